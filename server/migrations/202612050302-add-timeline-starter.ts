import type { Migration } from './runner.ts';
import { TIMELINE_STARTER } from './data/timeline-starter.ts';

// The starter timeline (published sources named in each entry); admins edit it from then on.
export const up: Migration['up'] = async ({ context: qi }) => {
  const now = new Date();
  await qi.bulkInsert(
    'timeline_entries',
    TIMELINE_STARTER.map((e) => ({
      id: crypto.randomUUID(),
      label: e.label,
      years_ago: e.yearsAgo,
      uncertainty_years: e.uncertaintyYears,
      relation: e.relation,
      phrases: JSON.stringify(e.phrases),
      source_citation: e.sourceCitation,
      source_url: e.sourceUrl,
      note: e.note,
      created_at: now,
      updated_at: now,
    })),
  );
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.bulkDelete('timeline_entries', { label: TIMELINE_STARTER.map((e) => e.label) });
};
