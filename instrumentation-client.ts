import { config } from "zod/v4/core";

// Runs in the browser before the app hydrates. zod probes for `new Function` the first time it
// parses an object, to compile faster parsers; the Content-Security-Policy (next.config.ts) forbids
// eval, and Chromium reports that probe as a policy violation even though zod catches the refusal.
// Without eval zod parses the same way, only without the compiled fast path. The setting lives in
// zod's core (the same global the full `z` reads), so pages that never parse in the browser do not
// download all of zod for it.
config({ jitless: true });
