import { useId } from "react";
import type { ProblemFigure } from "@/lib/problems/types";

const TONES: Record<ProblemFigure["rects"][number]["tone"], string> = {
  member: "fill-paper-sunk stroke-ink",
  rail: "fill-paper-sunk stroke-ink",
  trim: "fill-rule stroke-ink",
  stud: "fill-none stroke-rule-strong [stroke-dasharray:3_3]",
  stock: "fill-paper-raised stroke-ink",
  post: "fill-rule-strong stroke-ink",
  tread: "fill-paper-sunk stroke-ink",
  highlight: "fill-chalk stroke-chalk-dark",
};

/**
 * The prompt's drawing, scaled to fit; dimension strings are drawn like the calculators'. A sketch
 * says it is not to scale, so nobody tries to measure it (its proportions are made up on purpose).
 */
export function ProblemFigureView({ figure }: { figure: ProblemFigure }) {
  // Several drawings share a page (a printed worksheet, a student's review), so each needs its own id.
  const descriptionId = useId();
  // A sketch is drawn in whole units and stays whole here: no decimal on the page can read as a decimal answer.
  const at = (value: number) => (figure.schematic ? Math.round(value) : value);
  const pad = at(Math.max(figure.width, figure.height) * 0.04 + 2);
  // A sketch's text is sized from its longer side, so a tall wall's labels stay readable on a phone.
  const font = figure.schematic ? Math.round(Math.max(figure.width, figure.height) / 30) : Math.max(figure.width / 36, 2.2);
  const dimY = figure.dimensions.map((d) => d.y);
  const top = at(Math.min(0, ...dimY) - font * 1.6 - pad);
  const bottom = at(Math.max(figure.height, ...dimY) + pad);
  const stroke = figure.schematic ? Math.max(1, Math.round(figure.width / 600)) : Math.max(figure.width / 600, 0.15);
  const drawing = (
    <svg role="img" aria-labelledby={descriptionId} viewBox={`${-pad} ${top} ${figure.width + 2 * pad} ${bottom - top}`} className="h-auto max-h-80 w-full" data-problem-figure>
      <desc id={descriptionId}>{figure.description}</desc>
      {figure.rects.map((r, i) => (
        <g key={i}>
          <rect x={r.x} y={r.y} width={Math.max(r.w, stroke)} height={Math.max(r.h, stroke)} strokeWidth={stroke} className={TONES[r.tone]} />
          {r.label ? (
            <text x={at(r.x + r.w / 2)} y={at(r.y + r.h / 2)} fontSize={at(font * 0.8)} textAnchor="middle" dominantBaseline="middle" className={r.tone === "highlight" ? "fill-paper font-mono font-bold" : "fill-ink font-mono"} aria-hidden="true">
              {r.label}
            </text>
          ) : null}
        </g>
      ))}
      {figure.dimensions.map((d, i) => {
        const tick = at(font * 0.5);
        const asked = d.label.includes("?");
        return (
          <g key={`d${i}`} aria-hidden="true" className={asked ? "text-chalk-dark" : "text-ink"}>
            <line x1={d.x1} x2={d.x2} y1={d.y} y2={d.y} stroke="currentColor" strokeWidth={at(stroke * 1.2)} />
            <line x1={d.x1} x2={d.x1} y1={d.y - tick} y2={d.y + tick} stroke="currentColor" strokeWidth={at(stroke * 1.2)} />
            <line x1={d.x2} x2={d.x2} y1={d.y - tick} y2={d.y + tick} stroke="currentColor" strokeWidth={at(stroke * 1.2)} />
            <text x={at((d.x1 + d.x2) / 2)} y={at(d.y - tick * 0.8)} fontSize={font} textAnchor="middle" className={`fill-current font-mono ${asked ? "font-bold" : ""}`}>
              {d.label}
            </text>
          </g>
        );
      })}
    </svg>
  );
  if (!figure.schematic) return drawing;
  return (
    <figure>
      {drawing}
      <figcaption className="mt-1 text-right text-xs text-ink-soft">Not to scale</figcaption>
    </figure>
  );
}
