import { z } from "zod";

// Runs in the browser before the app hydrates. zod probes for `new Function` the first time it
// parses an object, to compile faster parsers; the Content-Security-Policy (next.config.ts) forbids
// eval, and Chromium reports that probe as a policy violation even though zod catches the refusal.
// Without eval zod parses the same way, only without the compiled fast path.
z.config({ jitless: true });
