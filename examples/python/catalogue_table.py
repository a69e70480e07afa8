#!/usr/bin/env python3
"""The relicore demo, part 2, in Python: the distance-redshift table of the INVENTED Quillmere
Deep Field Survey's universe.

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


def main(argv: list[str]) -> int:
    path = argv[1] if len(argv) > 1 else DEFAULT_INPUT
    values = read_inputs(path)
    u = universe_of(values)
    print(f"# relicore catalogue table (Python) -- INVENTED DATA from {path}")
    print("# fictional Quillmere Deep Field Survey; a demo universe, not a published fit")
    show("universe_hubble_distance_mpc", u.hubble_distance_mpc)
    show("universe_hubble_time_gyr", u.hubble_time_gyr)
    show("universe_omega_radiation", u.omega_radiation)
    show("universe_omega_dark_energy", u.omega_dark_energy)
    show("universe_matter_radiation_equality_redshift", u.matter_radiation_equality_redshift)
    show("universe_age_today_gyr", u.age_gyr(0.0))
    for i, z in enumerate(values.get("table_redshift", []), start=1):
        p = f"redshift_{i}_"
        show(p + "z", z)
        show(p + "comoving_distance_mpc", u.comoving_distance_mpc(z))
        show(p + "luminosity_distance_mpc", u.luminosity_distance_mpc(z))
        show(p + "angular_diameter_distance_mpc", u.angular_diameter_distance_mpc(z))
        show(p + "distance_modulus", u.distance_modulus(z))
        show(p + "transverse_scale_kpc_per_arcsec", u.transverse_scale_kpc_per_arcsec(z))
        show(p + "comoving_volume_gpc3", u.comoving_volume_gpc3(z))
        show(p + "lookback_time_gyr", u.lookback_time_gyr(z))
        show(p + "age_gyr", u.age_gyr(z))
    for i, t in enumerate(values.get("table_age_gyr", []), start=1):
        show(f"age_{i}_gyr", t)
        show(f"age_{i}_redshift", u.redshift_at_age_gyr(t))
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
