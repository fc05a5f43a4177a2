"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { classSchema, type ClassFormInput, type ClassInput } from "@/lib/classes/schemas";
import { Alert } from "@/components/ui/alert";
import { TextField } from "@/components/ui/text-field";
import { useHydrated } from "@/components/ui/use-hydrated";
import { callApi } from "@/components/ui/call-api";
import { useServerErrors } from "@/components/ui/use-server-form";

type Props = { classId?: number; initial?: ClassFormInput };

const FIELDS = ["name", "term", "sectionCode", "program"] as const;

/** Creates a class (no classId) or edits one; the API parses the same schema. */
export function ClassForm({ classId, initial }: Props) {
  const router = useRouter();
  const hydrated = useHydrated();
  const [saved, setSaved] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    setFocus,
    formState: { errors, isSubmitting, isDirty },
    reset,
  } = useForm<ClassFormInput, unknown, ClassInput>({
    resolver: zodResolver(classSchema),
    defaultValues: initial ?? { name: "", term: "", sectionCode: "", program: "" },
  });
  const { formError, setFormError, showFailure } = useServerErrors({ setError, setFocus }, FIELDS);

  const onSubmit = handleSubmit(async (values) => {
    setFormError(undefined);
    setSaved(false);
    const result = classId
      ? await callApi<unknown>(`/api/classes/${classId}`, "PATCH", values)
      : await callApi<{ id: number }>("/api/classes", "POST", values);
    if (!result.ok) {
      showFailure(result);
      return;
    }
    if (classId) {
      reset(values);
      setSaved(true);
      router.refresh();
    } else {
      router.push(`/classes/${(result.data as { id: number }).id}/add-students`);
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError ? <Alert tone="error">{formError}</Alert> : null}
      {saved && !isDirty ? <Alert tone="success">Saved.</Alert> : null}
      <fieldset disabled={!hydrated} className="grid min-w-0 gap-4 sm:grid-cols-2">
        <TextField className="sm:col-span-2" label="Class name" placeholder="CARP 110 — Finish Carpentry I" error={errors.name?.message} {...register("name")} />
        <TextField label="Term" placeholder="Spring 2027" error={errors.term?.message} {...register("term")} />
        <TextField label="Section code (optional)" placeholder="A" error={errors.sectionCode?.message} {...register("sectionCode")} />
        <TextField
          className="sm:col-span-2"
          label="Program (optional)"
          placeholder="Carpentry & Joinery"
          error={errors.program?.message}
          {...register("program")}
        />
        <div className="sm:col-span-2">
          <button type="submit" className="btn-primary w-full sm:w-auto" disabled={isSubmitting}>
            {isSubmitting ? "Saving…" : classId ? "Save changes" : "Create class"}
          </button>
        </div>
      </fieldset>
    </form>
  );
}
