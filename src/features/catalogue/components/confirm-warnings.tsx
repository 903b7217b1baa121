import type { MeasurementConfirmationDto } from '@shared/schemas/measurement.ts';
import { Button } from '@/components/ui/button.tsx';

/**
 * What the server asked to be confirmed (a negative parallax, a likely sign error, statements that
 * will lose their distance), with a button to go ahead and one to step back. Nothing has been saved
 * while this shows.
 */
export function ConfirmWarnings({
  confirmation,
  confirmLabel,
  busy,
  onConfirm,
  onCancel,
}: {
  confirmation: MeasurementConfirmationDto;
  confirmLabel: string;
  busy?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
}) {
  return (
    <section
      role="alertdialog"
      aria-label="Check before saving"
      className="space-y-2 rounded-md border border-changed/60 bg-changed/10 px-3.5 py-3 text-sm"
    >
      <h3 className="font-semibold">Check before saving: nothing has been saved yet</h3>
      <ul className="list-disc space-y-1 pl-5">
        {confirmation.warnings.map((w) => (
          <li key={w.code}>{w.message}</li>
        ))}
      </ul>
      {confirmation.statements.length > 0 && (
        <>
          <p className="font-medium">Statements that will no longer work out:</p>
          <ul className="list-disc space-y-1 pl-5">
            {confirmation.statements.map((s) => (
              <li key={s.id} className="break-words">
                {s.text}
              </li>
            ))}
          </ul>
        </>
      )}
      <div className="flex flex-wrap gap-2 pt-1">
        {/* Inside a form these must not submit it as well: type="button". */}
        <Button type="button" busy={busy} onClick={onConfirm}>
          {confirmLabel}
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel}>
          Go back
        </Button>
      </div>
    </section>
  );
}
