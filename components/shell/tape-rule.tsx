// A strip of tape-measure graduations (inch, half, quarter, eighth, sixteenth) used as the
// product's signature rule under the header. Decorative: hidden from screen readers.
export function TapeRule({ inches = 24 }: { inches?: number }) {
  const ticks: { x: number; h: number }[] = [];
  for (let i = 0; i <= inches * 16; i++) {
    const h = i % 16 === 0 ? 12 : i % 8 === 0 ? 9 : i % 4 === 0 ? 7 : i % 2 === 0 ? 5 : 3;
    ticks.push({ x: i, h });
  }
  return (
    <svg aria-hidden="true" focusable="false" className="block h-3 w-full text-ink-soft" viewBox={`0 0 ${inches * 16} 12`} preserveAspectRatio="xMinYMin slice">
      {ticks.map((t) => (
        <line key={t.x} x1={t.x + 0.5} x2={t.x + 0.5} y1={0} y2={t.h} stroke="currentColor" strokeWidth={t.h === 12 ? 0.6 : 0.35} />
      ))}
    </svg>
  );
}
