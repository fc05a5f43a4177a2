import createMDX from "@next/mdx";
import type { NextConfig } from "next";

// The Content-Security-Policy is a fixed header set here rather than a per-request nonce in
// proxy.ts: a nonce must be new for every response, which would make every page dynamic, and the
// lessons, calculators and home page are prerendered once at build time and served as files.
// The price is 'unsafe-inline' in script-src, which Next's inline bootstrap scripts
// (self.__next_f.push(...) carrying the server-component payload) need without a nonce; scripts
// from other origins, eval, plugins, <base> rewrites, foreign form targets and framing stay
// blocked. Inline styles are allowed because KaTeX's markup and recharts set style attributes.
// `next dev` evaluates code for fast refresh, so 'unsafe-eval' is added only there.
const isDev = process.env.NODE_ENV === "development";

const contentSecurityPolicy = [
  "default-src 'self'",
  `script-src 'self' 'unsafe-inline'${isDev ? " 'unsafe-eval'" : ""}`,
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join("; ");

// Sent with every response — pages, route handlers, static files and the not-found page.
const securityHeaders = [
  { key: "Content-Security-Policy", value: contentSecurityPolicy },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  // For browsers that predate frame-ancestors.
  { key: "X-Frame-Options", value: "DENY" },
  // Shop photos come from a plain file input (the phone's own camera app), so the page itself
  // never needs the camera, microphone or location.
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=()" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

const nextConfig: NextConfig = {
  pageExtensions: ["ts", "tsx", "md", "mdx"],
  // Sequelize requires optional drivers (pg, mysql) that Turbopack would try to bundle.
  serverExternalPackages: ["sequelize", "sqlite3"],
  poweredByHeader: false,
  // Lets two builds live side by side (e.g. parallel work on one checkout); tests start whichever is named.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  // forbidden() renders app/forbidden.tsx with a real 403 status.
  experimental: { authInterrupts: true },
  async headers() {
    return [{ source: "/:path*", headers: securityHeaders }];
  },
};

// Plugins are named as strings: Turbopack can only pass serializable options to the loader.
const withMDX = createMDX({
  options: {
    remarkPlugins: ["remark-gfm", "remark-math"],
    rehypePlugins: [["rehype-katex", { strict: false }]],
  },
});

export default withMDX(nextConfig);
