"use client";

import useSWR from "swr";
import type { SessionUser } from "@/lib/auth/roles";

// Pages ask who is signed in from the browser, so the pages around them (lessons above all)
// can be rendered once at build time. Every page and route still checks on the server itself.
async function fetchMe(url: string): Promise<SessionUser | null> {
  const res = await fetch(url);
  if (res.status === 401) return null;
  if (!res.ok) throw new Error("Could not check your sign-in.");
  return ((await res.json()) as { user: SessionUser }).user;
}

export function useCurrentUser() {
  return useSWR("/api/me", fetchMe, { revalidateOnFocus: true });
}
