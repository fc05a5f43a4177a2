import crypto from "node:crypto";
import bcrypt from "bcryptjs";
import type { Database } from "@/lib/db";
import type { Role } from "@/models";
import { seedDemoHistory } from "./demo-history";

// The invented demo scenario: Harbor Ridge Technical College, program Carpentry & Joinery.
export const DEMO_PASSWORD = "layout-1616";

export const DEMO_STAFF: { name: string; email: string; role: Role; note: string }[] = [
  { name: "Dana Whitlock", email: "dana.whitlock@harborridge.example", role: "instructor", note: "instructor, CARP 110" },
  { name: "Marcus Ibarra", email: "marcus.ibarra@harborridge.example", role: "instructor", note: "co-instructor, CARP 110" },
  { name: "Renee Okafor", email: "renee.okafor@harborridge.example", role: "admin", note: "program coordinator (admin)" },
  { name: "Sam Lindqvist", email: "sam.lindqvist@example.com", role: "student", note: "self-learner, no class" },
];

export const DEMO_STUDENTS = [
  "Avery Castellanos",
  "Bashir Rahimi",
  "Caitlin Moreau",
  "Darnell Hughes",
  "Elena Sokolova",
  "Felix Tran",
  "Gabriela Nunes",
  "Harlan Whitehorse",
  "Imani Brooks",
  "Jonah Petersen",
  "Keiko Fujimoto",
  "Liam O'Rourke",
  "Maya Desai",
  "Nico Alvarado",
  "Olivia Mensah",
  "Priya Raman",
  "Quinn Harrington",
  "Rosa Delgado",
].map((name) => ({
  name,
  email: `${name.toLowerCase().replace(/[^a-z ]/g, "").replace(" ", ".")}@students.harborridge.example`,
}));

export const DEMO_CLASS = {
  name: "CARP 110 — Finish Carpentry I",
  term: "Spring 2027",
  program: "Carpentry & Joinery · Harbor Ridge Technical College",
  joinCode: "HRTC110",
  sectionCode: "A",
};

/** People invited to CARP 110 who have not accepted yet: the roster shows them as "invited". */
export const DEMO_INVITED = [
  { name: "Sofia Lindgren", email: "sofia.lindgren@students.harborridge.example" },
  { name: "Tomas Achebe", email: "tomas.achebe@students.harborridge.example" },
  { name: "Uma Kowalczyk", email: "uma.kowalczyk@students.harborridge.example" },
];

const DAY = 24 * 60 * 60 * 1000;

/**
 * CARP 110's assignments, dated from the day the demo is first seeded so there are two past due
 * (the first course weeks' tape and fractions, then even spacing), one due soon and one later.
 * Kinds and levels follow the course order; the list keeps its order for the code that indexes it.
 */
export const DEMO_ASSIGNMENTS = [
  {
    title: "Even spacing on the hallway wall",
    instructions: "Work each layout on paper first: subtract the members, divide by the **spaces**, round once to 1/16\".\n\nShow the marks from the left end.",
    opensIn: -17, dueIn: -7, latePolicy: "penalty" as const, latePenaltyPercent: 10, lateUntilIn: null, reveal: "when-final" as const, status: "published" as const,
    items: [
      { kind: "even-gap", level: 2, problemCount: 3, points: 4 },
      { kind: "mark-position", level: 2, problemCount: 2, points: 4 },
    ],
  },
  {
    title: "Battens and rails for the 141 1/2\" wall",
    instructions: "Deduct the base trim and both rails before you cut a single batten.",
    opensIn: -4, dueIn: 1, latePolicy: "until" as const, latePenaltyPercent: null, lateUntilIn: 4, reveal: "when-final" as const, status: "published" as const,
    items: [
      { kind: "batten-length", level: 2, problemCount: 2, points: 5 },
      { kind: "bay-rail", level: 2, problemCount: 2, points: 5 },
    ],
  },
  {
    title: "Stock to buy: boards, kerf and offcuts",
    instructions: "Allow 1/8\" for every saw kerf. Board feet to the nearest quarter.",
    opensIn: 0, dueIn: 10, latePolicy: "none" as const, latePenaltyPercent: null, lateUntilIn: null, reveal: "after-due" as const, status: "published" as const,
    items: [
      { kind: "stock-boards", level: 2, problemCount: 2, points: 6 },
      { kind: "lumber-board-feet", level: 1, problemCount: 2, points: 4 },
    ],
  },
  {
    title: "Porch guard and the 104 3/4\" stair",
    instructions: "Check every opening against the 4\" sphere rule and every riser against your local code.",
    opensIn: 12, dueIn: 21, latePolicy: "none" as const, latePenaltyPercent: null, lateUntilIn: null, reveal: "when-final" as const, status: "draft" as const,
    items: [
      { kind: "fewest-members", level: 2, problemCount: 2, points: 5 },
      { kind: "stair-risers", level: 2, problemCount: 2, points: 5 },
    ],
  },
  {
    title: "Reading the tape and fractions",
    instructions: "Read each mark to the nearest 1/16\". Add and subtract on paper, then reduce the fraction before you write it down.",
    opensIn: -35, dueIn: -21, latePolicy: "none" as const, latePenaltyPercent: null, lateUntilIn: null, reveal: "when-final" as const, status: "published" as const,
    items: [
      { kind: "tape-reading", level: 2, problemCount: 3, points: 3 },
      { kind: "fraction-arithmetic", level: 1, problemCount: 3, points: 3 },
    ],
  },
];

export type DemoLogin = { email: string; role: Role; note: string };

/** Idempotent: finds before it creates, so a second run changes nothing. */
export async function seedDemo({ sequelize, models }: Database, cost: number): Promise<DemoLogin[]> {
  const { User, SchoolClass, Enrollment, ClassInstructor, Invitation, Assignment, AssignmentItem } = models;
  const started = performance.now();
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, cost);

  const classId = await sequelize.transaction(async (transaction) => {
    const ensureUser = async (name: string, email: string, role: Role) => {
      const [user] = await User.findOrCreate({ where: { email }, defaults: { name, email, role, passwordHash }, transaction });
      return user;
    };
    const staff = new Map<string, number>();
    for (const person of DEMO_STAFF) staff.set(person.email, (await ensureUser(person.name, person.email, person.role)).id);

    const [carp110] = await SchoolClass.findOrCreate({
      where: { joinCode: DEMO_CLASS.joinCode },
      defaults: { ...DEMO_CLASS, instructorId: staff.get(DEMO_STAFF[0].email)! },
      transaction,
    });
    await ClassInstructor.findOrCreate({
      where: { classId: carp110.id, userId: staff.get(DEMO_STAFF[1].email)! },
      transaction,
    });
    for (const student of DEMO_STUDENTS) {
      const user = await ensureUser(student.name, student.email, "student");
      await Enrollment.findOrCreate({ where: { classId: carp110.id, studentId: user.id }, defaults: { status: "active" }, transaction });
    }
    const now = Date.now();
    for (const person of DEMO_INVITED) {
      // Only a hash is ever stored; nobody holds these links, so the instructor can resend them from the roster.
      await Invitation.findOrCreate({
        where: { classId: carp110.id, email: person.email },
        defaults: { ...person, tokenHash: crypto.createHash("sha256").update(crypto.randomBytes(32)).digest("hex"), invitedBy: carp110.instructorId, expiresAt: new Date(now + 7 * DAY) },
        transaction,
      });
    }
    for (const [index, a] of DEMO_ASSIGNMENTS.entries()) {
      const existing = await Assignment.findOne({ where: { classId: carp110.id, title: a.title }, transaction });
      if (existing) continue;
      const opensAt = new Date(now + a.opensIn * DAY);
      const created = await Assignment.create(
        {
          classId: carp110.id,
          title: a.title,
          instructions: a.instructions,
          opensAt,
          // Due at 5 pm UTC, the end of a shop day somewhere in the Americas.
          dueAt: new Date(new Date(now + a.dueIn * DAY).setUTCHours(17, 0, 0, 0)),
          latePolicy: a.latePolicy,
          lateUntil: a.lateUntilIn === null ? null : new Date(new Date(now + a.lateUntilIn * DAY).setUTCHours(17, 0, 0, 0)),
          latePenaltyPercent: a.latePenaltyPercent,
          attemptsAllowed: 3,
          reveal: a.reveal,
          status: a.status,
          publishedAt: a.status === "published" ? new Date(opensAt.getTime() - (index + 1) * 60_000) : null,
          createdBy: carp110.instructorId,
        },
        { transaction },
      );
      await AssignmentItem.bulkCreate(
        a.items.map((item, index) => ({ ...item, assignmentId: created.id, position: index + 1, tolerance: "half" as const })),
        { transaction },
      );
    }
    return carp110.id;
  });

  const history = await seedDemoHistory({ sequelize, models }, classId, DEMO_STUDENTS.map((s) => s.email), Date.now());
  if (history) {
    const seconds = ((performance.now() - started) / 1000).toFixed(1);
    console.log(`Demo class history: ${history.tries} tries on ${history.problems} problems, ${history.lessons} lessons read, ${history.photos} shop photos (demo seeded in ${seconds} s).`);
  }

  return [
    ...DEMO_STAFF.map(({ email, role, note }) => ({ email, role, note })),
    { email: DEMO_STUDENTS[0].email, role: "student" as const, note: `student, CARP 110 (and ${DEMO_STUDENTS.length - 1} more like it)` },
    { email: DEMO_STUDENTS[3].email, role: "student" as const, note: "student, CARP 110, with a graded past (keeps dividing by members)" },
  ];
}
