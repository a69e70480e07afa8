#!/usr/bin/env python3
"""The relicore demo in Python: a fictional observatory's balloon radiometer and a fictional
handheld infrared thermometer, from INVENTED data.

Reads examples/data/invented_radiometer.txt (or the path given as the first argument) and
prints every computed quantity as ``key = value`` with 17 significant digits. The Rust, C and
Fortran versions read the same file and print the same keys; examples/run_demo.sh compares the
four outputs. Every number is computed by relicore; this program only reads, calls and prints.

Run from the repository root: ``.venv/bin/python examples/python/radiometer_demo.py``.
"""

from __future__ import annotations

import sys
from dataclasses import dataclass, field
from pathlib import Path

import relicore.blackbody as bb

DEFAULT_INPUT = "examples/data/invented_radiometer.txt"

SCALAR_KEYS = {
    "radiometer_frequency_hz": "frequency_hz",
    "hot_load_temperature_k": "hot_temperature_k",
    "hot_load_reading_v": "hot_reading_v",
    "cold_load_temperature_k": "cold_temperature_k",
    "cold_load_reading_v": "cold_reading_v",
    "cmb_temperature_k": "cmb_temperature_k",
    "thermometer_band_lower_m": "band_lower_m",
    "thermometer_band_upper_m": "band_upper_m",
    "thermometer_check_temperature_k": "check_temperature_k",
}
LIST_KEYS = {
    "sky_reading_v": "sky_readings_v",
    "thermometer_reading_w_m2_sr": "thermometer_readings_w_m2_sr",
    "curve_temperature_k": "curve_temperatures_k",
}


@dataclass
class Inputs:
    """The demo inputs, as read from the data file."""

    frequency_hz: float = 0.0
    hot_temperature_k: float = 0.0
    hot_reading_v: float = 0.0
    cold_temperature_k: float = 0.0
    cold_reading_v: float = 0.0
    cmb_temperature_k: float = 0.0
    band_lower_m: float = 0.0
    band_upper_m: float = 0.0
    check_temperature_k: float = 0.0
    sky_readings_v: list[float] = field(default_factory=list)
    response_wavelengths_m: list[float] = field(default_factory=list)
    response: list[float] = field(default_factory=list)
    thermometer_readings_w_m2_sr: list[float] = field(default_factory=list)
    curve_temperatures_k: list[float] = field(default_factory=list)


def read_inputs(path: str | Path) -> Inputs:
    """Parses the plain-text input file (format described in its header)."""
    inp = Inputs()
    for line_no, raw in enumerate(Path(path).read_text().splitlines(), start=1):
        tokens = raw.split()
        if not tokens or tokens[0].startswith("#"):
            continue
        key, values = tokens[0], [float(t) for t in tokens[1:]]
        want = 2 if key == "thermometer_response" else 1
        if len(values) != want:
            raise SystemExit(f"radiometer_demo: line {line_no}: {key} takes {want} value(s)")
        if key in SCALAR_KEYS:
            setattr(inp, SCALAR_KEYS[key], values[0])
        elif key in LIST_KEYS:
            getattr(inp, LIST_KEYS[key]).append(values[0])
        elif key == "thermometer_response":
            inp.response_wavelengths_m.append(values[0])
            inp.response.append(values[1])
        else:
            raise SystemExit(f"radiometer_demo: line {line_no}: unknown key {key!r}")
    return inp


def compute(inp: Inputs) -> list[tuple[str, float]]:
    """Every demo quantity, in the order all four programs print them, as (key, value)."""
    out: list[tuple[str, float]] = []
    # Part 1: the balloon radiometer.
    nu = inp.frequency_hz
    cal = bb.two_load_calibration(nu, inp.hot_reading_v, inp.hot_temperature_k, inp.cold_reading_v, inp.cold_temperature_k)
    out.append(("calibration_gain_v_per_k", cal.gain))
    out.append(("calibration_offset_v", cal.offset))
    b_hot = bb.spectral_radiance_frequency(nu, inp.hot_temperature_k)
    out.append(("hot_load_spectral_radiance_w_m2_sr_hz", b_hot))
    out.append(("hot_load_brightness_temperature_k", bb.brightness_temperature_frequency(nu, b_hot)))
    out.append(("hot_load_rayleigh_jeans_temperature_k", bb.calibrated_brightness_temperature(cal, inp.hot_reading_v)))
    out.append(("cold_load_rayleigh_jeans_temperature_k", bb.calibrated_brightness_temperature(cal, inp.cold_reading_v)))
    for n, reading in enumerate(inp.sky_readings_v, start=1):
        out.append((f"sky_{n}_rayleigh_jeans_temperature_k", bb.calibrated_brightness_temperature(cal, reading)))
        out.append((f"sky_{n}_physical_temperature_k", bb.calibrated_temperature(cal, reading)))
    out.append(
        ("cmb_thermodynamic_to_rayleigh_jeans_factor", bb.thermodynamic_to_rayleigh_jeans_factor(nu, inp.cmb_temperature_k))
    )
    # Part 2: the handheld infrared thermometer.
    w, r = inp.response_wavelengths_m, inp.response
    out.append(("thermometer_check_radiance_w_m2_sr", bb.response_weighted_radiance(w, r, inp.check_temperature_k)))
    for n, reading in enumerate(inp.thermometer_readings_w_m2_sr, start=1):
        t = bb.temperature_from_response_weighted_radiance(w, r, reading)
        out.append((f"target_{n}_temperature_k", t))
        out.append((f"target_{n}_band_radiance_w_m2_sr", bb.band_radiance_wavelength(inp.band_lower_m, inp.band_upper_m, t)))
    # Blackbody curves: the peaks the plot marks.
    for n, t in enumerate(inp.curve_temperatures_k, start=1):
        peak = bb.peak_wavelength(t)
        out.append((f"curve_{n}_peak_wavelength_m", peak))
        out.append((f"curve_{n}_peak_spectral_radiance_w_m2_sr_m", bb.spectral_radiance_wavelength(peak, t)))
    return out


def main(argv: list[str]) -> int:
    path = argv[1] if len(argv) > 1 else DEFAULT_INPUT
    inp = read_inputs(path)
    print(f"# relicore radiometer demo (Python) -- INVENTED DATA from {path}")
    print("# fictional Glimmerfen Ridge Observatory; no real instrument or measurement")
    for key, value in compute(inp):
        print(f"{key} = {value:.16e}")
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
