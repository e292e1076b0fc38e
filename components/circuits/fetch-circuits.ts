import { requestJson } from '@/components/api/request-json';

// Types only: the shapes come from the server modules, so client and route cannot drift apart.
import type { CircuitListItem, CircuitPage } from '@/lib/circuits/list-circuits';
import type { ListCircuitsQuery } from '@/lib/circuits/schemas';

export type CircuitSortKey = ListCircuitsQuery['sort'];
export type SortDirection = ListCircuitsQuery['dir'];
export type CircuitListQuery = ListCircuitsQuery;
export type CircuitSummary = CircuitListItem;
export type CircuitListPage = CircuitPage;

export function circuitListKey(query: CircuitListQuery) {
  return ['circuits', 'list', query] as const;
}

export function fetchCircuits(query: CircuitListQuery, signal?: AbortSignal): Promise<CircuitListPage> {
  const params = new URLSearchParams({
    sort: query.sort,
    dir: query.dir,
    page: String(query.page),
    pageSize: String(query.pageSize),
  });
  return requestJson<CircuitListPage>(`/api/circuits?${params.toString()}`, signal);
}
