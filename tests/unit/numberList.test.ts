import { describe, expect, it } from 'vitest';
import { parseNumberList } from '../../shared/requests/numberList';

describe('span lengths typed on one line', () => {
  it('reads commas, spaces, semicolons and a trailing unit', () => {
    expect(parseNumberList('95, 120, 95')).toEqual([95, 120, 95]);
    expect(parseNumberList('95 120 95')).toEqual([95, 120, 95]);
    expect(parseNumberList('95 ft; 120 ft; 95.5ft')).toEqual([95, 120, 95.5]);
  });

  it('gives no list for an empty line, and NaN for a piece that is not a number', () => {
    expect(parseNumberList('   ')).toBeUndefined();
    const parsed = parseNumberList('95, abc, 95')!;
    expect(parsed[0]).toBe(95);
    expect(Number.isNaN(parsed[1])).toBe(true);
  });
});
