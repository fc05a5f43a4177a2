"use client";

import Link from "next/link";
import { navFor } from "@/lib/navigation";
import { NavLinks } from "./nav-links";
import { useCurrentUser } from "./use-current-user";
import { UserMenu } from "./user-menu";

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
