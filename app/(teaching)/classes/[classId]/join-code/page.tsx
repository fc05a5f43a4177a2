import type { Metadata } from "next";
import Link from "next/link";
import { PrintButton } from "@/components/classes/print-button";
import { requireRole } from "@/lib/auth/session";
import { classForTeacher } from "@/lib/classes/queries";
import { formatJoinCode } from "@/lib/classes/schemas";
import { env } from "@/lib/env";
import { classIdOf, orPage } from "../load-class";

export const metadata: Metadata = { title: "Join code" };

/** Big enough to read from the back of the shop; prints on one sheet for the notice board. */
export default async function JoinCodePage({ params }: PageProps<"/classes/[classId]/join-code">) {
  const user = await requireRole("instructor", "admin");
  const classId = classIdOf((await params).classId);
  const summary = await orPage(() => classForTeacher(user, classId));
  const address = `${new URL(env().NEXTAUTH_URL).host}/my-classes`;
  return (
    <div className="flex min-h-[70dvh] flex-col items-center justify-center gap-8 text-center print:min-h-0 print:pt-16">
      <nav className="flex w-full flex-wrap items-center justify-between gap-2" data-chrome>
        <Link href={`/classes/${classId}`}>Back to {summary.name}</Link>
        <PrintButton />
      </nav>
      <div className="space-y-2">
        <p className="text-xl text-ink-soft sm:text-2xl">{summary.name}</p>
        <p className="text-lg text-ink-soft">{[summary.term, summary.sectionCode ? `Section ${summary.sectionCode}` : null].filter(Boolean).join(" · ")}</p>
      </div>
      <div className="space-y-3">
        <p className="text-xl font-semibold sm:text-3xl">Sign in, open My classes, and enter</p>
        <p
          className="measure rounded-lg border-4 border-ink px-4 py-6 text-[13vw] leading-none font-bold tracking-[0.12em] sm:px-10 sm:text-[9vw] xl:text-[8rem] print:text-[6rem]"
          aria-label={`Join code ${summary.joinCode.split("").join(" ")}`}
        >
          {formatJoinCode(summary.joinCode)}
        </p>
        <p className="measure text-base break-words sm:text-3xl">{address}</p>
      </div>
      <p className="max-w-prose text-ink-soft">No account yet? Create one on the sign-up page first; it is free. Spaces and capitals do not matter when you type the code.</p>
    </div>
  );
}
