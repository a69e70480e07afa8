"""Hypothesis tests of relicore.growth with hostile inputs: the contract of
test_hypothesis_blackbody.py for every element-wise call of the growth topic (the free
Eisenstein & Hu transfer functions, the methods of LinearGrowth and LinearPowerSpectrum): the
result equals the scalar calls bit for bit and is finite, or RelicoreError names the function,
the argument, its value and the first failing index; nan_on_error=True gives NaN exactly at the
failing elements. Spectra built from hostile options give a spectrum or RelicoreError naming the
parameter with a documented status, never a crash; the properties of a spectrum are finite.
Facts checked on the same random inputs (definitions, not numbers of our own): D(0) = 1,
S8 = sigma8 (Omega_m/0.3)^(1/2), f sigma8(z) = f(z) D(z) sigma8.

The function lists come from the table (tests/python/faces_table.py), so a new growth entry
joins these tests without an edit here.
"""

from __future__ import annotations

import functools
import math

import pytest
from faces_table import GROWTH_FUNCTIONS, GROWTH_METHODS, SPECTRUM_METHODS, SPECTRUM_PROPERTIES
from hypothesis import given
from hypothesis import strategies as st
from test_hypothesis_blackbody import SETTINGS, VALUES, check_elementwise, element_arguments

import relicore
from relicore.growth import LinearGrowth, LinearPowerSpectrum

# sigma(R) costs a quadrature per element: fewer elements for it
SLOW = {"density_rms_in_sphere"}


@functools.cache
def spectrum() -> LinearPowerSpectrum:
    u = relicore.Universe(67.36, 0.3153, omega_baryon=0.0493)
    return LinearPowerSpectrum(LinearGrowth(u), scalar_amplitude=2.1e-9, spectral_index=0.9649)


@pytest.mark.parametrize("name", sorted(GROWTH_FUNCTIONS))
@SETTINGS
@given(data=st.data())
def test_free_functions(name, data):
    argnames = list(GROWTH_FUNCTIONS[name])
    args, arrays, shape = data.draw(element_arguments(len(argnames)))
    check_elementwise(name, argnames, getattr(relicore.growth, name), args, arrays, shape)


@pytest.mark.parametrize("name", sorted(GROWTH_METHODS))
@SETTINGS
@given(data=st.data())
def test_growth_methods(name, data):
    g = spectrum().growth
    argnames = list(GROWTH_METHODS[name])
    args, arrays, shape = data.draw(element_arguments(len(argnames)))
    check_elementwise(f"LinearGrowth.{name}", argnames, getattr(g, name), args, arrays, shape)


@pytest.mark.parametrize("name", sorted(SPECTRUM_METHODS))
@SETTINGS
@given(data=st.data())
def test_spectrum_methods(name, data):
    p = spectrum()
    argnames = list(SPECTRUM_METHODS[name])
    args, arrays, shape = data.draw(element_arguments(len(argnames)))
    if name in SLOW and sum(a.size for a in arrays) > 8:
        return
    check_elementwise(f"LinearPowerSpectrum.{name}", argnames, getattr(p, name), args, arrays, shape)


def test_properties_are_finite_and_their_definitions():
    p = spectrum()
    for name in SPECTRUM_PROPERTIES:
        assert math.isfinite(getattr(p, name)), name
    assert p.s8 == pytest.approx(p.sigma8 * math.sqrt(0.3153 / 0.3), rel=1e-15)
    g = p.growth
    assert g.growth_factor(0.0) == 1.0
    for z in (0.0, 0.5, 2.0):
        want = g.growth_rate(z) * g.growth_factor(z) * p.sigma8
        assert p.growth_rate_times_sigma8(z) == pytest.approx(want, rel=4e-16)


@SETTINGS
@given(value=VALUES, spectral_index=VALUES, running=VALUES, sigma8=st.booleans(),
       form=st.sampled_from(["baryon_oscillations", "no_wiggle"]))
def test_hostile_spectrum_options(value, spectral_index, running, sigma8, form):
    g = spectrum().growth
    norm = {"sigma8" if sigma8 else "scalar_amplitude": value}
    try:
        p = LinearPowerSpectrum(g, transfer_form=form, spectral_index=spectral_index, running=running, **norm)
    except relicore.RelicoreError as err:
        assert err.function == "LinearPowerSpectrum"
        assert err.status in (-2, -3, -10, -11, -14), str(err)
        assert err.argument in (None, "transfer_form", "sigma8", "scalar_amplitude", "spectral_index", "running",
                                "universe"), str(err)
        return
    assert value > 0 and math.isfinite(value) and math.isfinite(spectral_index) and math.isfinite(running)
    for name in SPECTRUM_PROPERTIES:
        assert math.isfinite(getattr(p, name)), name
