"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { useForm, useWatch, type Resolver } from "react-hook-form";
import { assignmentSchema, MAX_ATTEMPTS, type AssignmentData } from "@/lib/assignments/schemas";
import { REVEAL_LABELS, pluralize, type KindOption } from "@/lib/assignments/teacher-format";
import type { TeacherAssignment } from "@/lib/assignments/teacher-views";
import { Alert } from "@/components/ui/alert";
import { MarkdownText } from "@/components/ui/markdown";
import { TextField } from "@/components/ui/text-field";
import { useHydrated } from "@/components/ui/use-hydrated";
import { callApi } from "@/components/ui/call-api";
import { useServerErrors } from "@/components/ui/use-server-form";
import { BuilderItems } from "./builder-items";
import { BuilderSchedule } from "./builder-schedule";
import { initialValues, toPayload, totalPoints, type BuilderValues } from "./builder-values";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { useSamplePreview } from "./sample-preview";

type Props = {
  classId: number;
  className: string;
  activeStudents: number;
  kinds: KindOption[];
  /** Null for a new assignment. */
  existing: TeacherAssignment | null;
};

const schemaResolver = zodResolver(assignmentSchema);
// The one schema validates what the API will receive: local dates become ISO instants first.
const resolver: Resolver<BuilderValues, unknown, AssignmentData> = (values, context, options) =>
  schemaResolver(toPayload(values), context, options as never) as never;

const FIELD_NAMES = /^(title|instructions|opensAt|dueAt|latePolicy|lateUntil|latePenaltyPercent|attemptsAllowed|reveal|items(\.\d+\.(kind|level|problemCount|tolerance|points))?)$/;

/** Create or edit an assignment: settings, items with samples, then save as a draft or publish. */
export function AssignmentBuilder({ classId, className, activeStudents, kinds, existing }: Props) {
  const router = useRouter();
  const hydrated = useHydrated();
  const ids = { instructions: useId(), tries: useId(), reveal: useId() };
  const [savedId, setSavedId] = useState<number | null>(existing?.id ?? null);
  const [busy, setBusy] = useState(false);
  const [confirming, setConfirming] = useState<AssignmentData | null>(null);
  const samples = useSamplePreview();
  const [showMarkdown, setShowMarkdown] = useState(false);
  const locked = existing?.locked ?? false;
  const published = existing?.status === "published";

  const { register, control, handleSubmit, setError, setFocus, formState: { errors } } = useForm<BuilderValues, unknown, AssignmentData>({
    resolver,
    defaultValues: initialValues(existing),
  });
  const items = useWatch({ control, name: "items" });
  const instructions = useWatch({ control, name: "instructions" });

  const { formError, setFormError, showFailure } = useServerErrors({ setError, setFocus }, FIELD_NAMES);
  const showServerError = (error: { message: string; fields: Record<string, string> }) => showFailure(error, { summary: `${error.message} The marked fields need attention.` });

  const save = async (data: AssignmentData): Promise<number | null> => {
    const result = savedId
      ? await callApi<{ assignment: TeacherAssignment }>(`/api/assignments/${savedId}`, "PATCH", data)
      : await callApi<{ assignment: TeacherAssignment }>(`/api/classes/${classId}/assignments`, "POST", data);
    if (!result.ok) {
      showServerError(result);
      return null;
    }
    setSavedId(result.data.assignment.id);
    return result.data.assignment.id;
  };

  const saveDraft = handleSubmit(async (data) => {
    setBusy(true);
    setFormError(undefined);
    const id = await save(data);
    setBusy(false);
    if (id) {
      router.push(`/classes/${classId}/assignments/${id}?saved=1`);
      router.refresh();
    }
  });

  const askToPublish = handleSubmit((data) => {
    setFormError(undefined);
    setConfirming(data);
  });

  const publish = async () => {
    if (!confirming) return;
    setBusy(true);
    const id = await save(confirming);
    if (!id) {
      setBusy(false);
      setConfirming(null);
      return;
    }
    const result = await callApi<{ emailed: number }>(`/api/assignments/${id}/publish`, "POST", {});
    setBusy(false);
    setConfirming(null);
    if (!result.ok) {
      showServerError({ ...result, message: `Saved as a draft, but not published: ${result.message}` });
      return;
    }
    router.push(`/classes/${classId}/assignments/${id}?published=${result.data.emailed}`);
    router.refresh();
  };

  const total = totalPoints(items ?? []);
  const cancelHref = existing ? `/classes/${classId}/assignments/${existing.id}` : `/classes/${classId}/assignments`;

  return (
    <form onSubmit={saveDraft} noValidate className="space-y-8" aria-label={existing ? "Edit the assignment" : "Build an assignment"}>
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      <fieldset disabled={!hydrated || busy} className="min-w-0 space-y-8">
        <legend className="sr-only">Assignment settings</legend>
        <section className="space-y-4" aria-labelledby="about-heading">
          <h2 id="about-heading" className="text-xl">
            What the students see
          </h2>
          <TextField label="Title" maxLength={160} placeholder="e.g. Battens on the hallway wall" error={errors.title?.message} {...register("title")} />
          <div>
            <div className="mb-1 flex flex-wrap items-end justify-between gap-2">
              <label htmlFor={ids.instructions} className="font-semibold">
                Instructions <span className="font-normal text-ink-soft">(optional, Markdown)</span>
              </label>
              <button type="button" className="btn-quiet min-h-9 px-3 text-sm" aria-pressed={showMarkdown} onClick={() => setShowMarkdown((v) => !v)}>
                {showMarkdown ? "Back to writing" : "Show how it reads"}
              </button>
            </div>
            <textarea
              id={ids.instructions}
              rows={5}
              className={`input py-2 ${showMarkdown ? "hidden" : ""}`}
              placeholder={"Work each layout from the left end.\n**Show your marks** on the story pole."}
              aria-invalid={errors.instructions ? true : undefined}
              {...register("instructions")}
            />
            {showMarkdown ? (
              <div className="min-h-32 rounded border border-rule bg-white p-3" data-markdown-preview>
                {instructions?.trim() ? <MarkdownText text={instructions} /> : <p className="text-ink-faint">Nothing written yet.</p>}
              </div>
            ) : null}
            {errors.instructions?.message ? <p className="mt-1 text-sm font-semibold text-danger">{errors.instructions.message}</p> : null}
          </div>
        </section>

        <BuilderSchedule register={register} control={control} errors={errors} />

        <section className="space-y-4" aria-labelledby="tries-heading">
          <h2 id="tries-heading" className="text-xl">
            Tries and worked solutions
          </h2>
          <div className="grid gap-4 md:grid-cols-2">
            <TextField
              label="Tries per problem"
              type="number"
              inputMode="numeric"
              min={1}
              max={MAX_ATTEMPTS}
              className="max-w-xs"
              readOnly={locked}
              hint={locked ? "Fixed once published. Give one student more with an extension." : "Each check of the answers uses one try."}
              error={errors.attemptsAllowed?.message}
              {...register("attemptsAllowed")}
            />
            <fieldset aria-describedby={ids.reveal}>
              <legend className="mb-1 font-semibold">Students see the answers and worked solution</legend>
              <p id={ids.reveal} className="mb-1 text-sm text-ink-soft">
                A problem is finished when it is right or out of tries.
              </p>
              {(["when-final", "after-due"] as const).map((value) => (
                <label key={value} className="flex min-h-touch items-center gap-2">
                  <input type="radio" value={value} className="size-5 accent-chalk" {...register("reveal")} />
                  {REVEAL_LABELS[value]}
                </label>
              ))}
            </fieldset>
          </div>
        </section>

        <section className="space-y-4" aria-labelledby="items-heading">
          <div className="flex flex-wrap items-end justify-between gap-2">
            <h2 id="items-heading" className="text-xl">
              Problems
            </h2>
            <p className="measure text-lg font-semibold" aria-live="polite" data-total-points>
              Total: {pluralize(total, "point")}
            </p>
          </div>
          <BuilderItems control={control} register={register} errors={errors} kinds={kinds} locked={locked} onPreview={(request) => void samples.show(request)} />
        </section>

        <div className="flex flex-wrap items-center gap-3 border-t border-rule pt-5" data-chrome>
          {published ? (
            <button type="submit" className="btn-primary">
              {busy ? "Saving…" : "Save changes"}
            </button>
          ) : (
            <>
              <button type="submit" className="btn-quiet">
                {busy && !confirming ? "Saving…" : "Save draft"}
              </button>
              <button type="button" className="btn-primary" onClick={askToPublish}>
                Save and publish
              </button>
            </>
          )}
          <Link href={cancelHref} className="btn-quiet">
            Cancel
          </Link>
          {published ? <p className="text-sm text-ink-soft">Published: students see changes at once.</p> : null}
        </div>
      </fieldset>

      <ConfirmDialog open={confirming !== null} title="Publish this assignment?" confirmLabel="Publish and e-mail" busy={busy} onConfirm={publish} onCancel={() => setConfirming(null)}>
        <p>
          {activeStudents === 0
            ? `${className} has no active students yet, so nobody is e-mailed now; students who join later see it in My classes.`
            : `${pluralize(activeStudents, "student")} in ${className} will be e-mailed a link, and each gets their own numbers.`}
        </p>
        <p>After publishing, the problems and tries per problem are fixed; the wording and dates stay editable.</p>
      </ConfirmDialog>
      {samples.dialog}
    </form>
  );
}
