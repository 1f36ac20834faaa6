import type { PhotoUploadResult, PhotoView } from '@shared/types/listings';
import { errorFromResponse, NetworkError, type ApiError } from './errors';
import { CSRF_HEADER, http, request } from './http';

type PhotosAnswer = Promise<{ photos: PhotoView[] }>;
const base = (listingId: number) => `/api/listings/${listingId}/photos`;

/** A listing's photos in the seller's order. */
export function listPhotos(listingId: number): PhotosAnswer {
  return http.get(base(listingId));
}

/** Make this photo the one shown first and on result cards. */
export function chooseCover(listingId: number, photoId: number): PhotosAnswer {
  return http.post(`${base(listingId)}/${photoId}/cover`);
}

export function deletePhoto(listingId: number, photoId: number): PhotosAnswer {
  return http.delete(`${base(listingId)}/${photoId}`);
}

/** Every photo of the listing, once each, in the new order. */
export function reorderPhotos(listingId: number, photoIds: number[]): PhotosAnswer {
  return request('PUT', `${base(listingId)}/order`, { body: { photoIds } });
}

/** What one upload reports while it runs. */
export interface UploadCallbacks {
  /** Share of the file sent so far, 0 to 1. */
  onProgress?: (fraction: number) => void;
}

/** A running upload: its outcome, and a way to stop it. */
export interface UploadHandle {
  done: Promise<PhotoUploadResult>;
  abort(): void;
}

function parseJson(text: string): unknown {
  try {
    return text ? (JSON.parse(text) as unknown) : undefined;
  } catch {
    return undefined;
  }
}

function failure(xhr: XMLHttpRequest): ApiError {
  const headers = new Headers();
  const retryAfter = xhr.getResponseHeader('Retry-After');
  if (retryAfter) headers.set('Retry-After', retryAfter);
  return errorFromResponse(xhr.status, headers, parseJson(xhr.responseText));
}

/**
 * Send one photo as the multipart field `photo`. An XMLHttpRequest rather than `fetch`, because only it reports
 * upload progress; the answer and its errors take the same shapes as every other call.
 */
export function uploadPhoto(
  listingId: number,
  file: Blob,
  csrfToken: string | null,
  callbacks: UploadCallbacks = {},
): UploadHandle {
  const xhr = new XMLHttpRequest();
  const done = new Promise<PhotoUploadResult>((resolve, reject) => {
    xhr.open('POST', base(listingId));
    xhr.setRequestHeader('Accept', 'application/json');
    if (csrfToken) xhr.setRequestHeader(CSRF_HEADER, csrfToken);
    xhr.upload.addEventListener('progress', (event) => {
      if (event.lengthComputable && event.total > 0) callbacks.onProgress?.(event.loaded / event.total);
    });
    xhr.addEventListener('load', () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        callbacks.onProgress?.(1);
        resolve(parseJson(xhr.responseText) as PhotoUploadResult);
      } else reject(failure(xhr));
    });
    xhr.addEventListener('error', () => reject(new NetworkError()));
    xhr.addEventListener('abort', () => reject(new DOMException('Upload stopped', 'AbortError')));
    const form = new FormData();
    form.append('photo', file);
    xhr.send(form);
  });
  return { done, abort: () => xhr.abort() };
}
