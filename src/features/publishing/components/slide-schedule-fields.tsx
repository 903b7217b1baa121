import { useId } from 'react';
import {
  SUN_OFFSET_MAX_MIN,
  type SlideSchedule,
  type TimeAnchor,
  WEEKDAY_LABELS,
  WEEKDAYS,
  type Weekday,
} from '@shared/schemas/slide-schedule.ts';

/** The schedule as the form edits it: `on` false means "always". */
export interface ScheduleDraft {
  on: boolean;
  days: Weekday[];
  from: TimeAnchor | null;
  until: TimeAnchor | null;
  firstDate: string;
  lastDate: string;
}

/** A stored schedule (or none) as a draft for the form. */
export const draftOf = (s: SlideSchedule | null): ScheduleDraft => ({
  on: !!s,
  days: s?.days ?? [...WEEKDAYS],
  from: s?.from ?? null,
  until: s?.until ?? null,
  firstDate: s?.firstDate ?? '',
  lastDate: s?.lastDate ?? '',
});

/** The draft as the API takes it (the server checks it and answers in words). */
export const scheduleOf = (d: ScheduleDraft): SlideSchedule | null =>
  d.on ? { days: d.days, from: d.from, until: d.until, firstDate: d.firstDate || null, lastDate: d.lastDate || null } : null;

const CONTROL =
  'rounded-md border border-rule bg-panel px-2 py-1.5 text-sm text-ink focus:border-accent focus:outline-none focus:ring-2 focus:ring-accent/30';

function AnchorField({
  label,
  edge,
  value,
  onChange,
}: {
  label: string;
  edge: string;
  value: TimeAnchor | null;
  onChange: (v: TimeAnchor | null) => void;
}) {
  const id = useId();
  const kind = value?.at ?? 'edge';
  const minutes = value && value.at !== 'clock' ? value.offsetMin : 0;
  return (
    <div className="flex flex-wrap items-end gap-2">
      <div>
        <label htmlFor={id} className="mb-1 block text-sm font-medium text-ink">
          {label}
        </label>
        <select
          id={id}
          className={CONTROL}
          value={kind}
          onChange={(e) => {
            const at = e.target.value;
            if (at === 'edge') onChange(null);
            else if (at === 'clock') onChange({ at: 'clock', time: '18:00' });
            else onChange({ at: at as 'sunset' | 'sunrise', offsetMin: minutes });
          }}
        >
          <option value="edge">{edge}</option>
          <option value="clock">a clock time</option>
          <option value="sunset">sunset</option>
          <option value="sunrise">sunrise</option>
        </select>
      </div>
      {value?.at === 'clock' && (
        <div>
          <label htmlFor={`${id}-time`} className="mb-1 block text-sm font-medium text-ink">
            Time
          </label>
          <input
            id={`${id}-time`}
            type="time"
            className={CONTROL}
            value={value.time}
            onChange={(e) => onChange({ at: 'clock', time: e.target.value })}
          />
        </div>
      )}
      {value && value.at !== 'clock' && (
        <div>
          <label htmlFor={`${id}-offset`} className="mb-1 block text-sm font-medium text-ink">
            Minutes from {value.at} (− before)
          </label>
          <input
            id={`${id}-offset`}
            type="number"
            step={5}
            min={-SUN_OFFSET_MAX_MIN}
            max={SUN_OFFSET_MAX_MIN}
            className={`${CONTROL} w-28`}
            value={value.offsetMin}
            onChange={(e) => onChange({ at: value.at, offsetMin: Math.round(Number(e.target.value) || 0) })}
          />
        </div>
      )}
    </div>
  );
}

/**
 * When a slide shows, by the venue's own clock: days of the week, times (a clock time, or minutes
 * from the venue's sunset or sunrise) and dates for a temporary exhibition. Problems are named by
 * the server, field by field (`errors`).
 */
export function SlideScheduleFields({
  draft,
  onChange,
  errors,
}: {
  draft: ScheduleDraft;
  onChange: (d: ScheduleDraft) => void;
  errors: string[];
}) {
  const set = (patch: Partial<ScheduleDraft>) => onChange({ ...draft, ...patch });
  return (
    <fieldset className="min-w-0 space-y-3 rounded-md border border-rule p-3">
      <legend className="px-1 text-sm font-medium text-ink">Schedule (the venue’s local time)</legend>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" checked={draft.on} onChange={(e) => set({ on: e.target.checked })} />
        Show only on certain days, times or dates
      </label>
      {draft.on && (
        <>
          <fieldset className="min-w-0">
            <legend className="mb-1 text-sm font-medium text-ink">Days</legend>
            <div className="flex flex-wrap gap-3">
              {WEEKDAYS.map((d) => (
                <label key={d} className="inline-flex items-center gap-1.5 text-sm">
                  <input
                    type="checkbox"
                    checked={draft.days.includes(d)}
                    onChange={(e) =>
                      set({
                        days: e.target.checked
                          ? WEEKDAYS.filter((w) => w === d || draft.days.includes(w))
                          : draft.days.filter((w) => w !== d),
                      })
                    }
                  />
                  {WEEKDAY_LABELS[d]}
                </label>
              ))}
            </div>
          </fieldset>
          <div className="flex flex-wrap gap-6">
            <AnchorField label="From" edge="the start of the day" value={draft.from} onChange={(from) => set({ from })} />
            <AnchorField label="Until" edge="midnight" value={draft.until} onChange={(until) => set({ until })} />
          </div>
          <p className="text-xs text-muted">
            An end earlier than the start on the clock runs past midnight. Where the Sun does not set (midnight sun), a slide
            shown from sunset does not show; in polar night it shows from the start of the day.
          </p>
          <div className="flex flex-wrap gap-4">
            <label className="text-sm font-medium text-ink">
              First day (optional)
              <input
                type="date"
                className={`${CONTROL} mt-1 block`}
                value={draft.firstDate}
                onChange={(e) => set({ firstDate: e.target.value })}
              />
            </label>
            <label className="text-sm font-medium text-ink">
              Last day (optional)
              <input
                type="date"
                className={`${CONTROL} mt-1 block`}
                value={draft.lastDate}
                onChange={(e) => set({ lastDate: e.target.value })}
              />
            </label>
          </div>
        </>
      )}
      {errors.length > 0 && (
        <ul role="alert" className="list-disc pl-5 text-xs font-medium text-broken">
          {errors.map((e) => (
            <li key={e}>{e}</li>
          ))}
        </ul>
      )}
    </fieldset>
  );
}
