import { useId } from "react";
import type { EvenSpacingResult } from "@/lib/layout/spacing";
import { HDimension, MarkNumber } from "./dimension";
import { lengthText, type Display } from "./readouts";

const WIDTH = 640;
const PAD = 16;
const HEIGHT = 170;

/**
 * Elevation of an evenly spaced layout: the span, each member (numbered), the gap and the
 * on-centre spacing dimensioned once, the span dimensioned below. Posts are drawn at both
 * ends when the layout has gaps at its ends.
 */
export function SpacingDrawing({ result, display, memberName = "member" }: { result: EvenSpacingResult; display: Display; memberName?: string }) {
  // Several drawings can share a lesson page, so their title and description ids must differ.
  const id = useId();
  const span = result.span.valueOf();
  const scale = (WIDTH - PAD * 2) / span;
  const x = (inches: number) => PAD + inches * scale;
  const top = 20;
  const bottom = 100;
  const numbered = result.members.length <= 60;
  const first = result.members[0];
  const second = result.members[1];
  const description =
    result.members.length === 0
      ? `The ${result.count} members do not fit in the ${lengthText(result.span, display)} span.`
      : `Elevation of a ${lengthText(result.span, display)} span with ${result.count} ${memberName}s ${lengthText(result.memberWidth, display)} wide and ${result.spaces} equal gaps of ${lengthText(result.gap, display)}, ${lengthText(result.onCenter, display)} on centre. The first ${memberName}'s left edge is at ${lengthText(first.startMark.exact, display)} from the left end.`;

  return (
    <figure className="card overflow-hidden p-2">
      <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} role="img" aria-labelledby={`${id}-title ${id}-desc`} className="w-full">
        <title id={`${id}-title`}>Layout drawing</title>
        <desc id={`${id}-desc`}>{description}</desc>
        <rect x={x(0)} y={top} width={span * scale} height={bottom - top} className="fill-paper-sunk stroke-rule-strong" strokeWidth={0.8} />
        {result.endCondition === "gaps" ? (
          <>
            <rect x={x(0) - 8} y={top - 8} width={8} height={bottom - top + 8} className="fill-ink-soft" />
            <rect x={x(span)} y={top - 8} width={8} height={bottom - top + 8} className="fill-ink-soft" />
          </>
        ) : null}
        {result.members.map((m) => (
          <rect key={m.index} x={x(m.start.valueOf())} y={top} width={Math.max(0.6, result.memberWidth.valueOf() * scale)} height={bottom - top} className="fill-ink" />
        ))}
        {numbered
          ? result.members.map((m) => <MarkNumber key={m.index} x={x(m.center.valueOf())} y={top - 9} n={m.index} r={result.members.length > 30 ? 4 : 6} />)
          : null}
        {first && second ? (
          <HDimension x1={x(first.end.valueOf())} x2={x(second.start.valueOf())} y={bottom + 14} label={`gap ${lengthText(result.gap, display)}`} fontSize={9} />
        ) : null}
        {first && second ? (
          <HDimension x1={x(first.center.valueOf())} x2={x(second.center.valueOf())} y={bottom + 34} label={`${lengthText(result.onCenter, display)} o.c.`} fontSize={9} />
        ) : null}
        <HDimension x1={x(0)} x2={x(span)} y={bottom + 58} label={`span ${lengthText(result.span, display)} (${lengthText(result.span, display, "feet-inches")})`} />
      </svg>
    </figure>
  );
}
