import type { Sequelize } from "sequelize";
import { Assignment } from "./assignment";
import { AssignmentExtension } from "./assignment-extension";
import { AssignmentItem } from "./assignment-item";
import { Attempt } from "./attempt";
import { ClassInstructor } from "./class-instructor";
import { EmailOutbox } from "./email-outbox";
import { Enrollment } from "./enrollment";
import { Invitation } from "./invitation";
import { LessonProgress } from "./lesson-progress";
import { PasswordReset } from "./password-reset";
import { PracticeProblem } from "./practice-problem";
import { SavedLayout } from "./saved-layout";
import { SchoolClass } from "./school-class";
import { ScoreOverride } from "./score-override";
import { Upload } from "./upload";
import { User } from "./user";

export { Assignment, AssignmentExtension, AssignmentItem, Attempt, ClassInstructor, EmailOutbox, Enrollment, Invitation, LessonProgress, PasswordReset, PracticeProblem, SavedLayout, SchoolClass, ScoreOverride, Upload, User };
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
  Invitation: typeof Invitation;
  PasswordReset: typeof PasswordReset;
  EmailOutbox: typeof EmailOutbox;
  Assignment: typeof Assignment;
  AssignmentItem: typeof AssignmentItem;
  AssignmentExtension: typeof AssignmentExtension;
  Upload: typeof Upload;
  ScoreOverride: typeof ScoreOverride;
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
    Invitation.initModel(sequelize);
    PasswordReset.initModel(sequelize);
    EmailOutbox.initModel(sequelize);
    Assignment.initModel(sequelize);
    AssignmentItem.initModel(sequelize);
    AssignmentExtension.initModel(sequelize);
    Upload.initModel(sequelize);
    ScoreOverride.initModel(sequelize);

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
    Invitation.belongsTo(SchoolClass, { as: "schoolClass", foreignKey: "classId" });
    Invitation.belongsTo(User, { as: "inviter", foreignKey: "invitedBy" });
    Invitation.belongsTo(User, { as: "acceptor", foreignKey: "acceptedBy" });
    PasswordReset.belongsTo(User, { as: "user", foreignKey: "userId" });
    Assignment.belongsTo(SchoolClass, { as: "schoolClass", foreignKey: "classId" });
    Assignment.belongsTo(User, { as: "author", foreignKey: "createdBy" });
    SchoolClass.hasMany(Assignment, { as: "assignments", foreignKey: "classId" });
    Assignment.hasMany(AssignmentItem, { as: "items", foreignKey: "assignmentId" });
    AssignmentItem.belongsTo(Assignment, { as: "assignment", foreignKey: "assignmentId" });
    Assignment.hasMany(AssignmentExtension, { as: "extensions", foreignKey: "assignmentId" });
    AssignmentExtension.belongsTo(Assignment, { as: "assignment", foreignKey: "assignmentId" });
    AssignmentExtension.belongsTo(User, { as: "student", foreignKey: "studentId" });
    AssignmentExtension.belongsTo(User, { as: "granter", foreignKey: "grantedBy" });
    PracticeProblem.belongsTo(AssignmentItem, { as: "assignmentItem", foreignKey: "assignmentItemId" });
    AssignmentItem.hasMany(PracticeProblem, { as: "problems", foreignKey: "assignmentItemId" });
    Attempt.belongsTo(AssignmentItem, { as: "assignmentItem", foreignKey: "assignmentItemId" });
    Upload.belongsTo(Assignment, { as: "assignment", foreignKey: "assignmentId" });
    Upload.belongsTo(User, { as: "student", foreignKey: "studentId" });
    Upload.belongsTo(User, { as: "commenter", foreignKey: "commentBy" });
    ScoreOverride.belongsTo(Assignment, { as: "assignment", foreignKey: "assignmentId" });
    ScoreOverride.belongsTo(User, { as: "student", foreignKey: "studentId" });
    ScoreOverride.belongsTo(User, { as: "author", foreignKey: "createdBy" });
    initialisedFor = sequelize;
  }
  return { User, SchoolClass, Enrollment, ClassInstructor, SavedLayout, LessonProgress, PracticeProblem, Attempt, Invitation, PasswordReset, EmailOutbox, Assignment, AssignmentItem, AssignmentExtension, Upload, ScoreOverride };
}
