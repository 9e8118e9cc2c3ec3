import { PerUserLimit } from '../common/per-user-limit/per-user-limit';

/** Photo uploads per keeper per hour, over every route that takes one: a day's shoot of a collection fits, a flood does not. */
export const PHOTO_UPLOADS_PER_HOUR = 100;

export const PhotoUploadLimit = () => PerUserLimit({ what: 'photoUploads', limit: PHOTO_UPLOADS_PER_HOUR, windowMinutes: 60 });
