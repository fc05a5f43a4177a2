import "./load-env";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { deliverDueMail } from "@/lib/mail/outbox";
import { queueDueReminders } from "@/lib/mail/reminders";
import { transport } from "@/lib/mail/transport";

// Run it as often as you like (cron every 15 minutes is plenty): each student is reminded of an
// assignment once. It also sends any other mail that is waiting, e.g. after an SMTP outage.

async function main() {
  const { DATABASE_PATH, SMTP_URL } = env();
  const queued = await queueDueReminders(new Date());
  let sent = 0;
  let failed = 0;
  for (;;) {
    const pass = await deliverDueMail();
    sent += pass.sent;
    failed += pass.failed;
    // A failed message waits for its retry time, so a pass that touched nothing means none are due.
    if (pass.sent + pass.failed === 0) break;
  }
  console.log(`queued ${queued}, sent ${sent}, failed ${failed}`);
  if (failed > 0) console.log(`Could not reach ${new URL(SMTP_URL).host} for every message; they stay queued in ${DATABASE_PATH} and are retried on the next run.`);
}

main()
  .then(async () => {
    transport().close();
    await db().sequelize.close();
  })
  .catch((error) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
