import type { NumberFlagDto } from '@shared/schemas/page.ts';
import { Icon } from '@/components/ui/icon.tsx';

/** A flag as the editor sees it now, with the reviewer's resolution when the server has one. */
export interface LiveFlag {
  text: string;
  normalised: string;
  from: number;
  to: number;
  resolution: NumberFlagDto['resolution'];
}

/**
 * Hand-typed numbers beside the page: each becomes a statement (writer) or is marked by a reviewer
 * as not a measured quantity. Approval waits until none is open.
 */
export function NumberCheckPanel({
  flags,
  onConvert,
  onShow,
}: {
  flags: LiveFlag[];
  onConvert?: (flag: LiveFlag) => void;
  onShow?: (flag: LiveFlag) => void;
}) {
  const open = flags.filter((f) => !f.resolution);
  return (
    <section aria-labelledby="number-check" className="rounded-lg border border-rule bg-panel p-4">
      <h2 id="number-check" className="flex items-center gap-2 font-semibold">
        <Icon name={open.length ? 'alert' : 'check'} className={`size-4 ${open.length ? 'text-changed' : 'text-ok'}`} />
        Number check
      </h2>
      <p className="mb-3 text-xs text-muted">
        {open.length
          ? `${open.length} hand-typed number${open.length === 1 ? '' : 's'} to turn into statements.`
          : 'No hand-typed numbers left to check.'}
      </p>
      <ul className="space-y-2">
        {flags.map((f, i) => (
          // biome-ignore lint/suspicious/noArrayIndexKey: flags come in text order from the page and are never reordered; the index only separates repeats
          <li key={`${f.normalised}-${f.from}-${i}`} className="rounded-md border border-rule px-3 py-2 text-sm">
            <button type="button" className="number-flag text-left font-serif" onClick={() => onShow?.(f)}>
              {f.text}
            </button>
            {f.resolution ? (
              <p className="mt-1 text-xs text-muted">
                <Icon name="check" className="mr-1 inline size-3 text-ok" />
                Not a measured quantity: {f.resolution.reason} ({f.resolution.by ?? 'a reviewer'})
              </p>
            ) : (
              onConvert && (
                <button
                  type="button"
                  className="mt-1 block text-xs font-medium text-accent hover:underline"
                  onClick={() => onConvert(f)}
                >
                  Make it a statement
                </button>
              )
            )}
          </li>
        ))}
      </ul>
    </section>
  );
}
