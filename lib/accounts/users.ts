import bcrypt from "bcryptjs";
import { UniqueConstraintError } from "sequelize";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import type { Role } from "@/models";
import type { User } from "@/models";

export type PublicUser = { id: number; email: string; name: string; role: Role };

export function toPublicUser(user: User): PublicUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, env().BCRYPT_COST);
}

export async function createUser(input: { name: string; email: string; password: string; role?: Role }): Promise<PublicUser> {
  const { User } = db().models;
  const passwordHash = await hashPassword(input.password);
  try {
    const user = await User.create({ name: input.name, email: input.email, passwordHash, role: input.role ?? "student" });
    return toPublicUser(user);
  } catch (error) {
    if (error instanceof UniqueConstraintError) {
      throw new AppError("conflict", "An account with that e-mail already exists. Sign in instead, or reset the password.", {
        email: "An account with that e-mail already exists.",
      });
    }
    throw error;
  }
}

// Compared against when the e-mail is unknown, so a wrong e-mail takes as long as a wrong password.
let dummyHash: Promise<string> | undefined;

export async function verifyCredentials(email: string, password: string): Promise<PublicUser | null> {
  const { User } = db().models;
  const user = await User.findOne({ where: { email } });
  const ok = await bcrypt.compare(password, user?.passwordHash ?? (await (dummyHash ??= hashPassword("no account has this password"))));
  return user && ok ? toPublicUser(user) : null;
}

export async function findUserById(id: number): Promise<PublicUser | null> {
  const user = await db().models.User.findByPk(id);
  return user ? toPublicUser(user) : null;
}

export type UserPage = { users: (PublicUser & { createdAt: string })[]; page: number; pageCount: number; total: number };

export async function listUsers({ page, pageSize = 25, role }: { page: number; pageSize?: number; role?: Role }): Promise<UserPage> {
  const { User } = db().models;
  const where = role ? { role } : {};
  const total = await User.count({ where });
  const pageCount = Math.max(1, Math.ceil(total / pageSize));
  const current = Math.min(Math.max(1, page), pageCount);
  const rows = await User.findAll({ where, order: [["role", "ASC"], ["name", "ASC"]], limit: pageSize, offset: (current - 1) * pageSize });
  return {
    users: rows.map((u) => ({ ...toPublicUser(u), createdAt: u.createdAt.toISOString() })),
    page: current,
    pageCount,
    total,
  };
}
