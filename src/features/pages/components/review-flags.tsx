import { useState } from 'react';
import type { NumberFlagDto } from '@shared/schemas/page.ts';
import { PageLimits } from '@shared/validations.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';

function FlagRow({
  flag,
  canReview,
  onResolve,
}: {
  flag: NumberFlagDto;
  canReview: boolean;
  onResolve: (text: string, reason: string) => void;
}) {
  const [reason, setReason] = useState('');
  const [open, setOpen] = useState(false);
  return (
    <li className="rounded-md border border-rule px-3 py-2 text-sm">
      <span className="number-flag-static font-serif underline decoration-[#c98a1b] decoration-wavy underline-offset-4">
        {flag.text}
      </span>
      {flag.resolution ? (
        <p className="mt-1 text-xs text-muted">
          <Icon name="check" className="mr-1 inline size-3 text-ok" />
          Not a measured quantity: {flag.resolution.reason} ({flag.resolution.by ?? 'a reviewer'})
        </p>
      ) : canReview ? (
        open ? (
          <form
            className="mt-2 space-y-2"
            onSubmit={(e) => {
              e.preventDefault();
              onResolve(flag.text, reason);
            }}
          >
            <label className="block text-xs font-medium" htmlFor={`reason-${flag.normalised}`}>
              Why is this not a measured quantity?
            </label>
            <textarea
              id={`reason-${flag.normalised}`}
              value={reason}
              onChange={(e) => setReason(e.target.value)}
              rows={2}
              maxLength={PageLimits.reasonMax}
              className="w-full rounded border border-rule bg-panel px-2 py-1 text-sm"
            />
            <Button type="submit" disabled={reason.trim().length < PageLimits.reasonMin}>
              Mark as not measured
            </Button>
          </form>
        ) : (
          <button
            type="button"
            className="mt-1 block text-xs font-medium text-accent hover:underline"
            onClick={() => setOpen(true)}
          >
            Mark as not a measured quantity…
          </button>
        )
      ) : (
        <p className="mt-1 text-xs text-changed">Open: the writer turns it into a statement, or a reviewer marks it.</p>
      )}
    </li>
  );
}

/** Hand-typed numbers the server found on this version, and the reviewer's rulings. */
export function ReviewFlags({
  flags,
  canReview,
  onResolve,
}: {
  flags: NumberFlagDto[];
  canReview: boolean;
  onResolve: (text: string, reason: string) => void;
}) {
  return (
    <section aria-labelledby="review-flags" className="space-y-2">
      <h2 id="review-flags" className="font-semibold">
        Hand-typed numbers ({flags.filter((f) => !f.resolution).length} open)
      </h2>
      {flags.length === 0 ? (
        <p className="text-sm text-muted">None found.</p>
      ) : (
        <ul className="space-y-2">
          {flags.map((f, i) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: the same number can be typed twice; the list comes in text order and is never reordered
            <FlagRow key={`${f.normalised}-${i}`} flag={f} canReview={canReview} onResolve={onResolve} />
          ))}
        </ul>
      )}
    </section>
  );
}
