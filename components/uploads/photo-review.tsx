"use client";

import { useId, useState } from "react";
import useSWR from "swr";
import { Alert } from "@/components/ui/alert";
import { LocalTime } from "@/components/ui/local-time";
import { useHydrated } from "@/components/ui/use-hydrated";
import { MAX_COMMENT_LENGTH, type UploadView } from "@/lib/uploads/limits";
import { PhotoThumb } from "./photo-thumb";
import { changePhoto, fetchUploads } from "./upload-client";

/** The instructor's view of one student's shop photos on an assignment, with a comment box under each. */
export function PhotoReview({ assignmentId, studentId, initial }: { assignmentId: number; studentId: number; initial: UploadView[] }) {
  // SWR keeps fallback data out of its cache, so a mutation before the first fetch starts from it.
  const fallback = { uploads: initial };
  const { data, error, mutate } = useSWR(`/api/assignments/${assignmentId}/uploads?studentId=${studentId}`, fetchUploads, {
    fallbackData: fallback,
    revalidateOnMount: false,
  });
  const headingId = useId();
  const uploads = data.uploads;

  const saved = (upload: UploadView) => mutate((current) => ({ uploads: (current ?? fallback).uploads.map((u) => (u.id === upload.id ? upload : u)) }), { revalidate: false });

  // Phone file names are long unbroken words; they wrap instead of widening a 360 px screen.
  return (
    <section aria-labelledby={headingId} className="space-y-4 [overflow-wrap:anywhere]">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={headingId} className="text-xl">
          Shop photos
        </h2>
        <p className="text-sm font-semibold text-ink-soft">{uploads.length === 1 ? "1 photo" : `${uploads.length} photos`}</p>
      </div>
      {error ? <Alert tone="error">{error.message}</Alert> : null}
      {uploads.length === 0 ? (
        <p className="card p-4 text-ink-soft">No shop photos from this student on this assignment yet.</p>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3" aria-label="The student's photos">
          {uploads.map((upload, index) => (
            <li key={upload.id} className="card min-w-0 space-y-3 p-3">
              <PhotoThumb upload={upload} label={`Photo ${index + 1}: ${upload.originalName}`} />
              <CommentBox upload={upload} index={index} onSaved={saved} />
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

type SaveState = { kind: "idle" } | { kind: "saving" } | { kind: "saved" } | { kind: "error"; message: string };

function CommentBox({ upload, index, onSaved }: { upload: UploadView; index: number; onSaved: (upload: UploadView) => void }) {
  const [text, setText] = useState(upload.comment ?? "");
  const [state, setState] = useState<SaveState>({ kind: "idle" });
  const hydrated = useHydrated();
  const fieldId = useId();
  const statusId = `${fieldId}-status`;
  const dirty = text.trim() !== (upload.comment ?? "");
  const over = text.length > MAX_COMMENT_LENGTH;

  const save = async () => {
    setState({ kind: "saving" });
    const result = await changePhoto(upload.id, { method: "PATCH", body: JSON.stringify({ comment: text }) });
    if (result.error || !result.upload) {
      setState({ kind: "error", message: result.error ?? "The comment was not saved. Try again." });
      return;
    }
    setText(result.upload.comment ?? "");
    onSaved(result.upload);
    setState({ kind: "saved" });
  };

  return (
    <form
      className="space-y-2"
      onSubmit={(event) => {
        event.preventDefault();
        if (!over) void save();
      }}
    >
      <label htmlFor={fieldId} className="block text-sm font-semibold">
        Comment on photo {index + 1}
      </label>
      <textarea
        id={fieldId}
        rows={4}
        className="input min-h-24 py-2 [field-sizing:content]"
        value={text}
        disabled={!hydrated}
        aria-invalid={over || state.kind === "error" ? true : undefined}
        aria-describedby={statusId}
        placeholder="What you see in the marks, the layout or the cut"
        onChange={(event) => {
          setText(event.target.value);
          if (state.kind !== "saving") setState({ kind: "idle" });
        }}
      />
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p id={statusId} role="status" className={`text-sm ${over || state.kind === "error" ? "font-semibold text-danger" : "text-ink-soft"}`}>
          {over ? (
            `${text.length - MAX_COMMENT_LENGTH} characters over the ${MAX_COMMENT_LENGTH} limit.`
          ) : state.kind === "error" ? (
            state.message
          ) : state.kind === "saving" ? (
            "Saving…"
          ) : state.kind === "saved" && !dirty ? (
            <span className="font-semibold text-ok">{upload.comment ? "Saved. The student sees it under the photo." : "Comment removed."}</span>
          ) : dirty ? (
            "Not saved yet."
          ) : upload.comment && upload.commentedAt ? (
            <>
              Saved{upload.commentByName ? ` by ${upload.commentByName}` : ""}, <LocalTime iso={upload.commentedAt} />
            </>
          ) : (
            `Up to ${MAX_COMMENT_LENGTH} characters.`
          )}
        </p>
        <button type="submit" className="btn-primary" disabled={!hydrated || !dirty || over || state.kind === "saving"}>
          {state.kind === "saving" ? "Saving…" : "Save comment"}
        </button>
      </div>
    </form>
  );
}
