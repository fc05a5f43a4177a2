"use client";

import { useId } from "react";
import { useFieldArray, useWatch, type FieldErrors, type UseFormRegister } from "react-hook-form";
import { MAX_ITEMS, MAX_PROBLEMS_PER_ITEM } from "@/lib/assignments/schemas";
import { TOLERANCE_LABELS, pluralize, type KindOption } from "@/lib/assignments/teacher-format";
import { NEW_ITEM, type BuilderControl, type BuilderValues } from "./builder-values";
import type { PreviewRequest } from "./sample-preview";

type Props = {
  control: BuilderControl;
  register: UseFormRegister<BuilderValues>;
  errors: FieldErrors<BuilderValues>;
  kinds: KindOption[];
  locked: boolean;
  onPreview: (request: PreviewRequest) => void;
};

function groupBySkill(kinds: KindOption[]): [string, KindOption[]][] {
  const groups = new Map<string, KindOption[]>();
  for (const k of kinds) groups.set(k.skillTitle, [...(groups.get(k.skillTitle) ?? []), k]);
  return [...groups];
}

const fieldError = (message: string | undefined, id: string) =>
  message ? (
    <p id={id} className="mt-1 text-sm font-semibold text-danger">
      {message}
    </p>
  ) : null;

/** The list of items: each so many problems of one kind and level. Locked once ever published. */
export function BuilderItems({ control, register, errors, kinds, locked, onPreview }: Props) {
  const { fields, append, remove, move } = useFieldArray({ control, name: "items" });
  const items = useWatch({ control, name: "items" });
  const baseId = useId();
  const groups = groupBySkill(kinds);
  const listError = errors.items?.message ?? errors.items?.root?.message;

  return (
    <div className="space-y-4">
      {listError ? (
        <p role="alert" className="rounded border-l-4 border-danger bg-danger-bg px-3 py-2 font-semibold text-danger" data-field-error="items">
          {listError}
        </p>
      ) : null}
      <ol className="space-y-4">
        {fields.map((field, index) => {
          const item = items?.[index] ?? NEW_ITEM;
          const kind = kinds.find((k) => k.key === item.kind);
          const level = kind?.levels.find((l) => l.level === Number(item.level));
          const e = errors.items?.[index];
          const id = (name: string) => `${baseId}-${index}-${name}`;
          const subtotal = Number(item.problemCount) * Number(item.points);
          const preview = () => onPreview({ kind: item.kind, level: Number(item.level), tolerance: item.tolerance, itemNumber: index + 1 });
          if (locked) {
            return (
              <li key={field.id} className="card flex flex-wrap items-start justify-between gap-3 p-4" data-item={index}>
                <div>
                  <h3 className="text-base">
                    Item {index + 1}: {kind?.title ?? item.kind}
                  </h3>
                  <p className="text-sm text-ink-soft">
                    Level {String(item.level)}: {level?.label} · {pluralize(Number(item.problemCount), "problem")} × {pluralize(Number(item.points), "point")} · {TOLERANCE_LABELS[item.tolerance]}
                  </p>
                </div>
                <button type="button" className="btn-quiet min-h-9 px-3 text-sm" onClick={preview} disabled={!kind}>
                  Preview a sample
                </button>
              </li>
            );
          }
          return (
            <li key={field.id} className="card space-y-4 p-4" aria-labelledby={id("heading")} data-item={index}>
              <div className="flex flex-wrap items-center justify-between gap-2">
                <h3 id={id("heading")} className="text-base">
                  Item {index + 1}
                  <span className="font-normal text-ink-soft"> · {Number.isFinite(subtotal) && subtotal > 0 ? pluralize(subtotal, "point") : "no points yet"}</span>
                </h3>
                <div className="flex flex-wrap gap-2">
                  <button type="button" className="btn-quiet min-h-9 px-3 text-sm" onClick={preview} disabled={!kind}>
                    Preview a sample
                  </button>
                  <button type="button" className="btn-quiet min-h-9 px-3 text-sm" onClick={() => move(index, index - 1)} disabled={index === 0} aria-label={`Move item ${index + 1} up`}>
                        ↑<span className="hidden sm:inline">Up</span>
                      </button>
                      <button type="button" className="btn-quiet min-h-9 px-3 text-sm" onClick={() => move(index, index + 1)} disabled={index === fields.length - 1} aria-label={`Move item ${index + 1} down`}>
                        ↓<span className="hidden sm:inline">Down</span>
                      </button>
                      <button type="button" className="btn-quiet min-h-9 px-3 text-sm text-danger" onClick={() => remove(index)} aria-label={`Remove item ${index + 1}`}>
                        Remove
                      </button>
                </div>
              </div>

              <div className="grid gap-4 md:grid-cols-2">
                <div>
                  <label htmlFor={id("kind")} className="mb-1 block font-semibold">
                    Problem kind
                  </label>
                  <select id={id("kind")} className="input" aria-invalid={e?.kind ? true : undefined} aria-describedby={`${id("kind-summary")} ${id("kind-error")}`} {...register(`items.${index}.kind`)}>
                    {groups.map(([skill, list]) => (
                      <optgroup key={skill} label={skill}>
                        {list.map((k) => (
                          <option key={k.key} value={k.key}>
                            {k.title}
                          </option>
                        ))}
                      </optgroup>
                    ))}
                  </select>
                  <p id={id("kind-summary")} className="mt-1 text-sm text-ink-soft">
                    {kind?.summary ?? "Choose a kind of problem."}
                  </p>
                  {fieldError(e?.kind?.message, id("kind-error"))}
                </div>
                <div>
                  <label htmlFor={id("level")} className="mb-1 block font-semibold">
                    Level and precision
                  </label>
                  <select id={id("level")} className="input" aria-invalid={e?.level ? true : undefined} aria-describedby={`${id("level-desc")} ${id("level-error")}`} {...register(`items.${index}.level`)}>
                    {(kind?.levels ?? []).map((l) => (
                      <option key={l.level} value={l.level}>
                        {l.level} — {l.label}
                      </option>
                    ))}
                  </select>
                  <p id={id("level-desc")} className="mt-1 text-sm text-ink-soft">
                    {level?.description ?? ""}
                  </p>
                  {fieldError(e?.level?.message, id("level-error"))}
                </div>
              </div>

              <div className="grid gap-4 sm:grid-cols-3">
                <div>
                  <label htmlFor={id("count")} className="mb-1 block font-semibold">
                    Problems
                  </label>
                  <input id={id("count")} type="number" inputMode="numeric" min={1} max={MAX_PROBLEMS_PER_ITEM} className="input measure" aria-invalid={e?.problemCount ? true : undefined} aria-describedby={id("count-error")} {...register(`items.${index}.problemCount`)} />
                  {fieldError(e?.problemCount?.message, id("count-error"))}
                </div>
                <div>
                  <label htmlFor={id("points")} className="mb-1 block font-semibold">
                    Points each
                  </label>
                  <input id={id("points")} type="number" inputMode="numeric" min={1} max={100} className="input measure" aria-invalid={e?.points ? true : undefined} aria-describedby={id("points-error")} {...register(`items.${index}.points`)} />
                  {fieldError(e?.points?.message, id("points-error"))}
                </div>
                <div>
                  <label htmlFor={id("tolerance")} className="mb-1 block font-semibold">
                    Tolerance
                  </label>
                  <select id={id("tolerance")} className="input" aria-describedby={id("tolerance-hint")} {...register(`items.${index}.tolerance`)}>
                    {(["half", "full"] as const).map((t) => (
                      <option key={t} value={t}>
                        {TOLERANCE_LABELS[t]}
                      </option>
                    ))}
                  </select>
                  <p id={id("tolerance-hint")} className="mt-1 text-sm text-ink-soft">
                    A graduation is the level&rsquo;s 1/8, 1/16 or 1/32. Counts are always exact.
                  </p>
                  {fieldError(e?.tolerance?.message, id("tolerance-error"))}
                </div>
              </div>
            </li>
          );
        })}
      </ol>
      {locked ? (
        <p className="text-sm text-ink-soft">The problems are fixed because this assignment has been published: students already have their own numbers. Duplicate it to build a changed version.</p>
      ) : (
        <button type="button" className="btn-quiet" onClick={() => append({ ...NEW_ITEM })} disabled={fields.length >= MAX_ITEMS}>
          + Add an item
        </button>
      )}
    </div>
  );
}
