import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';

import type { Label } from '@polecourt/plots';
import { create as createFont } from 'fontkit';
import PDFDocument from 'pdfkit';

import { woffToSfnt } from './woff-to-sfnt.js';

// The report's page furniture: palette, fonts, page geometry, and a small
// cursor-based layout (text blocks, key-value grids, tables, callouts) on
// top of pdfkit. Nothing here knows about assessments.

export const INK = {
  ink: '#1e2a33',
  muted: '#4d5a65',
  faint: '#5d6872',
  rule: '#d8d1c0',
  ruleStrong: '#b9b09b',
  paper: '#fdfbf6',
  paperSunk: '#efeadd',
  accent: '#0e5a58',
  accentStrong: '#0a4341',
  accentSoft: '#dce9e5',
  pass: '#2d6a3a',
  passSoft: '#e1ecdf',
  fail: '#9c4435',
  failSoft: '#f4e2dc',
  caution: '#7a5a12',
  cautionSoft: '#f3ead2',
} as const;

export const PAGE = { width: 595.28, height: 841.89, left: 56, right: 56, top: 60, contentBottom: 770, footerY: 790 } as const;
export const CONTENT_WIDTH = PAGE.width - PAGE.left - PAGE.right;

// Inter from @fontsource, shipped with the app: its .woff files, turned into
// plain font files and parsed by fontkit once per process; pdfkit embeds
// the glyphs each report uses.
const require = createRequire(import.meta.url);
type Font = ReturnType<typeof createFont>;
let fontCache: Record<Weight, Font> | null = null;
function load(weight: number): Font {
  return createFont(woffToSfnt(readFileSync(require.resolve(`@fontsource/inter/files/inter-latin-${weight}-normal.woff`))));
}
// Parsed once and shared by every document (pdfkit subsets per document).
function fonts(): Record<Weight, Font> {
  fontCache ??= { regular: load(400), medium: load(500), semibold: load(600) };
  return fontCache;
}

// Shaping: kerning and tabular figures only. Inter's contextual alternates and
// ligatures add nothing to a report and cost most of the layout time.
const FEATURES = { kern: true, tnum: true, calt: false, liga: false, clig: false, rclt: false, ccmp: false, locl: false, mark: false, mkmk: false, rlig: false, curs: false } as unknown as PDFKit.Mixins.OpenTypeFeatures[];

export type Weight = 'regular' | 'medium' | 'semibold';

export interface TextStyle {
  size?: number;
  weight?: Weight;
  color?: string;
  lineGap?: number;
}

export interface Column {
  title: string;
  width: number;
  align?: 'left' | 'right';
}

export interface Cell {
  text: string;
  color?: string;
  weight?: Weight;
  fill?: string;
}

export class Layout {
  readonly doc: PDFKit.PDFDocument;
  y: number = PAGE.top;
  private onNewPage: ((layout: Layout) => void) | null = null;

  constructor(info: { title: string; author: string; subject: string; createdAt: Date }) {
    this.doc = new PDFDocument({
      autoFirstPage: false,
      size: 'A4',
      bufferPages: true,
      compress: true,
      info: { Title: info.title, Author: info.author, Subject: info.subject, Creator: 'Polecourt', Producer: 'Polecourt', CreationDate: info.createdAt, ModDate: info.createdAt },
      // The content bottom is kept by this layout; pdfkit's own margin only stops stray page breaks.
      margins: { top: PAGE.top, bottom: 10, left: PAGE.left, right: PAGE.right },
    });
    const f = fonts();
    for (const w of ['regular', 'medium', 'semibold'] as const) this.doc.registerFont(w, f[w] as unknown as Buffer);
  }

  /** Runs after each new page (running header). */
  setPageHeader(draw: (layout: Layout) => void): void {
    this.onNewPage = draw;
  }

  addPage(): void {
    this.doc.addPage();
    this.doc.rect(0, 0, PAGE.width, PAGE.height).fill(INK.paper);
    this.y = PAGE.top;
    this.onNewPage?.(this);
  }

  /** Starts a new page unless `height` still fits above the footer. */
  ensure(height: number): void {
    if (this.y + height > PAGE.contentBottom) this.addPage();
  }

  style(s: TextStyle = {}): PDFKit.PDFDocument {
    return this.doc.font(s.weight ?? 'regular').fontSize(s.size ?? 9.5).fillColor(s.color ?? INK.ink);
  }

  heightOf(text: string, width: number, s: TextStyle = {}): number {
    this.style(s);
    return this.doc.heightOfString(text, { features: FEATURES, width, lineGap: s.lineGap ?? 1.5 });
  }

  /** A wrapped block of text at the cursor; the cursor moves below it. */
  text(text: string, s: TextStyle = {}, options: { x?: number; width?: number; gapAfter?: number } = {}): void {
    const width = options.width ?? CONTENT_WIDTH;
    const h = this.heightOf(text, width, s);
    this.ensure(h);
    this.style(s).text(text, options.x ?? PAGE.left, this.y, { features: FEATURES, width, lineGap: s.lineGap ?? 1.5 });
    this.y += h + (options.gapAfter ?? 6);
  }

  /** One unwrapped line at (x, y); never breaks the page. */
  line(text: string, x: number, y: number, s: TextStyle = {}, align: 'left' | 'right' | 'center' = 'left'): void {
    this.style(s);
    const w = this.doc.widthOfString(text, { features: FEATURES });
    const left = align === 'right' ? x - w : align === 'center' ? x - w / 2 : x;
    this.doc.text(text, left, y, { lineBreak: false, features: FEATURES });
  }

  /** A plot label at (ox + l.x, oy + l.y), placed by its anchor and baseline (the plots package's convention); `backdrop` fills a box of that colour under it, so lines it crosses do not run through the text. */
  label(l: Label, ox: number, oy: number, s: TextStyle = {}, backdrop?: string): void {
    this.style(s);
    const w = this.doc.widthOfString(l.text, { features: FEATURES });
    const h = this.doc.currentLineHeight();
    const dx = l.anchor === 'middle' ? -w / 2 : l.anchor === 'end' ? -w : 0;
    const dy = l.baseline === 'middle' ? -h / 2 : l.baseline === 'bottom' ? -h : 0;
    if (backdrop && !l.rotate) {
      this.doc.rect(ox + l.x + dx - 1.5, oy + l.y + dy - 0.5, w + 3, h + 1).fill(backdrop);
      this.style(s); // fill() changed the fill colour the text is drawn in
    }
    if (l.rotate) {
      this.doc.save();
      this.doc.rotate(l.rotate, { origin: [ox + l.x, oy + l.y] });
      this.doc.text(l.text, ox + l.x + dx, oy + l.y + dy, { lineBreak: false, features: FEATURES });
      this.doc.restore();
    } else {
      this.doc.text(l.text, ox + l.x + dx, oy + l.y + dy, { lineBreak: false, features: FEATURES });
    }
  }

  rule(color: string = INK.rule, width = 0.6): void {
    this.doc.moveTo(PAGE.left, this.y).lineTo(PAGE.left + CONTENT_WIDTH, this.y).lineWidth(width).strokeColor(color).stroke();
  }

  /** A section heading: a small accent label over a rule. */
  section(title: string, lead?: string): void {
    this.ensure(lead ? 60 : 40);
    this.y += 8;
    this.line(title.toUpperCase(), PAGE.left, this.y, { size: 8, weight: 'semibold', color: INK.accent });
    this.y += 13;
    this.rule();
    this.y += 8;
    if (lead) this.text(lead, { size: 9, color: INK.muted });
  }

  /** Label-value rows in two columns; long values wrap. */
  keyValues(rows: ([string, string] | [string, string, TextStyle])[], keyWidth = 130): void {
    const valueWidth = CONTENT_WIDTH - keyWidth;
    for (const [k, v, style] of rows) {
      const vs = { size: 9.5, ...style };
      const h = Math.max(this.heightOf(k, keyWidth - 8, { size: 9 }), this.heightOf(v, valueWidth, vs));
      this.ensure(h + 4);
      this.style({ size: 9, color: INK.muted }).text(k, PAGE.left, this.y + 0.5, { features: FEATURES, width: keyWidth - 8, lineGap: 1.5 });
      this.style(vs).text(v, PAGE.left + keyWidth, this.y + (vs.size < 9.5 ? 1 : 0), { features: FEATURES, width: valueWidth, lineGap: 1.5 });
      this.y += h + 4;
    }
  }

  /** A table with a shaded header row, repeated after a page break. */
  table(columns: Column[], rows: Cell[][], size = 8.5): void {
    const pad = 4;
    const header = () => {
      const h = Math.max(...columns.map((c) => this.heightOf(c.title, c.width - 2 * pad, { size: 7.5, weight: 'semibold' }))) + 2 * pad;
      this.doc.rect(PAGE.left, this.y, CONTENT_WIDTH, h).fill(INK.paperSunk);
      let x = PAGE.left;
      for (const c of columns) {
        this.style({ size: 7.5, weight: 'semibold', color: INK.muted }).text(c.title, x + pad, this.y + pad, { features: FEATURES, width: c.width - 2 * pad, align: c.align ?? 'left', lineGap: 1 });
        x += c.width;
      }
      this.y += h;
    };
    this.ensure(60);
    header();
    for (const row of rows) {
      const h = Math.max(...row.map((cell, i) => this.heightOf(cell.text, columns[i]!.width - 2 * pad, { size, weight: cell.weight ?? 'regular' }))) + 2 * pad;
      if (this.y + h > PAGE.contentBottom) {
        this.addPage();
        header();
      }
      let x = PAGE.left;
      row.forEach((cell, i) => {
        const col = columns[i]!;
        if (cell.fill) this.doc.rect(x + 1, this.y + 1.5, col.width - 2, h - 3).fill(cell.fill);
        this.style({ size, weight: cell.weight ?? 'regular', color: cell.color ?? INK.ink }).text(cell.text, x + pad, this.y + pad, {
          width: col.width - 2 * pad,
          align: col.align ?? 'left',
          lineGap: 1.5,
        });
        x += col.width;
      });
      this.y += h;
      this.rule(INK.rule, 0.4);
    }
    this.y += 8;
  }

  /** A boxed note with a coloured bar on its left. */
  callout(title: string, body: string, tone: { bar: string; fill: string; title: string }): void {
    const width = CONTENT_WIDTH - 24;
    const h = this.heightOf(title, width, { size: 9.5, weight: 'semibold' }) + 4 + this.heightOf(body, width, { size: 9 }) + 20;
    this.ensure(h + 6);
    this.doc.rect(PAGE.left, this.y, CONTENT_WIDTH, h).fill(tone.fill);
    this.doc.rect(PAGE.left, this.y, 3, h).fill(tone.bar);
    this.style({ size: 9.5, weight: 'semibold', color: tone.title }).text(title, PAGE.left + 14, this.y + 10, { features: FEATURES, width, lineGap: 1.5 });
    const th = this.heightOf(title, width, { size: 9.5, weight: 'semibold' });
    this.style({ size: 9, color: INK.ink }).text(body, PAGE.left + 14, this.y + 10 + th + 4, { features: FEATURES, width, lineGap: 1.5 });
    this.y += h + 10;
  }

  /** Collects the finished file. Call after everything is drawn. */
  finish(): Promise<Buffer> {
    const chunks: Buffer[] = [];
    return new Promise((resolve, reject) => {
      this.doc.on('data', (c: Buffer) => chunks.push(c));
      this.doc.on('end', () => resolve(Buffer.concat(chunks)));
      this.doc.on('error', reject);
      this.doc.end();
    });
  }
}
