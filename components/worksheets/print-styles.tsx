// Paper rules for the worksheet pages only: rendered with the page, so they leave with it and never
// change how any other page prints.
const PRINT_CSS = `
@page { size: letter; margin: 0.5in; }
@media print {
  html, body { background: white !important; color: black !important; font-size: 10.5pt; }
  body { min-height: 0 !important; display: block !important; }
  .ws-page { border: 0 !important; box-shadow: none !important; border-radius: 0 !important; padding: 0 !important; margin: 0 !important; max-width: none !important; background: white !important; }
  .ws-page, .ws-page * { color: black !important; }
  .ws-page ~ .ws-page { break-before: page; }
  .ws-problem, .ws-key-problem { break-inside: avoid; }
  .ws-figure svg { max-height: 1.55in; }
  .ws-figure .fill-chalk { fill: #9a9a9a !important; }
  .ws-figure .stroke-chalk-dark { stroke: black !important; }
  .ws-answer-line { border-color: black !important; }
}
`;

export function WorksheetPrintStyles() {
  return <style>{PRINT_CSS}</style>;
}
