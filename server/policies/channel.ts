import type { Channel } from '../models/index.ts';
import { hasRole, type Rule } from './utils.ts';

const desk = hasRole('admin', 'editor');
const deskOnRecord = ((user, channel) => desk(user) && !!channel) as Rule<Channel>;

/** Editors and admins build kiosk channels (slides, order, timing, screens); other roles do not see them. */
export const channelPolicy = {
  list: desk,
  create: desk,
  read: deskOnRecord,
  update: deskOnRecord,
  delete: deskOnRecord,
};
