// A worked example whose every number comes from the layout engine: the lesson names the
// inputs, the engine works them, and the steps print its results. Nothing is typed twice.
import type { ReactNode } from "react";
import { roundTo, Fraction } from "@/lib/layout/core";
import { cutList } from "@/lib/layout/cut-list";
import { cutListSchema } from "@/lib/layout/cut-list-schema";
import { guardSpacing } from "@/lib/layout/guards";
import { guardSpacingSchema } from "@/lib/layout/guards-schema";
import { parseMeasure } from "@/lib/layout/measure";
import { evenSpacing, type EvenSpacingResult } from "@/lib/layout/spacing";
import { evenSpacingSchema } from "@/lib/layout/spacing-schema";
import { stairLayout } from "@/lib/layout/stairs";
import { stairLayoutSchema } from "@/lib/layout/stairs-schema";
import { wallGrid } from "@/lib/layout/wall-grid";
import { wallGridSchema } from "@/lib/layout/wall-grid-schema";
import { exactAndError, lengthText } from "@/components/calculators/readouts";

const D = { unit: "in", denominator: 16 } as const;
const t = (v: Fraction) => lengthText(v, D);
const M = ({ children }: { children: ReactNode }) => <span className="measure whitespace-nowrap font-semibold">{children}</span>;

type Props = { kind: string; title?: string } & Record<string, string | number | undefined>;

function spacingSteps(r: EvenSpacingResult, memberWord: string): ReactNode[] {
  const second = r.members[1];
  const { exact, error } = exactAndError(r.gap, D);
  return [
    <>
      Members take up {r.count} × <M>{t(r.memberWidth)}</M> = <M>{t(r.totalMemberWidth)}</M>.
    </>,
    <>
      Free space: <M>{t(r.span)}</M> − <M>{t(r.totalMemberWidth)}</M> = <M>{t(r.freeSpace)}</M>.
    </>,
    <>
      Spaces: {r.endCondition === "members" ? `${r.count} ${memberWord}s with one at each end leave ${r.count} − 1` : `${r.count} ${memberWord}s between posts leave ${r.count} + 1`} ={" "}
      <strong>{r.spaces}</strong> spaces.
    </>,
    <>
      Gap: <M>{t(r.freeSpace)}</M> ÷ {r.spaces} = <M>{exact}</M>, which rounds to <M>{t(r.gap)}</M> ({error}).
    </>,
    <>
      On centre: gap + width = <M>{t(r.onCenter)}</M>.
    </>,
    ...(second
      ? [
          <>
            Mark from the left end, never by adding rounded gaps: {memberWord} 2&rsquo;s left edge is at <M>{t(second.startMark.exact)}</M>, the last {memberWord}&rsquo;s at{" "}
            <M>{t(r.members.at(-1)!.startMark.exact)}</M>.
          </>,
        ]
      : []),
  ];
}

function steps(props: Props): ReactNode[] {
  switch (props.kind) {
    case "even-spacing":
      return spacingSteps(evenSpacing(evenSpacingSchema.parse(props)), "member");
    case "guard-spacing": {
      const r = guardSpacing(guardSpacingSchema.parse(props));
      return [
        <>
          The opening must stay under <M>{t(r.maxOpening)}</M>. The fewest balusters that do it: <strong>{r.count}</strong>.
          {r.oneFewer ? (
            <>
              {" "}
              With {r.oneFewer.count}, each opening would be <M>{t(r.oneFewer.opening)}</M> — too wide.
            </>
          ) : null}
        </>,
        ...spacingSteps(r, "baluster"),
      ];
    }
    case "stairs": {
      const r = stairLayout(stairLayoutSchema.parse(props));
      return [
        <>
          Risers: the fewest whose height stays within the limit for a total rise of <M>{t(r.totalRise)}</M> is <strong>{r.riserCount}</strong>.
        </>,
        <>
          Riser height: <M>{t(r.totalRise)}</M> ÷ {r.riserCount} = <M>{exactAndError(r.riserHeight.exact, D).exact}</M> → <M>{t(r.riserHeight.exact)}</M>.
        </>,
        <>
          Treads: one fewer than the risers = <strong>{r.treadCount}</strong>, each <M>{t(r.treadDepth.exact)}</M> deep.
        </>,
        <>
          Total run: {r.treadCount} × <M>{t(r.treadDepth.exact)}</M> = <M>{t(r.totalRun.exact)}</M>.
        </>,
        <>
          Stringer length, a square root so only approximate: about <M>{t(r.stringerLength.rounded)}</M>.
        </>,
      ];
    }
    case "wall-grid": {
      const input = wallGridSchema.parse(props);
      const r = wallGrid(input);
      return [
        <>
          Vertical length: <M>{t(input.wallHeight)}</M> − <M>{t(input.topRailWidth)}</M> top rail − <M>{t(input.bottomRailWidth)}</M> bottom rail − <M>{t(input.baseTrimHeight ?? new Fraction(0))}</M>{" "}
          base trim = <M>{t(r.verticalLength.exact)}</M>.
        </>,
        ...spacingSteps(r.verticalLayout, "vertical"),
        <>
          Each horizontal rail between verticals is cut to the bay: <M>{t(r.bay.exact)}</M>.
        </>,
      ];
    }
    case "cut-list": {
      const body = { ...props, pieces: JSON.parse(String(props.pieces ?? "[]")), stock: (JSON.parse(String(props.stock ?? "[]")) as string[]).map((length) => ({ length })) };
      const r = cutList(cutListSchema.parse(body));
      return [
        <>
          The pieces add up to <M>{t(r.totalPieceLength)}</M>, before any kerf.
        </>,
        <>
          With the kerf between cuts they need <strong>{r.boardCount}</strong> board{r.boardCount === 1 ? "" : "s"}
          {r.optimal ? " — proven the fewest" : ""}.
        </>,
        ...r.boards.map((b, i) => (
          <>
            Board {i + 1} (<M>{t(b.stockLength)}</M>): {b.cuts.map((c) => t(c.length)).join(", ")}; offcut <M>{t(b.offcut)}</M>.
          </>
        )),
      ];
    }
    case "round": {
      const parsed = parseMeasure(String(props.value ?? ""), "in");
      if (!parsed.ok) throw new Error(`WorkedExample round: ${parsed.error.message}`);
      const d = Number(props.denominator ?? 16);
      const r = roundTo(parsed.value, d);
      const scaled = parsed.value.mul(d);
      return [
        <>
          Multiply by {d}: <M>{parsed.value.toString()}</M> × {d} = <M>{scaled.toString()}</M> {d}ths.
        </>,
        <>
          Round to the nearest whole {d}th (an exact half goes up): <M>{r.rounded.mul(d).toString()}</M>.
        </>,
        <>
          So the mark is <M>{lengthText(parsed.value, { unit: "in", denominator: d })}</M>, {exactAndError(parsed.value, { unit: "in", denominator: d }).error}.
        </>,
      ];
    }
    default:
      throw new Error(`WorkedExample: unknown kind "${props.kind}"`);
  }
}

export function WorkedExample(props: Props) {
  const list = steps(props);
  return (
    <figure className="card my-6 p-4">
      <figcaption className="mb-2 text-sm font-semibold uppercase tracking-wide text-chalk-dark">{props.title ?? "Worked example"}</figcaption>
      <ol className="list-decimal space-y-2 pl-6">
        {list.map((step, i) => (
          <li key={i}>{step}</li>
        ))}
      </ol>
    </figure>
  );
}
