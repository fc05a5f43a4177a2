import Link from "next/link";
import { getCurrentUser } from "@/lib/auth/session";
import { navFor } from "@/lib/navigation";
import { SpacesDiagram } from "@/components/shell/spaces-diagram";

export default async function HomePage() {
  const user = await getCurrentUser();
  return (
    <div className="space-y-12">
      <section className="grid items-center gap-8 md:grid-cols-[1.1fr_1fr]">
        <div className="space-y-4">
          <p className="text-sm font-semibold uppercase tracking-wider text-chalk-dark">Layout math for the carpentry shop</p>
          <h1 className="text-3xl">Count the spaces, not the boards.</h1>
          <p className="max-w-prose text-lg text-ink-soft">
            Take the members off the span, divide what is left by the spaces, round to the nearest 1/16&Prime; and mark every
            position from one end. Sixteenths teaches that step by step, gives every student their own numbers to practise on, and
            checks each answer the way a journeyman would.
          </p>
          {user ? (
            <div className="space-y-3">
              <p className="text-lg">
                Welcome back, <strong>{user.name.split(" ")[0]}</strong>.
              </p>
              <ul className="flex flex-wrap gap-3">
                {navFor(user.role).map((item) => (
                  <li key={item.href}>
                    <Link href={item.href} className="btn-primary">
                      {item.label}
                    </Link>
                  </li>
                ))}
              </ul>
            </div>
          ) : (
            <div className="flex flex-wrap gap-3">
              <Link href="/calculators" className="btn-primary">
                Open the calculators
              </Link>
              <Link href="/signup" className="btn-quiet">
                Create a free account
              </Link>
            </div>
          )}
        </div>
        <figure className="card p-4">
          <SpacesDiagram />
          <figcaption className="mt-3 text-sm text-ink-soft">
            Five battens flush at both ends leave <strong>four</strong> spaces: (span − 5 × width) ÷ 4.
          </figcaption>
        </figure>
      </section>

      <section aria-labelledby="who" className="space-y-4">
        <h2 id="who" className="text-2xl">
          Who it is for
        </h2>
        <ul className="grid gap-4 md:grid-cols-3">
          <li className="card p-5">
            <h3 className="text-lg">Students</h3>
            <p className="mt-2 text-ink-soft">
              Work spacing, batten and stair problems in fractions of an inch. Every student gets different numbers, and feedback names
              the slip — divided by the members instead of the spaces, forgot the trim, added rounded gaps.
            </p>
          </li>
          <li className="card p-5">
            <h3 className="text-lg">Instructors</h3>
            <p className="mt-2 text-ink-soft">
              Run a class with a join code, build assignments from problem kinds, and see in the gradebook who is stuck and on what —
              so tomorrow&rsquo;s demo at the bench covers the right thing.
            </p>
          </li>
          <li className="card p-5">
            <h3 className="text-lg">Self-learners</h3>
            <p className="mt-2 text-ink-soft">
              Laying out an accent wall or a porch guard at home? Read the lessons and work the same problems; an account keeps your
              progress.
            </p>
          </li>
        </ul>
      </section>

      <aside className="rounded-lg border-l-4 border-caution-edge bg-caution-bg p-4 text-ink">
        <p>
          <strong>Safety first.</strong> Saws, nailers, ladders and dust can hurt you. Read the <Link href="/safety">shop safety notes</Link>,
          follow your instructor and the tool&rsquo;s manual, and check stairs and guards against your local code.
        </p>
      </aside>
    </div>
  );
}
