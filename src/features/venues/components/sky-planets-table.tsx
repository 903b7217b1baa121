import { Fragment } from 'react';
import type { PlanetTonight, SkyEvent } from '@shared/sky/types.ts';
import { DataTable, type DataColumn } from '@/components/ui/data-table.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { formatAltitude, formatAu, formatKm, formatLightTime } from './sky-format.ts';

/**
 * A time, or the words for why there is none; `note` adds a line of context beneath. A time that
 * only just happens (state "grazes") shows the time, with the "only just" words beneath it.
 */
function EventCell({ event, note }: { event: SkyEvent; note?: string }) {
  const split = event.state === 'grazes' && event.utc ? event.text.indexOf(' (only just') : -1;
  const main = split > 0 ? event.text.slice(0, split) : event.text;
  const grazing = split > 0 ? event.text.slice(split + 2, -1) : null;
  return (
    <td className={`px-3 py-2 ${event.utc ? 'tabular-nums' : 'text-xs text-muted'}`}>
      {main}
      {grazing && <span className="block text-xs text-muted">{grazing}</span>}
      {note && <span className="block text-xs text-muted">{note}</span>}
    </td>
  );
}

function Visible({ planet }: { planet: PlanetTonight }) {
  return (
    <>
      {planet.upAfterDusk ? (
        <span className="inline-flex items-center gap-1 font-medium text-ok">
          <Icon name="check" className="size-4" />
          Yes
        </span>
      ) : (
        <span className="inline-flex items-center gap-1 font-medium text-neutral">
          <Icon name="x" className="size-4" />
          No
        </span>
      )}
      <span className="block text-xs text-muted">{planet.visibility}</span>
    </>
  );
}

const columns = (atTime: string): DataColumn[] => [
  { label: 'Planet' },
  { label: 'Up between dusk and dawn?' },
  { label: 'Rises' },
  { label: 'Highest' },
  { label: 'Sets' },
  { label: `At ${atTime}` },
  { label: 'Distance', align: 'right' },
  { label: 'Light takes', align: 'right' },
];

/** One planet as a card, for a phone: the table's eight columns do not fit 390 px. */
function PlanetCard({ planet: p, atTime }: { planet: PlanetTonight; atTime: string }) {
  // A planet that rises and sets has times; one that stays up or down has a sentence instead.
  const times = p.times.state === 'rises-and-sets' ? p.times : undefined;
  const rows: Array<[string, string]> = times
    ? [
        ['Rises', times.rise.text],
        ['Highest', times.transit.text],
        ['Sets', times.set.text],
      ]
    : [];
  return (
    <li className="rounded-lg border border-rule bg-panel p-3 text-sm">
      <p className="font-medium">{p.name}</p>
      <div className="mt-1">
        <Visible planet={p} />
      </div>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
        {/* In the order they happen: a planet up at noon sets before it rises again. */}
        {times?.earlierSet && (
          <>
            <dt className="text-muted">Up at noon</dt>
            <dd className="tabular-nums">until {times.earlierSet.text}</dd>
          </>
        )}
        {rows.map(([label, text]) => (
          <Fragment key={label}>
            <dt className="text-muted">{label}</dt>
            <dd className="tabular-nums">{text}</dd>
          </Fragment>
        ))}
        {times?.laterRise && (
          <>
            <dt className="text-muted">Rises again</dt>
            <dd className="tabular-nums">{times.laterRise.text}</dd>
          </>
        )}
        {p.times.state !== 'rises-and-sets' && (
          <>
            <dt className="text-muted">Rising and setting</dt>
            <dd>{p.times.summary}</dd>
          </>
        )}
        <dt className="text-muted">At {atTime}</dt>
        <dd className="tabular-nums">
          {formatAltitude(p.altitudeDeg)} {p.direction}
          {!p.aboveHorizon && ', below the horizon'}
        </dd>
        <dt className="text-muted">Distance</dt>
        <dd className="tabular-nums">
          {formatAu(p.distanceAu)} ({formatKm(p.distanceKm)})
        </dd>
        <dt className="text-muted">Light takes</dt>
        <dd className="tabular-nums">{formatLightTime(p.lightTimeSeconds)}</dd>
      </dl>
    </li>
  );
}

/**
 * The planets tonight: on a phone a card each; from 640 px one row each, figures in tabular
 * numerals, words where a time cannot be given.
 */
export function SkyPlanetsTable({ planets, atTime }: { planets: PlanetTonight[]; atTime: string }) {
  return (
    <>
      <ul aria-label="Planets tonight" className="space-y-2 sm:hidden">
        {planets.map((p) => (
          <PlanetCard key={p.id} planet={p} atTime={atTime} />
        ))}
      </ul>
      <div className="hidden sm:block">
        <PlanetRows planets={planets} atTime={atTime} />
      </div>
    </>
  );
}

function PlanetRows({ planets, atTime }: { planets: PlanetTonight[]; atTime: string }) {
  return (
    <DataTable compact caption="Planets tonight" columns={columns(atTime)}>
      {planets.map((p) => (
        <tr key={p.id} className="border-b border-rule align-top last:border-0">
          <th scope="row" className="px-3 py-2 font-medium whitespace-nowrap">
            {p.name}
          </th>
          <td className="min-w-44 px-3 py-2">
            <Visible planet={p} />
          </td>
          {p.times.state === 'rises-and-sets' ? (
            <>
              <EventCell
                event={p.times.rise}
                note={
                  p.times.earlierSet
                    ? `Up at noon until ${p.times.earlierSet.text}`
                    : p.times.laterRise
                      ? `Rises again ${p.times.laterRise.text}`
                      : undefined
                }
              />
              <EventCell event={p.times.transit} />
              <EventCell event={p.times.set} />
            </>
          ) : (
            <td colSpan={3} className="px-3 py-2 text-sm">
              <span className="inline-flex items-center gap-1.5">
                <Icon name="info" className="size-4 text-muted" />
                {p.times.summary}
              </span>
            </td>
          )}
          <td className="px-3 py-2 tabular-nums">
            {formatAltitude(p.altitudeDeg)} {p.direction}
            {!p.aboveHorizon && <span className="block text-xs text-muted">below the horizon</span>}
          </td>
          <td className="px-3 py-2 text-right tabular-nums whitespace-nowrap">
            {formatAu(p.distanceAu)}
            <span className="block text-xs text-muted">{formatKm(p.distanceKm)}</span>
          </td>
          <td className="px-3 py-2 text-right tabular-nums whitespace-nowrap">{formatLightTime(p.lightTimeSeconds)}</td>
        </tr>
      ))}
    </DataTable>
  );
}
