import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import type { ReportBlock, ReportDocument } from './report-document';

/**
 * Draws a report document as PDF with pdfkit: Liberation Sans shipped in backend/assets/fonts (no
 * system or network fonts), A4 or US Letter, the farm and report name in every page's header,
 * page numbers in the footer, tables that break across pages and the bar chart as vector shapes.
 */
const FONT_DIR_CANDIDATES = [
  resolve(__dirname, '..', '..', 'assets', 'fonts'),
  resolve(process.cwd(), 'assets', 'fonts'),
];

function fontDir(): string {
  const dir = FONT_DIR_CANDIDATES.find((candidate) => existsSync(resolve(candidate, 'LiberationSans-Regular.ttf')));
  if (!dir)
    throw new Error(`report fonts are missing: expected LiberationSans-Regular.ttf in ${FONT_DIR_CANDIDATES[0]}`);
  return dir;
}

const MARGIN = 50;
const HEADER_SPACE = 28;
const TEXT = '#1d2a24';
const MUTED = '#5b6b63';
const RULE = '#c9d3ce';
const BAR = '#2e7d5b';

type Doc = PDFKit.PDFDocument;

function bottom(doc: Doc): number {
  return doc.page.height - MARGIN - 14;
}

function ensureSpace(doc: Doc, height: number): void {
  if (doc.y + height > bottom(doc)) doc.addPage();
}

function drawParagraph(doc: Doc, text: string): void {
  doc.font('body').fontSize(10).fillColor(TEXT);
  ensureSpace(
    doc,
    doc.heightOfString(text, { width: contentWidth(doc) }) > 200
      ? 30
      : doc.heightOfString(text, { width: contentWidth(doc) }),
  );
  doc.text(text, MARGIN, doc.y, { width: contentWidth(doc) });
  doc.moveDown(0.5);
}

function contentWidth(doc: Doc): number {
  return doc.page.width - 2 * MARGIN;
}

function drawFacts(doc: Doc, facts: Array<{ label: string; value: string }>): void {
  const labelWidth = 150;
  const valueWidth = contentWidth(doc) - labelWidth - 8;
  for (const fact of facts) {
    doc.fontSize(10);
    const height = Math.max(
      doc.font('bold').heightOfString(fact.label, { width: labelWidth }),
      doc.font('body').heightOfString(fact.value, { width: valueWidth }),
    );
    ensureSpace(doc, height + 3);
    const y = doc.y;
    doc.font('bold').fillColor(MUTED).text(fact.label, MARGIN, y, { width: labelWidth });
    doc
      .font('body')
      .fillColor(TEXT)
      .text(fact.value, MARGIN + labelWidth + 8, y, { width: valueWidth });
    doc.y = y + height + 3;
  }
  doc.moveDown(0.4);
}

/** Column widths in proportion to the longest text of each column, within sensible limits. */
function columnWidths(doc: Doc, columns: string[], rows: string[][]): number[] {
  const total = contentWidth(doc);
  const weights = columns.map((column, i) => {
    const longest = Math.max(column.length, ...rows.map((row) => (row[i] ?? '').length));
    return Math.min(Math.max(longest, 8), 60);
  });
  const sum = weights.reduce((a, b) => a + b, 0);
  return weights.map((w) => (w / sum) * total);
}

/**
 * A comparison: the row names take what they need up to a fifth of the width (at least 70 pt), the
 * compared columns share the rest equally, so no column is favoured and every one fits the page.
 */
function comparisonWidths(doc: Doc, columns: string[], rows: string[][]): number[] {
  const total = contentWidth(doc);
  doc.font('bold').fontSize(8.5);
  const longestName = Math.max(...rows.map((row) => doc.widthOfString(row[0] ?? '')), 0) + 6;
  const first = Math.min(Math.max(longestName, 70), total / 5);
  const others = columns.length - 1;
  return [first, ...Array.from({ length: others }, () => (total - first) / Math.max(others, 1))];
}

function drawTable(doc: Doc, columns: string[], rows: string[][], comparison = false): void {
  const widths = comparison ? comparisonWidths(doc, columns, rows) : columnWidths(doc, columns, rows);
  const pad = 3;
  const drawRow = (cells: string[], header: boolean) => {
    const fontOf = (i: number) => (header || (comparison && i === 0) ? 'bold' : 'body');
    doc.fontSize(8.5);
    const heights = cells.map((cell, i) =>
      doc.font(fontOf(i)).heightOfString(cell || ' ', { width: widths[i]! - 2 * pad }),
    );
    const height = Math.max(...heights) + 2 * pad;
    if (doc.y + height > bottom(doc)) {
      doc.addPage();
      if (!header) drawRow(columns, true);
    }
    const y = doc.y;
    let x = MARGIN;
    if (header) doc.rect(MARGIN, y, contentWidth(doc), height).fill('#eef3f0');
    cells.forEach((cell, i) => {
      doc
        .font(fontOf(i))
        .fillColor(header ? MUTED : TEXT)
        .text(cell, x + pad, y + pad, { width: widths[i]! - 2 * pad });
      x += widths[i]!;
    });
    doc
      .moveTo(MARGIN, y + height)
      .lineTo(MARGIN + contentWidth(doc), y + height)
      .lineWidth(0.5)
      .strokeColor(RULE)
      .stroke();
    doc.y = y + height;
  };
  drawRow(columns, true);
  for (const row of rows) drawRow(row, false);
  doc.moveDown(0.6);
}

function drawList(doc: Doc, items: string[]): void {
  doc.font('body').fontSize(10).fillColor(TEXT);
  for (const item of items) {
    const height = doc.heightOfString(item, { width: contentWidth(doc) - 14 });
    ensureSpace(doc, Math.min(height, 60) + 2);
    const y = doc.y;
    doc.text('•', MARGIN, y, { width: 10 });
    doc.text(item, MARGIN + 14, y, { width: contentWidth(doc) - 14 });
    doc.moveDown(0.25);
  }
  doc.moveDown(0.4);
}

/** Horizontal bars drawn as vector rectangles, labelled with their values. */
function drawBars(doc: Doc, block: ReportBlock): void {
  const bars = block.bars ?? [];
  const rowHeight = 18;
  const height = 20 + bars.length * rowHeight;
  ensureSpace(doc, height);
  doc
    .font('bold')
    .fontSize(9)
    .fillColor(MUTED)
    .text(block.caption ?? '', MARGIN, doc.y);
  const top = doc.y + 4;
  const labelWidth = 110;
  const valueWidth = 90;
  const barWidth = contentWidth(doc) - labelWidth - valueWidth - 10;
  const max = Math.max(...bars.map((b) => b.value), 1e-9);
  bars.forEach((bar, i) => {
    const y = top + i * rowHeight;
    doc
      .font('body')
      .fontSize(9)
      .fillColor(TEXT)
      .text(bar.label, MARGIN, y + 3, { width: labelWidth - 6 });
    const width = Math.max(0, (bar.value / max) * barWidth);
    doc.rect(MARGIN + labelWidth, y + 2, width, rowHeight - 6).fill(BAR);
    doc
      .fillColor(TEXT)
      .text(`${bar.value.toLocaleString('en-US')} ${block.unit ?? ''}`, MARGIN + labelWidth + width + 6, y + 3, {
        width: valueWidth + (barWidth - width),
      });
  });
  doc.y = top + bars.length * rowHeight + 8;
  doc.x = MARGIN;
}

function drawBlock(doc: Doc, block: ReportBlock): void {
  switch (block.kind) {
    case 'paragraph':
      drawParagraph(doc, block.text ?? '');
      break;
    case 'facts':
      drawFacts(doc, block.facts ?? []);
      break;
    case 'table':
      drawTable(doc, block.columns ?? [], block.rows ?? [], block.comparison === true);
      break;
    case 'list':
      drawList(doc, block.items ?? []);
      break;
    case 'bars':
      drawBars(doc, block);
      break;
  }
}

/**
 * The whole PDF in memory (a report is tens of kilobytes). pdfkit and its font engine are loaded
 * with the first report, not at start: they hold about 4 MB of a server's memory that most
 * processes would never use.
 */
export async function renderReportPdf(report: ReportDocument, producedAt: Date = new Date()): Promise<Buffer> {
  const fonts = fontDir();
  const { default: PDFDocument } = await import('pdfkit');
  const doc = new PDFDocument({
    size: report.pageSize,
    margins: { top: MARGIN + HEADER_SPACE, bottom: MARGIN, left: MARGIN, right: MARGIN },
    bufferPages: true,
    info: { Title: `${report.title} — ${report.farmName}`, Author: 'Thermbay', CreationDate: producedAt },
  });
  doc.registerFont('body', resolve(fonts, 'LiberationSans-Regular.ttf'));
  doc.registerFont('bold', resolve(fonts, 'LiberationSans-Bold.ttf'));
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolvePdf, reject) => {
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolvePdf(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  doc
    .font('bold')
    .fontSize(18)
    .fillColor(TEXT)
    .text(report.title, MARGIN, doc.y, { width: contentWidth(doc) });
  doc
    .font('body')
    .fontSize(10)
    .fillColor(MUTED)
    .text(report.subtitle, { width: contentWidth(doc) });
  doc.moveDown(0.8);
  for (const section of report.sections) {
    ensureSpace(doc, 60);
    doc
      .font('bold')
      .fontSize(13)
      .fillColor(TEXT)
      .text(section.heading, MARGIN, doc.y, { width: contentWidth(doc) });
    doc.moveDown(0.3);
    for (const block of section.blocks) drawBlock(doc, block);
    doc.moveDown(0.4);
  }
  ensureSpace(doc, 40);
  doc
    .font('body')
    .fontSize(8.5)
    .fillColor(MUTED)
    .text(report.footer, MARGIN, doc.y, { width: contentWidth(doc) });

  // header and page numbers on every page, once the page count is known
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i += 1) {
    doc.switchToPage(i);
    const width = contentWidth(doc);
    doc.page.margins.top = 0;
    doc.page.margins.bottom = 0;
    doc
      .font('body')
      .fontSize(8.5)
      .fillColor(MUTED)
      .text(`${report.farmName} — ${report.title}`, MARGIN, MARGIN - 10, { width, lineBreak: false, ellipsis: true });
    doc
      .moveTo(MARGIN, MARGIN + 4)
      .lineTo(MARGIN + width, MARGIN + 4)
      .lineWidth(0.5)
      .strokeColor(RULE)
      .stroke();
    doc.text(`Page ${i - range.start + 1} of ${range.count}`, MARGIN, doc.page.height - MARGIN + 10, {
      width,
      align: 'right',
      lineBreak: false,
    });
  }
  doc.end();
  return done;
}
