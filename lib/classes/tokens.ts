import crypto from "node:crypto";
import { JOIN_CODE_ALPHABET, JOIN_CODE_LENGTH } from "./schemas";

export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

/** Only the hash is stored, so a copy of the database does not hold working invitation links. */
export function hashToken(token: string): string {
  return crypto.createHash("sha256").update(token).digest("hex");
}

/** 32 random bytes as base64url: the link in the e-mail; the row keeps its SHA-256. */
export function newInvitationToken(now = Date.now()): { token: string; tokenHash: string; expiresAt: Date } {
  const token = crypto.randomBytes(32).toString("base64url");
  return { token, tokenHash: hashToken(token), expiresAt: new Date(now + INVITATION_LIFETIME_MS) };
}

/** 8 characters from 32 unambiguous ones: about 10^12 codes, and the join route is rate limited. */
export function generateJoinCode(): string {
  let code = "";
  for (let i = 0; i < JOIN_CODE_LENGTH; i++) code += JOIN_CODE_ALPHABET[crypto.randomInt(JOIN_CODE_ALPHABET.length)];
  return code;
}
