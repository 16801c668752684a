import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import type { passwordResetCompleteSchema } from '../../../../shared/contracts/auth';
import { api } from '../../../lib/api-client';

type ResetPasswordInput = { token: string } & z.output<typeof passwordResetCompleteSchema>;

export function resetPassword({ token, password }: ResetPasswordInput): Promise<void> {
  return api.postWithoutResult(`/api/auth/password-reset/${encodeURIComponent(token)}`, { password });
}

export function useResetPassword() {
  return useMutation({ mutationFn: resetPassword });
}
