//! The C ABI with arbitrary bytes as `struct relicore_universe` and
//! `struct relicore_thermal_history`, calling every function that takes one of them (88
//! exports; the lists below are checked against `bindings/c/prototypes.txt` by `make fuzz`).
//! Run under AddressSanitizer (cargo-fuzz's default sanitizer): each struct, each input and each
//! output array lives in its own heap block of exactly its size, so a read outside it stops
//! the run.
//!
//! The structs are built from the fuzzer's bytes: NULL; all zeros, a valid value (the defaults
//! with Ω_b = 0.0493, or a universe from `relicore_universe_init` with fuzzed parameters, or a
//! thermal history computed from the universe under test with fuzzed options); then the tag
//! kept, made valid or replaced by fuzzed bits; then up to eight patches of fuzzed bytes or
//! numbers anywhere in the storage (a corrupted value behind an intact tag).
//!
//! The oracle is the calling convention of `bindings/c/src/lib.rs` and the struct docs: every
//! call returns `RELICORE_OK` or a known negative code, never `RELICORE_ERROR_PANIC` (nor a
//! crash); a NULL pointer gives `RELICORE_ERROR_NULL_POINTER`, a struct without the valid tag
//! `RELICORE_ERROR_INVALID_STRUCT`; on success every output is finite, on failure NaN (array
//! forms: every element written, the failing ones NaN, the status that of the first failing
//! one, or every element NaN when the whole call fails); a failed
//! `relicore_thermal_history_compute` leaves its output cleared; no call writes into the
//! `const` struct it reads.
#![no_main]

use libfuzzer_sys::fuzz_target;
use relicore_capi::decoupling::{
    RELICORE_THERMAL_HISTORY_STORAGE_WORDS, relicore_thermal_history,
    relicore_thermal_history_compute, relicore_thermal_history_options,
    relicore_thermal_history_options_default,
};
use relicore_capi::gen_cosmology::*;
use relicore_capi::gen_decoupling::*;
use relicore_capi::gen_growth::*;
use relicore_capi::growth::{
    RELICORE_LINEAR_GROWTH_STORAGE_WORDS, relicore_linear_growth, relicore_linear_growth_compute,
};
use relicore_capi::status::*;
use relicore_capi::universe::{
    RELICORE_UNIVERSE_STORAGE_WORDS, relicore_universe, relicore_universe_get_parameters,
    relicore_universe_init, relicore_universe_parameters,
};
use relicore_fuzz::Input;
use std::sync::OnceLock;

type U = relicore_universe;
type H = relicore_thermal_history;

/// Words of each struct: the tag and the storage.
const U_WORDS: usize = 1 + RELICORE_UNIVERSE_STORAGE_WORDS;
const H_WORDS: usize = 1 + RELICORE_THERMAL_HISTORY_STORAGE_WORDS;
const G_WORDS: usize = 1 + RELICORE_LINEAR_GROWTH_STORAGE_WORDS;
const _: () = assert!(core::mem::size_of::<U>() == 8 * U_WORDS);
const _: () = assert!(core::mem::size_of::<H>() == 8 * H_WORDS);
const _: () = assert!(core::mem::size_of::<relicore_linear_growth>() == 8 * G_WORDS);

type UScalar = unsafe extern "C" fn(*const U, f64, *mut f64) -> i32;
type UArray = unsafe extern "C" fn(*const U, *const f64, usize, *mut f64) -> i32;
type UConst = unsafe extern "C" fn(*const U, *mut f64) -> i32;
type UScalar2 = unsafe extern "C" fn(*const U, f64, f64, *mut f64) -> i32;
type UArray2 = unsafe extern "C" fn(*const U, *const f64, usize, f64, *mut f64) -> i32;
type HScalar = unsafe extern "C" fn(*const H, f64, *mut f64) -> i32;
type HArray = unsafe extern "C" fn(*const H, *const f64, usize, *mut f64) -> i32;
type HConst = unsafe extern "C" fn(*const H, *mut f64) -> i32;

macro_rules! table {
    ($t:ty; $($f:ident),* $(,)?) => {
        [$((stringify!($f), $f as $t)),*]
    };
}

const U_SCALAR: [(&str, UScalar); 26] = table![UScalar;
    relicore_age_gyr, relicore_angular_diameter_distance_mpc, relicore_cmb_temperature_at_k,
    relicore_comoving_distance_mpc, relicore_comoving_volume_gpc3, relicore_conformal_time_mpc,
    relicore_critical_density_kg_m3, relicore_differential_comoving_volume_mpc3_sr,
    relicore_dimensionless_hubble, relicore_distance_modulus, relicore_hubble_distance_at_mpc,
    relicore_hubble_parameter_km_s_mpc, relicore_lookback_time_gyr,
    relicore_luminosity_distance_mpc, relicore_omega_curvature_at, relicore_omega_dark_energy_at,
    relicore_omega_matter_at, relicore_omega_radiation_at, relicore_redshift_at_age_gyr,
    relicore_redshift_at_comoving_distance_mpc, relicore_redshift_at_lookback_time_gyr,
    relicore_redshift_at_luminosity_distance_mpc, relicore_saha_ionized_fraction,
    relicore_transverse_comoving_distance_mpc, relicore_transverse_scale_kpc_per_arcsec,
    relicore_volume_averaged_distance_mpc,
];

const U_ARRAY: [(&str, UArray); 26] = table![UArray;
    relicore_age_gyr_array, relicore_angular_diameter_distance_mpc_array,
    relicore_cmb_temperature_at_k_array, relicore_comoving_distance_mpc_array,
    relicore_comoving_volume_gpc3_array, relicore_conformal_time_mpc_array,
    relicore_critical_density_kg_m3_array, relicore_differential_comoving_volume_mpc3_sr_array,
    relicore_dimensionless_hubble_array, relicore_distance_modulus_array,
    relicore_hubble_distance_at_mpc_array, relicore_hubble_parameter_km_s_mpc_array,
    relicore_lookback_time_gyr_array, relicore_luminosity_distance_mpc_array,
    relicore_omega_curvature_at_array, relicore_omega_dark_energy_at_array,
    relicore_omega_matter_at_array, relicore_omega_radiation_at_array,
    relicore_redshift_at_age_gyr_array, relicore_redshift_at_comoving_distance_mpc_array,
    relicore_redshift_at_lookback_time_gyr_array,
    relicore_redshift_at_luminosity_distance_mpc_array, relicore_saha_ionized_fraction_array,
    relicore_transverse_comoving_distance_mpc_array,
    relicore_transverse_scale_kpc_per_arcsec_array, relicore_volume_averaged_distance_mpc_array,
];

const U_CONST: [(&str, UConst); 5] = table![UConst;
    relicore_hubble_distance_mpc, relicore_hubble_time_gyr,
    relicore_matter_radiation_equality_redshift, relicore_omega_dark_energy,
    relicore_omega_radiation,
];

const U_SCALAR2: [(&str, UScalar2); 4] = table![UScalar2;
    relicore_angular_diameter_distance_between_mpc, relicore_hubble_distance_over_sound_horizon,
    relicore_transverse_comoving_distance_over_sound_horizon,
    relicore_volume_averaged_distance_over_sound_horizon,
];

const U_ARRAY2: [(&str, UArray2); 3] = table![UArray2;
    relicore_hubble_distance_over_sound_horizon_array,
    relicore_transverse_comoving_distance_over_sound_horizon_array,
    relicore_volume_averaged_distance_over_sound_horizon_array,
];

const H_SCALAR: [(&str, HScalar); 5] = table![HScalar;
    relicore_ionized_fraction, relicore_matter_temperature_k, relicore_optical_depth,
    relicore_sound_horizon_mpc, relicore_visibility,
];

const H_ARRAY: [(&str, HArray); 5] = table![HArray;
    relicore_ionized_fraction_array, relicore_matter_temperature_k_array,
    relicore_optical_depth_array, relicore_sound_horizon_mpc_array, relicore_visibility_array,
];

const H_CONST: [(&str, HConst); 10] = table![HConst;
    relicore_age_at_last_scattering_yr, relicore_angular_scale_last_scattering,
    relicore_drag_redshift, relicore_last_scattering_redshift,
    relicore_reionization_optical_depth, relicore_sound_horizon_drag_mpc,
    relicore_sound_horizon_last_scattering_mpc, relicore_temperature_at_last_scattering_k,
    relicore_thermal_decoupling_redshift, relicore_visibility_peak_redshift,
];

// and by hand below: relicore_universe_init, relicore_universe_get_parameters,
// relicore_linear_growth_compute, relicore_thermal_history_compute

/// An array element the function has not written: a NaN with a payload no function writes.
const UNWRITTEN: u64 = 0x7ff4_dead_beef_0001;

/// A valid universe (flat, H0 = 67.36, Ω_m = 0.3153, Ω_b = 0.0493, the other defaults) and a
/// thermal history of it with the default options, computed once.
struct Templates {
    universe: Vec<u64>,
    history: Vec<u64>,
}

fn templates() -> &'static Templates {
    static T: OnceLock<Templates> = OnceLock::new();
    T.get_or_init(|| {
        let mut p = relicore::cosmology::UniverseParameters::new(67.36, 0.3153);
        p.omega_baryon = 0.0493;
        let mut universe = vec![0u64; U_WORDS];
        let params = relicore_universe_parameters::from(p);
        // SAFETY: a readable parameter struct and a writable universe of exactly its size.
        let s = unsafe { relicore_universe_init(&params, universe.as_mut_ptr().cast()) };
        assert_eq!(s, RELICORE_OK, "template universe");
        let options = default_options();
        let mut history = vec![0u64; H_WORDS];
        // SAFETY: a valid universe, readable options, a writable history of exactly its size.
        let s = unsafe {
            relicore_thermal_history_compute(
                universe.as_ptr().cast(),
                &options,
                history.as_mut_ptr().cast(),
            )
        };
        assert_eq!(s, RELICORE_OK, "template history");
        Templates { universe, history }
    })
}

/// The default options of a thermal history (every field, those added later included).
fn default_options() -> relicore_thermal_history_options {
    // SAFETY: the struct is plain old data (integers and floats): all-zero bits are a value.
    let mut options: relicore_thermal_history_options = unsafe { core::mem::zeroed() };
    // SAFETY: a writable options struct.
    let s = unsafe { relicore_thermal_history_options_default(&mut options) };
    assert_eq!(s, RELICORE_OK, "relicore_thermal_history_options_default");
    options
}

/// What every call on a struct must return, before any physics: NULL, invalid, or either.
#[derive(Clone, Copy, Debug, PartialEq)]
enum Expect {
    Null,
    Invalid,
    Valid,
}

fn expect_of(words: &Option<Vec<u64>>, tag: u64) -> Expect {
    match words {
        None => Expect::Null,
        Some(w) if w.first() != Some(&tag) => Expect::Invalid,
        Some(_) => Expect::Valid,
    }
}

fn ptr<S>(words: &Option<Vec<u64>>) -> *const S {
    words
        .as_ref()
        .map_or(core::ptr::null(), |w| w.as_ptr().cast())
}

/// Base, tag and patches of one struct of `n` words from the input; `valid` is a valid value
/// and `make` may build another one (None: NULL). The flag says whether the storage may hold
/// something no fill function wrote (a zero base, or patches).
fn build(
    input: &mut Input<'_>,
    n: usize,
    valid: &[u64],
    make: impl FnOnce(&mut Input<'_>, &mut [u64]),
) -> (Option<Vec<u64>>, bool) {
    let mode = input.byte();
    let mut w = match mode % 8 {
        0 => return (None, false),
        1 => vec![0u64; n],
        2 | 3 => {
            let mut w = vec![0u64; n];
            make(input, &mut w);
            w
        }
        _ => valid.to_vec(),
    };
    let tag = valid.first().copied().unwrap_or(0);
    match (mode / 8) % 4 {
        0 | 1 => {}
        2 => {
            if let Some(t) = w.first_mut() {
                *t = tag;
            }
        }
        _ => {
            let bits = input.u64();
            if let Some(t) = w.first_mut() {
                *t = bits;
            }
        }
    }
    let patches = usize::from(input.byte() % 9);
    let corrupted = mode % 8 == 1 || patches > 0;
    for _ in 0..patches {
        let word = 1 + (input.u32() as usize) % (n - 1);
        let kind = input.byte();
        match kind % 3 {
            // a number in an 8-byte field: raw bits, an edge value or a decade range
            0 => {
                let v: f64 = input.real(-310.0, 310.0);
                if let Some(x) = w.get_mut(word) {
                    *x = v.to_bits();
                }
            }
            // an integer in an 8-byte field (counts, indices, flags)
            1 => {
                let v = u64::from(input.u16()) | (u64::from(kind / 3) << 56);
                if let Some(x) = w.get_mut(word) {
                    *x = v;
                }
            }
            // raw bytes, from the word on
            _ => {
                let len = usize::from(input.byte() % 64);
                let bytes: Vec<u8> = (0..len).map(|_| input.byte()).collect();
                for (k, chunk) in bytes.chunks(8).enumerate() {
                    let mut b = [0u8; 8];
                    b[..chunk.len()].copy_from_slice(chunk);
                    if let Some(x) = w.get_mut(word + k) {
                        *x = u64::from_le_bytes(b);
                    }
                }
            }
        }
    }
    (Some(w), corrupted)
}

fn known(status: i32) -> bool {
    (RELICORE_ERROR_CAPACITY_TOO_SMALL..=RELICORE_OK).contains(&status)
}

/// The status against what the pointers allow, and the output against the status.
fn check_scalar(name: &str, expect: Expect, out_null: bool, status: i32, out: f64) {
    assert!(known(status), "{name}: unknown status {status}");
    assert_ne!(status, RELICORE_ERROR_PANIC, "{name}: panic");
    if out_null || expect == Expect::Null {
        assert_eq!(status, RELICORE_ERROR_NULL_POINTER, "{name}: {expect:?}");
        return;
    }
    if expect == Expect::Invalid {
        assert_eq!(status, RELICORE_ERROR_INVALID_STRUCT, "{name}");
    }
    if status == RELICORE_OK {
        assert!(out.is_finite(), "{name}: OK with {out:?}");
    } else {
        assert!(out.is_nan(), "{name}: status {status} with {out:?}");
    }
}

/// An array call's status and elements: `out` was filled with [`UNWRITTEN`] before.
fn check_array(name: &str, expect: Expect, null: bool, status: i32, out: &[f64]) {
    assert!(known(status), "{name}: unknown status {status}");
    assert_ne!(status, RELICORE_ERROR_PANIC, "{name}: panic");
    if null || expect == Expect::Null {
        assert_eq!(status, RELICORE_ERROR_NULL_POINTER, "{name}: {expect:?}");
        return;
    }
    if expect == Expect::Invalid {
        assert_eq!(status, RELICORE_ERROR_INVALID_STRUCT, "{name}");
    }
    for (i, v) in out.iter().enumerate() {
        assert_ne!(v.to_bits(), UNWRITTEN, "{name}: element {i} not written");
        if status == RELICORE_OK {
            assert!(v.is_finite(), "{name}: OK with element {i} = {v:?}");
        } else {
            assert!(v.is_finite() || v.is_nan(), "{name}: element {i} = {v:?}");
        }
    }
    if status != RELICORE_OK && !out.is_empty() {
        assert!(
            out.iter().any(|v| v.is_nan()),
            "{name}: status {status} but no element failed"
        );
    }
}

/// Arguments of the array forms: n values in a block of exactly n (or NULL), an output of
/// exactly n (or NULL, or the input itself: the functions allow out = x).
struct Arrays {
    x: Option<Vec<f64>>,
    out: Option<Vec<f64>>,
    in_place: bool,
    n: usize,
}

fn arrays(input: &mut Input<'_>, lo: f64, hi: f64) -> Arrays {
    let mode = input.byte();
    let n = usize::from(mode % 7);
    let x: Vec<f64> = (0..n).map(|_| input.real(lo, hi)).collect();
    Arrays {
        x: if mode / 7 % 16 == 1 { None } else { Some(x) },
        out: if mode / 7 % 16 == 2 {
            None
        } else {
            Some(vec![f64::from_bits(UNWRITTEN); n])
        },
        in_place: mode / 7 % 16 == 3,
        n,
    }
}

impl Arrays {
    /// Runs `f(x, n, out)` and checks it.
    fn run(&self, name: &str, expect: Expect, f: impl Fn(*const f64, usize, *mut f64) -> i32) {
        let null = self.x.is_none() || self.out.is_none();
        if self.in_place && !null {
            let mut buf = self.x.clone().unwrap_or_default();
            let p = buf.as_mut_ptr();
            let status = f(p, self.n, p);
            // in place, an element the call did not write keeps its input: no UNWRITTEN check
            assert!(
                known(status) && status != RELICORE_ERROR_PANIC,
                "{name}: {status}"
            );
            if expect == Expect::Invalid {
                assert_eq!(status, RELICORE_ERROR_INVALID_STRUCT, "{name}");
            }
            if status == RELICORE_OK {
                assert!(buf.iter().all(|v| v.is_finite()), "{name}: OK with {buf:?}");
            }
            return;
        }
        let x = self.x.as_ref().map_or(core::ptr::null(), |v| v.as_ptr());
        let mut out = self.out.clone();
        let o = out
            .as_mut()
            .map_or(core::ptr::null_mut(), |v| v.as_mut_ptr());
        let status = f(x, self.n, o);
        check_array(name, expect, null, status, out.as_deref().unwrap_or(&[]));
    }
}

/// A scalar output (or NULL for 1 in 16 calls).
fn out_cell(input: &mut Input<'_>) -> Option<f64> {
    if input.byte() % 16 == 0 {
        None
    } else {
        Some(0.5)
    }
}

fn call_scalar(name: &str, expect: Expect, input: &mut Input<'_>, f: impl FnOnce(*mut f64) -> i32) {
    let mut cell = out_cell(input);
    let p = cell
        .as_mut()
        .map_or(core::ptr::null_mut(), |c| c as *mut f64);
    let status = f(p);
    check_scalar(
        name,
        expect,
        cell.is_none(),
        status,
        cell.unwrap_or(f64::NAN),
    );
}

fn universe_calls(input: &mut Input<'_>, u: *const U, expect: Expect) {
    for (name, f) in U_SCALAR {
        let z: f64 = input.real(-6.0, 13.0);
        // SAFETY: u is NULL or a readable struct of exactly its size; out NULL or one cell.
        call_scalar(name, expect, input, |o| unsafe { f(u, z, o) });
    }
    for (name, f) in U_CONST {
        // SAFETY: as above.
        call_scalar(name, expect, input, |o| unsafe { f(u, o) });
    }
    for (name, f) in U_SCALAR2 {
        let a: f64 = input.real(-6.0, 13.0);
        let b: f64 = input.real(-6.0, 13.0);
        // SAFETY: as above.
        call_scalar(name, expect, input, |o| unsafe { f(u, a, b, o) });
    }
    for (name, f) in U_ARRAY {
        let a = arrays(input, -6.0, 13.0);
        // SAFETY: x NULL or n readable values, out NULL or n writable (or x itself).
        a.run(name, expect, |x, n, o| unsafe { f(u, x, n, o) });
    }
    for (name, f) in U_ARRAY2 {
        let a = arrays(input, -6.0, 13.0);
        let rd: f64 = input.real(0.0, 3.0);
        // SAFETY: as above.
        a.run(name, expect, |x, n, o| unsafe { f(u, x, n, rd, o) });
    }
    // the parameters back: on failure every field NaN
    let mut params =
        relicore_universe_parameters::from(relicore::cosmology::UniverseParameters::new(1.0, 1.0));
    let null_out = input.byte() % 16 == 0;
    let out = if null_out {
        core::ptr::null_mut()
    } else {
        &mut params as *mut relicore_universe_parameters
    };
    // SAFETY: u as above; out NULL or a writable parameter struct.
    let status = unsafe { relicore_universe_get_parameters(u, out) };
    let fields = [
        params.h0_km_s_mpc,
        params.omega_matter,
        params.omega_baryon,
        params.omega_curvature,
        params.cmb_temperature_k,
        params.n_eff,
        params.neutrino_masses_ev[0],
        params.neutrino_masses_ev[1],
        params.neutrino_masses_ev[2],
        params.w0,
        params.wa,
        params.helium_mass_fraction,
    ];
    let name = "relicore_universe_get_parameters";
    assert!(
        known(status) && status != RELICORE_ERROR_PANIC,
        "{name}: {status}"
    );
    if null_out || expect == Expect::Null {
        assert_eq!(status, RELICORE_ERROR_NULL_POINTER, "{name}");
    } else if expect == Expect::Invalid {
        assert_eq!(status, RELICORE_ERROR_INVALID_STRUCT, "{name}");
    }
    if status != RELICORE_OK && !null_out {
        assert!(
            fields.iter().all(|v| v.is_nan()),
            "{name}: {status} with {fields:?}"
        );
    }
}

fn history_calls(input: &mut Input<'_>, h: *const H, expect: Expect) {
    for (name, f) in H_SCALAR {
        let z: f64 = input.real(-6.0, 5.0);
        // SAFETY: h is NULL or a readable struct of exactly its size; out NULL or one cell.
        call_scalar(name, expect, input, |o| unsafe { f(h, z, o) });
    }
    for (name, f) in H_CONST {
        // SAFETY: as above.
        call_scalar(name, expect, input, |o| unsafe { f(h, o) });
    }
    for (name, f) in H_ARRAY {
        let a = arrays(input, -6.0, 5.0);
        // SAFETY: x NULL or n readable values, out NULL or n writable (or x itself).
        a.run(name, expect, |x, n, o| unsafe { f(h, x, n, o) });
    }
}

/// `relicore_thermal_history_compute` of the universe under test with fuzzed options into a
/// struct of exactly its size: the status, and a cleared output on failure.
fn compute_history(input: &mut Input<'_>, u: *const U, expect: Expect, out: &mut [u64]) -> i32 {
    let mut options = default_options();
    options.reionization = i32::from(input.byte() % 4) - 1;
    options.reionization_redshift = input.real(-2.0, 3.0);
    options.highest_redshift = input.real(3.3, 4.3);
    if input.byte() % 4 == 0 {
        options.helium_reionization_redshift = input.real(-2.0, 2.0);
        options.helium_reionization_width = input.real(-2.0, 2.0);
    }
    let null_options = input.byte() % 16 == 0;
    let o = if null_options {
        core::ptr::null()
    } else {
        &options as *const relicore_thermal_history_options
    };
    // SAFETY: u NULL or readable, o NULL or readable, out writable and of exactly its size.
    let status = unsafe { relicore_thermal_history_compute(u, o, out.as_mut_ptr().cast()) };
    let name = "relicore_thermal_history_compute";
    assert!(
        known(status) && status != RELICORE_ERROR_PANIC,
        "{name}: {status}"
    );
    if null_options || expect == Expect::Null {
        assert_eq!(status, RELICORE_ERROR_NULL_POINTER, "{name}");
    } else if expect == Expect::Invalid {
        assert_eq!(status, RELICORE_ERROR_INVALID_STRUCT, "{name}");
    }
    if status != RELICORE_OK {
        assert!(
            out.iter().all(|&w| w == 0),
            "{name}: {status}, output not cleared"
        );
    }
    status
}

fuzz_target!(|data: &[u8]| {
    let t = templates();
    let mut input = Input::new(data);
    let u_tag = t.universe.first().copied().unwrap_or(0);
    let h_tag = t.history.first().copied().unwrap_or(0);

    let (u, _) = build(&mut input, U_WORDS, &t.universe, |input, w| {
        let p = relicore_universe_parameters::from(relicore_fuzz::parameters::<f64>(input));
        // SAFETY: a readable parameter struct, a writable universe of exactly its size.
        let s = unsafe { relicore_universe_init(&p, w.as_mut_ptr().cast()) };
        assert!(
            known(s) && s != RELICORE_ERROR_PANIC,
            "relicore_universe_init: {s}"
        );
        if s != RELICORE_OK {
            assert!(w.iter().all(|&x| x == 0), "failed init left a value");
        }
    });
    let u_expect = expect_of(&u, u_tag);
    let u_ptr: *const U = ptr(&u);

    // a thermal history: the template, or computed from the universe under test (milliseconds:
    // for 1 input in 4)
    let compute = input.byte() % 4 == 0;
    let (h, _) = build(&mut input, H_WORDS, &t.history, |input, w| {
        if compute {
            compute_history(input, u_ptr, u_expect, w);
        }
    });
    let h_expect = expect_of(&h, h_tag);
    let h_ptr: *const H = ptr(&h);
    let (u_before, h_before) = (u.clone(), h.clone());

    universe_calls(&mut input, u_ptr, u_expect);
    history_calls(&mut input, h_ptr, h_expect);

    // the linear growth of the universe under test (milliseconds: for 1 input in 8)
    if input.byte() % 8 == 0 {
        let mut g = vec![0u64; G_WORDS];
        // SAFETY: u NULL or readable; g writable and of exactly its size.
        let s = unsafe { relicore_linear_growth_compute(u_ptr, g.as_mut_ptr().cast()) };
        let name = "relicore_linear_growth_compute";
        assert!(known(s) && s != RELICORE_ERROR_PANIC, "{name}: {s}");
        match u_expect {
            Expect::Null => assert_eq!(s, RELICORE_ERROR_NULL_POINTER, "{name}"),
            Expect::Invalid => assert_eq!(s, RELICORE_ERROR_INVALID_STRUCT, "{name}"),
            Expect::Valid => {}
        }
    }

    // nothing wrote into the const structs
    assert!(u == u_before, "a function wrote into its const universe");
    assert!(
        h == h_before,
        "a function wrote into its const thermal history"
    );
});
