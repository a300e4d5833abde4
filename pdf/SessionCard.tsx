/**
 * One session card as react-pdf pages: a header with the athlete, date, day
 * and a QR code to the logging page; one block per exercise with its sets,
 * worked loads, plates per side, warm-up ramp, substitutes and a write-in
 * cell (reps, load, RIR) per work set; the caution and page count at the foot
 * of every page. A long session flows onto further pages; an exercise block
 * never splits across two.
 *
 * @example
 * <Document><SessionCard card={cardView(session, { athlete })} size="a6" qrUrl={url} /></Document>
 */
import { Canvas, Link, Page, Text, View } from "@react-pdf/renderer";
import { CAUTION_TEXT } from "../components/Caution";
import type { CardExercise, CardView, SetLine } from "./model";
import { qrRuns } from "./qr";
import { BOX_SPACING, cellWidth, metricsFor, pageSize, type CardSize } from "./sizes";
import { cardStyles, INK, MUTED, RULE } from "./styles";

/** The pdfkit drawing calls a react-pdf Canvas hands its paint function (the subset used here). */
type Painter = {
  lineWidth(w: number): Painter;
  strokeColor(c: string): Painter;
  fillColor(c: string): Painter;
  font(name: string): Painter;
  fontSize(n: number): Painter;
  rect(x: number, y: number, w: number, h: number): Painter;
  roundedRect(x: number, y: number, w: number, h: number, r: number): Painter;
  fill(color?: string): Painter;
  stroke(): Painter;
  text(t: string, x: number, y: number, options?: { width?: number; align?: "left" | "right"; lineBreak?: boolean }): Painter;
};

const ROW_GAP = 2;

type Styles = ReturnType<typeof cardStyles>;

function Qr({ url, size }: { url: string; size: CardSize }) {
  const s = cardStyles(size);
  const side = metricsFor(size).qr;
  const { modules, runs } = qrRuns(url);
  // A quiet zone of two modules on each side (the standard asks for four; the card's white margin supplies the rest).
  const unit = side / (modules + 4);
  const paint = (p: Painter) => {
    for (const [x, y, w] of runs) p.rect((x + 2) * unit, (y + 2) * unit, w * unit, unit);
    p.fill(INK);
    return null;
  };
  return (
    <View style={s.qrBox}>
      <Link src={url}>
        <Canvas style={{ width: side, height: side }} paint={paint} />
      </Link>
      <Text style={s.qrCaption}>scan to log</Text>
    </View>
  );
}

function Header({ card, size, qrUrl }: { card: CardView; size: CardSize; qrUrl: string | null }) {
  const s = cardStyles(size);
  return (
    <View style={s.header}>
      <View style={s.headerText}>
        <Text style={s.athlete}>{card.athlete}</Text>
        <Text style={s.title}>{card.day}</Text>
        <Text style={s.dateLine}>
          {card.dateText} <Text style={s.blockLine}>· {card.isoWeek} · {card.blockText}</Text>
          {card.deload ? <Text style={s.deload}> · DELOAD</Text> : null}
        </Text>
        {card.warmupNotes.length > 0 ? (
          <Text style={s.notes}>
            <Text style={{ fontWeight: 700 }}>Before you start: </Text>
            {card.warmupNotes.join("; ")}
          </Text>
        ) : null}
      </View>
      {qrUrl ? <Qr url={qrUrl} size={size} /> : null}
    </View>
  );
}

function WorkLine({ line, s }: { line: SetLine; s: Styles }) {
  return (
    <View style={s.workRow}>
      <Text style={s.sets}>
        {line.count} × {line.reps}
      </Text>
      {line.load ? <Text style={s.load}>{line.load}</Text> : null}
      {line.plates ? (
        <Text style={s.plates}>
          {line.plates}
          <Text style={s.aSide}> a side</Text>
        </Text>
      ) : null}
    </View>
  );
}

function Warmups({ lines, units, s }: { lines: SetLine[]; units: string; s: Styles }) {
  return (
    <View style={s.warmRow}>
      <Text style={s.warmLabel}>Warm-up {units}</Text>
      {lines.map((w, i) => (
        // Load first ("32.5 × 8"), so a ramp step never reads as sets × reps like the work line.
        <Text key={i} style={s.warmStep}>
          {w.bare || "light"}
          {w.reps ? ` × ${w.reps}` : ""}
          {w.count > 1 ? ` (${w.count} sets)` : ""}
          {w.plates ? <Text style={s.warmPlates}> ({w.plates})</Text> : null}
        </Text>
      ))}
    </View>
  );
}

/**
 * The write-in cells (set number, then reps, load and RIR boxes) drawn straight
 * onto the page: as one canvas per exercise rather than a view per box, a
 * 20-card pack renders in well under half the time. Captions and set numbers
 * use the PDF's built-in Helvetica, which needs no embedding.
 */
function WriteIn({ ex, size }: { ex: CardExercise; size: CardSize }) {
  const s = cardStyles(size);
  const m = metricsFor(size);
  const count = Math.max(ex.workSets, 1);
  const rows = Math.ceil(count / m.boxColumns);
  const { box } = m;
  const caption = size === "letter" ? 6 : 5;
  const boxes: Array<[string, number]> = [
    [ex.timed ? "time" : "reps", box.reps],
    ["load", box.load],
    ["RIR", box.rir],
  ];
  const paint = (p: Painter) => {
    p.lineWidth(0.75).strokeColor(MUTED);
    for (let i = 0; i < count; i++) {
      const x0 = (i % m.boxColumns) * cellWidth(m);
      const y0 = Math.floor(i / m.boxColumns) * (box.height + ROW_GAP);
      p.font("Helvetica-Bold").fontSize(m.small).fillColor(MUTED);
      p.text(String(i + 1), x0, y0 + box.height - m.small, { width: box.label - 2, align: "right", lineBreak: false });
      let x = x0 + box.label;
      for (const [label, width] of boxes) {
        p.roundedRect(x, y0, width, box.height, 1.5).stroke();
        p.font("Helvetica").fontSize(caption).fillColor(RULE);
        p.text(label, x + 1.5, y0 + 1, { lineBreak: false });
        x += width + BOX_SPACING;
      }
    }
    return null;
  };
  return <Canvas style={[s.boxes, { height: rows * (box.height + ROW_GAP) }]} paint={paint} />;
}

function Exercise({ ex, units, size }: { ex: CardExercise; units: string; size: CardSize }) {
  const s = cardStyles(size);
  const { details } = ex;
  return (
    <View style={s.exercise} wrap={false}>
      <View style={s.info}>
        <View style={s.nameRow}>
          {ex.label ? <Text style={s.label}>{ex.label}</Text> : null}
          <Text style={s.name}>{ex.name}</Text>
          {ex.effort ? <Text style={s.effort}>{ex.effort}</Text> : null}
        </View>
        {details.length > 0 || ex.cue ? (
          <Text style={s.details}>
            {details.join(" · ")}
            {ex.cue ? `${details.length > 0 ? " · " : ""}“${ex.cue}”` : ""}
          </Text>
        ) : null}
        {ex.warmups.length > 0 ? <Warmups lines={ex.warmups} units={units} s={s} /> : null}
        {ex.work.map((w, i) => (
          <WorkLine key={i} line={w} s={s} />
        ))}
        {ex.note && !ex.work.some((w) => w.load) ? <Text style={s.note}>{ex.note}: choose the load on the day</Text> : null}
        {ex.substitutes.map((sub, i) => (
          <Text key={i} style={s.sub}>
            or <Text style={s.subName}>{sub.name}</Text>
            {sub.text ? `: ${sub.text}` : ""}
          </Text>
        ))}
      </View>
      <WriteIn ex={ex} size={size} />
    </View>
  );
}

function Footer({ card, size }: { card: CardView; size: CardSize }) {
  const s = cardStyles(size);
  // The page count is a render prop: it gets its own width and inherits no line height, or it prints nothing (styles.ts).
  return (
    <>
      <Text style={s.footerLeft} fixed>
        {card.athlete} · {card.day} · {card.dateText}
      </Text>
      <Text
        style={s.footerRight}
        fixed
        render={({ subPageNumber, subPageTotalPages }) => (subPageTotalPages > 1 ? `page ${subPageNumber} of ${subPageTotalPages}` : " ")}
      />
      <Text style={s.caution} fixed>
        <Text style={s.cautionLead}>Train safe. </Text>
        {CAUTION_TEXT}
      </Text>
    </>
  );
}

export function SessionCard({ card, size, qrUrl }: { card: CardView; size: CardSize; qrUrl: string | null }) {
  const s = cardStyles(size);
  const { width, height } = pageSize(size);
  return (
    <Page size={[width, height]} style={s.page} wrap>
      <Header card={card} size={size} qrUrl={qrUrl} />
      {card.exercises.map((ex, i) => (
        <Exercise key={i} ex={ex} units={card.units} size={size} />
      ))}
      {card.exercises.length === 0 ? <Text>No exercises are planned for this day.</Text> : null}
      <Footer card={card} size={size} />
    </Page>
  );
}
