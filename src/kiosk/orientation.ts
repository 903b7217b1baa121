import { loadScreenOrientation } from './storage.ts';

type Orientation = 'landscape' | 'portrait';

const viewportShape = (): Orientation => (window.innerHeight > window.innerWidth ? 'portrait' : 'landscape');

/**
 * Landscape or portrait: the screen's own setting when an admin chose one (a paired player; the
 * staff preview follows its frame), else the viewport's shape (taller than wide is portrait).
 */
export function currentOrientation(): Orientation {
  const preview = document.documentElement.classList.contains('preview');
  const set = preview ? 'auto' : loadScreenOrientation();
  return set === 'auto' ? viewportShape() : set;
}

/**
 * Puts the layout class on the document (kiosk.css lays every slide kind out for both). A display
 * hung on its side whose computer still sends a landscape picture gets the slides turned a quarter
 * turn clockwise (`rotated`), so the admin's setting is enough and nobody has to rotate the desktop.
 */
export function applyOrientation(): void {
  const orientation = currentOrientation();
  const root = document.documentElement.classList;
  root.toggle('portrait', orientation === 'portrait');
  root.toggle('landscape', orientation === 'landscape');
  root.toggle('rotated', orientation !== viewportShape());
}
