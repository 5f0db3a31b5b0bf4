// What the current revision of a request says, as a reviewer reads it, and what changed since the
// revision before it. Drafts may be half filled, so every field has a word for "not yet".
import { StyleSheet, View } from 'react-native';
import type { RevisionView } from '../../shared/requests/types';
import type { CheckLike } from '../engineering/checkFigures';
import { EngineeringCheckView } from '../engineering/EngineeringCheckView';
import { TypedFields } from './TypedFields';
import { Panel } from '../ui/Panel';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';
import { changedFieldName, changedValue } from './changeWords';
import { formatCostImpact, formatDay, formatDays } from './format';

const notYet = 'Not given yet';

function Field({ label, value, testID }: { label: string; value: string | undefined; testID?: string }) {
  return (
    <View style={styles.field} testID={testID}>
      <Text variant="label" style={styles.fieldLabel}>{label}</Text>
      <Text style={value ? undefined : styles.missing}>{value || notYet}</Text>
    </View>
  );
}

export function RequestBodyView({ revision }: { revision: RevisionView }) {
  const b = revision.body;
  const where = [b.location?.description, b.location?.span ? `span ${b.location.span}` : '', b.location?.station ? `station ${b.location.station}` : '']
    .filter(Boolean)
    .join(' · ');
  const changes = revision.changes.filter((c) => c.path !== 'type' && c.path !== 'projectId');
  return (
    <Panel title={revision.revision > 1 ? `The request, revision ${revision.revision}` : 'The request'} testID="request-body">
      <Field label="Where on the structure" value={where} testID="request-location" />
      <Field label="Plan sheets" value={b.planSheets ? (b.planSheets.length ? b.planSheets.join(', ') : 'None listed') : undefined} />
      <Field label="Reason" value={b.reason} testID="request-reason" />
      <Field label="Proposed change" value={b.proposedChange} testID="request-proposed-change" />
      <View style={styles.facts}>
        <View style={styles.fact}>
          <Field label="Decision needed by" value={b.neededBy ? formatDay(b.neededBy) : undefined} testID="request-needed-by" />
        </View>
        <View style={styles.fact}>
          <Field label="Cost impact" value={b.costImpact ? formatCostImpact(b.costImpact) : undefined} testID="request-cost" />
        </View>
        <View style={styles.fact}>
          <Field label="Contract-time impact" value={typeof b.contractTimeImpactDays === 'number' ? formatDays(b.contractTimeImpactDays) : undefined} testID="request-time-impact" />
        </View>
      </View>
      <TypedFields body={b} />
      {changes.length > 0 ? (
        <View style={styles.changes} testID="request-changes">
          <Text variant="label">Changed since revision {revision.revision - 1}</Text>
          {changes.map((c) => (
            <Text key={c.path} variant="muted">
              {changedFieldName(c.path)}: {changedValue(c.before)} → {changedValue(c.after)}
            </Text>
          ))}
        </View>
      ) : null}
      <EngineeringFindings engineering={revision.engineering} />
    </Panel>
  );
}

// Stored with the revision at submit; a request type without checks stores none. The plots are
// drawn from the stored figures, so every desk sees what was filed.
function EngineeringFindings({ engineering }: { engineering: unknown }) {
  if (!engineering || typeof engineering !== 'object') return null;
  const e = engineering as CheckLike;
  return (
    <View style={styles.changes} testID="request-engineering">
      <Text variant="label">Engineering checks{typeof e.engineeringVersion === 'string' ? ` (version ${e.engineeringVersion}, run at submit)` : ''}</Text>
      <EngineeringCheckView check={e} stored bleed={space.lg} testID="request-check" />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: 2 },
  fieldLabel: { color: colors.inkMuted },
  missing: { color: colors.inkMuted, fontStyle: 'italic' },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  fact: { flexGrow: 1, flexBasis: 180 },
  changes: { gap: space.xs, borderTopWidth: 1, borderTopColor: colors.line, paddingTop: space.md },
});
