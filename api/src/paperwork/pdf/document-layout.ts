import PDFDocument from 'pdfkit';
import { readFile } from 'node:fs/promises';
import sharp from 'sharp';
import { type FontWeight, roboto } from './roboto.js';

export type { FontWeight };

/** Wiretrail's palette on paper: deep slate-teal with a copper accent, and verdict colours that print dark enough to read. */
export const INK = {
  slate: '#1d4b55',
  slateDark: '#11343c',
  copper: '#a8592a',
  text: '#14262b',
  muted: '#50656a',
  rule: '#c5d3d5',
  tint: '#eef4f4',
  copperTint: '#f7ece4',
  pass: '#2e7d4f',
  fail: '#b3261e',
  check: '#8a5200',
} as const;


const LOGO = new URL('../../../../web/public/logo.svg', import.meta.url);
let logoPng: Promise<Buffer | null> | null = null;

/**
 * The app's own logo, drawn once from web/public/logo.svg onto the band's colour (no transparency, so the PDF carries
 * one image, not an image and its mask); a document is still made without it if the file is absent.
 */
function logo(): Promise<Buffer | null> {
  logoPng ??= readFile(LOGO)
    .then((svg) => sharp(svg, { density: 300 }).resize(160, 160).flatten({ background: INK.slate }).png().toBuffer())
    .catch(() => null);
  return logoPng;
}

export interface Cell {
  text: string;
  weight?: FontWeight;
  color?: string;
}

export interface Column {
  header: string;
  /** A share of the table's width. */
  width: number;
  align?: 'left' | 'right' | 'center';
}

export interface Row {
  cells: Array<Cell | string>;
  /** A line in small print across the whole row beneath it: a note and where a limit comes from. */
  detail?: string;
}

export interface LayoutOptions {
  /** The kind of document, printed large: "Minor works certificate". */
  title: string;
  subtitle: string;
  number: string;
  /** Already in words: "Issued 14 March 2026". */
  issued: string;
  contractor: string;
  landscape?: boolean;
  /** PDF metadata. */
  subject: string;
}

const MARGIN = 40;
const FOOTER = 28;
const BODY = 9;
const SMALL = 7.5;

/**
 * The layout every Wiretrail document shares: a slate band with the logo, the document's kind and its number
 * in copper, sections under copper-ruled headings, tables that carry over pages with their headers, and a footer
 * with the number and page count on every page.
 */
export class DocumentLayout {
  readonly doc: PDFKit.PDFDocument;
  private readonly chunks: Buffer[] = [];
  private readonly ended: Promise<void>;

  private constructor(
    private readonly o: LayoutOptions,
    private readonly logoImage: Buffer | null,
  ) {
    this.doc = new PDFDocument({
      size: 'A4',
      layout: o.landscape ? 'landscape' : 'portrait',
      margins: { top: MARGIN, left: MARGIN, right: MARGIN, bottom: MARGIN + FOOTER },
      bufferPages: true,
      info: { Title: `${o.number} ${o.title}`, Author: o.contractor, Subject: o.subject, Creator: 'Wiretrail', Producer: 'Wiretrail' },
    });
    for (const [weight, font] of Object.entries(roboto())) this.doc.registerFont(weight, font);
    this.doc.on('data', (c: Buffer) => this.chunks.push(c));
    this.ended = new Promise((resolve, reject) => {
      this.doc.on('end', () => resolve());
      this.doc.on('error', reject);
    });
    this.band();
  }

  static async start(o: LayoutOptions): Promise<DocumentLayout> {
    return new DocumentLayout(o, await logo());
  }

  get left(): number {
    return this.doc.page.margins.left;
  }

  get width(): number {
    return this.doc.page.width - this.doc.page.margins.left - this.doc.page.margins.right;
  }

  private get bottom(): number {
    return this.doc.page.height - this.doc.page.margins.bottom;
  }

  get y(): number {
    return this.doc.y;
  }

  set y(value: number) {
    this.doc.y = value;
  }

  font(weight: FontWeight, size = BODY, color: string = INK.text): this {
    this.doc.font(weight).fontSize(size).fillColor(color);
    return this;
  }

  /** Starts a new page when less than `height` is left on this one. */
  ensure(height: number): void {
    if (this.doc.y + height > this.bottom) this.newPage();
  }

  newPage(): void {
    this.doc.addPage();
    this.slim();
  }

  /** The first page's band: logo, the document's kind, and its number. */
  private band(): void {
    const { doc } = this;
    const h = 74;
    doc.rect(0, 0, doc.page.width, h).fill(INK.slate);
    doc.rect(0, h, doc.page.width, 3).fill(INK.copper);
    if (this.logoImage) {
      doc.image(this.logoImage, MARGIN, 17, { width: 40, height: 40 });
      // The mark's own tile is slate too: a light edge keeps it from melting into the band.
      doc.roundedRect(MARGIN, 17, 40, 40, 8.75).lineWidth(0.75).strokeColor('#4f7f89').stroke();
    }
    const textX = MARGIN + (this.logoImage ? 54 : 0);
    this.font('medium', 18, '#ffffff');
    doc.text(this.o.title, textX, 18, { width: this.width - 220, lineBreak: false });
    this.font('regular', 9.5, '#d7e6e8');
    doc.text(this.o.subtitle, textX, 42, { width: this.width - 220, lineBreak: false });
    const boxW = 150;
    const boxX = doc.page.width - MARGIN - boxW;
    doc.roundedRect(boxX, 16, boxW, 42, 6).fill(INK.copper);
    this.font('bold', 15, '#ffffff');
    doc.text(this.o.number, boxX, 22, { width: boxW, align: 'center', lineBreak: false });
    this.font('regular', 8, '#fbeee4');
    doc.text(this.o.issued, boxX, 41, { width: boxW, align: 'center', lineBreak: false });
    doc.x = MARGIN;
    doc.y = h + 20;
  }

  /** Later pages: a thin band with the kind and number, so a loose page still says what it belongs to. */
  private slim(): void {
    const { doc } = this;
    doc.rect(0, 0, doc.page.width, 26).fill(INK.slate);
    this.font('medium', 9, '#ffffff');
    doc.text(`${this.o.title} · ${this.o.number}`, MARGIN, 9, { width: this.width, lineBreak: false });
    doc.x = MARGIN;
    doc.y = 26 + 18;
  }

  heading(text: string): void {
    this.ensure(48);
    const { doc } = this;
    doc.moveDown(0.6);
    const y = doc.y;
    this.font('medium', 11.5, INK.slate);
    doc.text(text, this.left, y, { width: this.width });
    const under = doc.y + 2;
    doc.moveTo(this.left, under).lineTo(this.left + 36, under).lineWidth(2).strokeColor(INK.copper).stroke();
    doc.moveTo(this.left + 38, under).lineTo(this.left + this.width, under).lineWidth(0.5).strokeColor(INK.rule).stroke();
    doc.y = under + 7;
  }

  paragraph(text: string, weight: FontWeight = 'regular', color: string = INK.text, size = BODY): void {
    this.font(weight, size, color);
    const h = this.doc.heightOfString(text, { width: this.width, lineGap: 1.5 });
    this.ensure(Math.min(h, 60));
    // A new page's band leaves its own white type set: set ours again.
    this.font(weight, size, color);
    this.doc.text(text, this.left, this.doc.y, { width: this.width, lineGap: 1.5 });
    this.doc.moveDown(0.3);
  }

  /** Labelled values side by side in columns, each label small and muted above its value. */
  fields(pairs: Array<[label: string, value: string]>, columns = 2, x = this.left, width = this.width): number {
    const { doc } = this;
    const gap = 14;
    const colW = (width - gap * (columns - 1)) / columns;
    let y = doc.y;
    for (let i = 0; i < pairs.length; i += columns) {
      const row = pairs.slice(i, i + columns);
      const heights = row.map(([label, value]) => {
        this.font('regular', SMALL);
        const lh = doc.heightOfString(label, { width: colW });
        this.font('regular', BODY);
        return lh + doc.heightOfString(value || '—', { width: colW, lineGap: 1 }) + 6;
      });
      const h = Math.max(...heights);
      if (y + h > this.bottom) {
        this.newPage();
        y = doc.y;
      }
      row.forEach(([label, value], j) => {
        const cx = x + j * (colW + gap);
        this.font('regular', SMALL, INK.muted);
        doc.text(label.toUpperCase(), cx, y, { width: colW, characterSpacing: 0.3 });
        this.font('regular', BODY, value ? INK.text : INK.muted);
        doc.text(value || '—', cx, doc.y + 1, { width: colW, lineGap: 1 });
      });
      y += h;
    }
    doc.y = y;
    return y;
  }

  /** Two blocks of fields next to each other, each under its own small title. */
  sideBySide(blocks: Array<{ title: string; pairs: Array<[string, string]> }>): void {
    const { doc } = this;
    const gap = 20;
    const w = (this.width - gap * (blocks.length - 1)) / blocks.length;
    const top = doc.y;
    let lowest = top;
    blocks.forEach((b, i) => {
      const x = this.left + i * (w + gap);
      doc.rect(x, top, w, 20).fill(INK.tint);
      this.font('medium', 9.5, INK.slate);
      doc.text(b.title, x + 8, top + 5.5, { width: w - 16, lineBreak: false });
      doc.y = top + 27;
      lowest = Math.max(lowest, this.fields(b.pairs, 1, x + 8, w - 16));
    });
    doc.y = lowest + 2;
  }

  /** A table with a tinted header row, carried over to the next page with its header when it runs long. */
  table(columns: Column[], rows: Row[]): void {
    const { doc } = this;
    const pad = 4;
    const total = columns.reduce((s, c) => s + c.width, 0);
    const widths = columns.map((c) => (c.width / total) * this.width);
    const xs = widths.map((_, i) => this.left + widths.slice(0, i).reduce((s, w) => s + w, 0));
    const cellOf = (c: Cell | string): Cell => (typeof c === 'string' ? { text: c } : c);

    const header = () => {
      this.font('medium', 8, INK.slate);
      const h = Math.max(...columns.map((c, i) => doc.heightOfString(c.header, { width: widths[i]! - 2 * pad }))) + 2 * pad;
      const y = doc.y;
      doc.rect(this.left, y, this.width, h).fill(INK.tint);
      this.font('medium', 8, INK.slate);
      columns.forEach((c, i) => doc.text(c.header, xs[i]! + pad, y + pad, { width: widths[i]! - 2 * pad, align: c.align ?? 'left' }));
      doc.y = y + h;
    };
    const measure = (row: Row) => {
      const cells = row.cells.map(cellOf);
      const cellH = Math.max(
        ...cells.map((c, i) => {
          this.font(c.weight ?? 'regular', BODY);
          return doc.heightOfString(c.text || '—', { width: widths[i]! - 2 * pad, lineGap: 1 });
        }),
      );
      this.font('regular', SMALL);
      const detailH = row.detail ? doc.heightOfString(row.detail, { width: this.width - 2 * pad, lineGap: 0.5 }) + 2 : 0;
      return { cells, cellH: cellH + 2 * pad, detailH };
    };

    this.ensure(60);
    header();
    for (const row of rows) {
      const m = measure(row);
      if (doc.y + m.cellH + m.detailH > this.bottom) {
        this.newPage();
        header();
      }
      const y = doc.y;
      m.cells.forEach((c, i) => {
        this.font(c.weight ?? 'regular', BODY, c.color ?? (c.text ? INK.text : INK.muted));
        doc.text(c.text || '—', xs[i]! + pad, y + pad, { width: widths[i]! - 2 * pad, align: columns[i]!.align ?? 'left', lineGap: 1 });
      });
      if (row.detail) {
        this.font('regular', SMALL, INK.muted);
        doc.text(row.detail, this.left + pad, y + m.cellH - pad + 1, { width: this.width - 2 * pad, lineGap: 0.5 });
      }
      const end = y + m.cellH + m.detailH + (row.detail ? pad : 0);
      doc.moveTo(this.left, end).lineTo(this.left + this.width, end).lineWidth(0.5).strokeColor(INK.rule).stroke();
      doc.y = end;
    }
    doc.x = this.left;
    doc.moveDown(0.4);
  }

  /** A boxed statement with a copper edge: the verdicts' disclaimer, a caution. */
  notice(title: string, text: string): void {
    const { doc } = this;
    this.font('regular', 8.5);
    const h = doc.heightOfString(text, { width: this.width - 24, lineGap: 1.5 }) + 30;
    this.ensure(h + 6);
    const y = doc.y + 4;
    doc.rect(this.left, y, this.width, h).fill(INK.copperTint);
    doc.rect(this.left, y, 3, h).fill(INK.copper);
    this.font('medium', 9, INK.copper);
    doc.text(title, this.left + 14, y + 8, { width: this.width - 24 });
    this.font('regular', 8.5, INK.text);
    doc.text(text, this.left + 14, doc.y + 2, { width: this.width - 24, lineGap: 1.5 });
    doc.x = this.left;
    doc.y = y + h + 6;
  }

  /** Who signed, as fields on the left, beside the signature drawn on the phone in a box on the right, with its caption. */
  signedBeside(pairs: Array<[label: string, value: string]>, signature: Buffer, caption: string): void {
    const top = this.doc.y;
    const half = this.width / 2 - 10;
    this.fields(pairs, 1, this.left, half);
    const below = this.doc.y;
    const boxX = this.left + half + 20;
    const { doc } = this;
    doc.rect(boxX, top, half, 86).lineWidth(0.5).strokeColor(INK.rule).stroke();
    doc.image(signature, boxX + 8, top + 6, { fit: [half - 16, 64], align: 'center', valign: 'center' });
    this.font('regular', 7.5, INK.muted);
    doc.text(caption, boxX + 8, top + 72, { width: half - 16, align: 'center' });
    doc.y = Math.max(below, top + 92);
    doc.x = this.left;
  }

  /** Footers on every page (page x of y is known only at the end), then the PDF's bytes. */
  async finish(): Promise<Buffer> {
    const { doc } = this;
    const range = doc.bufferedPageRange();
    for (let i = range.start; i < range.start + range.count; i++) {
      doc.switchToPage(i);
      const bottomMargin = doc.page.margins.bottom;
      // Writing inside the bottom margin must not start a new page.
      doc.page.margins.bottom = 0;
      const y = doc.page.height - MARGIN - 10;
      doc.moveTo(MARGIN, y - 6).lineTo(doc.page.width - MARGIN, y - 6).lineWidth(0.5).strokeColor(INK.rule).stroke();
      this.font('regular', 7.5, INK.muted);
      doc.text(`${this.o.contractor} · ${this.o.number} · made with Wiretrail`, MARGIN, y, { width: this.width - 80, lineBreak: false });
      doc.text(`Page ${i - range.start + 1} of ${range.count}`, doc.page.width - MARGIN - 80, y, { width: 80, align: 'right', lineBreak: false });
      doc.page.margins.bottom = bottomMargin;
    }
    doc.end();
    await this.ended;
    return Buffer.concat(this.chunks);
  }
}
