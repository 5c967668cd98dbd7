import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { statementSchema, type Statement } from '@shared/schemas/orders';
import { env } from '@/config/env';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerOrderKeys } from './seller-order-keys';

const reply = z.object({ statement: statementSchema });

export async function getStatement(month: string, signal?: AbortSignal): Promise<Statement> {
  return (await api.get(apiPaths.sellerOrders.statement(month), { signal, schema: reply })).statement;
}

export function statementQueryOptions(month: string) {
  return queryOptions({
    queryKey: sellerOrderKeys.statement(month),
    queryFn: ({ signal }) => getStatement(month, signal),
    staleTime: 30_000,
    placeholderData: keepPreviousData,
  });
}

export function useStatement(month: string) {
  return useQuery(statementQueryOptions(month));
}

/** The CSV download's address (same origin; the session cookie goes with it). */
export function statementCsvHref(month: string): string {
  return `${env.VITE_API_BASE_URL}${apiPaths.sellerOrders.statement(month, 'csv')}`;
}
