import { Op, type Transaction } from "sequelize";
import { hashPassword, type PublicUser } from "@/lib/accounts/users";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { writeTransaction } from "./manage";
import { hashToken } from "./tokens";

export type InvitationView =
  | { state: "unknown" }
  | { state: "used" | "revoked" | "expired" | "closed"; className: string }
  | { state: "open"; email: string; name: string | null; className: string; term: string; instructorName: string; accountExists: boolean; expiresAt: string };

const looksLikeToken = (token: string) => /^[A-Za-z0-9_-]{20,100}$/.test(token);

async function findByToken(token: string, transaction?: Transaction) {
  if (!looksLikeToken(token)) return null;
  const { Invitation, SchoolClass, User } = db().models;
  const invitation = await Invitation.findOne({
    where: { tokenHash: hashToken(token) },
    include: [{ model: SchoolClass, as: "schoolClass", include: [{ model: User, as: "instructor", attributes: ["name"] }] }],
    transaction,
  });
  if (!invitation) return null;
  const schoolClass = (invitation as unknown as { schoolClass: { id: number; name: string; term: string; archivedAt: Date | null; instructor: { name: string } } }).schoolClass;
  return { invitation, schoolClass };
}

/** What the invitation page shows; never says more than the link itself already proves. */
export async function viewInvitation(token: string): Promise<InvitationView> {
  const found = await findByToken(token);
  if (!found) return { state: "unknown" };
  const { invitation, schoolClass } = found;
  const className = schoolClass.name;
  if (invitation.acceptedAt) return { state: "used", className };
  if (invitation.revokedAt) return { state: "revoked", className };
  if (invitation.expiresAt.getTime() <= Date.now()) return { state: "expired", className };
  if (schoolClass.archivedAt) return { state: "closed", className };
  const account = await db().models.User.findOne({ attributes: ["id"], where: { email: invitation.email } });
  return {
    state: "open",
    email: invitation.email,
    name: invitation.name ?? null,
    className,
    term: schoolClass.term,
    instructorName: schoolClass.instructor.name,
    accountExists: Boolean(account),
    expiresAt: invitation.expiresAt.toISOString(),
  };
}

const REFUSALS: Record<Exclude<InvitationView["state"], "open">, string> = {
  unknown: "This invitation link is not valid. Check that the whole link was copied, or ask your instructor to send a new one.",
  used: "This invitation has already been used. Sign in to find the class under My classes.",
  revoked: "This invitation was cancelled, usually because a newer one was sent. Use the newest e-mail, or ask your instructor to resend it.",
  expired: "This invitation has run out. Ask your instructor to send a new one.",
  closed: "This class is closed. Ask your instructor if you still need to join.",
};

export function refusalFor(state: Exclude<InvitationView["state"], "open">): string {
  return REFUSALS[state];
}

/** Makes the student active in the class (re-adding a removed one) and closes their other open invitations there. */
export async function enrollActive(transaction: Transaction, classId: number, student: { id: number; email: string }): Promise<void> {
  const { Enrollment, Invitation } = db().models;
  const existing = await Enrollment.findOne({ where: { classId, studentId: student.id }, transaction });
  if (existing) await existing.update({ status: "active" }, { transaction });
  else await Enrollment.create({ classId, studentId: student.id, status: "active" }, { transaction });
  await Invitation.update(
    { acceptedAt: new Date(), acceptedBy: student.id },
    { where: { classId, email: student.email, acceptedAt: null, revokedAt: null }, transaction },
  );
}

export type Accepted = { classId: number; className: string; email: string; createdAccount: boolean };

/**
 * Accepts an invitation: for the signed-in student whose e-mail it was sent to, or by making a new
 * student account. Everything happens in one write transaction that starts by claiming the
 * invitation with a guarded UPDATE, so a double click or a second tab gets "already used".
 */
export async function acceptInvitation(token: string, signedIn: SessionUser | null, newAccount: { name: string; password: string } | null): Promise<Accepted> {
  const found = await findByToken(token);
  if (!found) throw new AppError("not_found", REFUSALS.unknown);
  const { invitation, schoolClass } = found;
  if (signedIn) {
    if (signedIn.email !== invitation.email) {
      throw new AppError("forbidden", `This invitation was sent to ${invitation.email}, but you are signed in as ${signedIn.email}. Sign out and open the link again.`);
    }
    if (signedIn.role !== "student") throw new AppError("conflict", "Invitations add students; this e-mail belongs to an instructor account.");
  } else if (!newAccount) {
    throw new AppError("bad_request", "Enter your name and a password to make your account.", { name: "Enter your name.", password: "Choose a password." });
  }
  // bcrypt is slow on purpose; hash before taking the write lock.
  const passwordHash = !signedIn && newAccount ? await hashPassword(newAccount.password) : null;

  return writeTransaction(async (transaction) => {
    const { User } = db().models;
    const now = new Date();
    const [claimed] = await db().models.Invitation.update(
      { acceptedAt: now },
      { where: { id: invitation.id, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: now } }, transaction },
    );
    if (claimed !== 1) {
      const fresh = await db().models.Invitation.findByPk(invitation.id, { transaction });
      const state = fresh?.acceptedAt ? "used" : fresh?.revokedAt ? "revoked" : "expired";
      throw new AppError("conflict", REFUSALS[state]);
    }
    if (schoolClass.archivedAt) throw new AppError("conflict", REFUSALS.closed);

    let student: PublicUser | SessionUser;
    if (signedIn) student = signedIn;
    else {
      if (await User.findOne({ attributes: ["id"], where: { email: invitation.email }, transaction })) {
        throw new AppError("conflict", "An account with this e-mail already exists. Sign in first, then open the link again.");
      }
      const created = await User.create({ name: newAccount!.name, email: invitation.email, passwordHash: passwordHash!, role: "student" }, { transaction });
      student = { id: created.id, name: created.name, email: created.email, role: created.role };
    }
    await db().models.Invitation.update({ acceptedBy: student.id }, { where: { id: invitation.id }, transaction });
    await enrollActive(transaction, schoolClass.id, student);
    return { classId: schoolClass.id, className: schoolClass.name, email: invitation.email, createdAccount: !signedIn };
  });
}
