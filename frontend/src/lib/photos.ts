import { crewApiPath } from './journal-keys';
import { uploadFile, type UploadProgress } from './upload';

/** The server's limit for one photo (journal contract: POST /photos, ≤ 8 MB). */
export const PHOTO_MAX_BYTES = 8 * 1024 * 1024;

/** What a crew member is told about photos before choosing one. */
export const PHOTO_RULES =
  'An image (JPEG, PNG, WebP…) up to 8 MB. Location tags and other data inside the file are removed when it is stored; only your crew can open it.';

/** Why a chosen file cannot be sent, checked before the upload (the server checks the bytes again), or null. */
export function photoProblem(file: File): string | null {
  if (!file.type.startsWith('image/')) return `${file.name} is not an image: choose a photo or a sonar screenshot.`;
  if (file.size > PHOTO_MAX_BYTES)
    return `${file.name} is ${(file.size / 1024 / 1024).toFixed(1)} MB; the limit is 8 MB. Send a smaller copy.`;
  return null;
}

/** POST /photos: an image (the server re-encodes it and strips its metadata, GPS included) → its id. */
export function uploadPhoto(crewId: string, file: File, onProgress?: (p: UploadProgress) => void) {
  return uploadFile<{ id: string }>(crewApiPath(crewId, '/photos'), file, { onProgress });
}

/** Where a crew member's browser loads a stored photo (the session cookie goes along; non-members get 404). */
export function photoUrl(crewId: string, photoId: string): string {
  return `/api${crewApiPath(crewId, `/photos/${encodeURIComponent(photoId)}`)}`;
}
