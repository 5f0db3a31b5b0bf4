import { useRouter } from 'expo-router';
import { ActivityIndicator } from 'react-native';
import { ApiError } from '../api/http';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { useFileRequest, useMyProjects } from './api';
import { RequestFilingForm } from './RequestFilingForm';

export function NewRequestScreen() {
  const router = useRouter();
  const projects = useMyProjects();
  const filing = useFileRequest();
  const failure = filing.error instanceof ApiError ? filing.error : null;

  return (
    <Screen>
      <Text variant="title">New request</Text>
      <Text variant="muted">A departure from the sealed plans needs approval before the work is done. It goes first to the section engineer.</Text>
      {failure ? <Notice tone="error">{failure.message}</Notice> : null}
      {projects.isPending ? <ActivityIndicator /> : null}
      {projects.error ? <Notice tone="error">{projects.error.message}</Notice> : null}
      {projects.data && projects.data.length === 0 ? <Notice tone="info">You are not a member of any project yet; ask your administrator.</Notice> : null}
      {projects.data && projects.data.length > 0 ? (
        <RequestFilingForm
          projects={projects.data}
          busy={filing.isPending}
          serverFieldErrors={failure?.fields}
          onSubmit={(fields, files) =>
            filing.mutate({ fields, files }, { onSuccess: (filed) => router.replace(`/requests/${filed.id}`) })
          }
        />
      ) : null}
    </Screen>
  );
}
