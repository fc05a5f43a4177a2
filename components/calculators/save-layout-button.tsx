"use client";

import Link from "next/link";
import { useId, useRef, useState } from "react";
import type { CalculatorKind } from "@/lib/calculators";
import { callApi } from "@/components/ui/call-api";

/** Saves the current layout under a name, for signed-in users; others get a sign-in link. */
export function SaveLayoutButton({ kind, query, signedIn }: { kind: CalculatorKind; query: string; signedIn: boolean }) {
  const dialog = useRef<HTMLDialogElement>(null);
  const nameInput = useRef<HTMLInputElement>(null);
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
    const result = await callApi("/api/layouts", "POST", { kind, name, params: query });
    setSaving(false);
    if (!result.ok) {
      // The name is the only thing typed here, so every refusal is shown beside it.
      setError(result.fields.name ?? result.message);
      nameInput.current?.focus();
      return;
    }
    setSaved(name.trim());
    dialog.current?.close();
    setName("");
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
              ref={nameInput}
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
