/** Uploading an image to the library, with progress. */
import type { MediaDto } from '@shared/media/schemas.ts';
import type { ApiError } from '@shared/schemas/common.ts';
import { ApiRequestError, errorFromAnswer } from '@/lib/api-client.ts';

/**
 * Uploads one image as multipart form data with XMLHttpRequest, because fetch cannot report
 * upload progress. Errors arrive as ApiRequestError, like every other API call.
 * @param file the image
 * @param onProgress called with the fraction sent, from 0 to 1
 * @param signal aborts the upload
 */
export function uploadMedia(file: File, onProgress: (fraction: number) => void, signal?: AbortSignal): Promise<MediaDto> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', '/api/media');
    xhr.responseType = 'json';
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => {
      const body = xhr.response as ({ data?: MediaDto } & Partial<ApiError>) | null;
      if (xhr.status >= 200 && xhr.status < 300 && body?.data) {
        onProgress(1);
        resolve(body.data);
        return;
      }
      reject(errorFromAnswer(xhr.status, body));
    };
    xhr.onerror = () =>
      reject(new ApiRequestError(0, 'network_error', 'The upload was interrupted. Check the connection and try again.'));
    xhr.onabort = () => reject(new ApiRequestError(0, 'aborted', 'Upload cancelled.'));
    signal?.addEventListener('abort', () => xhr.abort());
    const form = new FormData();
    form.append('file', file, file.name);
    xhr.send(form);
  });
}
