"use client";

/** Opens the browser's print dialog; the sheets' own print rules do the rest. */
export function PrintButton({ disabled = false }: { disabled?: boolean }) {
  return (
    <button type="button" className="btn-primary" onClick={() => window.print()} disabled={disabled}>
      Print
    </button>
  );
}
