// The whole request read back before it is filed, step by step, each with a way back to change it.
import { useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { labelledBodyFields } from '../../../shared/requests/bodyFields';
import { requestTypeLabels } from '../../../shared/requests/requestBody';
import type { AttachmentSummary, ProjectSummary } from '../../../shared/requests/types';
import { Button } from '../../ui/Button';
import { Text } from '../../ui/Text';
import { colors, radius, space } from '../../ui/theme';
import type { PickedFile } from '../api';
import { draftBodyFrom } from './draftBody';
import type { FilingControl, FilingFormValues } from './formValues';
import { stepOfField, stepTitles, type FilingStep } from './steps';

type Row = { label: string; value: string };

function Section({ step, rows, onChange }: { step: FilingStep; rows: Row[]; onChange: (s: FilingStep) => void }) {
  return (
    <View style={styles.section} testID={`review-${step}`}>
      <View style={styles.head}>
        <Text variant="label" style={styles.title}>{stepTitles[step]}</Text>
        <Button kind="quiet" label={`Change ${stepTitles[step].toLowerCase()}`} onPress={() => onChange(step)} testID={`review-change-${step}`} />
      </View>
      {rows.map((r) => (
        <View key={r.label} style={styles.row}>
          <Text variant="label" style={styles.label}>{r.label}</Text>
          <Text style={styles.value}>{r.value}</Text>
        </View>
      ))}
    </View>
  );
}

type Props = { control: FilingControl; projects: ProjectSummary[]; files: PickedFile[]; stored?: readonly AttachmentSummary[]; onChange: (s: FilingStep) => void };

export function ReviewStep({ control, projects, files, stored = [], onChange }: Props) {
  const values = useWatch({ control }) as FilingFormValues;
  const rows = labelledBodyFields(draftBodyFrom(values) ?? {});
  const project = projects.find((p) => p.id === values.projectId);
  const on = (step: FilingStep) => rows.filter((r) => stepOfField(r.path, values.type) === step);
  return (
    <View style={styles.list} testID="filing-review">
      <Text variant="muted">Read it through before filing. Once filed it goes to the section engineer and can be changed only if it is returned to you.</Text>
      <Section step="kind" rows={[{ label: 'Kind', value: requestTypeLabels[values.type] }]} onChange={onChange} />
      <Section step="where" rows={[...(project ? [{ label: 'Project', value: `${project.code} · ${project.name}` }] : []), ...on('where')]} onChange={onChange} />
      <Section step="departure" rows={on('departure')} onChange={onChange} />
      <Section
        step="files"
        rows={
          files.length + stored.length
            ? [...stored.map((a) => a.fileName), ...files.map((f) => f.name)].map((name, i) => ({ label: `File ${i + 1}`, value: name }))
            : [{ label: 'Files', value: 'None added' }]
        }
        onChange={onChange}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.lg },
  section: { gap: space.sm, backgroundColor: colors.surface, borderRadius: radius, borderWidth: 1, borderColor: colors.line, padding: space.md },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap', gap: space.sm },
  title: { fontSize: 16, flexShrink: 1 },
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md },
  label: { color: colors.inkMuted, flexBasis: 180, flexGrow: 1 },
  value: { flexBasis: 200, flexGrow: 2 },
});
