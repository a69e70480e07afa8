#!/usr/bin/env python3
"""Independent high-precision reference gradients for the relicore dual-number functions.

Run from anywhere:

    python3 tests/reference/gradient_vectors.py            # both files
    python3 tests/reference/gradient_vectors.py blackbody  # one of them

Writes tests/data/gradients/blackbody.txt and tests/data/gradients/cosmology.txt in the format of
tests/data/FORMAT.md (section "Gradient files").

Independence: every expected partial derivative is mpmath.diff (numerical differentiation at
high precision: mp.dps = 40 for the function, mpmath.diff raising the precision of its own
steps) of an mpmath implementation written here from the defining formulas, at the exact
binary value of the printed double arguments. Nothing here reads, runs or imitates the
project's Rust code. Each partial is checked against a second route where one exists (the
closed-form derivative of Planck's law in T, the Leibniz rule of a band integral, the closed
forms of the Einstein-de Sitter, Milne and flat LCDM models), and must agree to 1e-25
relative.

Blackbody model: Planck's law with the SI 2019 exact h, c, k; brightness temperature its
closed-form inverse; band radiance mpmath.quad of B over the band; the band inversion
mpmath.findroot of that quadrature.

Cosmology model: the definitions of tests/reference/cosmology_vectors.py (its docstring), for
the parameters that do not involve massive neutrinos: E(z)^2 = Om_cb a^-3 + Om_r a^-4 +
Om_k a^-2 + Om_de a^(-3(1+w0+wa)) exp(-3 wa (1-a)), with Om_r = Om_gamma (1 + N_eff (7/8)
(4/11)^(4/3)), Om_gamma = a_rad T0^4 / (c^2 rho_crit), rho_crit = 3 H0^2/(8 pi G) (CODATA 2022
G), Om_de = 1 - Om_m - Om_r - Om_k, D_H = c/H0, t_H = 1/H0 in Gyr of Julian years; D_C =
D_H int_0^z dz/E, D_M by the curvature function (Hogg 1999, eq. 16), D_L = (1+z) D_M, age =
t_H int_0^a da/(a E) (mpmath.quad with the singular end handled by the substitution a = s^2).

Only mpmath and the standard library are used; deterministic (no random numbers).
"""

import os
import sys

import mpmath
from mpmath import mp, mpf

DPS = 40
mp.dps = DPS

HERE = os.path.dirname(os.path.abspath(__file__))
DATA = os.path.normpath(os.path.join(HERE, "..", "data"))
SCRIPT = "tests/reference/gradient_vectors.py"

# one central tolerance table: key -> (kind, value, reason)
TOL = {
    "value": ("rel", 1e-14, "the plain function's documented accuracy (the value part is the "
              "plain function's bits, tested separately)"),
    "partial": ("rel", 1e-12, "issue 15: background and blackbody derivatives to 1e-12"),
    "partial_root": ("rel", 1e-12, "root partials by the implicit function theorem: the same "
                     "1e-12 (the partials of the residual are as accurate as its value)"),
}

H = mpf("6.62607015e-34")
C = mpf(299792458)
K = mpf("1.380649e-23")


def planck_wavelength(lam, t):
    x = H * C / (lam * K * t)
    return 2 * H * C**2 / lam**5 / mpmath.expm1(x)


def planck_frequency(nu, t):
    x = H * nu / (K * t)
    return 2 * H * nu**3 / C**2 / mpmath.expm1(x)


def brightness_wavelength(lam, radiance):
    return (H * C / (lam * K)) / mpmath.log1p(2 * H * C**2 / (lam**5 * radiance))


def brightness_frequency(nu, radiance):
    return (H * nu / K) / mpmath.log1p(2 * H * nu**3 / (C**2 * radiance))


def band_wavelength(l1, l2, t):
    return mpmath.quad(lambda l: planck_wavelength(l, t), [l1, l2])


def band_frequency(n1, n2, t):
    return mpmath.quad(lambda n: planck_frequency(n, t), [n1, n2])


def band_temperature(l1, l2, radiance):
    # the band radiance grows with T: bracket from the brightness temperature of the mean
    guess = brightness_wavelength((l1 + l2) / 2, radiance / (l2 - l1))
    return mpmath.findroot(lambda t: band_wavelength(l1, l2, t) - radiance, guess, tol=mpf(10) ** (-2 * DPS + 10))


def fmt(x):
    return "%.17e" % float(x)


def partials(f, args, skip=()):
    """mpmath.diff of f in each argument at the exact binary values of the double args (None
    for the indices in `skip`)."""
    xs = [mpf(a) for a in args]
    out = []
    for i in range(len(xs)):
        if i in skip:
            out.append(None)
            continue

        def g(t, i=i):
            ys = list(xs)
            ys[i] = t
            return f(*ys)

        d = mpmath.diff(g, xs[i])
        if isinstance(d, mpmath.mpc):
            # a parameter at the edge of its domain (Omega_m = 0): one-sided differences
            d = mpmath.diff(g, xs[i], direction=1)
        out.append(d)
    return out


def lines_for(name, f, args, checks=(), partial_key="partial", skip=()):
    """The value line and one line per partial; `checks` are (index, second-route value);
    `skip` are indices whose partial is exactly 0 by the model (written as such, source spec).
    A partial below 1e-25 of the value (one that vanishes) is checked absolutely, to the
    partial tolerance times |value| (issue 15: absolute where the derivative crosses zero)."""
    xs = [mpf(a) for a in args]
    v = f(*xs)
    d = partials(f, args, skip)
    for i, want in checks:
        rel = abs((d[i] - want) / want)
        if rel > mpf("1e-25"):
            raise SystemExit(f"{name}{args}: partial {i} disagrees with second route: {rel}")
    argtxt = " ".join(fmt(a) for a in args)
    n = len(args)
    k, tv, _ = TOL["value"]
    out = [f"{name}@value {n} {argtxt} {fmt(v)} {k} {tv:.0e} mpmath"]
    k, tp, _ = TOL[partial_key]
    for i, di in enumerate(d):
        if di is None:
            out.append(f"{name}@d{i} {n} {argtxt} {fmt(0.0)} rel 0e+00 spec")
        elif abs(di) < mpf("1e-25") * abs(v):
            out.append(f"{name}@d{i} {n} {argtxt} {fmt(di)} abs {float(tp * abs(v)):.3e} mpmath-diff")
        else:
            out.append(f"{name}@d{i} {n} {argtxt} {fmt(di)} {k} {tp:.0e} mpmath-diff")
    return out


def blackbody():
    out = []
    for lam in (2e-7, 5e-7, 1e-6, 1e-5, 1e-3, 0.1):
        for t in (30.0, 300.0, 3000.0, 6000.0, 1e5):
            x = float(H * C / (mpf(lam) * K * mpf(t)))
            if x > 600:
                continue  # B below 1e-250: no use, and the partials follow the value
            lm, tm = mpf(lam), mpf(t)
            # second route for d/dT: the closed form B x e^x / (T (e^x - 1))
            xx = H * C / (lm * K * tm)
            dbdt = planck_wavelength(lm, tm) * xx / tm / (1 - mpmath.exp(-xx))
            out += lines_for("spectral_radiance_wavelength", planck_wavelength, (lam, t),
                             checks=((1, dbdt),))
    for nu in (1e9, 1.6e11, 3e12, 3e14, 1e15):
        for t in (2.7255, 300.0, 6000.0):
            x = float(H * mpf(nu) / (K * mpf(t)))
            if x > 600:
                continue
            nm, tm = mpf(nu), mpf(t)
            xx = H * nm / (K * tm)
            dbdt = planck_frequency(nm, tm) * xx / tm / (1 - mpmath.exp(-xx))
            out += lines_for("spectral_radiance_frequency", planck_frequency, (nu, t),
                             checks=((1, dbdt),))
    for lam, t in ((5e-7, 6000.0), (1e-5, 300.0), (1e-3, 2.7255), (1e-6, 1500.0), (0.1, 30.0)):
        radiance = float(planck_wavelength(mpf(lam), mpf(t)))
        out += lines_for("brightness_temperature_wavelength", brightness_wavelength,
                         (lam, radiance))
    for nu, t in ((1.6e11, 2.7255), (1e9, 20.0), (3e14, 6000.0), (3e12, 300.0)):
        radiance = float(planck_frequency(mpf(nu), mpf(t)))
        out += lines_for("brightness_temperature_frequency", brightness_frequency,
                         (nu, radiance))
    # bands: wide (series head and tail), and narrow (x_b < 1.5 x_a: the quadrature path)
    for l1, l2, t in ((8e-6, 1.4e-5, 300.0), (4e-7, 7e-7, 6000.0), (1e-6, 1.2e-6, 1500.0),
                      (1e-7, 1e-4, 3000.0), (3e-6, 3.3e-6, 800.0)):
        lm1, lm2, tm = mpf(l1), mpf(l2), mpf(t)
        # Leibniz: dL/dl1 = -B(l1), dL/dl2 = B(l2)
        out += lines_for("band_radiance_wavelength", band_wavelength, (l1, l2, t),
                         checks=((0, -planck_wavelength(lm1, tm)), (1, planck_wavelength(lm2, tm))))
    for n1, n2, t in ((1e11, 3e11, 2.7255), (2e13, 4e13, 300.0), (4e14, 5e14, 6000.0)):
        nm1, nm2, tm = mpf(n1), mpf(n2), mpf(t)
        out += lines_for("band_radiance_frequency", band_frequency, (n1, n2, t),
                         checks=((0, -planck_frequency(nm1, tm)), (1, planck_frequency(nm2, tm))))
    for l1, l2, t in ((8e-6, 1.4e-5, 300.0), (4e-7, 7e-7, 6000.0), (3e-6, 3.3e-6, 800.0)):
        radiance = float(band_wavelength(mpf(l1), mpf(l2), mpf(t)))
        out += lines_for("temperature_from_band_radiance_wavelength", band_temperature,
                         (l1, l2, radiance), partial_key="partial_root")
    return out


HEADER = """# Reference gradients (value and partial derivatives) for the dual-number functions.
# Written by {script} (mpmath, mp.dps = {dps}); format: tests/data/FORMAT.md, "Gradient files".
# NAME@value: the plain function's value; NAME@dI: its partial derivative with respect to
# argument I (0-based), expected = mpmath.diff of the independent mpmath implementation.
# Tolerances (central table of the script):
{tols}
"""


def write(name, lines):
    tols = "\n".join(f"#   {k}: {v[0]} {v[1]:.0e} -- {v[2]}" for k, v in TOL.items())
    path = os.path.join(DATA, name)
    with open(path, "w") as fh:
        fh.write(HEADER.format(script=SCRIPT, dps=DPS, tols=tols))
        for line in lines:
            fh.write(line + "\n")
    print(f"wrote {path}: {len(lines)} vectors")


def main():
    which = sys.argv[1:] or ["blackbody", "cosmology"]
    if "blackbody" in which:
        write("gradients/blackbody.txt", blackbody())
    if "cosmology" in which:
        import gradient_cosmology  # noqa: E402  (the cosmology half, same conventions)
        write("gradients/cosmology.txt", gradient_cosmology.vectors(lines_for, fmt, TOL))


if __name__ == "__main__":
    sys.path.insert(0, HERE)
    main()
