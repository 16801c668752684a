import { useMutation, useQueryClient } from '@tanstack/react-query';
import { operatorAccountSchema, type OperatorAccount } from '../../../../shared/contracts/operator';
import { api } from '../../../lib/api-client';
import { accountsQueryOptions } from './get-accounts';

type SetAccountEnabledInput = { userId: number; enabled: boolean };

/** Disables an account everywhere (its sessions end) or enables it again. */
export function setAccountEnabled({ userId, enabled }: SetAccountEnabledInput): Promise<OperatorAccount> {
  return api.post(`/api/operator/accounts/${userId}/${enabled ? 'enable' : 'disable'}`, {}, operatorAccountSchema);
}

/** Settles only once the account list has been read again. */
export function useSetAccountEnabled() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setAccountEnabled,
    onSettled: () => queryClient.invalidateQueries({ queryKey: accountsQueryOptions().queryKey }),
  });
}
