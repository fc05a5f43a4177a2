import bcrypt from "bcryptjs";
import type { Database } from "@/lib/db";
import type { Role } from "@/models";

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
};

export type DemoLogin = { email: string; role: Role; note: string };

/** Idempotent: finds before it creates, so a second run changes nothing. */
export async function seedDemo({ sequelize, models }: Database, cost: number): Promise<DemoLogin[]> {
  const { User, SchoolClass, Enrollment, ClassInstructor } = models;
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, cost);

  await sequelize.transaction(async (transaction) => {
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
  });

  return [
    ...DEMO_STAFF.map(({ email, role, note }) => ({ email, role, note })),
    { email: DEMO_STUDENTS[0].email, role: "student" as const, note: `student, CARP 110 (and ${DEMO_STUDENTS.length - 1} more like it)` },
  ];
}
