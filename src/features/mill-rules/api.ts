import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../lib/api-client';
import type { MillRules, MillRulesSaved, MillRulesView } from '../../../shared/mill-rules';

export const millRulesKeys = { all: ['mill-rules'] as const };

export const millRulesQuery = () =>
  queryOptions({ queryKey: millRulesKeys.all, queryFn: () => apiFetch<MillRulesView>('/api/office/mill-rules') });

export function useSaveMillRules() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: MillRules) => apiFetch<MillRulesSaved>('/api/office/mill-rules', { method: 'PUT', body: input }),
    onSuccess: async (saved) => {
      qc.setQueryData(millRulesKeys.all, saved);
      // Prices shown anywhere may have changed.
      await qc.invalidateQueries({ queryKey: ['slabs'] });
    },
  });
}
