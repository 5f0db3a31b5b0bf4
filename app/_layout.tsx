// Root: fonts before first paint (the sign-in check runs meanwhile), the query client, and the route tree. No access rules here:
// the signed-in group's own layout guards its screens.
import { useState } from 'react';
import { Slot } from 'expo-router';
import { useFonts } from 'expo-font';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { WorkSans_400Regular } from '@expo-google-fonts/work-sans/400Regular';
import { WorkSans_500Medium } from '@expo-google-fonts/work-sans/500Medium';
import { WorkSans_600SemiBold } from '@expo-google-fonts/work-sans/600SemiBold';
import { ApiError } from '../features/api/http';
import { actorQuery } from '../features/auth/useActor';

export default function RootLayout() {
  const [fontsLoaded, fontError] = useFonts({ WorkSans_400Regular, WorkSans_500Medium, WorkSans_600SemiBold });
  const [queryClient] = useState(() => {
    const client = new QueryClient({
      defaultOptions: {
        queries: {
          // A 4xx will not change on retry; a dropped connection might.
          retry: (count, err) => count < 2 && !(err instanceof ApiError && err.status >= 400 && err.status < 500),
        },
      },
    });
    // Who is signed in is asked while the fonts load, not after: every first screen waits on it.
    void client.prefetchQuery(actorQuery);
    return client;
  });
  if (!fontsLoaded && !fontError) return null;
  return (
    <QueryClientProvider client={queryClient}>
      <Slot />
    </QueryClientProvider>
  );
}
