import { grams, kcal, type Nutrients } from "@/lib/nutrition";

/**
 * Per-serving energy and macros as a small table, rounded for display
 * (lib/nutrition/rounding.ts). Server-safe; the editor's live panel uses it too.
 */
export function NutritionFacts({ perServing, testIdPrefix = "per-serving", compact = false }: { perServing: Nutrients; testIdPrefix?: string; compact?: boolean }) {
  const rows: [string, string, string][] = [
    ["energy", "Energy", kcal(perServing.energyKcal)],
    ["protein", "Protein", grams(perServing.protein)],
    ["carbohydrate", "Carbohydrate", grams(perServing.carbohydrate)],
    ["fat", "Fat", grams(perServing.fat)],
  ];
  if (perServing.fibre !== null) rows.push(["fibre", "Fibre", grams(perServing.fibre)]);
  if (compact) {
    return (
      <span className="text-sm text-iron-500">
        {rows.map(([key, label, value], i) => (
          <span key={key}>
            {i > 0 ? " · " : ""}
            {i === 0 ? null : `${label.toLowerCase()} `}
            <span className="font-semibold text-iron" data-testid={`${testIdPrefix}-${key}`}>{value}</span>
          </span>
        ))}
      </span>
    );
  }
  return (
    <dl className="divide-y divide-chalk-200 text-sm">
      {rows.map(([key, label, value]) => (
        <div key={key} className="flex items-baseline justify-between py-1.5">
          <dt className="text-iron-600">{label}</dt>
          <dd className={key === "energy" ? "text-lg font-bold text-iron" : "font-semibold text-iron"} data-testid={`${testIdPrefix}-${key}`}>
            {value}
          </dd>
        </div>
      ))}
    </dl>
  );
}
