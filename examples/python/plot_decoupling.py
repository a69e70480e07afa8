#!/usr/bin/env python3
"""Plots of the relicore demo, part 3: the thermal history of the demo universe as the INVENTED
toy simulation code "Orvelstep" (fictional Hollinscarth Simulation Group) sees it.

Usage: plot_decoupling.py [INPUT_FILE] [OUTPUT_DIR]   (defaults:
examples/data/invented_simulation.txt, examples/out)

Writes three PNG files and prints their paths:
  ionization_history.png  x_e(z) from z = 1e4 to 0 on log axes (1 + z on the horizontal axis),
                          with the invented reionisation redshift, the same universe without
                          reionisation (dotted), Saha equilibrium (dashed) and the fictional
                          run's start and output redshifts marked;
  temperature_ratio.png   T_m/T_r against z, the thermal decoupling redshift (T_m/T_r = 0.99)
                          and the run's start marked;
  visibility.png          the visibility function g (per Mpc of conformal distance) around
                          recombination, z* and z_drag marked with vertical lines and labels.
Every plotted value comes from relicore (one array call per curve); this script only calls it,
divides T_m by T_r and draws.
"""

from __future__ import annotations

import sys
from pathlib import Path

import matplotlib

matplotlib.use("Agg")
import matplotlib.pyplot as plt  # noqa: E402
import numpy as np  # noqa: E402

sys.path.insert(0, str(Path(__file__).resolve().parent))
from relicore.decoupling import ThermalHistory, saha_ionized_fraction  # noqa: E402
from simulation_start import DEFAULT_INPUT, Inputs, read_inputs  # noqa: E402

INVENTED = ("INVENTED scenario: fictional toy code Orvelstep (Hollinscarth Simulation Group); "
            "round-number demo universe, not a published fit (relicore demo)")


def redshift_grid(highest: float, n: int = 1500) -> np.ndarray:
    """Redshifts from 0 to `highest`, uniform in ln(1 + z), ending exactly at both ends."""
    z = np.expm1(np.linspace(0.0, np.log1p(highest), n))
    z[0], z[-1] = 0.0, highest
    return z


def finish(fig: plt.Figure, path: Path) -> None:
    fig.text(0.99, 0.005, INVENTED, ha="right", va="bottom", fontsize=7, color="gray")
    fig.savefig(path, dpi=120, bbox_inches="tight")
    plt.close(fig)


def plot_ionization_history(inp: Inputs, history: ThermalHistory, plain: ThermalHistory, path: Path) -> None:
    u = inp.universe
    z = redshift_grid(history.highest_redshift)
    fig, ax = plt.subplots(figsize=(8.5, 5.5))
    ax.loglog(1.0 + z, history.ionized_fraction(z), color="tab:blue", lw=2,
              label=f"relicore history, reionisation at $z$ = {inp.reionization_redshift:g}")
    ax.loglog(1.0 + z, plain.ionized_fraction(z), color="tab:blue", lw=1, ls=":",
              label="the same universe without reionisation")
    saha = saha_ionized_fraction(u, z)
    shown = saha > 0.0  # Saha equilibrium underflows to 0 at low z; log axes cannot show it
    ax.loglog(1.0 + z[shown], saha[shown], color="tab:red", lw=1.2, ls="--", label="Saha equilibrium")
    out = np.asarray(inp.output_redshifts)
    ax.plot(1.0 + out, history.ionized_fraction(out), "o", ms=4, color="black",
            label="the fictional run's output redshifts")
    ax.plot(1.0 + inp.start_redshift, history.ionized_fraction(inp.start_redshift), "s", ms=7,
            mfc="none", mec="black", label=f"the fictional run's start, $z$ = {inp.start_redshift:g}")
    z_star = history.last_scattering_redshift
    for zz, text in ((inp.reionization_redshift, "reionisation"), (z_star, "last scattering $z_*$")):
        ax.axvline(1.0 + zz, color="gray", lw=0.8, ls="-.")
        ax.text(1.0 + zz, 2.5, f" {text}\n $z$ = {zz:.5g}", fontsize=8, color="dimgray", va="top")
    ax.plot([], [], color="gray", lw=0.8, ls="-.", label="reionisation and last-scattering redshifts")
    ax.set_xlim(1.0 + z[-1], 1.0)  # time runs to the right: z from 1e4 down to 0
    ax.set_ylim(1e-5, 3.0)
    ax.set_xlabel("$1 + z$")
    ax.set_ylabel("ionised fraction $x_\\mathrm{e} = n_\\mathrm{e} / n_\\mathrm{H}$")
    ax.set_title("Ionisation history of the demo universe ($x_\\mathrm{e} > 1$ while helium is ionised)",
                 fontsize=10)
    ax.grid(True, which="major", alpha=0.3)
    ax.legend(fontsize=8, loc="lower left")
    finish(fig, path)


def plot_temperature_ratio(inp: Inputs, history: ThermalHistory, path: Path) -> None:
    u = inp.universe
    z = redshift_grid(history.highest_redshift)
    ratio = history.matter_temperature_k(z) / u.cmb_temperature_at_k(z)
    z_dec = history.thermal_decoupling_redshift
    fig, ax = plt.subplots(figsize=(8.5, 5.5))
    ax.semilogx(1.0 + z, ratio, color="tab:purple", lw=2,
                label="$T_\\mathrm{m} / T_\\mathrm{r}$, gas over radiation temperature (relicore)")
    ax.axvline(1.0 + z_dec, color="gray", lw=0.8, ls="-.",
               label="thermal decoupling ($T_\\mathrm{m} / T_\\mathrm{r}$ = 0.99)")
    ax.text(1.0 + z_dec, 0.5, f" thermal decoupling\n ($T_\\mathrm{{m}} / T_\\mathrm{{r}}$ = 0.99)\n $z$ = {z_dec:.5g}",
            fontsize=8, color="dimgray")
    z0 = inp.start_redshift
    ax.plot(1.0 + z0, history.matter_temperature_k(z0) / u.cmb_temperature_at_k(z0), "s", ms=7, mfc="none",
            mec="black", label=f"the fictional run's start, $z$ = {z0:g}")
    ax.set_xlim(1.0 + z[-1], 1.0)
    ax.set_ylim(0.0, 1.05)
    ax.set_xlabel("$1 + z$")
    ax.set_ylabel("$T_\\mathrm{m} / T_\\mathrm{r}$ (matter over radiation temperature)")
    ax.set_title("Ratio of the gas (matter) temperature to the radiation temperature in the demo universe\n"
                 "(heating of the gas by reionisation is not modelled)", fontsize=10)
    ax.grid(True, which="major", alpha=0.3)
    ax.legend(fontsize=8, loc="lower left")
    finish(fig, path)


def plot_visibility(history: ThermalHistory, path: Path) -> None:
    z = np.linspace(600.0, 1600.0, 2001)
    g = history.visibility(z)
    z_star = history.last_scattering_redshift
    z_drag = history.drag_redshift
    fig, ax = plt.subplots(figsize=(8.5, 5.5))
    ax.plot(z, g, color="tab:green", lw=2, label="visibility $g = -(\\mathrm{d}\\tau/\\mathrm{d}\\eta)\\,e^{-\\tau}$ (relicore)")
    top = float(g.max())
    # the axis runs from high z to low z (time to the right): z* > z_drag is drawn left of z_drag,
    # so its label extends to the left and z_drag's to the right
    for zz, text, colour, align, name in (
        (z_star, "$z_*$", "tab:red", "right", "last scattering $z_*$ (optical depth 1)"),
        (z_drag, "$z_\\mathrm{drag}$", "tab:blue", "left", "drag epoch $z_\\mathrm{drag}$ (baryon-drag depth 1)"),
    ):
        ax.axvline(zz, color=colour, lw=1.0, ls="--", label=name)
        ax.text(zz, top * 1.03, f" {text} = {zz:.2f} ", color=colour, fontsize=9, ha=align)
    ax.invert_xaxis()
    ax.set_ylim(0.0, top * 1.12)
    ax.set_xlabel("redshift $z$")
    ax.set_ylabel("visibility $g$ per unit conformal distance $\\eta$ (Mpc$^{-1}$)")
    ax.set_title("Visibility function of the demo universe around recombination", fontsize=10)
    ax.grid(True, alpha=0.3)
    ax.legend(fontsize=8, loc="center left")  # above the high-z tail of g, below the labels of the lines
    finish(fig, path)


def main(argv: list[str]) -> int:
    path = argv[1] if len(argv) > 1 else DEFAULT_INPUT
    out = Path(argv[2] if len(argv) > 2 else "examples/out")
    out.mkdir(parents=True, exist_ok=True)
    inp = read_inputs(path)
    history = ThermalHistory(inp.universe, reionization_redshift=inp.reionization_redshift)
    plain = ThermalHistory(inp.universe)
    targets = [out / "ionization_history.png", out / "temperature_ratio.png", out / "visibility.png"]
    plot_ionization_history(inp, history, plain, targets[0])
    plot_temperature_ratio(inp, history, targets[1])
    plot_visibility(history, targets[2])
    print(f"plots written (invented scenario): {targets[0].resolve()}")
    for t in targets[1:]:
        print(f"                                   {t.resolve()}")
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
