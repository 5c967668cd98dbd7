import { useMutation } from '@tanstack/react-query';
import type { PlanDestination } from '@shared/schemas/garage';
import { apiPaths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { planReply, type SourcingPlan } from './garage-schemas';

// A plan is computed on demand from live listings, so it is a POST the restorer starts, not a cached query.
export async function buildPlan({ vehicleId, destination }: { vehicleId: string; destination: PlanDestination }): Promise<SourcingPlan> {
  return api.post(apiPaths.garage.plan(vehicleId), { destination }, { schema: planReply });
}

export function useBuildPlan(vehicleId: string) {
  return useMutation({ mutationFn: (destination: PlanDestination) => buildPlan({ vehicleId, destination }) });
}
