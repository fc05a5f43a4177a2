import type { Metadata } from "next";
import Link from "next/link";
import { ClassForm } from "@/components/classes/class-form";
import { requireRole } from "@/lib/auth/session";

export const metadata: Metadata = { title: "New class" };

export default async function NewClassPage() {
  await requireRole("instructor", "admin");
  return (
    <div className="mx-auto max-w-prose space-y-6">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link href="/classes">Classes</Link> <span aria-hidden="true">/</span> <span>New class</span>
      </nav>
      <header className="space-y-1">
        <h1 className="text-2xl">New class</h1>
        <p className="text-ink-soft">You will be its lead instructor. A join code is made for it; next you add students.</p>
      </header>
      <div className="card p-5">
        <ClassForm />
      </div>
    </div>
  );
}
