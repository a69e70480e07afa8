#!/usr/bin/env python3
"""The relicore demo, part 3, in Python: the starting time and thermal history of the INVENTED
toy simulation code "Wrenfold" of the fictional Marrowgate Simulation Group.

Reads examples/data/invented_simulation.txt (or the path given as the first argument), builds
the demo universe and its thermal history (with the invented reionisation redshift) and prints,
as ``key = value`` with 17 significant digits: the run's starting time (the age of the universe
at the invented start redshift, in Myr) and its initial x_e and T_m, the last-scattering
summary of the history, and x_e, T_m, T_r and T_m/T_r at each invented output redshift. The
Rust, C and Fortran versions read the same file and print the same keys; examples/run_demo.sh
compares the four outputs. Every number is computed by relicore; this program only reads,
calls, converts Gyr to Myr and radians to 100 theta*, divides T_m by T_r and prints.

Run from the repository root: ``.venv/bin/python examples/python/simulation_start.py``.
"""

from __future__ import annotations

import sys
from dataclasses import dataclass
from pathlib import Path

from relicore import Universe
from relicore.decoupling import ThermalHistory

DEFAULT_INPUT = "examples/data/invented_simulation.txt"

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
SIMULATION_KEYS = {"simulation_start_redshift", "simulation_reionization_redshift", "simulation_output_redshift"}


@dataclass(frozen=True)
class Inputs:
    universe: Universe
    start_redshift: float
    reionization_redshift: float
    output_redshifts: list[float]


def read_inputs(path: str) -> Inputs:
    """The universe and the fictional run of the input file (every key must be given)."""
    values: dict[str, list[float]] = {}
    for line_no, raw in enumerate(Path(path).read_text().splitlines(), start=1):
        line = raw.strip()
        if not line or line.startswith("#"):
            continue
        fields = line.split()
        if len(fields) != 2:
            raise SystemExit(f"simulation_start: {path}:{line_no}: want 'key value', got {line!r}")
        key, text = fields
        if not key.startswith("universe_") and key not in SIMULATION_KEYS:
            raise SystemExit(f"simulation_start: {path}:{line_no}: unknown key {key!r}")
        try:
            values.setdefault(key, []).append(float(text))
        except ValueError:
            raise SystemExit(f"simulation_start: {path}:{line_no}: cannot read {text!r} as a number") from None
    kwargs = {}
    for key in UNIVERSE_KEYS:
        v = values.get("universe_" + key)
        if v is None or len(v) != 1:
            raise SystemExit(f"simulation_start: universe_{key} must be given once")
        kwargs[key] = v[0]
    masses = values.get("universe_neutrino_mass_ev", [])
    if len(masses) != 3:
        raise SystemExit("simulation_start: universe_neutrino_mass_ev must be given three times")
    for key in ("simulation_start_redshift", "simulation_reionization_redshift"):
        if len(values.get(key, [])) != 1:
            raise SystemExit(f"simulation_start: {key} must be given once")
    return Inputs(
        universe=Universe(neutrino_masses_ev=tuple(masses), **kwargs),
        start_redshift=values["simulation_start_redshift"][0],
        reionization_redshift=values["simulation_reionization_redshift"][0],
        output_redshifts=values.get("simulation_output_redshift", []),
    )


def show(key: str, value: float) -> None:
    print(f"{key} = {value:.16e}")


def main(argv: list[str]) -> int:
    path = argv[1] if len(argv) > 1 else DEFAULT_INPUT
    inp = read_inputs(path)
    u = inp.universe
    history = ThermalHistory(u, reionization_redshift=inp.reionization_redshift)
    print(f"# relicore simulation start (Python) -- INVENTED DATA from {path}")
    print("# fictional toy code Wrenfold (Marrowgate Simulation Group); a demo universe, not a published fit")

    z = inp.start_redshift
    show("start_redshift", z)
    show("start_age_myr", u.age_gyr(z) * 1000.0)
    show("start_ionized_fraction", history.ionized_fraction(z))
    show("start_matter_temperature_k", history.matter_temperature_k(z))
    show("start_radiation_temperature_k", u.cmb_temperature_at_k(z))
    show("start_temperature_ratio", history.matter_temperature_k(z) / u.cmb_temperature_at_k(z))

    show("reionization_redshift", inp.reionization_redshift)
    show("history_last_scattering_redshift", history.last_scattering_redshift)
    show("history_drag_redshift", history.drag_redshift)
    show("history_sound_horizon_last_scattering_mpc", history.sound_horizon_last_scattering_mpc)
    show("history_sound_horizon_drag_mpc", history.sound_horizon_drag_mpc)
    show("history_100_theta_star", history.angular_scale_last_scattering * 100.0)
    show("history_age_at_last_scattering_yr", history.age_at_last_scattering_yr)
    show("history_temperature_at_last_scattering_k", history.temperature_at_last_scattering_k)
    show("history_visibility_peak_redshift", history.visibility_peak_redshift)
    show("history_thermal_decoupling_redshift", history.thermal_decoupling_redshift)
    show("history_reionization_optical_depth", history.reionization_optical_depth)

    for i, z in enumerate(inp.output_redshifts, start=1):
        p = f"output_{i}_"
        t_m = history.matter_temperature_k(z)
        t_r = u.cmb_temperature_at_k(z)
        show(p + "z", z)
        show(p + "age_myr", u.age_gyr(z) * 1000.0)
        show(p + "ionized_fraction", history.ionized_fraction(z))
        show(p + "matter_temperature_k", t_m)
        show(p + "radiation_temperature_k", t_r)
        show(p + "temperature_ratio", t_m / t_r)
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
