"use client";

import { useRef } from "react";
import type { UseFormReturn } from "react-hook-form";
import type { Fraction } from "@/lib/layout/core";
import { BenchField, BenchForm, BenchSection } from "./fraction-bench-field";
import { calculate, millimetresText, plainNumberText, type BenchDisplay, type FractionBenchValues } from "./fraction-bench-results";
import { CountReadout, lengthText, Readout, ReadoutGrid } from "./readouts";

// Phone keyboards have no × or ÷, and the inch mark hides behind a long press.
const KEYS = [
  { show: "+", insert: " + ", name: "plus" },
  { show: "−", insert: " − ", name: "minus" },
  { show: "×", insert: " × ", name: "times" },
  { show: "÷", insert: " ÷ ", name: "divided by" },
  { show: "(", insert: "(", name: "open bracket" },
  { show: ")", insert: ")", name: "close bracket" },
  { show: "/", insert: "/", name: "fraction bar" },
  { show: "′", insert: "'", name: "foot mark" },
  { show: "″", insert: '"', name: "inch mark" },
] as const;

const EXAMPLES = ["(96 - 3 × 1 1/2) ÷ 4", '22 3/4" ÷ 2', '3 × 2 1/2"', '96 ÷ 24"', "8' - 2 × 3/4"];

type Props = { form: UseFormReturn<FractionBenchValues>; values: FractionBenchValues; display: BenchDisplay };

export function CalculateSection({ form, values, display }: Props) {
  const input = useRef<HTMLInputElement | null>(null);
  const result = calculate(values.expr, display.unit);

  const put = (text: string, caret: number) => {
    form.setValue("expr", text, { shouldDirty: true });
    // After React has written the new text into the box.
    requestAnimationFrame(() => {
      input.current?.focus();
      input.current?.setSelectionRange(caret, caret);
    });
  };
  const insert = (piece: string) => {
    const text = form.getValues("expr");
    const from = input.current?.selectionStart ?? text.length;
    const to = input.current?.selectionEnd ?? text.length;
    put(text.slice(0, from) + piece + text.slice(to), from + piece.length);
  };

  return (
    <BenchSection title="Calculate" intro={<p>Add, subtract, multiply and divide lengths exactly; the answer is rounded once, at the end.</p>}>
      <BenchForm label="Calculate inputs">
        <BenchField
          label="Calculation"
          registration={form.register("expr")}
          value={values.expr}
          inputRef={(element) => {
            input.current = element;
          }}
          problem={result.ok ? null : result.problem}
          note={display.unit === "mm" ? "Numbers with no unit are millimetres; write 1 1/2\" for inches." : "Numbers with no unit are inches."}
        />
        <div className="flex flex-wrap gap-1" role="group" aria-label="Insert a sign">
          {KEYS.map((key) => (
            <button key={key.name} type="button" className="btn-quiet measure min-w-touch px-2 text-lg" aria-label={`Insert ${key.name}`} onClick={() => insert(key.insert)}>
              {key.show}
            </button>
          ))}
          <button type="button" className="btn-quiet px-3" onClick={() => put("", 0)}>
            Clear
          </button>
        </div>
        <p className="text-xs text-ink-soft">
          Try:{" "}
          {EXAMPLES.map((example, i) => (
            <span key={example}>
              {i > 0 ? " · " : null}
              <button type="button" className="measure cursor-pointer text-chalk-dark underline decoration-1 underline-offset-2" onClick={() => put(example, example.length)}>
                {example}
              </button>
            </span>
          ))}
        </p>
      </BenchForm>
      {result.ok ? (
        result.kind === "length" ? (
          <ReadoutGrid>
            <Readout label="Answer" value={result.value} display={display} style={display.style} />
            <CountReadout
              label={display.unit === "in" ? "In millimetres" : "In inches"}
              value={display.unit === "in" ? millimetresText(result.value) : lengthText(result.value, { unit: "in", denominator: display.denominator }, display.style)}
              note={display.unit === "in" ? "exact: 1″ = 25.4 mm" : `to the nearest 1/${display.denominator}″`}
            />
          </ReadoutGrid>
        ) : (
          <NumberAnswer value={result.value} />
        )
      ) : (
        <p className="rounded border border-rule bg-paper-sunk p-3 text-sm text-ink-soft">Fix the calculation to see the answer.</p>
      )}
      <details data-chrome open className="text-xs text-ink-soft">
        <summary className="cursor-pointer font-semibold text-ink">How the bench reads a calculation</summary>
        <ul className="mt-1 list-disc space-y-1 pl-5">
          <li>
            Signs: <span className="measure">+ − × ÷</span>; <span className="measure">*</span> or <span className="measure">x</span> also multiply, and a{" "}
            <span className="measure">/</span> with a space beside it divides.
          </li>
          <li>
            A <span className="measure">/</span> touching digits on both sides is a fraction bar: <span className="measure">2 1/2 / 2</span> is 2 1/2 divided by 2.
          </li>
          <li>
            A dash touching both sides joins as on a tape: <span className="measure">22-3/4</span> is 22 3/4 and <span className="measure">1&apos;-10&quot;</span> is
            1′ 10″. With spaces, <span className="measure">22 - 3/4</span> subtracts.
          </li>
          <li>
            A number with no unit fits in: beside + or − it is a length; beside × or dividing a length it is a count, so{" "}
            <span className="measure">3 × 2 1/2&quot;</span> is 7 1/2″.
          </li>
          <li>
            A length ÷ a length is a plain number — how many fit. A length × a length is refused: the bench has no square inches.
          </li>
        </ul>
      </details>
    </BenchSection>
  );
}

function NumberAnswer({ value }: { value: Fraction }) {
  const { fraction, decimal } = plainNumberText(value);
  const whole = value.floor();
  const fits = value.compare(0) > 0 && !whole.equals(value) ? `${whole.toString()} whole ones fit, and ${value.sub(whole).toFraction()} of one more.` : null;
  return (
    <ReadoutGrid>
      <CountReadout label="How many fit" value={fraction} note={<>a plain number (a length ÷ a length){fits ? <> · {fits}</> : null}</>} />
      <CountReadout label="As a decimal" value={decimal} note={decimal.endsWith("…") ? "it repeats; the fraction is exact" : "exact"} />
    </ReadoutGrid>
  );
}
