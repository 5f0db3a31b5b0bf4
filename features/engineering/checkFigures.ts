// The figures a check carries, read back from a check object that may have come from the server
// (stored at submit, possibly by an older version of the checks). Anything not in the expected
// shape reads as "no figures", so a screen shows the words and skips the drawing rather than fail.
import {
  analyzeContinuousBeam,
  type ContinuousBeamResult,
  type DeckPlacementPlan,
  type InstallationGap,
  type SealKind,
} from '../../shared/engineering';

type Loose = Record<string, unknown>;

export type CheckLike = { kind?: unknown; verdict?: unknown; findings?: unknown; inputs?: unknown; results?: unknown; engineeringVersion?: unknown; caution?: unknown };

const obj = (v: unknown): Loose | null => (v !== null && typeof v === 'object' && !Array.isArray(v) ? (v as Loose) : null);
const num = (v: unknown): number | undefined => (typeof v === 'number' && Number.isFinite(v) ? v : undefined);
const numbers = (v: unknown): number[] | null => (Array.isArray(v) && v.length > 0 && v.every((x) => num(x) !== undefined) ? (v as number[]) : null);

// The moment diagram is not stored (it is hundreds of stations); it is drawn again from the stored
// spans and load, which fix it exactly.
function beamFor(spansFt: number[], uniformLoadKipPerFt: number): ContinuousBeamResult | null {
  try {
    return analyzeContinuousBeam({ spansFt, uniformLoadKipPerFt });
  } catch {
    return null;
  }
}

export type DeckFigures = { plan: DeckPlacementPlan; beam: ContinuousBeamResult | null; emergencyJointAtFt?: number };

export function deckFigures(check: CheckLike): DeckFigures | null {
  const inputs = obj(check.inputs);
  const plan = obj(obj(check.results)?.plan);
  const spansFt = numbers(inputs?.spansFt);
  const load = num(plan?.deadLoadKipPerFt);
  if (!plan || !spansFt || load === undefined || !Array.isArray(plan.segments) || !numbers(plan.supportsFt) || !obj(plan.singlePlacement)) return null;
  return { plan: plan as unknown as DeckPlacementPlan, beam: beamFor(spansFt, load), emergencyJointAtFt: num(inputs?.emergencyJointAtFt) };
}

export type JointFigures = { beam: ContinuousBeamResult | null; jointAtFt: number; plannedAtFt?: number; momentAtJointKipFt?: number; distanceToInflectionFt?: number };

export function jointFigures(check: CheckLike): JointFigures | null {
  const inputs = obj(check.inputs);
  const spansFt = numbers(inputs?.spansFt);
  const jointAtFt = num(inputs?.jointAtFt);
  if (!spansFt || jointAtFt === undefined) return null;
  const proposed = obj(obj(check.results)?.proposed);
  // The joint check judges the shape of the diagram under a unit uniform load; drawn the same way.
  return {
    beam: beamFor(spansFt, 1),
    jointAtFt,
    plannedAtFt: num(inputs?.plannedAtFt),
    momentAtJointKipFt: num(proposed?.momentAtJointKipFt),
    distanceToInflectionFt: num(proposed?.distanceToInflectionPointFt),
  };
}

export type SealFigures = {
  gap: InstallationGap | null;
  movementRangeIn?: number;
  suggestedFamily?: SealKind;
  suitableFamilies: SealKind[];
  modularCells?: number;
  substituteCapacityIn?: number;
};

export function sealFigures(check: CheckLike): SealFigures | null {
  const results = obj(check.results);
  const seal = obj(results?.seal);
  if (!seal) return null;
  const gap = obj(results?.gap);
  const gapOk = gap && Array.isArray(gap.table) && gap.table.length > 1 && num(gap.openingIn) !== undefined && num(gap.installTempF) !== undefined;
  return {
    gap: gapOk ? (gap as unknown as InstallationGap) : null,
    movementRangeIn: num(obj(results?.movement)?.movementRangeIn),
    suggestedFamily: typeof seal.suggestedJointFamily === 'string' ? (seal.suggestedJointFamily as SealKind) : undefined,
    suitableFamilies: Array.isArray(seal.suitableJointFamilies) ? (seal.suitableJointFamilies.filter((k) => typeof k === 'string') as SealKind[]) : [],
    modularCells: num(seal.modularCells),
    substituteCapacityIn: num(seal.substituteCapacityIn),
  };
}

export function findingsOf(check: CheckLike): string[] {
  return Array.isArray(check.findings) ? check.findings.filter((f): f is string => typeof f === 'string') : [];
}
