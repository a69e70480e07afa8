#!/usr/bin/env python3
"""Plots of the relicore demo (INVENTED data, fictional Glimmerfen Ridge Observatory).

Usage: plot_demo.py [INPUT_FILE] [OUTPUT_DIR]   (defaults: examples/data/invented_radiometer.txt,
examples/out)

Writes two PNG files and prints their paths:
  blackbody_curves.png        B_lambda for the curve temperatures of the input file (log-log),
                              the fictional thermometer's band shaded, its invented response
                              table drawn, the peaks marked (their wavelengths in the legend);
  radiometer_calibration.png  the fictional radiometer's two-load calibration: Rayleigh-Jeans
                              brightness temperature and physical temperature against the raw
                              reading, with the two loads and the invented sky readings.
Every plotted value comes from relicore; this script only calls it and draws.
"""

from __future__ import annotations

import sys
from pathlib import Path

import matplotlib

matplotlib.use("Agg")
import matplotlib.pyplot as plt  # noqa: E402
import numpy as np  # noqa: E402

import relicore.blackbody as bb  # noqa: E402
from radiometer_demo import DEFAULT_INPUT, Inputs, read_inputs  # noqa: E402

INVENTED = "invented data, fictional instruments (relicore demo)"


def plot_blackbody_curves(inp: Inputs, path: Path) -> None:
    wavelengths_m = np.geomspace(0.1e-6, 100e-6, 2000)
    fig, (ax, resp) = plt.subplots(
        2, 1, figsize=(8.5, 7.5), sharex=True, gridspec_kw={"height_ratios": [4, 1], "hspace": 0.08}
    )
    band_um = (inp.band_lower_m * 1e6, inp.band_upper_m * 1e6)
    band_label = f"thermometer band {band_um[0]:g}–{band_um[1]:g} µm"
    for a in (ax, resp):
        a.axvspan(*band_um, color="tab:orange", alpha=0.15, label=band_label)
    peaks_b = []
    for t in inp.curve_temperatures_k:
        radiance = bb.spectral_radiance_wavelength(wavelengths_m, t)
        peak_m = bb.peak_wavelength(t)
        peak_b = bb.spectral_radiance_wavelength(peak_m, t)
        peaks_b.append(peak_b)
        # the peak wavelength goes into the legend, not onto the plot, where curves would cross it
        (line,) = ax.loglog(wavelengths_m * 1e6, radiance, label=f"$T$ = {t:g} K, peak at {peak_m * 1e6:.4g} µm")
        ax.plot(peak_m * 1e6, peak_b, "o", color=line.get_color())
    ax.plot([], [], "o", color="0.3", label="peak of $B_\\lambda$ (dots)")
    # the floor three decades below the lowest peak, so every curve is drawn around its peak
    ax.set_ylim(min(peaks_b) * 1e-3, max(peaks_b) * 30)
    ax.set_ylabel("spectral radiance $B_\\lambda$ (W m$^{-2}$ sr$^{-1}$ m$^{-1}$)")
    ax.set_title("Planck curves and their peak wavelengths, from relicore")
    ax.grid(True, which="major", alpha=0.3)
    ax.legend(loc="upper right", fontsize=8)

    resp.plot(
        np.asarray(inp.response_wavelengths_m) * 1e6, inp.response, "o-", color="tab:orange", ms=3,
        label="invented response table of the fictional thermometer",
    )
    resp.set_ylim(0, 1.25)
    resp.set_ylabel("relative\nresponse", fontsize=8)
    resp.legend(loc="upper left", fontsize=7)
    resp.set_xlim(wavelengths_m[0] * 1e6, wavelengths_m[-1] * 1e6)
    resp.set_xlabel("wavelength $\\lambda$ (µm)")
    resp.grid(True, which="major", alpha=0.3)
    fig.text(0.99, 0.005, INVENTED, ha="right", va="bottom", fontsize=7, color="gray")
    fig.savefig(path, dpi=120, bbox_inches="tight")
    plt.close(fig)


def plot_calibration(inp: Inputs, path: Path) -> None:
    nu = inp.frequency_hz
    cal = bb.two_load_calibration(nu, inp.hot_reading_v, inp.hot_temperature_k, inp.cold_reading_v, inp.cold_temperature_k)
    all_readings = [inp.hot_reading_v, inp.cold_reading_v, *inp.sky_readings_v]
    # calibrated_temperature is defined only where J > 0, i.e. above the offset: start there
    lo = max(min(all_readings) - 0.05, cal.offset + 1e-4)
    readings = np.linspace(lo, max(all_readings) + 0.05, 400)
    j_line = bb.calibrated_brightness_temperature(cal, readings)
    t_curve = bb.calibrated_temperature(cal, readings)
    sky = np.asarray(inp.sky_readings_v)
    j_sky = bb.calibrated_brightness_temperature(cal, sky)
    t_sky = bb.calibrated_temperature(cal, sky)
    loads_v = np.array([inp.hot_reading_v, inp.cold_reading_v])
    loads_t = np.array([inp.hot_temperature_k, inp.cold_temperature_k])
    loads_j = bb.calibrated_brightness_temperature(cal, loads_v)

    fig, (ax, diff) = plt.subplots(
        2, 1, figsize=(8.5, 7.5), sharex=True, gridspec_kw={"height_ratios": [3, 1.4], "hspace": 0.08}
    )
    ax.plot(readings, j_line, color="tab:blue", label="Rayleigh-Jeans brightness temperature $J$ (the calibration line)")
    ax.plot(readings, t_curve, color="tab:red", ls="--", label="physical (Planck) temperature $T$ of a blackbody scene")
    ax.plot(loads_v, loads_j, "s", color="tab:blue", ms=7, label="hot and cold loads: $J$")
    ax.plot(loads_v, loads_t, "s", color="tab:red", mfc="none", ms=10, label="hot and cold loads: their set $T$ (invented)")
    ax.plot(sky, j_sky, "o", color="tab:blue", label="invented sky readings: $J$")
    ax.plot(sky, t_sky, "o", color="tab:red", mfc="none", label="invented sky readings: $T$")
    # labels below and to the right of the rising lines, where nothing else is drawn
    for reading, name, t_load, j, offset, align in (
        (inp.hot_reading_v, "hot load", inp.hot_temperature_k, loads_j[0], (-5, -150), "right"),
        (inp.cold_reading_v, "cold load", inp.cold_temperature_k, loads_j[1], (25, -30), "left"),
    ):
        ax.annotate(
            f"{name}: $T$ = {t_load:g} K, $J$ = {j:.5g} K",
            (reading, j),
            textcoords="offset points",
            xytext=offset,
            ha=align,
            fontsize=8,
            arrowprops={"arrowstyle": "-", "color": "0.4", "lw": 0.8},
        )
    ax.set_ylabel("temperature (K)")
    ax.set_title(
        f"Fictional balloon radiometer, {nu / 1e9:g} GHz: two-load calibration\n"
        f"gain {cal.gain * 1e3:.6g} mV/K, offset {cal.offset:.6g} V (from relicore)"
    )
    ax.grid(True, alpha=0.3)
    ax.legend(loc="upper left", fontsize=8)

    diff.plot(readings, t_curve - j_line, color="tab:purple", label="$T - J$ along the calibration line")
    diff.plot(loads_v, loads_t - loads_j, "s", color="tab:purple", mfc="none", ms=9, label="hot and cold loads")
    diff.plot(sky, t_sky - j_sky, "o", color="tab:purple", mfc="none", label="invented sky readings")
    diff.set_ylabel("$T - J$ (K)")
    diff.set_xlabel("raw reading (V, invented)")
    diff.grid(True, alpha=0.3)
    diff.legend(loc="lower right", fontsize=8)
    fig.text(0.99, 0.005, INVENTED, ha="right", va="bottom", fontsize=7, color="gray")
    fig.savefig(path, dpi=120, bbox_inches="tight")
    plt.close(fig)


def main(argv: list[str]) -> int:
    input_path = argv[1] if len(argv) > 1 else DEFAULT_INPUT
    out_dir = Path(argv[2] if len(argv) > 2 else "examples/out")
    out_dir.mkdir(parents=True, exist_ok=True)
    inp = read_inputs(input_path)
    curves = out_dir / "blackbody_curves.png"
    calibration = out_dir / "radiometer_calibration.png"
    plot_blackbody_curves(inp, curves)
    plot_calibration(inp, calibration)
    print(f"plots written (invented data): {curves.resolve()}")
    print(f"                               {calibration.resolve()}")
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
