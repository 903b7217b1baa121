/**
 * The starter timeline every organisation begins with (admins edit it). Built only from published
 * standards and papers named in each entry. Every value here was recalled from memory when the set
 * was written, and each entry's note says so: check it against the source before relying on it.
 * Uncertainties are the source's own (±); where the chart prints none, half a unit of its last
 * digit (common practice), as the note says.
 */
export const TIMELINE_STARTER = [
  {
    label: 'Oldest solids of the Solar System',
    yearsAgo: 4.5673e9,
    uncertaintyYears: 0.16e6,
    relation: 'around',
    phrases: {
      'en-GB': 'around the time the first solid grains of our Solar System formed',
      'en-US': 'around the time the first solid grains of our Solar System formed',
      'fr-FR': 'à l’époque où se formaient les premiers grains solides de notre Système solaire',
    },
    sourceCitation:
      'Lead–lead ages of calcium–aluminium-rich inclusions in meteorites, 4567.30 ± 0.16 million years: Science 338, 651–655 (2012)',
    sourceUrl: null,
    note: 'Recalled from memory (value and reference); check against the paper.',
  },
  {
    label: 'Before the Sun and Earth formed',
    yearsAgo: 4.5673e9,
    uncertaintyYears: 0.16e6,
    relation: 'before',
    phrases: {
      'en-GB': 'before the Sun and Earth had formed',
      'en-US': 'before the Sun and Earth had formed',
      'fr-FR': 'avant que le Soleil et la Terre ne se forment',
    },
    sourceCitation:
      'Lead–lead ages of calcium–aluminium-rich inclusions in meteorites (the oldest solids of the Solar System), 4567.30 ± 0.16 million years: Science 338, 651–655 (2012)',
    sourceUrl: null,
    note: 'Recalled from memory (value and reference); the Sun and Earth are younger than the oldest solids, so light older than them predates both.',
  },
  {
    label: 'Oldest known mineral grains on Earth',
    yearsAgo: 4.404e9,
    uncertaintyYears: 8e6,
    relation: 'around',
    phrases: {
      'en-GB': 'around the age of the oldest mineral grains yet found on Earth',
      'en-US': 'around the age of the oldest mineral grains yet found on Earth',
      'fr-FR': 'à l’âge des plus anciens grains minéraux trouvés sur Terre',
    },
    sourceCitation:
      'Detrital zircon from the Jack Hills, Western Australia, 4.404 ± 0.008 billion years: Nature 409, 175–178 (2001)',
    sourceUrl: null,
    note: 'Recalled from memory (value and reference); check against the paper.',
  },
  {
    label: 'Base of the Cambrian',
    yearsAgo: 538.8e6,
    uncertaintyYears: 0.2e6,
    relation: 'around',
    phrases: {
      'en-GB': 'around the start of the Cambrian period, when many groups of animals first appear in the fossil record',
      'en-US': 'around the start of the Cambrian period, when many groups of animals first appear in the fossil record',
      'fr-FR': 'au début du Cambrien, quand de nombreux groupes d’animaux apparaissent dans les fossiles',
    },
    sourceCitation:
      'International Chronostratigraphic Chart v2023/09, International Commission on Stratigraphy: base of the Cambrian, 538.8 ± 0.2 Ma',
    sourceUrl: 'https://stratigraphy.org/chart',
    note: 'Recalled from memory; check against the chart version named.',
  },
  {
    label: 'End-Permian mass extinction (base of the Triassic)',
    yearsAgo: 251.902e6,
    uncertaintyYears: 0.024e6,
    relation: 'around',
    phrases: {
      'en-GB': 'around the time of the largest known mass extinction, at the end of the Permian period',
      'en-US': 'around the time of the largest known mass extinction, at the end of the Permian period',
      'fr-FR': 'à l’époque de la plus grande extinction de masse connue, à la fin du Permien',
    },
    sourceCitation:
      'International Chronostratigraphic Chart v2023/09, International Commission on Stratigraphy: base of the Triassic, 251.902 ± 0.024 Ma',
    sourceUrl: 'https://stratigraphy.org/chart',
    note: 'Recalled from memory; check against the chart version named.',
  },
  {
    label: 'End of the Cretaceous (base of the Paleogene)',
    yearsAgo: 66.0e6,
    uncertaintyYears: 0.05e6,
    relation: 'around',
    phrases: {
      'en-GB': 'around the time the dinosaurs, apart from birds, died out',
      'en-US': 'around the time the dinosaurs, apart from birds, died out',
      'fr-FR': 'à l’époque où les dinosaures, hormis les oiseaux, ont disparu',
    },
    sourceCitation:
      'International Chronostratigraphic Chart v2023/09, International Commission on Stratigraphy: base of the Paleogene, 66.0 Ma',
    sourceUrl: 'https://stratigraphy.org/chart',
    note: 'Recalled from memory. The chart prints 66.0 without an uncertainty; ±0.05 million years is half a unit of its last digit (common practice).',
  },
  {
    label: 'Oldest Oldowan stone tools (Gona, Ethiopia)',
    yearsAgo: 2.55e6,
    uncertaintyYears: 0.05e6,
    relation: 'around',
    phrases: {
      'en-GB': 'around the time early relatives of ours were making some of the oldest stone tools yet found',
      'en-US': 'around the time early relatives of ours were making some of the oldest stone tools yet found',
      'fr-FR': 'à l’époque où de lointains parents de notre espèce taillaient certains des plus anciens outils de pierre connus',
    },
    sourceCitation: 'Stone tools from Gona, Ethiopia, dated to 2.6–2.5 million years ago: Nature 385, 333–336 (1997)',
    sourceUrl: null,
    note: 'Recalled from memory (value and reference). The paper gives a range, 2.6–2.5 million years; entered as its middle ± half its width.',
  },
] as const;
