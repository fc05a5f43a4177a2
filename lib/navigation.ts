import type { Role } from "@/models";

export type NavItem = { href: string; label: string; roles?: readonly Role[] };

// Areas appear here as they are built; `roles` hides an item from everyone else
// (the pages check again on the server — hiding a link is not authorization).
export const NAV_ITEMS: readonly NavItem[] = [
  { href: "/lessons", label: "Lessons" },
  { href: "/calculators", label: "Calculators" },
  { href: "/practice", label: "Practice" },
  { href: "/my-classes", label: "My classes", roles: ["student"] },
  { href: "/my-progress", label: "My progress", roles: ["student"] },
  { href: "/classes", label: "Classes", roles: ["instructor", "admin"] },
  { href: "/admin/users", label: "Users", roles: ["admin"] },
  { href: "/admin/classes", label: "All classes", roles: ["admin"] },
];

export function navFor(role: Role | null): NavItem[] {
  return NAV_ITEMS.filter((item) => !item.roles || (role !== null && item.roles.includes(role)));
}

/** Only same-site paths are followed after sign-in; anything else goes home. */
export function safeCallbackPath(value: string | null | undefined): string {
  if (!value || !value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return "/";
  return value;
}
