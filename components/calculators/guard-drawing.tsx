import { useId } from "react";
import type { Fraction } from "@/lib/layout/core";
import type { GuardSpacingResult } from "@/lib/layout/guards";
import { formatMeasure } from "@/lib/layout/measure";
import { HDimension, MarkNumber } from "./dimension";
import { lengthText, type Display } from "./readouts";

const WIDTH = 640;
const PAD = 24;
const POST = 10;
const RAIL = 6;
const BALUSTER_TOP = 32;
const BALUSTER_BOTTOM = 132;
const DETAIL_TOP = 212;
const DETAIL_BALUSTER_TOP = 236;
const DETAIL_BALUSTER_BOTTOM = 322;

function sphereText(limit: Fraction, display: Display) {
  return formatMeasure(limit, { unit: display.unit, denominator: 64, mmDecimals: 1 }).text.replace(/\.0 mm$/, " mm");
}

/**
 * Elevation of a guard: the two posts, top and bottom rail, the balusters numbered from the
 * left post, the first opening and the span dimensioned, and the code sphere drawn to scale
 * in one opening. Below it, the sphere rule enlarged: this layout's opening beside the
 * opening one baluster fewer would leave. Horizontal distances and the sphere share one
 * scale; the baluster height is not to scale.
 */
export function GuardDrawing({ result, display }: { result: GuardSpacingResult; display: Display }) {
  // Unique per drawing: a lesson page can hold more than one.
  const svgId = useId();
  const span = result.span.valueOf();
  const limit = result.maxOpening.valueOf();
  const laidOut = result.members.length === result.count;
  // One scale for the run and the sphere, capped so a short span or a large typed limit
  // still leaves the sphere inside the baluster height.
  const scale = Math.min((WIDTH - 2 * PAD) / span, 10, (BALUSTER_BOTTOM - BALUSTER_TOP - 4) / limit);
  const left = (WIDTH - span * scale) / 2;
  const x = (inches: number) => left + inches * scale;
  const width = result.memberWidth.valueOf() * scale;
  const numbered = laidOut && result.count <= 60;
  const numberRadius = result.count > 30 ? 4 : 6;

  const openings = laidOut ? result.openings : [];
  const firstOpening = openings[0];
  const sphereOpening = openings.length >= 3 ? openings[Math.floor(openings.length / 2)] : openings.at(-1);
  const showDetail = laidOut && result.count > 0 && result.oneFewer !== null;
  const height = showDetail ? 372 : DETAIL_TOP - 8;
  const sphere = sphereText(result.maxOpening, display);

  const description = !laidOut
    ? `Elevation of a guard ${lengthText(result.span, display)} between posts: ${result.count} balusters of ${lengthText(result.memberWidth, display)} do not fit.`
    : [
        `Elevation of a guard between two posts ${lengthText(result.span, display)} apart, with ${result.count} balusters ${lengthText(result.memberWidth, display)} wide numbered from the left post and ${result.spaces} equal openings of ${lengthText(result.gap, display)}.`,
        sphereOpening && result.count > 0
          ? `A ${sphere} sphere is drawn to scale in opening ${sphereOpening.index}; it is wider than the opening, so it does not pass.`
          : "",
        result.oneFewer && result.count > 0
          ? `Enlarged below: with one baluster fewer the openings would be ${lengthText(result.oneFewer.opening, display)}, and the ${sphere} sphere passes.`
          : "",
      ]
        .filter(Boolean)
        .join(" ");

  return (
    <figure className="card overflow-hidden p-2 print:break-inside-avoid">
      <svg viewBox={`0 0 ${WIDTH} ${height}`} role="img" aria-labelledby={`${svgId}-title ${svgId}-desc`} className="w-full print:max-h-[2.8in]">
        <title id={`${svgId}-title`}>Guard drawing</title>
        <desc id={`${svgId}-desc`}>{description}</desc>
        <line x1={8} x2={WIDTH - 8} y1={BALUSTER_BOTTOM + RAIL + 12} y2={BALUSTER_BOTTOM + RAIL + 12} className="stroke-rule-strong" strokeWidth={1} />
        <rect x={x(0) - POST} y={BALUSTER_TOP - RAIL - 10} width={POST} height={BALUSTER_BOTTOM - BALUSTER_TOP + 2 * RAIL + 22} className="fill-ink-soft" />
        <rect x={x(span)} y={BALUSTER_TOP - RAIL - 10} width={POST} height={BALUSTER_BOTTOM - BALUSTER_TOP + 2 * RAIL + 22} className="fill-ink-soft" />
        <rect x={x(0)} y={BALUSTER_TOP - RAIL} width={span * scale} height={RAIL} className="fill-ink-faint" />
        <rect x={x(0)} y={BALUSTER_BOTTOM} width={span * scale} height={RAIL} className="fill-ink-faint" />
        {laidOut
          ? result.members.map((m) => (
              <rect key={m.index} x={x(m.start.valueOf())} y={BALUSTER_TOP} width={Math.max(0.6, width)} height={BALUSTER_BOTTOM - BALUSTER_TOP} className="fill-ink" />
            ))
          : null}
        {numbered ? result.members.map((m) => <MarkNumber key={m.index} x={x(m.center.valueOf())} y={BALUSTER_TOP - RAIL - 10} n={m.index} r={numberRadius} />) : null}
        {sphereOpening && result.count > 0 ? (
          <circle
            cx={x((sphereOpening.start.valueOf() + sphereOpening.end.valueOf()) / 2)}
            cy={(BALUSTER_TOP + BALUSTER_BOTTOM) / 2}
            r={(limit / 2) * scale}
            className="fill-chalk-light stroke-chalk"
            fillOpacity={0.75}
            strokeWidth={1.2}
          />
        ) : null}
        {firstOpening ? (
          <LabelledDimension x1={x(firstOpening.start.valueOf())} x2={x(firstOpening.end.valueOf())} y={BALUSTER_BOTTOM + RAIL + 30} label={`opening ${lengthText(result.gap, display)}`} />
        ) : null}
        <LabelledDimension x1={x(0)} x2={x(span)} y={BALUSTER_BOTTOM + RAIL + 54} label={`span ${lengthText(result.span, display)} (${lengthText(result.span, display, "feet-inches")})`} />
        {showDetail && result.oneFewer ? (
          <SphereDetail result={result} oneFewerOpening={result.oneFewer.opening} display={display} sphere={sphere} />
        ) : null}
      </svg>
    </figure>
  );
}

/** A dimension with its label above it when it fits, else beside it: an opening is often narrower than its label. */
function LabelledDimension({ x1, x2, y, label }: { x1: number; x2: number; y: number; label: string }) {
  const fontSize = 9;
  if (label.length * fontSize * 0.62 < x2 - x1) return <HDimension x1={x1} x2={x2} y={y} label={label} fontSize={fontSize} />;
  return (
    <>
      <HDimension x1={x1} x2={x2} y={y} label="" />
      <text x={x2 + 6} y={y + 3} fontSize={fontSize} className="fill-ink font-mono" aria-hidden="true">
        {label}
      </text>
    </>
  );
}

function SphereDetail({ result, oneFewerOpening, display, sphere }: { result: GuardSpacingResult; oneFewerOpening: Fraction; display: Display; sphere: string }) {
  const w = result.memberWidth.valueOf();
  const limit = result.maxOpening.valueOf();
  const widest = Math.max(result.gap.valueOf(), oneFewerOpening.valueOf(), limit);
  const scale = Math.min(14, (WIDTH / 2 - 40) / (2 * w + widest), (DETAIL_BALUSTER_BOTTOM - DETAIL_BALUSTER_TOP - 6) / limit);
  const panels = [
    { cx: WIDTH / 4, opening: result.gap, heading: `This layout: ${lengthText(result.gap, display)}`, verdict: `${sphere} sphere does not pass`, why: "the sphere is wider than the opening", passes: false },
    { cx: (WIDTH * 3) / 4, opening: oneFewerOpening, heading: `One baluster fewer: ${lengthText(oneFewerOpening, display)}`, verdict: `${sphere} sphere passes`, why: `the opening is not under ${sphere}: it fails`, passes: true },
  ];
  return (
    <g>
      <line x1={8} x2={WIDTH - 8} y1={DETAIL_TOP - 8} y2={DETAIL_TOP - 8} className="stroke-rule" strokeWidth={1} strokeDasharray="4 3" />
      <text x={WIDTH / 2} y={DETAIL_TOP + 6} textAnchor="middle" fontSize={10} className="fill-ink-soft">
        The sphere rule, enlarged
      </text>
      {panels.map((p) => {
        const half = (p.opening.valueOf() / 2) * scale;
        const cy = (DETAIL_BALUSTER_TOP + DETAIL_BALUSTER_BOTTOM) / 2;
        return (
          <g key={p.heading}>
            <text x={p.cx} y={DETAIL_BALUSTER_TOP - 6} textAnchor="middle" fontSize={10} className="fill-ink font-mono">
              {p.heading}
            </text>
            <rect x={p.cx - half - w * scale} y={DETAIL_BALUSTER_TOP} width={w * scale} height={DETAIL_BALUSTER_BOTTOM - DETAIL_BALUSTER_TOP} className="fill-ink" />
            <rect x={p.cx + half} y={DETAIL_BALUSTER_TOP} width={w * scale} height={DETAIL_BALUSTER_BOTTOM - DETAIL_BALUSTER_TOP} className="fill-ink" />
            <circle cx={p.cx} cy={cy} r={(limit / 2) * scale} className={p.passes ? "fill-danger-bg stroke-danger" : "fill-chalk-light stroke-chalk"} fillOpacity={0.85} strokeWidth={1.4} />
            <text x={p.cx} y={DETAIL_BALUSTER_BOTTOM + 16} textAnchor="middle" fontSize={10} fontWeight={700} className={p.passes ? "fill-danger" : "fill-ok"}>
              {p.verdict}
            </text>
            <text x={p.cx} y={DETAIL_BALUSTER_BOTTOM + 30} textAnchor="middle" fontSize={9} className="fill-ink-soft">
              {p.why}
            </text>
          </g>
        );
      })}
    </g>
  );
}
