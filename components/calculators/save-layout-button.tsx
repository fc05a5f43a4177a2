"use client";

import Link from "next/link";
import { useId, useRef, useState } from "react";
import type { CalculatorKind } from "@/lib/calculators";
import type { ErrorBody } from "@/lib/errors";

/** Saves the current layout under a name, for signed-in users; others get a sign-in link. */
export function SaveLayoutButton({ kind, query, signedIn }: { kind: CalculatorKind; query: string; signedIn: boolean }) {
  const dialog = useRef<HTMLDialogElement>(null);
  const id = useId();
  const [name, setName] = useState("");
  const [error, setError] = useState<string>();
  const [saving, setSaving] = useState(false);
  const [saved, setSaved] = useState<string>();

  if (!signedIn) {
    return (
      <Link className="btn-quiet" href={`/signin?callbackUrl=${encodeURIComponent(`/calculators/${kind}?${query}`)}`}>
        Sign in to save
      </Link>
    );
  }

  const save = async (event: React.FormEvent) => {
    event.preventDefault();
    setSaving(true);
    setError(undefined);
    try {
      const res = await fetch("/api/layouts", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ kind, name, params: query }) });
      if (!res.ok) {
        const body = (await res.json().catch(() => null)) as ErrorBody | null;
        setError(body?.error.fields?.name ?? body?.error.message ?? "Could not save the layout. Try again.");
        return;
      }
      setSaved(name.trim());
      dialog.current?.close();
      setName("");
    } catch {
      setError("Could not reach Sixteenths. Check your connection and try again.");
    } finally {
      setSaving(false);
    }
  };

  return (
    <>
      <button type="button" className="btn-quiet" onClick={() => dialog.current?.showModal()}>
        Save layout
      </button>
      {saved ? (
        <p role="status" className="self-center text-sm text-ok">
          Saved “{saved}”. <Link href="/layouts">My layouts</Link>
        </p>
      ) : null}
      <dialog ref={dialog} aria-labelledby={`${id}-title`} className="card m-auto w-[min(28rem,calc(100vw-2rem))] p-5 backdrop:bg-ink/40">
        <form onSubmit={save} className="space-y-4">
          <h2 id={`${id}-title`} className="text-lg">
            Save this layout
          </h2>
          <div>
            <label htmlFor={`${id}-name`} className="mb-1 block font-semibold">
              Name
            </label>
            <input
              id={`${id}-name`}
              className="input"
              value={name}
              maxLength={120}
              onChange={(e) => setName(e.target.value)}
              placeholder="e.g. Hallway wall, 1x4 battens"
              aria-invalid={error ? true : undefined}
              aria-describedby={error ? `${id}-error` : undefined}
              autoFocus
            />
            {error ? (
              <p id={`${id}-error`} className="mt-1 text-sm font-semibold text-danger">
                {error}
              </p>
            ) : null}
          </div>
          <div className="flex justify-end gap-2">
            <button type="button" className="btn-quiet" onClick={() => dialog.current?.close()}>
              Cancel
            </button>
            <button type="submit" className="btn-primary" disabled={saving}>
              {saving ? "Saving…" : "Save"}
            </button>
          </div>
        </form>
      </dialog>
    </>
  );
}
