import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';
import { csrfHeaderName } from '@/lib/csrf-middleware';
import { ApiProblem, expectData, problemFromResponse } from '@/lib/problem';
import { teamHeader } from '@/features/datasets/api/team-header';

type Dataset = components['schemas']['DatasetDto'];

export type CsvDelimiter = ',' | ';' | '\t' | '|';

export type UploadInput = {
  file: Blob;
  fileName: string;
  name: string;
  delimiter: CsvDelimiter;
  /** Called as the body is sent: bytes so far and in total. */
  onProgress?: (loaded: number, total: number) => void;
};

/** An upload refusal, with the API's finer `code` and the data rows (1-based) it names, if any. */
export class UploadProblem extends ApiProblem {
  readonly code: string | null;
  readonly rows: number[];

  constructor(base: ApiProblem, code: string | null, rows: number[]) {
    super({
      status: base.status,
      slug: base.slug,
      title: base.title,
      detail: base.detail,
      requestId: base.requestId,
      fieldErrors: base.fieldErrors,
      retryAfterSeconds: base.retryAfterSeconds,
    });
    this.name = 'UploadProblem';
    this.code = code;
    this.rows = rows;
  }
}

function readUploadProblem(xhr: XMLHttpRequest): UploadProblem {
  let body: unknown = null;
  try {
    body = JSON.parse(xhr.responseText);
  } catch {
    body = null;
  }
  const headers = new Headers();
  for (const name of ['x-request-id', 'retry-after']) {
    const value = xhr.getResponseHeader(name);
    if (value !== null) headers.set(name, value);
  }
  const base = problemFromResponse(body, new Response(null, { status: xhr.status, statusText: xhr.statusText, headers }));
  const record = typeof body === 'object' && body !== null ? (body as Record<string, unknown>) : {};
  const rows = Array.isArray(record.rows) ? record.rows.filter((row): row is number => typeof row === 'number') : [];
  return new UploadProblem(base, typeof record.code === 'string' ? record.code : null, rows);
}

/**
 * Uploads a CSV file as multipart form data. XMLHttpRequest rather than fetch, because only it reports
 * upload progress in every browser. The client's CSRF middleware does not see this request, so the token
 * is asked for here, the same way the middleware asks for it.
 */
export async function uploadDatasetCsv(teamId: string, input: UploadInput): Promise<Dataset> {
  const { csrfToken } = await expectData(apiClient.GET('/v1/session/csrf-token'));
  const query = new URLSearchParams({ name: input.name });
  if (input.delimiter !== ',') query.set('delimiter', input.delimiter);
  const form = new FormData();
  form.append('file', input.file, input.fileName);

  return new Promise<Dataset>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `${globalThis.location.origin}/v1/datasets/csv?${query.toString()}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader(csrfHeaderName, csrfToken);
    for (const [name, value] of Object.entries(teamHeader(teamId))) xhr.setRequestHeader(name, value);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) input.onProgress?.(event.loaded, event.total);
    };
    xhr.onload = () => {
      if (xhr.status === 201) {
        try {
          resolve(JSON.parse(xhr.responseText) as Dataset);
        } catch {
          reject(new ApiProblem({ status: xhr.status, slug: 'unexpected-answer', title: 'Unexpected answer', detail: 'The API answered without a dataset.' }));
        }
        return;
      }
      reject(readUploadProblem(xhr));
    };
    xhr.onerror = () => reject(new Error('The upload was interrupted. Check your connection and try again.'));
    xhr.onabort = () => reject(new Error('The upload was cancelled.'));
    xhr.send(form);
  });
}

export function useUploadDatasetCsv(teamId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UploadInput) => uploadDatasetCsv(teamId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['datasets', teamId, 'list'] }),
  });
}
