import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import { calculatorPath, CALCULATOR_KINDS, calculatorTitle, type CalculatorKind } from "@/lib/calculators";
import type { SessionUser } from "@/lib/auth/roles";
import type { SavedLayout } from "@/models";

export type SavedLayoutView = {
  id: number;
  kind: CalculatorKind;
  calculator: string;
  name: string;
  params: string;
  href: string;
  updatedAt: string;
};

function view(row: SavedLayout): SavedLayoutView {
  const kind = (CALCULATOR_KINDS as readonly string[]).includes(row.kind) ? (row.kind as CalculatorKind) : "even-spacing";
  return {
    id: row.id,
    kind,
    calculator: calculatorTitle(kind),
    name: row.name,
    params: row.params,
    href: calculatorPath(kind, row.params),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export const MAX_SAVED_LAYOUTS = 200;

export async function listLayouts(user: SessionUser): Promise<SavedLayoutView[]> {
  const rows = await db().models.SavedLayout.findAll({ where: { userId: user.id }, order: [["updatedAt", "DESC"]], limit: MAX_SAVED_LAYOUTS });
  return rows.map(view);
}

export async function createLayout(user: SessionUser, input: { kind: CalculatorKind; name: string; params: string }): Promise<SavedLayoutView> {
  const { SavedLayout } = db().models;
  if ((await SavedLayout.count({ where: { userId: user.id } })) >= MAX_SAVED_LAYOUTS) {
    throw new AppError("conflict", `You already have ${MAX_SAVED_LAYOUTS} saved layouts; delete some before saving more.`);
  }
  return view(await SavedLayout.create({ userId: user.id, ...input }));
}

// Someone else's layout answers 404, the same as a missing one: ids do not reveal what exists.
async function ownLayout(user: SessionUser, id: number): Promise<SavedLayout> {
  const row = await db().models.SavedLayout.findOne({ where: { id, userId: user.id } });
  if (!row) throw new AppError("not_found", "There is no saved layout with that id in your account.");
  return row;
}

export async function renameLayout(user: SessionUser, id: number, name: string): Promise<SavedLayoutView> {
  const row = await ownLayout(user, id);
  row.name = name;
  await row.save();
  return view(row);
}

export async function deleteLayout(user: SessionUser, id: number): Promise<void> {
  await (await ownLayout(user, id)).destroy();
}
