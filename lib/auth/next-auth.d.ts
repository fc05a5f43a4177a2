import type { Role } from "@/models";

declare module "next-auth" {
  interface User {
    role: Role;
  }
  interface Session {
    user: { id: number; email: string; name: string; role: Role };
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    uid: number;
    role: Role;
  }
}
