import { describe, expect, it } from "vitest";
import { runLoad } from "../support/load-run";

// The load benchmark's check at a size that fits the suite: its own app, killed with SIGKILL
// part-way through and started again on the same database, with every unacknowledged answer
// retried under its idempotency key. The shared suite app is never touched.
describe("answers under load through a crash", () => {
  it("every acknowledged answer is stored exactly once after a SIGKILL and a restart", async () => {
    const report = await runLoad({ students: 20, answersEach: 5, killAfter: 0.4, deadlineMs: 60_000 });
    expect(report.killedAtAcknowledged).toBeGreaterThanOrEqual(40);
    expect(report.killedAtAcknowledged).toBeLessThan(100);
    expect(report).toMatchObject({ sent: 100, acknowledged: 100, lost: 0, duplicates: 0, refused: 0 });
    // Every acknowledged answer is one stored try, and nothing else was stored.
    expect(report.stored).toBe(100);
    expect(report.unacknowledged).toBe(0);
  }, 120_000);
});
