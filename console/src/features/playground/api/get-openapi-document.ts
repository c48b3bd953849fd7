import { queryOptions, useQuery } from '@tanstack/react-query';

// The API's own OpenAPI document (served at /v1/openapi.json on this origin). The typed client has no
// route for it, since the document does not describe itself, so it is fetched directly.
export async function getOpenApiDocument(signal?: AbortSignal): Promise<unknown> {
  const response = await globalThis.fetch(`${globalThis.location?.origin ?? ''}/v1/openapi.json`, {
    signal,
    headers: { accept: 'application/json' },
  });
  if (!response.ok) throw new Error(`The API description could not be loaded (status ${response.status}).`);
  return response.json();
}

export function openApiDocumentQueryOptions() {
  return queryOptions({
    queryKey: ['openapi-document'],
    queryFn: ({ signal }) => getOpenApiDocument(signal),
    // The document changes only with a deployment.
    staleTime: Number.POSITIVE_INFINITY,
    gcTime: Number.POSITIVE_INFINITY,
  });
}

export function useOpenApiDocument() {
  return useQuery(openApiDocumentQueryOptions());
}
