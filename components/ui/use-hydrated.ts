"use client";

import { useSyncExternalStore } from "react";

const noSubscription = () => () => {};

/**
 * False in the server HTML and during hydration, true once React owns the page. Forms use it to
 * keep their fields disabled until then: react-hook-form writes its default values into the
 * inputs as it registers them, so anything typed into the bare HTML would be silently replaced,
 * and a sign-in form submitted before its handler exists would send the password as a GET query.
 */
export function useHydrated(): boolean {
  return useSyncExternalStore(noSubscription, () => true, () => false);
}
