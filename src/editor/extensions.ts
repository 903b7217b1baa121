import { ReactNodeViewRenderer } from '@tiptap/react';
import type { Extensions } from '@tiptap/core';
import { pageExtensions } from '@shared/editor/extensions.ts';
import { EyeSafetyNotice } from '@shared/editor/nodes/eye-safety-notice.ts';
import { MediaImage } from '@shared/editor/nodes/media-image.ts';
import { StatementRef } from '@shared/editor/nodes/statement-ref.ts';
import { EyeSafetyView } from './node-views/eye-safety-view.tsx';
import { MediaImageView } from './node-views/media-image-view.tsx';
import { StatementRefView } from './node-views/statement-ref-view.tsx';
import { NumberFlags } from './number-flags.ts';

const OURS = new Set([StatementRef.name, EyeSafetyNotice.name, MediaImage.name]);

/** The shared page extensions with the client's node views, plus the live number check. */
export const clientExtensions: Extensions = [
  ...pageExtensions.filter((e) => !OURS.has(e.name)),
  StatementRef.extend({ addNodeView: () => ReactNodeViewRenderer(StatementRefView, { as: 'span' }) }),
  EyeSafetyNotice.extend({ addNodeView: () => ReactNodeViewRenderer(EyeSafetyView) }),
  MediaImage.extend({ addNodeView: () => ReactNodeViewRenderer(MediaImageView) }),
  NumberFlags,
];
