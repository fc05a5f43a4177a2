import Link from "next/link";

export default function Forbidden() {
  return (
    <div className="mx-auto max-w-prose space-y-3 py-12">
      <p className="measure text-sm font-semibold text-ink-faint">403</p>
      <h1 className="text-2xl">This page is not open to your account.</h1>
      <p className="text-ink-soft">
        It belongs to another role — instructors see their own classes, and program admins manage accounts. If you think you should
        have access, ask your instructor or program coordinator.
      </p>
      <Link href="/" className="btn-primary">
        Go to the home page
      </Link>
    </div>
  );
}
