import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { createAppQueryClient } from './app-query-client';

export interface AppProviderProps {
  children: ReactNode;
  /** For tests; the app makes its own. */
  queryClient?: QueryClient;
}

/** Everything the screens need from above: the server-state cache. */
export function AppProvider({ children, queryClient }: AppProviderProps) {
  const [client] = useState(() => queryClient ?? createAppQueryClient());
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
