#!/usr/bin/python3
"""Writes the astropy reference fixture for the sky-tonight planet positions.

Run by hand (not in CI), with Debian's python3-astropy and no network:
    /usr/bin/python3 tests/reference/sky/generate-astropy-fixture.py > tests/reference/sky/astropy-fixture.json

Positions come from astropy's built-in ephemeris (ERFA epv00 for the Earth, plan94 for the
planets), apparent geocentric places (light time, aberration, deflection) rotated from GCRS to the
true equator and equinox of date with ERFA's IAU 2006/2000A bias-precession-nutation matrix
(what astropy's TETE frame does for a geocentric observer), which is what Meeus's "apparent right
ascension and declination" are. Times are given in TT, so no IERS table is needed.
"""
import json
import sys
import warnings

from astropy.utils import iers

# No downloads: the bundled IERS-B table is enough, and nothing here needs UT1.
iers.conf.auto_download = False
iers.conf.auto_max_age = None

import astropy  # noqa: E402
import astropy.units as u  # noqa: E402
import erfa  # noqa: E402
import numpy as np  # noqa: E402
from astropy.coordinates import get_body, solar_system_ephemeris  # noqa: E402
from astropy.time import Time  # noqa: E402

PLANETS = ["mercury", "venus", "mars", "jupiter", "saturn", "uranus", "neptune"]
# 0h TT on dates spread over 1990-2040, including Meeus's Example 33.a date.
DATES = [
    ("1992-12-20", 2448976.5),
    ("2000-01-01", 2451544.5),
    ("2012-06-06", 2456084.5),
    ("2021-11-03", 2459521.5),
    ("2026-03-14", 2461113.5),
    ("2033-09-21", 2463861.5),
    ("2040-01-15", 2466168.5),
]


def true_of_date(gcrs, jde):
    """GCRS direction rotated to the true equator and equinox of date; degrees."""
    rbpn = erfa.pnm06a(jde, 0.0)
    x, y, z = rbpn @ gcrs.cartesian.xyz.value
    ra = np.degrees(np.arctan2(y, x)) % 360.0
    dec = np.degrees(np.arctan2(z, np.hypot(x, y)))
    return float(ra), float(dec)


def main():
    solar_system_ephemeris.set("builtin")
    cases = []
    with warnings.catch_warnings():
        warnings.simplefilter("error")  # any IERS or download warning stops the run
        # ERFA calls years past its leap-second table "dubious" when astropy passes an approximate
        # UT to the TDB - TT periodic terms; that changes TDB by microseconds, far below our tolerance.
        warnings.filterwarnings("ignore", message='ERFA function "taiutc" yielded 1 of "dubious year')
        warnings.filterwarnings("ignore", message='ERFA function "utctai" yielded 1 of "dubious year')
        for label, jde in DATES:
            t = Time(jde, format="jd", scale="tt")
            for body in PLANETS + ["sun"]:
                gcrs = get_body(body, t)
                ra, dec = true_of_date(gcrs, jde)
                cases.append({
                    "body": body,
                    "date": label,
                    "jde": jde,
                    "ra_deg": ra,
                    "dec_deg": dec,
                    "distance_au": float(gcrs.distance.to(u.au).value),
                })
    json.dump({
        "astropy_version": astropy.__version__,
        "ephemeris": "builtin (ERFA epv00 + plan94)",
        "frame": "apparent geocentric, true equator and equinox of date (GCRS rotated by ERFA pnm06a)",
        "cases": cases,
    }, sys.stdout, indent=1)
    sys.stdout.write("\n")


if __name__ == "__main__":
    main()
