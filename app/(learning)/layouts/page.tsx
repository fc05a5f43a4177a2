import type { Metadata } from "next";
import { MyLayouts } from "@/components/layouts/my-layouts";
import { requireUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "My layouts" };

export default async function MyLayoutsPage() {
  await requireUser();
  return (
    <div className="space-y-6">
      <header className="space-y-1">
        <h1 className="text-2xl">My layouts</h1>
        <p className="text-ink-soft">Layouts you saved from the calculators. Open one to pick up where you left off.</p>
      </header>
      <MyLayouts />
    </div>
  );
}
