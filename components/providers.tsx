'use client';

import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useState } from 'react';

// Only the online screens that fetch from the API use react-query (the office screens and the
// reference pages); the bench screens read the device's store. So the provider wraps those layouts,
// not the root, and the bench screens do not load react-query. One client per browser tab, as when it
// sat in the root layout: its cache survives moving between the reference pages and the office.
let browserClient: QueryClient | undefined;
const makeClient = () => new QueryClient({ defaultOptions: { queries: { staleTime: 30_000, retry: 1 } } });
const getClient = () => (typeof window === 'undefined' ? makeClient() : (browserClient ??= makeClient()));

export function QueryProvider({ children }: { children: React.ReactNode }) {
  const [client] = useState(getClient);
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
