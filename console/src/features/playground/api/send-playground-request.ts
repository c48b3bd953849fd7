import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { problemFromResponse, type ApiProblem } from '@/lib/problem';
import type { EndpointId } from '@/features/playground/model/endpoints';
import { authHeaders, type PlaygroundAuth } from '@/features/playground/api/playground-auth';
import type { ResultPayload } from '@/features/playground/api/result-payload';

type Schemas = components['schemas'];

export type PlaygroundAnswer =
  | { ok: true; status: number; durationMs: number; payload: ResultPayload; raw: unknown }
  | { ok: false; status: number; durationMs: number; problem: ApiProblem; raw: unknown };

// The editor holds whatever the person typed; the API validates it, so the body is passed on as given
// and typed only to satisfy the client.
function post(endpoint: EndpointId, body: unknown, headers: Record<string, string>) {
  switch (endpoint) {
    case 'fits':
      return apiClient.POST('/v1/fits', { body: body as Schemas['CreateFitDto'], headers });
    case 'form-comparisons':
      return apiClient.POST('/v1/form-comparisons', { body: body as Schemas['CompareFormsDto'], headers });
    case 'predictions':
      return apiClient.POST('/v1/predictions', { body: body as Schemas['CreatePredictionDto'], headers });
    case 'batch-fits':
      return apiClient.POST('/v1/batch-fits', { body: body as Schemas['CreateBatchFitDto'], headers });
    case 'rolling-fits':
      return apiClient.POST('/v1/rolling-fits', { body: body as Schemas['CreateRollingFitDto'], headers });
  }
}

/** Sends one playground request; a refusal comes back as an answer (with its status), not a throw. */
export async function sendPlaygroundRequest(endpoint: EndpointId, body: unknown, auth: PlaygroundAuth): Promise<PlaygroundAnswer> {
  const started = performance.now();
  const { data, error, response } = await post(endpoint, body, authHeaders(auth));
  const durationMs = performance.now() - started;
  if (response.ok && data !== undefined) {
    return { ok: true, status: response.status, durationMs, payload: data as ResultPayload, raw: data };
  }
  return { ok: false, status: response.status, durationMs, problem: problemFromResponse(error, response), raw: error ?? null };
}
