"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { pluralize } from "@/lib/assignments/teacher-format";
import { Alert } from "@/components/ui/alert";
import { useHydrated } from "@/components/ui/use-hydrated";
import { callApi } from "@/components/ui/call-api";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";

type Props = {
  assignment: { id: number; classId: number; title: string; status: "draft" | "published"; locked: boolean; activeStudents: number; className: string };
  targets: { id: number; name: string; term: string }[];
};

type Pending = "publish" | "unpublish" | "duplicate" | "delete" | null;

/** Publish, unpublish, duplicate and delete, each behind a question that says what will happen. */
export function AssignmentActions({ assignment: a, targets }: Props) {
  const router = useRouter();
  const hydrated = useHydrated();
  const selectId = useId();
  const [pending, setPending] = useState<Pending>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string>();
  const [done, setDone] = useState<string>();
  const [target, setTarget] = useState(a.classId);
  const base = `/api/assignments/${a.id}`;

  const run = async (action: Exclude<Pending, null>) => {
    setBusy(true);
    setError(undefined);
    setDone(undefined);
    const result =
      action === "delete"
        ? await callApi<void>(base, "DELETE")
        : await callApi<{ emailed?: number; assignment: { id: number; classId: number } }>(`${base}/${action}`, "POST", action === "duplicate" ? { classId: target } : {});
    setBusy(false);
    setPending(null);
    if (!result.ok) return setError(result.message);
    if (action === "delete") {
      router.push(`/classes/${a.classId}/assignments?deleted=1`);
      router.refresh();
      return;
    }
    const data = result.data as { emailed?: number; assignment: { id: number; classId: number } };
    if (action === "duplicate") {
      router.push(`/classes/${data.assignment.classId}/assignments/${data.assignment.id}/edit?copied=1`);
      return;
    }
    setDone(action === "publish" ? `Published. ${pluralize(data.emailed ?? 0, "student")} e-mailed.` : "Unpublished. Students no longer see it; their work is kept.");
    router.refresh();
  };

  return (
    <div className="space-y-3" data-chrome>
      {error ? <Alert tone="error">{error}</Alert> : null}
      {done ? <Alert tone="success">{done}</Alert> : null}
      <div className="flex flex-wrap gap-3">
        <Link href={`/classes/${a.classId}/assignments/${a.id}/edit`} className="btn-quiet">
          Edit
        </Link>
        {a.status === "draft" ? (
          <button type="button" className="btn-primary" disabled={!hydrated} onClick={() => setPending("publish")}>
            Publish
          </button>
        ) : (
          <button type="button" className="btn-quiet" disabled={!hydrated} onClick={() => setPending("unpublish")}>
            Unpublish
          </button>
        )}
        <button type="button" className="btn-quiet" disabled={!hydrated} onClick={() => setPending("duplicate")}>
          Duplicate
        </button>
        {a.locked ? null : (
          <button type="button" className="btn-quiet text-danger" disabled={!hydrated} onClick={() => setPending("delete")}>
            Delete draft
          </button>
        )}
      </div>
      {a.locked ? <p className="text-sm text-ink-soft">A published assignment cannot be deleted, because students&rsquo; numbers and tries belong to it. Unpublish it to hide it.</p> : null}

      <ConfirmDialog open={pending === "publish"} title={`Publish “${a.title}”?`} confirmLabel="Publish and e-mail" busy={busy} onConfirm={() => run("publish")} onCancel={() => setPending(null)}>
        <p>
          {a.activeStudents === 0 ? `${a.className} has no active students yet, so nobody is e-mailed now.` : `${pluralize(a.activeStudents, "student")} in ${a.className} will be e-mailed a link.`}
        </p>
        <p>From then on its problems and tries per problem are fixed.</p>
      </ConfirmDialog>
      <ConfirmDialog open={pending === "unpublish"} title={`Unpublish “${a.title}”?`} confirmLabel="Unpublish" busy={busy} onConfirm={() => run("unpublish")} onCancel={() => setPending(null)}>
        <p>Students stop seeing it until you publish it again. Their numbers, answers and scores are kept, and nobody is e-mailed twice.</p>
      </ConfirmDialog>
      <ConfirmDialog open={pending === "duplicate"} title="Duplicate as a new draft" confirmLabel="Make the copy" busy={busy} onConfirm={() => run("duplicate")} onCancel={() => setPending(null)}>
        <p>The copy keeps the items, dates and settings, and opens in the builder so you can adjust it before publishing.</p>
        <label htmlFor={selectId} className="block font-semibold text-ink">
          Into the class
        </label>
        <select id={selectId} className="input" value={target} onChange={(e) => setTarget(Number(e.target.value))}>
          {targets.map((t) => (
            <option key={t.id} value={t.id}>
              {t.name} ({t.term}){t.id === a.classId ? " — this class" : ""}
            </option>
          ))}
        </select>
      </ConfirmDialog>
      <ConfirmDialog open={pending === "delete"} title={`Delete the draft “${a.title}”?`} tone="danger" confirmLabel="Delete draft" busy={busy} onConfirm={() => run("delete")} onCancel={() => setPending(null)}>
        <p>The draft and its items are removed for good. No student has seen it.</p>
      </ConfirmDialog>
    </div>
  );
}
