import * as accountsAndClasses from "./20261201-0001-accounts-and-classes";
import * as savedLayouts from "./20261201-0002-saved-layouts";

// Listed by hand, in order, so the same list runs under tsx, vitest and Next without a file glob.
export const migrations = [
  { name: "20261201-0001-accounts-and-classes", ...accountsAndClasses },
  { name: "20261201-0002-saved-layouts", ...savedLayouts },
];
