import { NextResponse } from "next/server";
import { consume } from "@/lib/auth/rate-limit";
import { readJson, withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { commitImport, previewImport } from "@/lib/classes/import";
import { classParamsSchema, rosterImportSchema } from "@/lib/classes/schemas";

/** { csv, dryRun: true } previews every row and writes nothing; dryRun: false sends every good row in one transaction. */
export const POST = withAuth<{ classId: string }>([...TEACHING_ROLES], async (req, { user, params }) => {
  const { classId } = classParamsSchema.parse(params);
  const { csv, dryRun } = rosterImportSchema.parse(await readJson(req));
  if (dryRun) return NextResponse.json(await previewImport(user, classId, csv));
  // Only the commit sends mail, so only it counts against the invitation limit.
  await consume("sendInvitations", `user:${user.id}`);
  return NextResponse.json(await commitImport(user, classId, csv), { status: 201 });
});
