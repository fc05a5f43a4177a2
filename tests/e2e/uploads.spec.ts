import crypto from "node:crypto";
import bcrypt from "bcryptjs";
import sharp from "sharp";
import { expect, test, type Page } from "@playwright/test";
import { openDatabase } from "@/lib/db";
import { expectSignedInAs, signIn } from "./helpers";

// Shop photos in Chromium: the student sends photos from the assignment page (section "Shop
// photos"), the instructor sees them on the student's review page and comments, the student
// reads the comment. Accounts, class and assignment are made for this file alone.

const PASSWORD = "photo-bench-1616";
const DAY = 24 * 60 * 60 * 1000;
const run = crypto.randomBytes(3).toString("hex");
const instructor = { email: `e2e-photos-teacher-${run}@example.com`, name: "Hollis Brandt" };
const student = { email: `e2e-photos-student-${run}@example.com`, name: "Rosa Quintero" };
const ids = { classId: 0, assignmentId: 0, studentId: 0 };

test.beforeAll(async () => {
  const database = openDatabase(process.env.E2E_DATABASE_PATH!);
  const { User, SchoolClass, Enrollment, Assignment, AssignmentItem } = database.models;
  const passwordHash = await bcrypt.hash(PASSWORD, 10);
  const teacher = await User.create({ ...instructor, role: "instructor", passwordHash });
  const learner = await User.create({ ...student, role: "student", passwordHash });
  const shop = await SchoolClass.create({ name: "Interior Trim", term: "Fall", joinCode: `PH${run}`.toUpperCase(), instructorId: teacher.id });
  await Enrollment.create({ classId: shop.id, studentId: learner.id, status: "active" });
  const assignment = await Assignment.create({
    classId: shop.id,
    title: "Wainscot battens",
    instructions: "Lay out the battens on the mock-up wall and send a photo of your marks.",
    opensAt: new Date(Date.now() - DAY),
    dueAt: new Date(Date.now() + 7 * DAY),
    status: "published",
    publishedAt: new Date(),
  });
  await AssignmentItem.create({ assignmentId: assignment.id, position: 1, kind: "even-gap", level: 1, problemCount: 1, points: 10 });
  Object.assign(ids, { classId: shop.id, assignmentId: assignment.id, studentId: learner.id });
  await database.sequelize.close();
});

const studentPage = () => `/my-classes/${ids.classId}/assignments/${ids.assignmentId}`;
const reviewPage = () => `/classes/${ids.classId}/assignments/${ids.assignmentId}/students/${ids.studentId}`;

async function photo(width = 1600, height = 1200): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: "#c8b89a", noise: { type: "gaussian", mean: 150, sigma: 35 } } })
    .withExif({ IFD0: { Artist: "phone-owner" } })
    .jpeg()
    .toBuffer();
}

function photosSection(page: Page) {
  return page.getByRole("region", { name: "Shop photos" });
}

test("a student sends shop photos, the instructor comments, the student reads it", async ({ browser }) => {
  // Two people, two sign-ins and five uploads: a longer walk than the default 30 s allows.
  test.setTimeout(90_000);
  const studentSide = await browser.newPage();
  await signIn(studentSide, student.email, PASSWORD);
  await expectSignedInAs(studentSide, student.name);
  await studentSide.goto(studentPage());
  const photos = photosSection(studentSide);
  await expect(photos.getByText("0 of 5 photos")).toBeVisible();
  await expect(photos.getByText("No photos yet.")).toBeVisible();

  // Hold each upload's reply briefly so the progress bar can be seen while the server works.
  await studentSide.route(`**/api/assignments/${ids.assignmentId}/uploads`, async (route) => {
    if (route.request().method() === "POST") await new Promise((r) => setTimeout(r, 700));
    await route.continue();
  });
  const chooser = photos.getByLabel("Choose photos");
  await chooser.setInputFiles([
    { name: "mock-up.jpg", mimeType: "image/jpeg", buffer: await photo() },
    { name: "layout-plan.jpg", mimeType: "image/jpeg", buffer: Buffer.from("%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n") },
  ]);
  const bar = photos.getByRole("progressbar", { name: "mock-up.jpg" });
  await expect(bar).toBeVisible();
  await expect(bar).toHaveAttribute("aria-valuenow", /^\d+$/);

  await expect(photos.getByText("1 of 5 photos")).toBeVisible({ timeout: 15_000 });
  const stored = photos.getByRole("img", { name: "Your photo mock-up.jpg" });
  await expect(stored).toBeVisible();
  // The thumbnail is fetched from the photo route after the list updates; wait for it to decode.
  await stored.scrollIntoViewIfNeeded();
  await expect.poll(() => stored.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBe(320);
  await expect(photos.getByText("That file is a PDF, not a photo. Send a JPEG, PNG or WebP.")).toBeVisible();
  await photos.getByRole("button", { name: "Dismiss the message about layout-plan.jpg" }).click();
  await expect(photos.getByText(/That file is a PDF/)).toHaveCount(0);

  // Too big for the limit: refused in the browser, before anything is sent.
  let sentBig = false;
  studentSide.on("request", (req) => {
    if (req.method() === "POST" && req.postDataBuffer()?.includes("huge-panorama.jpg")) sentBig = true;
  });
  await chooser.setInputFiles({ name: "huge-panorama.jpg", mimeType: "image/jpeg", buffer: Buffer.alloc(11 * 1024 * 1024, 1) });
  const refusedBig = photos.getByRole("listitem").filter({ hasText: "huge-panorama.jpg" });
  await expect(refusedBig.getByRole("alert")).toHaveText(/^This one is 11\.0\sMB; a photo can be at most 10\.0\sMB\./);
  expect(sentBig).toBe(false);

  // A second photo, then deleted with confirmation, by keyboard.
  await chooser.setInputFiles({ name: "second-try.jpg", mimeType: "image/jpeg", buffer: await photo(900, 1200) });
  await expect(photos.getByText("2 of 5 photos")).toBeVisible({ timeout: 15_000 });
  await photos.getByRole("button", { name: "Delete second-try.jpg" }).focus();
  await studentSide.keyboard.press("Enter");
  await expect(photos.getByRole("button", { name: "Keep it" })).toBeFocused();
  await studentSide.keyboard.press("Enter");
  await expect(photos.getByText("2 of 5 photos")).toBeVisible();
  await photos.getByRole("button", { name: "Delete second-try.jpg" }).click();
  await photos.getByRole("button", { name: "Yes, delete it" }).click();
  await expect(photos.getByText("1 of 5 photos")).toBeVisible();
  await expect(photos.getByRole("img", { name: "Your photo second-try.jpg" })).toHaveCount(0);

  // The instructor's side.
  const teacherSide = await browser.newPage();
  await signIn(teacherSide, instructor.email, PASSWORD);
  await expectSignedInAs(teacherSide, instructor.name);
  await teacherSide.goto(reviewPage());
  const review = photosSection(teacherSide);
  await expect(review.getByText("1 photo", { exact: true })).toBeVisible();
  const thumb = review.getByRole("img", { name: "Photo 1: mock-up.jpg" });
  await expect(thumb).toBeVisible();
  const fullLink = review.getByRole("link", { name: /mock-up\.jpg/ });
  await expect(fullLink).toHaveAttribute("target", "_blank");
  const full = await teacherSide.request.get((await fullLink.getAttribute("href"))!);
  expect(full.headers()["content-type"]).toBe("image/jpeg");
  expect((await sharp(await full.body()).metadata()).exif).toBeUndefined();

  const box = review.getByLabel("Comment on photo 1");
  await box.fill("Marks are clear. Start the layout from the centre next time so the end gaps match.");
  await expect(review.getByText("Not saved yet.")).toBeVisible();
  await review.getByRole("button", { name: "Save comment" }).click();
  await expect(review.getByText("Saved. The student sees it under the photo.")).toBeVisible();
  await teacherSide.reload();
  await expect(photosSection(teacherSide).getByLabel("Comment on photo 1")).toHaveValue(/Start the layout from the centre/);

  await studentSide.reload();
  const reread = photosSection(studentSide);
  await expect(reread.getByText(`${instructor.name} wrote`)).toBeVisible();
  await expect(reread.getByText(/Start the layout from the centre next time/)).toBeVisible();

  // A photo sent after the page loaded with one already stored joins it; it does not replace it.
  await reread.getByLabel("Choose photos").setInputFiles({ name: "after-comment.png", mimeType: "image/png", buffer: await sharp(await photo(800, 600)).png().toBuffer() });
  await expect(reread.getByText("2 of 5 photos")).toBeVisible({ timeout: 15_000 });
  await expect(reread.getByRole("img", { name: /^Your photo / })).toHaveCount(2);
  await teacherSide.close();
  await studentSide.close();
});

test.describe("on a phone", () => {
  test.use({ viewport: { width: 360, height: 740 }, isMobile: true, hasTouch: true });

  test("the photo section fits a 360 px screen", async ({ page }) => {
    await signIn(page, student.email, PASSWORD);
    await expectSignedInAs(page, student.name);
    await page.goto(studentPage());
    // A phone project runs in its own worker, with its own accounts from beforeAll: send a photo here.
    const photos = photosSection(page);
    await photos.getByLabel("Choose photos").setInputFiles({ name: "IMG_20261130_153212_wainscot_dry_fit_from_my_phone.jpg", mimeType: "image/jpeg", buffer: await photo(1200, 1600) });
    await expect(photos.getByRole("img", { name: "Your photo IMG_20261130_153212_wainscot_dry_fit_from_my_phone.jpg" })).toBeVisible({ timeout: 15_000 });
    await expect(photos.getByRole("button", { name: "Delete IMG_20261130_153212_wainscot_dry_fit_from_my_phone.jpg" })).toBeVisible();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
  });
});
