import { useState } from 'react';
import type { ChannelDetailDto } from '@shared/schemas/channel.ts';
import { ChannelLimits } from '@shared/validations.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';

/**
 * The channel's screen options: QR codes on object slides (to each page's public address), and
 * after how long a silent screen is e-mailed to admins (empty: never).
 */
export function ChannelSettingsForm({
  channel,
  busy,
  error,
  onSave,
}: {
  channel: ChannelDetailDto;
  busy: boolean;
  error?: string;
  onSave: (input: { showQr: boolean; silenceAlertMinutes: number | null }) => void;
}) {
  const [showQr, setShowQr] = useState(channel.showQr);
  const [minutes, setMinutes] = useState(channel.silenceAlertMinutes === null ? '' : String(channel.silenceAlertMinutes));
  return (
    <form
      aria-label="Screen options"
      className="space-y-3"
      onSubmit={(e) => {
        e.preventDefault();
        onSave({ showQr, silenceAlertMinutes: minutes.trim() === '' ? null : Number(minutes) });
      }}
    >
      <label className="flex items-start gap-2 text-sm">
        <input type="checkbox" className="mt-1" checked={showQr} onChange={(e) => setShowQr(e.target.checked)} />
        <span>
          QR code on object slides
          <span className="block text-xs text-muted">
            Opens the page’s public address, where visitors can read how we know each number.
          </span>
        </span>
      </label>
      <TextField
        label="E-mail admins when a screen is silent for (minutes)"
        type="number"
        min={ChannelLimits.silenceAlertMin}
        max={ChannelLimits.silenceAlertMax}
        value={minutes}
        onChange={(e) => setMinutes(e.target.value)}
        hint="Empty: no e-mail. One message per outage, and a short note when the screen is back."
        error={error}
      />
      <Button type="submit" variant="secondary" busy={busy}>
        Save options
      </Button>
    </form>
  );
}
