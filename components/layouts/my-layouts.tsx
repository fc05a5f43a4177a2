"use client";

import Link from "next/link";
import { useState } from "react";
import useSWR from "swr";
import type { ErrorBody } from "@/lib/errors";
import type { SavedLayoutView } from "@/lib/layouts/saved";
import { Alert } from "@/components/ui/alert";

async function fetchJson<T>(url: string): Promise<T> {
  const res = await fetch(url);
  if (!res.ok) throw new Error(((await res.json().catch(() => null)) as ErrorBody | null)?.error.message ?? "Could not load your layouts.");
  return res.json();
}

async function send(url: string, init: RequestInit): Promise<string | null> {
  try {
    const res = await fetch(url, { ...init, headers: { "content-type": "application/json" } });
    if (res.ok) return null;
    const body = (await res.json().catch(() => null)) as ErrorBody | null;
    return body?.error.fields?.name ?? body?.error.message ?? "That did not work. Try again.";
  } catch {
    return "Could not reach Sixteenths. Check your connection and try again.";
  }
}

export function MyLayouts() {
  const { data, error, isLoading, mutate } = useSWR<{ layouts: SavedLayoutView[] }>("/api/layouts", fetchJson);
  const [message, setMessage] = useState<{ tone: "error" | "success"; text: string }>();

  if (isLoading) return <p role="status">Loading your layouts…</p>;
  if (error) return <Alert tone="error">{error.message}</Alert>;
  const layouts = data?.layouts ?? [];

  const rename = async (layout: SavedLayoutView, name: string) => {
    const problem = await send(`/api/layouts/${layout.id}`, { method: "PATCH", body: JSON.stringify({ name }) });
    setMessage(problem ? { tone: "error", text: problem } : { tone: "success", text: `Renamed to “${name.trim()}”.` });
    await mutate();
    return problem === null;
  };
  const remove = async (layout: SavedLayoutView) => {
    if (!window.confirm(`Delete the layout “${layout.name}”? This cannot be undone.`)) return;
    const problem = await send(`/api/layouts/${layout.id}`, { method: "DELETE" });
    setMessage(problem ? { tone: "error", text: problem } : { tone: "success", text: `Deleted “${layout.name}”.` });
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
  onRename: (layout: SavedLayoutView, name: string) => Promise<boolean>;
  onDelete: (layout: SavedLayoutView) => Promise<void>;
}) {
  const [editing, setEditing] = useState(false);
  const [name, setName] = useState(layout.name);
  const inputId = `rename-${layout.id}`;
  return (
    <li className="card flex flex-wrap items-center justify-between gap-3 p-4">
      {editing ? (
        <form
          className="flex flex-1 flex-wrap items-end gap-2"
          onSubmit={async (e) => {
            e.preventDefault();
            if (await onRename(layout, name)) setEditing(false);
          }}
        >
          <div className="min-w-48 flex-1">
            <label htmlFor={inputId} className="mb-1 block text-sm font-semibold">
              New name
            </label>
            <input id={inputId} className="input" value={name} maxLength={120} onChange={(e) => setName(e.target.value)} autoFocus />
          </div>
          <button type="submit" className="btn-primary">
            Save name
          </button>
          <button type="button" className="btn-quiet" onClick={() => (setEditing(false), setName(layout.name))}>
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
