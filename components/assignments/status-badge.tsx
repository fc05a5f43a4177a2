const STYLES = {
  draft: "border-rule-strong bg-paper-sunk text-ink-soft",
  published: "border-ok bg-ok-bg text-ok",
} as const;

/** Draft or published, in words (never colour alone); a draft once published says so. */
export function StatusBadge({ status, everPublished = false }: { status: "draft" | "published"; everPublished?: boolean }) {
  const text = status === "published" ? "Published" : everPublished ? "Unpublished" : "Draft";
  return <span className={`inline-block rounded-sm border px-2 py-0.5 text-xs font-semibold whitespace-nowrap ${STYLES[status]}`} data-status={status}>{text}</span>;
}
