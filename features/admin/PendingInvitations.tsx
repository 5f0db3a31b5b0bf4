// Invitations not yet used: who, as what, until when; send again (a new link, a new week) or withdraw.
import { StyleSheet, View } from 'react-native';
import { roleLabels } from '../../shared/roles';
import type { PendingInvitation } from '../../shared/people/types';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Panel } from '../ui/Panel';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';
import { useInvitations, useResendInvitation, useWithdrawInvitation } from './api';
import { LoadState } from './LoadState';

const day = new Intl.DateTimeFormat('en-US', { dateStyle: 'medium' });

function InvitationRow({ invitation }: { invitation: PendingInvitation }) {
  const resend = useResendInvitation();
  const withdraw = useWithdrawInvitation();
  const failure = resend.error ?? withdraw.error;
  return (
    <View style={styles.item} testID={`invitation-${invitation.email}`}>
      <Text variant="label">{`${invitation.name} · ${invitation.email}`}</Text>
      <Text variant="muted">
        {[roleLabels[invitation.role], invitation.organization, invitation.projects.map((p) => p.code).join(', ') || 'no projects'].filter(Boolean).join(' · ')}
      </Text>
      <Text variant="muted" style={invitation.expired ? styles.expired : undefined}>
        {invitation.expired ? `Expired ${day.format(new Date(invitation.expiresAt))}; send it again for a new link.` : `Invited by ${invitation.invitedBy}; the link works until ${day.format(new Date(invitation.expiresAt))}.`}
      </Text>
      {resend.isSuccess ? <Notice tone="ok">A new link was sent; the old one no longer works.</Notice> : null}
      {failure ? <Notice tone="error">{failure.message}</Notice> : null}
      <View style={styles.actions}>
        <Button kind="secondary" label="Send again" busy={resend.isPending} onPress={() => resend.mutate(invitation.id)} testID={`invitation-resend-${invitation.email}`} />
        <Button kind="quiet" label="Withdraw" busy={withdraw.isPending} onPress={() => withdraw.mutate(invitation.id)} testID={`invitation-withdraw-${invitation.email}`} />
      </View>
    </View>
  );
}

export function PendingInvitations() {
  const invitations = useInvitations();
  return (
    <Panel title="Waiting to be accepted" testID="invitations">
      <LoadState query={invitations} what="The invitations" testID="invitations" />
      {invitations.data?.length === 0 ? <Text variant="muted" testID="invitations-empty">No invitation is waiting. Invite someone above; they show here until they choose a password.</Text> : null}
      {invitations.data?.map((i) => <InvitationRow key={i.id} invitation={i} />)}
    </Panel>
  );
}

const styles = StyleSheet.create({
  item: { gap: space.xs, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  expired: { color: colors.caution },
});
