import { expect, test } from "@playwright/test";
import { openDatabase } from "@/lib/db";

// The answer form's retry, in a real browser against the real server: the first send reaches the
// server and is stored, but its reply is lost on the way back. The form says it is trying again,
// sends the same Idempotency-Key, and the server answers from the stored reply: one try spent.
test("a lost reply is retried with the same key and the try counts once", async ({ page }) => {
  const made = await page.request.post("/api/practice", { data: { kind: "even-gap", level: 1 } });
  expect(made.status()).toBe(201);
  const { problem } = (await made.json()) as { problem: { id: string; parts: { key: string; label: string }[]; attemptsAllowed: number } };
  await page.goto(`/practice/${problem.id}`);

  const keys: string[] = [];
  let release = () => {};
  const retryHeld = new Promise<void>((resolve) => (release = resolve));
  await page.route(`**/api/practice/${problem.id}/answers`, async (route) => {
    keys.push(route.request().headers()["idempotency-key"]);
    if (keys.length === 1) {
      // Stored on the server; the browser never hears back.
      await route.fetch();
      return route.abort("connectionreset");
    }
    await retryHeld;
    return route.continue();
  });

  // Whole numbers: readable for every part, and never this layout's answers.
  for (const part of problem.parts) await page.getByRole("textbox", { name: part.label }).fill("997");
  await page.getByRole("button", { name: "Check answers" }).click();
  await expect(page.getByRole("button", { name: "Saving…" })).toBeVisible();
  await expect(page.getByText("Could not reach the server, trying again (1 of 2)")).toBeVisible();
  release();

  await expect(page.getByText(`${problem.attemptsAllowed - 1} tries left`)).toBeVisible();
  expect(keys).toHaveLength(2);
  expect(keys[0]).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
  expect(keys[1]).toBe(keys[0]);

  const database = openDatabase(process.env.E2E_DATABASE_PATH!);
  try {
    const stored = await database.models.PracticeProblem.findByPk(problem.id, { raw: true });
    expect(stored?.attemptsUsed).toBe(1);
  } finally {
    await database.sequelize.close();
  }
});
