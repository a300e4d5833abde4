/**
 * react-pdf styles of a recipe card, one sheet per paper size, on the session
 * cards' type scale (pdf/sizes.ts) and ink (pdf/styles.ts).
 *
 * @example
 * const s = recipeStyles("a5");
 * // <Text style={s.title}>Oat bowl</Text>
 */
import { StyleSheet } from "@react-pdf/renderer";
import { CARD_FONT } from "../fonts";
import { metricsFor, type CardSize } from "../sizes";
import { ACCENT, INK, MUTED, RULE } from "../styles";

function build(size: CardSize) {
  const m = metricsFor(size);
  const amountWidth = size === "a6" ? 52 : size === "a5" ? 64 : 80;
  const cell = { width: size === "a6" ? 58 : 80, textAlign: "right" as const };
  return StyleSheet.create({
    page: {
      fontFamily: CARD_FONT,
      fontSize: m.base,
      color: INK,
      paddingTop: m.margin,
      paddingHorizontal: m.margin,
      paddingBottom: m.margin + m.footer,
      lineHeight: 1.25,
    },
    byline: { fontSize: m.small, color: MUTED, fontWeight: 700, textTransform: "uppercase", letterSpacing: 0.4 },
    title: { fontSize: m.title, fontWeight: 700, lineHeight: 1.1, marginTop: 1 },
    serving: { fontSize: m.base, color: MUTED, marginTop: 2, marginBottom: m.base * 0.6 },
    table: { borderTopWidth: 1.25, borderTopColor: INK, borderBottomWidth: 0.75, borderBottomColor: RULE, marginBottom: m.base * 0.4 },
    tableHead: { flexDirection: "row", paddingTop: 2 },
    row: { flexDirection: "row", borderTopWidth: 0.5, borderTopColor: RULE, paddingVertical: 1.5 },
    rowFirst: { flexDirection: "row", borderTopWidth: 0.75, borderTopColor: INK, paddingVertical: 1.5 },
    cellLabel: { flex: 1 },
    cellHead: { ...cell, fontSize: m.small, color: MUTED, fontWeight: 700 },
    cell: { ...cell, fontWeight: 700 },
    cellStrong: { ...cell, fontWeight: 700, fontSize: m.base + 1 },
    cellMuted: { ...cell, color: MUTED },
    tableNote: { fontSize: m.small - 0.5, color: MUTED, paddingBottom: 2 },
    heading: { fontSize: m.small, fontWeight: 700, color: MUTED, textTransform: "uppercase", letterSpacing: 0.4, marginTop: m.base * 0.6, marginBottom: 2 },
    ingredient: { flexDirection: "row", paddingVertical: 1 },
    amount: { width: amountWidth, fontWeight: 700, paddingRight: 4 },
    ingredientName: { flex: 1 },
    weight: { color: MUTED, fontSize: m.small },
    flag: { color: ACCENT, fontWeight: 700 },
    flagNote: { fontSize: m.small - 0.5, color: ACCENT, marginTop: 2 },
    step: { flexDirection: "row", marginBottom: 2.5 },
    stepNo: { width: m.base * 1.8, fontWeight: 700 },
    stepText: { flex: 1 },
    footer: { position: "absolute", left: m.margin, right: m.margin, bottom: m.margin * 0.6 },
    footerRow: { flexDirection: "row", justifyContent: "space-between", fontSize: m.small - 1, color: MUTED, marginBottom: 1.5 },
    note: { fontSize: size === "a6" ? 6 : m.small - 1.5, color: MUTED, lineHeight: 1.2 },
  });
}

const cache = new Map<CardSize, ReturnType<typeof build>>();

export function recipeStyles(size: CardSize): ReturnType<typeof build> {
  let s = cache.get(size);
  if (!s) cache.set(size, (s = build(size)));
  return s;
}
