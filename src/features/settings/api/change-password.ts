import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const changePassword = (input: { currentPassword: string; newPassword: string }) =>
  api.post<void>('/api/session/password', input);

export const useChangePassword = () => useMutation({ mutationFn: changePassword });
