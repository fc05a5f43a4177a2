import Link from "next/link";

export default function NotFound() {
  return (
    <div className="mx-auto max-w-prose space-y-3 py-12">
      <p className="measure text-sm font-semibold text-ink-faint">404</p>
      <h1 className="text-2xl">Nothing is marked here.</h1>
      <p className="text-ink-soft">The page you asked for does not exist, or it moved. Check the address, or start again from the home page.</p>
      <Link href="/" className="btn-primary">
        Go to the home page
      </Link>
    </div>
  );
}
