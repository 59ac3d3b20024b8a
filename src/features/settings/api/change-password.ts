import { useMutation } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { authRoutes } from '../../../../shared/contract/auth';
import type { ChangePasswordInput } from '../../../../shared/schemas/auth';

export const useChangePassword = () =>
  useMutation({ mutationFn: (input: ChangePasswordInput) => call(authRoutes.changePassword, { body: input }) });
