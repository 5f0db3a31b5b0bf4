// Reading what the API hands out as files: a binary body through supertest, the trail CSV as
// RFC 4180 has it, and the text of a PDF.
export const binary = (res: unknown, cb: (err: Error | null, body: unknown) => void) => {
  const r = res as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  r.on('data', (c: Buffer) => chunks.push(c));
  r.on('end', () => cb(null, Buffer.concat(chunks)));
};

// RFC 4180: records end in CRLF; a quoted cell may hold commas, CR, LF and doubled quotes.
export function parseCsv(text: string): string[][] {
  const records: string[][] = [];
  let record: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (c === '"') quoted = false;
      else cell += c;
    } else if (c === '"' && cell === '') quoted = true;
    else if (c === ',') {
      record.push(cell);
      cell = '';
    } else if (c === '\r' && text[i + 1] === '\n') {
      record.push(cell);
      records.push(record);
      record = [];
      cell = '';
      i++;
    } else if (c === '"' || c === '\r' || c === '\n') throw new Error(`bare ${JSON.stringify(c)} at ${i}: not RFC 4180`);
    else cell += c;
  }
  if (quoted || cell !== '' || record.length) throw new Error('the last record is not closed by CRLF');
  return records;
}

// The export marks a cell a spreadsheet would run (or one already starting with an apostrophe)
// with one leading apostrophe; taking it off gives the stored text back.
export const unguard = (cell: string) => (cell.startsWith("'") ? cell.slice(1) : cell);

export async function pdfText(pdf: Buffer): Promise<string> {
  const { getDocument } = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, isEvalSupported: false }).promise;
  let text = '';
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    text += content.items.map((item) => ('str' in item ? item.str : '')).join(' ') + '\n';
  }
  return text.replace(/\s+/g, ' ');
}
