"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { Joined } from "@/lib/classes/join";
import { joinClassSchema, type JoinClassInput } from "@/lib/classes/schemas";
import { Alert } from "@/components/ui/alert";
import { TextField } from "@/components/ui/text-field";
import { useHydrated } from "@/components/ui/use-hydrated";
import { callApi } from "@/components/ui/call-api";

export function JoinClassForm({ initialCode = "" }: { initialCode?: string }) {
  const router = useRouter();
  const hydrated = useHydrated();
  const [joined, setJoined] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<JoinClassInput>({ resolver: zodResolver(joinClassSchema), defaultValues: { code: initialCode } });

  const onSubmit = handleSubmit(async (values) => {
    setJoined(undefined);
    const result = await callApi<Joined>("/api/classes/join", "POST", values);
    if (!result.ok) {
      setError("code", { message: result.fields.code ?? result.message }, { shouldFocus: true });
      return;
    }
    setJoined(result.data.alreadyIn ? `You are already in ${result.data.className}.` : `You joined ${result.data.className}.`);
    reset({ code: "" });
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3">
      {joined ? <Alert tone="success">{joined}</Alert> : null}
      <fieldset disabled={!hydrated} className="flex min-w-0 flex-wrap items-end gap-3">
        <TextField
          className="min-w-0 flex-1 basis-48"
          label="Join code"
          hint="The code your instructor shows in class, like K7PX M3QD."
          autoComplete="off"
          autoCapitalize="characters"
          spellCheck={false}
          error={errors.code?.message}
          {...register("code")}
        />
        <button type="submit" className="btn-primary" disabled={isSubmitting}>
          {isSubmitting ? "Joining…" : "Join class"}
        </button>
      </fieldset>
    </form>
  );
}
