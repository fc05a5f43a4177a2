import type { Fraction } from "@/lib/layout/core";
import { formatMeasure } from "@/lib/layout/measure";
import {
  calculate,
  decimalText,
  decimalToFraction,
  lumberResult,
  millimetresText,
  readLength,
  roundingLadder,
  signedInches,
  type BenchDisplay,
  type FractionBenchValues,
} from "./fraction-bench-results";
import { exactAndError, lengthText } from "./readouts";

type Row = { what: string; typed: string; result: string; note: string };

function rowsOf(values: FractionBenchValues, display: BenchDisplay): Row[] {
  const d = display.denominator;
  const inches = (value: Fraction, denominator = d) => formatMeasure(value, { denominator }).text;
  const rows: Row[] = [];

  const calc = calculate(values.expr, display.unit);
  if (!calc.ok) rows.push({ what: "Calculate", typed: values.expr, result: "—", note: calc.problem.message });
  else if (calc.kind === "number") rows.push({ what: "Calculate", typed: values.expr, result: calc.value.toFraction(true), note: `plain number, ${decimalText(calc.value)}` });
  else {
    const { exact, error } = exactAndError(calc.value, display);
    rows.push({ what: "Calculate", typed: values.expr, result: lengthText(calc.value, display, display.style), note: `exact ${exact} · ${error}` });
  }

  const fromDecimal = decimalToFraction(values.decimal, d);
  rows.push(
    fromDecimal.ok
      ? { what: "Decimal to a fraction", typed: values.decimal, result: fromDecimal.text, note: `to 1/${d}″, error ${signedInches(fromDecimal.error)}` }
      : { what: "Decimal to a fraction", typed: values.decimal, result: "—", note: fromDecimal.problem.message },
  );

  const fraction = readLength(values.fraction, "in");
  rows.push(
    fraction.ok
      ? { what: "Fraction to a decimal", typed: values.fraction, result: `${decimalText(fraction.value)}″`, note: "" }
      : { what: "Fraction to a decimal", typed: values.fraction, result: "—", note: fraction.problem.message },
  );

  const metric = readLength(values.metric, display.unit);
  rows.push(
    metric.ok
      ? { what: "Inches and millimetres", typed: values.metric, result: `${millimetresText(metric.value)} = ${inches(metric.value)}`, note: "1″ = 25.4 mm" }
      : { what: "Inches and millimetres", typed: values.metric, result: "—", note: metric.problem.message },
  );

  const ladder = roundingLadder(values.round);
  rows.push(
    ladder.ok
      ? {
          what: "Round",
          typed: values.round,
          result: ladder.rows.map((r) => `1/${r.denominator}: ${inches(r.rounded, r.denominator)}`).join(" · "),
          note: `exact ${decimalText(ladder.value)}″; an exact half rounds away from zero`,
        }
      : { what: "Round", typed: values.round, result: "—", note: ladder.problem.message },
  );

  const tape = readLength(values.tape, "in");
  if (tape.ok) rows.push({ what: "Tape reading", typed: "", result: inches(tape.value, 32), note: "" });

  const lumber = lumberResult(values.nominal, values.boardLength, display.unit);
  if (lumber.ok) {
    const size = (v: Fraction) => lengthText(v, { unit: display.unit, denominator: 16 });
    rows.push({
      what: "Lumber",
      typed: `${values.nominal}, ${values.boardLength}`,
      result: `${size(lumber.lumber.actual.thickness)} × ${size(lumber.lumber.actual.width)}; ${lumber.boardFeet.toFraction(true)} bf`,
      note: "PS 20 dry size; board feet on the nominal size",
    });
  }
  return rows;
}

/** The printed shop sheet: every calculation on the bench, one line each. */
export function BenchSheet({ values, display }: { values: FractionBenchValues; display: BenchDisplay }) {
  return (
    <div className="hidden print:block">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="pb-1 text-left font-semibold">Calculations on the bench</caption>
        <thead>
          <tr className="border-b border-ink">
            <th scope="col" className="py-1 pr-3">What</th>
            <th scope="col" className="py-1 pr-3">Typed</th>
            <th scope="col" className="py-1 pr-3">Result</th>
            <th scope="col" className="py-1">Note</th>
          </tr>
        </thead>
        <tbody className="measure">
          {rowsOf(values, display).map((row) => (
            <tr key={row.what} className="border-b border-rule align-top">
              <th scope="row" className="py-1 pr-3 font-sans">{row.what}</th>
              <td className="py-1 pr-3">{row.typed}</td>
              <td className="py-1 pr-3 font-bold">{row.result}</td>
              <td className="py-1 text-xs">{row.note}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
