"use client";

// The drawings behind the progress pages. Every series has a token colour and a second cue — a
// hatch pattern or a printed value — so the chart reads without colour too.
import { Bar, BarChart, CartesianGrid, LabelList, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

const INK = "#4a463f";
const RULE = "#d6cfbf";
export const SERIES = [
  { fill: "#1f58a8", pattern: "solid" },
  { fill: "#e0b34a", pattern: "hatch" },
  { fill: "#2f6b35", pattern: "dots" },
] as const;

function Patterns({ id }: { id: string }) {
  return (
    <defs>
      <pattern id={`${id}-hatch`} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <rect width="6" height="6" fill={SERIES[1].fill} />
        <line x1="0" y1="0" x2="0" y2="6" stroke="#1d1b18" strokeWidth="1.5" />
      </pattern>
      <pattern id={`${id}-dots`} width="6" height="6" patternUnits="userSpaceOnUse">
        <rect width="6" height="6" fill={SERIES[2].fill} />
        <circle cx="3" cy="3" r="1.3" fill="#fffdf7" />
      </pattern>
    </defs>
  );
}

const fillOf = (id: string, i: number) => (i === 0 ? SERIES[0].fill : `url(#${id}-${SERIES[i].pattern})`);
const tick = { fill: INK, fontSize: 12 };

type Row = Record<string, string | number>;

/** Vertical bars of one series, each bar labelled with its value. */
export function ColumnChart({ data, x, y, yLabel, height = 220 }: { data: Row[]; x: string; y: string; yLabel: string; height?: number }) {
  return (
    <ResponsiveContainer width="100%" height={height}>
      <BarChart data={data} margin={{ top: 18, right: 8, bottom: 4, left: -16 }} accessibilityLayer={false}>
        <CartesianGrid stroke={RULE} vertical={false} />
        <XAxis dataKey={x} tick={tick} interval="preserveStartEnd" />
        <YAxis allowDecimals={false} tick={tick} />
        <Tooltip cursor={{ fill: "#ece7da" }} />
        <Bar dataKey={y} name={yLabel} fill={SERIES[0].fill} isAnimationActive={false}>
          <LabelList dataKey={y} position="top" fill={INK} fontSize={11} formatter={(v: unknown) => (v ? String(v) : "")} />
        </Bar>
      </BarChart>
    </ResponsiveContainer>
  );
}

/** Horizontal bars, one or more series side by side; category names sit on the left and wrap. */
export function RowChart({ id, data, category, series, max }: { id: string; data: Row[]; category: string; series: { key: string; label: string }[]; max?: number }) {
  const rowHeight = 18 + series.length * 14;
  return (
    <ResponsiveContainer width="100%" height={Math.max(140, data.length * rowHeight + 60)}>
      <BarChart data={data} layout="vertical" margin={{ top: 4, right: 28, bottom: 4, left: 4 }} accessibilityLayer={false}>
        <Patterns id={id} />
        <CartesianGrid stroke={RULE} horizontal={false} />
        <XAxis type="number" allowDecimals={false} tick={tick} domain={[0, max ?? "auto"]} />
        <YAxis type="category" dataKey={category} tick={tick} width={132} interval={0} />
        <Tooltip cursor={{ fill: "#ece7da" }} />
        {series.length > 1 ? <Legend wrapperStyle={{ fontSize: 12 }} formatter={(value: string) => <span style={{ color: INK }}>{value}</span>} /> : null}
        {series.map((s, i) => (
          <Bar key={s.key} dataKey={s.key} name={s.label} fill={fillOf(id, i)} stroke={i === 0 ? undefined : "#1d1b18"} strokeWidth={i === 0 ? 0 : 0.5} isAnimationActive={false}>
            <LabelList dataKey={s.key} position="right" fill={INK} fontSize={11} />
          </Bar>
        ))}
      </BarChart>
    </ResponsiveContainer>
  );
}
