import { createHash, randomBytes } from "node:crypto";
import { Op, Transaction } from "sequelize";
import { hashPassword } from "@/lib/accounts/users";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import { enqueueMail } from "@/lib/mail/outbox";
import { passwordResetMail, RESET_LINK_HOURS } from "@/lib/mail/templates/password-reset";

const LIFETIME_MS = RESET_LINK_HOURS * 60 * 60_000;

/** Only this hash is stored: a copy of the database does not let anyone reset a password. */
export function hashResetToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/**
 * Stores a reset for the account with this address and queues its e-mail in the same
 * transaction. An unknown address does nothing and says nothing: the route answers alike.
 */
export async function requestPasswordReset(email: string, now = new Date()): Promise<void> {
  const { User, PasswordReset } = db().models;
  const user = await User.findOne({ attributes: ["id", "email", "name"], where: { email } });
  if (!user) return;
  const token = randomBytes(32).toString("base64url");
  await db().sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    await PasswordReset.create({ userId: user.id, tokenHash: hashResetToken(token), expiresAt: new Date(now.getTime() + LIFETIME_MS) }, { transaction });
    await enqueueMail([passwordResetMail({ to: user.email, name: user.name, token })], transaction);
  });
}

export type ResetLinkState = "open" | "unknown" | "used" | "expired";
export type ResetLink = { state: ResetLinkState; email: string | null };

/** What a reset link can still do, for the page it lands on. The address is shown only to whoever holds the link. */
export async function inspectResetLink(token: string, now = new Date()): Promise<ResetLink> {
  const { PasswordReset, User } = db().models;
  const reset = token ? await PasswordReset.findOne({ where: { tokenHash: hashResetToken(token) } }) : null;
  if (!reset) return { state: "unknown", email: null };
  const user = await User.findByPk(reset.userId, { attributes: ["email"] });
  return { state: stateOf(reset, now), email: user?.email ?? null };
}

function stateOf(reset: { usedAt: Date | null; expiresAt: Date }, now: Date): ResetLinkState {
  if (reset.usedAt) return "used";
  if (reset.expiresAt.getTime() <= now.getTime()) return "expired";
  return "open";
}

const REFUSALS: Record<Exclude<ResetLinkState, "open">, string> = {
  unknown: "That reset link is not one we sent, or it was cut short when copied. Ask for a new link.",
  used: "That reset link has already been used. Ask for a new link if you still need one.",
  expired: "That reset link has run out (each one lasts an hour). Ask for a new link.",
};

/**
 * Sets the new password and spends the link, and every other open link of the same account,
 * in one transaction. Answers the account's address so the page can fill in the sign-in form.
 */
export async function confirmPasswordReset(token: string, password: string, now = new Date()): Promise<{ email: string }> {
  const { PasswordReset, User } = db().models;
  // Hashed before the transaction: bcrypt takes a while, and the write lock should not wait on it.
  const passwordHash = await hashPassword(password);
  const tokenHash = hashResetToken(token);
  // IMMEDIATE takes the write lock up front, so two uses of one link queue instead of racing.
  return db().sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const reset = await PasswordReset.findOne({ where: { tokenHash }, transaction });
    const state = reset ? stateOf(reset, now) : "unknown";
    if (!reset || state !== "open") {
      const why = REFUSALS[state as keyof typeof REFUSALS];
      throw new AppError("conflict", why, { token: why });
    }
    await User.update({ passwordHash }, { where: { id: reset.userId }, transaction });
    // Ends every session already open: whoever knew the old password may be signed in somewhere.
    await User.increment("sessionVersion", { by: 1, where: { id: reset.userId }, transaction });
    await PasswordReset.update({ usedAt: now }, { where: { userId: reset.userId, usedAt: { [Op.is]: null } }, transaction });
    const user = await User.findByPk(reset.userId, { attributes: ["email"], transaction });
    return { email: user!.email };
  });
}
