// The part every request has: project, title, where, why, what instead, when and at what cost.
import { Controller, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { ProjectSummary } from '../../../shared/requests/types';
import { Choice, FieldError } from '../../ui/Choice';
import { Text } from '../../ui/Text';
import { space } from '../../ui/theme';
import { FormChoices, FormText, Pair, PairItem } from './fields';
import { costKindLabels, costKinds, type FilingControl } from './formValues';

type Props = { control: FilingControl; projects: ProjectSummary[]; projectLocked: boolean };

export function WhatAndWhere({ control, projects, projectLocked }: Props) {
  return (
    <View style={styles.section}>
      <Text variant="heading" accessibilityRole="header">What and where</Text>
      <Controller
        control={control}
        name="projectId"
        render={({ field, fieldState }) => (
          <View style={styles.group} accessibilityRole="radiogroup" accessibilityLabel="Project">
            <Text variant="label">Project</Text>
            {projects
              .filter((p) => !projectLocked || p.id === field.value)
              .map((p) => (
                <Choice
                  key={p.id}
                  label={`${p.code} · ${p.name}`}
                  detail={`Structure ${p.structureNumber}, ${p.featureCarried} over ${p.featureCrossed}, ${p.county}`}
                  chosen={field.value === p.id}
                  onPress={() => (projectLocked ? undefined : field.onChange(p.id))}
                  testID="filing-project"
                />
              ))}
            <FieldError message={fieldState.error?.message} />
          </View>
        )}
      />
      <FormText
        control={control}
        name="title"
        label="Title"
        hint="What departs from the plans, in a line: e.g. “Move deck drain outlet at pier 2”."
        testID="filing-title"
      />
      <FormText
        control={control}
        name="location.description"
        label="Where on the structure"
        hint="The element and its place, e.g. “Deck drain over pier 2, north fascia”."
        testID="filing-location"
      />
      <Pair>
        <PairItem>
          <FormText control={control} name="location.span" label="Span (optional)" testID="filing-span" />
        </PairItem>
        <PairItem>
          <FormText control={control} name="location.station" label="Station (optional)" placeholder="e.g. 12+40" testID="filing-station" />
        </PairItem>
      </Pair>
      <FormText
        control={control}
        name="planSheets"
        label="Plan sheets affected"
        hint="Sheet numbers separated by commas, e.g. S-12, D-3. Leave empty if none."
        autoCapitalize="characters"
        testID="filing-plan-sheets"
      />
    </View>
  );
}

export function TheChange({ control }: { control: FilingControl }) {
  return (
    <View style={styles.section}>
      <Text variant="heading" accessibilityRole="header">The change</Text>
      <FormText control={control} name="reason" label="Reason" hint="Why the change is needed and what the plans show today." multiline testID="filing-reason" />
      <FormText
        control={control}
        name="proposedChange"
        label="Proposed change"
        hint="What you would build instead, with dimensions and materials."
        multiline
        testID="filing-proposed-change"
      />
    </View>
  );
}

export function ScheduleAndCost({ control }: { control: FilingControl }) {
  const costKind = useWatch({ control, name: 'costImpact.kind' });
  return (
    <View style={styles.section}>
      <Text variant="heading" accessibilityRole="header">Schedule and cost</Text>
      <FormText
        control={control}
        name="neededBy"
        label="Decision needed by"
        hint="The latest date an answer keeps the work on schedule, as YYYY-MM-DD."
        placeholder="YYYY-MM-DD"
        keyboardType="numbers-and-punctuation"
        testID="filing-needed-by"
      />
      <FormChoices control={control} name="costImpact.kind" label="Cost impact" options={costKinds} labels={costKindLabels} testIDPrefix="filing-cost" />
      {costKind === 'credit' || costKind === 'added_cost' ? (
        <FormText
          control={control}
          name="costImpact.amountUsd"
          label={costKind === 'credit' ? 'Credit, in dollars' : 'Added cost, in dollars'}
          hint="Your estimate; the final figure is settled by the contract’s change procedure."
          placeholder="e.g. 1850"
          keyboardType="decimal-pad"
          testID="filing-cost-amount"
        />
      ) : null}
      <FormText
        control={control}
        name="contractTimeImpactDays"
        label="Contract-time impact, in days"
        hint="Whole days: 0 if none, negative if the change saves time."
        keyboardType="numbers-and-punctuation"
        testID="filing-time-impact"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.lg },
  group: { gap: space.sm },
});
