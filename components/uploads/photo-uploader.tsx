"use client";

import { useId, useRef, useState, type DragEvent } from "react";
import useSWR from "swr";
import { Alert } from "@/components/ui/alert";
import { useHydrated } from "@/components/ui/use-hydrated";
import { MAX_PHOTO_BYTES, MAX_PHOTOS_PER_ASSIGNMENT, PHOTO_MIME_TYPES, formatBytes, tooBigMessage, type UploadView } from "@/lib/uploads/limits";
import { PhotoComment, PhotoThumb } from "./photo-thumb";
import { changePhoto, fetchUploads, sendPhoto } from "./upload-client";

type Pending = { key: string; file: File; progress: number; state: "waiting" | "sending" | "failed"; error?: string; retryable?: boolean };

/**
 * A student's shop photos on one assignment: choose or drop up to five, watch each one go up,
 * see what was stored with the instructor's comments, and delete while the assignment is open.
 */
export function PhotoUploader({ assignmentId, initial, open }: { assignmentId: number; initial: UploadView[]; open: boolean }) {
  const listUrl = `/api/assignments/${assignmentId}/uploads`;
  // SWR keeps fallback data out of its cache, so a mutation before the first fetch starts from it.
  const fallback = { uploads: initial };
  const { data, mutate } = useSWR(listUrl, fetchUploads, { fallbackData: fallback, revalidateOnMount: false });
  const uploads = data.uploads;
  const [pending, setPending] = useState<Pending[]>([]);
  const [notice, setNotice] = useState<string>();
  const queue = useRef<Pending[]>([]);
  const draining = useRef(false);
  const hydrated = useHydrated();
  const headingId = useId();

  const inFlight = pending.filter((p) => p.state !== "failed").length;
  const room = Math.max(0, MAX_PHOTOS_PER_ASSIGNMENT - uploads.length - inFlight);

  const patch = (key: string, change: Partial<Pending>) => setPending((list) => list.map((p) => (p.key === key ? { ...p, ...change } : p)));

  // One photo at a time: each gets the whole connection, and the count stays in order.
  const drain = async () => {
    if (draining.current) return;
    draining.current = true;
    while (queue.current.length > 0) {
      const item = queue.current.shift()!;
      patch(item.key, { state: "sending", progress: 0, error: undefined });
      const result = await sendPhoto(assignmentId, item.file, (progress) => patch(item.key, { progress }));
      if (result.ok) {
        setPending((list) => list.filter((p) => p.key !== item.key));
        await mutate((current) => ({ uploads: [...(current ?? fallback).uploads, result.upload] }), { revalidate: false });
        setNotice(`“${result.upload.originalName}” is stored.`);
      } else {
        patch(item.key, { state: "failed", error: result.message, retryable: result.retryable });
      }
    }
    draining.current = false;
  };

  const accept = (files: FileList | File[]) => {
    let left = room;
    const added: Pending[] = Array.from(files).map((file, i) => {
      const key = `${Date.now()}-${i}-${file.name}`;
      if (file.size > MAX_PHOTO_BYTES) return { key, file, progress: 0, state: "failed", error: tooBigMessage(file.size) };
      if (left <= 0) return { key, file, progress: 0, state: "failed", error: `Not sent: an assignment takes ${MAX_PHOTOS_PER_ASSIGNMENT} photos at most. Delete one to make room.` };
      left -= 1;
      return { key, file, progress: 0, state: "waiting" };
    });
    setNotice(undefined);
    setPending((list) => [...list.filter((p) => p.state !== "failed"), ...added]);
    queue.current.push(...added.filter((p) => p.state === "waiting"));
    void drain();
  };

  const retry = (item: Pending) => {
    patch(item.key, { state: "waiting", progress: 0, error: undefined });
    queue.current.push(item);
    void drain();
  };

  const removeStored = async (upload: UploadView): Promise<string | null> => {
    const { error } = await changePhoto(upload.id, { method: "DELETE" });
    if (error) return error;
    await mutate((current) => ({ uploads: (current ?? fallback).uploads.filter((u) => u.id !== upload.id) }), { revalidate: false });
    setNotice(`“${upload.originalName}” is deleted.`);
    return null;
  };

  // Phone file names are long unbroken words; they wrap instead of widening a 360 px screen.
  return (
    <section aria-labelledby={headingId} className="space-y-4 [overflow-wrap:anywhere]">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={headingId} className="text-xl">
          Shop photos
        </h2>
        <p className="text-sm font-semibold text-ink-soft" aria-live="polite">
          {uploads.length} of {MAX_PHOTOS_PER_ASSIGNMENT} photos
        </p>
      </div>
      <p className="text-ink-soft">
        Photos of your mock-up or your marked layout, so your instructor can check the work beside your score. JPEG, PNG or WebP, up to {formatBytes(MAX_PHOTO_BYTES)} each.
      </p>

      {open ? (
        room > 0 ? (
          <DropZone disabled={!hydrated} room={room} onFiles={accept} />
        ) : inFlight === 0 ? (
          <Alert>All {MAX_PHOTOS_PER_ASSIGNMENT} photos are in. Delete one to send a different one.</Alert>
        ) : null
      ) : (
        <Alert>This assignment is closed, so it takes no more photos. The ones below stay with it as sent.</Alert>
      )}

      {notice ? (
        <p role="status" className="text-sm font-semibold text-ok">
          {notice}
        </p>
      ) : null}

      {pending.length > 0 ? (
        <ul className="space-y-2" aria-label="Photos being sent">
          {pending.map((item) => (
            <PendingRow key={item.key} item={item} onRetry={() => retry(item)} onDismiss={() => setPending((list) => list.filter((p) => p.key !== item.key))} />
          ))}
        </ul>
      ) : null}

      {uploads.length === 0 ? (
        <p className="card p-4 text-ink-soft">No photos yet.{open ? " Your first one will show here." : ""}</p>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3" aria-label="Your stored photos">
          {uploads.map((upload) => (
            <StoredPhoto key={upload.id} upload={upload} canDelete={open} onDelete={removeStored} />
          ))}
        </ul>
      )}
    </section>
  );
}

function DropZone({ disabled, room, onFiles }: { disabled: boolean; room: number; onFiles: (files: FileList) => void }) {
  const [over, setOver] = useState(false);
  const inputId = useId();
  const hintId = `${inputId}-hint`;
  const onDrop = (event: DragEvent) => {
    event.preventDefault();
    setOver(false);
    if (!disabled && event.dataTransfer.files.length > 0) onFiles(event.dataTransfer.files);
  };
  return (
    <div
      onDragOver={(event) => {
        event.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={onDrop}
      className={`flex flex-col items-center gap-3 rounded-lg border-2 border-dashed p-5 text-center sm:flex-row sm:text-left ${over ? "border-chalk bg-chalk-light" : "border-rule-strong bg-paper-raised"}`}
    >
      <input
        id={inputId}
        type="file"
        multiple
        // A hint for the picker only; the server decides by the file's content.
        accept={PHOTO_MIME_TYPES.join(",")}
        disabled={disabled}
        aria-describedby={hintId}
        className="peer sr-only"
        onChange={(event) => {
          if (event.target.files?.length) onFiles(event.target.files);
          event.target.value = "";
        }}
      />
      <label htmlFor={inputId} className={`btn-primary cursor-pointer peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-chalk ${disabled ? "pointer-events-none opacity-60" : ""}`}>
        Choose photos
      </label>
      <p id={hintId} className="text-sm text-ink-soft">
        <span className="hidden sm:inline">or drop them here. </span>
        {room === 1 ? "Room for 1 more photo." : `Room for ${room} more photos.`}
      </p>
    </div>
  );
}

function PendingRow({ item, onRetry, onDismiss }: { item: Pending; onRetry: () => void; onDismiss: () => void }) {
  const labelId = useId();
  return (
    <li className={`card space-y-2 p-3 ${item.state === "failed" ? "border-danger" : ""}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-x-3">
        <span id={labelId} className="min-w-0 truncate font-semibold" title={item.file.name}>
          {item.file.name}
        </span>
        <span className="text-sm text-ink-soft">{formatBytes(item.file.size)}</span>
      </div>
      {item.state === "failed" ? (
        <div className="space-y-2">
          <p role="alert" className="text-sm font-semibold text-danger">
            {item.error}
          </p>
          <div className="flex gap-2">
            {item.retryable ? (
              <button type="button" className="btn-quiet" onClick={onRetry}>
                Try again
              </button>
            ) : null}
            <button type="button" className="btn-quiet" onClick={onDismiss} aria-label={`Dismiss the message about ${item.file.name}`}>
              Dismiss
            </button>
          </div>
        </div>
      ) : (
        <div className="flex items-center gap-3">
          <div
            role="progressbar"
            aria-labelledby={labelId}
            aria-valuemin={0}
            aria-valuemax={100}
            aria-valuenow={item.progress}
            aria-valuetext={item.state === "waiting" ? "Waiting" : `${item.progress}% sent`}
            className="h-2 flex-1 overflow-hidden rounded bg-paper-sunk"
          >
            <div className="h-full bg-chalk transition-[width]" style={{ width: `${item.progress}%` }} />
          </div>
          <span className="measure w-24 text-right text-sm text-ink-soft">{item.state === "waiting" ? "waiting" : item.progress === 100 ? "checking…" : `${item.progress}%`}</span>
        </div>
      )}
    </li>
  );
}

function StoredPhoto({ upload, canDelete, onDelete }: { upload: UploadView; canDelete: boolean; onDelete: (upload: UploadView) => Promise<string | null> }) {
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <li className="card min-w-0 space-y-3 p-3">
      <PhotoThumb upload={upload} label={`Your photo ${upload.originalName}`} />
      <PhotoComment upload={upload} />
      {error ? (
        <p role="alert" className="text-sm font-semibold text-danger">
          {error}
        </p>
      ) : null}
      {canDelete ? (
        confirming ? (
          <div role="group" aria-label={`Delete ${upload.originalName}?`} className="space-y-2 rounded border border-danger bg-danger-bg p-2">
            <p className="text-sm font-semibold text-danger">Delete this photo? It cannot be brought back.</p>
            <div className="flex flex-wrap gap-2">
              <button
                type="button"
                className="btn border-danger bg-danger text-white hover:opacity-90"
                disabled={busy}
                onClick={async () => {
                  setBusy(true);
                  const problem = await onDelete(upload);
                  setBusy(false);
                  if (problem) {
                    setError(problem);
                    setConfirming(false);
                  }
                }}
              >
                {busy ? "Deleting…" : "Yes, delete it"}
              </button>
              <button type="button" className="btn-quiet" autoFocus disabled={busy} onClick={() => setConfirming(false)}>
                Keep it
              </button>
            </div>
          </div>
        ) : (
          <button type="button" className="btn-quiet text-danger" onClick={() => (setConfirming(true), setError(null))} aria-label={`Delete ${upload.originalName}`}>
            Delete
          </button>
        )
      ) : null}
    </li>
  );
}
