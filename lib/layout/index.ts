// The layout engine in one import for the calculators, the problem kinds and the grader.
// The cut list's packing internals (cut-list-exact, cut-list-heuristic) stay private.
export * from "./core";
export * from "./measure";
export * from "./expression";
export * from "./schema";
export * from "./measure-schema";
export * from "./serialize";
export * from "./lumber";
export * from "./spacing";
export * from "./spacing-schema";
export * from "./guards";
export * from "./guards-schema";
export * from "./stairs";
export * from "./stairs-schema";
export * from "./cut-list";
export * from "./cut-list-schema";
export * from "./wall-grid";
export * from "./wall-grid-schema";
