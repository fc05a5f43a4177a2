import { useId } from "react";
import type { StairLayoutResult } from "@/lib/layout/stairs";
import { HDimension, MarkNumber, VDimension } from "./dimension";
import { lengthText, type Display } from "./readouts";

const WIDTH = 640;
const LEFT = 92;
const RIGHT = 84;
const TOP = 28;
const BOTTOM = 60;
const MAX_HEIGHT = 300;

/**
 * Side view of the stair as it is laid out on the stringer: the risers and treads as a
 * sawtooth from the lower floor to the upper floor, the stringer's body beneath them, the
 * total rise and total run dimensioned, one riser and one tread dimensioned, and every
 * riser numbered from the bottom. Drawn to one scale both ways.
 */
export function StairDrawing({ result, display }: { result: StairLayoutResult; display: Display }) {
  // Unique per drawing: a lesson page can hold more than one.
  const svgId = useId();
  const rise = result.totalRise.valueOf();
  const run = result.totalRun.exact.valueOf();
  const riser = result.riserHeight.exact.valueOf();
  const tread = result.treadDepth.exact.valueOf();
  const n = result.riserCount;
  const available = WIDTH - LEFT - RIGHT;
  const scale = Math.min(available / Math.max(run, rise), MAX_HEIGHT / rise);
  const height = TOP + rise * scale + BOTTOM;
  const left = LEFT + (available - run * scale) / 2;
  const X = (inches: number) => left + inches * scale;
  const floorY = TOP + rise * scale;
  const Y = (inches: number) => floorY - inches * scale;

  // The sawtooth, from the marks the engine gives: each riser runs up from the last mark's
  // height, and each tread runs to the next riser's face.
  const profile: [number, number][] = [[X(0), Y(0)]];
  result.steps.forEach((step, i) => {
    profile.push([X(step.run.exact.valueOf()), Y(step.height.exact.valueOf())]);
    const next = result.steps[i + 1];
    if (next) profile.push([X(next.run.exact.valueOf()), Y(step.height.exact.valueOf())]);
  });

  // The stringer's underside runs parallel to the pitch, a little under one riser below the
  // inside corners of the sawtooth; it is a picture of the board, not a size for it.
  const drop = riser * 0.9;
  const stringer =
    result.treadCount > 0
      ? [...profile, [X(run), Y(rise - riser - drop)], [X((drop * tread) / riser), Y(0)]].map(([x, y]) => `${x},${y}`).join(" ")
      : null;

  const numberRadius = Math.min(6, riser * scale * 0.4);
  const numbered = n <= 40 && numberRadius >= 3.5;
  const topTread = result.treadCount > 0 ? result.steps[result.treadCount - 1] : null;
  const upperFloorEnd = WIDTH - 8;
  const riseX = Math.min(X(run) + 44, WIDTH - 24);

  const description =
    `Side view of the stair: ${n} ${n === 1 ? "riser" : "risers"} of ${lengthText(result.riserHeight.exact, display)} and ${result.treadCount} ${result.treadCount === 1 ? "tread" : "treads"} of ${lengthText(result.treadDepth.exact, display)}, ` +
    `climbing a total rise of ${lengthText(result.totalRise, display)} over a total run of ${lengthText(result.totalRun.exact, display)} from the floor to the upper floor. ` +
    `The risers are numbered from the bottom; the stringer is about ${lengthText(result.stringerLength.rounded, display)} long at about ${result.angleDegrees.approx.toFixed(0)}° from the floor.`;

  return (
    <figure className="card overflow-hidden p-2 print:break-inside-avoid">
      <svg viewBox={`0 0 ${WIDTH} ${height}`} role="img" aria-labelledby={`${svgId}-title ${svgId}-desc`} className="w-full print:max-h-[2.1in]">
        <title id={`${svgId}-title`}>Stair drawing</title>
        <desc id={`${svgId}-desc`}>{description}</desc>
        <line x1={8} x2={upperFloorEnd} y1={floorY} y2={floorY} className="stroke-ink-soft" strokeWidth={1.4} />
        <text x={10} y={floorY + 13} fontSize={10} className="fill-ink-soft">
          floor
        </text>
        <rect x={X(run)} y={Y(rise)} width={upperFloorEnd - X(run)} height={8} className="fill-ink-faint" />
        <text x={upperFloorEnd} y={Y(rise) - 5} textAnchor="end" fontSize={10} className="fill-ink-soft">
          upper floor
        </text>
        {stringer ? <polygon points={stringer} className="fill-paper-sunk stroke-rule-strong" strokeWidth={0.8} /> : null}
        <polyline points={profile.map(([x, y]) => `${x},${y}`).join(" ")} fill="none" className="stroke-ink" strokeWidth={1.8} strokeLinejoin="miter" />
        {numbered
          ? result.steps.map((step) => (
              <MarkNumber
                key={step.index}
                x={X(step.run.exact.valueOf()) + numberRadius + 3}
                y={Y(step.height.exact.valueOf() - riser / 2)}
                n={step.index}
                r={numberRadius}
              />
            ))
          : null}
        <VDimension y1={Y(0)} y2={Y(riser)} x={X(0) - 12} label="" />
        <text x={X(0) - 18} y={Y(riser / 2) + 3} textAnchor="end" fontSize={9} className="fill-ink font-mono">
          riser {lengthText(result.riserHeight.exact, display)}
        </text>
        {topTread ? (
          <>
            <HDimension x1={X(topTread.run.exact.valueOf())} x2={X(run)} y={Y(topTread.height.exact.valueOf()) - 12} label="" />
            <text x={X(topTread.run.exact.valueOf()) - 6} y={Y(topTread.height.exact.valueOf()) - 9} textAnchor="end" fontSize={9} className="fill-ink font-mono">
              tread {lengthText(result.treadDepth.exact, display)}
            </text>
          </>
        ) : null}
        <VDimension y1={Y(0)} y2={Y(rise)} x={riseX} label={`total rise ${lengthText(result.totalRise, display)}`} fontSize={9} />
        {run > 0 ? <HDimension x1={X(0)} x2={X(run)} y={floorY + 24} label={`total run ${lengthText(result.totalRun.exact, display)} (${lengthText(result.totalRun.exact, display, "feet-inches")})`} fontSize={9} /> : null}
      </svg>
    </figure>
  );
}
