/**
 * One recipe card as react-pdf pages: title and servings, a per-serving table
 * beside the whole recipe, the ingredients with their weights, the numbered
 * method, and a note on where the numbers come from at the foot of every page.
 * Same fonts, paper sizes and ink as the session cards; a long recipe flows
 * onto further pages.
 *
 * @example
 * <Document><RecipeCard card={recipeCardView(recipe)} size="a6" /></Document>
 */
import { Page, Text, View } from "@react-pdf/renderer";
import { pageSize, type CardSize } from "../sizes";
import type { RecipeCardView } from "./model";
import { recipeStyles } from "./styles";

export const NUTRITION_NOTE =
  "Worked from the food labels entered for each ingredient, raw weights, no cooking losses. A guide for planning meals, not dietary or medical advice.";

function Nutrition({ card, size }: { card: RecipeCardView; size: CardSize }) {
  const s = recipeStyles(size);
  return (
    <View style={s.table} wrap={false}>
      <View style={s.tableHead}>
        <Text style={s.cellLabel}> </Text>
        <Text style={s.cellHead}>a serving</Text>
        <Text style={s.cellHead}>whole recipe</Text>
      </View>
      {card.rows.map((r, i) => (
        <View key={r.label} style={i === 0 ? s.rowFirst : s.row}>
          <Text style={s.cellLabel}>{r.label}</Text>
          <Text style={i === 0 ? s.cellStrong : s.cell}>{r.perServing}</Text>
          <Text style={s.cellMuted}>{r.whole}</Text>
        </View>
      ))}
      {card.fibreNote ? <Text style={s.tableNote}>{card.fibreNote}</Text> : null}
    </View>
  );
}

export function RecipeCard({ card, size }: { card: RecipeCardView; size: CardSize }) {
  const s = recipeStyles(size);
  const { width, height } = pageSize(size);
  return (
    <Page size={[width, height]} style={s.page} wrap>
      {card.byline ? <Text style={s.byline}>{card.byline}</Text> : null}
      <Text style={s.title}>{card.title}</Text>
      <Text style={s.serving}>{card.servingLine}</Text>
      <Nutrition card={card} size={size} />
      <Text style={s.heading}>Ingredients</Text>
      {card.ingredients.map((i, idx) => (
        <View key={idx} style={s.ingredient} wrap={false}>
          <Text style={s.amount}>{i.amount}</Text>
          <Text style={s.ingredientName}>
            {i.name}
            {i.weight ? <Text style={s.weight}> ({i.weight})</Text> : null}
            {i.flagged ? <Text style={s.flag}> *</Text> : null}
          </Text>
        </View>
      ))}
      {card.flagNote ? <Text style={s.flagNote}>{card.flagNote}</Text> : null}
      {card.steps.length > 0 ? (
        <>
          <Text style={s.heading}>Method</Text>
          {card.steps.map((step, idx) => (
            <View key={idx} style={s.step} wrap={false}>
              <Text style={s.stepNo}>{idx + 1}.</Text>
              <Text style={s.stepText}>{step}</Text>
            </View>
          ))}
        </>
      ) : null}
      <View style={s.footer} fixed>
        <View style={s.footerRow}>
          <Text>{card.title}</Text>
          <Text render={({ subPageNumber, subPageTotalPages }) => (subPageTotalPages > 1 ? `page ${subPageNumber} of ${subPageTotalPages}` : "")} />
        </View>
        <Text style={s.note}>{NUTRITION_NOTE}</Text>
      </View>
    </Page>
  );
}
