"use client";

import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import type { ImportPreview, ImportResult } from "@/lib/classes/import";
import { MAX_IMPORT_BYTES, MAX_IMPORT_ROWS } from "@/lib/classes/schemas";
import { Alert } from "@/components/ui/alert";
import { useHydrated } from "@/components/ui/use-hydrated";
import { callApi } from "@/components/ui/call-api";
import { focusFirstInvalid } from "@/components/ui/use-server-form";
import { ImportPreviewTable } from "./import-preview-table";
import { SendProgress } from "./send-progress";

type Stage = { kind: "empty" } | { kind: "checking" } | { kind: "preview"; csv: string; preview: ImportPreview } | { kind: "sending"; csv: string; preview: ImportPreview } | { kind: "sent"; result: ImportResult };

/** Upload or paste → the server's dry run shows every row → one click sends all good rows in one transaction. */
export function RosterImport({ classId }: { classId: number }) {
  const router = useRouter();
  const hydrated = useHydrated();
  const id = useId();
  const [stage, setStage] = useState<Stage>({ kind: "empty" });
  const [pasted, setPasted] = useState("");
  const [error, setError] = useState<string>();
  // A problem with the file itself is shown beside the control it came from, which gets the focus.
  const [inputError, setInputError] = useState<{ source: "file" | "paste"; message: string }>();
  const refuse = (source: "file" | "paste", message: string) => {
    setInputError({ source, message });
    setStage({ kind: "empty" });
    // Retried over a few frames: the control may be re-rendered right after the refusal.
    focusFirstInvalid(() => document.getElementById(`${id}-${source}`)?.parentElement ?? null);
  };

  const check = async (csv: string, source: "file" | "paste") => {
    setError(undefined);
    setInputError(undefined);
    if (!csv.trim()) {
      refuse(source, "The roster is empty. Choose a CSV file or paste the rows.");
      return;
    }
    setStage({ kind: "checking" });
    const result = await callApi<ImportPreview>(`/api/classes/${classId}/roster/import`, "POST", { csv, dryRun: true });
    if (!result.ok) {
      refuse(source, result.fields.csv ?? result.message);
      return;
    }
    if (result.data.fileError) {
      refuse(source, result.data.fileError);
      return;
    }
    setStage({ kind: "preview", csv, preview: result.data });
  };

  const onFile = async (file: File | undefined) => {
    if (!file) return;
    if (file.size > MAX_IMPORT_BYTES) {
      refuse("file", `${file.name} is over 1 MB. Split the roster into smaller files.`);
      return;
    }
    await check(await file.text(), "file");
  };
  const fieldError = (source: "file" | "paste") =>
    inputError?.source === source ? (
      <p id={`${id}-${source}-error`} className="mt-1 text-sm font-semibold text-danger">
        {inputError.message}
      </p>
    ) : null;
  const describedBy = (source: "file" | "paste", hint?: string) => [hint, inputError?.source === source ? `${id}-${source}-error` : null].filter(Boolean).join(" ") || undefined;

  const send = async () => {
    if (stage.kind !== "preview") return;
    setError(undefined);
    setStage({ ...stage, kind: "sending" });
    const result = await callApi<ImportResult>(`/api/classes/${classId}/roster/import`, "POST", { csv: stage.csv, dryRun: false });
    if (!result.ok) {
      setError(`Nothing was sent: ${result.message}`);
      setStage({ ...stage, kind: "preview" });
      return;
    }
    setStage({ kind: "sent", result: result.data });
    router.refresh();
  };

  const startOver = () => {
    setStage({ kind: "empty" });
    setPasted("");
    setError(undefined);
    setInputError(undefined);
  };

  if (stage.kind === "sent") {
    const { result } = stage;
    return (
      <div className="space-y-4">
        <Alert tone="success">
          {result.sent} invitation{result.sent === 1 ? "" : "s"} written. {result.counts.error > 0 ? `${result.counts.error} row${result.counts.error === 1 ? " was" : "s were"} skipped.` : ""}
        </Alert>
        <SendProgress classId={classId} batch={result.batch} />
        <button type="button" className="btn-quiet" onClick={startOver}>
          Import another file
        </button>
      </div>
    );
  }

  const preview = stage.kind === "preview" || stage.kind === "sending" ? stage.preview : null;
  const sendable = preview ? preview.counts.invite + preview.counts.resend : 0;
  return (
    <div className="space-y-4">
      {error ? <Alert tone="error">{error}</Alert> : null}
      {!preview ? (
        <fieldset disabled={!hydrated || stage.kind === "checking"} className="min-w-0 space-y-4">
          <div>
            <label htmlFor={`${id}-file`} className="mb-1 block font-semibold">
              Roster file (.csv)
            </label>
            <p id={`${id}-file-hint`} className="mb-1 text-sm text-ink-soft">
              A header row naming the columns, then one student per line. Columns called Name, Full name or Student and E-mail, Email address or Mail
              are found in any order. Up to {MAX_IMPORT_ROWS} students and 1 MB.
            </p>
            <input
              id={`${id}-file`}
              type="file"
              accept=".csv,text/csv,text/plain"
              aria-describedby={describedBy("file", `${id}-file-hint`)}
              aria-invalid={inputError?.source === "file" ? true : undefined}
              className="block w-full text-sm file:mr-3 file:min-h-touch file:rounded file:border file:border-rule-strong file:bg-paper-raised file:px-4 file:font-semibold"
              onChange={(e) => onFile(e.currentTarget.files?.[0])}
            />
            {fieldError("file")}
          </div>
          <div>
            <label htmlFor={`${id}-paste`} className="mb-1 block font-semibold">
              Or paste the rows
            </label>
            <textarea
              id={`${id}-paste`}
              rows={4}
              className="input min-h-24 py-2 font-mono text-sm"
              placeholder={"Name,E-mail\nAvery Castellanos,avery@example.com"}
              value={pasted}
              onChange={(e) => setPasted(e.target.value)}
              aria-describedby={describedBy("paste")}
              aria-invalid={inputError?.source === "paste" ? true : undefined}
            />
            {fieldError("paste")}
          </div>
          <button type="button" className="btn-quiet" onClick={() => check(pasted, "paste")}>
            {stage.kind === "checking" ? "Checking…" : "Check pasted rows"}
          </button>
        </fieldset>
      ) : (
        <div className="space-y-4">
          <p aria-live="polite">
            <span className="font-semibold">
              {preview.rows.length} row{preview.rows.length === 1 ? "" : "s"} read
            </span>
            {preview.columns.email ? (
              <span className="text-ink-soft">
                {" "}
                (e-mail from “{preview.columns.email}”{preview.columns.name ? `, name from “${preview.columns.name}”` : ", no name column"})
              </span>
            ) : null}
            : {preview.counts.invite} to invite, {preview.counts.resend} to re-send, {preview.counts.error} with errors. Nothing is written until you send.
          </p>
          <ImportPreviewTable rows={preview.rows} />
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn-primary" disabled={sendable === 0 || stage.kind === "sending"} onClick={send}>
              {stage.kind === "sending" ? "Sending…" : `Send ${sendable} invitation${sendable === 1 ? "" : "s"}`}
            </button>
            <button type="button" className="btn-quiet" onClick={startOver} disabled={stage.kind === "sending"}>
              Choose another file
            </button>
          </div>
          {preview.counts.error > 0 ? <p className="text-sm text-ink-soft">Rows with errors are skipped. Fix them in the file and import it again to send those.</p> : null}
        </div>
      )}
    </div>
  );
}
