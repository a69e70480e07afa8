"""Expected values of the fuzzing regression tests (tests/fuzz_regressions.rs), computed here with
mpmath at 40 digits from the definitions, independently of the library:

* Hubble time t_H = 1 Mpc / (1000 H0 m/s) in Gyr, with 1 pc = 648000/pi au, 1 au =
  149 597 870 700 m (IAU 2012 B2, IAU 2015 B2) and 1 Gyr = 1e9 Julian years of 365.25 days;
* photon density a_rad T0^4 / c^2 with a_rad = pi^2 k^4 / (15 hbar^3 c^3) (SI 2019 exact h, k, c)
  over the critical density 3 H0^2 / (8 pi G), G = 6.67430e-11 (CODATA 2022); each of the
  N_eff massless neutrino species 7/8 (4/11)^(4/3) / 3 of it times N_eff (common practice);
* ages as t_H int_0^a a' da' / sqrt(a'^4 E^2(a')) by mpmath.quad (tanh-sinh; in a' = a t, the
  integrand scaled to 1 at t = 1), with
  a^4 E^2 = Omega_r + Omega_m a + Omega_de a^(1 - 3 (w0 + wa)) exp(-3 wa (1 - a)) (flat; the
  Friedmann equation with w0-wa dark energy, Chevallier & Polarski 2001, Linder 2003);
* closed forms where they exist (named at each value);
* Planck's law with the exact SI 2019 h, c, k: B_lambda = 2hc^2/lambda^5 / expm1(hc/(lambda k T)),
  B_nu = 2h nu^3/c^2 / expm1(h nu/(k T)); brightness temperatures
  T = (hc/(lambda k)) / log1p(2hc^2/(lambda^5 L)) and (h nu/k) / log1p(2h nu^3/(c^2 L)) (Planck's
  law solved for T); band radiances as K4 T^4 int_0^x t^3/expm1(t) dt, K4 = 2k^4/(h^3 c^2),
  x = hc/(lambda k T) (mpmath.quad), for the exact binary values of the arguments.

Run: .venv/bin/python fuzz/regression_values.py (prints the values the test file quotes).
"""
from mpmath import mp, mpf, sqrt, quad, log, pi, exp, expm1

mp.dps = 40

C = mpf(299792458)
H = mpf("6.62607015e-34")
HBAR = H / (2 * pi)
KB = mpf("1.380649e-23")
G = mpf("6.67430e-11")
AU = mpf(149597870700)
MPC = 648000 / pi * AU * 10**6
GYR = mpf(10)**9 * mpf("365.25") * 86400


def hubble_time_gyr(h0):
    return MPC / (1000 * mpf(h0)) / GYR


def omega_radiation(h0, t0, n_eff):
    h0_si = mpf(h0) * 1000 / MPC
    rho_crit = 3 * h0_si**2 / (8 * pi * G)
    a_rad = pi**2 * KB**4 / (15 * HBAR**3 * C**3)
    photon = a_rad * mpf(t0)**4 / C**2 / rho_crit
    return photon * (1 + mpf(n_eff) * mpf(7) / 8 * (mpf(4) / 11) ** (mpf(4) / 3))


def age(h0, om, t0, n_eff, w0, wa, z):
    om = mpf(om)
    orad = omega_radiation(h0, t0, n_eff) if t0 else mpf(0)
    ode = 1 - om - orad
    w0, wa = mpf(w0), mpf(wa)

    def q2(a):
        return orad + om * a + ode * a ** (1 - 3 * (w0 + wa)) * exp(-3 * wa * (1 - a))

    # a = a_z t, and the integrand scaled to 1 at t = 1: mpmath.quad stops on an absolute error
    # estimate, so an integrand of 1e-100 would be returned far less accurately than its digits
    a_z = 1 / (1 + mpf(z))
    scale = a_z / sqrt(q2(a_z))
    inner = quad(lambda t: (a_z * t / sqrt(q2(a_z * t))) / scale, [0, mpf(1) / 2, 1])
    return hubble_time_gyr(h0) * a_z * scale * inner


def show(name, v):
    print(f"{name:60s} {mp.nstr(v, 20)}")


# 1. flat, Omega_m = 0.3, no radiation, w0 = 3 (H0 = 70): the age at z = 1e8, 1e20 and 1e26; at 1e26
#    also the closed form of a past ruled by dark energy with w = 3, t_H / (6 sqrt(Omega_de)
#    (1+z)^6), whose matter correction is (0.3/0.7) (1+z)^-9 relative
show("w0=3 age(1e8)", age(70, 0.3, 0, 0, 3, 0, mpf("1e8")))
show("w0=3 age(1e20)", age(70, 0.3, 0, 0, 3, 0, mpf("1e20")))
show("w0=3 age(1e26)", age(70, 0.3, 0, 0, 3, 0, mpf("1e26")))
show("w0=3 age(1e26) closed form", hubble_time_gyr(70) / (6 * sqrt(1 - mpf(0.3)) * (1 + mpf("1e26")) ** 6))

# 2. nearly empty: Omega_m = 1e-308, T0 = 3e-202 K (Omega_r ~ 1e-806, 0 in f64): de Sitter,
#    lookback time t_H ln(1+z) up to relative terms of 1e-308 (1+z)^3 (closed form)
for z in ("10", "1e4", "1e12"):
    show(f"empty lookback({z})", hubble_time_gyr(67.36) * log(1 + mpf(z)))

# 3. flat, H0 = 67.36, Omega_m = 0.3153, T0 = 2.7255 K, N_eff = 3.044 massless, w0 = -1,
#    wa = 10^0.5 (the fuzzer's largest wa): the age near the top of the inversions' bracket
wa = mpf(10) ** mpf("0.5")
wa = mpf(float(wa))  # the f64 the test uses
u_max = mpf(float("27.631021115928547"))
z_top = mpf(float(expm1(u_max)))  # the f64 z of the top of the bracket
for z in (mpf("1.005e12"), z_top):
    show(f"wa=10^0.5 age({mp.nstr(z, 17)})", age(67.36, 0.3153, 2.7255, 3.044, -1, wa, z))

# 4. f32 model: flat, Omega_m = f32(0.3), no radiation, w0 = -0.5: E(1)^2 = Omega_m 8 +
#    Omega_de 2^1.5 (closed form)
om32 = mpf(float.fromhex("0x1.333334p-2"))  # f32 nearest to 0.3
show("f32 w0=-0.5 E(1)", sqrt(om32 * 8 + (1 - om32) * mpf(2) ** mpf("1.5")))

# 5. ages by octaves (the single quadrature fails): flat, no radiation, H0 = 67.36
#    (a) dark energy alone, w0 = -0.9 (the f64 value): age(z) = t_H 2/(3(1+w)) (1+z)^(-3(1+w)/2)
#        (closed form of a single fluid with constant w)
w = mpf(-0.9)
for z in ("0", "1e3", "1e12"):
    show(f"w=-0.9 alone age({z})", hubble_time_gyr(67.36) * 2 / (3 * (1 + w)) * (1 + mpf(z)) ** (-3 * (1 + w) / 2))
#    (b) Omega_m = 1e-200 with a cosmological constant: age(z) = t_H 2/(3 sqrt(Omega_L))
#        asinh(sqrt(Omega_L/Omega_m) (1+z)^(-3/2)) (closed form of flat matter + Lambda)
om = mpf(1e-200)
ol = 1 - om
for z in ("0", "1e3"):
    show(f"Omega_m=1e-200 age({z})", hubble_time_gyr(67.36) * 2 / (3 * sqrt(ol)) * mp.asinh(sqrt(ol / om) * (1 + mpf(z)) ** mpf(-1.5)))


# 6. Planck's law and its closed-form inverse where 2h nu^3/c^2, 2hc^2/lambda^5, x or a/L are
#    below the normal range (blackbody fuzz findings; tests/blackbody_edges.rs)
H_SI, K_SI = H, KB


def b_nu(nu, t):
    nu, t = mpf(nu), mpf(t)
    return 2 * H_SI * nu**3 / C**2 / expm1(H_SI * nu / (K_SI * t))


def b_lambda(lam, t):
    lam, t = mpf(lam), mpf(t)
    return 2 * H_SI * C**2 / lam**5 / expm1(H_SI * C / (lam * K_SI * t))


def t_nu(nu, radiance):
    nu, radiance = mpf(nu), mpf(radiance)
    return (H_SI * nu / K_SI) / mp.log1p(2 * H_SI * nu**3 / (C**2 * radiance))


def t_lambda(lam, radiance):
    lam, radiance = mpf(lam), mpf(radiance)
    return (H_SI * C / (lam * K_SI)) / mp.log1p(2 * H_SI * C**2 / (lam**5 * radiance))


def band_lambda(lo, t):
    """Band radiance of [lo, inf) in W m^-2 sr^-1."""
    lo, t = mpf(lo), mpf(t)
    x = H_SI * C / (lo * K_SI * t)
    k4 = 2 * K_SI**4 / (H_SI**3 * C**2)
    # scaled: t = x s, the integral x^3 int_0^1 s^3 x/expm1(x s) ds (integrand near s^2 for tiny x)
    inner = quad(lambda s: s**3 * x / expm1(x * s) if s > 0 else mpf(0), [0, 1])
    return k4 * t**4 * x**3 * inner


for nu, t in ((3.0681834431356214e-91, 0.01), (1.0388853614941867e-13, 1e300)):
    show(f"B_nu({nu!r}, {t!r})", b_nu(nu, t))
for lam, t in ((1.04e59, 0.01), (1e62, 1.0), (1e10, 1e300)):
    show(f"B_lambda({lam!r}, {t!r})", b_lambda(lam, t))
for lam, radiance in ((1.04e59, 7e-253), (1.0, 1.1e292)):
    show(f"T_b(lambda={lam!r}, L={radiance!r})", t_lambda(lam, radiance))
for nu, radiance in ((3.0681834431356214e-91, 2.9e-223), (1e-13, 3e234)):
    show(f"T_b(nu={nu!r}, L={radiance!r})", t_nu(nu, radiance))
for lo, t in ((1.09e99, 3.79e6), (1.09e99, 1e20), (1e100, 1e250)):
    show(f"band [{lo!r}, inf) at {t!r}", band_lambda(lo, t))


def band_lambda2(lo, up, t):
    """Band radiance of [lo, up] in W m^-2 sr^-1 (x_b = x(lo) > x_a = x(up))."""
    lo, up, t = mpf(lo), mpf(up), mpf(t)
    xb = H_SI * C / (lo * K_SI * t)
    xa = H_SI * C / (up * K_SI * t)
    k4 = 2 * K_SI**4 / (H_SI**3 * C**2)
    inner = quad(lambda s: s**3 * xb / expm1(xb * s), [xa / xb, 1])
    return k4 * t**4 * xb**3 * inner


# 7. a band whose K4 T^4 overflows (T above about 1.7e79 K) while its radiance is normal
for lo, up, t in ((0.997473462943497, 1.7369343996094755e98, 1.7369343990923917e98), (1e-3, 1.0, 1e90)):
    show(f"band [{lo!r}, {up!r}] at {t!r}", band_lambda2(lo, up, t))
