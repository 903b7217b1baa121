/** The kinds of object the catalogue holds; the database CHECK in 202612010201 lists the same. */
export const SKY_OBJECT_KINDS = ['star', 'galaxy', 'quasar', 'nebula', 'cluster', 'planet', 'moon', 'sun', 'other'] as const;
export type SkyObjectKind = (typeof SKY_OBJECT_KINDS)[number];

/** Plain-English labels for the interface. */
export const KIND_LABELS: Record<SkyObjectKind, string> = {
  star: 'Star',
  galaxy: 'Galaxy',
  quasar: 'Quasar',
  nebula: 'Nebula',
  cluster: 'Star cluster',
  planet: 'Planet',
  moon: 'Moon',
  sun: 'Sun',
  other: 'Other',
};

/** Solar-system bodies move across the sky, so they have no fixed J2000 position. */
export const MOVING_KINDS: readonly SkyObjectKind[] = ['planet', 'moon', 'sun'];
