// The PDF record of a sheet, made on the device with pdf-lib so it works offline (a sheet made at
// the bench may not have reached the server yet). Standard fonts only: text is mapped to WinAnsi,
// so it stays extractable as plain text.
import { PDFDocument, rgb, StandardFonts, type PDFFont, type PDFPage } from 'pdf-lib';
import type { LadderGeometry } from './ladder-geometry';
import type { SheetRecord } from './sheet-record';

const MAP: Record<string, string> = {
  '\u2212': '-', '\u2009': ' ', '\u202f': ' ', '\u00a0': ' ', '→': '->', '←': '<-', '⁺': '+', '⁻': '-', '≤': '<=', '≥': '>=', '≈': '~',
  Δ: 'D', ε: 'e', ρ: 'rho', α: 'alpha', β: 'beta', '⅓': '1/3', 'ₐ': 'a', '⁰': '0', '¹': '1', '²': '2', '³': '3',
};
const SUBSCRIPT = '₀₁₂₃₄₅₆₇₈₉';
const SUPERSCRIPT = '⁰¹²³⁴⁵⁶⁷⁸⁹';
// WinAnsi = Latin-1 plus these (the rest of 0x80–0x9F).
const WIN_ANSI_EXTRA = new Set('€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ');

/** Map text to what the standard PDF fonts can show; anything else becomes '?'. */
export function toWinAnsi(text: string): string {
  let out = '';
  for (const ch of text) {
    const i = SUBSCRIPT.indexOf(ch);
    const j = SUPERSCRIPT.indexOf(ch);
    if (i >= 0) out += String(i);
    else if (j >= 0) out += String(j);
    else if (MAP[ch] !== undefined) out += MAP[ch];
    else {
      const c = ch.codePointAt(0) ?? 63;
      out += (c >= 32 && c < 127) || (c >= 0xa0 && c <= 0xff) || WIN_ANSI_EXTRA.has(ch) ? ch : c === 10 ? ' ' : '?';
    }
  }
  return out;
}

const A4: [number, number] = [595.28, 841.89];
const MARGIN = 48;
const INK = rgb(0.118, 0.169, 0.2);
const SOFT = rgb(0.29, 0.353, 0.388);
const UP = rgb(0.541, 0.235, 0.11);
const DOWN = rgb(0.165, 0.31, 0.439);

class Writer {
  page: PDFPage;
  y: number;
  constructor(readonly doc: PDFDocument, readonly font: PDFFont, readonly bold: PDFFont) {
    this.page = doc.addPage(A4);
    this.y = A4[1] - MARGIN;
  }
  need(h: number) {
    if (this.y - h < MARGIN) {
      this.page = this.doc.addPage(A4);
      this.y = A4[1] - MARGIN;
    }
  }
  wrap(text: string, size: number, width: number, font = this.font): string[] {
    const words = toWinAnsi(text).split(/\s+/);
    const lines: string[] = [];
    let line = '';
    for (const w of words) {
      const next = line ? `${line} ${w}` : w;
      if (font.widthOfTextAtSize(next, size) > width && line) {
        lines.push(line);
        line = w;
      } else line = next;
    }
    if (line) lines.push(line);
    return lines.length ? lines : [''];
  }
  text(text: string, opts: { size?: number; bold?: boolean; x?: number; width?: number; color?: ReturnType<typeof rgb> } = {}) {
    const size = opts.size ?? 9.5;
    const font = opts.bold ? this.bold : this.font;
    const x = opts.x ?? MARGIN;
    const width = opts.width ?? A4[0] - MARGIN - x;
    for (const l of this.wrap(text, size, width, font)) {
      this.need(size * 1.35);
      this.page.drawText(l, { x, y: this.y - size, size, font, color: opts.color ?? INK });
      this.y -= size * 1.35;
    }
  }
  gap(h = 6) {
    this.y -= h;
  }
  table(columns: string[], rows: string[][]) {
    const width = A4[0] - 2 * MARGIN;
    const widths = columns.length === 3 ? [0.36, 0.22, 0.42] : columns.map(() => 1 / columns.length);
    const size = 8.5;
    const drawRow = (cells: string[], bold: boolean) => {
      const wrapped = cells.map((c, i) => this.wrap(c, size, width * (widths[i] ?? 0.25) - 6, bold ? this.bold : this.font));
      const h = Math.max(...wrapped.map((w) => w.length)) * size * 1.3 + 4;
      this.need(h);
      let x = MARGIN;
      wrapped.forEach((lines, i) => {
        lines.forEach((l, k) => this.page.drawText(l, { x, y: this.y - size - k * size * 1.3, size, font: bold ? this.bold : this.font, color: INK }));
        x += width * (widths[i] ?? 0.25);
      });
      this.y -= h;
      this.page.drawLine({ start: { x: MARGIN, y: this.y + 2 }, end: { x: MARGIN + width, y: this.y + 2 }, thickness: 0.3, color: rgb(0.85, 0.82, 0.78) });
    };
    drawRow(columns, true);
    for (const r of rows) drawRow(r, false);
  }
}

function drawLadder(w: Writer, g: LadderGeometry, title: string) {
  const boxW = A4[0] - 2 * MARGIN;
  const scale = boxW / g.width;
  const boxH = g.height * scale;
  w.need(boxH + 30);
  w.text(title, { size: 11, bold: true });
  const top = w.y;
  const X = (x: number) => MARGIN + x * scale;
  const Y = (y: number) => top - y * scale;
  for (const r of g.rungs) {
    w.page.drawLine({ start: { x: X(r.x1), y: Y(r.y) }, end: { x: X(r.x2), y: Y(r.y) }, thickness: 1, color: INK });
    w.page.drawText(toWinAnsi(r.label), { x: X(4), y: Y(r.y) - 3, size: 6, font: w.font, color: SOFT });
  }
  for (const a of g.arrows) {
    const up = a.yTo < a.yFrom;
    const color = up ? UP : DOWN;
    w.page.drawLine({ start: { x: X(a.x), y: Y(a.yFrom) }, end: { x: X(a.x), y: Y(a.yTo) }, thickness: a.unknown ? 2.2 : 1.1, color, dashArray: up ? undefined : [3, 2] });
    const tip = Y(a.yTo);
    const d = up ? -5 : 5;
    w.page.drawLine({ start: { x: X(a.x) - 3, y: tip + d }, end: { x: X(a.x), y: tip }, thickness: 1.1, color });
    w.page.drawLine({ start: { x: X(a.x) + 3, y: tip + d }, end: { x: X(a.x), y: tip }, thickness: 1.1, color });
    w.page.drawText(toWinAnsi(`${a.short}${a.unknown ? ' (unknown)' : ''}`), { x: X(a.x) + 3, y: (Y(a.yFrom) + Y(a.yTo)) / 2, size: 5.5, font: a.unknown ? w.bold : w.font, color });
  }
  w.y = top - boxH - 4;
  w.text(`Drawn to scale: bar = ${g.scaleBarKj} kJ/mol. Solid arrows up absorb energy; dashed arrows down release it.`, { size: 7.5, color: SOFT });
}

/** Render the record (and, for a cycle, its ladder) as PDF bytes. */
export async function renderSheetPdf(record: SheetRecord, ladder?: LadderGeometry | null): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(toWinAnsi(record.title));
  doc.setCreator('Rungbook');
  doc.setProducer('Rungbook workbench');
  const w = new Writer(doc, await doc.embedFont(StandardFonts.Helvetica), await doc.embedFont(StandardFonts.HelveticaBold));
  w.text('Rungbook sheet record', { size: 9, color: SOFT });
  w.text(record.title, { size: 17, bold: true });
  w.text(record.subtitle, { size: 10, color: SOFT });
  w.gap(8);
  for (const [k, v] of record.facts) w.text(`${k}: ${v}`, { size: 9 });
  for (const s of record.sections) {
    w.gap(10);
    w.text(s.heading, { size: 12, bold: true });
    w.gap(2);
    if (s.table) w.table(s.table.columns, s.table.rows);
    for (const l of s.lines ?? []) w.text(l);
    if (s.heading === 'Result' && ladder) {
      w.gap(10);
      drawLadder(w, ladder, 'Ladder');
    }
  }
  w.gap(12);
  w.text('Sign-off', { size: 12, bold: true });
  for (const l of record.signOff) w.text(l);
  return doc.save();
}
