// Small real files of each kind the product takes, so type sniffing sees genuine bytes.
import sharp from 'sharp';
import PDFDocument from 'pdfkit';

export async function samplePdf(text = 'Sheet S-12, marked up'): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'LETTER' });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve) => doc.on('end', () => resolve(Buffer.concat(chunks))));
  doc.text(text);
  doc.end();
  return done;
}

export async function samplePhoto(width = 64, height = 48, colour = '#8a8f94'): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: colour } }).jpeg({ quality: 80 }).toBuffer();
}

export async function samplePng(width = 32, height = 32): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 4, background: '#1f3a4d' } }).png().toBuffer();
}

// A file that starts like a PDF and runs to `bytes`, for size limits.
export function pdfOfSize(bytes: number): Buffer {
  const head = Buffer.from('%PDF-1.4\n%\xe2\xe3\xcf\xd3\n');
  const out = Buffer.alloc(bytes, 0x20);
  head.copy(out);
  return out;
}
