/**
 * Demo objects with rounded, approximate values recalled from common reference works. They are
 * labelled demo and attached to the demo source; they are not checked data.
 */

interface DemoMeasurement {
  quantity: string;
  value: number;
  unit?: string;
  band?: string;
  uncertainty?: number;
  uncertaintyMinus?: number;
  uncertaintyPlus?: number;
  note?: string;
  /** Entered by the demo writer as a proposal awaiting review. */
  proposed?: boolean;
}

interface DemoObject {
  name: string;
  designations: string[];
  kind: 'star' | 'galaxy' | 'quasar' | 'nebula' | 'cluster' | 'planet' | 'moon' | 'sun' | 'other';
  ra?: string;
  dec?: string;
  notes?: string;
  /** The name as sentences use it (article, number), where it differs from the name as listed. */
  sentenceNames?: { en?: { text: string; plural: boolean }; fr?: { text: string; plural: boolean } };
  measurements: DemoMeasurement[];
}

const V = (value: number, uncertainty?: number): DemoMeasurement => ({
  quantity: 'apparent_magnitude',
  value,
  unit: 'mag',
  band: 'V',
  uncertainty,
});

export const DEMO_OBJECTS: DemoObject[] = [
  {
    name: 'Sirius',
    sentenceNames: { fr: { text: 'Sirius', plural: false } },
    designations: ['α CMa', 'HD 48915'],
    kind: 'star',
    ra: '06 45 08.9',
    dec: '-16 42 58',
    measurements: [
      V(-1.46, 0.01),
      { quantity: 'parallax', value: 379.2, unit: 'mas', uncertainty: 1.6 },
      { quantity: 'radius', value: 1.71, unit: 'R_sun' },
      { quantity: 'mass', value: 2.06, unit: 'M_sun' },
    ],
  },
  {
    name: 'Betelgeuse',
    sentenceNames: { fr: { text: 'Bételgeuse', plural: false } },
    designations: ['α Ori', 'HD 39801'],
    kind: 'star',
    ra: '05 55 10.3',
    dec: '+07 24 25',
    notes: 'A variable red supergiant: its magnitude changes.',
    measurements: [
      V(0.5, 0.2),
      { quantity: 'distance', value: 168, unit: 'pc', uncertaintyMinus: 15, uncertaintyPlus: 27 },
      { quantity: 'distance', value: 197, unit: 'pc', uncertainty: 45, note: 'An older, larger estimate.' },
      { quantity: 'radius', value: 760, unit: 'R_sun' },
    ],
  },
  {
    name: 'Vega',
    sentenceNames: { fr: { text: 'Véga', plural: false } },
    designations: ['α Lyr', 'HD 172167'],
    kind: 'star',
    ra: '18 36 56.3',
    dec: '+38 47 01',
    measurements: [
      V(0.03),
      { quantity: 'parallax', value: 130.2, unit: 'mas', uncertainty: 0.4 },
      {
        quantity: 'radius',
        value: 2.7,
        unit: 'R_sun',
        proposed: true,
        note: 'Proposed by the demo writer from a museum placard.',
      },
    ],
  },
  {
    name: 'Polaris',
    sentenceNames: { fr: { text: 'l’étoile Polaire', plural: false } },
    designations: ['α UMi', 'North Star'],
    kind: 'star',
    ra: '02 31 49.1',
    dec: '+89 15 51',
    measurements: [V(1.98), { quantity: 'parallax', value: 7.5, unit: 'mas', uncertainty: 0.1 }],
  },
  {
    name: 'Proxima Centauri',
    sentenceNames: { fr: { text: 'Proxima du Centaure', plural: false } },
    designations: ['α Cen C', 'GJ 551'],
    kind: 'star',
    ra: '14 29 43.0',
    dec: '-62 40 46',
    measurements: [
      V(11.13),
      { quantity: 'parallax', value: 768.1, unit: 'mas', uncertainty: 0.05 },
      { quantity: 'radius', value: 0.154, unit: 'R_sun' },
    ],
  },
  {
    name: 'Rigel',
    sentenceNames: { fr: { text: 'Rigel', plural: false } },
    designations: ['β Ori', 'HD 34085'],
    kind: 'star',
    ra: '05 14 32.3',
    dec: '-08 12 06',
    measurements: [V(0.13), { quantity: 'parallax', value: 3.8, unit: 'mas', uncertainty: 0.6 }],
  },
  {
    name: 'Deneb',
    sentenceNames: { fr: { text: 'Deneb', plural: false } },
    designations: ['α Cyg'],
    kind: 'star',
    ra: '20 41 25.9',
    dec: '+45 16 49',
    measurements: [V(1.25), { quantity: 'distance', value: 2600, unit: 'ly' }],
  },
  {
    name: 'Sun',
    sentenceNames: { en: { text: 'the Sun', plural: false }, fr: { text: 'le Soleil', plural: false } },
    designations: ['Sol'],
    kind: 'sun',
    notes: 'Never look at the Sun directly or through optics without a certified solar filter.',
    measurements: [
      V(-26.74),
      { quantity: 'radius', value: 1, unit: 'R_sun' },
      { quantity: 'mass', value: 1, unit: 'M_sun' },
      { quantity: 'distance', value: 1, unit: 'au' },
    ],
  },
  {
    name: 'Andromeda Galaxy',
    sentenceNames: { en: { text: 'the Andromeda Galaxy', plural: false }, fr: { text: 'la galaxie d’Andromède', plural: false } },
    designations: ['M31', 'NGC 224'],
    kind: 'galaxy',
    ra: '00 42 44.3',
    dec: '+41 16 09',
    measurements: [
      V(3.44),
      { quantity: 'distance', value: 765, unit: 'kpc', uncertainty: 30 },
      { quantity: 'redshift', value: -0.001 },
      { quantity: 'angular_size', value: 190, unit: 'arcmin' },
    ],
  },
  {
    name: 'Triangulum Galaxy',
    sentenceNames: {
      en: { text: 'the Triangulum Galaxy', plural: false },
      fr: { text: 'la galaxie du Triangle', plural: false },
    },
    designations: ['M33', 'NGC 598'],
    kind: 'galaxy',
    ra: '01 33 50.0',
    dec: '+30 39 37',
    measurements: [V(5.72), { quantity: 'distance', value: 0.86, unit: 'Mpc' }],
  },
  {
    name: 'Large Magellanic Cloud',
    sentenceNames: {
      en: { text: 'the Large Magellanic Cloud', plural: false },
      fr: { text: 'le Grand Nuage de Magellan', plural: false },
    },
    designations: ['LMC'],
    kind: 'galaxy',
    ra: '05 23 34.5',
    dec: '-69 45 22',
    measurements: [V(0.9), { quantity: 'distance', value: 50, unit: 'kpc', uncertainty: 1 }],
  },
  {
    name: 'Whirlpool Galaxy',
    sentenceNames: {
      en: { text: 'the Whirlpool Galaxy', plural: false },
      fr: { text: 'la galaxie du Tourbillon', plural: false },
    },
    designations: ['M51', 'NGC 5194'],
    kind: 'galaxy',
    ra: '13 29 52.7',
    dec: '+47 11 43',
    measurements: [V(8.4), { quantity: 'redshift', value: 0.0015 }],
  },
  {
    name: 'Messier 87',
    designations: ['M87', 'NGC 4486', 'Virgo A'],
    kind: 'galaxy',
    ra: '12 30 49.4',
    dec: '+12 23 28',
    measurements: [
      V(8.6),
      { quantity: 'redshift', value: 0.0043 },
      { quantity: 'distance', value: 16.4, unit: 'Mpc', uncertainty: 0.5 },
    ],
  },
  {
    name: 'Sombrero Galaxy',
    sentenceNames: { en: { text: 'the Sombrero Galaxy', plural: false }, fr: { text: 'la galaxie du Sombrero', plural: false } },
    designations: ['M104', 'NGC 4594'],
    kind: 'galaxy',
    ra: '12 39 59.4',
    dec: '-11 37 23',
    measurements: [V(8.0), { quantity: 'redshift', value: 0.0034 }],
  },
  {
    name: '3C 279',
    designations: ['PKS 1253-05'],
    kind: 'quasar',
    ra: '12 56 11.2',
    dec: '-05 47 22',
    measurements: [
      V(17.8, 0.3),
      { quantity: 'redshift', value: 0.536, uncertainty: 0.001 },
      { quantity: 'spectral_index', value: -0.5 },
      { quantity: 'extinction', value: 0.08, unit: 'mag', band: 'V' },
    ],
  },
  {
    name: '3C 48',
    designations: [],
    kind: 'quasar',
    ra: '01 37 41.3',
    dec: '+33 09 35',
    measurements: [V(16.2), { quantity: 'redshift', value: 0.367 }],
  },
  {
    name: 'TON 618',
    designations: [],
    kind: 'quasar',
    ra: '12 28 24.9',
    dec: '+31 28 38',
    measurements: [V(15.9), { quantity: 'redshift', value: 2.22 }],
  },
  {
    name: 'APM 08279+5255',
    designations: [],
    kind: 'quasar',
    ra: '08 31 41.7',
    dec: '+52 45 17',
    measurements: [V(15.2), { quantity: 'redshift', value: 3.91 }],
  },
  {
    name: 'Orion Nebula',
    sentenceNames: { en: { text: 'the Orion Nebula', plural: false }, fr: { text: 'la nébuleuse d’Orion', plural: false } },
    designations: ['M42', 'NGC 1976'],
    kind: 'nebula',
    ra: '05 35 17.3',
    dec: '-05 23 28',
    measurements: [
      V(4.0),
      { quantity: 'distance', value: 412, unit: 'pc', uncertainty: 7 },
      { quantity: 'angular_size', value: 65, unit: 'arcmin' },
    ],
  },
  {
    name: 'Crab Nebula',
    sentenceNames: { en: { text: 'the Crab Nebula', plural: false }, fr: { text: 'la nébuleuse du Crabe', plural: false } },
    designations: ['M1', 'NGC 1952'],
    kind: 'nebula',
    ra: '05 34 31.9',
    dec: '+22 00 52',
    measurements: [V(8.4), { quantity: 'distance', value: 2.0, unit: 'kpc', uncertainty: 0.5 }],
  },
  {
    name: 'Ring Nebula',
    sentenceNames: {
      en: { text: 'the Ring Nebula', plural: false },
      fr: { text: 'la nébuleuse annulaire de la Lyre', plural: false },
    },
    designations: ['M57', 'NGC 6720'],
    kind: 'nebula',
    ra: '18 53 35.1',
    dec: '+33 01 45',
    measurements: [V(8.8), { quantity: 'distance', value: 790, unit: 'pc' }],
  },
  {
    name: 'Pleiades',
    sentenceNames: { en: { text: 'the Pleiades', plural: true }, fr: { text: 'les Pléiades', plural: true } },
    designations: ['M45', 'Seven Sisters'],
    kind: 'cluster',
    ra: '03 47 00',
    dec: '+24 07 00',
    measurements: [
      V(1.6),
      { quantity: 'distance', value: 136, unit: 'pc', uncertainty: 1 },
      // E(B−V) ≈ 0.04 towards the cluster, so A_V ≈ 3.1 × 0.04 (recalled from memory): beyond 100 pc a
      // light-output statement needs the extinction.
      { quantity: 'extinction', value: 0.12, unit: 'mag', band: 'V', uncertainty: 0.03 },
      { quantity: 'angular_size', value: 110, unit: 'arcmin' },
    ],
  },
  {
    name: 'Omega Centauri',
    sentenceNames: { fr: { text: 'Oméga du Centaure', plural: false } },
    designations: ['NGC 5139'],
    kind: 'cluster',
    ra: '13 26 47.3',
    dec: '-47 28 46',
    measurements: [V(3.9), { quantity: 'distance', value: 5.2, unit: 'kpc' }],
  },
  {
    name: 'Hercules Globular Cluster',
    sentenceNames: {
      en: { text: 'the Hercules Globular Cluster', plural: false },
      fr: { text: 'l’amas globulaire d’Hercule', plural: false },
    },
    designations: ['M13', 'NGC 6205'],
    kind: 'cluster',
    ra: '16 41 41.2',
    dec: '+36 27 37',
    measurements: [V(5.8), { quantity: 'distance', value: 7.4, unit: 'kpc' }],
  },
  {
    name: 'Jupiter',
    designations: [],
    kind: 'planet',
    measurements: [
      { quantity: 'radius', value: 71492, unit: 'km' },
      { quantity: 'mass', value: 317.8, unit: 'M_earth' },
    ],
  },
  {
    name: 'Saturn',
    sentenceNames: { fr: { text: 'Saturne', plural: false } },
    designations: [],
    kind: 'planet',
    measurements: [
      { quantity: 'radius', value: 60268, unit: 'km' },
      { quantity: 'mass', value: 95.2, unit: 'M_earth' },
    ],
  },
  {
    name: 'Mars',
    designations: [],
    kind: 'planet',
    measurements: [
      { quantity: 'radius', value: 3389.5, unit: 'km' },
      { quantity: 'mass', value: 0.107, unit: 'M_earth' },
    ],
  },
  {
    name: 'Moon',
    sentenceNames: { en: { text: 'the Moon', plural: false }, fr: { text: 'la Lune', plural: false } },
    designations: ['Luna'],
    kind: 'moon',
    measurements: [
      { quantity: 'radius', value: 1737.4, unit: 'km' },
      { quantity: 'mass', value: 0.0123, unit: 'M_earth' },
      { quantity: 'distance', value: 384400, unit: 'km' },
    ],
  },
  { name: 'Titan', designations: ['Saturn VI'], kind: 'moon', measurements: [{ quantity: 'radius', value: 2574.7, unit: 'km' }] },
];
