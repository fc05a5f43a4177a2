"use client";

import { useState } from "react";

export function CopyLinkButton({ query }: { query: string }) {
  const [state, setState] = useState<"idle" | "copied" | "failed">("idle");
  const copy = async () => {
    const url = `${window.location.origin}${window.location.pathname}?${query}`;
    try {
      await navigator.clipboard.writeText(url);
      setState("copied");
    } catch {
      // Clipboard access can be refused (plain HTTP, permissions); the address bar has the same link.
      setState("failed");
    }
    setTimeout(() => setState("idle"), 2500);
  };
  return (
    <button type="button" className="btn-quiet" onClick={copy}>
      {state === "copied" ? "Link copied" : state === "failed" ? "Copy the address bar instead" : "Copy link"}
      <span className="sr-only" aria-live="polite">
        {state === "copied" ? "The link to this layout is on your clipboard." : ""}
      </span>
    </button>
  );
}

export function PrintButton() {
  return (
    <button type="button" className="btn-quiet" onClick={() => window.print()}>
      Print shop sheet
    </button>
  );
}
