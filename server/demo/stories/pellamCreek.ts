// Pellam Creek Bridge (PC-0114): three-span continuous steel plate girders, 140-175-140 ft, fixed at
// abutment 1 with a finger joint at abutment 2. Corbel & Fane Constructors build it; Ruth Caldera,
// P.E., is the engineer of record. Invented, like every name in the demo.
import type { RequestStory, StoryCalendar } from '../storyTypes';

const spansFt = [140, 175, 140];

const labLetterhead = ['Brennock Testing Services', 'Concrete and Aggregates Laboratory', '42 Furnace Street, Tallis'];

export function pellamCreekStories(cal: StoryCalendar): RequestStory[] {
  return [
    {
      project: 'pellamCreek',
      filedBy: 'dana',
      filedOn: { daysAgo: 21, at: '08:20' },
      body: {
        type: 'deck_placement_change',
        title: 'Place the three-span deck in one continuous placement',
        location: { description: 'Full deck, abutment 1 to abutment 2 (455 ft)' },
        planSheets: ['S-14', 'S-15'],
        reason:
          'The plans phase the deck in five placements (sheet S-14). Two boom pumps and a second finishing crew are available for one long placement, which removes four transverse construction joints from the riding surface and shortens the deck work by six working days.',
        proposedChange:
          'Place the whole deck in one placement from abutment 1 to abutment 2 with a Type D water-reducing and retarding admixture, instead of the five-stage sequence on sheet S-14. An emergency bulkhead location is set at 70 ft in span 1.',
        neededBy: cal.date(24),
        costImpact: { kind: 'credit', amountUsd: 18500 },
        contractTimeImpactDays: -6,
        deck: { spansFt, deckWidthFt: 44, slabThicknessIn: 9, haunchCyPerFt: 0.1 },
        plannedSequence: 'Five placements (sheet S-14): the positive-moment lengths of spans 1, 3 and 2, then the lengths over piers 1 and 2.',
        proposedSequence: { kind: 'single_placement', description: 'One placement starting at abutment 1 and moving toward abutment 2 at about 60 cy/h, two pumps alternating.' },
        placement: { rateCyPerHr: 60, equipment: 'Two 47 m boom pumps, one bridge finishing machine, work bridge with fogging' },
        retarder: { astmC494Type: 'D', product: 'Type D water-reducing retarder, trial batch TB-7', initialSetHr: 14.5 },
        emergencyJointAtFt: 70,
      },
      steps: [
        {
          on: { daysAgo: 21, at: '08:40' },
          by: 'dana',
          attach: {
            make: 'sketch',
            fileName: 'SK-1 single deck placement.pdf',
            sheet: 'SK-1',
            title: 'Deck placement: one placement, abutment 1 to abutment 2',
            segments: [{ fromFt: 0, toFt: 455, order: 1 }],
            marks: [{ atFt: 70, label: 'Emergency bulkhead', kind: 'emergency' }],
            notes: [
              'Placement direction: abutment 1 toward abutment 2, about 60 cy/h with two pumps alternating.',
              'Concrete: deck mix D-45 with Type D retarder (trial batch TB-7, initial set 14.5 h by ASTM C403).',
              'Emergency bulkhead with dowels kept ready at 70 ft from abutment 1, in the positive-moment region of span 1.',
            ],
          },
        },
        {
          on: { daysAgo: 21, at: '08:45' },
          by: 'dana',
          attach: {
            make: 'letter',
            fileName: 'TB-7 time of setting report.pdf',
            letterhead: labLetterhead,
            to: ['Corbel & Fane Constructors', 'Attn: Dana Ostrow'],
            subject: 'Time of setting of trial batch TB-7 (ASTM C403), Pellam Creek Bridge deck mix',
            paragraphs: [
              'Trial batch TB-7 of deck mix D-45 was made with the Type D admixture at the dosage proposed for the single deck placement. Penetration resistance was read on mortar sieved from the batch.',
              'The times below are measured from the first contact of cement and water.',
            ],
            table: {
              caption: 'Trial batch TB-7',
              rows: [
                ['Mix', 'D-45, 4,500 psi, Type D admixture 6 oz/cwt'],
                ['Concrete temperature', '72 °F'],
                ['Air temperature', '78 °F'],
                ['Initial set (500 psi)', '14 h 30 min'],
                ['Final set (4,000 psi)', '18 h 10 min'],
              ],
            },
            signature: ['Aldo Renfrew', 'Laboratory manager'],
          },
        },
        { on: { daysAgo: 21, at: '08:50' }, by: 'dana', attach: { make: 'photo', fileName: 'Deck reinforcement span 2.jpg', subject: 'rebar_mat', seed: 1141 } },
        { on: { daysAgo: 20, at: '15:20' }, by: 'dana', move: { type: 'submit', comment: 'We plan a weekday night start to keep the concrete cool.' } },
        {
          on: { daysAgo: 19, at: '08:30' },
          by: 'priya',
          comment: 'Visited the site: both pumps can set up on the abutment 1 approach and the SR 9 shoulder, and the finishing machine rails are set full length.',
        },
        {
          on: { daysAgo: 18, at: '10:05' },
          by: 'priya',
          move: { type: 'forward', comment: 'Field conditions support one placement. The lab report gives 14.5 h of initial set. Recommend approval with a standby plan.' },
        },
        { on: { daysAgo: 17, at: '14:30' }, by: 'marcus', route: 'ruth', comment: 'Routed to the engineer of record for the deck design.' },
        {
          on: { daysAgo: 9, at: '16:45' },
          by: 'ruth',
          move: {
            type: 'approve_with_conditions',
            comment: 'Approved. The retarded mix covers the placement time with margin, and the emergency bulkhead lies in the positive-moment region of span 1.',
            conditions: [
              {
                text: 'Send the ASTM C403 time-of-setting result of a trial batch of the production mix made at the expected placement temperature; initial set not less than 12.0 h.',
                dueBefore: 'at least 7 days before the placement',
              },
              {
                text: 'Keep a standby pump on site and bulkheads with dowels ready for an emergency joint in each positive-moment zone the check shows (0–104, 176–279 and 351–455 ft from abutment 1), at least 10 ft from an inflection point; keep a placement log.',
                dueBefore: 'on the day of the placement',
              },
              {
                text: 'Record girder deflections at the span quarter points before and after the placement and send them to the engineer of record.',
                dueBefore: 'within 3 days after the placement',
              },
            ],
          },
        },
        {
          on: { daysAgo: 3, at: '11:15' },
          by: 'tomas',
          satisfy: {
            seq: 1,
            note: 'Witnessed the production trial batch at the plant: initial set 14 h 05 min at 74 °F concrete temperature. Report attached.',
            evidence: {
              make: 'letter',
              fileName: 'Production trial batch PB-2 time of setting.pdf',
              letterhead: labLetterhead,
              to: ['Marrowfield State Highway Department', 'Tallis Section, Attn: Tomas Reyl'],
              subject: 'Time of setting of production trial batch PB-2 (ASTM C403), Pellam Creek Bridge deck mix',
              paragraphs: ['Production trial batch PB-2 was batched at the supplying plant in the presence of the agency inspector, at the admixture dosage of trial batch TB-7.'],
              table: {
                caption: 'Production trial batch PB-2',
                rows: [
                  ['Concrete temperature', '74 °F'],
                  ['Air temperature', '81 °F'],
                  ['Initial set (500 psi)', '14 h 05 min'],
                  ['Final set (4,000 psi)', '17 h 50 min'],
                ],
              },
              signature: ['Aldo Renfrew', 'Laboratory manager'],
            },
          },
        },
      ],
    },
    {
      project: 'pellamCreek',
      filedBy: 'dana',
      filedOn: { daysAgo: 20, at: '08:50' },
      body: {
        type: 'construction_joint_relocation',
        title: 'Move deck construction joint CJ-2 closer to pier 1',
        location: { span: '2', description: 'Transverse deck construction joint CJ-2' },
        planSheets: ['S-14'],
        reason:
          'The finishing machine rail supports cannot be set at the CJ-2 station on sheet S-14: it falls over the utility bay, where the overhang brackets are spaced for the conduit run. It applies if the single placement (PC-0114-003) is not approved or is called off; the five-stage sequence of sheet S-14 then governs.',
        proposedChange: 'Move CJ-2 from 50 ft to 25 ft past pier 1 (190 ft to 165 ft from abutment 1), roughened and doweled as on sheet S-15.',
        neededBy: cal.date(30),
        costImpact: { kind: 'none' },
        contractTimeImpactDays: 0,
        element: 'deck',
        spansFt,
        plannedLocation: { description: '50 ft past pier 1 (sheet S-14)', atFt: 190 },
        proposedLocation: { description: '25 ft past pier 1', atFt: 165 },
        preparation: { roughened: true, keyed: false, waterstop: false },
        plane: 'transverse',
      },
      steps: [
        {
          on: { daysAgo: 20, at: '09:05' },
          by: 'dana',
          attach: {
            make: 'sketch',
            fileName: 'SK-3 CJ-2 relocation.pdf',
            sheet: 'SK-3',
            title: 'Deck construction joint CJ-2: planned and proposed locations',
            marks: [
              { atFt: 190, label: 'CJ-2 planned', kind: 'planned' },
              { atFt: 165, label: 'CJ-2 proposed', kind: 'proposed' },
            ],
            notes: ['Stations in feet from abutment 1 along the girder line.', 'Joint roughened and doweled as on sheet S-15.', 'Utility bay between 185 ft and 196 ft.'],
          },
        },
        { on: { daysAgo: 20, at: '09:10' }, by: 'dana', attach: { make: 'photo', fileName: 'Utility bay at CJ-2.jpg', subject: 'rebar_mat', seed: 1142 } },
        { on: { daysAgo: 19, at: '16:10' }, by: 'dana', move: { type: 'submit' } },
        {
          on: { daysAgo: 17, at: '11:20' },
          by: 'priya',
          move: { type: 'forward', comment: 'The rail conflict is real; I saw it on site. The new station is close to pier 1 and may be in the negative-moment region; please check.' },
        },
        { on: { daysAgo: 14, at: '09:30' }, by: 'marcus', route: 'ruth' },
        {
          on: { daysAgo: 4, at: '14:00' },
          by: 'ruth',
          comment:
            'PC-0114-003 is approved, but this joint stays the fallback if the single placement is called off. A joint about 60 ft past pier 1 (200 ft) clears both the utility bay and the tension region (inflection point at 176.3 ft). I will call the contractor’s engineer.',
        },
      ],
    },
    {
      project: 'pellamCreek',
      filedBy: 'dana',
      filedOn: { daysAgo: 62, at: '10:10' },
      body: {
        type: 'joint_seal_substitution',
        title: 'Replace the abutment 2 finger joint with a large strip seal',
        location: { description: 'Deck expansion joint at abutment 2' },
        planSheets: ['S-22', 'S-23'],
        reason: 'The finger joint assembly on sheet S-22 has a 16-week lead time from the fabricator, which would push the deck closure past the paving window.',
        proposedChange: 'Install a 4 in strip seal joint at abutment 2 in place of the finger joint, in the same blockout.',
        neededBy: cal.date(-30),
        costImpact: { kind: 'credit', amountUsd: 27000 },
        contractTimeImpactDays: -10,
        jointLocation: 'Abutment 2 (expansion end)',
        specified: { kind: 'finger', product: 'Finger joint assembly per sheet S-22', movementCapacityIn: 4.5, minOpeningIn: 1.75, maxOpeningIn: 6.25 },
        substitute: { kind: 'strip_seal', product: 'Carrowby SR-400 strip seal', movementCapacityIn: 4, minOpeningIn: 0, maxOpeningIn: 4 },
        contributingLengthFt: 455,
        material: 'steel',
        climate: 'moderate',
        installTempF: 74,
        gapAtReferenceIn: 4,
        referenceTempF: 60,
      },
      steps: [
        {
          on: { daysAgo: 62, at: '10:30' },
          by: 'dana',
          attach: {
            make: 'dataSheet',
            fileName: 'SR-400 strip seal data sheet.pdf',
            manufacturer: 'Carrowby Joint Systems',
            product: 'SR-400 strip seal',
            familyLabel: 'Strip seal',
            movementCapacityIn: 4,
            minOpeningIn: 0,
            maxOpeningIn: 4,
            notes: ['Neoprene gland locked into extruded steel rails.', 'Set the opening for the temperature at installation from the table supplied with each joint.'],
          },
        },
        {
          on: { daysAgo: 62, at: '10:35' },
          by: 'dana',
          attach: {
            make: 'sketch',
            fileName: 'SK-5 abutment 2 joint.pdf',
            sheet: 'SK-5',
            title: 'Abutment 2 expansion joint: strip seal in the finger joint blockout',
            expansionJoints: [{ atFt: 455, label: 'Abut 2 joint' }],
            notes: ['Deck fixed at abutment 1: 455 ft of deck moves toward abutment 2.', 'Strip seal rails anchored in the blockout of sheet S-22.'],
          },
        },
        { on: { daysAgo: 61, at: '14:05' }, by: 'dana', move: { type: 'submit' } },
        { on: { daysAgo: 59, at: '09:40' }, by: 'priya', move: { type: 'forward', comment: 'Forwarded without a field recommendation: the joint type is a design matter.' } },
        { on: { daysAgo: 58, at: '11:00' }, by: 'marcus', route: 'ruth' },
        {
          on: { daysAgo: 52, at: '15:30' },
          by: 'ruth',
          move: {
            type: 'reject',
            comment:
              'Rejected. 455 ft of steel deck moves about 4.3 in at abutment 2 (AASHTO Procedure A); a strip seal suits less than 4 in, and this one opens only to 4 in against the 6.25 in the joint reaches on the coldest day. Keep the finger joint: ask the fabricator for an earlier slot, or propose a modular joint with its data sheet.',
          },
        },
      ],
    },
    {
      project: 'pellamCreek',
      filedBy: 'dana',
      filedOn: { daysAgo: 78, at: '13:15' },
      body: {
        type: 'other_deviation',
        title: 'Hot-dip galvanized anchor bolts at the pier bearings',
        location: { description: 'Anchor bolts of the bearings at piers 1 and 2' },
        planSheets: ['S-9'],
        reason: 'The painted anchor bolts of sheet S-9 need field touch-up after setting; galvanized bolts of the same grade are in stock.',
        proposedChange: 'Supply ASTM F1554 Grade 55 anchor bolts hot-dip galvanized to ASTM F2329 in place of painted ones, of the same diameter, length and embedment.',
        neededBy: cal.date(-60),
        costImpact: { kind: 'none' },
        contractTimeImpactDays: 0,
      },
      steps: [
        {
          on: { daysAgo: 78, at: '13:30' },
          by: 'dana',
          attach: {
            make: 'letter',
            fileName: 'Anchor bolt galvanizing certificate.pdf',
            letterhead: ['Kestrow Galvanizing Works', '7 Kiln Road, Pellam Falls'],
            to: ['Corbel & Fane Constructors', 'Attn: Dana Ostrow'],
            subject: 'Certificate of hot-dip galvanizing, anchor bolts for Pellam Creek Bridge',
            paragraphs: ['We certify that the anchor bolts listed below were hot-dip galvanized to ASTM F2329 and that the coating thickness was measured on each lot.'],
            table: {
              caption: 'Anchor bolts',
              rows: [
                ['Grade', 'ASTM F1554 Grade 55'],
                ['Size', '1 1/2 in diameter × 36 in'],
                ['Quantity', '32'],
                ['Mean coating thickness', '3.9 mils'],
              ],
            },
            signature: ['Petra Holm', 'Quality manager'],
          },
        },
        { on: { daysAgo: 77, at: '09:00' }, by: 'dana', move: { type: 'submit' } },
        { on: { daysAgo: 75, at: '10:20' }, by: 'priya', move: { type: 'forward', comment: 'Same grade and size; the bolts are on site.' } },
        { on: { daysAgo: 74, at: '08:50' }, by: 'marcus', route: 'ruth' },
        { on: { daysAgo: 70, at: '13:40' }, by: 'ruth', move: { type: 'approve', comment: 'Approved: same grade and embedment, and galvanizing improves durability at the piers.' } },
      ],
    },
    {
      project: 'pellamCreek',
      filedBy: 'dana',
      filedOn: { daysAgo: 2, at: '10:30' },
      body: {
        type: 'construction_joint_relocation',
        title: 'Raise the pier 2 column-to-cap construction joint',
        location: { description: 'Pier 2, horizontal joint between the columns and the cap' },
        planSheets: ['S-7'],
        reason: 'The cap forms rest on a falsework bent whose beams sit 18 in above the joint on sheet S-7.',
        element: 'pier_cap',
        plannedLocation: { description: 'Bottom of the cap (sheet S-7)' },
        preparation: { roughened: true, keyed: false, waterstop: false },
      },
      steps: [],
    },
  ];
}
