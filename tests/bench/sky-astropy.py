#!/usr/bin/python3
"""Times astropy's get_body (built-in ephemeris, offline) for a list of positions read from stdin.

Input: JSON [{"body": "venus", "jde": 2461113.5}, ...]. Output: JSON with the astropy version and
seconds for one get_body call per position (as the TypeScript side computes them) and for one
vectorised call per body. Used by tests/bench/sky.ts; not a test.
"""
import json
import sys
import time
import warnings

from astropy.utils import iers

iers.conf.auto_download = False
iers.conf.auto_max_age = None

import astropy  # noqa: E402
from astropy.coordinates import get_body, solar_system_ephemeris  # noqa: E402
from astropy.time import Time  # noqa: E402


def main():
    places = json.load(sys.stdin)
    solar_system_ephemeris.set("builtin")
    warnings.simplefilter("ignore")  # far-future "dubious year" notes only; the timing is what matters
    get_body("venus", Time(2461113.5, format="jd", scale="tt"))  # warm caches once, as the JS side warms up
    start = time.perf_counter()
    for p in places:
        get_body(p["body"], Time(p["jde"], format="jd", scale="tt"))
    one_by_one = time.perf_counter() - start
    start = time.perf_counter()
    for body in sorted({p["body"] for p in places}):
        jdes = [p["jde"] for p in places if p["body"] == body]
        get_body(body, Time(jdes, format="jd", scale="tt"))
    vectorised = time.perf_counter() - start
    json.dump({"astropy_version": astropy.__version__, "positions": len(places), "one_by_one_s": one_by_one, "vectorised_s": vectorised}, sys.stdout)


if __name__ == "__main__":
    main()
