#!/usr/bin/env python3
"""The relicore demo, part 2: an INVENTED galaxy catalogue turned into distances and ages.

The Quillmere Deep Field Survey is FICTIONAL and so is its catalogue: 100,000 galaxy redshifts
drawn at random (seeded) from an invented distribution, with invented absolute magnitudes,
all read from examples/data/invented_catalogue.txt together with the demo's universe. Every
cosmological number comes from relicore.Universe, called once per quantity on the whole
catalogue (the loops run in Rust); this script only draws the invented data, calls, summarises
and plots.

Prints a summary and writes examples/out/distance_redshift.png (comoving, luminosity and
angular-diameter distance against redshift, log-log, with the catalogue's redshift histogram).

Usage (from the repository root; examples/run_demo.sh does this):
    .venv/bin/python examples/python/catalogue_demo.py [INPUT] [OUTPUT_DIR]
"""

from __future__ import annotations

import sys
from pathlib import Path

import numpy as np

sys.path.insert(0, str(Path(__file__).resolve().parent))
from catalogue_table import DEFAULT_INPUT, objects_of, read_inputs, universe_of  # noqa: E402

SURVEY = "Quillmere Deep Field Survey (FICTIONAL)"


def one(values: dict[str, list[float]], key: str) -> float:
    v = values.get(key)
    if v is None or len(v) != 1:
        raise SystemExit(f"catalogue_demo: {key} must be given once")
    return v[0]


def invented_catalogue(values: dict[str, list[float]]) -> tuple[np.ndarray, np.ndarray]:
    """INVENTED redshifts and absolute magnitudes, from the seed and shapes of the input file."""
    n = int(one(values, "catalogue_size"))
    rng = np.random.default_rng(int(one(values, "catalogue_seed")))
    z_min, z_max = one(values, "catalogue_redshift_min"), one(values, "catalogue_redshift_max")
    shape, scale = one(values, "catalogue_redshift_gamma_shape"), one(values, "catalogue_redshift_gamma_scale")
    z = np.empty(0)
    while z.size < n:  # redraw what falls outside the limits
        draw = rng.gamma(shape, scale, size=n)
        z = np.concatenate([z, draw[(draw >= z_min) & (draw <= z_max)]])
    z = z[:n]
    m_abs = rng.normal(one(values, "catalogue_absolute_magnitude_mean"), one(values, "catalogue_absolute_magnitude_sigma"), n)
    return z, m_abs


def main(argv: list[str]) -> int:
    path = argv[1] if len(argv) > 1 else DEFAULT_INPUT
    out_dir = Path(argv[2] if len(argv) > 2 else "examples/out")
    values = read_inputs(path)
    u = universe_of(values)
    z, m_abs = invented_catalogue(values)
    m_lim = one(values, "catalogue_limiting_magnitude")

    d_l = u.luminosity_distance_mpc(z)
    mu = u.distance_modulus(z)
    age = u.age_gyr(z)
    lookback = u.lookback_time_gyr(z)
    scale = u.transverse_scale_kpc_per_arcsec(z)
    volume = u.comoving_volume_gpc3(np.array([z.min(), z.max()]))
    m_app = m_abs + mu
    seen = m_app <= m_lim

    print(f"# {SURVEY}: INVENTED catalogue of {z.size:,} galaxies (seeded random redshifts, invented magnitudes)")
    print(f"# universe: {u!r}")
    print("#   (a flat model with radiation and one massive neutrino, its parameters invented for the demo,")
    print("#   not a published fit)")
    print("# relicore computed D_L, distance modulus, age, lookback time and transverse scale for every galaxy")
    print("#   (one array call per quantity; speed is measured by make bench, not here)")
    print()
    q = [0.0, 0.05, 0.5, 0.95, 1.0]
    rows = [
        ("redshift", z, "{:10.4f}"),
        ("luminosity distance, Mpc", d_l, "{:10.1f}"),
        ("distance modulus, mag", mu, "{:10.3f}"),
        ("age at emission, Gyr", age, "{:10.4f}"),
        ("lookback time, Gyr", lookback, "{:10.4f}"),
        ("transverse scale, kpc/arcsec", scale, "{:10.4f}"),
        ("apparent magnitude (invented M)", m_app, "{:10.3f}"),
    ]
    print(f"{'quantity':<32}" + "".join(f"{f'{int(p * 100)}%':>10}" for p in q))
    for name, values_, fmt in rows:
        print(f"{name:<32}" + "".join(fmt.format(v) for v in np.quantile(values_, q)))
    print()
    shell = volume[1] - volume[0]
    print(f"comoving volume between the nearest (z = {z.min():.4f}) and farthest (z = {z.max():.4f}) galaxy:")
    print(f"  {shell:,.1f} Gpc^3 over the whole sky")
    print(f"age of the universe today: {u.age_gyr(0.0):.4f} Gyr; the oldest light in the catalogue left "
          f"{lookback.max():.4f} Gyr ago")
    print(f"galaxies brighter than the invented limiting magnitude {m_lim:g}: {int(seen.sum()):,} of {z.size:,} "
          f"({seen.mean() * 100:.1f}%); median redshift of those {np.median(z[seen]):.3f}")
    print(f"redshift at which the universe was 1 Gyr old: {u.redshift_at_age_gyr(1.0):.4f}")

    try:
        import matplotlib

        matplotlib.use("Agg")
        import matplotlib.pyplot as plt
    except ImportError:  # the summary does not need matplotlib
        print("matplotlib is not installed: no plot written")
        return 0
    out_dir.mkdir(parents=True, exist_ok=True)
    grid = np.geomspace(1e-3, 1e3, 400)
    fig, (ax, hist) = plt.subplots(2, 1, figsize=(7.5, 7.5), sharex=True, gridspec_kw={"height_ratios": [3, 1]})
    ax.loglog(grid, u.comoving_distance_mpc(grid), label="comoving distance $D_C$")
    ax.loglog(grid, u.luminosity_distance_mpc(grid), label="luminosity distance $D_L$")
    ax.loglog(grid, u.angular_diameter_distance_mpc(grid), label="angular-diameter distance $D_A$")
    ax.axhline(u.hubble_distance_mpc, color="grey", lw=0.8, ls=":", label="Hubble distance $c/H_0$")
    follow_up = np.array([z_obj for z_obj, _, _ in objects_of(values)])
    if follow_up.size:
        ax.plot(follow_up, u.luminosity_distance_mpc(follow_up), "o", ms=5, mfc="none", color="black",
                label=f"the {follow_up.size} INVENTED follow-up galaxies of the table (at their $D_L$)")
    ax.set_ylabel("distance, Mpc")
    ax.set_title(f"Distance-redshift relations of the survey's invented universe\n{SURVEY}: INVENTED data",
                 fontsize=10)
    ax.legend(fontsize=8)
    ax.grid(True, which="both", lw=0.3, alpha=0.5)
    bins_per_decade = 20  # bins of equal width in log10(z): 0.05 dex
    hist.hist(z, bins=np.geomspace(1e-3, 1e3, 6 * bins_per_decade + 1), color="tab:purple", alpha=0.7,
              label=f"{z.size:,} INVENTED galaxies")
    hist.set_xscale("log")
    hist.set_xlabel("redshift $z$")
    hist.set_ylabel(f"galaxies per\n{1 / bins_per_decade:g} dex in $z$")
    hist.legend(fontsize=8, loc="upper left")
    hist.grid(True, which="both", lw=0.3, alpha=0.5)
    fig.tight_layout()
    target = out_dir / "distance_redshift.png"
    fig.savefig(target, dpi=120)
    print(f"wrote {target}")
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))
