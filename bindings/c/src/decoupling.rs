//! Decoupling in `double`: Saha equilibrium of a universe, the published fits of the
//! last-scattering and drag redshifts, and the thermal history — the caller-owned
//! `struct relicore_thermal_history` that holds a computed core `ThermalHistory<f64>`, its
//! options struct, the function that computes it, its queries at a redshift and its summary.
//! The functions of a history are generated (`gen_decoupling`). The model and its references:
//! the module doc of `relicore::decoupling`.
//!
//! Storage: tagged words (see `stored`); `relicore_thermal_history_compute` computes the core
//! value in place in them (`ThermalHistory::compute_in_place`: no large temporary on the stack).

use crate::boundary::{Failure, boundary, non_null};
use crate::status::RELICORE_ERROR_OUT_OF_DOMAIN;
use crate::stored::{stored, stored_clear, stored_place, stored_ref, stored_seal};
use crate::universe::relicore_universe;
use relicore::decoupling::{
    DEFAULT_HELIUM_REIONIZATION_REDSHIFT, DEFAULT_HELIUM_REIONIZATION_WIDTH,
    DEFAULT_HIGHEST_REDSHIFT, HistoryOptions, ThermalHistory,
};

/// Number of 8-byte words of storage in `struct relicore_thermal_history` (163840 bytes; the
/// core history, 2048 table nodes of eight columns and a copy of the universe, takes about
/// 144 KB of them, the rest is room to grow without changing the size of the struct).
pub const RELICORE_THERMAL_HISTORY_STORAGE_WORDS: usize = 20480;

/// The options of a thermal history, as `relicore_thermal_history_compute` takes them. Fill it
/// with `relicore_thermal_history_options_default`, change what differs, then compute. A plain
/// value.
#[allow(non_camel_case_types)]
#[repr(C)]
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct relicore_thermal_history_options {
    /// 0: no reionisation (default; `reionization_redshift` is then ignored); 1: tanh
    /// reionisation of hydrogen at `reionization_redshift` (a tanh in (1+z)^{3/2} of width
    /// Δz = 0.5, Lewis 2008) and of helium's second electron at `helium_reionization_redshift`
    /// (a tanh in z of width `helium_reionization_width`). Any other value is refused with
    /// `RELICORE_ERROR_OUT_OF_DOMAIN`.
    pub reionization: i32,
    /// Reionisation redshift z_re, finite, 0 ≤ z_re ≤ 100 (used only when `reionization` = 1;
    /// the default is NaN, unset, so it must be set when reionisation is switched on).
    pub reionization_redshift: f64,
    /// Highest redshift of the table, where the integration starts in Saha equilibrium: finite,
    /// ≥ 3000 and ≤ 10⁴ (default 10⁴; above 10⁴, beyond a rounding allowance of 1e-11
    /// relative, the 2048 nodes are too few: `RELICORE_ERROR_CAPACITY_TOO_SMALL`).
    pub highest_redshift: f64,
    /// Redshift of helium's second reionisation (He II → He III), the centre of its tanh in z:
    /// finite, 0 ≤ z ≤ 20 (default 3.5, Planck Collaboration 2020, A&A 641, A6, Sect. 3.3; from
    /// memory). Used only with reionisation, checked always.
    pub helium_reionization_redshift: f64,
    /// Width Δz of helium's second reionisation tanh: finite, 0.1 ≤ Δz ≤ 10 (default 0.5, same
    /// source). Used only with reionisation, checked always.
    pub helium_reionization_width: f64,
}

impl relicore_thermal_history_options {
    /// The core options, or `RELICORE_ERROR_OUT_OF_DOMAIN` for an unknown reionisation switch.
    fn to_core(self) -> Result<HistoryOptions<f64>, Failure> {
        let reionization_redshift = match self.reionization {
            0 => None,
            1 => Some(self.reionization_redshift),
            _ => return Err(Failure::Call(RELICORE_ERROR_OUT_OF_DOMAIN)),
        };
        Ok(HistoryOptions {
            reionization_redshift,
            highest_redshift: self.highest_redshift,
            helium_reionization_redshift: self.helium_reionization_redshift,
            helium_reionization_width: self.helium_reionization_width,
        })
    }
}

/// A computed recombination and thermal history of one universe (its ionised fraction and
/// matter temperature on a table of 2048 nodes uniform in ln(1+z), the optical depths from
/// z = 0, and its summary: last scattering, drag epoch, sound horizons, θ*, …), built by
/// `relicore_thermal_history_compute`; every query takes a `const struct
/// relicore_thermal_history *`. It keeps its own copy of the universe: the universe struct may
/// be changed or discarded afterwards.
///
/// Caller-owned and fixed-size: `sizeof(struct relicore_thermal_history)` = 8 + 8 ×
/// `RELICORE_THERMAL_HISTORY_STORAGE_WORDS` = 163848 bytes, aligned like `uint64_t`. That is
/// large for a thread's stack: put it in static storage, inside your own (heap or static)
/// structs, or allocate it; there is nothing to free besides your own allocation.
///
/// It is a plain value: it may be copied with memcpy or plain assignment and the copy works the
/// same; it may be read by any number of threads at once. Its fields are private to the
/// library: do not read or write them. A struct that `relicore_thermal_history_compute` did not
/// fill (or whose compute failed) is refused with `RELICORE_ERROR_INVALID_STRUCT`.
#[allow(non_camel_case_types)]
#[repr(C)]
#[derive(Clone, Copy)]
pub struct relicore_thermal_history {
    /// Validity tag written last by a successful `relicore_thermal_history_compute` (0 after a
    /// failed one). Private to the library.
    pub tag: u64,
    /// The history itself. Private to the library.
    pub storage: [u64; RELICORE_THERMAL_HISTORY_STORAGE_WORDS],
}

stored!(
    relicore_thermal_history,
    ThermalHistory<f64>,
    RELICORE_THERMAL_HISTORY_STORAGE_WORDS,
    b"RELIHIST"
);

// ------------------------------------------------------------------------------------- Saha

// ------------------------------------------------------------------------------------- fits

// --------------------------------------------------------------------------- the history

/// Fills `*out` with the default options: no reionisation (`reionization` = 0,
/// `reionization_redshift` NaN, unset), a table up to `highest_redshift` = 10⁴, and helium's
/// second reionisation (when reionisation is on) at `helium_reionization_redshift` = 3.5 with
/// `helium_reionization_width` = 0.5.
///
/// * `out`: the options struct.
///
/// Returns `RELICORE_OK`, or `RELICORE_ERROR_NULL_POINTER` when `out` is NULL (nothing is
/// written).
///
/// # Safety
/// `out` is NULL or points to a writable `struct relicore_thermal_history_options`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_thermal_history_options_default(
    out: *mut relicore_thermal_history_options,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            let o = relicore_thermal_history_options {
                reionization: 0,
                reionization_redshift: f64::NAN,
                highest_redshift: DEFAULT_HIGHEST_REDSHIFT,
                helium_reionization_redshift: DEFAULT_HELIUM_REIONIZATION_REDSHIFT,
                helium_reionization_width: DEFAULT_HELIUM_REIONIZATION_WIDTH,
            };
            // SAFETY: out is non-NULL and writable (this function's contract).
            unsafe { out.write(o) };
            Ok(())
        },
        || {},
    )
}

/// Computes the recombination and thermal history of a universe into `*out`: hydrogen by the
/// Peebles three-level atom (case-B coefficient of Pequignot et al. 1991 with the fudge factor
/// 1.14 of Seager, Sasselov & Scott 1999, two-photon 2s decay, Lyman-α escape), helium in Saha
/// equilibrium coupled through the electron density, the matter temperature coupled to the
/// radiation by Compton scattering, integrated in ln(1+z) from the highest redshift (in Saha
/// equilibrium) to z = 0 by a stiff Rosenbrock stepper onto 2048 nodes; then the Thomson and
/// drag optical depths, and the summary (last scattering, drag epoch, sound horizons, θ*, age
/// and temperature at last scattering, visibility peak, thermal decoupling, reionisation
/// optical depth). Compute once, then query it any number of times, from any number of
/// threads. It is written in place: no large temporary on the stack.
///
/// * `universe`: from `relicore_universe_init`; it needs baryons (Ω_b > 0) and radiation
///   (T0 > 0). The history keeps a copy of it.
/// * `options`: see `struct relicore_thermal_history_options`
///   (`relicore_thermal_history_options_default`).
/// * `out`: the history (caller-owned storage, see `struct relicore_thermal_history`).
///
/// Returns `RELICORE_OK`, or an error code with `*out` cleared (tag and storage zeroed, so every
/// function refuses it with `RELICORE_ERROR_INVALID_STRUCT`): `RELICORE_ERROR_NULL_POINTER` when
/// a pointer is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not filled by a
/// successful `relicore_universe_init`; `RELICORE_ERROR_INVALID_PARAMETER` for a universe
/// without baryons or without radiation; `RELICORE_ERROR_OUT_OF_DOMAIN` for a `reionization`
/// switch other than 0 or 1, a reionisation redshift above 100, a highest redshift below
/// 3000, a helium reionisation redshift above 20 or a helium reionisation width outside
/// [0.1, 10]; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite reionisation redshift (when
/// reionisation is on), highest redshift, helium reionisation redshift or width;
/// `RELICORE_ERROR_NEGATIVE` for a negative reionisation or helium reionisation redshift; `RELICORE_ERROR_CAPACITY_TOO_SMALL` for a highest redshift above 10⁴
/// by more than 1e-11 relative (more than the 2048 nodes can cover at their spacing); `RELICORE_ERROR_NO_CONVERGENCE` if the
/// integration or a root search fails (not seen for physical parameters).
///
/// Cost: milliseconds (fastest of 20 for Planck-like parameters on the two-core development
/// machine: 1.4 ms, 2.4 ms with reionisation); allocates nothing.
///
/// Accuracy: x_e and T_m within 1e-5 relative from z = 1600 to 50, z* and z_drag within 1e-5,
/// against an independent scipy `solve_ivp` (Radau) integration of the same equations
/// (`tests/data/decoupling.txt`). The model itself (Peebles atom with the 1.14 fudge factor,
/// helium in Saha equilibrium) reproduces full recombination calculations only to about 0.1 %
/// near last scattering.
///
/// Reference: Peebles 1968, ApJ 153, 1; Pequignot, Petitjean & Boisson 1991, A&A 251, 680;
/// Seager, Sasselov & Scott 1999, ApJ 523, L1; the tanh reionisation of Lewis 2008, PRD 78,
/// 023002.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `options` is NULL or
/// points to a readable `struct relicore_thermal_history_options`; `out` is NULL or points to a
/// writable `struct relicore_thermal_history` that overlaps neither.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_thermal_history_compute(
    universe: *const relicore_universe,
    options: *const relicore_thermal_history_options,
    out: *mut relicore_thermal_history,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            // SAFETY: out is non-NULL and writable (this function's contract).
            unsafe { stored_clear(out) };
            non_null(options)?;
            // the universe struct is checked before the options (as in every function)
            // SAFETY: NULL or readable, and not overlapping `out` (this function's contract).
            let u = unsafe { stored_ref(universe) }?;
            // SAFETY: non-NULL and readable (this function's contract).
            let opts = unsafe { options.read() }.to_core()?;
            // SAFETY: `out` is cleared, writable and nothing else refers to it during the call.
            unsafe { stored_place(out) }.compute_in_place(u, opts)?;
            // SAFETY: out is non-NULL and writable. The tag is written last.
            unsafe { stored_seal(out) };
            Ok(())
        },
        // SAFETY: out is NULL or writable (this function's contract).
        || unsafe { stored_clear(out) },
    )
}

// ------------------------------------------------------------------------------- summary

#[cfg(test)]
mod tests {
    use super::*;
    use crate::gen_decoupling::*;
    use crate::status::*;
    use crate::universe::{
        RELICORE_UNIVERSE_STORAGE_WORDS, relicore_universe_init, relicore_universe_parameters,
        relicore_universe_parameters_default,
    };
    use relicore::cosmology::Universe;
    use relicore::decoupling as dc;

    type Query = unsafe extern "C" fn(*const relicore_thermal_history, f64, *mut f64) -> i32;
    type CoreQuery = fn(&ThermalHistory<f64>, f64) -> relicore::Result<f64>;
    type Fit = unsafe extern "C" fn(f64, f64, *mut f64) -> i32;
    type CoreFit = fn(f64, f64) -> relicore::Result<f64>;

    fn blank_universe() -> Box<relicore_universe> {
        Box::new(relicore_universe {
            tag: 0,
            storage: [0; RELICORE_UNIVERSE_STORAGE_WORDS],
        })
    }

    fn blank_history() -> Box<relicore_thermal_history> {
        // built on the heap: the struct is too large for comfort on a test thread's stack
        let b: Box<[u64]> = vec![0; 1 + RELICORE_THERMAL_HISTORY_STORAGE_WORDS].into_boxed_slice();
        // SAFETY: relicore_thermal_history is repr(C) of 1 + WORDS u64 words, alignment 8:
        // exactly the layout of the boxed slice, and every bit pattern is a value.
        unsafe { Box::from_raw(Box::into_raw(b).cast::<relicore_thermal_history>()) }
    }

    fn parameters(omega_baryon: f64) -> relicore_universe_parameters {
        let mut p = <relicore_universe_parameters as crate::boundary::NotANumber>::NAN;
        // SAFETY: p is writable.
        assert_eq!(
            unsafe { relicore_universe_parameters_default(67.4, 0.315, &mut p) },
            RELICORE_OK
        );
        p.omega_baryon = omega_baryon;
        p
    }

    fn universe(omega_baryon: f64) -> Box<relicore_universe> {
        let p = parameters(omega_baryon);
        let mut u = blank_universe();
        // SAFETY: valid pointers.
        assert_eq!(unsafe { relicore_universe_init(&p, &mut *u) }, RELICORE_OK);
        u
    }

    fn options() -> relicore_thermal_history_options {
        let mut o = relicore_thermal_history_options {
            reionization: 7,
            reionization_redshift: 1.0,
            highest_redshift: 1.0,
            helium_reionization_redshift: 1.0,
            helium_reionization_width: 1.0,
        };
        // SAFETY: o is writable.
        assert_eq!(
            unsafe { relicore_thermal_history_options_default(&mut o) },
            RELICORE_OK
        );
        o
    }

    #[test]
    fn the_struct_is_a_tag_and_its_words() {
        assert_eq!(
            size_of::<relicore_thermal_history>(),
            8 * (1 + RELICORE_THERMAL_HISTORY_STORAGE_WORDS)
        );
        assert_eq!(size_of::<relicore_thermal_history>(), 163_848);
        assert_eq!(align_of::<relicore_thermal_history>(), 8);
        assert_eq!(size_of::<relicore_thermal_history_options>(), 40);
    }

    #[test]
    fn default_options_are_the_core_defaults() {
        let o = options();
        assert_eq!(o.reionization, 0);
        assert!(o.reionization_redshift.is_nan());
        assert_eq!(o.to_core(), Ok(HistoryOptions::<f64>::default()));
        // SAFETY: NULL is allowed.
        let code = unsafe { relicore_thermal_history_options_default(std::ptr::null_mut()) };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);
        let on = relicore_thermal_history_options {
            reionization: 1,
            reionization_redshift: 7.5,
            highest_redshift: 5000.0,
            helium_reionization_redshift: 4.0,
            helium_reionization_width: 0.25,
        };
        assert_eq!(
            on.to_core(),
            Ok(HistoryOptions {
                reionization_redshift: Some(7.5),
                highest_redshift: 5000.0,
                helium_reionization_redshift: 4.0,
                helium_reionization_width: 0.25,
            })
        );
        for switch in [-1, 2, i32::MAX, i32::MIN] {
            let bad = relicore_thermal_history_options {
                reionization: switch,
                ..on
            };
            assert_eq!(
                bad.to_core(),
                Err(Failure::Call(RELICORE_ERROR_OUT_OF_DOMAIN))
            );
        }
    }

    /// Every query and summary value of the C struct equals the core's own history, bit for bit,
    /// with and without reionisation; copies work the same.
    #[test]
    #[cfg_attr(miri, ignore = "a history takes minutes under miri")]
    fn compute_stores_the_core_history() {
        let u = universe(0.0493);
        // SAFETY: u was initialised.
        let core_u: &Universe<f64> = unsafe { stored_ref(&*u) }.unwrap_or_else(|_| panic!());
        for reion in [None, Some(7.7)] {
            let mut o = options();
            if let Some(z) = reion {
                o.reionization = 1;
                o.reionization_redshift = z;
            }
            let core = Box::new(
                ThermalHistory::<f64>::new(core_u, o.to_core().unwrap_or_else(|_| panic!()))
                    .unwrap_or_else(|e| panic!("{e}")),
            );
            let mut h = blank_history();
            // SAFETY: valid pointers.
            assert_eq!(
                unsafe { relicore_thermal_history_compute(&*u, &o, &mut *h) },
                RELICORE_OK
            );
            let copy = h.clone();
            let queries: [(Query, CoreQuery); 5] = [
                (relicore_ionized_fraction, |h, z| h.ionized_fraction(z)),
                (relicore_matter_temperature_k, |h, z| {
                    h.matter_temperature_k(z)
                }),
                (relicore_optical_depth, |h, z| h.optical_depth(z)),
                (relicore_visibility, |h, z| h.visibility(z)),
                (relicore_sound_horizon_mpc, |h, z| h.sound_horizon_mpc(z)),
            ];
            for (f, g) in queries {
                for z in [0.0, 3.0, 7.7, 1089.9, 9999.0, 1e4, 2e4, -1.0, f64::NAN] {
                    let mut v = 0.5;
                    let mut w = 0.5;
                    // SAFETY: valid pointers.
                    let (s, t) = unsafe { (f(&*h, z, &mut v), f(&*copy, z, &mut w)) };
                    match g(&core, z) {
                        Ok(want) => {
                            assert_eq!((s, v.to_bits()), (RELICORE_OK, want.to_bits()), "z = {z}");
                            assert_eq!((t, w.to_bits()), (s, v.to_bits()));
                        }
                        Err(e) => {
                            assert_eq!(s, crate::status::status_of(e), "z = {z}");
                            assert!(v.is_nan() && w.is_nan() && t == s);
                        }
                    }
                }
            }
            let summary: [(
                unsafe extern "C" fn(*const relicore_thermal_history, *mut f64) -> i32,
                f64,
            ); 10] = [
                (
                    relicore_last_scattering_redshift,
                    core.last_scattering_redshift(),
                ),
                (relicore_drag_redshift, core.drag_redshift()),
                (
                    relicore_sound_horizon_last_scattering_mpc,
                    core.sound_horizon_last_scattering_mpc(),
                ),
                (
                    relicore_sound_horizon_drag_mpc,
                    core.sound_horizon_drag_mpc(),
                ),
                (
                    relicore_angular_scale_last_scattering,
                    core.angular_scale_last_scattering(),
                ),
                (
                    relicore_age_at_last_scattering_yr,
                    core.age_at_last_scattering_yr(),
                ),
                (
                    relicore_temperature_at_last_scattering_k,
                    core.temperature_at_last_scattering_k(),
                ),
                (
                    relicore_visibility_peak_redshift,
                    core.visibility_peak_redshift(),
                ),
                (
                    relicore_thermal_decoupling_redshift,
                    core.thermal_decoupling_redshift(),
                ),
                (
                    relicore_reionization_optical_depth,
                    core.reionization_optical_depth(),
                ),
            ];
            for (f, want) in summary {
                let mut v = 0.5;
                // SAFETY: valid pointers.
                assert_eq!(unsafe { f(&*copy, &mut v) }, RELICORE_OK);
                assert_eq!(v.to_bits(), want.to_bits());
                // SAFETY: NULL out is allowed.
                assert_eq!(
                    unsafe { f(&*h, std::ptr::null_mut()) },
                    RELICORE_ERROR_NULL_POINTER
                );
            }
            assert_eq!(reion.is_some(), core.reionization_optical_depth() > 0.0);
            // the array form of a query, in place
            let mut zs = [0.0, 500.0, -2.0, 1100.0];
            let want: Vec<f64> = zs
                .iter()
                .map(|&z| core.visibility(z).unwrap_or(f64::NAN))
                .collect();
            // SAFETY: zs holds 4 values, written in place.
            let code = unsafe {
                crate::gen_decoupling::relicore_visibility_array(
                    &*h,
                    zs.as_ptr(),
                    4,
                    zs.as_mut_ptr(),
                )
            };
            assert_eq!(code, RELICORE_ERROR_NEGATIVE);
            for (a, b) in zs.iter().zip(&want) {
                assert!(a.to_bits() == b.to_bits() || (a.is_nan() && b.is_nan()));
            }
        }
    }

    /// A failed compute clears the struct (it was a valid history before) and every function
    /// refuses it; the error codes of the options and of the universe.
    #[test]
    #[cfg_attr(miri, ignore = "a history takes minutes under miri")]
    fn failures_clear_the_struct() {
        let u = universe(0.0493);
        let mut h = blank_history();
        let good = options();
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_thermal_history_compute(&*u, &good, &mut *h) },
            RELICORE_OK
        );
        assert_eq!(
            h.tag,
            <relicore_thermal_history as crate::stored::Stored>::TAG
        );
        let no_baryons = universe(0.0);
        let cases: [(relicore_thermal_history_options, &relicore_universe, i32); 13] = [
            (
                relicore_thermal_history_options {
                    reionization: 2,
                    ..good
                },
                &*u,
                RELICORE_ERROR_OUT_OF_DOMAIN,
            ),
            (
                relicore_thermal_history_options {
                    reionization: 1,
                    ..good
                },
                &*u,
                RELICORE_ERROR_NON_FINITE,
            ),
            (
                relicore_thermal_history_options {
                    reionization: 1,
                    reionization_redshift: -1.0,
                    ..good
                },
                &*u,
                RELICORE_ERROR_NEGATIVE,
            ),
            (
                relicore_thermal_history_options {
                    reionization: 1,
                    reionization_redshift: 100.5,
                    ..good
                },
                &*u,
                RELICORE_ERROR_OUT_OF_DOMAIN,
            ),
            (
                relicore_thermal_history_options {
                    highest_redshift: 2999.0,
                    ..good
                },
                &*u,
                RELICORE_ERROR_OUT_OF_DOMAIN,
            ),
            (
                relicore_thermal_history_options {
                    highest_redshift: 1.0001e4,
                    ..good
                },
                &*u,
                RELICORE_ERROR_CAPACITY_TOO_SMALL,
            ),
            (
                relicore_thermal_history_options {
                    highest_redshift: f64::INFINITY,
                    ..good
                },
                &*u,
                RELICORE_ERROR_NON_FINITE,
            ),
            (
                relicore_thermal_history_options {
                    helium_reionization_redshift: f64::NAN,
                    ..good
                },
                &*u,
                RELICORE_ERROR_NON_FINITE,
            ),
            (
                relicore_thermal_history_options {
                    helium_reionization_redshift: -0.5,
                    ..good
                },
                &*u,
                RELICORE_ERROR_NEGATIVE,
            ),
            (
                relicore_thermal_history_options {
                    helium_reionization_redshift: 21.0,
                    ..good
                },
                &*u,
                RELICORE_ERROR_OUT_OF_DOMAIN,
            ),
            (
                relicore_thermal_history_options {
                    helium_reionization_width: 0.0,
                    ..good
                },
                &*u,
                RELICORE_ERROR_OUT_OF_DOMAIN,
            ),
            (good, &*no_baryons, RELICORE_ERROR_INVALID_PARAMETER),
            (good, &*blank_universe(), RELICORE_ERROR_INVALID_STRUCT),
        ];
        for (o, uu, want) in cases {
            // a valid history before each failing call
            // SAFETY: valid pointers.
            assert_eq!(
                unsafe { relicore_thermal_history_compute(&*u, &good, &mut *h) },
                RELICORE_OK
            );
            // SAFETY: valid pointers.
            let code = unsafe { relicore_thermal_history_compute(uu, &o, &mut *h) };
            assert_eq!(code, want, "{o:?}");
            assert_eq!(h.tag, 0);
            assert!(h.storage.iter().all(|&w| w == 0));
            let mut v = 1.0;
            // SAFETY: valid pointers.
            assert_eq!(
                unsafe { relicore_last_scattering_redshift(&*h, &mut v) },
                RELICORE_ERROR_INVALID_STRUCT
            );
            assert!(v.is_nan());
        }
        // NULL pointers
        // SAFETY: NULL arguments are allowed.
        unsafe {
            assert_eq!(
                relicore_thermal_history_compute(std::ptr::null(), &good, &mut *h),
                RELICORE_ERROR_NULL_POINTER
            );
            assert_eq!(h.tag, 0);
            assert_eq!(
                relicore_thermal_history_compute(&*u, std::ptr::null(), &mut *h),
                RELICORE_ERROR_NULL_POINTER
            );
            assert_eq!(
                relicore_thermal_history_compute(&*u, &good, std::ptr::null_mut()),
                RELICORE_ERROR_NULL_POINTER
            );
        }
    }

    #[test]
    fn foreign_and_null_histories_are_refused() {
        let mut h = blank_history();
        let mut v = 1.0;
        // SAFETY: valid pointers (a zeroed struct).
        assert_eq!(
            unsafe { relicore_ionized_fraction(&*h, 1000.0, &mut v) },
            RELICORE_ERROR_INVALID_STRUCT
        );
        assert!(v.is_nan());
        h.tag = <relicore_thermal_history as crate::stored::Stored>::TAG ^ 1;
        v = 1.0;
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_drag_redshift(&*h, &mut v) },
            RELICORE_ERROR_INVALID_STRUCT
        );
        assert!(v.is_nan());
        // a zeroed storage behind a valid tag: the summary values are 0, finite; a NaN one is
        // refused as overwritten storage
        h.tag = <relicore_thermal_history as crate::stored::Stored>::TAG;
        // SAFETY: valid pointers.
        assert_eq!(unsafe { relicore_drag_redshift(&*h, &mut v) }, RELICORE_OK);
        h.storage.iter_mut().for_each(|w| *w = f64::NAN.to_bits());
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_drag_redshift(&*h, &mut v) },
            RELICORE_ERROR_INVALID_STRUCT
        );
        assert!(v.is_nan());
        v = 1.0;
        // SAFETY: NULL history is allowed.
        assert_eq!(
            unsafe { relicore_optical_depth(std::ptr::null(), 1.0, &mut v) },
            RELICORE_ERROR_NULL_POINTER
        );
        assert!(v.is_nan());
    }

    #[test]
    fn saha_and_fits_are_the_core_functions() {
        let u = universe(0.05);
        // SAFETY: u was initialised.
        let core_u: &Universe<f64> = unsafe { stored_ref(&*u) }.unwrap_or_else(|_| panic!());
        for z in [0.0, 1000.0, 1500.0, 6000.0, 1e8, 1.1e8, -1.0, f64::NAN] {
            let mut v = 0.5;
            // SAFETY: valid pointers.
            let s = unsafe { relicore_saha_ionized_fraction(&*u, z, &mut v) };
            match dc::saha_ionized_fraction(core_u, z) {
                Ok(want) => assert_eq!((s, v.to_bits()), (RELICORE_OK, want.to_bits())),
                Err(e) => assert!(s == crate::status::status_of(e) && v.is_nan()),
            }
        }
        let nb = universe(0.0);
        let mut v = 0.5;
        // SAFETY: valid pointers.
        let s = unsafe { relicore_saha_ionized_fraction(&*nb, 1000.0, &mut v) };
        assert_eq!(s, RELICORE_ERROR_INVALID_PARAMETER);
        assert!(v.is_nan());
        let fits: [(Fit, CoreFit); 2] = [
            (
                relicore_last_scattering_redshift_fit,
                dc::last_scattering_redshift_fit,
            ),
            (relicore_drag_redshift_fit, dc::drag_redshift_fit),
        ];
        for (f, g) in fits {
            for (wb, wm) in [
                (0.0224, 0.143),
                (0.0, 0.1),
                (0.02, f64::NAN),
                (1e300, 1e300),
            ] {
                let mut v = 0.5;
                // SAFETY: valid pointer.
                let s = unsafe { f(wb, wm, &mut v) };
                match g(wb, wm) {
                    Ok(want) => assert_eq!((s, v.to_bits()), (RELICORE_OK, want.to_bits())),
                    Err(e) => assert!(s == crate::status::status_of(e) && v.is_nan()),
                }
            }
        }
    }
}
