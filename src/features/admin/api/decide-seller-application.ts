import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { sellerApplicationDecisionInput, sellerApplicationSchema, type SellerApplication } from '@shared/schemas/auth';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { adminSellerApplicationKeys } from './get-seller-applications';

export type SellerApplicationDecision = z.infer<typeof sellerApplicationDecisionInput>;

const decisionReply = z.object({ application: sellerApplicationSchema });

export async function decideSellerApplication(input: { id: string } & SellerApplicationDecision): Promise<SellerApplication> {
  const { id, ...decision } = input;
  const reply = await api.post(apiPaths.admin.sellerApplicationDecision(id), decision, { schema: decisionReply });
  return reply.application;
}

export function useDecideSellerApplication() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: decideSellerApplication,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminSellerApplicationKeys.all }),
  });
}
