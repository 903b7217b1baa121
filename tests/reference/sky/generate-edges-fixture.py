#!/usr/bin/python3
"""Writes the astropy fixture for rising, setting and twilight at the edges (edges-fixture.json).

Run by hand (not in CI), with Debian's python3-astropy and no network (about ten minutes):
    /usr/bin/python3 tests/reference/sky/generate-edges-fixture.py > tests/reference/sky/edges-fixture.json

Every night of 2025 (local noon to local noon) at four places, latitudes 50°, 60°, 70° and 78° N.
2025 is near a major lunar standstill (the Moon reaches declination ±28.7°), so the Moon skims the
horizon at high latitudes more often than in most years.

Altitudes come from astropy's built-in ephemeris (ERFA epv00 for the Earth and Sun, plan94 for the
planets, astropy's own Meeus ch. 47 Moon), geocentric places turned into topocentric geometric
altitudes (AltAz with pressure 0: no refraction) by astropy's frame machinery. They are computed
every 30 minutes and interpolated (four-point Lagrange, error under 0.001° for these latitudes) to a
one-minute grid, on which crossings are placed by linear interpolation and extremes by a parabola.

The altitudes crossed are the standard ones (Meeus ch. 15): −0°34′ for a planet's centre, −0°50′ for
the Sun's (upper limb), −6°, −12°, −18° for the twilights; for the Moon the topocentric centre at
−0°34′ − s, with s = 0.2725 π its semidiameter (π its horizontal parallax), which is Meeus's
geocentric h0 = 0.7275 π − 0°34′ seen from the surface.

UT1 − UTC: astropy's bundled IERS-B table ends in December 2022; beyond it astropy takes UT1 = UTC
(the same assumption the sky code makes; they differ by under 0.9 s, about 0.004° of hour angle).

A night's body and altitude are written out when an extreme of the altitude lies within 0.5° of that
altitude (every such night), and every 30th night whatever happens, so the file stays small.
"""
import json
import sys
import warnings
from datetime import datetime, timedelta, timezone
from zoneinfo import ZoneInfo

from astropy.utils import iers

iers.conf.auto_download = False
iers.conf.auto_max_age = None
iers.conf.iers_degraded_accuracy = "ignore"

import astropy  # noqa: E402
import astropy.units as u  # noqa: E402
import numpy as np  # noqa: E402
from astropy.coordinates import AltAz, EarthLocation, get_body, solar_system_ephemeris  # noqa: E402
from astropy.time import Time  # noqa: E402

YEAR = 2025
PLACES = [
    {"latitude": 50.0, "longitude": 14.4, "time_zone": "Europe/Prague"},
    {"latitude": 60.0, "longitude": 10.75, "time_zone": "Europe/Oslo"},
    {"latitude": 70.0, "longitude": 23.7, "time_zone": "Europe/Oslo"},
    {"latitude": 78.0, "longitude": 15.6, "time_zone": "Arctic/Longyearbyen"},
]
PLANETS = ["mercury", "venus", "mars", "jupiter", "saturn", "uranus", "neptune"]
SUN_ALTITUDES = {"sunset": -0.8333, "civil": -6.0, "nautical": -12.0, "astronomical": -18.0}
PLANET_ALTITUDE = -0.5667
NEAR_DEG = 0.5
EVERY_NTH_NIGHT = 30
COARSE_MIN = 30
PAD_MIN = 10  # samples taken this far past each end of the night, so an extreme at an end is seen
EARTH_RADIUS_KM = 6378.14  # Meeus ch. 47, the radius his parallax uses

EPOCH = datetime(YEAR, 1, 1, tzinfo=timezone.utc)
START = EPOCH - timedelta(days=1)
END = EPOCH + timedelta(days=368)
NIGHTS = 366 if YEAR % 4 == 0 else 365


def minutes(dt):
    return (dt - EPOCH).total_seconds() / 60.0


def fine_grid(coarse_t, coarse_y, fine_t):
    """Four-point Lagrange interpolation of an evenly spaced series."""
    h = coarse_t[1] - coarse_t[0]
    i = np.clip(np.floor((fine_t - coarse_t[0]) / h).astype(int), 1, len(coarse_t) - 3)
    s = (fine_t - coarse_t[i]) / h
    y0, y1, y2, y3 = coarse_y[i - 1], coarse_y[i], coarse_y[i + 1], coarse_y[i + 2]
    return (
        -s * (s - 1) * (s - 2) / 6 * y0
        + (s + 1) * (s - 1) * (s - 2) / 2 * y1
        - (s + 1) * s * (s - 2) / 2 * y2
        + (s + 1) * s * (s - 1) / 6 * y3
    )


def night_events(t, f, lo, hi, pad):
    """Crossings of zero and extremes inside [lo, hi), from one-minute samples (padded so an extreme at an end is seen)."""
    a = np.searchsorted(t, lo - pad)
    b = np.searchsorted(t, hi + pad)
    tt, ff = t[a:b], f[a:b]
    crossings = []
    above = ff > 0
    for j in np.nonzero(above[1:] != above[:-1])[0]:
        tc = tt[j] + (tt[j + 1] - tt[j]) * ff[j] / (ff[j] - ff[j + 1])
        if lo <= tc < hi:
            crossings.append([round(float(tc), 2), "r" if ff[j + 1] > ff[j] else "s"])
    extremes = []
    d = np.diff(ff)
    for j in np.nonzero(d[:-1] * d[1:] < 0)[0] + 1:
        y0, y1, y2 = ff[j - 1], ff[j], ff[j + 1]
        den = y0 - 2 * y1 + y2
        x = 0.5 * (y0 - y2) / den if den != 0 else 0.0
        te = tt[j] + x * (tt[1] - tt[0])
        ye = y1 - 0.25 * (y0 - y2) * x
        if lo <= te < hi:
            extremes.append([round(float(te), 2), "h" if den < 0 else "l", round(float(ye), 4)])
    return crossings, extremes


def main():
    solar_system_ephemeris.set("builtin")
    coarse = np.arange(minutes(START), minutes(END), COARSE_MIN, dtype=float)
    fine = np.arange(coarse[2], coarse[-3], 1.0)
    times = Time(EPOCH) + coarse * u.min
    bodies = {}
    with warnings.catch_warnings():
        # Past the IERS table astropy warns and takes UT1 = UTC and mean polar motion (arcseconds).
        warnings.simplefilter("ignore")
        for body in ["sun", "moon"] + PLANETS:
            bodies[body] = get_body(body, times)
            print(f"positions: {body}", file=sys.stderr)
        cases = []
        for p_index, place in enumerate(PLACES):
            location = EarthLocation.from_geodetic(place["longitude"] * u.deg, place["latitude"] * u.deg, 0 * u.m)
            frame = AltAz(obstime=times, location=location, pressure=0)
            series = {}
            for body, gcrs in bodies.items():
                alt = gcrs.transform_to(frame).alt.deg
                fine_alt = fine_grid(coarse, alt, fine)
                if body == "sun":
                    for key, h0 in SUN_ALTITUDES.items():
                        series[key] = fine_alt - h0
                elif body == "moon":
                    parallax = np.degrees(np.arcsin(EARTH_RADIUS_KM / gcrs.distance.to(u.km).value))
                    series["moon"] = fine_alt - fine_grid(coarse, PLANET_ALTITUDE - 0.2725 * parallax, fine)
                else:
                    series[body] = fine_alt - PLANET_ALTITUDE
                print(f"altitudes: {place['latitude']} {body}", file=sys.stderr)
            zone = ZoneInfo(place["time_zone"])
            day = datetime(YEAR, 1, 1)
            for n in range(NIGHTS):
                date = day + timedelta(days=n)
                lo = minutes(datetime(date.year, date.month, date.day, 12, tzinfo=zone).astimezone(timezone.utc))
                nxt = date + timedelta(days=1)
                hi = minutes(datetime(nxt.year, nxt.month, nxt.day, 12, tzinfo=zone).astimezone(timezone.utc))
                for key, f in series.items():
                    crossings, extremes = night_events(fine, f, lo, hi, PAD_MIN)
                    near = any(abs(e[2]) <= NEAR_DEG for e in extremes)
                    if near or n % EVERY_NTH_NIGHT == 0:
                        cases.append([p_index, date.strftime("%m-%d"), key, crossings, extremes])
    out = {
        "astropy_version": astropy.__version__,
        "ephemeris": "builtin (ERFA epv00 + plan94; Meeus ch. 47 Moon)",
        "year": YEAR,
        "minutes_from": EPOCH.isoformat(),
        "altitudes_deg": {**SUN_ALTITUDES, "planet": PLANET_ALTITUDE, "moon": "-0.5667 - 0.2725 * parallax (topocentric)"},
        "near_deg": NEAR_DEG,
        "every_nth_night": EVERY_NTH_NIGHT,
        "pad_minutes": PAD_MIN,
        "places": PLACES,
        "case_fields": ["place", "MM-DD (the evening)", "body or altitude", "crossings [minute, r|s]", "extremes [minute, h|l, altitude minus threshold deg]"],
        "cases": cases,
    }
    sys.stdout.write("{\n")
    for k, v in out.items():
        if k != "cases":
            sys.stdout.write(f" {json.dumps(k)}: {json.dumps(v)},\n")
    sys.stdout.write(' "cases": [\n')
    sys.stdout.write(",\n".join("  " + json.dumps(c, separators=(",", ":")) for c in cases))
    sys.stdout.write("\n ]\n}\n")


if __name__ == "__main__":
    main()
