#!/usr/bin/env python3
"""Writes the astropy reference fixture for the engine's cosmology tests.

Run by hand (not in CI), with Debian's python3-astropy and python3-scipy (astropy
needs scipy for its integrals; use /usr/bin/python3 if another python3 comes first on PATH):
    python3 tests/reference/engine/generate-astropy-fixture.py > tests/reference/engine/astropy-fixture.json

Each model is given in the engine's request format, so the test can send it unchanged.
"""
import json
import sys

import astropy
import numpy as np
from astropy.cosmology import FlatLambdaCDM, LambdaCDM, Planck18, WMAP9

REDSHIFTS = [0.001, 0.01, 0.05, 0.1, 0.25, 0.5, 0.75, 1.0, 1.5, 2.0, 3.0, 4.0, 5.0, 7.0, 10.0, 13.0, 16.0, 20.0]


def case_models():
    """(request model, astropy cosmology, has radiation or neutrinos)."""
    out = []
    # Flat, no radiation.
    for h0, om in [(70.0, 0.3), (67.0, 0.05), (72.0, 1.0), (60.0, 0.5)]:
        out.append(({"H0": h0, "Om0": om}, FlatLambdaCDM(H0=h0, Om0=om, Tcmb0=0), False))
    # Curved, no radiation: open and closed.
    for h0, om, ode in [(70.0, 0.3, 0.5), (70.0, 0.3, 0.0), (65.0, 0.4, 0.8), (70.0, 1.3, 0.1)]:
        out.append(({"H0": h0, "Om0": om, "Ode0": ode}, LambdaCDM(H0=h0, Om0=om, Ode0=ode, Tcmb0=0), False))
    # Radiation with massless neutrinos: flat, open, closed.
    out.append(({"H0": 67.7, "Om0": 0.31, "Tcmb0": 2.7255, "Neff": 3.046},
                FlatLambdaCDM(H0=67.7, Om0=0.31, Tcmb0=2.7255, Neff=3.046), True))
    out.append(({"H0": 70.0, "Om0": 0.25, "Ode0": 0.6, "Tcmb0": 2.725, "Neff": 3.04},
                LambdaCDM(H0=70.0, Om0=0.25, Ode0=0.6, Tcmb0=2.725, Neff=3.04), True))
    out.append(({"H0": 70.0, "Om0": 0.35, "Ode0": 0.75, "Tcmb0": 2.725, "Neff": 3.04},
                LambdaCDM(H0=70.0, Om0=0.35, Ode0=0.75, Tcmb0=2.725, Neff=3.04), True))
    # Massive neutrinos.
    out.append(({"preset": "planck18"}, Planck18, True))
    out.append(({"preset": "wmap9"}, WMAP9, True))
    out.append(({"H0": 70.0, "Om0": 0.3, "Tcmb0": 2.7255, "Neff": 3.046, "m_nu": [0.05, 0.1, 0.2]},
                FlatLambdaCDM(H0=70.0, Om0=0.3, Tcmb0=2.7255, Neff=3.046, m_nu=[0.05, 0.1, 0.2]), True))
    out.append(({"H0": 68.0, "Om0": 0.3, "Ode0": 0.65, "Tcmb0": 2.7255, "Neff": 3.5, "m_nu": [0.0, 0.1, 0.3]},
                LambdaCDM(H0=68.0, Om0=0.3, Ode0=0.65, Tcmb0=2.7255, Neff=3.5, m_nu=[0.0, 0.1, 0.3]), True))
    return out


def main():
    models = []
    for request_model, cosmo, radiation in case_models():
        z = np.array(REDSHIFTS)
        cases = []
        values = {
            "comoving_distance": cosmo.comoving_distance(z).value,
            "transverse_comoving_distance": cosmo.comoving_transverse_distance(z).value,
            "angular_diameter_distance": cosmo.angular_diameter_distance(z).value,
            "luminosity_distance": cosmo.luminosity_distance(z).value,
            "lookback_time": cosmo.lookback_time(z).value,
            "age_at_z": cosmo.age(z).value,
            "hubble_parameter": cosmo.H(z).value,
            "distance_modulus": cosmo.distmod(z).value,
        }
        for i, zi in enumerate(REDSHIFTS):
            cases.append({"z": zi, **{k: float(v[i]) for k, v in values.items()}})
        models.append({
            "description": repr(cosmo),
            "radiation": radiation,
            "model": request_model,
            "age_now": float(cosmo.age(0).value),
            "cases": cases,
        })
    json.dump({
        "generator": "tests/reference/engine/generate-astropy-fixture.py",
        "astropy_version": astropy.__version__,
        "numpy_version": np.__version__,
        "units": {"distances": "Mpc", "times": "Gyr", "hubble_parameter": "km/s/Mpc", "distance_modulus": "mag"},
        "models": models,
    }, sys.stdout, indent=1)
    sys.stdout.write("\n")


if __name__ == "__main__":
    main()
