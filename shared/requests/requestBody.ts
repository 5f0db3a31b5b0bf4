// What a request says, by type: a zod discriminated union shared by the form and the server.
// A submitted revision must satisfy `requestBodySchema`; a draft only `requestDraftSchema`, so a
// contractor can save at any step.
import { z } from 'zod';
import { climates, deckMaterials, sealKinds } from '../engineering';

export const requestTypes = ['deck_placement_change', 'construction_joint_relocation', 'joint_seal_substitution', 'other_deviation'] as const;
export type RequestType = (typeof requestTypes)[number];

export const requestTypeLabels: Record<RequestType, string> = {
  deck_placement_change: 'Deck placement change',
  construction_joint_relocation: 'Construction joint relocation',
  joint_seal_substitution: 'Expansion-joint seal substitution',
  other_deviation: 'Other deviation from the plans',
};

const text = (what: string, min: number, max: number) =>
  z
    .string({ message: `Enter ${what}.` })
    .trim()
    .min(min, min <= 1 ? `Enter ${what}.` : `Enter ${what} (at least ${min} characters).`)
    .max(max, `Keep ${what} under ${max} characters.`);

const positive = (what: string, max: number) =>
  z
    .number({ message: `Enter ${what} as a number.` })
    .finite(`Enter ${what} as a number.`)
    .positive(`${what[0]!.toUpperCase()}${what.slice(1)} must be more than zero.`)
    .max(max, `${what[0]!.toUpperCase()}${what.slice(1)} over ${max} looks wrong; check the units.`);

const stationFt = (what: string) => z.number({ message: `Enter ${what} in feet from the start of the girder.` }).finite().min(0, `${what} cannot be negative.`);

export const costImpactSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('none') }),
  z.strictObject({ kind: z.enum(['credit', 'added_cost']), amountUsd: positive('the amount in dollars', 1e9) }),
]);

const locationSchema = z.strictObject({
  span: z.string().trim().max(40).optional(),
  station: z.string().trim().max(40).optional(),
  description: text('where on the structure', 3, 500),
});

const commonFields = {
  projectId: z.uuid({ message: 'Choose the project this request is for.' }),
  title: text('a title', 5, 160),
  structureNumber: z.string().trim().max(40).optional(),
  location: locationSchema,
  planSheets: z.array(z.string().trim().min(1).max(40)).max(40, 'List at most 40 plan sheets.'),
  reason: text('the reason for the change', 10, 8000),
  proposedChange: text('the proposed change', 10, 8000),
  neededBy: z.iso.date({ message: 'Enter the date needed by as YYYY-MM-DD.' }),
  costImpact: costImpactSchema,
  contractTimeImpactDays: z.number({ message: 'Enter the contract-time impact in days.' }).int('Whole days only.').min(-365).max(365),
};

const spansFt = z.array(positive('a span length in feet', 1000)).min(1, 'Enter at least one span.').max(20, 'At most 20 spans.');

const deckPlacementFields = {
  deck: z.strictObject({
    spansFt,
    deckWidthFt: positive('the deck width in feet', 200),
    slabThicknessIn: positive('the slab thickness in inches', 24),
    haunchCyPerFt: z.number().finite().min(0).max(5).optional(),
  }),
  plannedSequence: text('the placement sequence on the plans', 3, 2000),
  proposedSequence: z.strictObject({
    kind: z.enum(['single_placement', 'revised_sequence']),
    description: text('the proposed sequence', 3, 2000),
  }),
  placement: z.strictObject({
    rateCyPerHr: positive('the placement rate in cy/hr', 1000),
    equipment: text('the placing equipment', 2, 500),
  }),
  retarder: z.strictObject({
    astmC494Type: z.enum(['B', 'D'], { message: 'A set retarder is ASTM C494 Type B or Type D.' }),
    product: text('the retarder product', 2, 200),
    // Time of initial setting by ASTM C403 from the mix's trial batch.
    initialSetHr: positive('the tested time of initial set in hours', 72),
  }).optional(),
  emergencyJointAtFt: stationFt('The emergency joint location').optional(),
};

const jointElements = ['deck', 'wall', 'footing', 'diaphragm', 'pier_cap', 'abutment', 'other'] as const;

const constructionJointFields = {
  element: z.enum(jointElements, { message: 'Choose the element the joint is in.' }),
  spansFt: spansFt.optional(),
  plannedLocation: z.strictObject({ description: text('the joint location on the plans', 3, 500), atFt: stationFt('The planned joint location').optional() }),
  proposedLocation: z.strictObject({ description: text('the proposed joint location', 3, 500), atFt: stationFt('The proposed joint location').optional() }),
  preparation: z.strictObject({ roughened: z.boolean(), keyed: z.boolean(), waterstop: z.boolean() }),
  plane: z.enum(['transverse', 'between_diaphragm_and_deck']).optional(),
};

const sealFields = z.strictObject({
  kind: z.enum(sealKinds, { message: 'Choose the kind of seal.' }),
  product: z.string().trim().max(200).optional(),
  movementCapacityIn: positive('the movement capacity in inches', 48),
  minOpeningIn: z.number().finite().min(0, 'An opening cannot be negative.').max(48),
  maxOpeningIn: positive('the maximum opening in inches', 48),
});

const sealSubstitutionFields = {
  jointLocation: text('where the joint is (e.g. abutment 2)', 2, 200),
  specified: sealFields,
  substitute: sealFields,
  contributingLengthFt: positive('the contributing length in feet', 5000),
  material: z.enum(deckMaterials),
  climate: z.enum(climates),
  installTempF: z.number({ message: 'Enter the installation temperature in °F.' }).finite().min(-40).max(140),
  gapAtReferenceIn: z.number().finite().min(0).max(48).optional(),
  referenceTempF: z.number().finite().min(-40).max(140).optional(),
};

const members = {
  deck_placement_change: z.strictObject({ type: z.literal('deck_placement_change'), ...commonFields, ...deckPlacementFields }),
  construction_joint_relocation: z.strictObject({ type: z.literal('construction_joint_relocation'), ...commonFields, ...constructionJointFields }),
  joint_seal_substitution: z.strictObject({ type: z.literal('joint_seal_substitution'), ...commonFields, ...sealSubstitutionFields }),
  other_deviation: z.strictObject({ type: z.literal('other_deviation'), ...commonFields }),
};

export const requestBodySchema = z
  .discriminatedUnion('type', [members.deck_placement_change, members.construction_joint_relocation, members.joint_seal_substitution, members.other_deviation], {
    message: 'Choose the kind of request.',
  })
  .superRefine((body, ctx) => {
    if (body.type === 'construction_joint_relocation' && body.element === 'deck' && !body.spansFt) {
      ctx.addIssue({ code: 'custom', path: ['spansFt'], message: 'A deck joint needs the span lengths to check it against the moment diagram.' });
    }
    if (body.type === 'joint_seal_substitution') {
      for (const side of ['specified', 'substitute'] as const) {
        if (body[side].minOpeningIn >= body[side].maxOpeningIn) {
          ctx.addIssue({ code: 'custom', path: [side, 'maxOpeningIn'], message: 'The maximum opening must be more than the minimum.' });
        }
      }
    }
  });

export type RequestBody = z.infer<typeof requestBodySchema>;

// Drafts: the type and project are fixed from the start; everything else may still be missing,
// and nested groups may be half filled.
function draftOf<S extends z.ZodObject>(schema: S) {
  const shape = Object.fromEntries(
    Object.entries(schema.shape).map(([key, field]) => {
      if (key === 'type' || key === 'projectId') return [key, field];
      const inner = field instanceof z.ZodObject ? field.partial() : field;
      return [key, (inner as z.ZodType).optional()];
    }),
  );
  return z.strictObject(shape);
}

// The type and project are known for every draft; the rest is whatever the contractor has filled.
export type RequestDraft = { type: RequestType; projectId: string; title?: string } & Partial<Omit<RequestBody, 'type' | 'projectId' | 'title'>> &
  Record<string, unknown>;

export const requestDraftSchema = z.discriminatedUnion('type', [
  draftOf(members.deck_placement_change),
  draftOf(members.construction_joint_relocation),
  draftOf(members.joint_seal_substitution),
  draftOf(members.other_deviation),
]) as unknown as z.ZodType<RequestDraft>;
