"use client";

import Link from "next/link";
import { useState } from "react";
import useSWR from "swr";
import type { ErrorBody } from "@/lib/errors";
import type { SavedLayoutView } from "@/lib/layouts/saved";
import { Alert } from "@/components/ui/alert";
import { callApi } from "@/components/ui/call-api";

async function fetchJson<T>(url: string): Promise<T> {
  const res = await fetch(url);
  if (!res.ok) throw new Error(((await res.json().catch(() => null)) as ErrorBody | null)?.error.message ?? "Could not load your layouts.");
  return res.json();
}


export function MyLayouts() {
  const { data, error, isLoading, mutate } = useSWR<{ layouts: SavedLayoutView[] }>("/api/layouts", fetchJson);
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string }>();

  if (isLoading) return <p role="status">Loading your layouts…</p>;
  if (error) return <Alert tone="error">{error.message}</Alert>;
  const layouts = data?.layouts ?? [];

  const rename = async (layout: SavedLayoutView, name: string) => {
    const result = await callApi(`/api/layouts/${layout.id}`, "PATCH", { name });
    if (!result.ok) return result.fields.name ?? result.message;
    setMessage({ tone: "success", text: `Renamed to “${name.trim()}”.` });
    await mutate();
    return null;
  };
  const remove = async (layout: SavedLayoutView) => {
    if (!window.confirm(`Delete the layout “${layout.name}”? This cannot be undone.`)) return;
    const result = await callApi(`/api/layouts/${layout.id}`, "DELETE");
    setMessage(result.ok ? { tone: "success", text: `Deleted “${layout.name}”.` } : { tone: "error", text: result.message });
    await mutate();
  };

  return (
    <div className="space-y-4">
      {message ? <Alert tone={message.tone}>{message.text}</Alert> : null}
      {layouts.length === 0 ? (
        <div className="card space-y-2 p-6">
          <p className="font-semibold">No saved layouts yet.</p>
          <p className="text-ink-soft">
            Work a layout in any of the <Link href="/calculators">calculators</Link> and press “Save layout”.
          </p>
        </div>
      ) : (
        <ul className="space-y-3">
          {layouts.map((layout) => (
            <LayoutRow key={layout.id} layout={layout} onRename={rename} onDelete={remove} />
          ))}
        </ul>
      )}
    </div>
  );
}

function LayoutRow({
  layout,
  onRename,
  onDelete,
}: {
  layout: SavedLayoutView;
  /** Resolves to the server's refusal, or null once renamed. */
  onRename: (layout: SavedLayoutView, name: string) => Promise<string | null>;
  onDelete: (layout: SavedLayoutView) => Promise<void>;
}) {
  const [editing, setEditing] = useState(false);
  const [name, setName] = useState(layout.name);
  const [error, setError] = useState<string>();
  const inputId = `rename-${layout.id}`;
  const errorId = `${inputId}-error`;
  return (
    <li className="card flex flex-wrap items-center justify-between gap-3 p-4">
      {editing ? (
        <form
          className="flex flex-1 flex-wrap items-end gap-2"
          onSubmit={async (e) => {
            e.preventDefault();
            const problem = await onRename(layout, name);
            setError(problem ?? undefined);
            if (problem === null) setEditing(false);
            else document.getElementById(inputId)?.focus();
          }}
        >
          <div className="min-w-48 flex-1">
            <label htmlFor={inputId} className="mb-1 block text-sm font-semibold">
              New name
            </label>
            <input
              id={inputId}
              className="input"
              value={name}
              maxLength={120}
              onChange={(e) => setName(e.target.value)}
              aria-invalid={error ? true : undefined}
              aria-describedby={error ? errorId : undefined}
              autoFocus
            />
            {error ? (
              <p id={errorId} className="mt-1 text-sm font-semibold text-danger">
                {error}
              </p>
            ) : null}
          </div>
          <button type="submit" className="btn-primary">
            Save name
          </button>
          <button type="button" className="btn-quiet" onClick={() => (setEditing(false), setName(layout.name), setError(undefined))}>
            Cancel
          </button>
        </form>
      ) : (
        <>
          <div className="min-w-0">
            <Link href={layout.href} className="text-lg font-semibold">
              {layout.name}
            </Link>
            <p className="text-sm text-ink-soft">
              {layout.calculator} · saved <time dateTime={layout.updatedAt}>{new Date(layout.updatedAt).toLocaleDateString()}</time>
            </p>
          </div>
          <div className="flex gap-2">
            <button type="button" className="btn-quiet" onClick={() => setEditing(true)} aria-label={`Rename ${layout.name}`}>
              Rename
            </button>
            <button type="button" className="btn-quiet text-danger" onClick={() => onDelete(layout)} aria-label={`Delete ${layout.name}`}>
              Delete
            </button>
          </div>
        </>
      )}
    </li>
  );
}
