import { useEffect, useState } from 'react';
import { Button } from './button.tsx';

/**
 * A small bar at the foot of the screen: what was just done, an Undo button, and the seconds left to
 * use it. The caller decides what happens when the time runs out.
 */
export function UndoToast({ message, until, onUndo }: { message: string; until: number; onUndo: () => void }) {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const tick = setInterval(() => setNow(Date.now()), 250);
    return () => clearInterval(tick);
  }, []);
  const left = Math.max(0, Math.ceil((until - now) / 1000));
  return (
    <div
      role="status"
      className="fixed inset-x-2 bottom-4 z-40 mx-auto flex max-w-md flex-wrap items-center gap-3 rounded-lg border border-rule bg-ink px-4 py-3 text-sm text-paper shadow-2xl"
    >
      <span className="min-w-0 flex-1 [overflow-wrap:anywhere]">{message}</span>
      <Button variant="secondary" onClick={onUndo}>
        Undo ({left} s)
      </Button>
    </div>
  );
}
