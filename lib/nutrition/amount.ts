/**
 * The weight in grams of an ingredient's amount, whatever unit it was given in.
 *
 * @example
 * gramsOf({ kind: "ml", amount: 250, density: 1.03, pieceGrams: null }); // 257.5
 * gramsOf({ kind: "piece", amount: 3, density: null, pieceGrams: 60 }); // 180
 */
import type { Ingredient } from "./types";

export function gramsOf(i: Pick<Ingredient, "kind" | "amount" | "density" | "pieceGrams">): number {
  switch (i.kind) {
    case "g":
      return i.amount;
    case "ml":
      if (i.density === null) throw new Error("An amount in ml needs a density (g per ml)");
      return i.amount * i.density;
    case "piece":
      if (i.pieceGrams === null) throw new Error("An amount in pieces needs a weight per piece");
      return i.amount * i.pieceGrams;
  }
}

/** How the amount reads to a person: "80 g", "250 ml", "3 pieces". */
export function amountText(i: Pick<Ingredient, "kind" | "amount">): string {
  const n = Number(i.amount.toFixed(2)).toString();
  if (i.kind === "g") return `${n} g`;
  if (i.kind === "ml") return `${n} ml`;
  return `${n} ${i.amount === 1 ? "piece" : "pieces"}`;
}
