import { useCallback, useEffect, useRef, useState } from 'react';

/**
 * A form opened by a button that is hidden while the form shows. When the form closes (cancelled
 * or done), focus goes back to the button, so a keyboard user carries on where they were instead
 * of at the top of the page.
 * @returns whether the form is open, open/close functions, and the ref for the opening button
 */
export function useFormOpener() {
  const [open, setOpen] = useState(false);
  const openerRef = useRef<HTMLButtonElement>(null);
  const returning = useRef(false);
  useEffect(() => {
    if (open || !returning.current) return;
    returning.current = false;
    openerRef.current?.focus();
  }, [open]);
  const show = useCallback(() => setOpen(true), []);
  const close = useCallback(() => {
    returning.current = true;
    setOpen(false);
  }, []);
  return { open, show, close, openerRef };
}
