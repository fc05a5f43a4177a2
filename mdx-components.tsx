import type { MDXComponents } from "mdx/types";

// Lessons map their own components here as they are written; the defaults keep plain Markdown readable.
const components: MDXComponents = {};

export function useMDXComponents(): MDXComponents {
  return components;
}
