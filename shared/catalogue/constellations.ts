/**
 * Which constellation a position lies in, by the standard method of Roman (1987), PASP 99, 695:
 * precess the J2000 position to the equinox of B1875.0, where the IAU boundaries (Delporte 1930)
 * run along lines of constant right ascension and declination, then take the first strip of the
 * published table (CDS VI/42) that contains it.
 */
import boundaries from './constellation-boundaries-roman-1987.json' with { type: 'json' };

type Strip = [raLowHours: number, raHighHours: number, decLowDeg: number, abbreviation: string];

const STRIPS = boundaries.rows as Strip[];

/** Julian date of the Besselian epoch B1875.0: 2415020.31352 + (1875 − 1900) × 365.242198781 days. */
const JD_B1875 = 2415020.31352 + (1875 - 1900) * 365.242198781;
const JD_J2000 = 2451545.0;
const ARCSEC = Math.PI / (180 * 3600);
const DEG = Math.PI / 180;

/**
 * Precesses a J2000.0 position to the mean equinox of B1875.0 with the IAU 1976 precession angles
 * (Lieske et al. 1977, as given in Meeus, Astronomical Algorithms, 2nd ed., eq. 21.2–21.4).
 * @param raDeg right ascension (J2000) in degrees
 * @param decDeg declination (J2000) in degrees
 * @returns the B1875.0 position in degrees, right ascension in [0, 360)
 */
export function precessJ2000ToB1875(raDeg: number, decDeg: number): { raDeg: number; decDeg: number } {
  const t = (JD_B1875 - JD_J2000) / 36525;
  const zeta = (2306.2181 * t + 0.30188 * t * t + 0.017998 * t ** 3) * ARCSEC;
  const z = (2306.2181 * t + 1.09468 * t * t + 0.018203 * t ** 3) * ARCSEC;
  const theta = (2004.3109 * t - 0.42665 * t * t - 0.041833 * t ** 3) * ARCSEC;
  const ra0 = raDeg * DEG;
  const dec0 = decDeg * DEG;
  const a = Math.cos(dec0) * Math.sin(ra0 + zeta);
  const b = Math.cos(theta) * Math.cos(dec0) * Math.cos(ra0 + zeta) - Math.sin(theta) * Math.sin(dec0);
  const c = Math.sin(theta) * Math.cos(dec0) * Math.cos(ra0 + zeta) + Math.cos(theta) * Math.sin(dec0);
  let ra = (Math.atan2(a, b) + z) / DEG;
  ra = ((ra % 360) + 360) % 360;
  // Near the poles asin loses precision; the vector form keeps it.
  const dec = Math.atan2(c, Math.hypot(a, b)) / DEG;
  return { raDeg: ra, decDeg: dec };
}

/**
 * The IAU three-letter abbreviation of the constellation containing a J2000 position.
 * @param raDeg right ascension (J2000) in degrees, 0 ≤ ra < 360
 * @param decDeg declination (J2000) in degrees, −90 ≤ dec ≤ 90
 * @returns e.g. "Ori"; every position on the sky has exactly one
 * @throws RangeError when the position is not a finite point on the sky
 */
export function constellationAt(raDeg: number, decDeg: number): string {
  if (!Number.isFinite(raDeg) || !Number.isFinite(decDeg) || decDeg < -90 || decDeg > 90) {
    throw new RangeError('The position must have a finite right ascension and a declination between −90° and +90°.');
  }
  const p = precessJ2000ToB1875(raDeg, decDeg);
  const raHours = p.raDeg / 15;
  for (const [raLow, raHigh, decLow, abbreviation] of STRIPS) {
    if (p.decDeg >= decLow && raHours >= raLow && raHours < raHigh) return abbreviation;
  }
  // The last strip covers the whole sky down to −90°, so this is unreachable for valid input.
  return 'Oct';
}

/** The 88 IAU constellations: abbreviation → Latin name. */
export const CONSTELLATION_NAMES: Readonly<Record<string, string>> = Object.freeze({
  And: 'Andromeda',
  Ant: 'Antlia',
  Aps: 'Apus',
  Aqr: 'Aquarius',
  Aql: 'Aquila',
  Ara: 'Ara',
  Ari: 'Aries',
  Aur: 'Auriga',
  Boo: 'Boötes',
  Cae: 'Caelum',
  Cam: 'Camelopardalis',
  Cnc: 'Cancer',
  CVn: 'Canes Venatici',
  CMa: 'Canis Major',
  CMi: 'Canis Minor',
  Cap: 'Capricornus',
  Car: 'Carina',
  Cas: 'Cassiopeia',
  Cen: 'Centaurus',
  Cep: 'Cepheus',
  Cet: 'Cetus',
  Cha: 'Chamaeleon',
  Cir: 'Circinus',
  Col: 'Columba',
  Com: 'Coma Berenices',
  CrA: 'Corona Australis',
  CrB: 'Corona Borealis',
  Crv: 'Corvus',
  Crt: 'Crater',
  Cru: 'Crux',
  Cyg: 'Cygnus',
  Del: 'Delphinus',
  Dor: 'Dorado',
  Dra: 'Draco',
  Equ: 'Equuleus',
  Eri: 'Eridanus',
  For: 'Fornax',
  Gem: 'Gemini',
  Gru: 'Grus',
  Her: 'Hercules',
  Hor: 'Horologium',
  Hya: 'Hydra',
  Hyi: 'Hydrus',
  Ind: 'Indus',
  Lac: 'Lacerta',
  Leo: 'Leo',
  LMi: 'Leo Minor',
  Lep: 'Lepus',
  Lib: 'Libra',
  Lup: 'Lupus',
  Lyn: 'Lynx',
  Lyr: 'Lyra',
  Men: 'Mensa',
  Mic: 'Microscopium',
  Mon: 'Monoceros',
  Mus: 'Musca',
  Nor: 'Norma',
  Oct: 'Octans',
  Oph: 'Ophiuchus',
  Ori: 'Orion',
  Pav: 'Pavo',
  Peg: 'Pegasus',
  Per: 'Perseus',
  Phe: 'Phoenix',
  Pic: 'Pictor',
  Psc: 'Pisces',
  PsA: 'Piscis Austrinus',
  Pup: 'Puppis',
  Pyx: 'Pyxis',
  Ret: 'Reticulum',
  Sge: 'Sagitta',
  Sgr: 'Sagittarius',
  Sco: 'Scorpius',
  Scl: 'Sculptor',
  Sct: 'Scutum',
  Ser: 'Serpens',
  Sex: 'Sextans',
  Tau: 'Taurus',
  Tel: 'Telescopium',
  Tri: 'Triangulum',
  TrA: 'Triangulum Australe',
  Tuc: 'Tucana',
  UMa: 'Ursa Major',
  UMi: 'Ursa Minor',
  Vel: 'Vela',
  Vir: 'Virgo',
  Vol: 'Volans',
  Vul: 'Vulpecula',
});
