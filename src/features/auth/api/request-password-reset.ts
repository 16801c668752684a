import { useMutation } from '@tanstack/react-query';
import { z } from 'zod';
import type { passwordResetRequestSchema } from '../../../../shared/contracts/auth';
import { api } from '../../../lib/api-client';

const passwordResetAnswerSchema = z.object({ message: z.string() });

/** Asks for a reset link; the server gives the same answer whether or not the address is known. */
export function requestPasswordReset(request: z.output<typeof passwordResetRequestSchema>): Promise<string> {
  return api.post('/api/auth/password-reset', request, passwordResetAnswerSchema).then((answer) => answer.message);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
