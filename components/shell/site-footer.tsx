import Link from "next/link";

export function SiteFooter() {
  return (
    <footer data-chrome className="mt-16 border-t border-rule bg-paper-sunk">
      <div className="mx-auto flex max-w-page flex-col gap-2 px-4 py-6 text-sm text-ink-soft sm:flex-row sm:items-center sm:justify-between">
        <p>Sixteenths — layout math for the carpentry shop. Measure twice; check your local code.</p>
        <nav aria-label="Footer">
          <ul className="flex gap-4">
            <li>
              <Link href="/safety">Shop safety</Link>
            </li>
          </ul>
        </nav>
      </div>
    </footer>
  );
}
