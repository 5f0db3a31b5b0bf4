// What a request may carry, judged by the file's own bytes, never by its name or the browser's word.
export const acceptedFileTypes: Record<string, string> = {
  'application/pdf': 'PDF',
  'image/png': 'PNG image',
  'image/jpeg': 'JPEG photo',
  'image/heic': 'HEIC photo',
  'image/heif': 'HEIF photo',
  'image/webp': 'WebP image',
  'application/vnd.openxmlformats-officedocument.wordprocessingml.document': 'Word document',
  'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet': 'Excel workbook',
  'application/vnd.openxmlformats-officedocument.presentationml.presentation': 'PowerPoint presentation',
  'application/vnd.oasis.opendocument.text': 'OpenDocument text',
  'application/vnd.oasis.opendocument.spreadsheet': 'OpenDocument spreadsheet',
  // Word, Excel and PowerPoint files of before 2007 share one container format.
  'application/x-cfb': 'Office document (97–2003)',
};

// Names a computer would run or render rather than open as a document: refused whatever the bytes
// are, since the file is saved under its own name ("drawing.pdf.exe") when someone downloads it.
const runnableEndings = /\.(exe|com|bat|cmd|msi|scr|pif|cpl|dll|jar|js|mjs|vbs|vbe|wsf|wsh|hta|ps1|psm1|sh|bash|app|lnk|reg|html?|xhtml|svgz?|xml|php|asp|aspx|jsp)$/i;
export const refusedByName = (fileName: string) => runnableEndings.test(fileName.trim().replace(/[.\s]+$/, ''));

export const acceptedTypesInWords = 'PDF, PNG, JPEG, HEIC or WebP photos, and Word, Excel, PowerPoint or OpenDocument files';

// Images a preview can be made of (HEIC needs a codec the server does not carry).
export const previewableTypes = new Set(['image/png', 'image/jpeg', 'image/webp']);
