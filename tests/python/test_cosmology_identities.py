"""Identities and closed forms that relicore.Universe must satisfy, through the Python face.

Sources: the definitions of Hogg 1999 (arXiv:astro-ph/9905116) eqs. 15-30 (D_L = (1+z) D_M,
D_A = D_M/(1+z), the distance modulus, the transverse scale, dV_C/dz/dOmega = D_H D_M^2/E and
V_C of eq. 29); the age-lookback relation (lookback(z) = age(0) - age(z), the definition of
lookback time); scipy.constants for c/H0, 1/H0 and the critical density; closed forms of the
Einstein-de Sitter, Milne, flat Lambda-CDM (age) and flat matter+radiation models (integrals
of the Friedmann equation done by hand: t = (2/(3 Om^2 H0)) [sqrt(Or + Om a)(Om a - 2 Or) +
2 Or^(3/2)], c eta = (2 D_H/Om) (sqrt(Or + Om a) - sqrt(Or))).

Tolerances, each with its reason at the check: "N roundings" means N rounding errors of
2^-53 relative, i.e. about N x 1.1e-16; 1e-12 where two independent quadratures of the core
meet (its documented accuracy); the inversions round trip within 1e-12 (the core's documented
accuracy).
"""

from __future__ import annotations

import math

import numpy as np
import pytest
import scipy.constants as sc

from relicore import Universe

ROUNDING = 2.0**-53

# Invented models, one per kind of term; none is a published fit.
MODELS = {
    "flat_no_radiation": Universe(70.0, 0.3, cmb_temperature_k=0.0),
    "flat_radiation": Universe(68.0, 0.31),
    "open_radiation": Universe(72.0, 0.25, omega_curvature=0.08),
    "closed_radiation": Universe(65.0, 0.35, omega_curvature=-0.06),
    "w0wa": Universe(69.0, 0.29, w0=-0.85, wa=-0.3),
    "massive_neutrinos": Universe(67.5, 0.315, omega_baryon=0.049, n_eff=3.046, neutrino_masses_ev=(0.06, 0.0, 0.0)),
    "open_matter_only": Universe(60.0, 0.4, omega_curvature=0.6, cmb_temperature_k=0.0),
}
Z = np.concatenate([[0.0, 1e-7, 1e-4], np.geomspace(1e-2, 1e4, 31)])
ZPOS = Z[Z > 0]


def rel_err(got, want):
    got, want = np.asarray(got, dtype=float), np.asarray(want, dtype=float)
    with np.errstate(divide="ignore", invalid="ignore"):
        return np.where(want == 0, np.abs(got - want), np.abs(got - want) / np.abs(want))


def assert_rel(got, want, tol, what):
    e = rel_err(got, want)
    worst = int(np.argmax(e))
    assert float(e.max()) <= tol, f"{what}: worst relative error {e.max():.3e} > {tol:.1e} at element {worst}"


@pytest.fixture(params=sorted(MODELS))
def model(request):
    return request.param, MODELS[request.param]


def test_luminosity_and_angular_diameter_distances(model):
    name, u = model
    dl, da, dm = u.luminosity_distance_mpc(Z), u.angular_diameter_distance_mpc(Z), u.transverse_comoving_distance_mpc(Z)
    # D_L = (1+z)^2 D_A: D_M (1+z) against D_M/(1+z) (1+z)^2, about 6 roundings
    assert_rel(dl, (1 + Z) ** 2 * da, 8 * ROUNDING, f"{name} D_L = (1+z)^2 D_A")
    assert_rel(dl, (1 + Z) * dm, 4 * ROUNDING, f"{name} D_L = (1+z) D_M")
    if u.omega_curvature == 0:
        # flat: D_M is D_C (the same number)
        assert np.array_equal(dm, u.comoving_distance_mpc(Z))


def test_derived_distances_and_volumes(model):
    name, u = model
    z = ZPOS
    dl = u.luminosity_distance_mpc(z)
    # 5 log10(D_L/Mpc) + 25: a few roundings of the log, relative to a modulus > 10
    assert_rel(u.distance_modulus(z), 5 * np.log10(dl) + 25, 1e-15, f"{name} distance modulus")
    # D_A pi/648000 in kpc: three roundings
    assert_rel(u.transverse_scale_kpc_per_arcsec(z), u.angular_diameter_distance_mpc(z) * 1000 * math.pi / 648000,
               6 * ROUNDING, f"{name} transverse scale")
    dm, e = u.transverse_comoving_distance_mpc(z), u.dimensionless_hubble(z)
    assert_rel(u.differential_comoving_volume_mpc3_sr(z), u.hubble_distance_mpc * dm * dm / e, 6 * ROUNDING,
               f"{name} dV/dz/dOmega")


def test_comoving_volume_closed_forms(model):
    # Hogg 1999 eq. 29 (and its sin form): V_C from D_M alone. The open/closed forms cancel for
    # small Omega_k D_M^2/D_H^2, so only z >= 0.5 there, at 1e-10 (the cancellation costs at most
    # 1e-13 at these z); flat: (4 pi/3) D_M^3, a few roundings.
    name, u = model
    ok, dh = u.omega_curvature, u.hubble_distance_mpc
    if ok == 0:
        dm = u.transverse_comoving_distance_mpc(ZPOS)
        assert_rel(u.comoving_volume_gpc3(ZPOS), 4 * math.pi / 3 * dm**3 * 1e-9, 8 * ROUNDING, f"{name} V_C flat")
        return
    z = ZPOS[(ZPOS >= 0.5) & (ZPOS <= 1e3)]
    x = u.transverse_comoving_distance_mpc(z) / dh
    r = math.sqrt(abs(ok))
    arc = np.arcsinh(r * x) if ok > 0 else np.arcsin(r * x)
    v = 4 * math.pi * dh**3 / (2 * ok) * (x * np.sqrt(1 + ok * x * x) - arc / r)
    assert_rel(u.comoving_volume_gpc3(z), v * 1e-9, 1e-10, f"{name} V_C curved")


def test_angular_diameter_distance_between(model):
    name, u = model
    z = ZPOS
    # from z1 = 0 it is D_A (the same formula with chi1 = 0): a few roundings
    assert_rel(u.angular_diameter_distance_between_mpc(0.0, z), u.angular_diameter_distance_mpc(z), 4 * ROUNDING,
               f"{name} D_A(0, z)")
    assert np.all(u.angular_diameter_distance_between_mpc(z, z) == 0.0)
    if u.omega_curvature == 0:
        # flat: (1+z2) D_A(z1, z2) = D_C(z2) - D_C(z1); cancellation when z1 ~ z2 is avoided
        z1, z2 = z[:-5], z[5:]
        dc = u.comoving_distance_mpc
        assert_rel((1 + z2) * u.angular_diameter_distance_between_mpc(z1, z2), dc(z2) - dc(z1), 1e-13,
                   f"{name} flat D_A(z1, z2)")


def test_age_plus_lookback_is_the_age_today(model):
    # the definition of lookback time; two independent quadratures of the core meet: 1e-12
    name, u = model
    age0 = u.age_gyr(0.0)
    assert_rel(u.age_gyr(Z) + u.lookback_time_gyr(Z), np.full_like(Z, age0), 1e-12, f"{name} age + lookback")
    assert u.lookback_time_gyr(0.0) == 0.0


def test_density_parameters(model):
    name, u = model
    parts = [u.omega_matter_at(Z), u.omega_radiation_at(Z), u.omega_dark_energy_at(Z), u.omega_curvature_at(Z)]
    # they sum to 1: each is a ratio to the same E^2, a few roundings each, relative to 1
    assert np.max(np.abs(sum(parts) - 1)) <= 8 * ROUNDING, name
    assert u.omega_matter_at(0.0) == pytest.approx(u.omega_matter, rel=4 * ROUNDING)
    assert u.omega_radiation_at(0.0) == pytest.approx(u.omega_radiation, rel=4 * ROUNDING)
    assert u.omega_dark_energy_at(0.0) == pytest.approx(u.omega_dark_energy, rel=8 * ROUNDING, abs=8 * ROUNDING)
    # Omega_de today is what remains: 1 - Omega_m - Omega_r - Omega_k, within a few ulp(1)
    assert abs(u.omega_dark_energy - (1 - u.omega_matter - u.omega_radiation - u.omega_curvature)) <= 4 * ROUNDING
    assert u.dimensionless_hubble(0.0) == pytest.approx(1.0, rel=4 * ROUNDING)


def test_expansion_rate_and_temperature(model):
    name, u = model
    e = u.dimensionless_hubble(Z)
    assert np.array_equal(u.hubble_parameter_km_s_mpc(Z), u.h0_km_s_mpc * e), name  # H0 E, one rounding
    # T0 (1+z): one sum and one product, the same operations
    assert np.array_equal(u.cmb_temperature_at_k(Z), u.cmb_temperature_k * (1 + Z)), name
    # rho_c(z) = 3 H(z)^2/(8 pi G), scipy.constants G (CODATA 2022) and parsec: a few roundings
    h_si = u.hubble_parameter_km_s_mpc(Z) * 1000 / (sc.parsec * 1e6)
    assert_rel(u.critical_density_kg_m3(Z), 3 * h_si**2 / (8 * math.pi * sc.G), 1e-14, f"{name} rho_c")


def test_hubble_distance_and_time_from_scipy_constants(model):
    name, u = model
    # c/H0 with c in km/s: two roundings; Mpc/(1000 H0)/Gyr with Julian years: a few
    assert u.hubble_distance_mpc == pytest.approx(sc.c / 1000 / u.h0_km_s_mpc, rel=4 * ROUNDING)
    assert u.hubble_time_gyr == pytest.approx(sc.parsec * 1e6 / 1000 / u.h0_km_s_mpc / (sc.Julian_year * 1e9),
                                              rel=8 * ROUNDING)


def test_matter_radiation_equality_with_massless_neutrinos():
    # Omega_cb/Omega_r,all - 1 = Omega_m/Omega_r - 1 when every species is massless: a few roundings
    for name in ("flat_radiation", "open_radiation", "closed_radiation", "w0wa"):
        u = MODELS[name]
        assert u.matter_radiation_equality_redshift == pytest.approx(
            u.omega_matter / u.omega_radiation - 1, rel=8 * ROUNDING
        )


INVERSE = [
    ("redshift_at_comoving_distance_mpc", "comoving_distance_mpc"),
    ("redshift_at_luminosity_distance_mpc", "luminosity_distance_mpc"),
    ("redshift_at_lookback_time_gyr", "lookback_time_gyr"),
    ("redshift_at_age_gyr", "age_gyr"),
]


def condition(f, z):
    """kappa = |d ln z/d ln f(z)|, by a central difference (accurate to ~1e-6, plenty for a
    threshold): how much a relative error of the target is magnified in the redshift."""
    h = 1e-5
    slope = (np.log(f(z * (1 + h))) - np.log(f(z * (1 - h)))) / (math.log1p(h) - math.log1p(-h))
    return 1 / np.abs(slope)


@pytest.mark.parametrize("inverse, forward", INVERSE)
def test_inversions_round_trip(model, inverse, forward):
    # the core's documented accuracy: round trip within 1e-12 relative. In the target it holds
    # everywhere; in z only where the problem is well conditioned (kappa <= 1e3, as in the
    # reference vectors): near the big bang the lookback time hardly changes with z, and no
    # inversion can return z more accurately than kappa times the rounding of the target.
    name, u = model
    z = np.geomspace(1e-3, 1e4, 15)
    if u.omega_curvature < 0 and forward == "luminosity_distance_mpc":
        z = z[z <= 10]  # D_L of a closed model need not be monotone far out: one root in range
    f = getattr(u, forward)
    target = f(z)
    back = getattr(u, inverse)(target)
    again = f(back)
    assert_rel(again, target, 1e-12, f"{name} {forward}({inverse}(target))")
    well = condition(f, z) <= 1e3
    assert well.sum() >= 8, f"{name} {forward}: too few well-conditioned redshifts"
    assert_rel(back[well], z[well], 1e-12, f"{name} {inverse}({forward}(z)), kappa <= 1e3")


def test_inversions_of_zero():
    u = MODELS["flat_radiation"]
    for inverse, _ in INVERSE[:3]:
        assert getattr(u, inverse)(0.0) == 0.0
    assert u.redshift_at_age_gyr(u.age_gyr(0.0)) == pytest.approx(0.0, abs=1e-12)


# --- closed forms -------------------------------------------------------------------------


def test_einstein_de_sitter():
    u = Universe(70.0, 1.0, cmb_temperature_k=0.0)
    dh, th = u.hubble_distance_mpc, u.hubble_time_gyr
    # D_C = 2 D_H (1 - 1/sqrt(1+z)); 1 - s formed without cancellation as z/(r (1 + r))
    r = np.sqrt(1 + ZPOS)
    assert_rel(u.comoving_distance_mpc(ZPOS), 2 * dh * ZPOS / (r * (1 + r)), 1e-12, "EdS D_C")
    assert_rel(u.age_gyr(Z), 2 / 3 * th * (1 + Z) ** -1.5, 1e-12, "EdS age")
    assert_rel(u.conformal_time_mpc(Z), 2 * dh / np.sqrt(1 + Z), 1e-12, "EdS conformal time")
    assert_rel(u.dimensionless_hubble(Z), (1 + Z) ** 1.5, 8 * ROUNDING, "EdS E")


def test_milne():
    u = Universe(70.0, 0.0, omega_curvature=1.0, cmb_temperature_k=0.0)
    dh, th = u.hubble_distance_mpc, u.hubble_time_gyr
    assert_rel(u.luminosity_distance_mpc(Z), dh * Z * (1 + Z / 2), 1e-12, "Milne D_L")
    assert_rel(u.lookback_time_gyr(ZPOS), th * ZPOS / (1 + ZPOS), 1e-12, "Milne lookback")
    assert_rel(u.dimensionless_hubble(Z), 1 + Z, 4 * ROUNDING, "Milne E")


def test_flat_lambda_cdm_age():
    om = 0.3
    u = Universe(70.0, om, cmb_temperature_k=0.0)
    ol = u.omega_dark_energy
    want = 2 / (3 * math.sqrt(ol)) * u.hubble_time_gyr * np.arcsinh(np.sqrt(ol / om) * (1 + Z) ** -1.5)
    assert_rel(u.age_gyr(Z), want, 1e-12, "flat LCDM age")


def test_flat_matter_plus_radiation():
    # Omega_m = 1 - Omega_r, no dark energy (to rounding): age and conformal time in closed form
    omega_r = Universe(70.0, 0.3).omega_radiation
    om = 1.0 - omega_r
    u = Universe(70.0, om)
    assert abs(u.omega_dark_energy) <= 4 * ROUNDING
    a = 1 / (1 + Z[Z <= 1e4])
    w = np.sqrt(omega_r + om * a)
    age = 2 / (3 * om**2) * (w * (om * a - 2 * omega_r) + 2 * omega_r**1.5) * u.hubble_time_gyr
    assert_rel(u.age_gyr(Z[Z <= 1e4]), age, 1e-12, "matter+radiation age")
    eta = 2 / om * (w - math.sqrt(omega_r)) * u.hubble_distance_mpc
    assert_rel(u.conformal_time_mpc(Z[Z <= 1e4]), eta, 1e-12, "matter+radiation conformal time")
