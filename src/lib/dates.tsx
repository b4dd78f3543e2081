import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from './api-client';
import { DEFAULT_MILL_TIME_ZONE, formatDateTime, formatDay } from '../../shared/dates';

export const millClockQuery = () =>
  queryOptions({
    queryKey: ['mill-clock'] as const,
    queryFn: () => apiFetch<{ timeZone: string; today: string }>('/api/mill-clock'),
    staleTime: 60 * 60_000,
  });

/** Dates and times as the clock reads at the mill: "Thu 3 Dec 2026", "Thu 3 Dec 2026, 14:05". */
export function useMillDates() {
  const { data } = useQuery(millClockQuery());
  const tz = data?.timeZone ?? DEFAULT_MILL_TIME_ZONE;
  return { day: (v: Date | string) => formatDay(v, tz), dateTime: (v: Date | string) => formatDateTime(v, tz), timeZone: tz };
}

/** For JSX that cannot call the hook itself (table cells). */
export function MillDateTime({ at }: { at: string }) {
  return <>{useMillDates().dateTime(at)}</>;
}
