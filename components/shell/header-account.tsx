"use client";

import Link from "next/link";
import useSWR from "swr";
import type { SessionUser } from "@/lib/auth/roles";
import { navFor } from "@/lib/navigation";
import { NavLinks } from "./nav-links";
import { UserMenu } from "./user-menu";

// The header asks who is signed in from the browser, so the pages around it (lessons above
// all) can be rendered once at build time. Every page still checks on the server itself.
async function fetchMe(url: string): Promise<SessionUser | null> {
  const res = await fetch(url);
  if (res.status === 401) return null;
  if (!res.ok) throw new Error("Could not check your sign-in.");
  return ((await res.json()) as { user: SessionUser }).user;
}

function useCurrentUser() {
  return useSWR("/api/me", fetchMe, { revalidateOnFocus: true });
}

export function HeaderNav() {
  const { data: user } = useCurrentUser();
  return <NavLinks items={navFor(user?.role ?? null)} />;
}

export function HeaderAccount() {
  const { data: user, isLoading } = useCurrentUser();
  if (isLoading) return <span className="inline-block min-h-touch w-24" aria-hidden="true" />;
  if (user) return <UserMenu user={user} />;
  return (
    <>
      <Link href="/signin" className="btn-quiet">
        Sign in
      </Link>
      <Link href="/signup" className="btn-primary hidden sm:inline-flex">
        Create account
      </Link>
    </>
  );
}
