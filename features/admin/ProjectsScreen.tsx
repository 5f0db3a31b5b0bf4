// Every project with its members and desk due days, for the administrator.
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { Notice } from '../ui/Notice';
import { space } from '../ui/theme';
import { AdminFrame } from './AdminFrame';
import { useAdminProjects, usePeople } from './api';
import { LoadState } from './LoadState';
import { ProjectPanel } from './ProjectPanel';

const twoColumnsFrom = 1024;

export function ProjectsScreen() {
  const { width } = useWindowDimensions();
  const projects = useAdminProjects();
  const people = usePeople();
  const wide = width >= twoColumnsFrom;
  const list = projects.data ?? [];
  const columns = wide ? [list.filter((_, i) => i % 2 === 0), list.filter((_, i) => i % 2 === 1)] : [list];
  return (
    <AdminFrame title="People and projects" intro="Who is on each project (only members see its requests) and how long a request may wait at each desk before reminders go out.">
      <LoadState query={projects} what="The projects" testID="projects" />
      <LoadState query={people} what="The people" testID="projects-people" />
      {projects.data?.length === 0 ? <Notice tone="info" testID="projects-empty">There are no projects yet. Projects are set up with the contract; ask whoever installs Spanrelay to add the first one.</Notice> : null}
      {projects.data && people.data ? (
        <View style={wide ? styles.columns : styles.gap}>
          {columns.map((column, i) => (
            <View key={i} style={wide ? styles.column : styles.gap}>
              {column.map((p) => <ProjectPanel key={p.id} project={p} people={people.data} />)}
            </View>
          ))}
        </View>
      ) : null}
    </AdminFrame>
  );
}

const styles = StyleSheet.create({
  gap: { gap: space.lg },
  columns: { flexDirection: 'row', gap: space.lg, alignItems: 'flex-start' },
  column: { flex: 1, gap: space.lg },
});
