// Runs once when the server starts. Mail queued before a restart (or whose retry came due while the
// server was down) would otherwise wait for the next action that queues mail.
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs" || process.env.NEXT_PHASE === "phase-production-build") return;
  const { kickDelivery } = await import("@/lib/mail/outbox");
  // After start-up, so serving the first requests is not held up by SMTP.
  setTimeout(() => {
    try {
      kickDelivery();
    } catch (error) {
      console.error("Mail delivery could not start:", error instanceof Error ? error.message : error);
    }
  }, 2_000).unref();
}
