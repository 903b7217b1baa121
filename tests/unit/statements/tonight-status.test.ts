/**
 * The status rule for statements that follow tonight (applyOutcome): a new night alone keeps the
 * statement current and its accepted wording follows; a new method (the venue moved, other
 * constants, another sentence) goes through the "changed" review like any other change.
 */
import { describe, expect, it } from 'vitest';
import { computeSkyTonight } from '../../../shared/sky/tonight.ts';
import {
  evaluateStatement,
  findTemplate,
  nightFromSky,
  type TemplateContext,
  type TemplateSuccess,
} from '../../../shared/statements/index.ts';
import {
  applyOutcome,
  type ComputedOutcome,
  type PreviousComputation,
} from '../../../server/services/statements/apply-outcome.ts';

const template = findTemplate('planet-light-tonight')!;
const venue = {
  id: 'venue-1',
  name: 'Corrie Vale Planetarium (demo)',
  latitude: 54.62,
  longitude: -2.95,
  elevationM: 160,
  timeZone: 'Europe/London',
};

/** Jupiter's statement for a night (dates far enough apart that the wording moves). */
function outcome(localDate: string, place: Partial<typeof venue> = {}): TemplateSuccess {
  const v = { ...venue, ...place };
  const ctx: TemplateContext = {
    object: { id: 'o', name: 'Jupiter', kind: 'planet' },
    measurements: [],
    model: { preset: 'planck18' },
    band: 'V',
    venue: v,
    night: nightFromSky(computeSkyTonight({ ...v, localDate, now: 0 })),
  };
  const r = evaluateStatement(template.id, ctx);
  if (!r.ok) throw new Error(r.reason);
  return r;
}

/** What the next computation reads of this one. */
const previousOf = (r: ComputedOutcome): PreviousComputation => ({
  status: r.status,
  acknowledgedTexts: r.acknowledgedTexts,
  inputs: r.inputs,
  model: null,
  night: r.night,
});

function computed(previous: PreviousComputation | null, o: TemplateSuccess, flags = template): ComputedOutcome {
  const r = applyOutcome(previous, o, flags);
  if (r.status === 'broken') throw new Error(r.statusReason);
  return r;
}

describe('statements that follow tonight', () => {
  const first = computed(null, outcome('2026-12-03'));

  it('a first computation is accepted with its method', () => {
    expect(first.status).toBe('current');
    expect(first.acknowledgedTexts).toEqual(first.texts);
    expect(first.night!.acceptedMethod).toEqual(first.night!.method);
  });

  it('a new night alone keeps it current and the accepted wording follows, with the night recorded', () => {
    const later = outcome('2027-01-20');
    expect(later.texts['en-GB']).not.toBe(first.texts['en-GB']);
    const next = computed(previousOf(first), later);
    expect(next.status).toBe('current');
    expect(next.statusReason).toBeNull();
    expect(next.acknowledgedTexts).toEqual(later.texts);
    expect(next.followedNight).toBe(true);
    expect(next.night!.localDate).toBe('2027-01-20');
    expect(next.working[0].inputs[0].source).toMatch(/night of 2027-01-20/);
  });

  it('without the followsTonight flag the same change would need a reviewer', () => {
    const next = computed(previousOf(first), outcome('2027-01-20'), { ...template, followsTonight: false });
    expect(next.status).toBe('changed');
    expect(next.acknowledgedTexts).toEqual(first.texts);
  });

  it('a moved venue goes through the changed review, even on a night whose wording did not move', () => {
    const moved = outcome('2026-12-03', { latitude: 51.48, longitude: 0 });
    const sameNight = computed(previousOf(first), moved);
    // Same wording: nothing for pages to re-check, but the new position is not accepted yet.
    expect(sameNight.texts).toEqual(first.texts);
    expect(sameNight.status).toBe('current');
    expect(sameNight.night!.acceptedMethod).toEqual(first.night!.method);
    const nextNight = computed(previousOf(sameNight), outcome('2027-01-20', { latitude: 51.48, longitude: 0 }));
    expect(nextNight.status).toBe('changed');
    expect(nextNight.statusReason).toMatch(/the venue moved: 54\.62°, -2\.95°, 160 m → 51\.48°, 0°, 160 m/);
    expect(nextNight.acknowledgedTexts).toEqual(first.texts);
    expect(nextNight.followedNight).toBe(false);
    // Still changed a night later: it waits for its reviewer.
    expect(computed(previousOf(nextNight), outcome('2027-03-01', { latitude: 51.48, longitude: 0 })).status).toBe('changed');
  });

  it('other constants or another sentence are changes of method too', () => {
    const previous = previousOf(first);
    const oldAu = {
      ...previous,
      night: {
        ...first.night!,
        acceptedMethod: { ...first.night!.method, constants: { auM: 149_597_870_691, cKmS: 299_792.458 } },
      },
    };
    expect(computed(oldAu, outcome('2027-01-20')).statusReason).toMatch(/astronomical unit or the speed of light used changed/);
    const oldSentence = {
      ...previous,
      night: {
        ...first.night!,
        acceptedMethod: {
          ...first.night!.method,
          wording: { ...first.night!.method.wording, 'en-GB': 'Jupiter’s light needs about … to get here tonight.' },
        },
      },
    };
    expect(computed(oldSentence, outcome('2027-01-20')).statusReason).toMatch(/the sentence around the number changed/);
  });
});
