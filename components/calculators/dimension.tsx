// SVG dimension strings as a draughtsman draws them: extension ticks at both ends and the
// measurement written along the line. Coordinates are in the drawing's own units.

type H = { x1: number; x2: number; y: number; label: string; tick?: number; fontSize?: number; labelAt?: "middle" | "start" };

export function HDimension({ x1, x2, y, label, tick = 4, fontSize = 10, labelAt }: H) {
  // A label wider than its dimension starts at the left tick instead of spilling both ways.
  const fits = labelAt ? labelAt === "middle" : label.length * fontSize * 0.62 < Math.abs(x2 - x1);
  return (
    <g className="text-ink" aria-hidden="true">
      <line x1={x1} x2={x2} y1={y} y2={y} stroke="currentColor" strokeWidth={0.6} />
      <line x1={x1} x2={x1} y1={y - tick} y2={y + tick} stroke="currentColor" strokeWidth={0.6} />
      <line x1={x2} x2={x2} y1={y - tick} y2={y + tick} stroke="currentColor" strokeWidth={0.6} />
      <text x={fits ? (x1 + x2) / 2 : Math.min(x1, x2)} y={y - 2} textAnchor={fits ? "middle" : "start"} fontSize={fontSize} className="fill-current font-mono">
        {label}
      </text>
    </g>
  );
}

type V = { y1: number; y2: number; x: number; label: string; tick?: number; fontSize?: number };

export function VDimension({ y1, y2, x, label, tick = 4, fontSize = 10 }: V) {
  const mid = (y1 + y2) / 2;
  return (
    <g className="text-ink" aria-hidden="true">
      <line x1={x} x2={x} y1={y1} y2={y2} stroke="currentColor" strokeWidth={0.6} />
      <line x1={x - tick} x2={x + tick} y1={y1} y2={y1} stroke="currentColor" strokeWidth={0.6} />
      <line x1={x - tick} x2={x + tick} y1={y2} y2={y2} stroke="currentColor" strokeWidth={0.6} />
      <text x={x - 3} y={mid} textAnchor="middle" fontSize={fontSize} transform={`rotate(-90 ${x - 3} ${mid})`} className="fill-current font-mono">
        {label}
      </text>
    </g>
  );
}

/** A numbered mark: a small circle with the member's number, as written on the wall in pencil. */
export function MarkNumber({ x, y, n, r = 6 }: { x: number; y: number; n: number; r?: number }) {
  return (
    <g aria-hidden="true">
      <circle cx={x} cy={y} r={r} className="fill-chalk" />
      <text x={x} y={y + r * 0.45} textAnchor="middle" fontSize={r * 1.25} className="fill-white font-mono font-bold">
        {n}
      </text>
    </g>
  );
}
