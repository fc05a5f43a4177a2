import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { gradebookCsv } from "@/lib/gradebook/export";
import { classParams, csvResponse } from "@/lib/gradebook/params";

export const GET = withAuth<{ classId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId } = classParams.parse(params);
  return csvResponse(await gradebookCsv(user, classId));
});
