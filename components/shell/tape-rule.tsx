// A strip of tape-measure graduations (inch, half, quarter, eighth, sixteenth) under the header:
// the product's signature. A repeating pattern keeps the ticks the same size at any width.
// Decorative, so hidden from screen readers. Whole-number coordinates and widths, drawn crisp:
// the page chrome carries no decimal that could be mistaken for an answer (the leak search reads
// every page for decimals like 20.5).
const STEP = 5; // px per sixteenth
const heights = Array.from({ length: 16 }, (_, i) => (i === 0 ? 14 : i % 8 === 0 ? 10 : i % 4 === 0 ? 7 : i % 2 === 0 ? 5 : 3));

export function TapeRule() {
  return (
    <svg aria-hidden="true" focusable="false" className="block h-3.5 w-full text-ink-soft" height="14" shapeRendering="crispEdges">
      <defs>
        <pattern id="tape-inch" width={STEP * 16} height="14" patternUnits="userSpaceOnUse">
          {heights.map((h, i) => (
            <line key={i} x1={i * STEP} x2={i * STEP} y1={0} y2={h} stroke="currentColor" strokeWidth={i === 0 ? 2 : 1} />
          ))}
        </pattern>
      </defs>
      <rect width="100%" height="14" fill="url(#tape-inch)" />
    </svg>
  );
}
