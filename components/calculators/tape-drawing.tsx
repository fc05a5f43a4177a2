"use client";

import type { PointerEvent } from "react";
import { Fraction } from "@/lib/layout/core";
import { formatMeasure } from "@/lib/layout/measure";
import { TAPE_WINDOW_INCHES } from "./tape-practice";

const WIDTH = 640;
const PAD = 26;
const PER_INCH = (WIDTH - PAD * 2) / TAPE_WINDOW_INCHES;
const TOP = 26; // the tape's top edge, where the graduations start
const BLADE = 88; // the blade's height
const HEIGHT = 172;

// Longer lines for coarser graduations, as on a tape: inch, 1/2, 1/4, 1/8, 1/16, 1/32.
const TICK_LENGTH: Record<number, number> = { 1: 52, 2: 40, 4: 31, 8: 23, 16: 16, 32: 10 };

/** The layout marks tapes print: every 16" for studs and every 19.2" (96 ÷ 5) for joists. */
const STUD_SPACING = 16;
const JOIST_SPACING = new Fraction(96, 5);

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** The graduation's own denominator: step 12 of 16 is a quarter, step 8 a half, step 0 an inch. */
function graduationOf(step: number, precision: number): number {
  const part = step % precision;
  return part === 0 ? 1 : precision / gcd(part, precision);
}

export function readingText(steps: number, precision: number): string {
  return formatMeasure(new Fraction(steps, precision), { denominator: precision }).text;
}

type Props = {
  windowStart: number;
  precision: number;
  marker: number;
  /** A practice target shown on request, in steps. */
  ghost?: number | null;
  titleId: string;
  descId: string;
  title: string;
  description: string;
  /** The graduation under the finger or pointer, in steps. */
  onPick: (steps: number) => void;
};

/**
 * A magnified stretch of tape blade: graduations down to 1/precision hanging from the top
 * edge, inch numbers, the 16" and 19.2" layout marks where they fall, and a marker the
 * reader moves. The whole drawing is the hit area, so a finger lands on the nearest
 * graduation even when the lines are a few pixels apart on a phone.
 */
export function TapeDrawing({ windowStart, precision, marker, ghost = null, titleId, descId, title, description, onPick }: Props) {
  const first = windowStart * precision;
  const last = (windowStart + TAPE_WINDOW_INCHES) * precision;
  const x = (steps: number) => PAD + ((steps - first) / precision) * PER_INCH;
  const stepWidth = PER_INCH / precision;
  const steps = Array.from({ length: last - first + 1 }, (_, i) => first + i);

  const pick = (event: PointerEvent<SVGSVGElement>) => {
    const box = event.currentTarget.getBoundingClientRect();
    if (box.width === 0) return;
    const viewX = ((event.clientX - box.left) / box.width) * WIDTH;
    // Snapping a pointer to the nearest graduation is screen geometry, not layout math.
    const snapped = Math.round(first + ((viewX - PAD) / PER_INCH) * precision);
    onPick(Math.min(last, Math.max(first, snapped)));
  };

  const joistMarks: number[] = [];
  for (let k = Math.ceil(windowStart / JOIST_SPACING.valueOf()); JOIST_SPACING.mul(k).compare(windowStart + TAPE_WINDOW_INCHES) <= 0; k++) {
    if (k > 0) joistMarks.push(JOIST_SPACING.mul(k).valueOf());
  }

  return (
    <svg
      viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
      role="img"
      aria-labelledby={`${titleId} ${descId}`}
      className="block w-full cursor-pointer touch-pan-y select-none"
      onPointerDown={(event) => {
        event.currentTarget.setPointerCapture(event.pointerId);
        pick(event);
      }}
      onPointerMove={(event) => {
        if (event.buttons !== 0 && event.currentTarget.hasPointerCapture(event.pointerId)) pick(event);
      }}
    >
      <title id={titleId}>{title}</title>
      <desc id={descId}>{description}</desc>
      <rect x={PAD - 14} y={TOP} width={WIDTH - 2 * PAD + 28} height={BLADE} rx={3} className="fill-paper-raised stroke-rule-strong" strokeWidth={1.2} />
      {steps.map((s) => {
        const graduation = graduationOf(s, precision);
        return <line key={s} x1={x(s)} x2={x(s)} y1={TOP} y2={TOP + TICK_LENGTH[graduation]} className="stroke-ink" strokeWidth={graduation <= 2 ? 2 : graduation <= 8 ? 1.4 : 1} />;
      })}
      {steps
        .filter((s) => s % precision === 0)
        .map((s) => {
          const inch = s / precision;
          const stud = inch > 0 && inch % STUD_SPACING === 0;
          return (
            <g key={`n${s}`} aria-hidden="true">
              {stud ? <rect x={x(s) - 21} y={TOP + 58} width={42} height={26} rx={2} className="fill-chalk" /> : null}
              <text x={x(s)} y={TOP + 79} textAnchor="middle" fontSize={22} className={`font-mono font-bold ${stud ? "fill-white" : "fill-ink"}`}>
                {inch}
              </text>
            </g>
          );
        })}
      {joistMarks.map((inchesAt) => {
        const cx = x(inchesAt * precision);
        const cy = TOP + BLADE - 8;
        return <path key={`j${inchesAt}`} d={`M ${cx} ${cy - 6} L ${cx + 5} ${cy} L ${cx} ${cy + 6} L ${cx - 5} ${cy} Z`} className="fill-ink" aria-hidden="true" />;
      })}
      {ghost !== null && ghost >= first && ghost <= last ? (
        <g aria-hidden="true">
          <line x1={x(ghost)} x2={x(ghost)} y1={TOP - 10} y2={TOP + BLADE + 10} className="stroke-ok" strokeWidth={3} strokeDasharray="6 4" />
          <text x={x(ghost)} y={TOP - 13} textAnchor="middle" fontSize={13} className="fill-ok font-mono font-bold">
            {readingText(ghost, precision)}
          </text>
        </g>
      ) : null}
      <g aria-hidden="true">
        {/* Broken where the inch numbers sit, so a marker on an inch line leaves its number readable. */}
        <line x1={x(marker)} x2={x(marker)} y1={TOP - 4} y2={TOP + TICK_LENGTH[1] + 2} className="stroke-chalk" strokeWidth={3} />
        <line x1={x(marker)} x2={x(marker)} y1={TOP + BLADE - 4} y2={TOP + BLADE + 22} className="stroke-chalk" strokeWidth={3} />
        <path d={`M ${x(marker) - 9} ${TOP - 14} L ${x(marker) + 9} ${TOP - 14} L ${x(marker)} ${TOP - 2} Z`} className="fill-chalk" />
        <circle cx={x(marker)} cy={TOP + BLADE + 34} r={13} className="fill-chalk" />
        <text
          x={x(marker) + (x(marker) > WIDTH - 140 ? -20 : 20)}
          y={TOP + BLADE + 40}
          textAnchor={x(marker) > WIDTH - 140 ? "end" : "start"}
          fontSize={17}
          className="fill-chalk-dark font-mono font-bold"
        >
          {readingText(marker, precision)}
        </text>
      </g>
      {steps.map((s) => (
        <rect
          key={`hit${s}`}
          data-graduation={readingText(s, precision).replace('"', "")}
          x={x(s) - stepWidth / 2}
          y={0}
          width={stepWidth}
          height={HEIGHT}
          fill="transparent"
        />
      ))}
    </svg>
  );
}
