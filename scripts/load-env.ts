import { loadEnvConfig } from "@next/env";

// The same .env files, in the same order, as `next dev` / `next start` read them.
loadEnvConfig(process.cwd(), process.env.NODE_ENV === "development");
