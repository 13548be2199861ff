import "server-only";
// The tire history as a PDF (pdf-lib, standard Helvetica: no font files to
// ship). A4 or US Letter; text that the standard font cannot encode is
// replaced rather than dropped silently.
import { PDFDocument, rgb, StandardFonts, type PDFFont, type PDFPage } from "pdf-lib";
import type { PrintableHistory } from "./history";

export const PAPER = { a4: [595.28, 841.89], letter: [612, 792] } as const;
export type Paper = keyof typeof PAPER;

const MARGIN = 42;
const INK = rgb(0.1, 0.12, 0.14);
const MUTED = rgb(0.35, 0.38, 0.42);

/** WinAnsi covers Latin-1 and a few typographic marks; anything else becomes a plain stand-in. */
export function winAnsi(text: string): string {
  return text
    .replace(/[≈~]/g, "~")
    .replace(/≥/g, ">=")
    .replace(/≤/g, "<=")
    .replace(/[\u2000-\u200b\u202f]/g, " ")
    .replace(/[^\x20-\x7e\xa0-\xff\u2013\u2014\u2018\u2019\u201c\u201d\u2022\u2026\u20ac]/g, "?");
}

export async function historyPdf(h: PrintableHistory, paper: Paper = "a4"): Promise<Uint8Array> {
  const pdf = await PDFDocument.create();
  pdf.setTitle(`Tire history: ${winAnsi(h.title)}`);
  pdf.setCreator("Fourpatch");
  pdf.setProducer("Fourpatch (pdf-lib)");
  const regular = await pdf.embedFont(StandardFonts.Helvetica);
  const bold = await pdf.embedFont(StandardFonts.HelveticaBold);
  const [width, height] = PAPER[paper];
  const usable = width - 2 * MARGIN;
  let page: PDFPage = pdf.addPage([width, height]);
  let y = height - MARGIN;

  const newPage = () => {
    page = pdf.addPage([width, height]);
    y = height - MARGIN;
  };
  const ensure = (h: number) => {
    if (y - h < MARGIN + 14) newPage();
  };
  const wrap = (text: string, font: PDFFont, size: number, maxWidth: number) => {
    const words = winAnsi(text).split(/\s+/);
    const lines: string[] = [];
    let line = "";
    for (const w of words) {
      const next = line ? `${line} ${w}` : w;
      if (font.widthOfTextAtSize(next, size) > maxWidth && line) {
        lines.push(line);
        line = w;
      } else line = next;
    }
    if (line) lines.push(line);
    return lines.length ? lines : [""];
  };
  const para = (text: string, { size = 10, font = regular, color = INK, gap = 4 } = {}) => {
    for (const l of wrap(text, font, size, usable)) {
      ensure(size + 2);
      page.drawText(l, { x: MARGIN, y: y - size, size, font, color });
      y -= size + 3;
    }
    y -= gap;
  };
  const heading = (text: string, size = 13) => {
    ensure(size + 30);
    y -= 6;
    para(text, { size, font: bold, gap: 2 });
  };
  /** A table with columns as fractions of the width; each cell wraps. */
  const table = (columns: [string, number][], rows: string[][], size = 9) => {
    const widths = columns.map(([, f]) => f * usable);
    const drawRow = (cells: string[], font: PDFFont) => {
      const wrapped = cells.map((c, i) => wrap(c, font, size, widths[i] - 6));
      const h = Math.max(...wrapped.map((w) => w.length)) * (size + 2) + 4;
      ensure(h);
      let x = MARGIN;
      wrapped.forEach((lines, i) => {
        lines.forEach((l, j) => page.drawText(l, { x: x + 2, y: y - size - j * (size + 2), size, font, color: INK }));
        x += widths[i];
      });
      y -= h;
      page.drawLine({ start: { x: MARGIN, y: y + 1 }, end: { x: MARGIN + usable, y: y + 1 }, thickness: 0.3, color: MUTED });
    };
    drawRow(columns.map(([c]) => c), bold);
    for (const r of rows) drawRow(r, regular);
    y -= 6;
  };

  para(`Tire history: ${h.title}`, { size: 18, font: bold, gap: 2 });
  para(h.subtitle, { size: 10, color: MUTED, gap: 2 });
  para(`Printed ${h.printedOn} from Fourpatch`, { size: 9, color: MUTED, gap: 8 });

  heading("Tire sets");
  if (h.sets.length === 0) para("No sets logged.");
  for (const s of h.sets) {
    para(`${s.title} - ${s.condition}`, { size: 11, font: bold, gap: 1 });
    para(s.detail, { size: 9, color: MUTED, gap: 3 });
    table(
      [["Position", 0.16], ["DOT code", 0.3], ["Made", 0.2], ["Age", 0.2], ["Condition", 0.14]],
      s.tires.map((t) => [t.position, t.dotCode, t.made, t.age, t.condition]),
    );
  }

  heading("Last tread checks, per groove");
  if (h.lastChecks.length === 0) para("No tread checks logged.");
  for (const c of h.lastChecks) {
    para(`${c.set}: ${c.date} · ${c.odometer} · by ${c.by}`, { size: 10, font: bold, gap: 2 });
    table([["Tire", 0.25], ["Inner", 0.25], ["Centre", 0.25], ["Outer", 0.25]], c.rows.map((r) => [r.position, r.inner, r.centre, r.outer]));
  }

  heading("Service history");
  if (h.service.length === 0) para("No service logged.");
  else table([["Date", 0.14], ["Work", 0.16], ["Set", 0.18], ["Odometer", 0.13], ["Done by", 0.19], ["Notes", 0.2]], h.service.map((s) => [s.date, s.kind, s.set, s.odometer, s.by, s.notes]));

  heading("Please note", 11);
  for (const c of h.cautions) para(c, { size: 9 });

  const pages = pdf.getPages();
  pages.forEach((p, i) => p.drawText(`${winAnsi(h.title)} · page ${i + 1} of ${pages.length}`, { x: MARGIN, y: MARGIN / 2, size: 8, font: regular, color: MUTED }));
  return pdf.save();
}
