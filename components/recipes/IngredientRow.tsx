"use client";
import { type FieldErrors, type UseFormRegister, useWatch } from "react-hook-form";
import { checkLabelEnergy, ingredientSchema, roundEnergy } from "@/lib/nutrition";
import type { FormControl, FormValues } from "./formSchema";

type NumKey = "amount" | "density" | "pieceGrams" | "energyKcal" | "protein" | "carbohydrate" | "fat" | "fibre";

/**
 * One ingredient: name, amount and unit (with a density for ml or a weight for
 * pieces), then the label's values per 100 g. Below it, as the coach types,
 * any impossible label and any energy that disagrees with the macros.
 */
export function IngredientRow({
  index,
  control,
  register,
  errors,
  onRemove,
}: {
  index: number;
  control: FormControl;
  register: UseFormRegister<FormValues>;
  errors: FieldErrors<FormValues>;
  onRemove: (() => void) | null;
}) {
  const row = useWatch({ control, name: `ingredients.${index}` });
  const rowErrors = errors.ingredients?.[index] as Record<string, { message?: string } | undefined> | undefined;
  const n = index + 1;
  const id = (key: string) => `ing-${index}-${key}`;

  // Live checks as the coach types: a value that is there but impossible (negative, over the cap,
  // macros over 100 g) shows at once; a value not given yet waits for the save.
  const parsed = ingredientSchema.safeParse(row);
  const live = new Map<string, string>();
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0] ?? "");
      const raw = (row as Record<string, unknown> | undefined)?.[key];
      const given = key === "macros" || !(raw === "" || raw === undefined || raw === null || (typeof raw === "number" && Number.isNaN(raw)));
      if (given && !live.has(key)) live.set(key, issue.message);
    }
  }
  const errorOf = (key: string) => rowErrors?.[key]?.message ?? live.get(key);
  const label = parsed.success ? checkLabelEnergy(parsed.data) : null;
  const macrosError = errorOf("macros");

  const numberField = (key: NumKey, text: string, unit: string, className = "") => (
    <div className={className}>
      <label className="field-label text-xs" htmlFor={id(key)}>
        <span className="sr-only">Ingredient {n} </span>
        {text} <span className="font-normal text-iron-400">{unit}</span>
      </label>
      <input
        id={id(key)}
        type="number"
        inputMode="decimal"
        step="any"
        className="field-input px-2 py-2 text-sm"
        data-testid={`ingredient-${index}-${key}`}
        aria-invalid={!!errorOf(key)}
        aria-describedby={errorOf(key) ? `${id(key)}-err` : undefined}
        {...register(`ingredients.${index}.${key}`, { valueAsNumber: true })}
      />
      {errorOf(key) ? <p id={`${id(key)}-err`} className="field-error text-xs">{errorOf(key)}</p> : null}
    </div>
  );

  return (
    <li className="rounded-lg border border-chalk-300 bg-chalk-50 p-3" data-testid={`ingredient-${index}`}>
      <div className="grid grid-cols-2 gap-2 sm:grid-cols-12">
        <div className="col-span-2 sm:col-span-5">
          <label className="field-label text-xs" htmlFor={id("name")}>
            <span className="sr-only">Ingredient {n} </span>Name
          </label>
          <input id={id("name")} className="field-input px-2 py-2 text-sm" autoComplete="off" placeholder="e.g. rolled oats" data-testid={`ingredient-${index}-name`} aria-invalid={!!errorOf("name")} {...register(`ingredients.${index}.name`)} />
          {errorOf("name") ? <p className="field-error text-xs">{errorOf("name")}</p> : null}
        </div>
        {numberField("amount", "Amount", "", "sm:col-span-2")}
        <div className="sm:col-span-2">
          <label className="field-label text-xs" htmlFor={id("kind")}>
            <span className="sr-only">Ingredient {n} </span>Unit
          </label>
          <select id={id("kind")} className="field-input px-2 py-2 text-sm" data-testid={`ingredient-${index}-kind`} {...register(`ingredients.${index}.kind`)}>
            <option value="g">g</option>
            <option value="ml">ml</option>
            <option value="piece">pieces</option>
          </select>
        </div>
        {row?.kind === "ml" ? numberField("density", "Density", "g/ml", "sm:col-span-3") : null}
        {row?.kind === "piece" ? numberField("pieceGrams", "One piece", "g", "sm:col-span-3") : null}
      </div>
      {row?.kind === "ml" ? <p className="mt-1 text-xs text-iron-400">1.00 g per ml is water and drinks like it; for anything else weigh 100 ml or check the label.</p> : null}
      <p className="mt-3 text-xs font-semibold uppercase tracking-wider text-iron-400">Label, per 100 g</p>
      <div className="mt-1 grid grid-cols-3 gap-2 sm:grid-cols-5">
        {numberField("energyKcal", "Energy", "kcal")}
        {numberField("protein", "Protein", "g")}
        {numberField("carbohydrate", "Carbs", "g")}
        {numberField("fat", "Fat", "g")}
        {numberField("fibre", "Fibre", "g, optional")}
      </div>
      {macrosError ? (
        <p role="alert" className="field-error text-xs" data-testid={`ingredient-${index}-macros-error`}>{macrosError}</p>
      ) : null}
      {label && !label.agrees ? (
        <p className="mt-1 rounded bg-brass-100 px-2 py-1 text-xs text-iron-700" data-testid={`ingredient-${index}-label-flag`}>
          The label says {roundEnergy(label.label)} kcal, but its protein, carbohydrate and fat make {roundEnergy(label.fromMacros)} kcal. Check the label (was the kJ figure typed?).
        </p>
      ) : null}
      {onRemove ? (
        <div className="mt-2 text-right">
          <button type="button" className="text-xs font-semibold text-ember-700 hover:underline" onClick={onRemove}>
            Remove ingredient {n}
          </button>
        </div>
      ) : null}
    </li>
  );
}
