import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { createAlertInput } from '@shared/schemas/garage';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { alertKeys } from './garage-keys';
import { alertReply, type WantedAlert } from './garage-schemas';

export type CreateAlertBody = z.input<typeof createAlertInput>;

export async function createAlert(input: CreateAlertBody): Promise<WantedAlert> {
  const reply = await api.post(apiPaths.alerts.list, input, { schema: alertReply });
  return reply.alert;
}

export function useCreateAlert() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createAlert,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: alertKeys.all }),
  });
}
