import type { Sequelize } from "sequelize";
import { Attempt } from "./attempt";
import { ClassInstructor } from "./class-instructor";
import { Enrollment } from "./enrollment";
import { LessonProgress } from "./lesson-progress";
import { PracticeProblem } from "./practice-problem";
import { SavedLayout } from "./saved-layout";
import { SchoolClass } from "./school-class";
import { User } from "./user";

export { Attempt, ClassInstructor, Enrollment, LessonProgress, PracticeProblem, SavedLayout, SchoolClass, User };
export type { Role } from "./user";
export { ROLES } from "./user";

export type Models = {
  User: typeof User;
  SchoolClass: typeof SchoolClass;
  Enrollment: typeof Enrollment;
  ClassInstructor: typeof ClassInstructor;
  SavedLayout: typeof SavedLayout;
  LessonProgress: typeof LessonProgress;
  PracticeProblem: typeof PracticeProblem;
  Attempt: typeof Attempt;
};

let initialisedFor: Sequelize | undefined;

/** Binds the model classes to a connection; the schema itself comes from migrations, never sync(). */
export function initModels(sequelize: Sequelize): Models {
  if (initialisedFor !== sequelize) {
    User.initModel(sequelize);
    SchoolClass.initModel(sequelize);
    Enrollment.initModel(sequelize);
    ClassInstructor.initModel(sequelize);
    SavedLayout.initModel(sequelize);
    LessonProgress.initModel(sequelize);
    PracticeProblem.initModel(sequelize);
    Attempt.initModel(sequelize);

    SchoolClass.belongsTo(User, { as: "instructor", foreignKey: "instructorId" });
    User.hasMany(SchoolClass, { as: "taughtClasses", foreignKey: "instructorId" });
    Enrollment.belongsTo(SchoolClass, { as: "schoolClass", foreignKey: "classId" });
    Enrollment.belongsTo(User, { as: "student", foreignKey: "studentId" });
    SchoolClass.hasMany(Enrollment, { as: "enrollments", foreignKey: "classId" });
    User.hasMany(Enrollment, { as: "enrollments", foreignKey: "studentId" });
    ClassInstructor.belongsTo(SchoolClass, { as: "schoolClass", foreignKey: "classId" });
    ClassInstructor.belongsTo(User, { as: "user", foreignKey: "userId" });
    SchoolClass.hasMany(ClassInstructor, { as: "coInstructors", foreignKey: "classId" });
    SavedLayout.belongsTo(User, { as: "owner", foreignKey: "userId" });
    LessonProgress.belongsTo(User, { as: "learner", foreignKey: "userId" });
    PracticeProblem.belongsTo(User, { as: "learner", foreignKey: "userId" });
    PracticeProblem.hasMany(Attempt, { as: "attempts", foreignKey: "problemId" });
    Attempt.belongsTo(PracticeProblem, { as: "problem", foreignKey: "problemId" });
    Attempt.belongsTo(User, { as: "learner", foreignKey: "userId" });
    initialisedFor = sequelize;
  }
  return { User, SchoolClass, Enrollment, ClassInstructor, SavedLayout, LessonProgress, PracticeProblem, Attempt };
}
