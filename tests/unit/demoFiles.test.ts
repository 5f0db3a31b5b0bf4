// The demo scenario's attachment generators: each file is what the upload rules accept, says what
// it should, is drawn the size it should be, and comes out the same bytes for the same spec.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { letterDocument, sealDataSheet, sitePhoto, sitePhotoSubjects, submittalSketch, type DemoFile, type SketchSpec } from '../../server/demo/demoFiles';
import { chooseScale, packLabels, type PlacedLabel } from '../../server/demo/demoFiles/sketchLayout';
import { feetInches } from '../../server/demo/demoFiles/pdfDocument';
import { acceptedFileTypes, refusedByName } from '../../server/storage/acceptedFileTypes';
import { pdfText } from '../support/documents';

async function pageSize(pdf: Buffer): Promise<{ pages: number; width: number; height: number }> {
  const { getDocument } = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await getDocument({ data: new Uint8Array(pdf), useSystemFonts: false, isEvalSupported: false }).promise;
  const [, , width, height] = (await doc.getPage(1)).view as [number, number, number, number];
  return { pages: doc.numPages, width, height };
}

async function expectAccepted(file: DemoFile) {
  const sniffed = await fileTypeFromBuffer(file.bytes);
  expect(sniffed?.mime).toBe(file.contentType);
  expect(acceptedFileTypes[file.contentType]).toBeDefined();
  expect(refusedByName(file.fileName)).toBe(false);
}

const sketch: SketchSpec = {
  fileName: 'cj2-relocation-sketch.pdf',
  agency: 'Marrowfield State Highway Department',
  projectName: 'Test Creek Bridge, SR 4',
  structureNumber: '99-0001',
  sheet: 'SK-2',
  title: 'Deck construction joint CJ-2 relocated toward Pier 1',
  preparedBy: 'A. Contractor, Example Builders',
  date: '2027-04-02',
  spansFt: [95, 120, 95],
  segments: [
    { fromFt: 0, toFt: 70, order: 1 },
    { fromFt: 240, toFt: 310, order: 2 },
    { fromFt: 125, toFt: 185, order: 3 },
    { fromFt: 70, toFt: 125, order: 4 },
    { fromFt: 185, toFt: 240, order: 5 },
  ],
  marks: [
    { atFt: 125, label: 'CJ-2', kind: 'planned' },
    { atFt: 107, label: 'CJ-2', kind: 'proposed' },
    { atFt: 160, label: 'EJ-A', kind: 'emergency' },
  ],
  expansionJoints: [{ atFt: 310, label: 'Finger joint EJ-2' }],
  notes: ['Joint CJ-2 moves 18 ft toward Pier 1.', 'Joint face roughened and doweled per sheet S-7.'],
};

describe('submittal sketch', () => {
  it('is a PDF the upload rules accept, on an 11x17 sheet in landscape', async () => {
    const file = await submittalSketch(sketch);
    await expectAccepted(file);
    // ANSI B (tabloid) is 11 x 17 in, 792 x 1224 pt at 72 pt per inch (ASME Y14.1 sheet sizes).
    expect(await pageSize(file.bytes)).toEqual({ pages: 1, width: 1224, height: 792 });
  });

  it('carries the title block, the disclaimer, the supports, the spans and the joints with their stations', async () => {
    const text = await pdfText((await submittalSketch(sketch)).bytes);
    for (const s of [
      'Marrowfield State Highway Department',
      'Test Creek Bridge, SR 4',
      '99-0001',
      'SK-2',
      'Deck construction joint CJ-2 relocated toward',
      'A. Contractor, Example Builders',
      '2027-04-02',
      'SUBMITTAL SKETCH - NOT A SEALED PLAN',
      'Submittal sketch for review; not a sealed plan',
      'Abut 1',
      'Pier 1',
      'Pier 2',
      'Abut 2',
      'Span 1',
      'Span 2',
      'Span 3',
      `95'-0"`,
      `120'-0"`,
      `310'-0" total`,
      `Proposed · 107'-0" from C/L Brg. Abut 1`,
      `Planned · 125'-0" from C/L Brg. Abut 1`,
      `Emergency · 160'-0" from C/L Brg. Abut 1`,
      'Finger joint EJ-2',
      'Joint CJ-2 moves 18 ft toward Pier 1.',
      'PLACEMENT SEQUENCE',
      `1" = 30'-0"`,
    ]) {
      expect(text).toContain(s);
    }
    expect(text).not.toContain('Pier 3');
  });

  it('draws a single span between two abutments with no pier', async () => {
    const single = { ...sketch, title: 'Single-span deck', spansFt: [62.5], segments: [], marks: [], expansionJoints: [], notes: ['Deck placed in one pour.'] };
    const text = await pdfText((await submittalSketch(single)).bytes);
    expect(text).toContain(`62'-6"`);
    expect(text).toContain('Abut 2');
    expect(text).not.toContain('Pier 1');
    // At 1" = 5'-0" the 62.5 ft span is 12.5 in long, within the 13.1 in the sheet leaves.
    expect(text).toContain(`1" = 5'-0"`);
  });

  it('is the same bytes for the same spec, and the date changes them', async () => {
    const a = await submittalSketch(sketch);
    const b = await submittalSketch(sketch);
    expect(a.bytes.equals(b.bytes)).toBe(true);
    // The creation date comes from the spec (noon UTC of its day), not the clock.
    expect(a.bytes.toString('latin1')).toContain('(D:20270402120000Z)');
    const c = await submittalSketch({ ...sketch, date: '2027-04-03' });
    expect(c.bytes.equals(a.bytes)).toBe(false);
  });

  it('refuses a spec it cannot draw truthfully', async () => {
    await expect(submittalSketch({ ...sketch, spansFt: [] })).rejects.toThrow(/spansFt is empty/);
    await expect(submittalSketch({ ...sketch, spansFt: [95, -10] })).rejects.toThrow(/span 2 is -10 ft/);
    await expect(submittalSketch({ ...sketch, marks: [{ atFt: 311, label: 'CJ-9', kind: 'proposed' }] })).rejects.toThrow(/"CJ-9" at 311 ft is beyond the girder line \(0 to 310 ft\)/);
    await expect(submittalSketch({ ...sketch, expansionJoints: [{ atFt: -1, label: 'EJ-0' }] })).rejects.toThrow(/beyond the girder line/);
    await expect(submittalSketch({ ...sketch, segments: [{ fromFt: 80, toFt: 20, order: 1 }] })).rejects.toThrow(/placement 1/);
    await expect(submittalSketch({ ...sketch, segments: [{ fromFt: 0, toFt: 20, order: 1 }, { fromFt: 20, toFt: 40, order: 1 }] })).rejects.toThrow(/used once/);
    await expect(submittalSketch({ ...sketch, date: '2027-02-30' })).rejects.toThrow(/not a calendar date/);
    await expect(submittalSketch({ ...sketch, fileName: 'sketch.png' })).rejects.toThrow(/must end in \.pdf/);
    // What does not fit the sheet is refused, never silently left off.
    await expect(submittalSketch({ ...sketch, notes: Array.from({ length: 30 }, (_, i) => `Note ${i + 1} about the placement.`) })).rejects.toThrow(/notes need \d+ pt/);
    const many = Array.from({ length: 31 }, (_, i) => ({ fromFt: i * 10, toFt: i * 10 + 10, order: i + 1 }));
    await expect(submittalSketch({ ...sketch, spansFt: [310], segments: many })).rejects.toThrow(/do not fit the placement table/);
  });
});

describe('sketch layout', () => {
  it('picks the largest plan scale whose drawing fits the sheet', () => {
    // Engineer's scales of 10, 20, 30 ... ft to the inch (common practice).
    expect(chooseScale(310, 13.1)).toBe(30); // 310/20 = 15.5 in is too long, 310/30 = 10.3 in fits
    expect(chooseScale(100, 13.1)).toBe(10);
    expect(chooseScale(131, 13.1)).toBe(10); // exactly 13.1 in
    expect(chooseScale(132, 13.1)).toBe(20);
    expect(() => chooseScale(10_000, 13.1)).toThrow(/does not fit/);
  });

  // The rule every placement keeps: on one level labels do not overlap; on different levels the
  // higher label's leader (rising from the deck at its mark) does not pass through the lower label,
  // unless both marks are at one station and share the leader.
  const expectReadable = (boxes: { x: number; width: number }[], placed: PlacedLabel[], left: number, right: number) => {
    placed.forEach((a, i) => {
      expect(a.left).toBeGreaterThanOrEqual(left);
      expect(a.right).toBeLessThanOrEqual(right);
      expect(a.right - a.left).toBe(boxes[i]!.width);
      expect(a.anchorX).toBe(boxes[i]!.x);
      placed.forEach((b, j) => {
        if (i === j) return;
        if (a.level === b.level) expect(a.right <= b.left || b.right <= a.left).toBe(true);
        if (a.level < b.level && Math.abs(a.anchorX - b.anchorX) > 1) expect(b.anchorX < a.left - 2 || b.anchorX > a.right + 2).toBe(true);
      });
    });
  };

  it('places crowded joint labels, near either edge of the sheet too, so every label can be read', () => {
    const boxes = [300, 310, 318, 330, 345, 500, 505, 900, 1150, 1160].map((x, i) => ({ x, width: 90 + (i % 3) * 30 }));
    const placed = packLabels(boxes, 60, 1190);
    expectReadable(boxes, placed, 60, 1190);
    expect(Math.max(...placed.map((p) => p.level))).toBeLessThan(7);
  });

  it('stacks the labels of two marks at one station on a shared leader', () => {
    const placed = packLabels([{ x: 500, width: 80 }, { x: 500, width: 80 }], 60, 1190);
    expect(placed.map((p) => p.level).sort()).toEqual([0, 1]);
  });

  it('keeps every label readable for any handful of marks along the girder', () => {
    fc.assert(
      fc.property(fc.array(fc.record({ x: fc.integer({ min: 200, max: 1130 }), width: fc.integer({ min: 60, max: 170 }) }), { minLength: 1, maxLength: 8 }), (boxes) => {
        const placed = packLabels(boxes, 62, 1189);
        expectReadable(boxes, placed, 62, 1189);
        expect(Math.max(...placed.map((p) => p.level))).toBeLessThan(7);
      }),
      { numRuns: 400 },
    );
  });

  it('writes feet and inches the way plan dimensions are written', () => {
    expect(feetInches(107.5)).toBe(`107'-6"`);
    expect(feetInches(125)).toBe(`125'-0"`);
    expect(feetInches(0.99)).toBe(`1'-0"`); // 11.88 in rounds to a whole foot
    expect(feetInches(62 + 1 / 12)).toBe(`62'-1"`);
  });
});

describe('seal data sheet', () => {
  const seal = {
    fileName: 'strip-seal-data.pdf',
    manufacturer: 'Brannock Seal Works',
    product: 'BSW-400 Strip Seal',
    familyLabel: 'Strip seal: preformed elastomeric gland in steel edge rails',
    movementCapacityIn: 4,
    minOpeningIn: 0,
    maxOpeningIn: 4,
    notes: ['Install the gland in one continuous piece, curb to curb.'],
  };

  it('is a one-page letter PDF naming the product, its family and its movement range in inches and millimetres', async () => {
    const file = await sealDataSheet(seal);
    await expectAccepted(file);
    // US letter is 8.5 x 11 in, 612 x 792 pt.
    expect(await pageSize(file.bytes)).toEqual({ pages: 1, width: 612, height: 792 });
    const text = await pdfText(file.bytes);
    for (const s of ['Brannock Seal Works', 'BSW-400 Strip Seal', 'Strip seal: preformed elastomeric gland', 'Movement capacity', 'Minimum opening', 'Maximum opening', 'Install the gland']) {
      expect(text).toContain(s);
    }
    // 4 in x 25.4 mm/in (exact by the 1959 international yard and pound agreement) = 101.6, shown as 102.
    expect(text).toMatch(/Movement capacity 4 102/);
    expect(text).toMatch(/Maximum opening 4 102/);
  });

  it('draws a compression seal for a compression-seal family and stays deterministic', async () => {
    const spec = { ...seal, product: 'CS-250 Compression Seal', familyLabel: 'Preformed compression seal', movementCapacityIn: 1.25, minOpeningIn: 1.25, maxOpeningIn: 2.5 };
    const a = await sealDataSheet(spec);
    const b = await sealDataSheet(spec);
    expect(a.bytes.equals(b.bytes)).toBe(true);
    // 1.25 in = 31.75 mm, shown as 32; 2.5 in = 63.5 mm, shown as 64 (rounded half up).
    expect(await pdfText(a.bytes)).toMatch(/Maximum opening 2\.5 64/);
  });

  it('refuses movement the opening range cannot give', async () => {
    await expect(sealDataSheet({ ...seal, movementCapacityIn: 5 })).rejects.toThrow(/no more than the opening range 4 in/);
    await expect(sealDataSheet({ ...seal, minOpeningIn: 3, maxOpeningIn: 2 })).rejects.toThrow(/opening must run/);
  });
});

describe('letter', () => {
  const letter = {
    fileName: 'tb3-time-of-setting.pdf',
    letterhead: ['Ashgrove Materials Testing', '1180 Quarry Bend Road'],
    date: '2027-03-18',
    to: ['A. Contractor', 'Example Builders'],
    subject: 'Time of setting, trial batch TB-3',
    paragraphs: ['We tested the mortar sieved from trial batch TB-3 for time of setting.'],
    table: { caption: 'ASTM C403 time of setting, trial batch TB-3', rows: [['Initial set (500 psi)', '11 h 30 min'], ['Final set (4000 psi)', '15 h 05 min']] as [string, string][] },
    signature: ['Sincerely,', 'L. Tester', 'Laboratory manager'],
  };

  it('is a letter PDF with its date written out, subject, table and signature', async () => {
    const file = await letterDocument(letter);
    await expectAccepted(file);
    expect((await pageSize(file.bytes)).width).toBe(612);
    const text = await pdfText(file.bytes);
    for (const s of ['Ashgrove Materials Testing', 'March 18, 2027', 'Subject: Time of setting, trial batch TB-3', 'ASTM C403 time of setting', 'Initial set (500 psi)', '11 h 30 min', 'Sincerely,', 'L. Tester']) {
      expect(text).toContain(s);
    }
  });

  it('runs onto a second page when the body is long, and is the same bytes each time', async () => {
    const long = { ...letter, paragraphs: Array.from({ length: 14 }, (_, i) => `Paragraph ${i + 1}. ${'The test followed the standard procedure at the stated temperature. '.repeat(4)}`) };
    const a = await letterDocument(long);
    expect((await pageSize(a.bytes)).pages).toBeGreaterThan(1);
    expect((await pdfText(a.bytes)).replace(/\s/g, '')).toContain('L.Tester');
    expect(a.bytes.equals((await letterDocument(long)).bytes)).toBe(true);
  });

  it('refuses a letter with no date, subject or signature', async () => {
    await expect(letterDocument({ ...letter, date: '18 March 2027' })).rejects.toThrow(/YYYY-MM-DD/);
    await expect(letterDocument({ ...letter, subject: ' ' })).rejects.toThrow(/subject/);
    await expect(letterDocument({ ...letter, signature: [] })).rejects.toThrow(/signature/);
  });
});

describe('site photo', () => {
  it.each(sitePhotoSubjects)('%s is a 1600x1200 JPEG of 100-400 KB that the upload rules accept and is not blank', async (subject) => {
    const file = await sitePhoto({ fileName: `${subject}.jpg`, subject, seed: 11 });
    await expectAccepted(file);
    const meta = await sharp(file.bytes).metadata();
    expect([meta.width, meta.height, meta.format]).toEqual([1600, 1200, 'jpeg']);
    expect(file.bytes.length).toBeGreaterThan(100 * 1024);
    expect(file.bytes.length).toBeLessThan(400 * 1024);
    // Exposed like a photo (neither black nor blown out) and with something in it.
    const stats = await sharp(file.bytes).stats();
    const mean = stats.channels.slice(0, 3).reduce((s, c) => s + c.mean, 0) / 3;
    expect(mean).toBeGreaterThan(60);
    expect(mean).toBeLessThan(210);
    expect(Math.min(...stats.channels.slice(0, 3).map((c) => c.stdev))).toBeGreaterThan(9);
  }, 20_000);

  it('is the same bytes for the same seed and another picture for another seed', async () => {
    const spec = { fileName: 'pour.jpg', subject: 'deck_pour' as const, seed: 5 };
    const a = await sitePhoto(spec);
    const b = await sitePhoto(spec);
    expect(a.bytes.equals(b.bytes)).toBe(true);
    const c = await sitePhoto({ ...spec, seed: 6 });
    expect(c.bytes.equals(a.bytes)).toBe(false);
  }, 20_000);

  it('refuses an unknown subject, a fractional seed or a name that is not a JPEG', async () => {
    await expect(sitePhoto({ fileName: 'x.jpg', subject: 'bridge_selfie' as never, seed: 1 })).rejects.toThrow(/no scene for subject "bridge_selfie"/);
    await expect(sitePhoto({ fileName: 'x.jpg', subject: 'rebar_mat', seed: 1.5 })).rejects.toThrow(/whole number/);
    await expect(sitePhoto({ fileName: 'x.png', subject: 'rebar_mat', seed: 1 })).rejects.toThrow(/must end in \.jpg or \.jpeg/);
  });
});
