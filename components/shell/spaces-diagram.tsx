// Five battens flush at both ends of a span, with the four spaces numbered: the fencepost rule in one picture.
export function SpacesDiagram() {
  const span = 300;
  const width = 14;
  const count = 5;
  const gap = (span - count * width) / (count - 1);
  const xs = Array.from({ length: count }, (_, i) => 10 + i * (width + gap));
  return (
    <svg viewBox="0 0 320 150" role="img" aria-labelledby="spaces-title spaces-desc" className="w-full">
      <title id="spaces-title">Five battens, four spaces</title>
      <desc id="spaces-desc">
        A wall elevation with five vertical battens, one flush at each end. The four spaces between them are numbered one to four.
      </desc>
      <rect x="10" y="20" width={span} height="100" className="fill-paper-sunk stroke-rule-strong" />
      {xs.map((x, i) => (
        <rect key={i} x={x} y="20" width={width} height="100" className="fill-ink" />
      ))}
      {xs.slice(0, -1).map((x, i) => (
        <g key={i}>
          <circle cx={x + width + gap / 2} cy="70" r="11" className="fill-chalk" />
          <text x={x + width + gap / 2} y="75" textAnchor="middle" className="fill-white font-mono text-[13px] font-bold">
            {i + 1}
          </text>
        </g>
      ))}
      <line x1="10" x2={10 + span} y1="138" y2="138" className="stroke-ink" strokeWidth="1" />
      <line x1="10" x2="10" y1="130" y2="146" className="stroke-ink" />
      <line x1={10 + span} x2={10 + span} y1="130" y2="146" className="stroke-ink" />
      <text x={10 + span / 2} y="134" textAnchor="middle" className="fill-ink font-mono text-[12px]">
        span
      </text>
    </svg>
  );
}
