import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { sellerApplicationSchema, type SellerApplication, type SellerApplicationInput } from '@shared/schemas/auth';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { sellerApplicationKeys } from './get-my-seller-application';

const createReply = z.object({ application: sellerApplicationSchema });

export async function createSellerApplication(input: SellerApplicationInput): Promise<SellerApplication> {
  const reply = await api.post(apiPaths.sellerApplications.create, input, { schema: createReply });
  return reply.application;
}

export function useCreateSellerApplication() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSellerApplication,
    onSuccess: (application) => {
      queryClient.setQueryData(sellerApplicationKeys.mine(), application);
      return queryClient.invalidateQueries({ queryKey: sellerApplicationKeys.all });
    },
  });
}
