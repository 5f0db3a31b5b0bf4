// The engineering check each request type carries, computed from the request's own inputs. The
// form runs it live; the server runs it again at submit and stores inputs, results and the module
// version with the revision, so every reviewer sees the same figures.
import {
  checkConstructionJointLocation,
  checkSealSubstitution,
  engineeringCaution,
  engineeringVersion,
  installationGap,
  planDeckPlacement,
  thermalMovementRange,
} from '../engineering';
import type { RequestBody } from './requestBody';

export type EngineeringVerdict = 'acceptable' | 'not_acceptable' | 'for_review';

export type EngineeringCheck = {
  engineeringVersion: string;
  kind: RequestBody['type'];
  verdict: EngineeringVerdict;
  findings: string[];
  inputs: Record<string, unknown>;
  results: Record<string, unknown>;
  caution: string;
};

function check(body: RequestBody, verdict: EngineeringVerdict, findings: string[], inputs: Record<string, unknown>, results: Record<string, unknown>): EngineeringCheck {
  return { engineeringVersion, kind: body.type, verdict, findings, inputs, results, caution: engineeringCaution };
}

// Throws EngineeringInputError (with a plain message) when the inputs cannot be analysed.
export function engineeringCheckFor(body: RequestBody): EngineeringCheck | null {
  switch (body.type) {
    case 'deck_placement_change': {
      const inputs = {
        spansFt: body.deck.spansFt,
        deckWidthFt: body.deck.deckWidthFt,
        slabThicknessIn: body.deck.slabThicknessIn,
        haunchCyPerFt: body.deck.haunchCyPerFt,
        placementRateCyPerHr: body.placement.rateCyPerHr,
      };
      const plan = planDeckPlacement(inputs);
      const findings: string[] = [plan.placementSequenceNote];
      let verdict: EngineeringVerdict = 'for_review';
      if (body.proposedSequence.kind === 'single_placement') {
        findings.push(plan.retarderNote);
        if (!body.retarder) {
          verdict = 'not_acceptable';
          findings.push('A single placement needs retarded concrete, and no retarder or set-time test is given.');
        } else if (body.retarder.initialSetHr < plan.singlePlacement.minInitialSetHr) {
          verdict = 'not_acceptable';
          findings.push(
            `The tested initial set (${body.retarder.initialSetHr} h, ASTM C403) is shorter than the ${plan.singlePlacement.minInitialSetHr.toFixed(1)} h the single placement needs.`,
          );
        } else {
          verdict = 'acceptable';
          findings.push(`The tested initial set (${body.retarder.initialSetHr} h, ASTM C403) covers the ${plan.singlePlacement.minInitialSetHr.toFixed(1)} h the single placement needs.`);
        }
      }
      let emergencyJoint = null;
      if (body.emergencyJointAtFt !== undefined) {
        emergencyJoint = checkConstructionJointLocation({ spansFt: body.deck.spansFt, jointAtFt: body.emergencyJointAtFt });
        findings.push(...emergencyJoint.reasons);
        if (!emergencyJoint.acceptable) verdict = 'not_acceptable';
      }
      return check(body, verdict, findings, { ...inputs, emergencyJointAtFt: body.emergencyJointAtFt, retarder: body.retarder }, { plan, emergencyJoint });
    }
    case 'construction_joint_relocation': {
      if (!body.spansFt || body.proposedLocation.atFt === undefined) {
        return check(body, 'for_review', ['No span lengths or proposed station given: the location is for the reviewers to judge.'], {}, {});
      }
      const inputs = { spansFt: body.spansFt, jointAtFt: body.proposedLocation.atFt, plane: body.plane };
      const proposed = checkConstructionJointLocation(inputs);
      const planned =
        body.plannedLocation.atFt !== undefined ? checkConstructionJointLocation({ ...inputs, jointAtFt: body.plannedLocation.atFt }) : null;
      return check(body, proposed.acceptable ? 'acceptable' : 'not_acceptable', proposed.reasons, { ...inputs, plannedAtFt: body.plannedLocation.atFt }, { proposed, planned });
    }
    case 'joint_seal_substitution': {
      const movement = thermalMovementRange({ contributingLengthFt: body.contributingLengthFt, material: body.material, climate: body.climate });
      const gap =
        body.gapAtReferenceIn !== undefined
          ? installationGap({
              gapAtReferenceIn: body.gapAtReferenceIn,
              referenceTempF: body.referenceTempF,
              installTempF: body.installTempF,
              contributingLengthFt: body.contributingLengthFt,
              material: body.material,
              climate: body.climate,
            })
          : null;
      const seal = checkSealSubstitution({
        movementRangeIn: movement.movementRangeIn,
        specified: { kind: body.specified.kind, minOpeningIn: body.specified.minOpeningIn, maxOpeningIn: body.specified.maxOpeningIn },
        substitute: { kind: body.substitute.kind, minOpeningIn: body.substitute.minOpeningIn, maxOpeningIn: body.substitute.maxOpeningIn },
      });
      // A seal's movement capacity is the span of openings it works over; a data sheet that says
      // otherwise is worth a reviewer's question, and the check goes by the openings.
      const capacityNotes = (['specified', 'substitute'] as const)
        .filter((side) => Math.abs(body[side].movementCapacityIn - (body[side].maxOpeningIn - body[side].minOpeningIn)) > 0.01)
        .map(
          (side) =>
            `The ${side} seal's stated movement capacity (${body[side].movementCapacityIn} in) differs from its opening range (${(body[side].maxOpeningIn - body[side].minOpeningIn).toFixed(2)} in); the check uses the opening range.`,
        );
      return check(
        body,
        seal.pass ? 'acceptable' : 'not_acceptable',
        [...seal.reasons, ...capacityNotes],
        { contributingLengthFt: body.contributingLengthFt, material: body.material, climate: body.climate, installTempF: body.installTempF, specified: body.specified, substitute: body.substitute },
        { movement, gap, seal },
      );
    }
    case 'other_deviation':
      return null;
  }
}
