import type { WallGridResult } from "@/lib/layout/wall-grid";
import { HDimension, MarkNumber, VDimension } from "./dimension";
import { lengthText, type Display } from "./readouts";
import { NarrowOrWide } from "./narrow-or-wide";

const WIDE = 640;
/** A phone draws on a narrower canvas, so the same label sizes read larger. */
const NARROW = 380;
const LEFT = 40;
const RIGHT = 40;
const TOP = 30;
const BELOW = 58;
/** Tall narrow walls would make the drawing taller than a screen; past this the wall is drawn narrower (as a share of the canvas width). */
const MAX_WALL_HEIGHT = 0.62;

function list(numbers: number[]): string {
  if (numbers.length <= 1) return numbers.join("");
  return `${numbers.slice(0, -1).join(", ")} and ${numbers[numbers.length - 1]}`;
}

/** The screen reader's version of the drawing: what is where, and which verticals miss the studs. */
export function wallGridDescription(result: WallGridResult, display: Display): string {
  const t = (v: Parameters<typeof lengthText>[0]) => lengthText(v, display);
  const { top, bottom } = result.rails;
  const base = bottom.bottom.n === 0n ? "no base trim" : `${t(bottom.bottom)} of existing base trim`;
  const parts = [
    `Elevation of a wall ${t(result.wallWidth)} wide and ${t(result.wallHeight)} high: ${base}, a ${t(bottom.width)} bottom rail and a ${t(top.width)} top rail across the full width.`,
    result.verticals.length === 0
      ? `The ${result.verticalLayout.count} verticals do not fit across the wall.`
      : `${result.verticals.length} verticals ${t(result.verticalLayout.memberWidth)} wide, numbered from the left, each cut ${t(result.verticalLength.exact)} long, leave ${result.bays.length} bays of ${t(result.bay.exact)}; the second vertical's left edge is ${result.verticals[1] ? t(result.verticals[1].startMark.exact) : "—"} from the left end.`,
  ];
  if (result.rows.length > 0) {
    const rows = result.rows.map((row) => `${t(row.bottomMark.exact)} to ${t(row.topMark.exact)}`).join("; ");
    parts.push(`${result.rows.length} row${result.rows.length > 1 ? "s" : ""} of rails cross every bay, from the floor at ${rows}, leaving panels ${t(result.panelHeight.exact)} high.`);
  }
  if (result.studs.length > 0) {
    const on = result.verticals.filter((v) => v.landsOnStud).map((v) => v.index);
    const off = result.verticals.filter((v) => !v.landsOnStud).map((v) => v.index);
    parts.push(`${result.studs.length} studs are drawn dashed behind the wall.`);
    if (on.length > 0) parts.push(`Vertical${on.length > 1 ? "s" : ""} ${list(on)} land${on.length > 1 ? "" : "s"} on a stud.`);
    if (off.length > 0) parts.push(`Vertical${off.length > 1 ? "s" : ""} ${list(off)} miss${off.length > 1 ? "" : "es"} every stud and ${off.length > 1 ? "are" : "is"} hatched.`);
  }
  return parts.join(" ");
}

/**
 * The wall in elevation, floor at the bottom: base trim, rails, numbered verticals and rows,
 * the studs dashed behind, and dimension strings for the wall, one bay and the vertical.
 */
export function WallGridDrawing({ result, display, idPrefix = "wall-grid" }: { result: WallGridResult; display: Display; idPrefix?: string }) {
  const description = wallGridDescription(result, display);
  return (
    <NarrowOrWide
      onPaper
      wide={<WallGridCanvas result={result} display={display} description={description} idPrefix={idPrefix} width={WIDE} />}
      narrow={<WallGridCanvas result={result} display={display} description={description} idPrefix={`${idPrefix}-narrow`} width={NARROW} />}
    />
  );
}

type CanvasProps = { result: WallGridResult; display: Display; description: string; idPrefix: string; width: number };

function WallGridCanvas({ result, display, description, idPrefix, width: WIDTH }: CanvasProps) {
  const wallWidth = result.wallWidth.valueOf();
  const wallHeight = result.wallHeight.valueOf();
  const scale = Math.min((WIDTH - LEFT - RIGHT) / wallWidth, (MAX_WALL_HEIGHT * WIDTH) / wallHeight);
  const x = (inches: number) => LEFT + inches * scale;
  const y = (fromFloor: number) => TOP + (wallHeight - fromFloor) * scale;
  const floor = y(0);
  const right = x(wallWidth);
  const height = floor + BELOW;
  const { top, bottom } = result.rails;
  const railsBottom = bottom.top.valueOf();
  const railsTop = top.bottom.valueOf();
  const withStuds = result.studs.length > 0;
  // Numbers as large as the spacing allows without touching; none when they would be unreadable.
  const markRadius = Math.min(6, (result.verticalLayout.onCenter.valueOf() * scale) / 2 - 0.5);
  const numbered = markRadius >= 3.2;
  const firstBay = result.bays[0];
  const lowestPanelTop = result.rows[0]?.bottom.valueOf() ?? railsTop;
  const t = (v: Parameters<typeof lengthText>[0]) => lengthText(v, display);
  const member = "fill-paper-raised stroke-ink";

  return (
    <figure className="card overflow-hidden p-2 print:break-inside-avoid">
      <svg viewBox={`0 0 ${WIDTH} ${height}`} role="img" aria-labelledby={`${idPrefix}-title ${idPrefix}-desc`} className="mx-auto w-full max-h-[36rem] print:max-h-[2.9in]">
        <title id={`${idPrefix}-title`}>Wall elevation</title>
        <desc id={`${idPrefix}-desc`}>{description}</desc>
        <defs>
          <pattern id={`${idPrefix}-miss`} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <rect width="6" height="6" className="fill-danger-bg" />
            <line x1="0" y1="0" x2="0" y2="6" strokeWidth="2.4" className="stroke-danger" />
          </pattern>
          <pattern id={`${idPrefix}-trim`} width="5" height="5" patternUnits="userSpaceOnUse" patternTransform="rotate(-45)">
            <rect width="5" height="5" className="fill-paper-sunk" />
            <line x1="0" y1="0" x2="0" y2="5" strokeWidth="0.8" className="stroke-rule-strong" />
          </pattern>
        </defs>

        <rect x={x(0)} y={y(wallHeight)} width={wallWidth * scale} height={wallHeight * scale} className="fill-chalk-light stroke-rule-strong" strokeWidth={0.8} />
        {result.studs.map((stud) => (
          <rect
            key={stud.index}
            x={x(stud.left.valueOf())}
            y={y(wallHeight)}
            width={(stud.right.valueOf() - stud.left.valueOf()) * scale}
            height={wallHeight * scale}
            fill="none"
            strokeDasharray="5 3"
            strokeWidth={0.9}
            className="stroke-ink-faint"
            data-stud={stud.index}
          />
        ))}

        {bottom.bottom.valueOf() > 0 ? (
          <rect x={x(0)} y={y(bottom.bottom.valueOf())} width={wallWidth * scale} height={bottom.bottom.valueOf() * scale} fill={`url(#${idPrefix}-trim)`} className="stroke-ink-soft" strokeWidth={0.6} />
        ) : null}
        {bottom.width.n > 0n ? (
          <rect x={x(0)} y={y(railsBottom)} width={wallWidth * scale} height={bottom.width.valueOf() * scale} className={member} strokeWidth={0.8} fillOpacity={0.85} />
        ) : null}
        {top.width.n > 0n ? <rect x={x(0)} y={y(wallHeight)} width={wallWidth * scale} height={top.width.valueOf() * scale} className={member} strokeWidth={0.8} fillOpacity={0.85} /> : null}
        {[...bottom.joints, ...top.joints].map((joint, i) => {
          const rail = i < bottom.joints.length ? bottom : top;
          return <line key={i} x1={x(joint.exact.valueOf())} x2={x(joint.exact.valueOf())} y1={y(rail.top.valueOf())} y2={y(rail.bottom.valueOf())} strokeWidth={1.6} className="stroke-ink" />;
        })}

        {result.rows.map((row) =>
          result.bays.map((bay) => (
            <rect
              key={`${row.index}-${bay.index}`}
              x={x(bay.start.valueOf())}
              y={y(row.top.valueOf())}
              width={(bay.end.valueOf() - bay.start.valueOf()) * scale}
              height={(row.top.valueOf() - row.bottom.valueOf()) * scale}
              className={member}
              strokeWidth={0.6}
              fillOpacity={0.85}
            />
          )),
        )}

        {result.verticals.map((v) => (
          <rect
            key={v.index}
            x={x(v.start.valueOf())}
            y={y(railsTop)}
            width={Math.max(0.8, (v.end.valueOf() - v.start.valueOf()) * scale)}
            height={(railsTop - railsBottom) * scale}
            fill={withStuds && !v.landsOnStud ? `url(#${idPrefix}-miss)` : undefined}
            fillOpacity={withStuds && !v.landsOnStud ? 1 : 0.85}
            className={withStuds && !v.landsOnStud ? "stroke-danger" : member}
            strokeWidth={0.8}
            data-vertical={v.index}
            data-misses-studs={withStuds && !v.landsOnStud ? "true" : undefined}
          />
        ))}
        {numbered ? result.verticals.map((v) => <MarkNumber key={v.index} x={x(v.center.valueOf())} y={TOP - 12} n={v.index} r={markRadius} />) : null}
        {withStuds && numbered
          ? result.verticals
              .filter((v) => !v.landsOnStud)
              .map((v) => {
                const cx = x(v.center.valueOf());
                const cy = floor + 4;
                return <path key={v.index} d={`M ${cx} ${cy} l 5 9 h -10 z`} className="fill-danger" aria-hidden="true" />;
              })
          : null}

        <line x1={x(0) - 6} x2={right + 6} y1={floor} y2={floor} strokeWidth={2} className="stroke-ink" />
        {firstBay && result.bay.exact.compare(0) > 0 ? (
          <HDimension x1={x(firstBay.start.valueOf())} x2={x(firstBay.end.valueOf())} y={y((railsBottom + lowestPanelTop) / 2)} label={`bay ${t(result.bay.exact)}`} fontSize={9} />
        ) : null}
        <VDimension y1={y(railsTop)} y2={y(railsBottom)} x={right + 22} label={`vertical ${t(result.verticalLength.exact)}`} fontSize={9} />
        <VDimension y1={y(wallHeight)} y2={floor} x={LEFT - 16} label={`height ${t(result.wallHeight)}`} fontSize={9} />
        <HDimension x1={x(0)} x2={right} y={floor + 40} label={`wall ${t(result.wallWidth)}${display.unit === "in" ? ` (${lengthText(result.wallWidth, display, "feet-inches")})` : ""}`} />
      </svg>
      <figcaption className="flex flex-wrap gap-x-4 gap-y-1 px-2 pt-1 text-xs text-ink-soft">
        {withStuds ? (
          <span className="flex items-center gap-1">
            <svg width="14" height="14" aria-hidden="true">
              <rect x="4" y="1" width="6" height="12" fill="none" strokeDasharray="3 2" className="stroke-ink-faint" />
            </svg>
            stud behind the wall (1 1/2″ face)
          </span>
        ) : null}
        {withStuds && result.verticals.some((v) => !v.landsOnStud) ? (
          <span className="flex items-center gap-1">
            <svg width="26" height="14" aria-hidden="true">
              <rect x="1" y="1" width="8" height="12" fill={`url(#${idPrefix}-miss)`} className="stroke-danger" />
              <path d="M 19 2 l 5 9 h -10 z" className="fill-danger" />
            </svg>
            hatched, with a triangle at the floor: misses every stud
          </span>
        ) : null}
        {bottom.bottom.valueOf() > 0 ? (
          <span className="flex items-center gap-1">
            <svg width="14" height="14" aria-hidden="true">
              <rect x="1" y="3" width="12" height="8" fill={`url(#${idPrefix}-trim)`} className="stroke-ink-soft" />
            </svg>
            existing base trim
          </span>
        ) : null}
      </figcaption>
    </figure>
  );
}
