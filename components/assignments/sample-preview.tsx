"use client";

import { useCallback, useId, useRef, useState } from "react";
import type { SamplePreview } from "@/lib/assignments/preview";
import { ProblemFigureView } from "@/components/practice/problem-figure";
import { Alert } from "@/components/ui/alert";
import { callApi } from "@/components/ui/call-api";
import { useModal } from "@/components/ui/use-modal";

export type PreviewRequest = { kind: string; level: number; tolerance: "half" | "full"; itemNumber: number };

type PreviewState = { request: PreviewRequest; sample: number; preview: SamplePreview | null; error?: string; loading: boolean };

/**
 * One sample of an item, answers and worked steps included — what a student's problem of this
 * item looks like. "Another sample" moves a counter; the server makes the seed from it.
 * Returns `show` for the item's button and the dialog to render once.
 */
export function useSamplePreview() {
  const [state, setState] = useState<PreviewState | null>(null);
  const latest = useRef(0);

  const show = useCallback(async (request: PreviewRequest, sample = 0) => {
    const ticket = ++latest.current;
    setState((s) => ({ request, sample, preview: s && s.request === request ? s.preview : null, loading: true }));
    const result = await callApi<{ preview: SamplePreview }>("/api/assignments/preview", "POST", { kind: request.kind, level: request.level, tolerance: request.tolerance, sample });
    // A slower answer to an earlier click must not replace a newer sample.
    if (ticket !== latest.current) return;
    setState((s) => (s ? { ...s, loading: false, preview: result.ok ? result.data.preview : s.preview, error: result.ok ? undefined : result.message } : s));
  }, []);

  const dialog = <SamplePreviewDialog state={state} onAnother={() => state && show(state.request, (state.sample + 1) % 10000)} onClose={() => setState(null)} />;
  return { show, dialog };
}

function SamplePreviewDialog({ state, onAnother, onClose }: { state: PreviewState | null; onAnother: () => void; onClose: () => void }) {
  const open = state !== null;
  const ref = useModal(open);
  const titleId = useId();
  const { request, sample = 0, preview = null, error, loading = false } = state ?? {};


  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      className="m-auto max-h-[calc(100dvh-2rem)] w-[min(48rem,calc(100vw-1rem))] overflow-y-auto rounded-lg border border-rule bg-paper-raised p-0 text-ink shadow-xl backdrop:bg-ink/40"
      data-sample-preview
    >
      <div className="sticky top-0 z-10 flex items-start justify-between gap-3 border-b border-rule bg-paper-raised px-4 py-3 sm:px-5">
        <div>
          <p className="text-sm text-ink-faint">Item {request?.itemNumber} · sample {sample + 1} · answers shown to you only</p>
          <h2 id={titleId} className="text-lg">
            {preview ? preview.title : "Sample problem"}
          </h2>
        </div>
        <button type="button" className="btn-quiet shrink-0 px-3" onClick={onClose}>
          Close<span className="sr-only"> the sample</span>
        </button>
      </div>
      <div className="space-y-4 p-4 sm:p-5" aria-busy={loading}>
        {error ? <Alert tone="error">{error}</Alert> : null}
        {!preview && loading ? <p className="text-ink-soft">Drawing a sample…</p> : null}
        {preview ? (
          <>
            <p className="text-sm text-ink-soft">
              {preview.skillTitle} · Level {preview.level}: <strong className="text-ink">{preview.levelLabel}</strong> — {preview.levelDescription}
            </p>
            <div className="card space-y-3 p-4 leading-relaxed">
              <div className="space-y-3" dangerouslySetInnerHTML={{ __html: preview.promptHtml }} />
              {preview.figure ? <ProblemFigureView figure={preview.figure} /> : null}
            </div>
            <h3 className="text-base">Expected answers</h3>
            <ul className="grid gap-2 sm:grid-cols-2">
              {preview.parts.map((p) => (
                <li key={p.key} className="rounded border border-rule bg-paper p-3">
                  <p className="text-sm text-ink-soft">{p.label}</p>
                  <p className="measure text-lg font-semibold" data-expected={p.key}>
                    {p.expected}
                  </p>
                  <p className="text-xs text-ink-soft">
                    Asked {p.hint}; accepted {p.accepts}.
                  </p>
                </li>
              ))}
            </ul>
            <details className="rounded border border-rule bg-paper p-3">
              <summary className="cursor-pointer font-semibold">Worked solution ({preview.stepsHtml.length} steps)</summary>
              <ol className="mt-3 list-decimal space-y-2 pl-6">
                {preview.stepsHtml.map((step, i) => (
                  <li key={i} dangerouslySetInnerHTML={{ __html: step }} />
                ))}
              </ol>
            </details>
          </>
        ) : null}
        <div className="flex flex-wrap gap-3">
          <button type="button" className="btn-primary" onClick={onAnother} disabled={loading || !request}>
            {loading && preview ? "Drawing…" : "Show another sample"}
          </button>
          <p className="self-center text-sm text-ink-soft">Each student gets their own numbers of this kind and level.</p>
        </div>
      </div>
    </dialog>
  );
}
