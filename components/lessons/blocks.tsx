import Link from "next/link";
import type { ReactNode } from "react";
import { CALCULATORS, calculatorPath, type CalculatorKind } from "@/lib/calculators";
import { headingId } from "@/lib/lessons/text";
import { SKILL_TITLES } from "@/lib/practice/skills";
import { PROBLEM_KINDS, type Skill } from "@/lib/problems";
import { LessonPractice } from "@/components/practice/lesson-practice";

export function Caution({ title = "Caution", children }: { title?: string; children: ReactNode }) {
  return (
    <aside role="note" aria-label={title} className="my-6 rounded border-l-4 border-caution-edge bg-caution-bg p-4 text-ink print:border print:border-black">
      <p className="mb-1 font-bold">⚠ {title}</p>
      <div className="space-y-2 [&>p]:m-0">{children}</div>
    </aside>
  );
}

export function Note({ title = "Note", children }: { title?: string; children: ReactNode }) {
  return (
    <aside role="note" aria-label={title} className="my-6 rounded border-l-4 border-chalk bg-chalk-light/60 p-4">
      <p className="mb-1 font-bold text-chalk-dark">{title}</p>
      <div className="space-y-2 [&>p]:m-0">{children}</div>
    </aside>
  );
}

export function Figure({ caption, children }: { caption: string; children: ReactNode }) {
  return (
    <figure className="card my-6 p-4 [&_svg]:h-auto [&_svg]:w-full">
      {children}
      <figcaption className="mt-2 text-sm text-ink-soft">{caption}</figcaption>
    </figure>
  );
}

// The calculator that checks each skill's working, offered beside the live problem.
const CALCULATOR_FOR_SKILL: Record<string, CalculatorKind> = {
  "tape-reading": "fraction-bench",
  fractions: "fraction-bench",
  lumber: "fraction-bench",
  "even-spacing": "even-spacing",
  marking: "even-spacing",
  "wall-grid": "wall-grid",
  "cut-list": "cut-list",
  guards: "guard-spacing",
  stairs: "stairs",
};

export function Practice({ kind }: { kind: string }) {
  if (kind === "safety") {
    return (
      <aside data-chrome className="my-6 rounded-lg border border-rule bg-paper-sunk p-4">
        <p className="font-semibold">Check your answers</p>
        <p className="text-ink-soft">
          Talk your answers through with your instructor, and compare them with the <Link href="/safety">shop safety notes</Link> and your shop&rsquo;s own rules.
        </p>
      </aside>
    );
  }
  const calculator = CALCULATOR_FOR_SKILL[kind] ?? "even-spacing";
  const title = CALCULATORS.find((c) => c.kind === calculator)?.title ?? "calculator";
  const hasProblems = PROBLEM_KINDS.some((k) => k.skill === kind);
  return (
    <>
      {hasProblems ? <LessonPractice skill={kind} title={SKILL_TITLES[kind as Skill]} /> : null}
      <p data-chrome className="text-sm text-ink-soft">
        Working the questions above on paper? Check each one in the <Link href={calculatorPath(calculator)}>{title.toLowerCase()} calculator</Link>
        {hasProblems ? (
          <>
            , or practise more on the <Link href="/practice">practice page</Link>
          </>
        ) : null}
        .
      </p>
    </>
  );
}

function textOf(node: ReactNode): string {
  if (typeof node === "string" || typeof node === "number") return String(node);
  if (Array.isArray(node)) return node.map(textOf).join("");
  if (node && typeof node === "object" && "props" in node) return textOf((node as { props: { children?: ReactNode } }).props.children);
  return "";
}

export function H2({ children }: { children?: ReactNode }) {
  return (
    <h2 id={headingId(textOf(children))} className="mt-10 scroll-mt-4 text-2xl">
      {children}
    </h2>
  );
}

export function H3({ children }: { children?: ReactNode }) {
  return (
    <h3 id={headingId(textOf(children))} className="mt-8 scroll-mt-4 text-xl">
      {children}
    </h3>
  );
}
