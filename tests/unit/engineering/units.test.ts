// Unit conversions against an outside library (convert-units 2.3.4). Its factors are rounded
// (3.28084 ft per m, 453.592 g per lb, 33.8140226 fl oz per L), so agreement is to its rounding,
// about one part in a million; our factors are the exact definitions.
import { describe, expect, it } from 'vitest';
import convert from 'convert-units';
import fc from 'fast-check';
import { units } from '../../../shared/engineering';
import { expectRel } from './helpers';

const value = fc.double({ min: -1e4, max: 1e4, noNaN: true });

describe('units', () => {
  it('ft to m and back', () => {
    expectRel(units.ftToM(1), convert(1).from('ft').to('m'), 2e-6);
    expectRel(units.mToFt(1), convert(1).from('m').to('ft'), 2e-6);
    // Definition of the international foot: exactly 0.3048 m.
    expect(units.ftToM(1)).toBe(0.3048);
  });

  it('in to mm and back', () => {
    expectRel(units.inToMm(1), convert(1).from('in').to('mm'), 2e-6);
    expectRel(units.mmToIn(25.4), convert(25.4).from('mm').to('in'), 2e-6);
    expect(units.inToMm(1)).toBe(25.4);
  });

  it('cy to m3 and back', () => {
    expectRel(units.cyToM3(1), convert(1).from('yd3').to('m3'), 2e-6);
    expectRel(units.m3ToCy(1), convert(1).from('m3').to('yd3'), 2e-6);
    // 1 cy is 27 ft^3: check against the library's ft3 too.
    expectRel(units.cyToM3(1), convert(27).from('ft3').to('m3'), 2e-6);
  });

  it('°F to °C and back', () => {
    for (const f of [-40, 0, 32, 60, 80, 120]) expectRel(units.fToC(f), convert(f).from('F').to('C'), 1e-9, 1e-9);
    for (const c of [-40, -12.2, 0, 26.7, 100]) expectRel(units.cToF(c), convert(c).from('C').to('F'), 1e-9, 1e-9);
  });

  it('kip to kN and kip·ft to kN·m, by mass times standard gravity', () => {
    // convert-units has no force unit; a pound-force is a pound of mass times g = 9.80665 m/s^2.
    const kNPerKip = (convert(1000).from('lb').to('kg') * 9.80665) / 1000;
    expectRel(units.kipToKn(1), kNPerKip, 2e-6);
    expectRel(units.kipFtToKnM(1), kNPerKip * convert(1).from('ft').to('m'), 4e-6);
    expectRel(units.kipPerFtToKnPerM(1), kNPerKip / convert(1).from('ft').to('m'), 4e-6);
  });

  it('round trips return the value', () => {
    fc.assert(
      fc.property(value, (x) => {
        expectRel(units.mToFt(units.ftToM(x)), x, 1e-12, 1e-12);
        expectRel(units.mmToIn(units.inToMm(x)), x, 1e-12, 1e-12);
        expectRel(units.knToKip(units.kipToKn(x)), x, 1e-12, 1e-12);
        expectRel(units.knMToKipFt(units.kipFtToKnM(x)), x, 1e-12, 1e-12);
        expectRel(units.m3ToCy(units.cyToM3(x)), x, 1e-12, 1e-12);
        expectRel(units.cToF(units.fToC(x)), x, 1e-12, 1e-9);
      }),
    );
  });
});
