import { useEffect, useId, useRef, useState } from 'react';
import { Button } from './button.tsx';

/**
 * A modal that asks for a reason before a step that needs one (retire, decline). An empty reason
 * is refused in words; Escape or Cancel closes it without doing anything.
 */
export function ReasonDialog({
  title,
  label,
  confirm,
  busy = false,
  onConfirm,
  onCancel,
}: {
  title: string;
  label: string;
  confirm: string;
  busy?: boolean;
  onConfirm: (reason: string) => void;
  onCancel: () => void;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const [reason, setReason] = useState('');
  const [missing, setMissing] = useState(false);
  const id = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
  }, []);
  return (
    <dialog
      ref={ref}
      aria-labelledby={`${id}-title`}
      onCancel={(e) => {
        e.preventDefault();
        onCancel();
      }}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-lg border border-rule bg-panel p-5 text-ink shadow-2xl backdrop:bg-black/50"
    >
      <form
        method="dialog"
        className="space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          if (!reason.trim()) return setMissing(true);
          onConfirm(reason.trim());
        }}
      >
        <h2 id={`${id}-title`} className="text-lg font-semibold">
          {title}
        </h2>
        <label htmlFor={`${id}-reason`} className="block text-sm font-medium">
          {label}
        </label>
        <textarea
          id={`${id}-reason`}
          rows={3}
          value={reason}
          aria-invalid={missing || undefined}
          aria-describedby={missing ? `${id}-error` : undefined}
          onChange={(e) => {
            setReason(e.target.value);
            if (e.target.value.trim()) setMissing(false);
          }}
          className={`block w-full rounded-md border bg-panel px-3 py-2 text-sm ${missing ? 'border-broken' : 'border-rule'}`}
        />
        {missing && (
          <p id={`${id}-error`} className="text-xs font-medium text-broken">
            Give a reason: it is kept with the history.
          </p>
        )}
        <div className="flex flex-wrap justify-end gap-2">
          <Button type="button" variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
          <Button type="submit" variant="danger" busy={busy}>
            {confirm}
          </Button>
        </div>
      </form>
    </dialog>
  );
}
