/**
 * Named cosmology presets, each parameter with the text of its source.
 *
 * Values were first written from memory and then checked against astropy 5.2.1
 * (`from astropy.cosmology import Planck18, WMAP9; print(Planck18, WMAP9)`):
 *   Planck18: FlatLambdaCDM(H0=67.66, Om0=0.30966, Tcmb0=2.7255, Neff=3.046, m_nu=[0, 0, 0.06] eV, Ob0=0.04897)
 *   WMAP9:    FlatLambdaCDM(H0=69.32, Om0=0.2865,  Tcmb0=2.725,  Neff=3.04,  m_nu=[0, 0, 0] eV,    Ob0=0.04628)
 * Both are flat: ΩΛ closes the sum (astropy's WMAP9 is FlatLambdaCDM, so its ΩΛ is
 * derived, ≈ 0.7134 once radiation is subtracted, rather than set).
 */
import type { CosmologyParams } from './model.ts';

/** A preset: model parameters plus a source for each. */
export interface Preset {
  params: CosmologyParams;
  label: string;
  sources: Record<string, string>;
}

const PLANCK18_REF =
  'Planck Collaboration (2020), Planck 2018 results VI, A&A 641, A6, Table 2, TT,TE,EE+lowE+lensing+BAO column';
const WMAP9_REF = 'Hinshaw et al. (2013), ApJS 208, 19, Table 4, WMAP+eCMB+BAO+H0 column (as astropy.cosmology.WMAP9)';

/** Planck 2018, as astropy's Planck18. */
export const PLANCK18: Preset = {
  label: 'Planck 2018 (flat ΛCDM, TT,TE,EE+lowE+lensing+BAO)',
  params: { name: 'planck18', H0: 67.66, Om0: 0.30966, Tcmb0: 2.7255, Neff: 3.046, m_nu: [0, 0, 0.06], Ob0: 0.04897 },
  sources: {
    H0: `${PLANCK18_REF}: H0 = 67.66 km/s/Mpc`,
    Om0: `${PLANCK18_REF}: Ωc + Ωb = 0.30966 from Ωc h² = 0.11933 and Ωb h² = 0.02242 (cold dark matter + baryons only, as astropy.cosmology.Planck18; the paper's Ωm = 0.3111 also counts the massive neutrino, which is a separate term here)`,
    Ob0: `${PLANCK18_REF}: Ωb h² = 0.02242`,
    Tcmb0: 'Fixsen (2009), ApJ 707, 916: T_CMB = 2.7255 K (the value adopted by the Planck 2018 analysis)',
    Neff: 'Planck 2018 baseline: standard N_eff = 3.046',
    m_nu: 'Planck 2018 baseline: one massive neutrino, Σm_ν = 0.06 eV',
    Ode0: 'flat model: ΩΛ = 1 − Ωm − Ωγ − Ων',
  },
};

/** WMAP nine-year, as astropy's WMAP9. */
export const WMAP9: Preset = {
  label: 'WMAP nine-year (flat ΛCDM, WMAP+eCMB+BAO+H0)',
  params: { name: 'wmap9', H0: 69.32, Om0: 0.2865, Tcmb0: 2.725, Neff: 3.04, m_nu: [0, 0, 0], Ob0: 0.04628 },
  sources: {
    H0: `${WMAP9_REF}: H0 = 69.32 km/s/Mpc`,
    Om0: `${WMAP9_REF}: Ωm = 0.2865`,
    Ob0: `${WMAP9_REF}: Ωb = 0.04628`,
    Tcmb0: 'T_CMB = 2.725 K, the COBE/FIRAS value used by the WMAP analysis (as astropy.cosmology.WMAP9)',
    Neff: 'standard N_eff = 3.04 (as astropy.cosmology.WMAP9)',
    m_nu: 'massless neutrinos (as astropy.cosmology.WMAP9)',
    Ode0: 'flat model: ΩΛ = 1 − Ωm − Ωγ − Ων',
  },
};

/** Presets by name. */
export const PRESETS = { planck18: PLANCK18, wmap9: WMAP9 } as const;
