import { Node } from '@tiptap/core';

/**
 * The eye-safety notice pages about the Sun, eclipses and solar observing must carry. It has no
 * content of its own: the wording is the organisation's, set by an admin, and shown wherever the
 * block sits.
 */
export const EyeSafetyNotice = Node.create({
  name: 'eyeSafetyNotice',
  group: 'block',
  atom: true,
  selectable: true,
  draggable: true,

  parseHTML() {
    return [{ tag: 'aside[data-eye-safety-notice]' }];
  },

  renderHTML() {
    return ['aside', { 'data-eye-safety-notice': '', class: 'eye-safety-notice', role: 'note' }];
  },
});
