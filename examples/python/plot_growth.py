#!/usr/bin/env python3
"""Plots of the relicore demo, part 3: structure growth in the demo universe of the INVENTED toy
simulation code "Orvelstep" (fictional Hollinscarth Simulation Group; both names are coinages).

Usage: plot_growth.py [INPUT_FILE] [OUTPUT_DIR]   (defaults:
examples/data/invented_simulation.txt, examples/out)

Writes three PNG files and prints their paths:
  power_spectrum.png      the linear matter power spectrum P(k, z) today and at the run's start
                          redshift (log-log; k in Mpc^-1, P in Mpc^3, no factors of h), with the
                          form without baryon oscillations today for comparison and the range
                          of the run's spectrum file marked;
  growth_factor.png       D(z) from the start redshift to today (log-log against 1 + z), with
                          the matter-era slope D proportional to a for comparison and the run's
                          start and time steps marked;
  growth_rate_sigma8.png  f(z) sigma8(z) from z = 0 to 3 (the redshifts galaxy surveys measure),
                          with the growth-index approximation Omega_m(z)^0.55 D(z) sigma8 for
                          comparison (gamma = 0.55 in flat Lambda-CDM: Linder 2005, from memory).
Every plotted value comes from relicore (one array call per curve); this script only calls it
and draws (and forms the comparison curves named above).
"""

from __future__ import annotations

import sys
from pathlib import Path

import matplotlib

matplotlib.use("Agg")
import matplotlib.pyplot as plt  # noqa: E402
import numpy as np  # noqa: E402

sys.path.insert(0, str(Path(__file__).resolve().parent))
from relicore.growth import LinearGrowth, LinearPowerSpectrum  # noqa: E402
from simulation_start import DEFAULT_INPUT, Inputs, power_spectrum, read_inputs, wavenumber_grid  # noqa: E402

INVENTED = ("INVENTED scenario: fictional toy code Orvelstep (Hollinscarth Simulation Group); "
            "round-number demo universe and primordial spectrum, not a published fit (relicore demo)")


def finish(fig: plt.Figure, path: Path) -> None:
    fig.text(0.99, 0.005, INVENTED, ha="right", va="bottom", fontsize=7, color="gray")
    fig.savefig(path, dpi=120, bbox_inches="tight")
    plt.close(fig)


def universe_label(inp: Inputs, spectrum: LinearPowerSpectrum) -> str:
    u = inp.universe
    mantissa, exponent = f"{inp.scalar_amplitude:.3e}".split("e")
    a_s = rf"{float(mantissa):g} \times 10^{{{int(exponent)}}}"
    return (rf"flat, $H_0$ = {u.h0_km_s_mpc:g} km s$^{{-1}}$ Mpc$^{{-1}}$, "
            rf"$\Omega_\mathrm{{m}}$ = {u.omega_matter:g}, $\Omega_\mathrm{{b}}$ = {u.omega_baryon:g}; "
            rf"$A_\mathrm{{s}} = {a_s}$, $n_\mathrm{{s}}$ = {inp.spectral_index:g}, "
            rf"$\sigma_8$ = {spectrum.sigma8:.4f} (derived)")


def plot_power_spectrum(inp: Inputs, spectrum: LinearPowerSpectrum, growth: LinearGrowth, path: Path) -> None:
    z0 = inp.start_redshift
    k = np.geomspace(1e-4, 1e2, 2000)
    smooth = LinearPowerSpectrum(growth, transfer_form="no_wiggle", scalar_amplitude=inp.scalar_amplitude,
                                 spectral_index=inp.spectral_index, running=inp.running)
    p_today = spectrum.linear_power_spectrum_mpc3(k, 0.0)
    p_smooth = smooth.linear_power_spectrum_mpc3(k, 0.0)
    fig, (ax, ax_ratio) = plt.subplots(2, 1, figsize=(8.5, 7.5), sharex=True,
                                       gridspec_kw={"height_ratios": [3, 1], "hspace": 0.06})
    ax.loglog(k, p_today, color="tab:blue", lw=2,
              label=r"today, $z$ = 0 (Eisenstein & Hu 1998, with baryon oscillations)")
    ax.loglog(k, p_smooth, color="black", lw=0.8, ls="--",
              label=r"today, the form without oscillations")
    k_file = wavenumber_grid(inp)
    ax.loglog(k_file, spectrum.linear_power_spectrum_mpc3(k_file, z0), "o", ms=2.5, mfc="none", mec="gray",
              mew=0.6, label=f"the {k_file.size} points of the run's spectrum file (40 per decade)")
    ax.loglog(k, spectrum.linear_power_spectrum_mpc3(k, z0), color="tab:red", lw=1.5,
              label=rf"at the fictional run's start, $z$ = {z0:g} (the same shape, scaled by $D^2$)")
    ax.set_xlim(k[0], k[-1])
    ax.set_ylim(1e-8, 1e6)
    ax.set_ylabel(r"linear matter power spectrum $P(k, z)$ (Mpc$^3$)")
    ax.set_title("Linear matter power spectrum of the demo universe\n" + universe_label(inp, spectrum),
                 fontsize=10)
    ax.grid(True, which="major", alpha=0.3)
    ax.legend(fontsize=8, loc="lower left")
    ax_ratio.semilogx(k, p_today / p_smooth, color="tab:blue", lw=1.2,
                      label="baryon acoustic oscillations:\n$P$ with / without them (same at every $z$)")
    ax_ratio.axhline(1.0, color="black", lw=0.8, ls="--", label="1 (no oscillations)")
    ax_ratio.set_ylim(0.88, 1.12)
    ax_ratio.set_xlabel(r"wavenumber $k$ (Mpc$^{-1}$, no factor of $h$)")
    ax_ratio.set_ylabel("with / without\noscillations")
    ax_ratio.legend(fontsize=7, loc="lower right")  # below the flat small-scale end, clear of the wiggles
    ax_ratio.grid(True, which="major", alpha=0.3)
    finish(fig, path)


def plot_growth_factor(inp: Inputs, growth: LinearGrowth, spectrum: LinearPowerSpectrum, path: Path) -> None:
    z0 = inp.start_redshift
    z = np.expm1(np.linspace(0.0, np.log1p(z0), 800))
    z[0], z[-1] = 0.0, z0
    d = growth.growth_factor(z)
    # D proportional to a, matched at the start redshift: the growing mode of the matter era
    matter_era = growth.growth_factor(z0) * (1.0 + z0) / (1.0 + z)
    fig, ax = plt.subplots(figsize=(8.5, 5.5))
    ax.loglog(1.0 + z, d, color="tab:green", lw=2, label=r"growth factor $D(z)$ (relicore; 1 today)")
    ax.loglog(1.0 + z, matter_era, color="gray", lw=1, ls="--",
              label=rf"$D \propto a$ (matter era), matched at $z$ = {z0:g}")
    steps = np.asarray(inp.step_redshifts)
    ax.plot(1.0 + steps, growth.growth_factor(steps), "o", ms=4, color="black",
            label="the fictional run's first time steps")
    ax.plot(1.0 + z0, growth.growth_factor(z0), "s", ms=8, mfc="none", mec="tab:red",
            label=rf"its start: $D$ = {growth.growth_factor(z0):.4g}, $f$ = {growth.growth_rate(z0):.4f}")
    ax.set_xlim(1.0 + z0 * 1.1, 1.0)  # time runs to the right
    ax.set_xlabel(r"$1 + z$")
    ax.set_ylabel(r"linear growth factor $D(z) = D_\mathrm{u}(a)/D_\mathrm{u}(1)$ (dimensionless)")
    ax.set_title("Linear growth factor of the demo universe (below the dashed line: dark energy slows growth)\n"
                 + universe_label(inp, spectrum), fontsize=10)
    ax.grid(True, which="both", alpha=0.3)
    ax.legend(fontsize=8, loc="upper left")
    finish(fig, path)


def plot_growth_rate_sigma8(inp: Inputs, growth: LinearGrowth, spectrum: LinearPowerSpectrum, path: Path) -> None:
    u = inp.universe
    z = np.linspace(0.0, 3.0, 601)
    fs8 = spectrum.growth_rate_times_sigma8(z)
    approx = u.omega_matter_at(z) ** 0.55 * growth.growth_factor(z) * spectrum.sigma8
    fig, (ax, ax_diff) = plt.subplots(2, 1, figsize=(8.5, 7.0), sharex=True,
                                      gridspec_kw={"height_ratios": [3, 1], "hspace": 0.06})
    ax.plot(z, fs8, color="tab:purple", lw=2, label=r"$f\sigma_8(z) = f(z)\,D(z)\,\sigma_8$ (relicore)")
    ax.plot(z, approx, color="black", lw=0.8, ls="--",
            label=r"$\Omega_\mathrm{m}(z)^{0.55}\,D(z)\,\sigma_8$ (growth index $\gamma$ = 0.55, Linder 2005)")
    ax.set_xlim(0.0, 3.0)
    ax.set_ylim(0.0, 0.55)
    ax_diff.plot(z, 100.0 * (approx / fs8 - 1.0), color="black", lw=1,
                 label=r"growth-index approximation / relicore $-$ 1")
    ax_diff.axhline(0.0, color="gray", lw=0.6, label="0 (agreement)")
    ax_diff.legend(fontsize=7, loc="upper right")
    ax_diff.set_ylabel("approximation /\nrelicore $-$ 1 (%)")
    ax_diff.set_xlabel(r"redshift $z$")
    ax_diff.grid(True, alpha=0.3)
    ax.set_ylabel(r"$f\sigma_8(z)$ (dimensionless)")
    ax.set_title(r"Growth rate times $\sigma_8(z)$ in the demo universe" + "\n" + universe_label(inp, spectrum),
                 fontsize=10)
    ax.grid(True, alpha=0.3)
    ax.legend(fontsize=8, loc="upper right")
    finish(fig, path)


def main(argv: list[str]) -> int:
    path = argv[1] if len(argv) > 1 else DEFAULT_INPUT
    out = Path(argv[2] if len(argv) > 2 else "examples/out")
    out.mkdir(parents=True, exist_ok=True)
    inp = read_inputs(path)
    growth, spectrum = power_spectrum(inp)
    targets = [out / "power_spectrum.png", out / "growth_factor.png", out / "growth_rate_sigma8.png"]
    plot_power_spectrum(inp, spectrum, growth, targets[0])
    plot_growth_factor(inp, growth, spectrum, targets[1])
    plot_growth_rate_sigma8(inp, growth, spectrum, targets[2])
    print(f"plots written (invented scenario): {targets[0].resolve()}")
    for t in targets[1:]:
        print(f"                                   {t.resolve()}")
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
