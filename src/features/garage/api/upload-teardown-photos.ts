import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiErrorBodySchema } from '@shared/errors';
import { apiPaths } from '@/config/paths';
import { env } from '@/config/env';
import { ApiError } from '@/lib/api-client';
import { garageKeys } from './garage-keys';
import { photosReply, type TeardownPhoto } from './garage-schemas';

/**
 * Multipart upload (field 'photos'). The shared api-client speaks JSON only, so this one call uses fetch
 * itself and turns a refusal into the same ApiError.
 */
export async function uploadTeardownPhotos({ vehicleId, bomLineId, files }: { vehicleId: string; bomLineId: string; files: File[] }): Promise<TeardownPhoto[]> {
  const form = new FormData();
  for (const f of files) form.append('photos', f);
  let response: Response;
  try {
    response = await fetch(`${env.VITE_API_BASE_URL}${apiPaths.garage.teardownPhotos(vehicleId, bomLineId)}`, {
      method: 'POST',
      body: form,
      credentials: 'same-origin',
      headers: { Accept: 'application/json' },
    });
  } catch {
    throw new ApiError({ status: 0, code: 'network_error', message: 'Could not reach Drabyard. Check your connection and try again.' });
  }
  const body: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const parsed = apiErrorBodySchema.safeParse(body);
    if (parsed.success) throw new ApiError({ status: response.status, ...parsed.data.error });
    throw new ApiError({ status: response.status, code: 'http_error', message: `The photos were not accepted (${response.status}).` });
  }
  const checked = photosReply.safeParse(body);
  if (!checked.success) throw new ApiError({ status: response.status, code: 'invalid_response', message: 'The server sent a reply we did not expect.' });
  return checked.data.photos;
}

export function useUploadTeardownPhotos(vehicleId: string, assemblyId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (vars: { bomLineId: string; files: File[] }) => uploadTeardownPhotos({ vehicleId, ...vars }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: garageKeys.checklist(vehicleId, assemblyId) }),
  });
}
