import { Node } from '@tiptap/core';

/**
 * An image from the media library. Only its id and an optional caption are stored: the file,
 * alt text, credit and licence come from the library, so a corrected credit shows everywhere.
 */
export const MediaImage = Node.create({
  name: 'mediaImage',
  group: 'block',
  atom: true,
  selectable: true,
  draggable: true,

  addAttributes() {
    return {
      mediaId: {
        default: null,
        parseHTML: (element) => element.getAttribute('data-media-id'),
        renderHTML: (attributes) => ({ 'data-media-id': attributes.mediaId as string }),
      },
      caption: {
        default: null,
        parseHTML: (element) => element.querySelector('figcaption')?.textContent ?? null,
        renderHTML: () => ({}),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'figure[data-media-id]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['figure', HTMLAttributes];
  },
});
