import { useQuery } from '@tanstack/react-query';
import type { DemoInfo, DemoStatus } from '@upwell/common';
import { api } from './client';

/** The demo accounts when the server runs the demo seed, else null (asked via the status route so no 404 is logged). */
export function useDemoInfo() {
  return useQuery({
    queryKey: ['demo'],
    queryFn: async (): Promise<DemoInfo | null> => {
      const status = await api<DemoStatus>('/demo/status');
      return status.enabled ? api<DemoInfo>('/demo') : null;
    },
    staleTime: Infinity,
    retry: false,
  });
}
