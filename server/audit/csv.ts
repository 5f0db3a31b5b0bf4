// CSV as RFC 4180 has it (CRLF between records, quotes doubled inside quoted cells), made safe to
// open in a spreadsheet: a cell that a spreadsheet would run as a formula gets a leading apostrophe.
// A cell that already starts with an apostrophe gets one too, so a reader who drops one leading
// apostrophe always gets the stored text back, and the trail's hashes can be recomputed from it.
const formulaStart = /^[=+\-@\t\r']/;

export function csvCell(value: string | number | null): string {
  if (value === null) return '';
  let text = String(value);
  if (typeof value === 'string' && formulaStart.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function csvDocument(header: string[], rows: (string | number | null)[][]): string {
  return [header, ...rows].map((row) => row.map(csvCell).join(',')).join('\r\n') + '\r\n';
}
