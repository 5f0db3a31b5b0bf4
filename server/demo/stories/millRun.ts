// Millbrack Run Bridge (MR-0409): a single 36 ft cast-in-place concrete slab span with strip seals
// at both abutments, in the Brackwater Section. Grennock Heavy Civil build it. All invented.
import type { RequestBody } from '../../../shared/requests/requestBody';
import type { RequestStory, StoryCalendar } from '../storyTypes';

const contractorLetterhead = ['Grennock Heavy Civil', '18 Weir Street, Brackwater'];

type JointBody = Extract<RequestBody, { type: 'construction_joint_relocation' }>;

export function millRunStories(cal: StoryCalendar): RequestStory[] {
  return [
    {
      project: 'millRun',
      filedBy: 'rosa',
      filedOn: { daysAgo: 13, at: '09:30' },
      body: {
        type: 'joint_seal_substitution',
        title: 'Substitute strip seal at both abutments',
        location: { description: 'Deck joints at abutments 1 and 2' },
        planSheets: ['M-6'],
        reason: 'The strip seal rails of sheet M-6 are on back order for ten weeks; the substitute is the same family with a wider working range and is in stock.',
        proposedChange: 'Install the substitute strip seal (rails and gland) at both abutments in the blockouts of sheet M-6.',
        neededBy: cal.date(20),
        costImpact: { kind: 'none' },
        contractTimeImpactDays: 0,
        jointLocation: 'Abutments 1 and 2',
        specified: { kind: 'strip_seal', product: 'Strip seal per sheet M-6', movementCapacityIn: 0.5, minOpeningIn: 1.25, maxOpeningIn: 1.75 },
        substitute: { kind: 'strip_seal', product: 'Pellquist PS-300 strip seal', movementCapacityIn: 2.5, minOpeningIn: 0.5, maxOpeningIn: 3 },
        // The slab is held at mid-length, so each joint takes the movement of half of it.
        contributingLengthFt: 18,
        material: 'concrete',
        climate: 'moderate',
        installTempF: 65,
        gapAtReferenceIn: 1.5,
        referenceTempF: 60,
      },
      steps: [
        {
          on: { daysAgo: 13, at: '09:45' },
          by: 'rosa',
          attach: {
            make: 'dataSheet',
            fileName: 'PS-300 strip seal data sheet.pdf',
            manufacturer: 'Pellquist Expansion Products',
            product: 'PS-300 strip seal',
            familyLabel: 'Strip seal',
            movementCapacityIn: 2.5,
            minOpeningIn: 0.5,
            maxOpeningIn: 3,
            notes: ['Rails anchored with studs at 12 in.', 'Gland installed after the rails are cast in.'],
          },
        },
        { on: { daysAgo: 13, at: '09:50' }, by: 'rosa', attach: { make: 'photo', fileName: 'PS-300 on a twin structure.jpg', subject: 'strip_seal_installed', seed: 4091 } },
        { on: { daysAgo: 12, at: '11:00' }, by: 'rosa', move: { type: 'submit' } },
        { on: { daysAgo: 10, at: '09:15' }, by: 'owen', move: { type: 'forward', comment: 'Field fit checked: the blockouts on sheet M-6 take the substitute rails.' } },
        { on: { daysAgo: 9, at: '10:30' }, by: 'marcus', route: 'ruth' },
        {
          on: { daysAgo: 7, at: '08:40' },
          by: 'marcus',
          reassign: 'ines',
          comment: 'Reassigned: Ruth Caldera is away until next month, and Ines Marwood has the county-road structures.',
        },
      ],
    },
    {
      project: 'millRun',
      filedBy: 'rosa',
      filedOn: { daysAgo: 22, at: '07:45' },
      body: {
        type: 'construction_joint_relocation',
        title: 'Move the abutment 2 backwall construction joint down 12 in',
        location: { description: 'Abutment 2, horizontal construction joint in the backwall' },
        planSheets: ['M-4'],
        reason: 'The form panels of the first lift cannot reach the bridge seat elevation; the lift ends 12 in lower.',
        proposedChange: 'Make the horizontal construction joint 12 in below the bridge seat, keyed and roughened, with the backwall dowels extended to lap above it.',
        neededBy: cal.date(10),
        costImpact: { kind: 'none' },
        contractTimeImpactDays: 0,
        element: 'abutment',
        plannedLocation: { description: 'At the bridge seat (sheet M-4)' },
        proposedLocation: { description: '12 in below the bridge seat' },
        preparation: { roughened: true, keyed: true, waterstop: false },
      },
      steps: [
        { on: { daysAgo: 22, at: '08:00' }, by: 'rosa', attach: { make: 'photo', fileName: 'Abutment 2 first lift.jpg', subject: 'bulkhead_with_dowels', seed: 4092 } },
        { on: { daysAgo: 21, at: '13:30' }, by: 'rosa', move: { type: 'submit' } },
        { on: { daysAgo: 19, at: '10:00' }, by: 'owen', move: { type: 'forward', comment: 'Site visited: the lift height is set by the form panels on hand.' } },
        {
          on: { daysAgo: 16, at: '15:10' },
          by: 'marcus',
          move: {
            type: 'return_for_revision',
            comment:
              'Returned: show the joint on a sketch with the keyway, the dowel laps and a waterstop. The backwall retains fill under the strip seal, so water will reach the joint.',
          },
        },
        {
          on: { daysAgo: 4, at: '16:20' },
          by: 'rosa',
          revise: (body) => ({ ...(body as JointBody), preparation: { roughened: true, keyed: true, waterstop: true } }),
        },
      ],
    },
    {
      project: 'millRun',
      filedBy: 'rosa',
      filedOn: { daysAgo: 7, at: '10:10' },
      body: {
        type: 'other_deviation',
        title: 'Alternate riprap gradation at the abutment slopes',
        location: { description: 'Slope protection at both abutments' },
        planSheets: ['M-2'],
        reason: 'The quarry named in the special provisions has closed its Class II riprap line; the nearest source produces Class III.',
        proposedChange: 'Place Class III riprap (D50 of 15 in, D100 of 30 in) 30 in thick on the geotextile in place of Class II (D50 of 12 in) 18 in thick.',
        neededBy: cal.date(25),
        costImpact: { kind: 'added_cost', amountUsd: 6400 },
        contractTimeImpactDays: 0,
      },
      steps: [
        {
          on: { daysAgo: 7, at: '10:30' },
          by: 'rosa',
          attach: {
            make: 'letter',
            fileName: 'Class III riprap gradation.pdf',
            letterhead: ['Brackwater Aggregates', 'Quarry laboratory'],
            to: contractorLetterhead,
            subject: 'Gradation of Class III riprap, lot 26-114',
            paragraphs: ['Gradation of the stockpile sampled for the Millbrack Run Bridge slope protection.'],
            table: {
              caption: 'Lot 26-114',
              rows: [
                ['D100', '30 in'],
                ['D50', '15 in'],
                ['D15', '6 in'],
                ['Specific gravity', '2.68'],
              ],
            },
            signature: ['Matt Orrel', 'Quarry manager'],
          },
        },
        { on: { daysAgo: 6, at: '09:00' }, by: 'rosa', move: { type: 'submit' } },
        { on: { daysAgo: 4, at: '14:50' }, by: 'owen', move: { type: 'forward', comment: 'The heavier stone is acceptable to the section; the thickness goes up to match.' } },
      ],
    },
    {
      project: 'millRun',
      filedBy: 'rosa',
      filedOn: { daysAgo: 46, at: '08:30' },
      body: {
        type: 'deck_placement_change',
        title: 'Place the slab in two longitudinal halves to keep one lane open',
        location: { description: 'Full slab, in two halves along the bridge' },
        planSheets: ['M-3'],
        reason: 'The county asked to keep one lane of County Road 40 open during construction; the slab on sheet M-3 is placed full width.',
        proposedChange:
          'Place the upstream half of the slab first and the downstream half about a week later, with a longitudinal construction joint on the crown line and the transverse bars lapped across it.',
        neededBy: cal.date(-25),
        costImpact: { kind: 'added_cost', amountUsd: 5200 },
        contractTimeImpactDays: 7,
        deck: { spansFt: [36], deckWidthFt: 34, slabThicknessIn: 22.5 },
        plannedSequence: 'One placement of the full slab (sheet M-3).',
        proposedSequence: {
          kind: 'revised_sequence',
          description: 'Two placements along the bridge: the upstream half (17 ft wide) first, the downstream half a week later, with a longitudinal joint on the crown line.',
        },
        placement: { rateCyPerHr: 40, equipment: 'Concrete pump and a 36 ft finishing machine' },
      },
      steps: [
        {
          on: { daysAgo: 46, at: '08:45' },
          by: 'rosa',
          attach: {
            make: 'sketch',
            fileName: 'SK-1 slab placement in halves.pdf',
            sheet: 'SK-1',
            title: 'Slab placement in two halves along the bridge',
            segments: [{ fromFt: 0, toFt: 36, order: 1 }],
            notes: ['Upstream half placed first, downstream half about a week later.', 'Longitudinal construction joint on the crown line.', 'One lane of County Road 40 open throughout.'],
          },
        },
        { on: { daysAgo: 45, at: '15:00' }, by: 'rosa', move: { type: 'submit' } },
        { on: { daysAgo: 43, at: '10:30' }, by: 'owen', move: { type: 'forward', comment: 'The county’s lane request is on file with the section.' } },
        { on: { daysAgo: 42, at: '09:00' }, by: 'marcus', route: 'ines' },
        {
          on: { daysAgo: 39, at: '11:45' },
          by: 'ines',
          move: {
            type: 'request_information',
            comment: 'Please send the traffic staging plan and how the transverse bars are spliced across the longitudinal joint (bar size and lap length).',
          },
        },
        {
          on: { daysAgo: 36, at: '10:00' },
          by: 'rosa',
          purpose: 'information_response',
          attach: {
            make: 'letter',
            fileName: 'Staging and splice details.pdf',
            letterhead: contractorLetterhead,
            to: ['Marrowfield State Highway Department', 'Attn: Ines Marwood, P.E.'],
            subject: 'Millbrack Run Bridge: traffic staging and splices across the longitudinal joint',
            paragraphs: [
              'Stage 1 keeps the downstream lane open while the upstream half is formed and placed; stage 2 shifts traffic to the new half once it reaches 3,000 psi.',
              'The transverse bottom and top bars are #5 bars lapped 36 in across the joint, staggered so that no more than half are spliced at one section.',
            ],
            signature: ['Rosa Tennant', 'Project manager, Grennock Heavy Civil'],
          },
        },
        {
          on: { daysAgo: 36, at: '10:05' },
          by: 'rosa',
          move: { type: 'provide_information', comment: 'Staging plan and splice details attached: #5 bars lapped 36 in across the joint.' },
        },
        {
          on: { daysAgo: 34, at: '16:10' },
          by: 'ines',
          move: { type: 'approve', comment: 'Approved as staged in the answer of the contractor; the second half is placed once the first reaches 3,000 psi.' },
        },
      ],
    },
    {
      project: 'millRun',
      filedBy: 'rosa',
      filedOn: { daysAgo: 1, at: '16:40' },
      body: {
        type: 'other_deviation',
        title: 'Night placement of the slab concrete',
        location: { description: 'Full slab' },
        reason: 'Daytime highs near 95 °F are forecast for the placement week.',
      },
      steps: [],
    },
  ];
}
