import type { ErrorBody } from "@/lib/errors";
import type { UploadView } from "@/lib/uploads/limits";

// Talking to the photo routes from the browser. Every failure comes back as a sentence to show,
// never as a thrown error, so the components only have to put it on screen.

export type SendResult = { ok: true; upload: UploadView } | { ok: false; message: string; retryable: boolean };

const OFFLINE = "Could not reach Sixteenths. Check your connection and try again.";

function messageOf(body: unknown, status: number): string {
  const error = (body as ErrorBody | null)?.error;
  return error?.message ?? `The server could not take that (error ${status}). Try again in a moment.`;
}

/** XMLHttpRequest rather than fetch: only it reports how much of the file has gone up. */
export function sendPhoto(assignmentId: number, file: File, onProgress: (percent: number) => void): Promise<SendResult> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/assignments/${assignmentId}/uploads`);
    xhr.responseType = "json";
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(Math.min(100, Math.round((event.loaded / event.total) * 100)));
    };
    xhr.onload = () => {
      if (xhr.status === 201) resolve({ ok: true, upload: (xhr.response as { upload: UploadView }).upload });
      else resolve({ ok: false, message: messageOf(xhr.response, xhr.status), retryable: xhr.status >= 500 });
    };
    xhr.onerror = () => resolve({ ok: false, message: OFFLINE, retryable: true });
    const form = new FormData();
    form.append("photo", file);
    xhr.send(form);
  });
}

/** DELETE or PATCH a photo; null when it worked, else the message to show. */
export async function changePhoto(uploadId: string, init: RequestInit): Promise<{ error: string | null; upload?: UploadView }> {
  try {
    const res = await fetch(`/api/uploads/${uploadId}`, { ...init, headers: { "content-type": "application/json" } });
    if (res.status === 204) return { error: null };
    const body = await res.json().catch(() => null);
    if (!res.ok) return { error: (body as ErrorBody | null)?.error.fields?.comment ?? messageOf(body, res.status) };
    return { error: null, upload: (body as { upload: UploadView }).upload };
  } catch {
    return { error: OFFLINE };
  }
}

export async function fetchUploads(url: string): Promise<{ uploads: UploadView[] }> {
  const res = await fetch(url);
  const body = await res.json().catch(() => null);
  if (!res.ok) throw new Error(messageOf(body, res.status));
  return body as { uploads: UploadView[] };
}

/** The thumbnail's drawn size, from the stored photo's (thumbnails are 320 px wide at most, 640 tall). */
export function thumbSize(upload: Pick<UploadView, "width" | "height">): { width: number; height: number } {
  const scale = Math.min(1, 320 / upload.width, 640 / upload.height);
  return { width: Math.max(1, Math.round(upload.width * scale)), height: Math.max(1, Math.round(upload.height * scale)) };
}
