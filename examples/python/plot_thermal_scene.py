#!/usr/bin/env python3
"""Plots of the relicore demo's INVENTED thermal scene (fictional Glimmerfen Ridge Observatory
workshop, fictional thermal camera).

Usage: plot_thermal_scene.py [SCENE_FILE] [OUTPUT_DIR] [IMAGE_PREFIX]
(defaults: examples/data/invented_thermal_scene.txt, examples/out,
OUTPUT_DIR/thermal_python: the images thermal_scene.py wrote, which run_demo.sh has compared
byte for byte with those of Rust, C and Fortran)

Writes three PNG files and prints their paths:
  thermal_scene_temperature.png  the object-temperature image T_obj (K, with a degC scale), each
                                 probe pixel labelled with its surface, T_obj and u_c;
  thermal_scene_uncertainty.png  the combined-standard-uncertainty image u_c(T_obj) (K, log
                                 colour scale), each probe labelled with its surface and
                                 emissivity;
  thermal_scene_budget.png       the uncertainty budget at each probe: |c_i| u(x_i) of the five
                                 inputs (the scalar call's sensitivity coefficients times the
                                 stated standard uncertainties) and u_c.
Every plotted value comes from relicore; this script only reads, calls and draws.
"""

from __future__ import annotations

import math
import sys
import textwrap
from pathlib import Path

import matplotlib

matplotlib.use("Agg")
import matplotlib.pyplot as plt  # noqa: E402
import numpy as np  # noqa: E402
from matplotlib.colors import LogNorm  # noqa: E402

import relicore.blackbody as bb  # noqa: E402
from thermal_scene import DEFAULT_INPUT, Scene, paint, read_scene  # noqa: E402

ZERO_CELSIUS_K = 273.15  # the definition of the Celsius scale


def surface(name: str) -> str:
    return name.replace("_", " ")


def with_uncertainty(value: float, u: float, unit: str) -> str:
    """value ± u with u to two significant digits and the value to the same decimal place (the
    usual way of stating a result with its standard uncertainty, JCGM 100:2008 §7.2.6)."""
    decimals = max(0, 1 - math.floor(math.log10(u)))
    return f"{value:.{decimals}f} ± {u:.{decimals}f} {unit}"


def caption(s: Scene) -> str:
    return (
        "INVENTED scene (relicore demo): the fictional Glimmerfen Ridge Observatory workshop seen by a fictional "
        f"thermal camera at λ = {s.wavelength_m * 1e6:g} µm\nthrough an infrared window "
        f"(τ = {s.transmittance:g}, $T_\\mathrm{{window}}$ = {s.path_temperature_k:g} K), the surfaces reflecting "
        f"a warm room at $T_\\mathrm{{refl}}$ = {s.reflected_temperature_k:g} K. The signals are noise-free values "
        "of the forward\nmeasurement equation, inverted pixel by pixel, so $T_\\mathrm{obj}$ reproduces the "
        "invented temperatures; the emissivities are generic\ntextbook magnitudes, not data for real surfaces."
    )


def read_image(path: Path, s: Scene) -> np.ndarray:
    image = np.fromfile(path, dtype="<f8")
    if image.size != s.width * s.height:
        raise SystemExit(f"plot_thermal_scene: {path} holds {image.size} values, not {s.width} x {s.height}")
    return image.reshape(s.height, s.width)


def probe_results(s: Scene, signals: np.ndarray, region_map: np.ndarray):
    """(x, y, region, TemperatureUncertainty) at each probe, by the scalar call."""
    out = []
    for x, y in s.probes:
        r = s.regions[int(region_map[y, x])]
        res = bb.object_temperature_wavelength_with_uncertainty(
            s.wavelength_m, float(signals[y, x]), r.emissivity, s.reflected_temperature_k, s.transmittance,
            s.path_temperature_k, s.signal_uncertainty, r.emissivity_uncertainty,
            s.reflected_temperature_uncertainty_k, s.transmittance_uncertainty, s.path_temperature_uncertainty_k,
        )
        out.append((x, y, r, res))
    return out


def label_probes(ax, probes, text_of) -> None:
    for x, y, r, res in probes:
        ax.plot(x, y, marker="+", color="black", ms=9, mew=1.6)
        ax.plot(x, y, marker="+", color="white", ms=7, mew=0.8)
        right = x > 0.8 * ax.get_xlim()[1]
        ax.annotate(
            text_of(r, res), (x, y), textcoords="offset points", xytext=(-6, -7) if right else (6, 5), fontsize=7,
            ha="right" if right else "left", va="top" if right else "bottom", multialignment="left",
            bbox={"boxstyle": "round,pad=0.25", "fc": "white", "ec": "0.5", "alpha": 0.85},
        )


def setup_axes(ax, s: Scene) -> None:
    ax.set_xlabel("x (pixel)")
    ax.set_ylabel("y (pixel)")
    ax.set_xlim(-0.5, s.width - 0.5)
    ax.set_ylim(s.height - 0.5, -0.5)


def plot_temperature(s: Scene, t_obj: np.ndarray, probes, path: Path) -> None:
    fig, ax = plt.subplots(figsize=(9.0, 7.2))
    im = ax.imshow(t_obj, cmap="inferno", interpolation="nearest")
    setup_axes(ax, s)
    cbar = fig.colorbar(im, ax=ax, fraction=0.046, pad=0.10)
    cbar.set_label("object temperature $T_\\mathrm{obj}$ (K)")
    celsius = cbar.ax.secondary_yaxis("left", functions=(lambda k: k - ZERO_CELSIUS_K, lambda c: c + ZERO_CELSIUS_K))
    celsius.set_ylabel("$T_\\mathrm{obj}$ (°C)")
    label_probes(
        ax, probes,
        lambda r, res: f"{surface(r.name)}\n$T_\\mathrm{{obj}}$ = "
        + with_uncertainty(res.temperature_k, res.combined_standard_uncertainty_k, "K")
        + f"\n({res.temperature_k - ZERO_CELSIUS_K:.1f} °C)",
    )
    ax.set_title("Object temperature $T_\\mathrm{obj}$ from a synthetic 640 × 480 frame of 10 µm signals\n"
                 "(inverse measurement equation, per-pixel emissivity; + marks the probe pixels)", fontsize=10)
    fig.text(0.01, 0.005, caption(s), ha="left", va="bottom", fontsize=7, color="0.25")
    fig.subplots_adjust(bottom=0.16)
    fig.savefig(path, dpi=120, bbox_inches="tight")
    plt.close(fig)


def plot_uncertainty(s: Scene, u_c: np.ndarray, probes, path: Path) -> None:
    fig, ax = plt.subplots(figsize=(9.0, 7.2))
    lo = 10 ** np.floor(np.log10(u_c.min()))
    hi = 1.5 * u_c.max()
    im = ax.imshow(u_c, cmap="viridis", norm=LogNorm(vmin=lo, vmax=hi), interpolation="nearest")
    setup_axes(ax, s)
    cbar = fig.colorbar(im, ax=ax, fraction=0.046, pad=0.04)
    cbar.set_label("combined standard uncertainty $u_\\mathrm{c}(T_\\mathrm{obj})$ (K, log scale)")
    label_probes(
        ax, probes,
        lambda r, res: f"{surface(r.name)}\nε = {r.emissivity:.2f} ± {r.emissivity_uncertainty:.2f}"
        f"\n$u_\\mathrm{{c}}$ = {res.combined_standard_uncertainty_k:.2g} K",
    )
    ax.set_title("Combined standard uncertainty $u_\\mathrm{c}(T_\\mathrm{obj})$ of each pixel "
                 "(JCGM 100:2008 eq. 10, uncorrelated inputs):\n"
                 "only the stated input uncertainties listed below, not the emissivity model "
                 "or the camera", fontsize=10)
    inputs = (
        "stated standard uncertainties: $u(L_\\mathrm{meas})$ = "
        f"{s.signal_uncertainty / 10 ** math.floor(math.log10(s.signal_uncertainty)):.1f} × "
        f"10$^{{{math.floor(math.log10(s.signal_uncertainty))}}}$ W m$^{{-2}}$ sr$^{{-1}}$ m$^{{-1}}$, "
        f"$u(\\varepsilon)$ per surface (labels), $u(T_\\mathrm{{refl}})$ = {s.reflected_temperature_uncertainty_k:g} K, "
        f"$u(\\tau)$ = {s.transmittance_uncertainty:g}, $u(T_\\mathrm{{window}})$ = {s.path_temperature_uncertainty_k:g} K"
    )
    fig.text(0.01, 0.005, inputs + "\n" + caption(s), ha="left", va="bottom", fontsize=7, color="0.25")
    fig.subplots_adjust(bottom=0.18)
    fig.savefig(path, dpi=120, bbox_inches="tight")
    plt.close(fig)


def plot_budget(s: Scene, probes, path: Path) -> None:
    labels = [
        "signal $L_\\mathrm{meas}$",
        "emissivity $\\varepsilon$",
        "reflected $T_\\mathrm{refl}$",
        "window $\\tau$",
        "window $T_\\mathrm{window}$",
    ]
    fig, ax = plt.subplots(figsize=(9.0, 5.0))
    n = len(probes)
    width = 0.8 / 6
    xs = np.arange(n)
    for i, label in enumerate(labels):
        values = []
        for _, _, r, res in probes:
            u_in = (s.signal_uncertainty, r.emissivity_uncertainty, s.reflected_temperature_uncertainty_k,
                    s.transmittance_uncertainty, s.path_temperature_uncertainty_k)
            values.append(abs(res.sensitivity_coefficients[i]) * u_in[i])
        ax.bar(xs + (i - 2.5) * width, values, width, label=label)
    ax.bar(xs + 2.5 * width, [res.combined_standard_uncertainty_k for *_, res in probes], width, color="black",
           label="$u_\\mathrm{c}(T_\\mathrm{obj})$")
    ax.set_yscale("log")
    ax.set_xticks(xs)
    ax.set_xticklabels(
        ["\n".join(textwrap.wrap(surface(r.name), 14)) + f"\nε = {r.emissivity:.2f}" for _, _, r, _ in probes],
        fontsize=8,
    )
    ax.set_ylabel("contribution to $u_\\mathrm{c}(T_\\mathrm{obj})$ (K)")
    ax.set_title("Uncertainty budget at the probe pixels: sensitivity coefficient × stated standard uncertainty\n"
                 "(the coefficients by implicit differentiation of the measurement equation)", fontsize=10)
    ax.grid(True, axis="y", which="major", alpha=0.3)
    ax.legend(fontsize=7, ncol=3, loc="upper left", title="$|c_i|\\,u(x_i)$ of the input $x_i$, and $u_\\mathrm{c}$",
              title_fontsize=7)
    top = max(res.combined_standard_uncertainty_k for *_, res in probes)
    ax.set_ylim(top=top * 15)
    fig.text(0.01, -0.04, caption(s), ha="left", va="top", fontsize=7, color="0.25")
    fig.savefig(path, dpi=120, bbox_inches="tight")
    plt.close(fig)


def main(argv: list[str]) -> int:
    scene_path = argv[1] if len(argv) > 1 else DEFAULT_INPUT
    out_dir = Path(argv[2] if len(argv) > 2 else "examples/out")
    prefix = argv[3] if len(argv) > 3 else str(out_dir / "thermal_python")
    out_dir.mkdir(parents=True, exist_ok=True)
    s = read_scene(scene_path)
    signals = read_image(Path(f"{prefix}_signal.f64"), s)
    t_obj = read_image(Path(f"{prefix}_temperature.f64"), s)
    u_c = read_image(Path(f"{prefix}_uncertainty.f64"), s)
    probes = probe_results(s, signals, paint(s))
    paths = [out_dir / f"thermal_scene_{k}.png" for k in ("temperature", "uncertainty", "budget")]
    plot_temperature(s, t_obj, probes, paths[0])
    plot_uncertainty(s, u_c, probes, paths[1])
    plot_budget(s, probes, paths[2])
    print(f"plots written (invented scene): {paths[0].resolve()}")
    for p in paths[1:]:
        print(f"                                {p.resolve()}")
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
