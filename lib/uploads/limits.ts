// Shared by the server and the uploader in the browser, so the page can warn before sending
// what the server would refuse anyway. No server imports here.

export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;
/** Room for the multipart boundary and headers around one photo. */
export const MAX_REQUEST_BYTES = MAX_PHOTO_BYTES + 64 * 1024;
export const MAX_PHOTOS_PER_ASSIGNMENT = 5;
export const MAX_COMMENT_LENGTH = 1000;

export const PHOTO_MIME_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
export type PhotoMime = (typeof PHOTO_MIME_TYPES)[number];

/** What a page shows of one stored photo; never the file names on disk. */
export type UploadView = {
  id: string;
  assignmentId: number;
  studentId: number;
  originalName: string;
  mime: PhotoMime;
  bytes: number;
  width: number;
  height: number;
  uploadedAt: string;
  thumbUrl: string;
  fullUrl: string;
  comment: string | null;
  commentByName: string | null;
  commentedAt: string | null;
};

/** "3.4 MB", "820 KB": sizes as a phone's file picker shows them. */
export function formatBytes(bytes: number): string {
  // A no-break space keeps the number and its unit on one line.
  if (bytes >= 1024 * 1024) return `${(bytes / (1024 * 1024)).toFixed(1)}\u00a0MB`;
  return `${Math.max(1, Math.round(bytes / 1024))}\u00a0KB`;
}

/** Shown under the file's name, so it does not repeat it. */
export function tooBigMessage(bytes: number): string {
  return `This one is ${formatBytes(bytes)}; a photo can be at most ${formatBytes(MAX_PHOTO_BYTES)}. Send a smaller copy (most phones offer “medium” or “large” when sharing).`;
}
