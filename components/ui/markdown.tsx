import Markdown from "react-markdown";
import remarkGfm from "remark-gfm";

/**
 * Instructor-written Markdown (assignment instructions). react-markdown builds React elements and
 * ignores raw HTML, so nothing a user typed runs as markup; links open as plain links.
 */
export function MarkdownText({ text, className }: { text: string; className?: string }) {
  if (!text.trim()) return null;
  return (
    <div className={["prose-instructions", className].filter(Boolean).join(" ")}>
      <Markdown remarkPlugins={[remarkGfm]} skipHtml>
        {text}
      </Markdown>
    </div>
  );
}
