import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ChangePasswordInput } from '../../../../shared/schemas/auth';

export const useChangePassword = () =>
  useMutation({ mutationFn: (input: ChangePasswordInput) => api.post<void>('/api/auth/password', input) });
