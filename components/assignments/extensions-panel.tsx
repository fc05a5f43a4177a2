"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import type { z } from "zod";
import type { ExtensionView } from "@/lib/assignments/extensions";
import { extensionSchema, MAX_EXTRA_ATTEMPTS } from "@/lib/assignments/schemas";
import { pluralize } from "@/lib/assignments/teacher-format";
import { Alert } from "@/components/ui/alert";
import { LocalTime, fromLocalInput, toLocalInput } from "@/components/ui/local-time";
import { TextField } from "@/components/ui/text-field";
import { useHydrated } from "@/components/ui/use-hydrated";
import { callApi } from "@/components/ui/call-api";
import { useServerErrors } from "@/components/ui/use-server-form";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { ScrollRegion } from "@/components/ui/scroll-region";

type Student = { studentId: number; name: string; email: string; status: "active" | "invited" };
type Values = { studentId: string; dueAt: string; extraAttempts: number | string; note: string };
type Output = z.output<typeof extensionSchema>;

const schemaResolver = zodResolver(extensionSchema);
const resolver: Resolver<Values, unknown, Output> = (v, context, options) =>
  schemaResolver({ studentId: v.studentId === "" ? undefined : v.studentId, dueAt: fromLocalInput(v.dueAt) || null, extraAttempts: v.extraAttempts === "" ? 0 : v.extraAttempts, note: v.note.trim() || null }, context, options as never) as never;

const EMPTY: Values = { studentId: "", dueAt: "", extraAttempts: 0, note: "" };

/** Accommodations for single students: a later due date, extra tries per problem, or both. */
export function ExtensionsPanel({ assignmentId, roster, initial, dueAt, attemptsAllowed }: { assignmentId: number; roster: Student[]; initial: ExtensionView[]; dueAt: string; attemptsAllowed: number }) {
  const router = useRouter();
  const hydrated = useHydrated();
  const studentFieldId = useId();
  const [extensions, setExtensions] = useState(initial);
  const [done, setDone] = useState<string>();
  const [removing, setRemoving] = useState<ExtensionView | null>(null);
  const [busy, setBusy] = useState(false);
  const { register, handleSubmit, reset, setError, setFocus, formState: { errors, isSubmitting } } = useForm<Values, unknown, Output>({ resolver, defaultValues: EMPTY });
  const { formError, setFormError, showFailure } = useServerErrors({ setError, setFocus }, ["studentId", "dueAt", "extraAttempts", "note"]);

  const submit = handleSubmit(async (data) => {
    setFormError(undefined);
    setDone(undefined);
    const result = await callApi<{ extension: ExtensionView }>(`/api/assignments/${assignmentId}/extensions`, "PUT", data);
    if (!result.ok) {
      showFailure(result);
      return;
    }
    const saved = result.data.extension;
    setExtensions((list) => [...list.filter((e) => e.studentId !== saved.studentId), saved].sort((a, b) => a.studentName.localeCompare(b.studentName)));
    setDone(`Extension saved for ${saved.studentName}.`);
    reset(EMPTY);
    router.refresh();
  });

  const edit = (e: ExtensionView) => {
    reset({ studentId: String(e.studentId), dueAt: e.dueAt ? toLocalInput(e.dueAt) : "", extraAttempts: e.extraAttempts, note: e.note ?? "" });
    setDone(undefined);
    setFocus("dueAt");
  };

  const remove = async () => {
    if (!removing) return;
    setBusy(true);
    const result = await callApi<void>(`/api/assignments/${assignmentId}/extensions/${removing.studentId}`, "DELETE");
    setBusy(false);
    if (!result.ok) setFormError(result.message);
    else {
      setExtensions((list) => list.filter((e) => e.studentId !== removing.studentId));
      setDone(`Extension removed for ${removing.studentName}.`);
      router.refresh();
    }
    setRemoving(null);
  };

  return (
    <div className="space-y-5">
      {extensions.length === 0 ? (
        <p className="text-ink-soft">No extensions yet. Everyone works to the same due date and {pluralize(attemptsAllowed, "try", "tries")} per problem.</p>
      ) : (
        <ScrollRegion labelledBy="extensions-caption">
          <table className="w-full text-left text-sm" data-extensions>
            <caption id="extensions-caption" className="sr-only">Students with an extension</caption>
            <thead className="border-b border-rule bg-paper-sunk">
              <tr>
                <th scope="col" className="px-3 py-2">Student</th>
                <th scope="col" className="hidden px-3 py-2 sm:table-cell">Due</th>
                <th scope="col" className="hidden px-3 py-2 sm:table-cell">Extra tries</th>
                <th scope="col" className="hidden px-3 py-2 md:table-cell">Note</th>
                <th scope="col" className="px-3 py-2"><span className="sr-only">Actions</span></th>
              </tr>
            </thead>
            <tbody>
              {extensions.map((e) => (
                <tr key={e.studentId} className="border-b border-rule align-top last:border-0">
                  <th scope="row" className="px-3 py-2 font-semibold">
                    {e.studentName}
                    <span className="block text-xs font-normal text-ink-soft sm:hidden">
                      {e.dueAt ? (
                        <>
                          Due <LocalTime iso={e.dueAt} />
                        </>
                      ) : (
                        "Class due date"
                      )}
                      {e.extraAttempts > 0 ? ` · +${pluralize(e.extraAttempts, "try", "tries")}` : ""}
                    </span>
                    {e.note ? <span className="block text-xs font-normal text-ink-soft md:hidden">{e.note}</span> : null}
                  </th>
                  <td className="hidden px-3 py-2 sm:table-cell">{e.dueAt ? <LocalTime iso={e.dueAt} /> : <span className="text-ink-soft">as the class (<LocalTime iso={dueAt} style="date" />)</span>}</td>
                  <td className="measure hidden px-3 py-2 sm:table-cell">{e.extraAttempts > 0 ? `+${e.extraAttempts}` : "—"}</td>
                  <td className="hidden px-3 py-2 md:table-cell">{e.note ?? <span className="text-ink-faint">—</span>}</td>
                  <td className="px-3 py-2">
                    <div className="flex flex-wrap justify-end gap-2">
                      <button type="button" className="btn-quiet min-h-9 px-3 text-sm" disabled={!hydrated} onClick={() => edit(e)}>
                        Change<span className="sr-only"> {e.studentName}&rsquo;s extension</span>
                      </button>
                      <button type="button" className="btn-quiet min-h-9 px-3 text-sm text-danger" disabled={!hydrated} onClick={() => setRemoving(e)}>
                        Remove<span className="sr-only"> {e.studentName}&rsquo;s extension</span>
                      </button>
                    </div>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      )}

      {done ? <Alert tone="success">{done}</Alert> : null}
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      {roster.length === 0 ? (
        <p className="text-sm text-ink-soft">Extensions are for students on the roster; this class has none yet.</p>
      ) : (
        <form onSubmit={submit} noValidate className="card space-y-4 p-4" aria-label="Grant or change an extension" data-chrome>
          <fieldset disabled={!hydrated || isSubmitting} className="min-w-0 space-y-4">
            <legend className="font-semibold">Grant or change an extension</legend>
            <div className="grid gap-4 md:grid-cols-3">
              <div>
                <label htmlFor={studentFieldId} className="mb-1 block font-semibold">
                  Student
                </label>
                <select
                  id={studentFieldId}
                  className="input"
                  aria-invalid={errors.studentId ? true : undefined}
                  aria-describedby={errors.studentId ? `${studentFieldId}-error` : undefined}
                  {...register("studentId")}
                >
                  <option value="">Choose a student…</option>
                  {roster.map((s) => (
                    <option key={s.studentId} value={s.studentId}>
                      {s.name}
                      {s.status === "invited" ? " (invited)" : ""}
                    </option>
                  ))}
                </select>
                {errors.studentId ? <p id={`${studentFieldId}-error`} className="mt-1 text-sm font-semibold text-danger">{errors.studentId.type === "server" ? errors.studentId.message : "Choose a student from the roster."}</p> : null}
              </div>
              <TextField label="New due date (optional)" type="datetime-local" error={errors.dueAt?.message} {...register("dueAt")} />
              <TextField label="Extra tries per problem" type="number" inputMode="numeric" min={0} max={MAX_EXTRA_ATTEMPTS} error={errors.extraAttempts?.message} {...register("extraAttempts")} />
            </div>
            <TextField label="Note (optional, seen by instructors only)" maxLength={300} placeholder="e.g. Out two days with a hand injury" error={errors.note?.message} {...register("note")} />
            <p className="text-sm text-ink-soft">
              Extra tries are added to this student&rsquo;s problems that are still open; a finished problem stays finished. Removing an extension, or lowering its tries, does not take tries back from problems already started.
            </p>
            <button type="submit" className="btn-primary">
              {isSubmitting ? "Saving…" : "Save extension"}
            </button>
          </fieldset>
        </form>
      )}

      <ConfirmDialog open={removing !== null} title={`Remove ${removing?.studentName ?? "this student"}’s extension?`} tone="danger" confirmLabel="Remove extension" busy={busy} onConfirm={remove} onCancel={() => setRemoving(null)}>
        <p>They go back to the class&rsquo;s due date. Extra tries come off problems they have not started; problems already started keep theirs.</p>
      </ConfirmDialog>
    </div>
  );
}
