#!/usr/bin/env python3
"""The relicore demo, part 2, in Python: the table of the INVENTED Quillmere Deep Field Survey's
follow-up objects (per object: luminosity distance, distance modulus, apparent magnitude,
half-light radius as an angle, lookback time, age of the universe when the light left).

Reads examples/data/invented_catalogue.txt (or the path given as the first argument) and prints
every computed quantity as ``key = value`` with 17 significant digits. The Rust, C and Fortran
versions read the same file and print the same keys; examples/run_demo.sh compares the four
outputs. Every number is computed by relicore; this program only reads, calls and prints.

Run from the repository root: ``.venv/bin/python examples/python/catalogue_table.py``.
"""

from __future__ import annotations

import sys
from pathlib import Path

from relicore import Universe

DEFAULT_INPUT = "examples/data/invented_catalogue.txt"

UNIVERSE_KEYS = [
    "h0_km_s_mpc",
    "omega_matter",
    "omega_baryon",
    "omega_curvature",
    "cmb_temperature_k",
    "n_eff",
    "w0",
    "wa",
    "helium_mass_fraction",
]


def read_inputs(path: str) -> dict[str, list[float]]:
    """Every key of the file with its values in file order (catalogue_ keys included)."""
    values: dict[str, list[float]] = {}
    for line_no, raw in enumerate(Path(path).read_text().splitlines(), start=1):
        line = raw.strip()
        if not line or line.startswith("#"):
            continue
        fields = line.split()
        if len(fields) != 2:
            raise SystemExit(f"catalogue_table: {path}:{line_no}: want 'key value', got {line!r}")
        key, text = fields
        try:
            values.setdefault(key, []).append(float(text))
        except ValueError:
            raise SystemExit(f"catalogue_table: {path}:{line_no}: cannot read {text!r} as a number") from None
    return values


def universe_of(values: dict[str, list[float]]) -> Universe:
    """The universe of the input file (every parameter must be given)."""
    kwargs = {}
    for key in UNIVERSE_KEYS:
        v = values.get("universe_" + key)
        if v is None or len(v) != 1:
            raise SystemExit(f"catalogue_table: universe_{key} must be given once")
        kwargs[key] = v[0]
    masses = values.get("universe_neutrino_mass_ev", [])
    if len(masses) != 3:
        raise SystemExit("catalogue_table: universe_neutrino_mass_ev must be given three times")
    return Universe(neutrino_masses_ev=tuple(masses), **kwargs)


def show(key: str, value: float) -> None:
    print(f"{key} = {value:.16e}")


OBJECT_KEYS = ["object_redshift", "object_absolute_magnitude", "object_half_light_radius_kpc"]


def objects_of(values: dict[str, list[float]]) -> list[tuple[float, float, float]]:
    """The follow-up objects: (redshift, absolute magnitude, half-light radius in kpc) each."""
    lists = [values.get(key, []) for key in OBJECT_KEYS]
    if len({len(v) for v in lists}) != 1:
        raise SystemExit("catalogue_table: " + ", ".join(OBJECT_KEYS) + " must be given equally often")
    return list(zip(*lists))


def main(argv: list[str]) -> int:
    path = argv[1] if len(argv) > 1 else DEFAULT_INPUT
    values = read_inputs(path)
    u = universe_of(values)
    print(f"# relicore catalogue table (Python) -- INVENTED DATA from {path}")
    print("# fictional Quillmere Deep Field Survey; an invented universe, not a published fit")
    show("universe_age_today_gyr", u.age_gyr(0.0))
    for i, (z, m_abs, radius_kpc) in enumerate(objects_of(values), start=1):
        p = f"object_{i}_"
        show(p + "redshift", z)
        show(p + "absolute_magnitude", m_abs)
        show(p + "half_light_radius_kpc", radius_kpc)
        show(p + "luminosity_distance_mpc", u.luminosity_distance_mpc(z))
        modulus = u.distance_modulus(z)
        show(p + "distance_modulus", modulus)
        show(p + "apparent_magnitude", m_abs + modulus)
        show(p + "half_light_radius_arcsec", radius_kpc / u.transverse_scale_kpc_per_arcsec(z))
        show(p + "lookback_time_gyr", u.lookback_time_gyr(z))
        show(p + "age_at_emission_gyr", u.age_gyr(z))
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
