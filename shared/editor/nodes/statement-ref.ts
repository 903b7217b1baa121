import { Node } from '@tiptap/core';

/**
 * A checked statement in the page text. Only its id is stored: the wording is always looked up
 * (the current text in the editor, the signed-off text when published), so nobody can type over it.
 */
export const StatementRef = Node.create({
  name: 'statementRef',
  group: 'inline',
  inline: true,
  atom: true,
  selectable: true,
  draggable: false,

  addAttributes() {
    return {
      statementId: {
        default: null,
        parseHTML: (element) => element.getAttribute('data-statement-id'),
        renderHTML: (attributes) => ({ 'data-statement-id': attributes.statementId as string }),
      },
    };
  },

  parseHTML() {
    return [{ tag: 'span[data-statement-id]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['span', { ...HTMLAttributes, class: 'statement-ref' }];
  },
});
