// The pdfkit set-up the demo documents share: Work Sans embedded from the app's own font package
// (the same files the decision record uses), and dates and document id fixed from the spec, so one
// spec always gives the same bytes (pdfkit derives the trailer ID from the info dictionary).
import PDFDocument from 'pdfkit';
import { workSans } from '../../documents/workSansFonts';

const fonts = workSans;
export type FontName = keyof typeof fonts;

// A calendar date as the documents carry it; noon UTC so no time zone moves it to another day.
export function calendarDate(what: string, date: string): Date {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  const at = match ? new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3]), 12)) : null;
  if (!at || at.toISOString().slice(0, 10) !== date) throw new Error(`${what}: date "${date}" is not a calendar date written YYYY-MM-DD`);
  return at;
}

const months = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];
export const longDate = (at: Date) => `${months[at.getUTCMonth()]} ${at.getUTCDate()}, ${at.getUTCFullYear()}`;

export function requireFileName(what: string, fileName: string, endings: RegExp, inWords: string): void {
  if (!endings.test(fileName.trim())) throw new Error(`${what}: file name "${fileName}" must end in ${inWords}`);
}

export type PdfSetup = {
  size: 'LETTER' | 'TABLOID';
  layout?: 'portrait' | 'landscape';
  margin: number;
  title: string;
  author: string;
  subject: string;
  date: Date;
};

export function openPdf(setup: PdfSetup): { doc: PDFKit.PDFDocument; finished: Promise<Buffer> } {
  const doc = new PDFDocument({
    size: setup.size,
    layout: setup.layout ?? 'portrait',
    margin: setup.margin,
    info: {
      Title: setup.title,
      Author: setup.author,
      Subject: setup.subject,
      Creator: 'Spanrelay demo seed',
      Producer: 'PDFKit',
      CreationDate: setup.date,
      ModDate: setup.date,
    },
  });
  for (const [name, path] of Object.entries(fonts)) doc.registerFont(name, path);
  doc.font('body');
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const finished = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  return { doc, finished };
}

// Feet and whole inches the way plan dimensions are written: 107.5 -> 107'-6".
export function feetInches(ft: number): string {
  const totalInches = Math.round(ft * 12);
  const sign = totalInches < 0 ? '-' : '';
  const abs = Math.abs(totalInches);
  return `${sign}${Math.floor(abs / 12)}'-${abs % 12}"`;
}

// A dash pattern of several lengths (centre lines, dash-dot joints). pdfkit takes an array, but its
// type declarations only know dash(length, options).
export function dashPattern(doc: PDFKit.PDFDocument, pattern: number[]): PDFKit.PDFDocument {
  return (doc as unknown as { dash(p: number[]): PDFKit.PDFDocument }).dash(pattern);
}
