import { describe, expect, it } from 'vitest';
import { TIMELINE_STARTER } from '../../../server/migrations/data/timeline-starter.ts';
import { LY_PER_PC } from '../../../shared/engine/units.ts';
import {
  chooseTimelineEntry,
  evaluateStatement,
  type StatementMeasurement,
  type TemplateContext,
  type TimelineEntry,
} from '../../../shared/statements/index.ts';

// The starter set as the server hands it to templates.
const timeline: TimelineEntry[] = TIMELINE_STARTER.map((e, i) => ({
  id: `t${i}`,
  label: e.label,
  yearsAgo: e.yearsAgo,
  uncertaintyYears: e.uncertaintyYears,
  relation: e.relation,
  phrases: { ...e.phrases },
  source: { citation: e.sourceCitation, url: e.sourceUrl },
}));
const byLabel = (label: string) => timeline.find((e) => e.label === label)!;

const src = { id: 'src-1', citation: 'Values for automated checks' };
const m = (quantity: string, value: number, extra: Partial<StatementMeasurement> = {}): StatementMeasurement => ({
  id: quantity,
  quantity,
  value,
  unit: '',
  band: null,
  source: src,
  ...extra,
});
// The astropy fixture's first model: FlatLambdaCDM(H0 = 70, Om0 = 0.3, Tcmb0 = 0).
const FLAT_70_03 = { H0: 70, Om0: 0.3 };
const ctx = (name: string, kind: string, measurements: StatementMeasurement[], entries = timeline): TemplateContext => ({
  object: { id: 'o', name, kind },
  measurements,
  model: FLAT_70_03,
  band: 'V',
  timeline: entries,
});

function ok(c: TemplateContext) {
  const r = evaluateStatement('light-set-out-timeline', c);
  if (!r.ok) throw new Error(r.reason);
  return r;
}

describe('the timeline rule (shared/statements/timeline.ts)', () => {
  const around = (yearsAgo: number, uncertaintyYears: number, label = 'A'): TimelineEntry => ({
    id: label,
    label,
    yearsAgo,
    uncertaintyYears,
    relation: 'around',
    phrases: { 'en-GB': label, 'en-US': label, 'fr-FR': label },
    source: { citation: 'invented for the rule test', url: null },
  });
  const beforeEntry = (yearsAgo: number, label = 'B'): TimelineEntry => ({ ...around(yearsAgo, 1, label), relation: 'before' });

  it('"around" needs the intervals to overlap', () => {
    expect(chooseTimelineEntry(100, { low: 95, high: 105 }, [around(110, 4)]).entry).toBeNull();
    expect(chooseTimelineEntry(100, { low: 95, high: 105 }, [around(110, 5)]).entry?.id).toBe('A');
  });

  it('"around" refuses a light interval wider than a fifth of the event’s age', () => {
    expect(chooseTimelineEntry(100, { low: 80, high: 121 }, [around(100, 1)]).entry).toBeNull();
    expect(chooseTimelineEntry(100, { low: 90, high: 110 }, [around(100, 1)]).entry?.id).toBe('A');
  });

  it('of several fitting entries, the narrowest wins; "around" before "before"', () => {
    const choice = chooseTimelineEntry(100, { low: 95, high: 105 }, [
      around(100, 5, 'wide'),
      around(102, 2, 'narrow'),
      beforeEntry(50),
    ]);
    expect(choice.entry?.id).toBe('narrow');
    expect(choice.compatible.map((e) => e.id).sort()).toEqual(['B', 'narrow', 'wide']);
  });

  it('"before" needs the whole interval older than the event, and takes the latest such event', () => {
    expect(chooseTimelineEntry(100, { low: 50, high: 150 }, [beforeEntry(60)]).entry).toBeNull();
    expect(chooseTimelineEntry(100, { low: 70, high: 150 }, [beforeEntry(60, 'late'), beforeEntry(20, 'early')]).entry?.id).toBe(
      'late',
    );
  });

  it('without an interval the value alone is compared', () => {
    expect(chooseTimelineEntry(100, null, [around(103, 3)]).entry?.id).toBe('A');
    expect(chooseTimelineEntry(100, null, [around(104, 3)]).entry).toBeNull();
  });
});

describe('“When its light set out, on Earth’s timeline” with the starter set', () => {
  it('z = 0.5: lookback 5.04 billion years (astropy fixture, FlatLambdaCDM 70/0.3) is before the Sun and Earth formed', () => {
    const r = ok(ctx('Q1', 'quasar', [m('redshift', 0.5, { sigma: 0.0005 })]));
    // astropy 5.2.1: lookback_time(z = 0.5) = 5.0406379 Gyr (tests/reference/engine/astropy-fixture.json).
    expect(r.value / 1e9).toBeCloseTo(5.0406379, 3);
    expect(r.interval!.low).toBeGreaterThan(4.5673e9 + 0.16e6);
    expect(r.texts['en-GB']).toBe(
      'The light we see tonight from Q1 set out about 5.0 billion years ago, before the Sun and Earth had formed.',
    );
    expect(r.texts['fr-FR']).toMatch(
      /^La lumière que nous recevons ce soir de Q1 est partie il y a environ 5,0 milliards d’années, avant que le Soleil et la Terre ne se forment\.$/,
    );
    const step = r.working.find((s) => s.title === 'Placing it on Earth’s timeline')!;
    expect(step.note).toMatch(/lookback time/);
    expect(step.inputs.map((i) => i.source)).toContain(byLabel('Before the Sun and Earth formed').source.citation);
  });

  it('z = 0.01: lookback 139 million years (astropy fixture) fits no entry, so the sentence makes no comparison', () => {
    const r = ok(ctx('NGC 9999 (test)', 'galaxy', [m('redshift', 0.01, { sigma: 0.00001 })]));
    // astropy 5.2.1: lookback_time(z = 0.01) = 0.13868 Gyr.
    expect(r.value / 1e9).toBeCloseTo(0.1386779, 3);
    expect(r.texts['en-GB']).toMatch(/^The light we see tonight from NGC 9999 \(test\) set out about \d+ million years ago\.$/);
    expect(r.working.at(-2)!.result.name).toBe('none');
  });

  it('a galaxy 765 ± 28 kpc away (2.50 million light-years) is placed beside the oldest stone tools', () => {
    // 765 kpc × 3.2616 ly/pc = 2.495 million years (hand-worked; distance invented for the test).
    const r = ok(ctx('Test galaxy', 'galaxy', [m('distance', 765e3, { sigma: 28e3, unit: 'pc' })]));
    expect(r.value).toBeCloseTo(765e3 * LY_PER_PC, 0);
    expect(r.texts['en-GB']).toBe(
      'The light we see tonight from Test galaxy set out about 2.5 million years ago, around the time early relatives of ours were making some of the oldest stone tools yet found.',
    );
    expect(r.model).toBeNull();
    expect(r.working.find((s) => s.title === 'Placing it on Earth’s timeline')!.note).toMatch(/distance in light-years/);
  });

  it('a nearby star (years) picks nothing from the starter set', () => {
    // 1000 / 379.21 mas = 2.637 pc = 8.6 light-years (hand-worked).
    const r = ok(ctx('Sirius', 'star', [m('parallax', 379.21, { sigma: 1.58, unit: 'mas' })]));
    expect(r.texts['en-GB']).toBe('The light we see tonight from Sirius set out about 8.60 years ago.');
    expect(r.texts['fr-FR']).toBe('La lumière que nous recevons ce soir de Sirius est partie il y a environ 8,60 ans.');
  });

  it('a recent-history entry is used for a nearby star only when the data has one', () => {
    const recent: TimelineEntry = {
      id: 'r',
      label: 'Invented recent event',
      yearsAgo: 8.6,
      uncertaintyYears: 0.5,
      relation: 'around',
      phrases: {
        'en-GB': 'around the time of an invented event',
        'en-US': 'around the time of an invented event',
        'fr-FR': 'à l’époque d’un événement inventé',
      },
      source: { citation: 'invented for this test', url: null },
    };
    const r = ok(ctx('Sirius', 'star', [m('parallax', 379.21, { sigma: 1.58, unit: 'mas' })], [...timeline, recent]));
    expect(r.texts['en-GB']).toBe(
      'The light we see tonight from Sirius set out about 8.60 years ago, around the time of an invented event.',
    );
  });

  it('is not for planets and moons', () => {
    const r = evaluateStatement('light-set-out-timeline', ctx('Jupiter', 'planet', [m('distance', 1e-5)]));
    expect(r.ok).toBe(false);
  });
});
