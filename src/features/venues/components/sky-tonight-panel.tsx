import { useState } from 'react';
import type { SkyTonight } from '@shared/sky/types.ts';
import { useSky } from '@/api/sky.ts';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { formatAltitude, formatKm } from './sky-format.ts';
import { SkyPlanetsTable } from './sky-planets-table.tsx';
import { formatCalendarDate, formatDateTime } from '@/lib/format-date.ts';

const percent = new Intl.NumberFormat(undefined, { style: 'percent', maximumFractionDigits: 0 });

function Row({ label, value }: { label: string; value: string }) {
  return (
    <div className="flex justify-between gap-4 py-1">
      <dt className="text-muted">{label}</dt>
      <dd className="text-right tabular-nums">{value}</dd>
    </div>
  );
}

function SunCard({ sky }: { sky: SkyTonight }) {
  const s = sky.sun;
  return (
    <section aria-labelledby="sun-heading" className="rounded-lg border border-rule bg-panel p-4">
      <h3 id="sun-heading" className="font-semibold">
        Sun and twilight
      </h3>
      <p className="mt-1 text-xs text-muted">{s.darkness.text}</p>
      <dl className="mt-2 divide-y divide-rule text-sm">
        <Row label="Sunset" value={s.sunset.text} />
        <Row label="Civil twilight ends" value={s.civilDusk.text} />
        <Row label="Nautical twilight ends" value={s.nauticalDusk.text} />
        <Row label="Astronomical twilight ends" value={s.astronomicalDusk.text} />
        <Row label="Astronomical twilight begins" value={s.astronomicalDawn.text} />
        <Row label="Sunrise" value={s.sunrise.text} />
      </dl>
    </section>
  );
}

function MoonCard({ sky }: { sky: SkyTonight }) {
  const m = sky.moon;
  return (
    <section aria-labelledby="moon-heading" className="rounded-lg border border-rule bg-panel p-4">
      <h3 id="moon-heading" className="flex items-center gap-2 font-semibold">
        <Icon name="moon" className="size-4 text-muted" />
        Moon: {m.phaseName}
      </h3>
      <dl className="mt-2 divide-y divide-rule text-sm">
        <Row label="Illuminated" value={percent.format(m.illuminatedFraction)} />
        <Row label="Phase angle" value={`${m.phaseAngleDeg.toFixed(1)}°`} />
        {m.times.earlierSet && <Row label="Up at noon, sets" value={m.times.earlierSet.text} />}
        <Row label={m.times.earlierSet ? 'Rises again' : 'Rises'} value={m.times.rise.text} />
        <Row label="Sets" value={m.times.set.text} />
        {m.times.laterRise && <Row label="Rises again" value={m.times.laterRise.text} />}
        <Row
          label={`At ${sky.observation.localTime}`}
          value={`${formatAltitude(m.altitudeDeg)} ${m.direction}${m.aboveHorizon ? '' : ', below the horizon'}`}
        />
        <Row label="Distance" value={formatKm(m.distanceKm)} />
      </dl>
    </section>
  );
}

/** The venue's sky for a night: when it gets dark, the Moon, and each planet in a table. */
export function SkyTonightPanel({ venueId }: { venueId: string }) {
  const [date, setDate] = useState('');
  const [at, setAt] = useState('');
  const sky = useSky(venueId, date || undefined, at || undefined);
  const data = sky.data?.sky;
  return (
    <section aria-labelledby="sky-heading" className="space-y-4">
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h2 id="sky-heading" className="text-lg font-semibold">
            Sky tonight
          </h2>
          {data && (
            <p className="text-sm text-muted">
              Night of {formatCalendarDate(data.localDate)} ({data.timeZone}). Positions at {data.observation.text}.
            </p>
          )}
        </div>
        <div className="flex items-end gap-3 text-sm">
          <label className="flex flex-col gap-1">
            <span className="font-medium">Night of</span>
            {/* Shows the night on screen, tonight's included, not an empty field. */}
            <input
              type="date"
              value={date || data?.localDate || ''}
              onChange={(e) => setDate(e.target.value)}
              className="rounded-md border border-rule bg-panel px-2 py-1.5"
            />
          </label>
          <label className="flex flex-col gap-1">
            <span className="font-medium">Positions at</span>
            <input
              type="time"
              value={at || data?.observation.localTime || ''}
              onChange={(e) => setAt(e.target.value)}
              className="rounded-md border border-rule bg-panel px-2 py-1.5"
            />
          </label>
        </div>
      </header>
      {sky.isPending && <p className="text-sm text-muted">Working out tonight’s sky…</p>}
      {sky.error && <Notice tone="error">{sky.error.message}</Notice>}
      {data && (
        <>
          <div className="grid gap-4 md:grid-cols-2">
            <SunCard sky={data} />
            <MoonCard sky={data} />
          </div>
          <SkyPlanetsTable planets={data.planets} atTime={data.observation.localTime ?? ''} />
          <p className="text-xs text-muted">
            {sky.data!.stored
              ? `Computed ${formatDateTime(sky.data!.computedAt)}; recomputed daily and whenever the venue moves.`
              : 'Computed for the chosen time; not stored.'}{' '}
            {data.method.notes.join(' ')} Distances along the light’s path, with 1 au = 149,597,870.7 km.
          </p>
        </>
      )}
    </section>
  );
}
