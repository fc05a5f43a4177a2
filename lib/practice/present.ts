import "server-only";
import katex from "katex";
import type { ProblemPart } from "@/lib/problems/types";
import { precisionText } from "@/lib/grading/grade";

const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);

/**
 * Prompt and solution text → HTML: plain text is escaped, `$…$` is typeset by KaTeX here on
 * the server (with MathML for screen readers), so the browser needs KaTeX's CSS but none of its code.
 */
export function mathTextToHtml(text: string): string {
  return text
    .split(/\n\s*\n/)
    .map((paragraph) => {
      const pieces = paragraph.split(/(\$[^$]+\$)/g).map((piece) => {
        if (piece.length > 2 && piece.startsWith("$") && piece.endsWith("$")) {
          return katex.renderToString(piece.slice(1, -1), { throwOnError: false, strict: false });
        }
        return escapeHtml(piece);
      });
      return `<p>${pieces.join("").trim()}</p>`;
    })
    .join("");
}

export function inlineMathToHtml(text: string): string {
  const html = mathTextToHtml(text);
  return html.startsWith("<p>") && html.indexOf("<p>", 1) === -1 ? html.slice(3, -4) : html;
}

export type PartView = { key: string; label: string; answer: ProblemPart["answer"]; hint: string };

export function partView(part: ProblemPart): PartView {
  const hint =
    part.answer === "count"
      ? "a whole number"
      : part.answer === "number"
        ? `a number, to ${precisionText(part.precision)}`
        : `in inches, to ${precisionText(part.precision)}"${part.style === "feet-inches" ? " (feet and inches are fine)" : ""}`;
  return { key: part.key, label: part.label, answer: part.answer, hint };
}
