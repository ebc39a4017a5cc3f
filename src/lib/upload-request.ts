import type { z } from 'zod';
import { apiErrorFromText, ApiRequestError, forgetCsrfToken, getCsrfToken } from './api-client';

export type UploadProgress = { loaded: number; total: number };

export type UploadOptions<S extends z.ZodType> = {
  form: FormData;
  schema: S;
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
  /** PUT replaces a single thing (a template's guide image); POST is the default. */
  method?: 'POST' | 'PUT';
};

type RawAnswer = { status: number; text: string };

const abortError = () => new DOMException('The upload was cancelled', 'AbortError');

// fetch() cannot report upload progress; XMLHttpRequest's upload.onprogress can.
function sendForm(path: string, form: FormData, token: string, options: Pick<UploadOptions<z.ZodType>, 'onProgress' | 'signal' | 'method'>) {
  return new Promise<RawAnswer>((resolve, reject) => {
    if (options.signal?.aborted) {
      reject(abortError());
      return;
    }
    const xhr = new XMLHttpRequest();
    xhr.open(options.method ?? 'POST', `/api${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('accept', 'application/json');
    xhr.setRequestHeader('x-csrf-token', token);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) options.onProgress?.({ loaded: event.loaded, total: event.total });
    };
    xhr.onload = () => resolve({ status: xhr.status, text: xhr.responseText });
    xhr.onerror = () => resolve({ status: 0, text: '' });
    xhr.onabort = () => reject(abortError());
    const abort = () => xhr.abort();
    options.signal?.addEventListener('abort', abort, { once: true });
    xhr.onloadend = () => options.signal?.removeEventListener('abort', abort);
    xhr.send(form);
  });
}

// A multipart POST with a byte progress callback, carrying the session's CSRF token the same
// way apiRequest does (and retrying once with a fresh token when the session changed).
export async function uploadRequest<S extends z.ZodType>(path: string, options: UploadOptions<S>): Promise<z.output<S>> {
  let answer = await sendForm(path, options.form, await getCsrfToken(), options);
  if (answer.status === 403 && apiErrorFromText(403, answer.text).code === 'csrf.invalid') {
    forgetCsrfToken();
    answer = await sendForm(path, options.form, await getCsrfToken(), options);
  }
  if (answer.status < 200 || answer.status >= 300) throw apiErrorFromText(answer.status, answer.text);
  let json: unknown;
  try {
    json = JSON.parse(answer.text);
  } catch {
    json = undefined;
  }
  const parsed = options.schema.safeParse(json);
  if (!parsed.success) {
    throw new ApiRequestError({
      status: answer.status,
      code: 'response.invalid',
      message: 'The server answered in a way this page does not understand. Reload the page and try again.',
    });
  }
  return parsed.data;
}
