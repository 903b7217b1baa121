import type { KioskScreenDto } from '@shared/schemas/kiosk.ts';
import { Icon } from '@/components/ui/icon.tsx';
import { formatDateTime } from '@/lib/format-date.ts';

/** A screen's health in words with an icon (never colour alone). */
export function ScreenHealth({ screen }: { screen: KioskScreenDto }) {
  switch (screen.health) {
    case 'online':
      return (
        <span className="inline-flex items-center gap-1.5 text-ok">
          <Icon name="check" className="size-4" />
          Online
        </span>
      );
    case 'offline':
      return (
        <span className="inline-flex items-center gap-1.5 text-broken">
          <Icon name="alert" className="size-4" />
          Offline since {formatDateTime(screen.lastSeenAt!)}
        </span>
      );
    case 'never-seen':
      return (
        <span className="inline-flex items-center gap-1.5 text-changed">
          <Icon name="info" className="size-4" />
          Paired, not yet seen
        </span>
      );
    case 'revoked':
      return (
        <span className="inline-flex items-center gap-1.5 text-neutral">
          <Icon name="x" className="size-4" />
          Revoked
        </span>
      );
    default:
      return (
        <span className="inline-flex items-center gap-1.5 text-neutral">
          <Icon name="key" className="size-4" />
          {screen.pairingExpiresAt
            ? `Waiting for pairing (code valid until ${formatDateTime(screen.pairingExpiresAt)})`
            : 'Not paired'}
        </span>
      );
  }
}
