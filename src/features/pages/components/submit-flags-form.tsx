import { useState } from 'react';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';

const REASON_MIN = 3;

/**
 * Before a page with open hand-typed numbers goes to review: one reason per number (the reviewer
 * reads them as comments), or the writer goes back and turns them into statements.
 */
export function SubmitFlagsForm({
  flags,
  busy,
  onSubmit,
  onCancel,
}: {
  flags: string[];
  busy: boolean;
  onSubmit: (notes: Array<{ text: string; reason: string }>) => void;
  onCancel: () => void;
}) {
  const [reasons, setReasons] = useState<Record<string, string>>({});
  const [tried, setTried] = useState(false);
  const missing = flags.filter((f) => (reasons[f] ?? '').trim().length < REASON_MIN);
  return (
    <form
      aria-label="Reasons for hand-typed numbers"
      className="mb-4 space-y-3 rounded-lg border border-changed/40 bg-changed/10 p-4"
      onSubmit={(e) => {
        e.preventDefault();
        setTried(true);
        if (missing.length === 0) onSubmit(flags.map((text) => ({ text, reason: reasons[text]!.trim() })));
      }}
    >
      <p className="text-sm font-semibold">
        {flags.length === 1 ? 'One number on this page is' : `${flags.length} numbers on this page are`} typed by hand, not
        computed.
      </p>
      <p className="text-sm text-muted">
        Say why each stays as typed (the reviewer reads your reason), or cancel and turn it into a statement.
      </p>
      {flags.map((text) => (
        <TextField
          key={text}
          label={`Why “${text}” stays as typed`}
          value={reasons[text] ?? ''}
          onChange={(e) => setReasons({ ...reasons, [text]: e.target.value })}
          error={tried && missing.includes(text) ? `Give a reason of at least ${REASON_MIN} characters` : undefined}
        />
      ))}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={busy}>
          Submit with these reasons
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
