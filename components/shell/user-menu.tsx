"use client";

import Link from "next/link";
import { useEffect, useRef } from "react";
import type { SessionUser } from "@/lib/auth/roles";

// The header is on every page; next-auth's browser client is fetched only when someone signs out.
async function signOutToHome() {
  const { signOut } = await import("next-auth/react");
  await signOut({ callbackUrl: "/" });
}

const ROLE_LABEL = { student: "Student", instructor: "Instructor", admin: "Program admin" } as const;

export function UserMenu({ user }: { user: SessionUser }) {
  const menu = useRef<HTMLDetailsElement>(null);

  // Close on Escape or a click elsewhere, as a menu should.
  useEffect(() => {
    const close = (event: Event) => {
      const el = menu.current;
      if (!el?.open) return;
      if (event instanceof KeyboardEvent ? event.key === "Escape" : !el.contains(event.target as Node)) {
        el.open = false;
        if (event instanceof KeyboardEvent) el.querySelector("summary")?.focus();
      }
    };
    document.addEventListener("keydown", close);
    document.addEventListener("click", close);
    return () => {
      document.removeEventListener("keydown", close);
      document.removeEventListener("click", close);
    };
  }, []);

  const initials = user.name
    .split(/\s+/)
    .map((part) => part[0])
    .slice(0, 2)
    .join("")
    .toUpperCase();

  return (
    <details ref={menu} className="relative">
      <summary
        className="flex min-h-touch cursor-pointer list-none items-center gap-2 rounded px-2 hover:bg-paper-sunk [&::-webkit-details-marker]:hidden"
        aria-label={`Account menu for ${user.name}`}
      >
        <span aria-hidden="true" className="grid size-9 place-items-center rounded-full bg-ink text-sm font-bold text-paper">
          {initials}
        </span>
        <span className="hidden max-w-40 truncate font-semibold sm:inline">{user.name}</span>
      </summary>
      <div className="card absolute right-0 z-20 mt-1 w-64 p-3 shadow-lg">
        <p className="font-semibold">{user.name}</p>
        <p className="truncate text-sm text-ink-soft">{user.email}</p>
        <p className="mt-1 text-xs font-semibold uppercase tracking-wide text-ink-faint">{ROLE_LABEL[user.role]}</p>
        <Link href="/layouts" className="btn-quiet mt-3 w-full">
          My layouts
        </Link>
        <button type="button" className="btn-quiet mt-2 w-full" onClick={signOutToHome}>
          Sign out
        </button>
      </div>
    </details>
  );
}
