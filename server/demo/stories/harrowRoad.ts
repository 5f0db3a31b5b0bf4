// Harrowmere Road Overpass (HR-0231): two prestressed concrete girder spans of 110 ft made continuous
// for live load at the pier, compression seals at both abutments; a federal-aid project, so central
// office classifies each change before it is decided. Lattimer-Oake Bridge Co. build it; Ines
// Marwood, P.E., of the agency's design unit is the engineer of record. All invented.
import type { RequestBody } from '../../../shared/requests/requestBody';
import type { RequestStory, StoryCalendar } from '../storyTypes';

const spansFt = [110, 110];

const contractorLetterhead = ['Lattimer-Oake Bridge Co.', '300 Foundry Row, Tallis'];

type JointBody = Extract<RequestBody, { type: 'construction_joint_relocation' }>;

export function harrowRoadStories(cal: StoryCalendar): RequestStory[] {
  return [
    {
      project: 'harrowRoad',
      filedBy: 'wes',
      filedOn: { daysAgo: 55, at: '09:00' },
      body: {
        type: 'construction_joint_relocation',
        title: 'Move deck construction joint CJ-1 6 ft toward abutment 1',
        location: { span: '1', description: 'Transverse deck construction joint CJ-1' },
        planSheets: ['B-11'],
        reason: 'The deck drain at 70 ft falls on the joint line of sheet B-11; the joint would cut the drain’s reinforcement frame.',
        proposedChange: 'Place CJ-1 at 64 ft from abutment 1 instead of 70 ft, clear of the drain, roughened, with the longitudinal bars continuous through it.',
        neededBy: cal.date(-35),
        costImpact: { kind: 'none' },
        contractTimeImpactDays: 0,
        element: 'deck',
        spansFt,
        plannedLocation: { description: '70 ft from abutment 1 (sheet B-11)', atFt: 70 },
        proposedLocation: { description: '64 ft from abutment 1', atFt: 64 },
        preparation: { roughened: true, keyed: false, waterstop: false },
        plane: 'transverse',
      },
      steps: [
        {
          on: { daysAgo: 55, at: '09:20' },
          by: 'wes',
          attach: {
            make: 'sketch',
            fileName: 'SK-2 CJ-1 at the deck drain.pdf',
            sheet: 'SK-2',
            title: 'Deck construction joint CJ-1 moved clear of the deck drain',
            marks: [
              { atFt: 70, label: 'CJ-1 planned', kind: 'planned' },
              { atFt: 64, label: 'CJ-1 proposed', kind: 'proposed' },
            ],
            notes: ['Deck drain DD-3 at 70 ft from abutment 1.', 'Longitudinal deck bars continuous through the joint.'],
          },
        },
        { on: { daysAgo: 54, at: '15:45' }, by: 'wes', move: { type: 'submit' } },
        { on: { daysAgo: 52, at: '10:10' }, by: 'priya', move: { type: 'forward', comment: 'The drain conflict is confirmed on site.' } },
        { on: { daysAgo: 51, at: '09:00' }, by: 'marcus', move: { type: 'classify_change', majorChange: false, comment: 'Minor: a joint shift within the positive-moment region, no cost or time.' } },
        { on: { daysAgo: 51, at: '09:10' }, by: 'marcus', route: 'ines' },
        {
          on: { daysAgo: 46, at: '14:20' },
          by: 'ines',
          move: {
            type: 'approve_with_conditions',
            comment: 'Approved: 64 ft stays 18.5 ft short of the 82.5 ft inflection point the check shows, clear of the continuity region over the pier.',
            conditions: [
              { text: 'Show CJ-1 at 64 ft and the DD-3 drain frame on the deck reinforcement shop drawing.', dueBefore: 'before the deck reinforcement is placed' },
              { text: 'Carry the longitudinal deck bars through the joint with no lap splice within 2 ft of it.', dueBefore: 'at the deck reinforcement inspection' },
            ],
          },
        },
        {
          on: { daysAgo: 40, at: '07:50' },
          by: 'tomas',
          satisfy: {
            seq: 1,
            note: 'Shop drawing R-4 rev B shows CJ-1 at 64 ft and the DD-3 drain frame; checked against the plan sheets.',
            evidence: {
              make: 'letter',
              fileName: 'Transmittal, shop drawing R-4 rev B.pdf',
              letterhead: contractorLetterhead,
              to: ['Marrowfield State Highway Department', 'Tallis Section, Attn: Tomas Reyl'],
              subject: 'Transmittal: deck reinforcement shop drawing R-4 rev B, Harrowmere Road Overpass',
              paragraphs: ['Enclosed is revision B of deck reinforcement shop drawing R-4, showing construction joint CJ-1 at 64 ft from abutment 1 and the frame of deck drain DD-3 at 70 ft, as approved under HR-0231-001.'],
              signature: ['Wes Dunmore', 'Project engineer, Lattimer-Oake Bridge Co.'],
            },
          },
        },
        {
          on: { daysAgo: 37, at: '06:40' },
          by: 'tomas',
          satisfy: {
            seq: 2,
            note: 'Checked the span 1 deck reinforcement: bars continuous through the CJ-1 line at 64 ft, nearest lap 4 ft 6 in from it.',
            evidence: { make: 'photo', fileName: 'CJ-1 line, bars through.jpg', subject: 'rebar_mat', seed: 2312 },
          },
        },
      ],
    },
    {
      project: 'harrowRoad',
      filedBy: 'wes',
      filedOn: { daysAgo: 12, at: '08:15' },
      body: {
        type: 'construction_joint_relocation',
        title: 'Move deck construction joint CJ-2 toward the pier',
        location: { span: '2', description: 'Transverse deck construction joint CJ-2' },
        planSheets: ['B-11', 'B-12'],
        reason: 'The pier placement (CJ-1 to CJ-2) goes in under a night closure of SR 9; ending it 25 ft nearer the pier lets it finish before the closure ends.',
        proposedChange: 'Move CJ-2 from 40 ft past the pier (150 ft from abutment 1) to 15 ft past it (125 ft).',
        neededBy: cal.date(21),
        costImpact: { kind: 'none' },
        contractTimeImpactDays: 0,
        element: 'deck',
        spansFt,
        plannedLocation: { description: '40 ft past the pier (sheet B-11)', atFt: 150 },
        proposedLocation: { description: '15 ft past the pier', atFt: 125 },
        preparation: { roughened: true, keyed: false, waterstop: false },
        plane: 'transverse',
      },
      steps: [
        {
          on: { daysAgo: 12, at: '08:30' },
          by: 'wes',
          attach: {
            make: 'sketch',
            fileName: 'SK-4 CJ-2 relocation.pdf',
            sheet: 'SK-4',
            title: 'Deck construction joint CJ-2: proposed location',
            marks: [
              { atFt: 150, label: 'CJ-2 planned', kind: 'planned' },
              { atFt: 125, label: 'CJ-2 proposed', kind: 'proposed' },
            ],
            notes: ['Pier placement from CJ-1 to CJ-2 under one night closure of SR 9.'],
          },
        },
        { on: { daysAgo: 11, at: '14:00' }, by: 'wes', move: { type: 'submit' } },
        {
          on: { daysAgo: 9, at: '10:40' },
          by: 'priya',
          move: {
            type: 'return_for_revision',
            comment:
              'Returned: at 125 ft the joint is 15 ft past the pier, inside the negative-moment region (the check puts the inflection point at 137.5 ft). Move it into span 2 clear of the tension zone, or keep the plans’ location.',
          },
        },
        {
          on: { daysAgo: 4, at: '09:00' },
          by: 'wes',
          revise: (body) => ({
            ...(body as JointBody),
            proposedChange: 'Move CJ-2 from 40 ft past the pier (150 ft) to 34 ft past it (144 ft), in the positive-moment region of span 2; the pier placement still finishes within the night closure.',
            proposedLocation: { description: '34 ft past the pier', atFt: 144 },
          }),
        },
        {
          on: { daysAgo: 4, at: '09:10' },
          by: 'wes',
          attach: {
            make: 'sketch',
            fileName: 'SK-4 rev 2 CJ-2 relocation.pdf',
            sheet: 'SK-4 rev 2',
            title: 'Deck construction joint CJ-2: revised location in span 2',
            marks: [
              { atFt: 150, label: 'CJ-2 planned', kind: 'planned' },
              { atFt: 144, label: 'CJ-2 proposed', kind: 'proposed' },
            ],
            notes: ['Revision 2: joint moved out of the negative-moment region over the pier.', 'Pier placement from CJ-1 to CJ-2 under one night closure of SR 9.'],
          },
        },
        {
          on: { daysAgo: 3, at: '15:30' },
          by: 'wes',
          move: { type: 'resubmit', comment: 'Revision 2 moves CJ-2 to 144 ft from abutment 1 (34 ft past the pier), in the positive-moment region of span 2. Sketch SK-4 rev 2 attached.' },
        },
      ],
    },
    {
      project: 'harrowRoad',
      filedBy: 'wes',
      filedOn: { daysAgo: 18, at: '10:00' },
      body: {
        type: 'deck_placement_change',
        title: 'Place the two-span deck in one placement',
        location: { description: 'Full deck, abutment 1 to abutment 2 (220 ft)' },
        planSheets: ['B-12'],
        reason: 'Traffic on SR 9 below must be shifted for every deck placement; one placement needs one lane shift instead of three.',
        proposedChange: 'Place the whole deck in one placement with a Type B retarder instead of the three placements on sheet B-12.',
        neededBy: cal.date(12),
        costImpact: { kind: 'credit', amountUsd: 38000 },
        contractTimeImpactDays: -4,
        deck: { spansFt, deckWidthFt: 40, slabThicknessIn: 8.5, haunchCyPerFt: 0.08 },
        plannedSequence: 'Three placements (sheet B-12): the positive-moment lengths of spans 1 and 2, then the length over the pier.',
        proposedSequence: { kind: 'single_placement', description: 'One placement from abutment 1 to abutment 2 at about 45 cy/h.' },
        placement: { rateCyPerHr: 45, equipment: 'One 42 m boom pump, one bridge finishing machine' },
        retarder: { astmC494Type: 'B', product: 'Type B retarder, trial batch H-3', initialSetHr: 6 },
      },
      steps: [
        {
          on: { daysAgo: 18, at: '10:20' },
          by: 'wes',
          attach: {
            make: 'sketch',
            fileName: 'SK-6 single deck placement.pdf',
            sheet: 'SK-6',
            title: 'Deck placement: one placement, abutment 1 to abutment 2',
            segments: [{ fromFt: 0, toFt: 220, order: 1 }],
            notes: ['One lane shift on SR 9 for the whole placement.', 'Type B retarder, trial batch H-3.'],
          },
        },
        {
          on: { daysAgo: 18, at: '10:25' },
          by: 'wes',
          attach: {
            make: 'letter',
            fileName: 'H-3 time of setting report.pdf',
            letterhead: ['Tallis Ready Mix', 'Quality Control Laboratory'],
            to: contractorLetterhead,
            subject: 'Time of setting of trial batch H-3 (ASTM C403), Harrowmere Road Overpass deck mix',
            paragraphs: ['Trial batch H-3 of the deck mix was made with the Type B retarder at 4 oz/cwt.'],
            table: {
              caption: 'Trial batch H-3',
              rows: [
                ['Concrete temperature', '70 °F'],
                ['Initial set (500 psi)', '6 h 00 min'],
                ['Final set (4,000 psi)', '8 h 20 min'],
              ],
            },
            signature: ['Corin Bask', 'QC technician'],
          },
        },
        { on: { daysAgo: 17, at: '16:00' }, by: 'wes', move: { type: 'submit' } },
        {
          on: { daysAgo: 15, at: '11:30' },
          by: 'priya',
          move: { type: 'forward', comment: 'The traffic reason holds. Note that the trial batch set time looks short for a 250 cy placement.' },
        },
        {
          on: { daysAgo: 14, at: '09:00' },
          by: 'marcus',
          move: {
            type: 'classify_change',
            majorChange: true,
            comment: 'Major change on a federal-aid project: it replaces the placement sequence on the sealed plans and carries a $38,000 credit. Concurrence requested.',
          },
        },
        { on: { daysAgo: 14, at: '09:20' }, by: 'marcus', route: 'ines', comment: 'Concurrence requested in parallel; I will record it here when it comes.' },
        {
          on: { daysAgo: 8, at: '13:00' },
          by: 'marcus',
          concurrence: {
            comment: 'Federal concurrence received; the decision stays with the engineer of record.',
            letter: {
              make: 'letter',
              fileName: 'Federal concurrence, HR-0231 deck placement.pdf',
              letterhead: ['Federal oversight agency', 'Marrowfield Division Office'],
              to: ['Marrowfield State Highway Department', 'Bridge Office, Attn: Marcus Trell'],
              subject: 'Concurrence in a major change: Harrowmere Road Overpass, single deck placement',
              paragraphs: [
                'We have reviewed the proposed change to the deck placement sequence of the Harrowmere Road Overpass and concur in it as a major change, subject to the engineer of record’s approval of the placement and set-time requirements.',
                'This concurrence does not relieve the engineer of record of the design decision.',
              ],
              signature: ['Helena Strand', 'Division bridge engineer'],
            },
          },
        },
      ],
    },
    {
      project: 'harrowRoad',
      filedBy: 'wes',
      filedOn: { daysAgo: 34, at: '11:00' },
      body: {
        type: 'other_deviation',
        title: 'Self-consolidating concrete for the pier diaphragm',
        location: { description: 'Continuity diaphragm between the girder ends over the pier' },
        planSheets: ['B-9'],
        reason: 'The diaphragm is congested with the continuity reinforcement and the girder strands; vibrating it fully is hard.',
        proposedChange: 'Use a self-consolidating concrete mix (slump flow 24 ± 2 in) for the pier diaphragm in place of the Class AA deck mix.',
        neededBy: cal.date(-20),
        costImpact: { kind: 'added_cost', amountUsd: 2600 },
        contractTimeImpactDays: 0,
      },
      steps: [
        {
          on: { daysAgo: 34, at: '11:15' },
          by: 'wes',
          attach: {
            make: 'letter',
            fileName: 'SCC mix design SCC-5.pdf',
            letterhead: ['Tallis Ready Mix', 'Quality Control Laboratory'],
            to: contractorLetterhead,
            subject: 'Mix design SCC-5, self-consolidating concrete',
            paragraphs: ['Proposed self-consolidating mix for the pier diaphragm of the Harrowmere Road Overpass.'],
            table: {
              caption: 'SCC-5',
              rows: [
                ['Design strength', '4,500 psi'],
                ['Slump flow', '24 ± 2 in'],
                ['Visual stability index', '0 to 1'],
              ],
            },
            signature: ['Corin Bask', 'QC technician'],
          },
        },
        { on: { daysAgo: 33, at: '09:30' }, by: 'wes', move: { type: 'submit' } },
        {
          on: { daysAgo: 32, at: '13:10' },
          by: 'priya',
          comment: 'The SCC mix needs its own trial placement and a form pressure check; the diaphragm forms are not rated for full liquid head. Is it worth it?',
        },
        { on: { daysAgo: 30, at: '08:45' }, by: 'wes', move: { type: 'withdraw', comment: 'Withdrawn: we will keep the plans’ mix and use smaller vibrators.' } },
      ],
    },
    {
      project: 'harrowRoad',
      filedBy: 'wes',
      filedOn: { daysAgo: 16, at: '13:00' },
      body: {
        type: 'joint_seal_substitution',
        title: 'Alternate compression seal at both abutments',
        location: { description: 'Deck joints at abutments 1 and 2' },
        planSheets: ['B-20'],
        reason: 'The compression seal of sheet B-20 is no longer made in the specified size; the alternate is the same family with a wider working range.',
        proposedChange: 'Install the alternate compression seal at both abutments, in the blockouts and with the adhesive of sheet B-20.',
        neededBy: cal.date(18),
        costImpact: { kind: 'none' },
        contractTimeImpactDays: 0,
        jointLocation: 'Abutments 1 and 2',
        specified: { kind: 'compression_seal', product: 'Compression seal per sheet B-20', movementCapacityIn: 0.75, minOpeningIn: 1.25, maxOpeningIn: 2 },
        substitute: { kind: 'compression_seal', product: 'Veltrane CS-250 compression seal', movementCapacityIn: 1.25, minOpeningIn: 1, maxOpeningIn: 2.25 },
        contributingLengthFt: 110,
        material: 'concrete',
        climate: 'moderate',
        installTempF: 48,
        gapAtReferenceIn: 1.5,
        referenceTempF: 60,
      },
      steps: [
        {
          on: { daysAgo: 16, at: '13:20' },
          by: 'wes',
          attach: {
            make: 'dataSheet',
            fileName: 'CS-250 compression seal data sheet.pdf',
            manufacturer: 'Veltrane Seals',
            product: 'CS-250 compression seal',
            familyLabel: 'Compression seal',
            movementCapacityIn: 1.25,
            minOpeningIn: 1,
            maxOpeningIn: 2.25,
            notes: ['Install with lubricant-adhesive along both faces.', 'Do not install below 40 °F.'],
          },
        },
        { on: { daysAgo: 15, at: '10:00' }, by: 'wes', move: { type: 'submit' } },
        { on: { daysAgo: 13, at: '14:15' }, by: 'priya', move: { type: 'forward' } },
        { on: { daysAgo: 12, at: '09:00' }, by: 'marcus', move: { type: 'classify_change', majorChange: false, comment: 'Minor: same joint family and size.' } },
        { on: { daysAgo: 12, at: '09:15' }, by: 'marcus', route: 'ines' },
        {
          on: { daysAgo: 6, at: '15:00' },
          by: 'ines',
          move: {
            type: 'request_information',
            comment:
              'The seal checks out against the joint’s openings. Please send the installation table for 40 to 60 °F (the install is planned at about 48 °F) and the manufacturer’s recommended blockout width.',
          },
        },
      ],
    },
  ];
}
