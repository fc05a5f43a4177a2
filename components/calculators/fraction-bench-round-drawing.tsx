import { Fraction } from "@/lib/layout/core";
import { formatMeasure } from "@/lib/layout/measure";
import { HDimension } from "./dimension";
import { decimalText, signedInches, type RoundingRow } from "./fraction-bench-results";

const WIDTH = 480;
const LEFT = 86; // room for the row names
const RIGHT = 36;
const RULE_TOP = 44;
const ROW_Y = [152, 196, 240];
const HEIGHT = 274;
const TICK: Record<number, number> = { 8: 46, 16: 32, 32: 20 };

const inchesText = (value: Fraction, denominator: number) => formatMeasure(value, { denominator }).text;

/** The eighth of an inch around the length, or the sixteenth either side when it sits on an eighth. */
function stretchAround(value: Fraction): { from: Fraction; to: Fraction } {
  const eighth = new Fraction(1, 8);
  const below = value.mul(8).floor().div(8);
  if (below.equals(value)) return { from: value.sub(new Fraction(1, 16)), to: value.add(new Fraction(1, 16)) };
  return { from: below, to: below.add(eighth) };
}

/**
 * A magnified eighth of an inch of rule with its 1/8, 1/16 and 1/32 graduations, the exact
 * length pointed at, and for each precision the graduation it rounds to, dimensioned with
 * the error.
 */
export function RoundingDrawing({ value, rows, titleId, descId }: { value: Fraction; rows: RoundingRow[]; titleId: string; descId: string }) {
  const { from, to } = stretchAround(value);
  const span = to.sub(from).valueOf();
  const x = (inches: Fraction) => LEFT + ((inches.valueOf() - from.valueOf()) / span) * (WIDTH - LEFT - RIGHT);
  const graduations = Array.from({ length: 5 }, (_, i) => from.add(new Fraction(i, 32)));
  const denominatorOf = (g: Fraction) => (g.mul(8).d === 1n ? 8 : g.mul(16).d === 1n ? 16 : 32);
  // Labels near either end of the rule grow inwards so they stay on the drawing.
  const anchorAt = (at: number) => (at < LEFT + 60 ? "start" : at > WIDTH - RIGHT - 60 ? "end" : "middle");
  const exactX = x(value);
  const exactLabel = `exact ${decimalText(value)}″`;
  const halfWay = value.s < 0n ? " (half: away from 0)" : " (half: up)";
  const description =
    `A magnified rule from ${inchesText(from, 32)} to ${inchesText(to, 32)} with its eighth, sixteenth and thirty-second graduations. ` +
    `The length, ${decimalText(value)}″, is pointed at. ` +
    rows.map((r) => `At 1/${r.denominator}″ it rounds to ${inchesText(r.rounded, r.denominator)}, error ${signedInches(r.error)}`).join("; ") +
    ".";

  return (
    <figure className="card overflow-hidden p-2">
      <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} role="img" aria-labelledby={`${titleId} ${descId}`} className="mx-auto block w-full max-w-xl">
        <title id={titleId}>Rounding drawing</title>
        <desc id={descId}>{description}</desc>
        <rect x={LEFT - 16} y={RULE_TOP} width={WIDTH - LEFT - RIGHT + 32} height={64} rx={3} className="fill-paper-raised stroke-rule-strong" strokeWidth={1.2} />
        {graduations.map((g) => {
          const d = denominatorOf(g);
          return (
            <g key={g.toFraction()} aria-hidden="true">
              <line x1={x(g)} x2={x(g)} y1={RULE_TOP} y2={RULE_TOP + TICK[d]} className="stroke-ink" strokeWidth={d === 8 ? 2.4 : d === 16 ? 1.6 : 1.1} />
              <text x={x(g)} y={RULE_TOP + 60} textAnchor="middle" fontSize={12.5} className="fill-ink font-mono">
                {inchesText(g, 32).replace('"', "")}
              </text>
            </g>
          );
        })}
        <g aria-hidden="true">
          <path d={`M ${exactX - 8} ${RULE_TOP - 14} L ${exactX + 8} ${RULE_TOP - 14} L ${exactX} ${RULE_TOP - 1} Z`} className="fill-chalk" />
          <text x={exactX} y={RULE_TOP - 20} textAnchor={anchorAt(exactX)} fontSize={14} className="fill-chalk-dark font-mono font-bold">
            {exactLabel}
          </text>
          <line x1={exactX} x2={exactX} y1={RULE_TOP} y2={ROW_Y[2] + 6} className="stroke-chalk" strokeWidth={1} strokeDasharray="3 3" />
        </g>
        {rows.map((row, i) => {
          const y = ROW_Y[i];
          const landing = x(row.rounded);
          return (
            <g key={row.denominator}>
              <text x={4} y={y + 5} fontSize={13.5} className="fill-ink font-mono font-bold" aria-hidden="true">
                to 1/{row.denominator}″
              </text>
              <line x1={landing} x2={landing} y1={RULE_TOP + TICK[row.denominator]} y2={y} className="stroke-rule-strong" strokeWidth={0.8} strokeDasharray="2 3" aria-hidden="true" />
              {row.error.n === 0n ? null : (
                <ErrorDimension from={exactX} to={landing} y={y} label={signedInches(row.error).replace(/ \(.*\)$/, "")} />
              )}
              <circle cx={landing} cy={y} r={5} className="fill-ink" aria-hidden="true" />
              <text x={landing} y={y + 20} textAnchor={anchorAt(landing)} fontSize={13} className="fill-ink font-mono" aria-hidden="true">
                {inchesText(row.rounded, row.denominator)}
                {row.tie ? halfWay : ""}
              </text>
            </g>
          );
        })}
      </svg>
    </figure>
  );
}

/** The error as a dimension; one too short to hold its label has the label outside, past the graduation. */
function ErrorDimension({ from, to, y, label }: { from: number; to: number; y: number; label: string }) {
  const roomy = Math.abs(to - from) > label.length * 7.5 + 8;
  if (roomy) return <HDimension x1={from} x2={to} y={y} label={label} fontSize={12} labelAt="middle" />;
  const outward = to >= from ? 1 : -1;
  return (
    <>
      <HDimension x1={from} x2={to} y={y} label="" fontSize={10} />
      <text x={to + outward * 10} y={y - 4} textAnchor={outward > 0 ? "start" : "end"} fontSize={12} className="fill-ink font-mono" aria-hidden="true">
        {label}
      </text>
    </>
  );
}
