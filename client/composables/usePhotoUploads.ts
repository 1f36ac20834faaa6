import { reactive, type Ref } from 'vue';
import { PHOTO_LIMITS, PHOTO_MESSAGES } from '@shared/listings/photo-limits';
import type { PhotoView } from '@shared/types/listings';
import { isApiError, toApiError } from '@/api/errors';
import { uploadPhoto } from '@/api/photos';
import { useAuthStore } from '@/stores/auth';

/** One chosen file on its way to the listing. */
export interface PhotoUpload {
  key: number;
  file: File;
  /** Share sent, 0 to 1. */
  progress: number;
  state: 'waiting' | 'sending' | 'failed';
  error: string;
}

/**
 * Sends chosen photos one at a time, each as its own request, with its progress; a refused file keeps its own
 * message (the server's words) and a retry button, and the others carry on. The listing's photos are replaced
 * by the server's list after every upload.
 */
export function usePhotoUploads(listingId: Ref<number | null>, photos: Ref<PhotoView[]>) {
  const auth = useAuthStore();
  const uploads = reactive<PhotoUpload[]>([]);
  let nextKey = 1;
  let running = false;

  const pending = () => uploads.filter((u) => u.state !== 'failed').length;

  async function send(upload: PhotoUpload, retried = false): Promise<void> {
    upload.state = 'sending';
    upload.progress = 0;
    upload.error = '';
    try {
      const handle = uploadPhoto(listingId.value!, upload.file, auth.csrfToken, {
        onProgress: (fraction) => {
          upload.progress = fraction;
        },
      });
      const result = await handle.done;
      photos.value = result.photos;
      uploads.splice(uploads.indexOf(upload), 1);
    } catch (caught) {
      if (!retried && isApiError(caught, 'csrf_invalid')) {
        await auth.load(true).catch(() => undefined);
        return send(upload, true);
      }
      upload.state = 'failed';
      upload.error = toApiError(caught).message;
    }
  }

  async function drain(): Promise<void> {
    if (running) return;
    running = true;
    try {
      for (
        let next = uploads.find((u) => u.state === 'waiting');
        next;
        next = uploads.find((u) => u.state === 'waiting')
      )
        await send(next);
    } finally {
      running = false;
    }
  }

  /** Queue chosen files; those over the size or count limit are refused here with the server's own words. */
  function add(files: Iterable<File>): void {
    for (const file of files) {
      const upload: PhotoUpload = { key: nextKey++, file, progress: 0, state: 'waiting', error: '' };
      if (file.size > PHOTO_LIMITS.maxBytes) Object.assign(upload, { state: 'failed', error: PHOTO_MESSAGES.tooLarge });
      else if (photos.value.length + pending() >= PHOTO_LIMITS.perListing)
        Object.assign(upload, { state: 'failed', error: PHOTO_MESSAGES.limit });
      uploads.push(upload);
    }
    void drain();
  }

  /** Try a failed file again. */
  function retry(key: number): void {
    const upload = uploads.find((u) => u.key === key);
    if (!upload || upload.state !== 'failed') return;
    upload.state = 'waiting';
    upload.error = '';
    void drain();
  }

  /** Forget a failed file. */
  function dismiss(key: number): void {
    const index = uploads.findIndex((u) => u.key === key && u.state === 'failed');
    if (index >= 0) uploads.splice(index, 1);
  }

  return { uploads, add, retry, dismiss };
}
