import type { KeyboardEvent, MouseEvent } from 'react';
import type { FocalPoint } from '@shared/media/schemas.ts';

const clamp = (v: number) => Math.min(1, Math.max(0, Math.round(v * 100) / 100));

/**
 * Click the image (or use the arrow keys) to mark its subject; kiosk crops keep that point in view.
 * The dashed box shows the 16:9 area a kiosk screen keeps.
 */
export function FocalPointPicker({
  src,
  alt,
  width,
  height,
  value,
  onChange,
}: {
  src: string;
  alt: string;
  width: number;
  height: number;
  value: FocalPoint;
  onChange: (point: FocalPoint) => void;
}) {
  const onClick = (e: MouseEvent<HTMLDivElement>) => {
    const box = e.currentTarget.getBoundingClientRect();
    onChange({ x: clamp((e.clientX - box.left) / box.width), y: clamp((e.clientY - box.top) / box.height) });
  };
  const onKey = (e: KeyboardEvent<HTMLDivElement>) => {
    const step = e.shiftKey ? 0.1 : 0.02;
    const moves: Record<string, [number, number]> = {
      ArrowLeft: [-step, 0],
      ArrowRight: [step, 0],
      ArrowUp: [0, -step],
      ArrowDown: [0, step],
    };
    const move = moves[e.key];
    if (!move) return;
    e.preventDefault();
    onChange({ x: clamp(value.x + move[0]), y: clamp(value.y + move[1]) });
  };
  // The kiosk's 16:9 window, as fractions of this image, centred on the point as far as the edges allow.
  const wide = width / height > 16 / 9;
  const w = wide ? (height * 16) / 9 / width : 1;
  const h = wide ? 1 : (width * 9) / 16 / height;
  const left = Math.min(1 - w, Math.max(0, value.x - w / 2));
  const top = Math.min(1 - h, Math.max(0, value.y - h / 2));
  return (
    <div>
      <p id="focal-help" className="mb-1 text-sm font-medium text-ink">
        Focal point
      </p>
      <div
        role="slider"
        tabIndex={0}
        aria-label="Focal point"
        aria-describedby="focal-help-text"
        // A slider needs one number: the across position; the text names both.
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={Math.round(value.x * 100)}
        aria-valuetext={`${Math.round(value.x * 100)}% across, ${Math.round(value.y * 100)}% down`}
        onClick={onClick}
        onKeyDown={onKey}
        className="relative cursor-crosshair overflow-hidden rounded-md border border-rule bg-black"
        style={{ aspectRatio: `${width} / ${height}` }}
      >
        <img src={src} alt={alt} className="absolute inset-0 h-full w-full" draggable={false} />
        <div
          className="pointer-events-none absolute border-2 border-dashed border-white/80"
          style={{ left: `${left * 100}%`, top: `${top * 100}%`, width: `${w * 100}%`, height: `${h * 100}%` }}
        />
        <div
          className="pointer-events-none absolute size-5 -translate-x-1/2 -translate-y-1/2 rounded-full border-2 border-white shadow-[0_0_0_2px_rgba(0,0,0,0.6)]"
          style={{ left: `${value.x * 100}%`, top: `${value.y * 100}%` }}
        />
      </div>
      <p id="focal-help-text" className="mt-1 text-xs text-muted">
        Click the subject, or use the arrow keys. The dashed box is what a kiosk screen shows.
      </p>
    </div>
  );
}
