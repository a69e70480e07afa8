#!/usr/bin/env python3
"""The relicore demo, part 3, in Python: the starting time, thermal history and initial-condition
quantities of the INVENTED toy simulation code "Orvelstep" of the fictional Hollinscarth
Simulation Group (both names are coinages for this demo).

Reads examples/data/invented_simulation.txt (or the path given as the first argument), builds
the demo universe, its thermal history (with the invented reionisation redshift), its linear
growth and a linear power spectrum (invented A_s and n_s) and prints, as ``key = value`` with 17
significant digits: the run's starting time (the age of the universe at the invented start
redshift, in Myr) and its initial x_e and T_m, the last-scattering summary of the history, the
growth factor and rate at the start redshift, sigma8, S8 and f sigma8, the leapfrog drift and
kick factors of the invented first time steps, and x_e, T_m, T_r and T_m/T_r at each invented
output redshift. It writes the linear power spectrum at the start redshift as a two-column file
(k in Mpc^-1, P in Mpc^3; the path given as the second argument). The Rust, C and Fortran
versions read the same file, print the same keys and write the same spectrum file;
examples/run_demo.sh compares the four. Every number is computed by relicore; this program only
reads, calls, converts Gyr to Myr and radians to 100 theta*, divides T_m by T_r, forms
8/h Mpc = 800/H0 Mpc, a = 1/(1 + z) and the wavenumber grid (one multiplication per point), and
prints.

Run from the repository root: ``.venv/bin/python examples/python/simulation_start.py``.
"""

from __future__ import annotations

import sys
from dataclasses import dataclass
from pathlib import Path

import numpy as np

from relicore import Universe
from relicore.decoupling import ThermalHistory
from relicore.growth import LinearGrowth, LinearPowerSpectrum

DEFAULT_INPUT = "examples/data/invented_simulation.txt"
DEFAULT_SPECTRUM = "examples/out/simulation_power_spectrum_python.txt"

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
SPECTRUM_KEYS = [
    "spectrum_scalar_amplitude",
    "spectrum_spectral_index",
    "spectrum_running",
    "spectrum_wavenumber_min_per_mpc",
    "spectrum_wavenumber_ratio",
    "spectrum_points",
]
SIMULATION_KEYS = {
    "simulation_start_redshift",
    "simulation_reionization_redshift",
    "simulation_output_redshift",
    "simulation_step_redshift",
    *SPECTRUM_KEYS,
}

# the header of the spectrum file (the same text in every language)
SPECTRUM_HEADER = [
    "# relicore demo -- INVENTED scenario: the linear matter power spectrum for the initial conditions",
    "# of the fictional toy simulation code Orvelstep (fictional Hollinscarth Simulation Group), not a real run",
    "# universe: the demo's round-number flat model below, not a published fit (massive neutrinos smooth)",
    "# column 1: k, wavenumber in Mpc^-1 (no factor of h); column 2: P(k, z) in Mpc^3 (no factor of h)",
    "# P(k, z) = (2 pi^2/k^3) A_s (k/k_p)^(n_s - 1 + alpha_s ln(k/k_p)/2) [(2/5) (c k/H0)^2 T(k) D_u(a)/Omega_m]^2",
    "# with k_p = 0.05 Mpc^-1 and T(k) the Eisenstein & Hu 1998 (ApJ 496, 605) formula with baryon oscillations",
    "# computed by relicore at the run's start redshift; the values of the model:",
]


@dataclass(frozen=True)
class Inputs:
    universe: Universe
    start_redshift: float
    reionization_redshift: float
    output_redshifts: list[float]
    step_redshifts: list[float]
    scalar_amplitude: float
    spectral_index: float
    running: float
    wavenumber_min_per_mpc: float
    wavenumber_ratio: float
    spectrum_points: int


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
    for key in ("simulation_start_redshift", "simulation_reionization_redshift", *SPECTRUM_KEYS):
        if len(values.get(key, [])) != 1:
            raise SystemExit(f"simulation_start: {key} must be given once")
    if len(values.get("simulation_step_redshift", [])) < 2:
        raise SystemExit("simulation_start: simulation_step_redshift must be given at least twice")
    points = values["spectrum_points"][0]
    if not (2.0 <= points <= 100_000.0 and points == int(points)):
        raise SystemExit("simulation_start: spectrum_points must be a whole number from 2 to 100000")
    return Inputs(
        universe=Universe(neutrino_masses_ev=tuple(masses), **kwargs),
        start_redshift=values["simulation_start_redshift"][0],
        reionization_redshift=values["simulation_reionization_redshift"][0],
        output_redshifts=values.get("simulation_output_redshift", []),
        step_redshifts=values["simulation_step_redshift"],
        scalar_amplitude=values["spectrum_scalar_amplitude"][0],
        spectral_index=values["spectrum_spectral_index"][0],
        running=values["spectrum_running"][0],
        wavenumber_min_per_mpc=values["spectrum_wavenumber_min_per_mpc"][0],
        wavenumber_ratio=values["spectrum_wavenumber_ratio"][0],
        spectrum_points=int(points),
    )


def power_spectrum(inp: Inputs) -> tuple[LinearGrowth, LinearPowerSpectrum]:
    """The growth of the input's universe and its power spectrum (invented A_s, n_s, alpha_s;
    the Eisenstein & Hu 1998 transfer function with baryon oscillations)."""
    growth = LinearGrowth(inp.universe)
    spectrum = LinearPowerSpectrum(
        growth,
        transfer_form="baryon_oscillations",
        scalar_amplitude=inp.scalar_amplitude,
        spectral_index=inp.spectral_index,
        running=inp.running,
    )
    return growth, spectrum


def wavenumber_grid(inp: Inputs) -> np.ndarray:
    """The spectrum file's wavenumbers, Mpc^-1: k_0 = the minimum, k_(i+1) = k_i * ratio by one
    multiplication per point (as the other languages form them)."""
    k = np.empty(inp.spectrum_points)
    value = inp.wavenumber_min_per_mpc
    for i in range(inp.spectrum_points):
        k[i] = value
        value *= inp.wavenumber_ratio
    return k


def show(key: str, value: float) -> None:
    print(f"{key} = {value:.16e}")


def write_spectrum_file(path: str, header_values: list[tuple[str, float]], k: np.ndarray, p: np.ndarray) -> None:
    """The two-column spectrum file: the header, ``# name = value`` lines, then ``k P`` rows."""
    lines = list(SPECTRUM_HEADER)
    lines += [f"# {name} = {value:.16e}" for name, value in header_values]
    lines += [f"{kk:.16e} {pp:.16e}" for kk, pp in zip(k.tolist(), p.tolist())]
    Path(path).write_text("\n".join(lines) + "\n")


def main(argv: list[str]) -> int:
    path = argv[1] if len(argv) > 1 else DEFAULT_INPUT
    spectrum_path = argv[2] if len(argv) > 2 else DEFAULT_SPECTRUM
    inp = read_inputs(path)
    u = inp.universe
    history = ThermalHistory(u, reionization_redshift=inp.reionization_redshift)
    print(f"# relicore simulation start (Python) -- INVENTED DATA from {path}")
    print("# fictional toy code Orvelstep (Hollinscarth Simulation Group); a demo universe, not a published fit")

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

    # the growth and the power spectrum of the initial conditions
    z0 = inp.start_redshift
    growth, spectrum = power_spectrum(inp)
    d0 = growth.growth_factor(z0)
    show("growth_start_growth_factor", d0)
    show("growth_start_growth_rate", growth.growth_rate(z0))
    show("growth_start_unnormalized_growth_factor", growth.unnormalized_growth_factor(z0))
    show("growth_unnormalized_growth_factor_today", growth.unnormalized_growth_factor(0.0))
    show("spectrum_scalar_amplitude", spectrum.scalar_amplitude)
    show("spectrum_spectral_index", inp.spectral_index)
    show("spectrum_running", inp.running)
    show("spectrum_sigma8", spectrum.sigma8)
    show("spectrum_s8", spectrum.s8)
    show("spectrum_start_sigma_8_over_h_mpc", spectrum.density_rms_in_sphere(800.0 / u.h0_km_s_mpc, z0))
    show("spectrum_start_growth_rate_times_sigma8", spectrum.growth_rate_times_sigma8(z0))
    show("spectrum_growth_rate_times_sigma8_today", spectrum.growth_rate_times_sigma8(0.0))
    steps = inp.step_redshifts
    for i, (z1, z2) in enumerate(zip(steps[:-1], steps[1:]), start=1):
        a1, a2 = 1.0 / (1.0 + z1), 1.0 / (1.0 + z2)
        show(f"step_{i}_start_scale_factor", a1)
        show(f"step_{i}_end_scale_factor", a2)
        show(f"step_{i}_drift_factor_gyr", growth.leapfrog_drift_factor_gyr(a1, a2))
        show(f"step_{i}_kick_factor_gyr", growth.leapfrog_kick_factor_gyr(a1, a2))
    k = wavenumber_grid(inp)
    p = spectrum.linear_power_spectrum_mpc3(k, z0)
    masses = u.neutrino_masses_ev
    header_values = [
        ("redshift", z0),
        ("h0_km_s_mpc", u.h0_km_s_mpc),
        ("omega_matter", u.omega_matter),
        ("omega_baryon", u.omega_baryon),
        ("omega_curvature", u.omega_curvature),
        ("cmb_temperature_k", u.cmb_temperature_k),
        ("n_eff", u.n_eff),
        ("neutrino_mass_1_ev", masses[0]),
        ("neutrino_mass_2_ev", masses[1]),
        ("neutrino_mass_3_ev", masses[2]),
        ("w0", u.w0),
        ("wa", u.wa),
        ("scalar_amplitude", spectrum.scalar_amplitude),
        ("spectral_index", inp.spectral_index),
        ("running", inp.running),
        ("sigma8_today", spectrum.sigma8),
        ("growth_factor_at_redshift", d0),
        ("points", float(inp.spectrum_points)),
    ]
    write_spectrum_file(spectrum_path, header_values, k, p)
    show("spectrum_file_points", float(inp.spectrum_points))
    show("spectrum_file_first_wavenumber_per_mpc", k[0])
    show("spectrum_file_last_wavenumber_per_mpc", k[-1])
    show("spectrum_file_first_power_mpc3", p[0])
    show("spectrum_file_last_power_mpc3", p[-1])

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
