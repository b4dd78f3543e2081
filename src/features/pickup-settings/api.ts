import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../lib/api-client';
import type { PickupSettings, PickupWindowView } from '../../../shared/pickups';

export type PickupSettingsView = { yardAddress: string; windows: PickupWindowView[]; closedDays: { day: string; note: string }[] };

export const pickupSettingsKeys = { all: ['pickup-settings'] as const };

export const pickupSettingsQuery = () =>
  queryOptions({ queryKey: pickupSettingsKeys.all, queryFn: () => apiFetch<PickupSettingsView>('/api/pickup-settings') });

export function useSavePickupSettings() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: PickupSettings) => apiFetch<PickupSettingsView>('/api/pickup-settings', { method: 'PUT', body: input }),
    onSuccess: (saved) => {
      qc.setQueryData(pickupSettingsKeys.all, saved);
      return qc.invalidateQueries({ queryKey: ['checkout'] });
    },
  });
}
