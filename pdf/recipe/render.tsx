/**
 * Renders a printable recipe card to a PDF buffer with the session cards'
 * fonts (pdf/fonts.ts) and paper sizes (pdf/sizes.ts: A6, A5, Letter).
 *
 * @example
 * const pdf = await renderRecipeCard({ title: "Oat bowl", servings: 2, steps: ["Mix"], ingredients }, "a6");
 * // pdf: Buffer starting with "%PDF-"
 */
import { Document, renderToBuffer } from "@react-pdf/renderer";
import { registerCardFonts } from "../fonts";
import type { CardSize } from "../sizes";
import { type RecipeCardInput, recipeCardView } from "./model";
import { RecipeCard } from "./RecipeCard";

export async function renderRecipeCard(recipe: RecipeCardInput, size: CardSize = "a6"): Promise<Buffer> {
  if (recipe.ingredients.length === 0) throw new RangeError("a recipe card needs at least one ingredient");
  registerCardFonts();
  const doc = (
    <Document title={`Recipe · ${recipe.title}`} author="Ironquill" creator="Ironquill" producer="Ironquill" language="en">
      <RecipeCard card={recipeCardView(recipe)} size={size} />
    </Document>
  );
  return renderToBuffer(doc);
}
