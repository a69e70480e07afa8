"""The two paths of a regular function's call give the same results and the same errors: the
native path of `relicore._native.Function.apply` (Python numbers and C-contiguous, aligned
float64 or float32 arrays whose shapes are the broadcast shape or hold one element) and the
Python path of `relicore._elementwise.apply` it hands everything else to (lists, other dtypes,
strided views, general broadcasting, numpy scalars other than float64). Also: the error names
the function the same way whatever went wrong, and help() of a class names no Rust item.
"""

from __future__ import annotations

import pydoc

import numpy as np
import pytest

import relicore
from relicore import blackbody as bb

S = bb.spectral_radiance_wavelength


@pytest.fixture(scope="module")
def u():
    return relicore.Universe(h0_km_s_mpc=68.3, omega_matter=0.307)


def test_native_and_python_paths_give_the_same_bits(u):
    lam = np.geomspace(0.3e-6, 300e-6, 37)
    t = np.linspace(250.0, 3000.0, 37)
    native = S(lam, t)
    assert native.tobytes() == S(list(lam), list(t)).tobytes()  # lists: Python path
    strided = np.repeat(lam, 2)[::2]  # a strided view: Python path
    assert native.tobytes() == S(strided, t).tobytes()
    grid = S(lam[:, None], t[None, :])  # general broadcasting: Python path
    assert np.array_equal(np.diagonal(grid), native)
    assert native.tobytes() == np.array([S(a, b) for a, b in zip(lam, t)]).tobytes()
    z = np.linspace(0.0, 5.0, 41)
    assert u.luminosity_distance_mpc(z).tobytes() == u.luminosity_distance_mpc(list(z)).tobytes()
    assert u.luminosity_distance_mpc(z).tobytes() == np.array([u.luminosity_distance_mpc(x) for x in z]).tobytes()


@pytest.mark.parametrize(
    "bad, argument",
    [
        (-1.0, "z"),  # a bad value, Python number (native path)
        (np.array([0.5, -2.0]), "z"),  # a bad value in an array (native path)
        ([0.5, -2.0], "z"),  # a bad value in a list (Python path)
        ("0.5", "z"),  # a bad type
        (np.array([0.5 + 1j]), "z"),  # a bad dtype
    ],
)
def test_the_error_names_the_method_the_same_way(u, bad, argument):
    with pytest.raises(relicore.RelicoreError) as info:
        u.luminosity_distance_mpc(bad)
    assert info.value.function == "Universe.luminosity_distance_mpc"
    assert info.value.argument == argument
    assert str(info.value).startswith("Universe.luminosity_distance_mpc: ")


def test_a_shape_error_names_the_method(u):
    with pytest.raises(relicore.RelicoreError) as info:
        u.angular_diameter_distance_between_mpc(np.zeros(2), np.ones(3))
    assert info.value.function == "Universe.angular_diameter_distance_between_mpc"
    assert info.value.argument == "z2"


def test_help_of_the_classes_names_no_rust_item():
    for cls in (relicore.Universe, relicore.decoupling.ThermalHistory):
        text = pydoc.render_doc(cls, renderer=pydoc.plaintext)
        assert "::" not in text, [line for line in text.splitlines() if "::" in line][:5]


def test_scalars_in_give_python_floats_and_arrays_keep_their_shape(u):
    assert type(S(1e-5, 300.0)) is float
    assert type(S(np.float64(1e-5), 300)) is float
    assert type(u.age_gyr(1)) is float
    got = S(np.full((2, 3), 1e-5), np.array([300.0]))
    assert got.shape == (2, 3) and got.dtype == np.float64
    zero_d = S(np.array(1e-5), 300.0)
    assert isinstance(zero_d, np.ndarray) and zero_d.shape == ()


def test_out_receives_the_result_and_is_returned(u):
    lam = np.geomspace(1e-6, 1e-4, 12).reshape(3, 4)
    want = S(lam, 500.0)
    out = np.full((3, 4), -1.0)
    assert S(lam, 500.0, out=out) is out
    assert out.tobytes() == want.tobytes()
    # a float32 out of a float64 call: rounded as numpy's same_kind cast does
    out32 = np.empty((3, 4), dtype=np.float32)
    S(lam, 500.0, out=out32)
    assert out32.tobytes() == want.astype(np.float32).tobytes()
    # scalars into a 0-d out
    zero_d = np.empty(())
    assert u.age_gyr(1.0, out=zero_d) is zero_d and zero_d[()] == u.age_gyr(1.0)
    # a non-contiguous out (a view) gets the values in place
    base = np.zeros((3, 8))
    S(lam, 500.0, out=base[:, ::2])
    assert np.array_equal(base[:, ::2], want) and not base[:, 1::2].any()
    # nan_on_error with out
    t = np.array([300.0, -1.0, 400.0])
    o = np.empty(3)
    S(1e-5, t, nan_on_error=True, out=o)
    assert np.isnan(o[1]) and o[0] == S(1e-5, 300.0)


@pytest.mark.parametrize(
    "out, why",
    [
        (np.empty(5), "shape"),
        (np.empty((3, 4), dtype=np.int64), "dtype"),
        ([0.0] * 12, "numpy array"),
    ],
)
def test_a_bad_out_is_refused_naming_out(out, why):
    lam = np.geomspace(1e-6, 1e-4, 12).reshape(3, 4)
    with pytest.raises(relicore.RelicoreError) as info:
        S(lam, 500.0, out=out)
    assert info.value.argument == "out" and info.value.function == "spectral_radiance_wavelength"
    assert why in str(info.value)


def test_a_read_only_out_is_refused():
    out = np.empty(2)
    out.flags.writeable = False
    with pytest.raises(relicore.RelicoreError, match="read-only"):
        S(np.array([1e-5, 2e-5]), 300.0, out=out)
