// The comment that sent the request back, so the contractor revises with it in front of them.
import type { RequestDetail } from '../../../shared/requests/types';
import { Notice } from '../../ui/Notice';
import { formatWhen } from '../format';

export function ReturnComment({ r, testID }: { r: Pick<RequestDetail, 'trail'>; testID?: string }) {
  const returned = [...r.trail].reverse().find((e) => e.eventType === 'return_for_revision');
  if (!returned?.comment) return null;
  return <Notice tone="info" testID={testID}>{`Returned by ${returned.actor.name} ${formatWhen(returned.at)}: “${returned.comment}”`}</Notice>;
}
