"use client";

import { useId, useState, type KeyboardEvent } from "react";
import { Fraction, roundTo } from "@/lib/layout/core";
import { formatMeasure, parseMeasure } from "@/lib/layout/measure";
import { readingText, TapeDrawing } from "./tape-drawing";
import { followWindow, newPractiseSeed, practiseTarget, TAPE_MAX_INCHES, TAPE_WINDOW_INCHES } from "./tape-practice";

export type TapePrecision = 8 | 16 | 32;

export type TapeReadingProps = {
  /** Where the marker starts, in tape notation (`22 3/4`); rounded to the precision. */
  start?: string;
  /** The finest graduation drawn and the marker's step: 8, 16 (default) or 32. */
  precision?: TapePrecision;
  /** Embedded alone in a lesson: its own card, without the layout-marks note. */
  compact?: boolean;
  /** Offer the "find this length" practice (default true). */
  practise?: boolean;
  /** Start practising with this seed's target (a shared link's). */
  seed?: string;
  label?: string;
  /** Told every move, so a page can keep the reading and the practice seed in its address. */
  onChange?: (state: { reading: string; seed: string }) => void;
};

type Verdict = { right: boolean; steps: number } | null;
type State = { steps: number; windowStart: number; seed: string; verdict: Verdict; shown: boolean };

const NAMES: Record<TapePrecision, string> = { 8: "eighth", 16: "sixteenth", 32: "thirty-second" };

function startState(start: string, seed: string, precision: TapePrecision): State {
  const parsed = parseMeasure(start, "in");
  const maxSteps = TAPE_MAX_INCHES * precision;
  const wanted = parsed.ok ? roundTo(parsed.value, precision).rounded.mul(precision) : new Fraction(0);
  let steps = Math.min(maxSteps, Math.max(0, wanted.valueOf()));
  let windowStart = followWindow(Math.max(0, Math.floor(steps / precision) - 1), steps, precision);
  if (seed) {
    // A practice link opens on the target's stretch of tape; a marker elsewhere starts at its left end.
    windowStart = practiseTarget(seed, precision).windowStart;
    if (steps < windowStart * precision || steps > (windowStart + TAPE_WINDOW_INCHES) * precision) steps = windowStart * precision;
  }
  return { steps, windowStart, seed, verdict: null, shown: false };
}

/** `22 3/4"` as a screen reader says it: "22 3/4 inches". */
function spokenReading(steps: number, precision: number): string {
  return steps === precision ? "1 inch" : `${readingText(steps, precision).replace('"', "")} inches`;
}

/** "22 and 12/16 — 12/16 reduces to 3/4": how the graduations were counted. */
function countedReading(steps: number, precision: number): string {
  const whole = Math.floor(steps / precision);
  const part = steps % precision;
  if (part === 0) return `right on the ${whole}" line`;
  const reduced = formatMeasure(new Fraction(part, precision), { denominator: precision }).text.replace('"', "");
  const counted = `${part}/${precision}`;
  const lead = whole === 0 ? `${counted} past 0` : `${whole} and ${counted}`;
  return reduced === counted ? lead : `${lead} — ${counted} reduces to ${reduced}`;
}

/**
 * A drawn tape measure the reader sets by tapping a graduation, dragging, the step buttons,
 * or the keyboard (arrows one graduation, Shift+arrows or Page Up/Down one inch), read back
 * reduced. The practice names a length and checks where the marker was put.
 */
export function TapeReading({ start = "22", precision = 16, compact = false, practise = true, seed = "", label = "Tape reading", onChange }: TapeReadingProps) {
  const id = useId();
  const [state, setState] = useState<State>(() => startState(start, seed, precision));
  const target = state.seed ? practiseTarget(state.seed, precision) : null;
  const reading = readingText(state.steps, precision);

  const report = (next: State) => {
    setState(next);
    onChange?.({ reading: readingText(next.steps, precision).replace('"', ""), seed: next.seed });
  };
  const moveTo = (steps: number) => {
    const clamped = Math.min(TAPE_MAX_INCHES * precision, Math.max(0, steps));
    report({ ...state, steps: clamped, windowStart: followWindow(state.windowStart, clamped, precision), verdict: null });
  };
  const newTarget = () => {
    const nextSeed = newPractiseSeed();
    const next = practiseTarget(nextSeed, precision);
    report({ steps: next.windowStart * precision, windowStart: next.windowStart, seed: nextSeed, verdict: null, shown: false });
  };

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const inch = event.shiftKey ? precision : 1;
    const moves: Record<string, number> = { ArrowRight: inch, ArrowUp: inch, ArrowLeft: -inch, ArrowDown: -inch, PageUp: precision, PageDown: -precision };
    const by = moves[event.key];
    if (by === undefined) return;
    event.preventDefault();
    moveTo(state.steps + by);
  };

  const step = NAMES[precision];
  const description =
    `A tape measure from ${state.windowStart}" to ${state.windowStart + TAPE_WINDOW_INCHES}", graduated to 1/${precision}", with longer lines at the halves, quarters and eighths. ` +
    `The marker is on ${reading}.` +
    (target && state.shown ? ` The length to find, ${readingText(target.steps, precision)}, is shown with a dashed line.` : "");

  return (
    <div className={compact ? "card my-6 space-y-3 p-4" : "space-y-3"} data-tape-reading>
      <p id={`${id}-label`} className="text-sm font-semibold">
        {label}
      </p>
      <div
        role="slider"
        tabIndex={0}
        aria-labelledby={`${id}-label`}
        aria-describedby={`${id}-desc`}
        aria-orientation="horizontal"
        aria-valuemin={0}
        aria-valuemax={TAPE_MAX_INCHES}
        aria-valuenow={state.steps / precision}
        aria-valuetext={spokenReading(state.steps, precision)}
        onKeyDown={onKeyDown}
        className="rounded"
      >
        <TapeDrawing
          windowStart={state.windowStart}
          precision={precision}
          marker={state.steps}
          ghost={target && state.shown ? target.steps : null}
          titleId={`${id}-title`}
          descId={`${id}-desc`}
          title="Tape measure"
          description={description}
          onPick={moveTo}
        />
      </div>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p aria-live="off">
          <span className="text-sm text-ink-soft">The marker reads </span>
          <span className="measure text-2xl font-bold" data-tape-readout>
            {reading}
          </span>
          <span className="block text-xs text-ink-soft">{countedReading(state.steps, precision)}</span>
        </p>
        <div data-chrome className="flex gap-1" role="group" aria-label="Move the marker">
          <button type="button" className="btn-quiet min-w-touch px-2" aria-label="Back one inch" onClick={() => moveTo(state.steps - precision)}>
            −1″
          </button>
          <button type="button" className="btn-quiet min-w-touch px-2" aria-label={`Back one ${step}`} onClick={() => moveTo(state.steps - 1)}>
            −1/{precision}
          </button>
          <button type="button" className="btn-quiet min-w-touch px-2" aria-label={`On one ${step}`} onClick={() => moveTo(state.steps + 1)}>
            +1/{precision}
          </button>
          <button type="button" className="btn-quiet min-w-touch px-2" aria-label="On one inch" onClick={() => moveTo(state.steps + precision)}>
            +1″
          </button>
        </div>
      </div>
      <p data-chrome className="text-xs text-ink-soft">
        Tap a graduation or drag the marker; with the tape focused, the arrow keys move one {step} and Shift+arrow one inch.
      </p>
      {practise ? (
        <div data-chrome className="space-y-2 rounded border border-rule bg-paper-sunk p-3">
          {target ? (
            <>
              <p className="text-lg">
                Find <strong className="measure" data-tape-target>{readingText(target.steps, precision)}</strong>
              </p>
              <div className="flex flex-wrap gap-2">
                <button type="button" className="btn-primary" onClick={() => setState({ ...state, verdict: { right: state.steps === target.steps, steps: state.steps } })}>
                  Check my mark
                </button>
                <button type="button" className="btn-quiet" onClick={() => setState({ ...state, shown: true })}>
                  Show me
                </button>
                <button type="button" className="btn-quiet" onClick={newTarget}>
                  Another length
                </button>
                <button type="button" className="btn-quiet" onClick={() => report({ ...state, seed: "", verdict: null, shown: false })}>
                  Stop practising
                </button>
              </div>
              <p role="status" className="min-h-6 text-sm">
                {state.verdict ? <VerdictText verdict={state.verdict} target={target.steps} precision={precision} /> : null}
              </p>
            </>
          ) : (
            <>
              <p className="text-sm">Practise: the bench names a length and you put the marker on it.</p>
              <button type="button" className="btn-quiet" onClick={newTarget}>
                Give me a length to find
              </button>
            </>
          )}
        </div>
      ) : null}
      {compact ? null : (
        <p className="text-xs text-ink-soft print:hidden">
          Tapes print layout marks too: every 16″ is highlighted (boxed here) for studs at 16″ on centre, and a small diamond every 19.2″ marks
          five joists or trusses across an 8′ sheet (96 ÷ 5 = 19.2). 19.2″ is not on a sixteenth: it falls just past 19 3/16″. Move to 16″, 19″ or
          32″ to see them.
        </p>
      )}
    </div>
  );
}

function VerdictText({ verdict, target, precision }: { verdict: NonNullable<Verdict>; target: number; precision: number }) {
  const at = readingText(verdict.steps, precision);
  if (verdict.right) return <span className="font-semibold text-ok">Right — the marker is on {at}.</span>;
  const off = readingText(Math.abs(target - verdict.steps), precision);
  const way = verdict.steps < target ? "short of" : "past";
  return (
    <span className="font-semibold text-danger">
      Not yet — the marker is on {at}, {off} {way} {readingText(target, precision)}. Move it and check again.
    </span>
  );
}
