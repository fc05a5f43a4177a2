import { withAuth } from "@/lib/auth/route";
import { TEACHING_ROLES } from "@/lib/auth/roles";
import { studentRecordCsv } from "@/lib/gradebook/export";
import { csvResponse, studentParams } from "@/lib/gradebook/params";

/** One student's every assignment and every try, for the class's instructors. */
export const GET = withAuth<{ classId: string; studentId: string }>([...TEACHING_ROLES], async (_req, { user, params }) => {
  const { classId, studentId } = studentParams.parse(params);
  return csvResponse(await studentRecordCsv(user, classId, studentId));
});
