import * as accountsAndClasses from "./20261201-0001-accounts-and-classes";
import * as savedLayouts from "./20261201-0002-saved-layouts";
import * as lessonProgress from "./20261202-0003-lesson-progress";
import * as practice from "./20261202-0004-practice";
import * as classesAssignmentsMail from "./20261203-0005-classes-assignments-mail";
import * as problemPartCount from "./20261203-0009-problem-part-count";
import * as scoreOverrides from "./20261204-0010-score-overrides";
import * as idempotencyKeys from "./20261205-0011-idempotency-keys";
import * as sessionVersion from "./20261205-0012-session-version";
import * as scoreReads from "./20261206-0013-score-reads";

// Listed by hand, in order, so the same list runs under tsx, vitest and Next without a file glob.
export const migrations = [
  { name: "20261201-0001-accounts-and-classes", ...accountsAndClasses },
  { name: "20261201-0002-saved-layouts", ...savedLayouts },
  { name: "20261202-0003-lesson-progress", ...lessonProgress },
  { name: "20261202-0004-practice", ...practice },
  { name: "20261203-0005-classes-assignments-mail", ...classesAssignmentsMail },
  { name: "20261203-0009-problem-part-count", ...problemPartCount },
  { name: "20261204-0010-score-overrides", ...scoreOverrides },
  { name: "20261205-0011-idempotency-keys", ...idempotencyKeys },
  { name: "20261205-0012-session-version", ...sessionVersion },
  { name: "20261206-0013-score-reads", ...scoreReads },
];
