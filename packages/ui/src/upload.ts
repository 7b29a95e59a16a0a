import { ApiError, apiErrorFrom, parseAnswer, type Parser } from './api-client.ts';

/**
 * A multipart upload with progress. XMLHttpRequest rather than fetch: only it reports how much
 * of the body has gone, which matters for a phone photo on a slow connection.
 */
export function apiUpload<T>(
  path: string,
  form: FormData,
  schema: Parser<T>,
  onProgress?: (fraction: number) => void,
): Promise<T> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', path);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress?.(event.loaded / event.total);
    };
    xhr.onerror = () =>
      reject(new ApiError('NETWORK', 'Vatside’s server did not answer. Check the connection.', 0));
    xhr.onload = () => {
      let body: unknown;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        body = undefined;
      }
      try {
        if (xhr.status < 200 || xhr.status >= 300) throw apiErrorFrom(xhr.status, body);
        resolve(parseAnswer(body, xhr.status, schema));
      } catch (error) {
        reject(error instanceof Error ? error : new Error(String(error)));
      }
    };
    xhr.send(form);
  });
}
