// The moves this person may make on the request now (as the server listed them), and a comment
// box. A move is chosen first and sent second, so one tap never settles a request by accident.
import { useEffect, useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { isRequestState, requestStateInfo } from '../../shared/requests/states';
import type { RequestDetail } from '../../shared/requests/types';
import type { Role } from '../../shared/roles';
import { workflowEventLabels, workflowEventPastTense, workflowEventSchema, type WorkflowEventType } from '../../shared/workflow/events';
import { ApiError } from '../api/http';
import { Button } from '../ui/Button';
import { Choice, FieldError } from '../ui/Choice';
import { Notice } from '../ui/Notice';
import { Panel } from '../ui/Panel';
import { Text } from '../ui/Text';
import { TextField } from '../ui/TextField';
import { colors, radius, space } from '../ui/theme';
import { useAddComment, useEngineersOfRecord, useWorkflowEvent } from './api';

// Moves whose forms need more than a comment (evidence, letters, a classification) come later.
// Submit and resubmit are made from the filing form, where the body is changed before it goes.
const panelMoves = [
  'provide_information',
  'forward',
  'route',
  'reassign',
  'request_information',
  'approve',
  'approve_with_conditions',
  'return_for_revision',
  'reject',
  'withdraw',
] as const satisfies readonly WorkflowEventType[];
type PanelMove = (typeof panelMoves)[number];

const commentRequired: ReadonlySet<PanelMove> = new Set(['return_for_revision', 'reject', 'request_information', 'provide_information', 'reassign']);

const whatFollows: Record<PanelMove, string> = {
  provide_information: 'Your answer goes back to the engineer of record. Attachments for answers come with a later version; describe them here for now.',
  forward: 'It goes to central office to be routed to an engineer of record.',
  route: 'The engineer of record you choose reviews it and decides.',
  reassign: 'The request moves to another engineer of record; both are told. Say why.',
  request_information: 'The contractor is asked your question and the request waits at their desk until they answer.',
  approve: 'The request is closed as approved. This is final.',
  approve_with_conditions: 'The request is approved once the field inspector confirms each condition on site.',
  return_for_revision: 'The contractor revises it as you ask and resubmits; it then starts again at the section engineer.',
  reject: 'The request is closed as rejected. This is final; say why.',
  withdraw: 'The request is closed as withdrawn and cannot be moved again.',
};

const settling: ReadonlySet<PanelMove> = new Set(['approve', 'reject', 'withdraw']);

type ConditionRow = { text: string; dueBefore: string };
const emptyCondition = (): ConditionRow => ({ text: '', dueBefore: '' });

// Spare empty rows are dropped, but an all-empty list is sent as is so each row says what it lacks.
function withoutBlankRows(rows: ConditionRow[]): ConditionRow[] {
  const filled = rows.filter((c) => c.text.trim() !== '' || c.dueBefore.trim() !== '');
  return filled.length > 0 ? filled : rows;
}

function isPanelMove(type: string): type is PanelMove {
  return (panelMoves as readonly string[]).includes(type);
}

function errorsFrom(issues: readonly { path: readonly PropertyKey[]; message: string }[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join('.') || 'move';
    out[key] ??= issue.message;
  }
  return out;
}

type Props = { request: RequestDetail; actorRole: Role | undefined };

export function ActionPanel({ request, actorRole }: Props) {
  const moves = request.availableActions.filter(isPanelMove);
  const [chosen, setChosen] = useState<PanelMove | null>(null);
  const [comment, setComment] = useState('');
  const [eorUserId, setEorUserId] = useState<string | null>(null);
  const [conditions, setConditions] = useState<ConditionRow[]>([emptyCondition()]);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [failure, setFailure] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const workflow = useWorkflowEvent();
  const addComment = useAddComment();
  const picksEor = chosen === 'route' || chosen === 'reassign';
  const eors = useEngineersOfRecord(request.id, picksEor);

  // After a refetch (a 409, someone else's move) the chosen move may no longer be open.
  useEffect(() => {
    if (chosen && !moves.includes(chosen)) setChosen(null);
  }, [chosen, moves]);

  // Auditors observe; everyone else on the project may at least comment.
  if (actorRole === 'auditor' && moves.length === 0) return null;

  function choose(move: PanelMove) {
    setChosen(chosen === move ? null : move);
    setErrors({});
    setFailure(null);
    setDone(null);
  }

  function fail(err: unknown) {
    const e = err instanceof ApiError ? err : null;
    setFailure(e?.status === 409 ? `${e.message} The request has been reloaded as it is now.` : (e?.message ?? 'Something went wrong; try again.'));
    if (e?.fields) setErrors(e.fields);
  }

  function send() {
    setFailure(null);
    setDone(null);
    if (!chosen) {
      if (comment.trim() === '') {
        setErrors({ comment: 'Write the comment first.' });
        return;
      }
      addComment.mutate(
        { id: request.id, comment: comment.trim() },
        {
          onSuccess: () => {
            setComment('');
            setErrors({});
            setDone('Your comment is on the trail.');
          },
          onError: fail,
        },
      );
      return;
    }
    // Blank rows go before checking, so an error's row number is the row the person sees.
    const rows = withoutBlankRows(conditions);
    if (chosen === 'approve_with_conditions' && rows.length !== conditions.length) setConditions(rows);
    const note = comment.trim() === '' ? undefined : comment.trim();
    const base = { type: chosen, version: request.version, comment: note };
    const draft =
      chosen === 'route' || chosen === 'reassign'
        ? { ...base, eorUserId: eorUserId ?? '' }
        : chosen === 'approve_with_conditions'
          ? { ...base, conditions: rows }
          : base;
    const parsed = workflowEventSchema.safeParse(draft);
    if (!parsed.success) {
      setErrors(errorsFrom(parsed.error.issues));
      return;
    }
    setErrors({});
    const move = chosen;
    workflow.mutate(
      { id: request.id, event: parsed.data },
      {
        onSuccess: () => {
          setChosen(null);
          setComment('');
          setEorUserId(null);
          setConditions([emptyCondition()]);
          setDone(`${workflowEventPastTense[move]}.`);
        },
        onError: fail,
      },
    );
  }

  const busy = workflow.isPending || addComment.isPending;
  // "Your move" only when the request waits at this person's desk; a contractor may withdraw at
  // any time, but that is not something asked of them.
  const atMyDesk = isRequestState(request.state) && actorRole !== undefined && requestStateInfo[request.state].desk === actorRole;
  const title = moves.length === 0 ? 'Comment on the request' : atMyDesk ? 'Your move' : 'What you can do';
  const needsComment = chosen !== null && commentRequired.has(chosen);
  const commentLabel = chosen === null ? 'Your comment' : needsComment ? 'Comment (required)' : 'Comment (optional)';
  const conditionsError = errors.conditions;

  return (
    <Panel title={title} emphasis={atMyDesk && moves.length > 0} testID="action-panel">
      {done ? <Notice tone="ok" testID="action-done">{done}</Notice> : null}
      {moves.length > 0 ? (
        <View style={styles.group} accessibilityRole="radiogroup" accessibilityLabel="What to do with the request">
          {moves.map((move) => (
            <Choice key={move} compact label={workflowEventLabels[move]} chosen={chosen === move} onPress={() => choose(move)} testID={`action-${move}`} />
          ))}
        </View>
      ) : (
        <Text variant="muted">Nothing is asked of you on this request now. A comment goes on its trail for everyone on the project to read.</Text>
      )}

      {chosen ? <Notice tone={settling.has(chosen) ? 'caution' : 'info'}>{whatFollows[chosen]}</Notice> : null}

      {picksEor ? (
        <View style={styles.group} accessibilityRole="radiogroup" accessibilityLabel="Engineer of record">
          <Text variant="label">Engineer of record</Text>
          {eors.isPending ? <ActivityIndicator /> : null}
          {eors.error ? <Notice tone="error">{eors.error.message}</Notice> : null}
          {eors.data?.length === 0 ? <Notice tone="info">No engineer of record is on this project yet; ask your administrator to add one.</Notice> : null}
          {eors.data?.map((p) => {
            const current = p.id === request.assignedEor?.id;
            return (
              <Choice
                key={p.id}
                compact
                label={current ? `${p.name} (has it now)` : p.name}
                detail={p.organization ?? p.email}
                chosen={eorUserId === p.id}
                onPress={() => setEorUserId(p.id)}
                testID="action-eor"
              />
            );
          })}
          <FieldError message={errors.eorUserId} />
        </View>
      ) : null}

      {chosen === 'approve_with_conditions' ? (
        <View style={styles.group}>
          <Text variant="label">Conditions</Text>
          <Text variant="muted">Each one is confirmed on site by the field inspector, with a note and evidence, before the request closes.</Text>
          {conditions.map((c, i) => (
            <View key={i} style={styles.condition} testID="action-condition">
              <Text variant="label">Condition {i + 1}</Text>
              <TextField
                label="What must be done"
                value={c.text}
                onChangeText={(text) => setConditions(conditions.map((x, j) => (j === i ? { ...x, text } : x)))}
                error={errors[`conditions.${i}.text`]}
                testID="action-condition-text"
              />
              <TextField
                label="Due before"
                placeholder="e.g. before placement"
                value={c.dueBefore}
                onChangeText={(dueBefore) => setConditions(conditions.map((x, j) => (j === i ? { ...x, dueBefore } : x)))}
                error={errors[`conditions.${i}.dueBefore`]}
                testID="action-condition-due"
              />
              {conditions.length > 1 ? (
                <Button kind="quiet" label="Remove this condition" onPress={() => setConditions(conditions.filter((_, j) => j !== i))} />
              ) : null}
            </View>
          ))}
          <FieldError message={conditionsError} />
          <Button kind="secondary" label="Add a condition" onPress={() => setConditions([...conditions, emptyCondition()])} testID="action-condition-add" />
        </View>
      ) : null}

      <TextField
        label={commentLabel}
        hint={chosen === null ? (moves.length > 0 ? 'Choose a move above to send it with the move, or add it on its own.' : undefined) : needsComment ? 'Say why; it goes on the trail and in the e-mail.' : 'It goes on the trail and in the e-mail.'}
        value={comment}
        onChangeText={setComment}
        multiline
        error={errors.comment}
        testID="action-comment"
      />
      {failure ? <Notice tone="error" testID="action-failure">{failure}</Notice> : null}
      {errors.move ? <FieldError message={errors.move} /> : null}
      <View style={styles.buttons}>
        {/* Without a move chosen, the button only comments; it must not look like the way forward. */}
        <Button
          kind={chosen || moves.length === 0 ? 'primary' : 'secondary'}
          label={chosen ? workflowEventLabels[chosen] : moves.length > 0 ? 'Add the comment only' : 'Add the comment'}
          busy={busy}
          onPress={send}
          testID="action-send"
        />
        {chosen ? <Button kind="quiet" label="Cancel" onPress={() => choose(chosen)} /> : null}
      </View>
    </Panel>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.sm },
  condition: { gap: space.sm, borderWidth: 1, borderColor: colors.line, borderRadius: radius, padding: space.md, backgroundColor: colors.concrete },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
