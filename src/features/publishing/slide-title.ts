import type { SlideDto } from '@shared/schemas/channel.ts';

/**
 * The slide's name as the list shows it. An image slide is named by its title (the words shown on the
 * screen); without one, by the image's file name. Never by its alt text, which describes the picture
 * for people who cannot see it and reads badly as a name.
 */
export const slideTitle = (s: Pick<SlideDto, 'kind' | 'page' | 'caption' | 'media'>) =>
  s.kind === 'page'
    ? (s.page?.title ?? 'A page')
    : s.kind === 'image'
      ? s.caption || (s.media ? `Image without a title (${s.media.fileName})` : 'Image without a title')
      : 'The sky tonight';
