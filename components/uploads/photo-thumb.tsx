import Image from "next/image";
import { LocalTime } from "@/components/ui/local-time";
import { formatBytes, type UploadView } from "@/lib/uploads/limits";
import { thumbSize } from "./upload-client";

/** A stored photo's thumbnail, linked to the full size in a new tab, with when it came in. */
export function PhotoThumb({ upload, label }: { upload: UploadView; label: string }) {
  const { width, height } = thumbSize(upload);
  return (
    <figure className="space-y-2">
      <a href={upload.fullUrl} target="_blank" rel="noopener" className="block overflow-hidden rounded border border-rule bg-paper-sunk no-underline" title="Open the full-size photo in a new tab">
        {/* The file comes from a signed-in route, so it is shown as sent: no image optimizer in between. */}
        <Image src={upload.thumbUrl} alt={label} width={width} height={height} unoptimized className="mx-auto h-48 w-full object-contain" />
        <span className="sr-only"> (opens full size in a new tab)</span>
      </a>
      <figcaption className="text-sm text-ink-soft">
        <span className="block truncate font-semibold text-ink" title={upload.originalName}>
          {upload.originalName}
        </span>
        <LocalTime iso={upload.uploadedAt} /> · <span className="measure">{upload.width}×{upload.height}</span> px · {formatBytes(upload.bytes)}
      </figcaption>
    </figure>
  );
}

/** The instructor's note under a photo, as the student sees it. */
export function PhotoComment({ upload }: { upload: UploadView }) {
  if (!upload.comment) return null;
  return (
    <div className="rounded border-l-4 border-chalk bg-chalk-light px-3 py-2 text-sm">
      <p className="font-semibold text-chalk-dark">
        {upload.commentByName ? `${upload.commentByName} wrote` : "Your instructor wrote"}
        {upload.commentedAt ? (
          <>
            {" "}
            on <LocalTime iso={upload.commentedAt} style="date" />
          </>
        ) : null}
      </p>
      <p className="whitespace-pre-line text-ink">{upload.comment}</p>
    </div>
  );
}
