import { useState } from 'react';
import type { SlideDto, SlideUpdateInput } from '@shared/schemas/channel.ts';
import { ChannelLimits } from '@shared/validations.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { draftOf, scheduleOf, SlideScheduleFields } from './slide-schedule-fields.tsx';

const pad = (n: number) => String(n).padStart(2, '0');

/** ISO instant → the value a datetime-local input shows (this browser's time zone). */
export function toLocalInput(iso: string | null): string {
  if (!iso) return '';
  const d = new Date(iso);
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

const fromLocalInput = (value: string) => (value ? new Date(value).toISOString() : null);

/** Duration, optional start and end, and the schedule of one slide; saved together. */
export function SlideTimingForm({
  slide,
  busy,
  error,
  scheduleErrors = [],
  onSave,
}: {
  slide: SlideDto;
  busy: boolean;
  error?: string | null;
  /** The server's messages about the schedule, field by field. */
  scheduleErrors?: string[];
  onSave: (input: SlideUpdateInput) => void;
}) {
  const [schedule, setSchedule] = useState(draftOf(slide.schedule));
  const [duration, setDuration] = useState(String(slide.durationS));
  const [startsAt, setStartsAt] = useState(toLocalInput(slide.startsAt));
  const [endsAt, setEndsAt] = useState(toLocalInput(slide.endsAt));
  const [caption, setCaption] = useState(slide.caption);
  const clamped = Math.min(
    ChannelLimits.durationMax,
    Math.max(ChannelLimits.durationMin, Math.round(Number(duration) || ChannelLimits.durationDefault)),
  );
  return (
    <form
      aria-label={`Timing for slide ${slide.position + 1}`}
      className="mt-3 space-y-3 border-t border-rule pt-3"
      onSubmit={(e) => {
        e.preventDefault();
        setDuration(String(clamped));
        onSave({
          durationS: clamped,
          startsAt: fromLocalInput(startsAt),
          endsAt: fromLocalInput(endsAt),
          schedule: scheduleOf(schedule),
          ...(slide.kind === 'image' ? { caption } : {}),
        });
      }}
    >
      <div className="grid gap-3 sm:grid-cols-[8rem_1fr_1fr_auto] sm:items-end xl:grid-cols-2 2xl:grid-cols-[8rem_1fr_1fr_auto]">
        <TextField
          label="Seconds on screen"
          type="number"
          min={ChannelLimits.durationMin}
          max={ChannelLimits.durationMax}
          value={duration}
          onChange={(e) => setDuration(e.target.value)}
          hint={`${ChannelLimits.durationMin}–${ChannelLimits.durationMax} s`}
        />
        <TextField
          label="Show from (optional)"
          type="datetime-local"
          value={startsAt}
          onChange={(e) => setStartsAt(e.target.value)}
          hint="Your local time"
        />
        <TextField
          label="Show until (optional)"
          type="datetime-local"
          value={endsAt}
          onChange={(e) => setEndsAt(e.target.value)}
          error={error ?? undefined}
        />
        <Button type="submit" variant="secondary" busy={busy}>
          Save timing
        </Button>
        {slide.kind === 'image' && (
          <TextField
            className="col-span-full"
            label="Caption"
            maxLength={ChannelLimits.captionMax}
            value={caption}
            onChange={(e) => setCaption(e.target.value)}
          />
        )}
      </div>
      <SlideScheduleFields draft={schedule} onChange={setSchedule} errors={scheduleErrors} />
    </form>
  );
}
