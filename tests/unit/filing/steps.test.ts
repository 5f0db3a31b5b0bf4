// The filing form's steps: the moves, which boxes each step checks, and where a server's
// complaint sends the person back to.
import { describe, expect, it } from 'vitest';
import { fieldFor } from '../../../features/requests/filing/formSchema';
import { earliestStep, firstStep, stepFields, stepHeading, stepOfField, stepReducer, type StepState } from '../../../features/requests/filing/steps';

const run = (state: StepState, ...actions: Parameters<typeof stepReducer>[1][]) => actions.reduce(stepReducer, state);

describe('filing steps', () => {
  it('moves forward one step at a time and remembers the furthest step reached', () => {
    const s = run(firstStep, { type: 'next' }, { type: 'next' });
    expect(s).toEqual({ step: 'departure', reached: 'departure' });
    expect(run(s, { type: 'back' }, { type: 'back' })).toEqual({ step: 'kind', reached: 'departure' });
    expect(run(s, { type: 'next' }, { type: 'next' }, { type: 'next' })).toEqual({ step: 'review', reached: 'review' });
    expect(run(firstStep, { type: 'back' })).toEqual(firstStep);
  });

  it('goes back to a step already reached but never jumps ahead of what has been checked', () => {
    const atDeparture = run(firstStep, { type: 'next' }, { type: 'next' });
    expect(run(atDeparture, { type: 'goTo', step: 'review' })).toBe(atDeparture);
    expect(run(atDeparture, { type: 'goTo', step: 'where' })).toEqual({ step: 'where', reached: 'departure' });
    // Next from an earlier step does not forget how far the person had got.
    expect(run(atDeparture, { type: 'goTo', step: 'kind' }, { type: 'next' })).toEqual({ step: 'where', reached: 'departure' });
  });

  it('resumes a draft kept on the device at the step it was left on', () => {
    expect(run(firstStep, { type: 'resume', step: 'files' })).toEqual({ step: 'files', reached: 'files' });
  });

  it('names the step in words', () => {
    expect(stepHeading('departure')).toBe('Step 3 of 5: The departure');
    expect(stepHeading('kind')).toBe('Step 1 of 5: Kind of request');
    expect(stepHeading('review')).toBe('Step 5 of 5: Review and file');
  });

  it('checks on each step only the boxes that step shows, for the chosen kind of request', () => {
    const where = stepFields('where', 'deck_placement_change');
    expect(where).toEqual(['projectId', 'title', 'location.description', 'location.span', 'location.station', 'planSheets']);

    const deck = stepFields('departure', 'deck_placement_change');
    expect(deck).toEqual(expect.arrayContaining(['deck.spansFt', 'retarder.initialSetHr', 'reason', 'costImpact.kind', 'contractTimeImpactDays']));
    expect(deck).not.toContain('title');
    expect(deck).not.toContain('jointLocation');
    expect(deck).not.toContain('spansFt');

    const seal = stepFields('departure', 'joint_seal_substitution');
    expect(seal).toEqual(expect.arrayContaining(['specified.kind', 'substitute.maxOpeningIn', 'installTempF']));
    expect(seal).not.toContain('deck.spansFt');

    expect(stepFields('departure', 'other_deviation')).toEqual(['reason', 'proposedChange', 'neededBy', 'costImpact.kind', 'costImpact.amountUsd', 'contractTimeImpactDays']);
    expect(stepFields('kind', 'other_deviation')).toEqual([]);
    expect(stepFields('files', 'other_deviation')).toEqual([]);
  });

  it('sends a server complaint to the step and box it is about', () => {
    // The paths the API answers with in error.fields.
    const place = (path: string) => {
      const field = fieldFor(path.split('.'));
      return field ? stepOfField(field, 'deck_placement_change') : 'review';
    };
    expect(place('title')).toBe('where');
    expect(place('location')).toBe('where');
    expect(place('deck.spansFt.1')).toBe('departure');
    expect(place('costImpact')).toBe('departure');
    expect(place('_')).toBe('review');
    expect(stepOfField('spansFt', 'construction_joint_relocation')).toBe('departure');
    expect(stepOfField('spansFt', 'deck_placement_change')).toBe('review');

    expect(earliestStep(['reason', 'title', 'deck.deckWidthFt'], 'deck_placement_change')).toBe('where');
    expect(earliestStep(['reason'], 'other_deviation')).toBe('departure');
    expect(earliestStep([], 'other_deviation')).toBeNull();
  });
});
