import { useState, type FormEvent } from 'react';
import type { KioskScreenDto, PairingCodeDto } from '@shared/schemas/kiosk.ts';
import { useAddScreen, useRepairScreen, useRevokeScreen, useScreens, useSetScreenOrientation } from '@/api/screens.ts';
import { ScreenLanguage } from './screen-language.tsx';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { ApiRequestError } from '@/lib/api-client.ts';
import { ModalDialog } from './modal-dialog.tsx';
import { ScreenHealth } from './screen-health.tsx';
import { formatDateTime, formatTime } from '@/lib/format-date.ts';
import { SCREEN_ORIENTATIONS, type ScreenOrientation } from '@shared/schemas/kiosk.ts';

const ORIENTATION_LABELS: Record<ScreenOrientation, string> = {
  auto: 'As the display reports',
  landscape: 'Landscape',
  portrait: 'Portrait',
};

function PairingCode({ pairing, onClose }: { pairing: PairingCodeDto | null; onClose: () => void }) {
  return (
    <ModalDialog title={pairing ? `Pairing code for ${pairing.screen.name}` : ''} open={!!pairing} onClose={onClose}>
      {pairing && (
        <>
          <p className="text-sm text-muted">
            Type this code on the screen’s player page. It works once, until {formatTime(pairing.expiresAt)}.
          </p>
          {/* Spelled out one character at a time for screen readers, so the code is not read as a word. */}
          <p className="sr-only">{`Pairing code ${pairing.pairingCode.split('').join(' ')}`}</p>
          <p className="my-5 text-center font-mono text-4xl font-semibold tracking-[0.2em] tabular-nums" aria-hidden="true">
            {pairing.pairingCode}
          </p>
          <div className="mb-4 flex flex-col items-center gap-3 rounded-md border border-rule p-3 sm:flex-row sm:items-start">
            <svg
              role="img"
              aria-label={`QR code of the player’s address, ${pairing.playerUrl}`}
              viewBox={`0 0 ${pairing.playerQr.size} ${pairing.playerQr.size}`}
              shapeRendering="crispEdges"
              className="size-36 shrink-0 rounded bg-white"
            >
              <path d={pairing.playerQr.path} fill="#000" />
            </svg>
            <div className="min-w-0 text-sm">
              <p className="font-medium">Open the player on the screen</p>
              <p className="mt-1 text-muted">
                In the screen’s browser, go to this address (or scan the code with a tablet or phone used as a screen), then type
                the code above.
              </p>
              <p className="mt-2 break-all text-sm">
                <a href={pairing.playerUrl} target="_blank" rel="noreferrer" className="font-mono text-accent underline">
                  {pairing.playerUrl}
                </a>
              </p>
            </div>
          </div>
          <Notice tone="warning">It is shown only this once. If it is lost, re-pair the screen for a new one.</Notice>
          <div className="mt-5 flex justify-end">
            <Button onClick={onClose}>Done</Button>
          </div>
        </>
      )}
    </ModalDialog>
  );
}

function ConfirmRevoke({
  screen,
  busy,
  onConfirm,
  onClose,
}: {
  screen: KioskScreenDto | null;
  busy: boolean;
  onConfirm: () => void;
  onClose: () => void;
}) {
  return (
    <ModalDialog title={screen ? `Revoke ${screen.name}?` : ''} open={!!screen} onClose={onClose}>
      <p className="text-sm">The screen stops at once and shows its pairing page. To use it again, re-pair it with a new code.</p>
      <div className="mt-5 flex justify-end gap-2">
        <Button variant="secondary" onClick={onClose}>
          Cancel
        </Button>
        <Button variant="danger" busy={busy} onClick={onConfirm}>
          Revoke screen
        </Button>
      </div>
    </ModalDialog>
  );
}

/** A venue's kiosk screens with their health; admins add, re-pair and revoke them here. */
export function ScreensPanel({ venueId, canManage }: { venueId: string; canManage: boolean }) {
  const screens = useScreens(venueId);
  const add = useAddScreen(venueId);
  const repair = useRepairScreen(venueId);
  const revoke = useRevokeScreen(venueId);
  const orient = useSetScreenOrientation(venueId);
  const [name, setName] = useState('');
  const [nameError, setNameError] = useState<string>();
  const [pairing, setPairing] = useState<PairingCodeDto | null>(null);
  const [revoking, setRevoking] = useState<KioskScreenDto | null>(null);

  const onAdd = (e: FormEvent) => {
    e.preventDefault();
    setNameError(undefined);
    add.mutate(
      { name },
      {
        onSuccess: (result) => {
          setName('');
          setPairing(result);
        },
        onError: (error) =>
          setNameError(
            error instanceof ApiRequestError ? (error.fields?.name ?? error.message) : 'Something went wrong. Try again.',
          ),
      },
    );
  };

  return (
    <section aria-labelledby="screens-heading" className="rounded-lg border border-rule bg-panel">
      <header className="flex items-center gap-2 border-b border-rule px-4 py-3">
        <Icon name="screen" className="size-5 text-muted" />
        <h2 id="screens-heading" className="font-semibold">
          Kiosk screens
        </h2>
        <span className="text-xs text-muted">Online means seen in the last two minutes.</span>
      </header>
      {screens.isPending && <p className="px-4 py-3 text-sm text-muted">Loading screens…</p>}
      {screens.error && (
        <div className="p-4">
          <Notice tone="error">{screens.error.message}</Notice>
        </div>
      )}
      {screens.data && screens.data.length === 0 && <p className="px-4 py-3 text-sm text-muted">No screens yet.</p>}
      {screens.data && screens.data.length > 0 && (
        <ul className="divide-y divide-rule">
          {screens.data.map((screen) => (
            <li key={screen.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 px-4 py-2.5 text-sm">
              <span className="min-w-40 font-medium">{screen.name}</span>
              <ScreenHealth screen={screen} />
              {screen.lastSeenAt && screen.health === 'online' && (
                <span className="text-xs text-muted">last seen {formatDateTime(screen.lastSeenAt)}</span>
              )}
              {screen.showingSlide && (
                <span className="min-w-0 break-words text-xs text-muted">
                  showing <span className="text-ink">{screen.showingSlide.title || 'a slide'}</span>
                  {screen.reportedOrientation && ` (${screen.reportedOrientation})`}
                </span>
              )}
              {screen.playerVersion && <span className="text-xs text-muted">player {screen.playerVersion}</span>}
              <ScreenLanguage venueId={venueId} screen={screen} canManage={canManage} />
              {screen.silenceAlertedAt && (
                <span className="inline-flex items-center gap-1 text-xs text-broken">
                  <Icon name="alert" className="size-3.5" />
                  Admins e-mailed {formatDateTime(screen.silenceAlertedAt)}
                </span>
              )}
              {canManage ? (
                <label className="inline-flex items-center gap-2 text-xs text-muted">
                  Hangs
                  <select
                    className="rounded-md border border-rule bg-panel px-2 py-1 text-xs text-ink focus:border-accent focus:outline-none focus:ring-2 focus:ring-accent/30"
                    value={screen.orientation}
                    disabled={orient.isPending && orient.variables?.screenId === screen.id}
                    onChange={(e) => orient.mutate({ screenId: screen.id, orientation: e.target.value as ScreenOrientation })}
                  >
                    {SCREEN_ORIENTATIONS.map((o) => (
                      <option key={o} value={o}>
                        {ORIENTATION_LABELS[o]}
                      </option>
                    ))}
                  </select>
                </label>
              ) : (
                screen.orientation !== 'auto' && <span className="text-xs text-muted">{screen.orientation}</span>
              )}
              {canManage && (
                <span className="ml-auto flex gap-2">
                  <Button
                    variant="quiet"
                    busy={repair.isPending && repair.variables === screen.id}
                    onClick={() => repair.mutate(screen.id, { onSuccess: setPairing })}
                  >
                    Re-pair
                  </Button>
                  {screen.health !== 'revoked' && screen.health !== 'awaiting-pairing' && (
                    <Button variant="danger" onClick={() => setRevoking(screen)}>
                      Revoke
                    </Button>
                  )}
                </span>
              )}
            </li>
          ))}
        </ul>
      )}
      {(repair.error || revoke.error || orient.error) && (
        <p role="alert" className="px-4 py-2 text-sm text-broken">
          {(repair.error ?? revoke.error ?? orient.error)?.message}
        </p>
      )}
      {canManage && (
        <form
          onSubmit={onAdd}
          aria-label="Add a screen"
          className="flex flex-wrap items-end gap-3 border-t border-rule px-4 py-3"
        >
          <TextField
            label="New screen’s name"
            value={name}
            onChange={(e) => setName(e.target.value)}
            error={nameError}
            className="min-w-64 flex-1"
          />
          <Button type="submit" busy={add.isPending}>
            <Icon name="plus" className="size-4" />
            Add screen
          </Button>
        </form>
      )}
      <PairingCode pairing={pairing} onClose={() => setPairing(null)} />
      <ConfirmRevoke
        screen={revoking}
        busy={revoke.isPending}
        onClose={() => setRevoking(null)}
        onConfirm={() => revoking && revoke.mutate(revoking.id, { onSettled: () => setRevoking(null) })}
      />
    </section>
  );
}
