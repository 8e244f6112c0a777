import { queryOptions } from '@tanstack/react-query';
import { client, unwrap } from '../api/client';
import type { ReferenceData, ReferenceRow } from '../api/types';
import { referenceDataKeys } from '../api/query-keys';

/**
 * Handbook tables (coverings, air leakage, curtains, fuels …) are shared read-only data that
 * several features pick from, so their query lives here rather than in one feature.
 */
export const referenceDataQueryOptions = () =>
  queryOptions({
    queryKey: referenceDataKeys.all,
    queryFn: ({ signal }) => unwrap(client.GET('/api/reference-data', { signal })),
    staleTime: Infinity,
  });

export function referenceRows(data: ReferenceData | undefined, table: string): ReferenceRow[] {
  return data?.[table]?.rows ?? [];
}

export function referenceLabel(data: ReferenceData | undefined, table: string, id: string | null | undefined): string {
  if (!id) return '—';
  return referenceRows(data, table).find((row) => row.id === id)?.label ?? id;
}
