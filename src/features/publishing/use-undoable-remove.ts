import { useCallback, useEffect, useRef, useState } from 'react';

/** How long the Undo button stays: long enough to notice a slip, short enough that nobody waits on it. */
export const UNDO_SECONDS = 6;

/**
 * Removing with a few seconds to undo. Nothing is sent until the time runs out (so a kiosk never shows
 * a slide vanish and come back); meanwhile the item is only hidden on this screen. Removing another
 * item, or leaving the screen, sends the waiting one at once. Closing the tab inside the window keeps the
 * item: nothing is removed that the person could still have undone.
 * @param send removes for good (the server call)
 */
export function useUndoableRemove(send: (id: string) => void) {
  const [waiting, setWaiting] = useState<{ id: string; label: string; until: number } | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const current = useRef(waiting);
  current.current = waiting;
  const sendRef = useRef(send);
  sendRef.current = send;

  const flush = useCallback(() => {
    clearTimeout(timer.current);
    if (current.current) sendRef.current(current.current.id);
    current.current = null;
    setWaiting(null);
  }, []);

  const remove = useCallback(
    (id: string, label: string) => {
      flush();
      const next = { id, label, until: Date.now() + UNDO_SECONDS * 1000 };
      current.current = next;
      setWaiting(next);
      timer.current = setTimeout(flush, UNDO_SECONDS * 1000);
    },
    [flush],
  );

  const undo = useCallback(() => {
    clearTimeout(timer.current);
    current.current = null;
    setWaiting(null);
  }, []);

  useEffect(() => flush, [flush]);
  return { waiting, remove, undo };
}
