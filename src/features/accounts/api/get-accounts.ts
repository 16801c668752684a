import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { operatorAccountSchema, type OperatorAccount } from '../../../../shared/contracts/operator';
import { api } from '../../../lib/api-client';
import { accountsKeys } from './accounts-keys';

const accountListSchema = z.array(operatorAccountSchema);

/** Every account on the instance with its status and labs (the instance operator only). */
export function getAccounts(): Promise<OperatorAccount[]> {
  return api.get('/api/operator/accounts', accountListSchema);
}

export const accountsQueryOptions = () =>
  queryOptions({
    queryKey: accountsKeys.list(),
    queryFn: getAccounts,
  });

export function useAccounts(): OperatorAccount[] {
  return useSuspenseQuery(accountsQueryOptions()).data;
}
