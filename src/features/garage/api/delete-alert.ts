import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { alertKeys } from './garage-keys';

export async function deleteAlert(id: string): Promise<void> {
  await api.delete(apiPaths.alerts.one(id));
}

export function useDeleteAlert() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteAlert,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alertKeys.all }),
  });
}
