/**
 * react-pdf styles of a session card, one sheet per paper size (built once).
 * Ink is near-black on white so cards photocopy well; the ember accent only
 * marks superset labels and the deload tag.
 *
 * @example
 * const s = cardStyles("a6");
 * // <Text style={s.load}>67.5 kg</Text>
 */
import { StyleSheet } from "@react-pdf/renderer";
import { CARD_FONT } from "./fonts";
import { boxesWidth, metricsFor, type CardSize } from "./sizes";

export const INK = "#14181d";
export const MUTED = "#434b58";
export const RULE = "#a8afb9";
export const ACCENT = "#8f3b1b";

function build(size: CardSize) {
  const m = metricsFor(size);
  return StyleSheet.create({
    page: {
      fontFamily: CARD_FONT,
      fontSize: m.base,
      color: INK,
      paddingTop: m.margin,
      paddingHorizontal: m.margin,
      paddingBottom: m.margin + m.footer,
      // No line height here: inherited by the footer's page-count render prop, it made that text vanish.
    },
    header: { flexDirection: "row", alignItems: "flex-start", marginBottom: m.base * 0.5 },
    headerText: { flexGrow: 1, flexShrink: 1, flexBasis: 0, paddingRight: 8 },
    athlete: { fontSize: m.small, color: MUTED, fontWeight: 700, textTransform: "uppercase", letterSpacing: 0.4 },
    title: { fontSize: m.title, fontWeight: 700, lineHeight: 1.1, marginTop: 1 },
    dateLine: { fontSize: m.base + 0.5, fontWeight: 700, marginTop: 2 },
    blockLine: { fontSize: m.small, color: MUTED, fontWeight: 400 },
    deload: { color: ACCENT, fontWeight: 700 },
    qrBox: { width: m.qr, alignItems: "center", flexShrink: 0 },
    qrCaption: { fontSize: m.small - 1.5, color: MUTED, marginTop: 1 },
    notes: { fontSize: m.small, marginTop: 2 },
    exercise: {
      borderTopWidth: 0.75,
      borderTopColor: RULE,
      paddingTop: m.base * 0.45,
      paddingBottom: m.base * 0.35,
      flexDirection: m.sideBySide ? "row" : "column",
    },
    info: { flexGrow: 1, flexShrink: 1, flexBasis: m.sideBySide ? 0 : "auto", paddingRight: m.sideBySide ? 8 : 0 },
    nameRow: { flexDirection: "row", alignItems: "flex-start" },
    label: {
      fontSize: m.small,
      fontWeight: 700,
      color: "#ffffff",
      backgroundColor: ACCENT,
      borderRadius: 2,
      paddingHorizontal: 2.5,
      paddingTop: 1,
      marginRight: 4,
      marginTop: (m.name - m.small) / 2,
    },
    name: { fontSize: m.name, fontWeight: 700, flexGrow: 1, flexShrink: 1, flexBasis: 0 },
    effort: { fontSize: m.base, fontWeight: 700, marginLeft: 6, marginTop: (m.name - m.base) / 2, flexShrink: 0 },
    details: { fontSize: m.small, color: MUTED },
    cue: { fontSize: m.small, color: MUTED },
    workRow: { flexDirection: "row", flexWrap: "wrap", alignItems: "flex-end", marginTop: 2 },
    sets: { fontSize: m.load, fontWeight: 700, marginRight: 5 },
    load: { fontSize: m.load, fontWeight: 700, marginRight: 5 },
    plates: { fontSize: m.load - 1, marginRight: 2 },
    aSide: { fontSize: m.small, color: MUTED },
    warmRow: { flexDirection: "row", flexWrap: "wrap", marginTop: 2 },
    warmLabel: { fontSize: m.small, color: MUTED, fontWeight: 700, marginRight: 4 },
    warmStep: { fontSize: m.small + 0.5, marginRight: 7 },
    warmPlates: { fontSize: m.small, color: MUTED },
    note: { fontSize: m.small, color: MUTED, marginTop: 1 },
    sub: { fontSize: m.small, marginTop: 1 },
    subName: { fontWeight: 700 },
    boxes: { marginTop: m.sideBySide ? 0 : 3, flexShrink: 0, width: boxesWidth(m) },
    // One line, cut short before the page count rather than wrapping into the caution.
    footerLeft: { position: "absolute", left: m.margin, right: m.margin + 64, maxLines: 1, textOverflow: "ellipsis", bottom: m.margin * 0.6 + m.footer - m.small, fontSize: m.small - 1, color: MUTED },
    // A render-prop text is measured before it has content: give it a width or it prints nothing.
    footerRight: { position: "absolute", right: m.margin, width: 60, textAlign: "right", bottom: m.margin * 0.6 + m.footer - m.small, fontSize: m.small - 1, color: MUTED },
    caution: { position: "absolute", left: m.margin, right: m.margin, bottom: m.margin * 0.6, fontSize: size === "a6" ? 6 : m.small - 1.5, color: MUTED, lineHeight: 1.2 },
    cautionLead: { fontWeight: 700, color: INK },
  });
}

const cache = new Map<CardSize, ReturnType<typeof build>>();

export function cardStyles(size: CardSize): ReturnType<typeof build> {
  let s = cache.get(size);
  if (!s) cache.set(size, (s = build(size)));
  return s;
}
