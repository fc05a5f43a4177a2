"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import type { Person } from "@/lib/classes/queries";
import { coInstructorSchema } from "@/lib/classes/schemas";
import { Alert } from "@/components/ui/alert";
import { TextField } from "@/components/ui/text-field";
import { useHydrated } from "@/components/ui/use-hydrated";
import { ActionButton } from "./action-button";
import { callApi } from "@/components/ui/call-api";

type Values = z.input<typeof coInstructorSchema>;

export function CoInstructors({ classId, lead, coInstructors, canManage }: { classId: number; lead: Person; coInstructors: Person[]; canManage: boolean }) {
  const router = useRouter();
  const hydrated = useHydrated();
  const [added, setAdded] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<Values>({ resolver: zodResolver(coInstructorSchema), defaultValues: { email: "" } });

  const onSubmit = handleSubmit(async (values) => {
    setAdded(undefined);
    const result = await callApi<{ coInstructor: Person }>(`/api/classes/${classId}/co-instructors`, "POST", values);
    if (!result.ok) {
      setError("email", { message: result.fields.email ?? result.message }, { shouldFocus: true });
      return;
    }
    setAdded(`${result.data.coInstructor.name} now co-teaches this class.`);
    reset();
    router.refresh();
  });

  return (
    <div className="space-y-4">
      <ul className="divide-y divide-rule rounded border border-rule">
        <li className="flex flex-wrap items-center justify-between gap-2 px-4 py-3">
          <span>
            <span className="font-semibold">{lead.name}</span> <span className="text-sm text-ink-soft">{lead.email}</span>
          </span>
          <span className="text-sm font-semibold text-ink-faint">Lead instructor</span>
        </li>
        {coInstructors.map((person) => (
          <li key={person.id} className="flex flex-wrap items-center justify-between gap-2 px-4 py-3">
            <span>
              <span className="font-semibold">{person.name}</span> <span className="text-sm break-all text-ink-soft">{person.email}</span>
            </span>
            {canManage ? (
              <ActionButton
                url={`/api/classes/${classId}/co-instructors/${person.id}`}
                method="DELETE"
                label="Remove"
                accessibleLabel={`Remove ${person.name} as co-instructor`}
                pendingLabel="Removing…"
                tone="danger"
                confirm={{
                  title: `Remove ${person.name}?`,
                  body: <p>They will no longer see this class, its roster or its gradebook. You can add them again later.</p>,
                  confirmLabel: "Remove co-instructor",
                }}
              />
            ) : (
              <span className="text-sm text-ink-faint">Co-instructor</span>
            )}
          </li>
        ))}
      </ul>
      {canManage ? (
        <form onSubmit={onSubmit} noValidate className="space-y-3">
          {added ? <Alert tone="success">{added}</Alert> : null}
          <fieldset disabled={!hydrated} className="flex min-w-0 flex-wrap items-end gap-3">
            <TextField
              className="min-w-0 flex-1 basis-64"
              label="Add a co-instructor by e-mail"
              hint="They need an instructor account already."
              type="email"
              inputMode="email"
              error={errors.email?.message}
              {...register("email")}
            />
            <button type="submit" className="btn-quiet" disabled={isSubmitting}>
              {isSubmitting ? "Adding…" : "Add co-instructor"}
            </button>
          </fieldset>
        </form>
      ) : (
        <p className="text-sm text-ink-soft">Only the lead instructor or a program admin can change who co-teaches.</p>
      )}
    </div>
  );
}
