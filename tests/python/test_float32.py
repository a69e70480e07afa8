"""float32 in, float32 out: a function whose table entry has a single-precision twin (`f32 = true`
in bindings/functions.toml, `relicore._native.Function.single`) computes float32 input with the
core's f32 twin and returns float32; every other function computes float64 and returns float64.

Checked against:
* the C library's `_f32` functions, bit for bit: the C test program's `--dump` mode prints the
  8 hex digits of every `_f32` value vector of tests/data/blackbody.txt (see
  test_cross_language.py for the program's lookup; a missing program is a failure when
  RELICORE_REQUIRE_CROSS=1, as `make test` sets it, and a skip otherwise);
* the `_f32` reference vectors themselves (mpmath values rounded to f32, their `ulp32`
  tolerances, tests/data/FORMAT.md), through float32 arrays, which do not need the C program;
* the `_f32` lines of tests/data/thermometry.txt (the C thermometry dump prints only the double
  lines), within their tolerances, for the numbers and the `_with_uncertainty` results;
* numpy's promotion rules (NEP 50) for which calls are float32.
"""

from __future__ import annotations

import os
import struct
import subprocess

import numpy as np
import pytest

import relicore
from relicore import blackbody as bb
from relicore._elementwise import FUNCTIONS
from refdata import ROOT, SCALAR_FILE, read_scalar_file, report, within
from thermometry_refdata import field
from test_cross_language import PROGRAMS, program

SINGLE = sorted(name for name, f in FUNCTIONS.items() if f.single)


def test_the_twins_are_the_table_entries_with_f32():
    import tomllib

    table = tomllib.loads((ROOT / "bindings" / "functions.toml").read_text())
    want = sorted(
        f["name"]
        for f in table["function"]
        if f.get("f32") and f.get("receiver", "none") == "none"
    )
    assert SINGLE == want and len(SINGLE) >= 14


def f32_vectors():
    """The `_f32` value vectors of blackbody.txt whose function has a twin in Python."""
    out = []
    for v in read_scalar_file(SCALAR_FILE):
        if v.is_f32 and not v.is_status and v.name[: -len("_f32")] in SINGLE:
            out.append(v)
    return out


def python_f32(v) -> np.float32:
    """The Python face on float32 arrays of one element (the array path)."""
    fn = getattr(bb, v.name[: -len("_f32")])
    args = [np.array([a], dtype=np.float32) for a in v.args]
    got = fn(*args)
    assert got.dtype == np.float32 and got.shape == (1,), (v.where(), got.dtype)
    return got[0]


def bits32(x: np.float32) -> str:
    return struct.pack(">f", float(x)).hex()


def test_float32_vectors_within_their_tolerance():
    vectors = f32_vectors()
    assert len(vectors) > 200
    for v in vectors:
        for a in v.args:
            assert float(np.float32(a)) == a, f"{v.where()}: argument not exact in f32"
        got = float(python_f32(v))
        assert within(v, got), report(v, got)


def test_float32_bits_equal_the_c_f32_functions():
    language, env, defaults, runs = PROGRAMS[0]
    assert language == "C"
    exe = program(env, defaults)
    if not exe.exists():
        message = f"C dump program {exe} not found (set {env} or build it)"
        if os.environ.get("RELICORE_REQUIRE_CROSS") == "1":
            pytest.fail(message)
        pytest.skip(message)
    command = [str(exe), "--dump", *runs[0]]
    run = subprocess.run(command, capture_output=True, text=True, timeout=600, cwd=ROOT)
    assert run.returncode == 0, run.stderr[-2000:]
    theirs = []
    for line in run.stdout.splitlines():
        fields = line.split()
        if len(fields) == 2 and fields[0].endswith("_f32") and fields[0][: -len("_f32")] in SINGLE:
            theirs.append((fields[0], fields[1].lower()))
    ours = [(v.name, bits32(python_f32(v))) for v in f32_vectors()]
    assert [n for n, _ in theirs] == [n for n, _ in ours], "the C program's _f32 lines and the vector file differ"
    differ = [f"#{i} {n}: C {b}, Python {a}" for i, ((n, a), (_, b)) in enumerate(zip(ours, theirs)) if a != b]
    assert not differ, f"{len(differ)} of {len(ours)} float32 values differ from C:\n" + "\n".join(differ[:40])


def test_array_broadcast_and_scalar_paths_agree_in_float32():
    lam = np.geomspace(0.3e-6, 300e-6, 257).astype(np.float32)
    t = np.float32(1234.5)
    simd = bb.spectral_radiance_wavelength(lam, t)  # the SIMD array form of the twin
    assert simd.dtype == np.float32
    # the element loop (temperature an array too) and the numpy-scalar path
    loop = bb.spectral_radiance_wavelength(lam, np.full(lam.shape, t))
    each = np.array([bb.spectral_radiance_wavelength(x, t) for x in lam])
    assert each.dtype == np.float32
    assert simd.tobytes() == loop.tobytes() == each.tobytes()
    # a non-contiguous float32 view goes through the Python path, same bits
    assert bb.spectral_radiance_wavelength(lam[::2], t).tobytes() == simd[::2].tobytes()
    grid = bb.spectral_radiance_wavelength(lam[:, None], np.array([300.0, 1234.5], dtype=np.float32))
    assert grid.dtype == np.float32 and grid.shape == (257, 2)
    assert grid[:, 1].tobytes() == simd.tobytes()


def test_float32_is_not_the_float64_result():
    # the f32 twin computes in single precision: over many inputs some results differ from
    # the float64 result rounded to float32 (a float64 computation would never differ)
    lam = np.geomspace(0.3e-6, 300e-6, 4001).astype(np.float32)
    got = bb.spectral_radiance_wavelength(lam, 1234.5)
    rounded = bb.spectral_radiance_wavelength(lam.astype(np.float64), 1234.5).astype(np.float32)
    assert got.dtype == np.float32
    assert np.any(got != rounded)
    assert np.allclose(got, rounded, rtol=1e-5)


def test_promotion_follows_numpy():
    lam32 = np.array([1e-5, 2e-5], dtype=np.float32)
    lam64 = lam32.astype(np.float64)
    f32 = np.float32
    # Python numbers are weak: they take the array's precision
    assert bb.spectral_radiance_wavelength(lam32, 300.0).dtype == np.float32
    assert bb.spectral_radiance_wavelength(lam32, 300).dtype == np.float32
    # numpy float32 scalars give a numpy float32 scalar
    s = bb.spectral_radiance_wavelength(f32(1e-5), f32(300.0))
    assert type(s) is np.float32 and s == bb.spectral_radiance_wavelength(lam32, 300.0)[0]
    assert type(bb.spectral_radiance_wavelength(f32(1e-5), 300.0)) is np.float32
    # a float64 array or numpy float64 scalar with float32 gives float64 (numpy's result type)
    assert bb.spectral_radiance_wavelength(lam32, np.array(300.0)).dtype == np.float64
    assert bb.spectral_radiance_wavelength(lam32, np.float64(300.0)).dtype == np.float64
    assert bb.spectral_radiance_wavelength(lam32, lam64).dtype == np.float64
    # integers and float16 compute in float64
    assert bb.radiant_exitance(np.arange(100, 103, dtype=np.int32)).dtype == np.float64
    assert bb.radiant_exitance(np.array([300.0], dtype=np.float16)).dtype == np.float64
    # Python numbers and float64 stay as they were
    assert type(bb.spectral_radiance_wavelength(1e-5, 300.0)) is float
    assert bb.spectral_radiance_wavelength(lam64, 300.0).dtype == np.float64


def test_functions_without_a_twin_compute_float32_input_in_float64():
    t32 = np.array([300.5, 1234.25, 5800.125], dtype=np.float32)
    assert not FUNCTIONS["radiant_exitance"].single
    got = bb.radiant_exitance(t32)
    assert got.dtype == np.float64
    assert got.tobytes() == bb.radiant_exitance(t32.astype(np.float64)).tobytes()
    u = relicore.Universe(h0_km_s_mpc=67.9, omega_matter=0.31)
    z32 = np.array([0.25, 1.5], dtype=np.float32)
    assert u.age_gyr(z32).dtype == np.float64
    assert type(u.age_gyr(np.float32(1.5))) is float


def test_float32_errors_name_the_argument_and_index():
    t = np.array([300.0, -2.0, 400.0], dtype=np.float32)
    with pytest.raises(relicore.RelicoreError) as info:
        bb.spectral_radiance_wavelength(np.float32(1e-5), t)
    err = info.value
    assert (err.function, err.argument, err.index) == ("spectral_radiance_wavelength", "temperature_k", (1,))
    got = bb.spectral_radiance_wavelength(np.float32(1e-5), t, nan_on_error=True)
    assert got.dtype == np.float32 and np.isnan(got[1]) and np.isfinite(got[[0, 2]]).all()


def test_thermometry_float32_vectors_within_their_tolerance():
    """The `_f32` lines of tests/data/thermometry.txt (numbers and the fields of the
    `_with_uncertainty` results) through float32 arrays of one element: float32 results from
    the single-precision twins, within the lines' tolerances (mpmath rounded to f32)."""
    from thermometry_refdata import read_scalar_file as thermometry_lines

    checked = 0
    for v in thermometry_lines():
        base = v.function[: -len("_f32")] if v.is_f32 else None
        if base not in SINGLE or v.is_status or v.table is not None:
            continue
        result = getattr(bb, base)(*[np.array([a], dtype=np.float32) for a in v.args])
        if v.field is None:
            assert result.dtype == np.float32, v.where()
            got = float(result[0])
        else:
            assert result.temperature_k.dtype == np.float32, v.where()
            row = result._replace(
                **{k: (x[0] if k != "inputs" else int(x[0])) for k, x in result._asdict().items()}
            )
            got = field(row, v.field)
        assert within(v, got), report(v, got)
        checked += 1
    assert checked > 150


def test_float32_result_values_in_every_form():
    signal = bb.measured_spectral_radiance_wavelength(10e-6, 350.0, 0.9, 300.0, 0.95, 290.0)
    args = (10e-6, signal, 0.9, 300.0, 0.95, 290.0, 0.01 * signal, 0.01, 1.0, 0.01, 1.0)
    fn = bb.object_temperature_wavelength_with_uncertainty
    arrays = fn(*[np.array([a, a], dtype=np.float32) for a in args])
    assert arrays.temperature_k.dtype == np.float32 and arrays.sensitivity_coefficients.shape == (2, 5)
    scalars = fn(*[np.float32(a) for a in args])
    assert type(scalars.temperature_k) is np.float32 and scalars.temperature_k == arrays.temperature_k[0]
    assert scalars.sensitivity_coefficients.tobytes() == arrays.sensitivity_coefficients[0].tobytes()
    assert int(scalars.inputs) == int(arrays.inputs[0])
    assert abs(float(scalars.temperature_k) - 350.0) < 1e-3 * 350.0
    # float64 input and mixed input stay float64
    assert type(fn(*args).temperature_k) is float
    mixed = fn(np.array([10e-6], dtype=np.float32), *[np.array([a]) for a in args[1:]])
    assert mixed.temperature_k.dtype == np.float64
