import type { Media } from '../models/index.ts';
import { anyStaff, hasRole, type Rule } from './utils.ts';

const isEditorOrAdmin = hasRole('editor', 'admin');

/**
 * Every signed-in role may browse, upload and describe images (credits and alt text are everyone's
 * job). Deleting an unused image is for whoever uploaded it, and for editors and admins, who look
 * after the whole library. Whether it is unused is checked by the delete itself (409). Once an
 * image is live (a published page, a kiosk channel), its credit, alt text, licence, source and crop
 * are the public's: only editors and admins change them (checked by updateMedia, 403).
 */
export const mediaPolicy = {
  list: anyStaff,
  upload: anyStaff,
  read: ((user, media) => anyStaff(user) && !!media) as Rule<Media>,
  update: ((user, media) => anyStaff(user) && !!media) as Rule<Media>,
  /** What the public sees of an image live on a published page or a kiosk channel is changed by editors only. */
  editLive: ((user, media) => !!media && isEditorOrAdmin(user)) as Rule<Media>,
  delete: ((user, media) => !!media && (isEditorOrAdmin(user) || media.uploadedById === user.id)) as Rule<Media>,
};
