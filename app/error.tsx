"use client";

import { useEffect } from "react";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <div role="alert" className="mx-auto max-w-prose space-y-3 py-12">
      <h1 className="text-2xl">Something went wrong on our side.</h1>
      <p className="text-ink-soft">Try again; if it keeps happening, tell your instructor what you were doing.</p>
      {error.digest ? <p className="measure text-sm text-ink-faint">Reference: {error.digest}</p> : null}
      <button type="button" className="btn-primary" onClick={reset}>
        Try again
      </button>
    </div>
  );
}
