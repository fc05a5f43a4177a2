import createMDX from "@next/mdx";
import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  pageExtensions: ["ts", "tsx", "md", "mdx"],
  // Sequelize requires optional drivers (pg, mysql) that Turbopack would try to bundle.
  serverExternalPackages: ["sequelize", "sqlite3"],
  poweredByHeader: false,
  // Lets two builds live side by side (e.g. parallel work on one checkout); tests start whichever is named.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  // forbidden() renders app/forbidden.tsx with a real 403 status.
  experimental: { authInterrupts: true },
};

// Plugins are named as strings: Turbopack can only pass serializable options to the loader.
const withMDX = createMDX({
  options: {
    remarkPlugins: ["remark-gfm", "remark-math"],
    rehypePlugins: [["rehype-katex", { strict: false }]],
  },
});

export default withMDX(nextConfig);
