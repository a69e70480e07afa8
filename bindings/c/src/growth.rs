//! Structure growth in `double`: the caller-owned `struct relicore_linear_growth` (a computed
//! core `LinearGrowth<f64>`) and `struct relicore_linear_power_spectrum` (a computed core
//! `LinearPowerSpectrum<f64>`), the options struct of a spectrum, its default function and the
//! two compute functions. The functions of a growth, of a spectrum and of a universe in this
//! topic (BAO distances, leapfrog factors) and the free Eisenstein & Hu transfer functions are
//! generated (`gen_growth`). The meanings and references: the module doc of `relicore::growth`.
//!
//! Storage: tagged words (see `stored`); the compute functions compute the core value in place
//! in them (`compute_in_place`, `compute_with_*_in_place`: no large temporary on the stack).

use crate::boundary::{Failure, boundary, non_null};
use crate::status::RELICORE_ERROR_OUT_OF_DOMAIN;
use crate::stored::{stored, stored_clear, stored_place, stored_ref, stored_seal};
use crate::universe::relicore_universe;
use relicore::growth::{LinearGrowth, LinearPowerSpectrum, TransferForm};

/// Number of 8-byte words of storage in `struct relicore_linear_growth` (131072 bytes; the core
/// growth — 376 pieces of 10 coefficients for D_u and for f, 160 pieces of 10 coefficients and
/// a total for each of the two leapfrog integrands, and a copy of the universe — takes 102904
/// bytes of them, the rest is room to grow without changing the size of the struct).
pub const RELICORE_LINEAR_GROWTH_STORAGE_WORDS: usize = 16384;

/// Number of 8-byte words of storage in `struct relicore_linear_power_spectrum` (131072 bytes;
/// the core spectrum, a copy of the growth included, takes 103088 bytes of them).
pub const RELICORE_LINEAR_POWER_SPECTRUM_STORAGE_WORDS: usize = 16384;

/// `transfer_form` of the options: the Eisenstein & Hu 1998 fitting formula with baryon
/// acoustic oscillations (needs Ω_b > 0).
pub const RELICORE_TRANSFER_BARYON_OSCILLATIONS: i32 = 0;
/// `transfer_form` of the options: the form without oscillations (Eisenstein & Hu 1998,
/// section 4.2).
pub const RELICORE_TRANSFER_NO_WIGGLE: i32 = 1;
/// `normalisation` of the options: `value` is the primordial amplitude A_s at
/// k_p = 0.05 Mpc⁻¹.
pub const RELICORE_NORMALISATION_SCALAR_AMPLITUDE: i32 = 0;
/// `normalisation` of the options: `value` is σ8 = σ(8 h⁻¹ Mpc, z = 0); A_s is derived.
pub const RELICORE_NORMALISATION_SIGMA8: i32 = 1;

/// The options of a linear power spectrum, as `relicore_linear_power_spectrum_compute` takes
/// them. Fill it with `relicore_linear_power_spectrum_options_default`, then set `value` and
/// `spectral_index` (they have no default) and change what else differs. A plain value.
#[allow(non_camel_case_types)]
#[repr(C)]
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct relicore_linear_power_spectrum_options {
    /// `RELICORE_TRANSFER_BARYON_OSCILLATIONS` (0, default) or `RELICORE_TRANSFER_NO_WIGGLE`
    /// (1); any other value is refused with `RELICORE_ERROR_OUT_OF_DOMAIN`.
    pub transfer_form: i32,
    /// `RELICORE_NORMALISATION_SCALAR_AMPLITUDE` (0, default) or `RELICORE_NORMALISATION_SIGMA8`
    /// (1); any other value is refused with `RELICORE_ERROR_OUT_OF_DOMAIN`.
    pub normalisation: i32,
    /// A_s (> 0, about 2.1e-9 in today's fits) or σ8 (> 0), as `normalisation` says. Default
    /// NaN (unset): it must be set.
    pub value: f64,
    /// Primordial spectral index n_s, finite. Default NaN (unset): it must be set (no single
    /// value is common practice).
    pub spectral_index: f64,
    /// Running α_s = dn_s/d ln k, finite. Default 0 (no running, common practice).
    pub running: f64,
}

/// A computed linear growth of one universe (D_u and f on a table of Chebyshev pieces in
/// octaves of the scale factor), built by `relicore_linear_growth_compute`; every query takes a
/// `const struct relicore_linear_growth *`. It keeps its own copy of the universe.
///
/// Caller-owned and fixed-size: `sizeof(struct relicore_linear_growth)` = 8 + 8 ×
/// `RELICORE_LINEAR_GROWTH_STORAGE_WORDS` = 131080 bytes, aligned like `uint64_t`. That is large
/// for a small thread stack: put it in static storage, inside your own structs, or allocate it;
/// there is nothing to free besides your own allocation. A plain value: it may be copied
/// (memcpy, assignment) and read by any number of threads at once. Its fields are private to
/// the library. A struct that `relicore_linear_growth_compute` did not fill (or whose compute
/// failed) is refused with `RELICORE_ERROR_INVALID_STRUCT`.
#[allow(non_camel_case_types)]
#[repr(C)]
#[derive(Clone, Copy)]
pub struct relicore_linear_growth {
    /// Validity tag written last by a successful compute (0 after a failed one). Private.
    pub tag: u64,
    /// The growth itself. Private to the library.
    pub storage: [u64; RELICORE_LINEAR_GROWTH_STORAGE_WORDS],
}

stored!(
    relicore_linear_growth,
    LinearGrowth<f64>,
    RELICORE_LINEAR_GROWTH_STORAGE_WORDS,
    b"RELIGROW"
);

/// A computed linear matter power spectrum (a copy of the growth, the Eisenstein & Hu 1998
/// transfer function of its universe, the primordial spectrum and σ8), built by
/// `relicore_linear_power_spectrum_compute`; every query takes a `const struct
/// relicore_linear_power_spectrum *`. It keeps its own copy of the growth.
///
/// Caller-owned and fixed-size: `sizeof(struct relicore_linear_power_spectrum)` = 8 + 8 ×
/// `RELICORE_LINEAR_POWER_SPECTRUM_STORAGE_WORDS` = 131080 bytes, aligned like `uint64_t`; the
/// same rules as `struct relicore_linear_growth` (keep it off small stacks, copyable, readable
/// from many threads, refused with `RELICORE_ERROR_INVALID_STRUCT` unless filled).
#[allow(non_camel_case_types)]
#[repr(C)]
#[derive(Clone, Copy)]
pub struct relicore_linear_power_spectrum {
    /// Validity tag written last by a successful compute (0 after a failed one). Private.
    pub tag: u64,
    /// The spectrum itself. Private to the library.
    pub storage: [u64; RELICORE_LINEAR_POWER_SPECTRUM_STORAGE_WORDS],
}

stored!(
    relicore_linear_power_spectrum,
    LinearPowerSpectrum<f64>,
    RELICORE_LINEAR_POWER_SPECTRUM_STORAGE_WORDS,
    b"RELISPEC"
);

/// Computes the linear growth of a universe into `*out`: the growth equation
/// D″ + (2 + d ln E/dN) D′ = (3/2) Ω_cb a⁻³ E⁻² D in N = ln a (Ω_cb = Ω_m − Ω_ν,massive today)
/// integrated once from a = 2⁻⁴⁷ on the Mészáros growing mode by the library's stiff
/// Rosenbrock stepper onto a table of Chebyshev pieces; then D(z), f(z) and D_u(z) cost
/// nanoseconds per query, from any number of threads. Written in place: no large temporary on
/// the stack.
///
/// * `universe`: from `relicore_universe_init`. The growth keeps a copy of it.
/// * `out`: the growth (caller-owned storage, see `struct relicore_linear_growth`).
///
/// Returns `RELICORE_OK`, or an error code with `*out` cleared (tag and storage zeroed, so every
/// function refuses it with `RELICORE_ERROR_INVALID_STRUCT`): `RELICORE_ERROR_NULL_POINTER` when
/// a pointer is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*universe` was not filled by a
/// successful `relicore_universe_init`; `RELICORE_ERROR_OUT_OF_DOMAIN` for a universe without
/// clustering matter or one whose curvature, dark energy or neutrino masses matter at
/// a = 2⁻⁴⁷ (not the case for physical parameters); `RELICORE_ERROR_NO_CONVERGENCE` if the
/// integration fails (not seen in testing).
///
/// Cost: about 10 ms (release build, development machine). Accuracy: D, D_u and f within 1e-10
/// relative of an independent scipy `solve_ivp` integration and of the Heath (1977) closed form
/// (`tests/data/growth.txt`).
///
/// Reference: the growth equation of linear perturbation theory (Peebles 1980, The Large-Scale
/// Structure of the Universe, §10); the radiation-era growing mode, Mészáros 1974, A&A 37, 225.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or
/// points to a writable `struct relicore_linear_growth` that does not overlap it.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_linear_growth_compute(
    universe: *const relicore_universe,
    out: *mut relicore_linear_growth,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            // SAFETY: out is non-NULL and writable (this function's contract).
            unsafe { stored_clear(out) };
            // SAFETY: NULL or readable, and not overlapping `out` (this function's contract).
            let u = unsafe { stored_ref(universe) }?;
            // SAFETY: `out` is cleared, writable and nothing else refers to it during the call.
            unsafe { stored_place(out) }.compute_in_place(u)?;
            // SAFETY: out is non-NULL and writable. The tag is written last.
            unsafe { stored_seal(out) };
            Ok(())
        },
        // SAFETY: out is NULL or writable (this function's contract).
        || unsafe { stored_clear(out) },
    )
}

/// Fills `*out` with the default options of a power spectrum: the transfer function with baryon
/// oscillations, normalised by the scalar amplitude, no running (`running` = 0); `value` and
/// `spectral_index` are NaN (unset: set them before computing).
///
/// * `out`: the options struct.
///
/// Returns `RELICORE_OK`, or `RELICORE_ERROR_NULL_POINTER` when `out` is NULL (nothing is
/// written).
///
/// # Safety
/// `out` is NULL or points to a writable `struct relicore_linear_power_spectrum_options`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_linear_power_spectrum_options_default(
    out: *mut relicore_linear_power_spectrum_options,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            let o = relicore_linear_power_spectrum_options {
                transfer_form: RELICORE_TRANSFER_BARYON_OSCILLATIONS,
                normalisation: RELICORE_NORMALISATION_SCALAR_AMPLITUDE,
                value: f64::NAN,
                spectral_index: f64::NAN,
                running: 0.0,
            };
            // SAFETY: out is non-NULL and writable (this function's contract).
            unsafe { out.write(o) };
            Ok(())
        },
        || {},
    )
}

/// The transfer form and whether `value` is σ8, or `RELICORE_ERROR_OUT_OF_DOMAIN` for a
/// switch outside its two values.
fn switches(o: &relicore_linear_power_spectrum_options) -> Result<(TransferForm, bool), Failure> {
    let form = match o.transfer_form {
        RELICORE_TRANSFER_BARYON_OSCILLATIONS => TransferForm::BaryonOscillations,
        RELICORE_TRANSFER_NO_WIGGLE => TransferForm::NoWiggle,
        _ => return Err(Failure::Call(RELICORE_ERROR_OUT_OF_DOMAIN)),
    };
    let sigma8 = match o.normalisation {
        RELICORE_NORMALISATION_SCALAR_AMPLITUDE => false,
        RELICORE_NORMALISATION_SIGMA8 => true,
        _ => return Err(Failure::Call(RELICORE_ERROR_OUT_OF_DOMAIN)),
    };
    Ok((form, sigma8))
}

/// Computes a linear matter power spectrum on a computed growth into `*out`:
/// P(k, z) = (2π²/k³) A_s (k/k_p)^(n_s − 1 + ½ α_s ln(k/k_p)) [(2/5)(ck/H0)² T(k) D_u(a)/Ω_m]²
/// with k_p = 0.05 Mpc⁻¹ and T(k) the Eisenstein & Hu 1998 fitting formula of the growth's
/// universe (ω_m, ω_b, T0), normalised by A_s or by σ8 (then A_s is derived:
/// `relicore_scalar_amplitude`); σ8 is computed here once (a quadrature, under a millisecond).
/// Written in place.
///
/// * `growth`: from `relicore_linear_growth_compute`. The spectrum keeps a copy of it.
/// * `options`: see `struct relicore_linear_power_spectrum_options`
///   (`relicore_linear_power_spectrum_options_default`).
/// * `out`: the spectrum (caller-owned storage, see `struct relicore_linear_power_spectrum`).
///
/// Returns `RELICORE_OK`, or an error code with `*out` cleared: `RELICORE_ERROR_NULL_POINTER`
/// when a pointer is NULL; `RELICORE_ERROR_INVALID_STRUCT` when `*growth` was not filled by a
/// successful `relicore_linear_growth_compute`; `RELICORE_ERROR_OUT_OF_DOMAIN` for a
/// `transfer_form` or `normalisation` switch outside its values, or parameters so far from
/// physical ones that σ8 cannot be formed; `RELICORE_ERROR_NON_FINITE` for a NaN or infinite
/// `value`, `spectral_index` or `running`; `RELICORE_ERROR_NON_POSITIVE` for A_s or σ8 ≤ 0;
/// `RELICORE_ERROR_INVALID_PARAMETER` for the oscillating form in a universe without baryons
/// (Ω_b = 0) or any form in a universe without radiation (T0 = 0: the transfer function needs
/// T0); `RELICORE_ERROR_NO_CONVERGENCE` if the quadrature fails (not seen in testing).
///
/// Accuracy: σ8 within 1e-9 relative of an mpmath quadrature of the same P(k); a derived A_s
/// within 2e-9 (`tests/data/growth.txt`). The fitting formula itself reproduces full Boltzmann
/// calculations to a few per cent (Eisenstein & Hu 1998, ApJ 496, 605).
///
/// # Safety
/// `growth` is NULL or points to a readable `struct relicore_linear_growth`; `options` is NULL
/// or points to a readable `struct relicore_linear_power_spectrum_options`; `out` is NULL or
/// points to a writable `struct relicore_linear_power_spectrum` that overlaps neither.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_linear_power_spectrum_compute(
    growth: *const relicore_linear_growth,
    options: *const relicore_linear_power_spectrum_options,
    out: *mut relicore_linear_power_spectrum,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            // SAFETY: out is non-NULL and writable (this function's contract).
            unsafe { stored_clear(out) };
            non_null(options)?;
            // SAFETY: NULL or readable, and not overlapping `out` (this function's contract).
            let g = unsafe { stored_ref(growth) }?;
            // SAFETY: non-NULL and readable (this function's contract).
            let o = unsafe { options.read() };
            let (form, sigma8) = switches(&o)?;
            // SAFETY: `out` is cleared, writable and nothing else refers to it during the call.
            let place = unsafe { stored_place(out) };
            if sigma8 {
                place.compute_with_sigma8_in_place(
                    g,
                    form,
                    o.value,
                    o.spectral_index,
                    o.running,
                )?;
            } else {
                place.compute_with_scalar_amplitude_in_place(
                    g,
                    form,
                    o.value,
                    o.spectral_index,
                    o.running,
                )?;
            }
            // SAFETY: out is non-NULL and writable. The tag is written last.
            unsafe { stored_seal(out) };
            Ok(())
        },
        // SAFETY: out is NULL or writable (this function's contract).
        || unsafe { stored_clear(out) },
    )
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::gen_growth::*;
    use crate::status::*;
    use crate::universe::{
        RELICORE_UNIVERSE_STORAGE_WORDS, relicore_universe_init, relicore_universe_parameters,
        relicore_universe_parameters_default,
    };

    /// A zeroed struct of `words` + 1 u64 on the heap, as `S` (a tag and its words).
    fn blank<S>(words: usize) -> Box<S> {
        assert_eq!(size_of::<S>(), 8 * (1 + words));
        let b: Box<[u64]> = vec![0; 1 + words].into_boxed_slice();
        // SAFETY: S is repr(C) of 1 + words u64 (asserted), alignment 8: the layout of the
        // boxed slice; every bit pattern is a value.
        unsafe { Box::from_raw(Box::into_raw(b).cast::<S>()) }
    }

    fn universe(omega_baryon: f64) -> Box<relicore_universe> {
        let mut p = <relicore_universe_parameters as crate::boundary::NotANumber>::NAN;
        // SAFETY: p is writable.
        assert_eq!(
            unsafe { relicore_universe_parameters_default(67.4, 0.315, &mut p) },
            RELICORE_OK
        );
        p.omega_baryon = omega_baryon;
        let mut u: Box<relicore_universe> = blank(RELICORE_UNIVERSE_STORAGE_WORDS);
        // SAFETY: valid pointers.
        assert_eq!(unsafe { relicore_universe_init(&p, &mut *u) }, RELICORE_OK);
        u
    }

    fn options(value: f64) -> relicore_linear_power_spectrum_options {
        let mut o = relicore_linear_power_spectrum_options {
            transfer_form: 9,
            normalisation: 9,
            value: 1.0,
            spectral_index: 1.0,
            running: 1.0,
        };
        // SAFETY: o is writable.
        let code = unsafe { relicore_linear_power_spectrum_options_default(&mut o) };
        assert_eq!(code, RELICORE_OK);
        assert!(o.value.is_nan() && o.spectral_index.is_nan() && o.running == 0.0);
        assert_eq!((o.transfer_form, o.normalisation), (0, 0));
        o.value = value;
        o.spectral_index = 0.965;
        o
    }

    #[test]
    fn the_structs_are_a_tag_and_their_words() {
        assert_eq!(size_of::<relicore_linear_growth>(), 131_080);
        assert_eq!(size_of::<relicore_linear_power_spectrum>(), 131_080);
        assert_eq!(align_of::<relicore_linear_growth>(), 8);
        assert_eq!(size_of::<relicore_linear_power_spectrum_options>(), 32);
        // SAFETY: NULL is allowed.
        let code = unsafe { relicore_linear_power_spectrum_options_default(std::ptr::null_mut()) };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);
    }

    /// One growth (about 10 s in a debug build) and its spectra: the C structs give the core's
    /// bits, copies work the same, every failure clears the output and is refused afterwards.
    #[test]
    #[cfg_attr(miri, ignore = "a growth takes minutes under miri")]
    fn compute_stores_the_core_values_and_failures_clear_them() {
        let u = universe(0.0493);
        let mut g: Box<relicore_linear_growth> = blank(RELICORE_LINEAR_GROWTH_STORAGE_WORDS);
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_linear_growth_compute(&*u, &mut *g) },
            RELICORE_OK
        );
        // SAFETY: u was initialised.
        let core_u = unsafe { stored_ref(&*u) }.unwrap_or_else(|_| panic!("universe"));
        let core_g = Box::new(LinearGrowth::new(core_u).unwrap_or_else(|e| panic!("{e}")));
        let copy = g.clone();
        for z in [0.0, 0.5, 3.0, 1100.0, -1.0, f64::NAN] {
            let (mut v, mut w) = (0.5, 0.5);
            // SAFETY: valid pointers.
            let (s, t) = unsafe {
                (
                    relicore_growth_factor(&*g, z, &mut v),
                    relicore_growth_rate(&*copy, z, &mut w),
                )
            };
            match (core_g.growth_factor(z), core_g.growth_rate(z)) {
                (Ok(d), Ok(f)) => {
                    assert_eq!((s, v.to_bits()), (RELICORE_OK, d.to_bits()));
                    assert_eq!((t, w.to_bits()), (RELICORE_OK, f.to_bits()));
                }
                (Err(e), _) => assert!(s == status_of(e) && v.is_nan() && w.is_nan()),
                _ => panic!("z = {z}"),
            }
        }
        let mut p: Box<relicore_linear_power_spectrum> =
            blank(RELICORE_LINEAR_POWER_SPECTRUM_STORAGE_WORDS);
        let o = options(2.1e-9);
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_linear_power_spectrum_compute(&*g, &o, &mut *p) },
            RELICORE_OK
        );
        let core_p = LinearPowerSpectrum::with_scalar_amplitude(
            &core_g,
            TransferForm::BaryonOscillations,
            2.1e-9,
            0.965,
            0.0,
        )
        .unwrap_or_else(|e| panic!("{e}"));
        let mut v = 0.0;
        // SAFETY: valid pointers.
        assert_eq!(unsafe { relicore_sigma8(&*p, &mut v) }, RELICORE_OK);
        assert_eq!(v.to_bits(), core_p.sigma8().to_bits());
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_linear_power_spectrum_mpc3(&*p, 0.1, 0.5, &mut v) },
            RELICORE_OK
        );
        assert_eq!(
            v.to_bits(),
            core_p
                .linear_power_spectrum_mpc3(0.1, 0.5)
                .unwrap_or(f64::NAN)
                .to_bits()
        );
        // failures: each after a valid spectrum, each clears it
        let no_baryons = universe(0.0);
        let mut gnb: Box<relicore_linear_growth> = blank(RELICORE_LINEAR_GROWTH_STORAGE_WORDS);
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_linear_growth_compute(&*no_baryons, &mut *gnb) },
            RELICORE_OK
        );
        let unfilled: Box<relicore_linear_growth> = blank(RELICORE_LINEAR_GROWTH_STORAGE_WORDS);
        let cases: [(
            relicore_linear_power_spectrum_options,
            &relicore_linear_growth,
            i32,
        ); 9] = [
            (
                relicore_linear_power_spectrum_options {
                    transfer_form: 2,
                    ..o
                },
                &*g,
                RELICORE_ERROR_OUT_OF_DOMAIN,
            ),
            (
                relicore_linear_power_spectrum_options {
                    normalisation: -1,
                    ..o
                },
                &*g,
                RELICORE_ERROR_OUT_OF_DOMAIN,
            ),
            (
                relicore_linear_power_spectrum_options {
                    value: f64::NAN,
                    ..o
                },
                &*g,
                RELICORE_ERROR_NON_FINITE,
            ),
            (
                relicore_linear_power_spectrum_options { value: 0.0, ..o },
                &*g,
                RELICORE_ERROR_NON_POSITIVE,
            ),
            (
                relicore_linear_power_spectrum_options {
                    normalisation: 1,
                    value: -0.8,
                    ..o
                },
                &*g,
                RELICORE_ERROR_NON_POSITIVE,
            ),
            (
                relicore_linear_power_spectrum_options {
                    spectral_index: f64::INFINITY,
                    ..o
                },
                &*g,
                RELICORE_ERROR_NON_FINITE,
            ),
            (
                relicore_linear_power_spectrum_options {
                    running: f64::NAN,
                    ..o
                },
                &*g,
                RELICORE_ERROR_NON_FINITE,
            ),
            (o, &*gnb, RELICORE_ERROR_INVALID_PARAMETER),
            (o, &*unfilled, RELICORE_ERROR_INVALID_STRUCT),
        ];
        for (bad, gg, want) in cases {
            // SAFETY: valid pointers.
            assert_eq!(
                unsafe { relicore_linear_power_spectrum_compute(&*g, &o, &mut *p) },
                RELICORE_OK
            );
            // SAFETY: valid pointers.
            let code = unsafe { relicore_linear_power_spectrum_compute(gg, &bad, &mut *p) };
            assert_eq!(code, want, "{bad:?}");
            assert_eq!(p.tag, 0);
            assert!(p.storage.iter().all(|&w| w == 0));
            let mut v = 1.0;
            // SAFETY: valid pointers.
            assert_eq!(
                unsafe { relicore_s8(&*p, &mut v) },
                RELICORE_ERROR_INVALID_STRUCT
            );
            assert!(v.is_nan());
        }
        // the no-wiggle form needs no baryons
        let nw = relicore_linear_power_spectrum_options {
            transfer_form: RELICORE_TRANSFER_NO_WIGGLE,
            normalisation: RELICORE_NORMALISATION_SIGMA8,
            value: 0.8,
            ..o
        };
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_linear_power_spectrum_compute(&*gnb, &nw, &mut *p) },
            RELICORE_OK
        );
        // SAFETY: valid pointers.
        assert_eq!(unsafe { relicore_sigma8(&*p, &mut v) }, RELICORE_OK);
        assert_eq!(v, 0.8);
        // NULL pointers; a failed growth compute clears
        // SAFETY: NULL arguments are allowed.
        unsafe {
            assert_eq!(
                relicore_linear_power_spectrum_compute(std::ptr::null(), &o, &mut *p),
                RELICORE_ERROR_NULL_POINTER
            );
            assert_eq!(p.tag, 0);
            assert_eq!(
                relicore_linear_power_spectrum_compute(&*g, std::ptr::null(), &mut *p),
                RELICORE_ERROR_NULL_POINTER
            );
            assert_eq!(
                relicore_linear_power_spectrum_compute(&*g, &o, std::ptr::null_mut()),
                RELICORE_ERROR_NULL_POINTER
            );
            assert_eq!(
                relicore_linear_growth_compute(std::ptr::null(), &mut *gnb),
                RELICORE_ERROR_NULL_POINTER
            );
            assert_eq!(gnb.tag, 0);
            assert_eq!(
                relicore_linear_growth_compute(&*u, std::ptr::null_mut()),
                RELICORE_ERROR_NULL_POINTER
            );
            let forged: Box<relicore_universe> = blank(RELICORE_UNIVERSE_STORAGE_WORDS);
            assert_eq!(
                relicore_linear_growth_compute(&*forged, &mut *gnb),
                RELICORE_ERROR_INVALID_STRUCT
            );
        }
    }
}
