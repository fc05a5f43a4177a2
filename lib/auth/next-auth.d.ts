import type { Role } from "@/models";

declare module "next-auth" {
  interface User {
    role: Role;
    sessionVersion: number;
  }
  interface Session {
    user: { id: number; email: string; name: string; role: Role };
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    uid: number;
    role: Role;
    /** The account's session version at sign-in; absent in tokens issued before versions existed (read as 0). */
    sv?: number;
  }
}
