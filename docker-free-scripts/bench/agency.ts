// The invented agency the benchmark fills its database with: districts of bridge projects, the
// people at each desk, and the life of each request as a path of moves. Pure data; seed.ts writes it.
import type { RequestState } from '../../shared/requests/states';
import type { Role } from '../../shared/roles';
import { defaultDeskDueDays, type DeskRole } from '../../shared/workflow/desks';

// A small seeded generator, so every run fills the same agency.
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const carried = ['Route 12', 'Route 47', 'County Road 9', 'Quarry Lane', 'Orchard Parkway', 'Route 230', 'Kiln Street', 'Valley Connector'];
const crossed = ['Harrow Creek', 'Stone Fork', 'the north rail spur', 'Millrace Run', 'Tanner Brook', 'Route 5', 'Ash Hollow', 'the canal feeder'];
const counties = ['Alder', 'Brennock', 'Corran', 'Dunmere', 'Elsby', 'Fallow'];

export function projectFacts(i: number) {
  const district = Math.floor(i / 100) + 1;
  return {
    code: `B${String(i + 1).padStart(4, '0')}`,
    name: `${carried[i % carried.length]} over ${crossed[Math.floor(i / carried.length) % crossed.length]}`,
    structureNumber: `${String(district).padStart(2, '0')}-${String(i + 1).padStart(4, '0')}`,
    featureCarried: carried[i % carried.length]!,
    featureCrossed: crossed[Math.floor(i / carried.length) % crossed.length]!,
    county: `${counties[i % counties.length]} County`,
    contractNumber: `C${String(district).padStart(2, '0')}-${String(7000 + i)}`,
    contractorFirm: `Bench Builders ${Math.floor(i / 20) + 1}`,
    section: `District ${district}`,
  };
}

type TitleMaker = (r: () => number) => string;
const pick = <T,>(r: () => number, list: readonly T[]): T => list[Math.floor(r() * list.length)]!;
const n = (r: () => number, lo: number, hi: number) => lo + Math.floor(r() * (hi - lo + 1));

export const titlesByType: Record<string, TitleMaker[]> = {
  deck_placement_change: [
    (r) => `Place the ${n(r, 2, 5)}-span deck in one pour`,
    (r) => `Reverse the deck placement sequence in span ${n(r, 1, 5)}`,
    (r) => `Add a bulkhead over pier ${n(r, 1, 4)} for a two-day deck pour`,
  ],
  construction_joint_relocation: [
    (r) => `Move the construction joint in span ${n(r, 1, 5)} ${n(r, 2, 12)} ft toward pier ${n(r, 1, 4)}`,
    (r) => `Relocate the pier cap construction joint at pier ${n(r, 1, 4)}`,
    (r) => `Add a keyed wall joint at abutment ${n(r, 1, 2)}`,
  ],
  joint_seal_substitution: [
    (r) => `Substitute a strip seal at abutment ${n(r, 1, 2)}`,
    (r) => `Replace the compression seal at pier ${n(r, 1, 4)} with a preformed silicone seal`,
  ],
  other_deviation: [
    (r) => `Relocate the drain outlet at pier ${n(r, 1, 4)}`,
    (r) => `Revise the bearing anchor bolt pattern at pier ${n(r, 1, 4)}`,
    (r) => `Shift the lighting conduit in the barrier of span ${n(r, 1, 5)}`,
    (r) => `Change the approach slab sleeper drainage at abutment ${n(r, 1, 2)}`,
    (r) => `Add an access hatch in the bearing seat at pier ${n(r, 1, 4)}`,
  ],
};
export const benchTypes = Object.keys(titlesByType);
export const pickType = (r: () => number) => pick(r, benchTypes);
export const pickTitle = (r: () => number, type: string) => pick(r, titlesByType[type]!)(r);

// What a register search is typed as: words of the titles, a structure number, a request number.
export function searchTermsFor(projectCount: number): string[] {
  const p = (i: number) => projectFacts(Math.min(projectCount - 1, i));
  return ['bearing', 'conduit', 'strip seal', p(Math.floor(projectCount * 0.37)).structureNumber, `${p(Math.floor(projectCount * 0.61)).code}-01`, 'sleeper'];
}

// How the agency's years of requests are spread over the states (most settled long ago).
const stateShares: [RequestState, number][] = [
  ['closed', 0.62],
  ['rejected', 0.08],
  ['withdrawn', 0.08],
  ['drafting', 0.03],
  ['section_review', 0.05],
  ['central_routing', 0.03],
  ['eor_review', 0.05],
  ['information_requested', 0.02],
  ['revising', 0.02],
  ['conditions_open', 0.02],
];
export function pickState(r: () => number): RequestState {
  let x = r();
  for (const [state, share] of stateShares) {
    if ((x -= share) < 0) return state;
  }
  return 'closed';
}

export type Move = { eventType: string; before: RequestState | null; after: RequestState; role: Role };
const mv = (eventType: string, before: RequestState | null, after: RequestState, role: Role): Move => ({ eventType, before, after, role });

const filed = [mv('created', null, 'drafting', 'contractor')];
const submitted = [...filed, mv('submit', 'drafting', 'section_review', 'contractor')];
const forwarded = [...submitted, mv('forward', 'section_review', 'central_routing', 'section_engineer')];
const routed = [...forwarded, mv('route', 'central_routing', 'eor_review', 'central_office')];

// The moves that brought a request to its state, on the main path.
export const pathTo: Record<RequestState, Move[]> = {
  drafting: filed,
  section_review: submitted,
  withdrawn: [...submitted, mv('withdraw', 'section_review', 'withdrawn', 'contractor')],
  central_routing: forwarded,
  eor_review: routed,
  information_requested: [...routed, mv('request_information', 'eor_review', 'information_requested', 'engineer_of_record')],
  revising: [...routed, mv('return_for_revision', 'eor_review', 'revising', 'engineer_of_record')],
  conditions_open: [...routed, mv('approve_with_conditions', 'eor_review', 'conditions_open', 'engineer_of_record')],
  closed: [...routed, mv('approve', 'eor_review', 'closed', 'engineer_of_record')],
  rejected: [...routed, mv('reject', 'eor_review', 'rejected', 'engineer_of_record')],
};

// The long-lived request the detail route reads: returned once, approved with two conditions,
// both met on site; the rest of its fifty events are comments.
export const longPath: Move[] = [
  ...routed,
  mv('return_for_revision', 'eor_review', 'revising', 'engineer_of_record'),
  mv('resubmit', 'revising', 'section_review', 'contractor'),
  mv('forward', 'section_review', 'central_routing', 'section_engineer'),
  mv('route', 'central_routing', 'eor_review', 'central_office'),
  mv('approve_with_conditions', 'eor_review', 'conditions_open', 'engineer_of_record'),
  mv('satisfy_condition', 'conditions_open', 'conditions_open', 'field_inspector'),
  mv('satisfy_condition', 'conditions_open', 'closed', 'field_inspector'),
];

export const decisionOf: Partial<Record<RequestState, string>> = {
  closed: 'approved',
  conditions_open: 'approved_with_conditions',
  rejected: 'rejected',
};

export const benchComments = [
  'Crew can hold the current sequence until this is answered.',
  'Attached the supplier letter to the revision.',
  'Checked against sheet S-6; dimensions agree.',
  'Please confirm the pump layout before the pre-pour meeting.',
  'Spoke with the field office; no objection from inspection.',
];

const dayMs = 24 * 3600 * 1000;

// When a request was filed and reached its present desk. Open requests came recently and mostly
// within their desk's due days (a few are overdue); settled ones are spread over five years.
export function timesFor(r: () => number, state: RequestState, desk: DeskRole | null, now: number): { created: number; deskSince: number } {
  if (!desk) {
    const created = now - (30 + r() * 5 * 365) * dayMs;
    return { created, deskSince: Math.min(now - dayMs, created + (5 + r() * 55) * dayMs) };
  }
  const due = defaultDeskDueDays[desk];
  const waited = r() < 0.03 ? due * (1 + r()) : due * 0.95 * r();
  const deskSince = now - waited * dayMs;
  // A draft's desk clock starts when it is filed.
  return { created: state === 'drafting' ? deskSince : deskSince - (1 + r() * 60) * dayMs, deskSince };
}
