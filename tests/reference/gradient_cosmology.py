"""The cosmology half of tests/reference/gradient_vectors.py (see its docstring for the model
and the independence rules). Massless neutrinos only: partials with respect to a non-zero
neutrino mass are not written here."""

import mpmath
from mpmath import mp, mpf

C_KM_S = mpf(299792458) / 1000
MPC_M = mpf(648000) / mpmath.pi * mpf(149597870700) * mpf(10) ** 6
GYR_S = mpf("365.25") * 86400 * mpf(10) ** 9
G = mpf("6.67430e-11")
HP = mpf("6.62607015e-34")
KB = mpf("1.380649e-23")
C = mpf(299792458)
HBAR = HP / (2 * mpmath.pi)
A_RAD = mpmath.pi**2 * KB**4 / (15 * HBAR**3 * C**3)
NU_PER_PHOTON = mpf(7) / 8 * (mpf(4) / 11) ** (mpf(4) / 3)

# parameter order of the gradient (src/cosmology/gradient.rs): the twelve numbers of a
# `universe` line, then the argument
NAMES = ["h0", "om", "ob", "ok", "t0", "neff", "m1", "m2", "m3", "w0", "wa", "yp"]


class Model:
    def __init__(self, p):
        (self.h0, self.om, self.ob, self.ok, self.t0, self.neff, m1, m2, m3, self.w0, self.wa,
         self.yp) = p
        if m1 or m2 or m3:
            raise ValueError("massless neutrinos only")
        h0_si = self.h0 * 1000 / MPC_M
        rho_c = 3 * h0_si**2 / (8 * mpmath.pi * G)
        og = A_RAD * self.t0**4 / C**2 / rho_c
        self.orad = og * (1 + self.neff * NU_PER_PHOTON)
        self.ode = 1 - self.om - self.orad - self.ok
        self.dh = C_KM_S / self.h0
        self.th = MPC_M / 1000 / self.h0 / GYR_S

    def e2(self, a):
        de = self.ode * a ** (-3 * (1 + self.w0 + self.wa)) * mpmath.exp(-3 * self.wa * (1 - a))
        return self.om / a**3 + self.orad / a**4 + self.ok / a**2 + de

    def chi(self, z):
        # D_C / D_H = int_0^z dz'/E
        return mpmath.quad(lambda x: 1 / mpmath.sqrt(self.e2(1 / (1 + x))), [0, z] if z <= 10 else [0, 1, 10, z])

    def dm(self, z):
        x = self.chi(z)
        if self.ok > 0:
            r = mpmath.sqrt(self.ok)
            return self.dh * mpmath.sinh(r * x) / r
        if self.ok < 0:
            r = mpmath.sqrt(-self.ok)
            return self.dh * mpmath.sin(r * x) / r
        return self.dh * x

    def age(self, z):
        # t_H int_0^a da/(a E), a = s^2: 2 s ds / (s^2 E(s^2))
        s1 = 1 / mpmath.sqrt(1 + z)
        return self.th * mpmath.quad(lambda s: 2 / (s * mpmath.sqrt(self.e2(s * s))), [0, s1])

    def hubble(self, z):
        return self.h0 * mpmath.sqrt(self.e2(1 / (1 + z)))


def luminosity(m, z):
    return (1 + z) * m.dm(z)


def comoving(m, z):
    return m.dh * m.chi(z)


FUNCS = {
    "luminosity_distance_mpc": luminosity,
    "comoving_distance_mpc": comoving,
    "hubble_parameter_km_s_mpc": lambda m, z: m.hubble(z),
    "age_gyr": lambda m, z: m.age(z),
}

UNIVERSES = [
    # name, parameters (the twelve numbers of a `universe` line)
    ("flat_lcdm", [67.4, 0.315, 0.049, 0.0, 2.7255, 3.044, 0.0, 0.0, 0.0, -1.0, 0.0, 0.245]),
    ("open_w0wa", [70.0, 0.3, 0.05, 0.05, 2.7255, 3.044, 0.0, 0.0, 0.0, -0.9, 0.2, 0.245]),
    ("closed_lcdm", [67.0, 0.32, 0.05, -0.1, 2.7255, 3.044, 0.0, 0.0, 0.0, -1.0, 0.0, 0.245]),
    ("einstein_de_sitter", [70.0, 1.0, 0.0, 0.0, 0.0, 3.044, 0.0, 0.0, 0.0, -1.0, 0.0, 0.245]),
    ("milne", [70.0, 0.0, 0.0, 1.0, 0.0, 3.044, 0.0, 0.0, 0.0, -1.0, 0.0, 0.245]),
    ("flat_lcdm_no_radiation", [70.0, 0.3, 0.0, 0.0, 0.0, 3.044, 0.0, 0.0, 0.0, -1.0, 0.0, 0.245]),
]

REDSHIFTS = {
    "luminosity_distance_mpc": [0.05, 0.5, 1.0, 3.0, 1100.0],
    "comoving_distance_mpc": [0.5, 2.0],
    "hubble_parameter_km_s_mpc": [0.0, 1.0, 10.0],
    "age_gyr": [0.0, 1.0, 10.0],
}


def closed_forms(name, fname, p, z):
    """Second routes: the value and d/dz, d/dH0 of closed forms (mpmath.diff of them)."""
    h0 = mpf(p[0])
    if name == "einstein_de_sitter" and fname == "luminosity_distance_mpc":
        f = lambda zz, hh: (1 + zz) * 2 * (C_KM_S / hh) * (1 - 1 / mpmath.sqrt(1 + zz))
    elif name == "milne" and fname == "luminosity_distance_mpc":
        f = lambda zz, hh: (C_KM_S / hh) * zz * (1 + zz / 2)
    elif name == "flat_lcdm_no_radiation" and fname == "age_gyr":
        om = mpf(p[1])
        ol = 1 - om

        def f(zz, hh):
            th = MPC_M / 1000 / hh / GYR_S
            a = 1 / (1 + zz)
            return th * 2 / (3 * mpmath.sqrt(ol)) * mpmath.asinh(mpmath.sqrt(ol / om) * a**1.5)
    else:
        return None
    return f


def vectors(lines_for, fmt, tol):
    out = []
    for name, p in UNIVERSES:
        out.append("universe " + name + " " + " ".join(fmt(v) for v in p))
        for fname, zs in REDSHIFTS.items():
            if name == "milne" and fname == "age_gyr":
                # at Omega_m = 0 the age's partial in Omega_m is -infinity (the integrand
                # (1/a - a^2)/2 of the derivative diverges at a = 0): no vector
                continue
            for z in zs:
                args = [z] + p

                def f(zz, *q):
                    return FUNCS[fname](Model(q), zz)

                cf = closed_forms(name, fname, p, z)
                checks = ()
                if cf is not None:
                    zm, hm = mpf(z), mpf(p[0])
                    dz = mpmath.diff(lambda t: cf(t, hm), zm)
                    dh = mpmath.diff(lambda t: cf(zm, t), hm)
                    checks = ((0, dz), (1, dh))
                # the masses sit at m = 0, where the flat Fermi-Dirac density has a partial of
                # exactly 0 (mpmath.diff cannot step below m = 0); Omega_b and Y_p do not enter
                # the background: those partials are exactly 0 by the model
                skip = {1 + NAMES.index(k) for k in ("ob", "m1", "m2", "m3", "yp")}
                lines = lines_for(fname, f, args, checks=checks, skip=skip)
                out += [f"function {name} " + line for line in lines]
    return out
