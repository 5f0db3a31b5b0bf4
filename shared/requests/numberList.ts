// Span lengths typed as one line ("95, 120, 95", "95 120 95", "95 ft; 120 ft"). An empty line is
// no list at all, so a required list is asked for rather than judged; a piece that is not a
// number stays NaN, so the schema can say which span is wrong.
export function parseNumberList(text: string): number[] | undefined {
  const pieces = text
    .split(/[,;\s]+/)
    .map((p) => p.replace(/(ft|feet|')$/i, '').trim())
    .filter((p) => p !== '' && !/^(ft|feet)$/i.test(p));
  if (pieces.length === 0) return undefined;
  return pieces.map((p) => (/^[+-]?(\d+\.?\d*|\.\d+)$/.test(p) ? Number(p) : Number.NaN));
}
