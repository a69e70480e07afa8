//! The universe: its parameter struct, the caller-owned `struct relicore_universe` that holds a
//! validated core `Universe<f64>` (tagged storage words, see `stored`), its init function and
//! the parameter check. The functions of a universe are generated (`gen_cosmology`).

use crate::boundary::{Failure, NotANumber, boundary, non_null, put};
use crate::status::status_of;
use crate::stored::{stored, stored_clear, stored_place, stored_ref, stored_seal};
use relicore::Error;
use relicore::cosmology::{Universe, UniverseParameters};

/// Number of 8-byte words of storage in `struct relicore_universe` (15360 bytes; the core
/// universe, a fixed-size distance table included, takes about 12.8 KB of them, the rest is
/// room to grow without changing the size of the struct).
pub const RELICORE_UNIVERSE_STORAGE_WORDS: usize = 1920;

/// The parameters of a universe, as `relicore_universe_init` takes them. Fill it with
/// `relicore_universe_parameters_default` (common-practice defaults for everything but H0 and
/// Ω_m), change what differs, then call `relicore_universe_init`. A plain value.
///
/// Positions used by `relicore_universe_check_parameters` (and by the core's
/// `Error::InvalidParameter`): 0 `h0_km_s_mpc`, 1 `omega_matter`, 2 `omega_baryon`,
/// 3 `omega_curvature`, 4 `cmb_temperature_k`, 5 `n_eff`, 6 `neutrino_masses_ev`, 7 `w0`,
/// 8 `wa`, 9 `helium_mass_fraction`.
#[allow(non_camel_case_types)]
#[repr(C)]
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct relicore_universe_parameters {
    /// Hubble constant H0 in km s⁻¹ Mpc⁻¹, > 0.
    pub h0_km_s_mpc: f64,
    /// Density parameter today of everything non-relativistic (cold dark matter, baryons and
    /// massive neutrinos, as published parameter tables quote it), ≥ 0.
    pub omega_matter: f64,
    /// Baryon density parameter today, 0 ≤ Ω_b ≤ Ω_m (default 0: the background does not need
    /// it).
    pub omega_baryon: f64,
    /// Curvature density parameter Ω_k today (default 0, flat; > 0 open, < 0 closed). Dark
    /// energy is what remains: Ω_de = 1 − Ω_m − Ω_r − Ω_k.
    pub omega_curvature: f64,
    /// CMB temperature today in K, ≥ 0 (default 2.7255; 0 switches photons and neutrinos off).
    pub cmb_temperature_k: f64,
    /// Effective number of neutrino species, ≥ 0 (default 3.044), shared equally by three
    /// species.
    pub n_eff: f64,
    /// The three neutrino masses in eV, each ≥ 0 (default all 0; a mass > 0 needs T0 > 0).
    pub neutrino_masses_ev: [f64; 3],
    /// Dark-energy equation of state today, w0 (default −1).
    pub w0: f64,
    /// Slope of the dark-energy equation of state, w(a) = w0 + wa (1 − a) (default 0).
    pub wa: f64,
    /// Primordial helium mass fraction Y_p, 0 ≤ Y_p < 1 (default 0.245).
    pub helium_mass_fraction: f64,
}

impl From<UniverseParameters<f64>> for relicore_universe_parameters {
    fn from(p: UniverseParameters<f64>) -> Self {
        Self {
            h0_km_s_mpc: p.h0_km_s_mpc,
            omega_matter: p.omega_matter,
            omega_baryon: p.omega_baryon,
            omega_curvature: p.omega_curvature,
            cmb_temperature_k: p.cmb_temperature_k,
            n_eff: p.n_eff,
            neutrino_masses_ev: p.neutrino_masses_ev,
            w0: p.w0,
            wa: p.wa,
            helium_mass_fraction: p.helium_mass_fraction,
        }
    }
}

impl From<relicore_universe_parameters> for UniverseParameters<f64> {
    fn from(p: relicore_universe_parameters) -> Self {
        let mut q = UniverseParameters::new(p.h0_km_s_mpc, p.omega_matter);
        q.omega_baryon = p.omega_baryon;
        q.omega_curvature = p.omega_curvature;
        q.cmb_temperature_k = p.cmb_temperature_k;
        q.n_eff = p.n_eff;
        q.neutrino_masses_ev = p.neutrino_masses_ev;
        q.w0 = p.w0;
        q.wa = p.wa;
        q.helium_mass_fraction = p.helium_mass_fraction;
        q
    }
}

impl NotANumber for relicore_universe_parameters {
    const NAN: Self = Self {
        h0_km_s_mpc: f64::NAN,
        omega_matter: f64::NAN,
        omega_baryon: f64::NAN,
        omega_curvature: f64::NAN,
        cmb_temperature_k: f64::NAN,
        n_eff: f64::NAN,
        neutrino_masses_ev: [f64::NAN; 3],
        w0: f64::NAN,
        wa: f64::NAN,
        helium_mass_fraction: f64::NAN,
    };
}

/// A validated universe with its derived constants and its precomputed distance table, built
/// by `relicore_universe_init`; every cosmology function takes a `const struct
/// relicore_universe *`. Caller-owned and fixed-size (`sizeof(struct relicore_universe)` =
/// 8 + 8 × `RELICORE_UNIVERSE_STORAGE_WORDS` = 15368 bytes, aligned like `uint64_t`): put it
/// on the stack, in static storage or inside your own structs; there is nothing to free.
///
/// It is a plain value: it may be copied with memcpy or plain assignment and the copy works
/// the same; it may be read by any number of threads at once. Its fields are private to the
/// library: do not read or write them. A struct that `relicore_universe_init` did not fill (or
/// whose init failed) is refused with `RELICORE_ERROR_INVALID_STRUCT`.
#[allow(non_camel_case_types)]
#[repr(C)]
#[derive(Clone, Copy)]
pub struct relicore_universe {
    /// Validity tag written last by a successful `relicore_universe_init` (0 after a failed
    /// one). Private to the library.
    pub tag: u64,
    /// The universe itself. Private to the library.
    pub storage: [u64; RELICORE_UNIVERSE_STORAGE_WORDS],
}

stored!(
    relicore_universe,
    Universe<f64>,
    RELICORE_UNIVERSE_STORAGE_WORDS,
    b"RELIUNIV"
);

/// Fills `*out` with the common-practice defaults and the given H0 and Ω_m: Ω_b = 0, Ω_k = 0
/// (flat), T0 = 2.7255 K (Fixsen 2009, ApJ 707, 916, rounded), N_eff = 3.044 (standard-model
/// value with the QED and non-instantaneous decoupling corrections), massless neutrinos,
/// w0 = −1, wa = 0 (a cosmological constant), Y_p = 0.245.
///
/// * `h0_km_s_mpc`: Hubble constant H0 in km s⁻¹ Mpc⁻¹ (copied as given).
/// * `omega_matter`: matter density parameter today, massive neutrinos included (copied as
///   given).
/// * `out`: the parameter struct.
///
/// Nothing is validated here (`relicore_universe_init` and `relicore_universe_check_parameters`
/// do that). Returns `RELICORE_OK`, or `RELICORE_ERROR_NULL_POINTER` when `out` is NULL.
///
/// # Safety
/// `out` is NULL or points to a writable `struct relicore_universe_parameters`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_universe_parameters_default(
    h0_km_s_mpc: f64,
    omega_matter: f64,
    out: *mut relicore_universe_parameters,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            let p = UniverseParameters::new(h0_km_s_mpc, omega_matter);
            // SAFETY: out is non-NULL and writable (this function's contract).
            unsafe { out.write(p.into()) };
            Ok(())
        },
        // SAFETY: out is NULL or writable (this function's contract).
        || unsafe { put(out, relicore_universe_parameters::NAN) },
    )
}

/// Validates a parameter set and builds the universe into `*out`: the derived constants
/// (radiation from T0 and N_eff, massive neutrinos by the exact Fermi-Dirac energy integral,
/// dark energy as the remainder) and the per-universe distance table (a piecewise Chebyshev
/// table of the line-of-sight comoving distance with an a-posteriori error check). Build once,
/// then call any number of cosmology functions on it, from any number of threads.
///
/// * `params`: the parameters (see `struct relicore_universe_parameters`).
/// * `out`: the universe (caller-owned storage, see `struct relicore_universe`).
///
/// Returns `RELICORE_OK`, or an error code with `*out` cleared (tag and storage zeroed, so
/// every function refuses it with `RELICORE_ERROR_INVALID_STRUCT`):
/// `RELICORE_ERROR_NULL_POINTER` when `params` or `out` is NULL;
/// `RELICORE_ERROR_INVALID_PARAMETER` for a non-finite parameter, H0 ≤ 0, Ω_m < 0, Ω_b < 0 or
/// Ω_b > Ω_m, T0 < 0, N_eff < 0, a negative neutrino mass, a positive mass with T0 = 0,
/// massive neutrinos denser today than Ω_m, Y_p outside [0, 1), and for values that make a
/// derived quantity or E(z) overflow: H0 so far from physical values that c/H0, 1/H0 or the
/// critical density is not a positive finite number, T0 or N_eff so large that the radiation
/// density overflows, w0 (with wa) when the dark-energy density overflows somewhere on the grid
/// below (w0, or the early-time w0 + wa, above about 3.8 to 4.8 in double precision), Ω_m when
/// E(z)² overflows otherwise (which parameter: `relicore_universe_check_parameters`);
/// `RELICORE_ERROR_NO_BIG_BANG` when E(z)² ≤ 0
/// somewhere between today and a → 0 (checked on 4097 points of a logarithmic grid in a from
/// 1e-30 to 1 and on every node of the distance table); `RELICORE_ERROR_NO_CONVERGENCE` if a
/// quadrature of the table fails (seen only for parameters far outside physical ones, such as
/// Ω_m in the hundreds or |Ω_k|, N_eff or |wa| in the thousands and more).
///
/// Cost: a few thousand quadratures (of the order of a millisecond); allocates nothing.
///
/// Reference: the Friedmann equation with radiation, massive neutrinos (Lesgourgues & Pastor
/// 2006, Phys. Rep. 429, 307, eq. 13), curvature and w0–wa dark energy (Chevallier & Polarski
/// 2001, Int. J. Mod. Phys. D 10, 213; Linder 2003, PRL 90, 091301).
///
/// # Safety
/// `params` is NULL or points to a readable `struct relicore_universe_parameters`; `out` is
/// NULL or points to a writable `struct relicore_universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_universe_init(
    params: *const relicore_universe_parameters,
    out: *mut relicore_universe,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            non_null(params)?;
            // SAFETY: non-NULL and readable (this function's contract); copied before `out`
            // is written.
            let p = unsafe { params.read() };
            let u = Universe::new(p.into())?;
            // SAFETY: out is non-NULL and writable and nothing else refers to it; the old value
            // holds no resource, so overwriting it without dropping is right. Sealed last.
            unsafe {
                stored_clear(out);
                *stored_place(out) = u;
                stored_seal(out);
            }
            Ok(())
        },
        // SAFETY: out is NULL or writable (this function's contract).
        || unsafe { stored_clear(out) },
    )
}

/// Checks a parameter set as `relicore_universe_init` does and says which parameter is wrong.
///
/// * `params`: the parameters.
/// * `which_parameter`: the position of the invalid parameter when the result is
///   `RELICORE_ERROR_INVALID_PARAMETER` (0 `h0_km_s_mpc`, 1 `omega_matter`, 2 `omega_baryon`,
///   3 `omega_curvature`, 4 `cmb_temperature_k`, 5 `n_eff`, 6 `neutrino_masses_ev`, 7 `w0`,
///   8 `wa`, 9 `helium_mass_fraction`), otherwise −1.
///
/// Returns the status `relicore_universe_init` would return for these parameters:
/// `RELICORE_OK`, `RELICORE_ERROR_INVALID_PARAMETER`, `RELICORE_ERROR_NO_BIG_BANG`,
/// `RELICORE_ERROR_NO_CONVERGENCE`; `RELICORE_ERROR_NULL_POINTER` when a pointer is NULL
/// (`*which_parameter` = −1 when it is not NULL). It builds the universe and discards it, so
/// it costs as much as `relicore_universe_init`.
///
/// # Safety
/// `params` is NULL or points to a readable `struct relicore_universe_parameters`;
/// `which_parameter` is NULL or points to a writable `int32_t`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_universe_check_parameters(
    params: *const relicore_universe_parameters,
    which_parameter: *mut i32,
) -> i32 {
    boundary(
        || {
            non_null(which_parameter)?;
            non_null(params)?;
            // SAFETY: non-NULL and readable (this function's contract).
            let p = unsafe { params.read() };
            let (which, result) = match Universe::new(p.into()) {
                Ok(_) => (-1, Ok(())),
                Err(e) => {
                    let which = match e {
                        Error::InvalidParameter(i) => i32::from(i.position()),
                        _ => -1,
                    };
                    (which, Err(Failure::Reported(status_of(e))))
                }
            };
            // SAFETY: non-NULL and writable (this function's contract).
            unsafe { which_parameter.write(which) };
            result
        },
        // SAFETY: NULL or writable (this function's contract).
        || unsafe { put(which_parameter, -1) },
    )
}

/// The parameters a universe was built from (as given to `relicore_universe_init`).
///
/// * `universe`: from `relicore_universe_init`.
/// * `out`: the parameters.
///
/// Returns `RELICORE_OK`, or an error code with every field of `*out` set to NaN:
/// `RELICORE_ERROR_NULL_POINTER` when a pointer is NULL; `RELICORE_ERROR_INVALID_STRUCT` when
/// `*universe` was not filled by a successful `relicore_universe_init`.
///
/// # Safety
/// `universe` is NULL or points to a readable `struct relicore_universe`; `out` is NULL or
/// points to a writable `struct relicore_universe_parameters` outside `*universe`.
#[unsafe(no_mangle)]
pub unsafe extern "C" fn relicore_universe_get_parameters(
    universe: *const relicore_universe,
    out: *mut relicore_universe_parameters,
) -> i32 {
    boundary(
        || {
            non_null(out)?;
            // SAFETY: NULL or readable (this function's contract).
            let u = unsafe { stored_ref(universe) }?;
            let p = relicore_universe_parameters::from(*u.parameters());
            // SAFETY: out is non-NULL and writable (this function's contract).
            unsafe { out.write(p) };
            Ok(())
        },
        // SAFETY: out is NULL or writable (this function's contract).
        || unsafe { put(out, relicore_universe_parameters::NAN) },
    )
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::gen_cosmology::*;
    use crate::status::*;

    fn blank() -> Box<relicore_universe> {
        Box::new(relicore_universe {
            tag: 0,
            storage: [0; RELICORE_UNIVERSE_STORAGE_WORDS],
        })
    }

    fn params(h0: f64, om: f64) -> relicore_universe_parameters {
        let mut p = relicore_universe_parameters::NAN;
        // SAFETY: p is writable.
        let code = unsafe { relicore_universe_parameters_default(h0, om, &mut p) };
        assert_eq!(code, RELICORE_OK);
        p
    }

    #[test]
    fn defaults_equal_the_core_defaults() {
        let p = params(67.5, 0.31);
        assert_eq!(
            UniverseParameters::from(p),
            UniverseParameters::new(67.5, 0.31)
        );
        // SAFETY: NULL out is allowed.
        let code = unsafe { relicore_universe_parameters_default(70.0, 0.3, std::ptr::null_mut()) };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);
    }

    #[test]
    fn init_stores_the_core_universe_and_the_constants_match() {
        let mut p = params(70.0, 0.3);
        p.omega_curvature = 0.05;
        p.neutrino_masses_ev = [0.06, 0.0, 0.0];
        let core = Universe::new(UniverseParameters::from(p)).unwrap_or_else(|e| panic!("{e}"));
        let mut u = blank();
        // SAFETY: valid pointers.
        assert_eq!(unsafe { relicore_universe_init(&p, &mut *u) }, RELICORE_OK);
        // SAFETY: u was initialised.
        let stored = unsafe { stored_ref(&*u) }.unwrap_or_else(|_| panic!("refused"));
        assert_eq!(stored, &core);
        let mut v = 0.0;
        let cases: [(
            unsafe extern "C" fn(*const relicore_universe, *mut f64) -> i32,
            f64,
        ); 4] = [
            (relicore_hubble_distance_mpc, core.hubble_distance_mpc()),
            (relicore_hubble_time_gyr, core.hubble_time_gyr()),
            (relicore_omega_radiation, core.omega_radiation()),
            (relicore_omega_dark_energy, core.omega_dark_energy()),
        ];
        for (f, want) in cases {
            // SAFETY: valid pointers.
            assert_eq!(unsafe { f(&*u, &mut v) }, RELICORE_OK);
            assert_eq!(v.to_bits(), want.to_bits());
        }
        // SAFETY: valid pointers.
        let code = unsafe { relicore_matter_radiation_equality_redshift(&*u, &mut v) };
        assert_eq!(code, RELICORE_OK);
        assert_eq!(Ok(v), core.matter_radiation_equality_redshift());
        let mut back = relicore_universe_parameters::NAN;
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_universe_get_parameters(&*u, &mut back) },
            RELICORE_OK
        );
        assert_eq!(back, p);
        // a copy is the same universe
        let copy = u.clone();
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_hubble_time_gyr(&*copy, &mut v) },
            RELICORE_OK
        );
        assert_eq!(v, core.hubble_time_gyr());
    }

    #[test]
    fn invalid_parameters_clear_the_struct_and_are_named() {
        let mut u = blank();
        let good = params(70.0, 0.3);
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_universe_init(&good, &mut *u) },
            RELICORE_OK
        );
        for (i, edit) in [
            (
                0,
                (|p: &mut relicore_universe_parameters| p.h0_km_s_mpc = -1.0) as fn(&mut _),
            ),
            (1, |p| p.omega_matter = f64::NAN),
            (2, |p| p.omega_baryon = 0.5),
            (4, |p| p.cmb_temperature_k = -1.0),
            (5, |p| p.n_eff = f64::INFINITY),
            (6, |p| p.neutrino_masses_ev = [0.0, -0.1, 0.0]),
            (7, |p| p.w0 = f64::NAN),
            (9, |p| p.helium_mass_fraction = 1.0),
        ] {
            let mut p = good;
            edit(&mut p);
            let mut which = 99;
            // SAFETY: valid pointers.
            let code = unsafe { relicore_universe_check_parameters(&p, &mut which) };
            assert_eq!(
                (code, which),
                (RELICORE_ERROR_INVALID_PARAMETER, i),
                "parameter {i}"
            );
            // SAFETY: valid pointers.
            let code = unsafe { relicore_universe_init(&p, &mut *u) };
            assert_eq!(code, RELICORE_ERROR_INVALID_PARAMETER);
            assert_eq!(u.tag, 0);
            assert!(u.storage.iter().all(|&w| w == 0));
            let mut v = 1.0;
            // SAFETY: valid pointers.
            let code = unsafe { relicore_hubble_distance_mpc(&*u, &mut v) };
            assert_eq!(code, RELICORE_ERROR_INVALID_STRUCT);
            assert!(v.is_nan());
        }
        let mut which = 99;
        // SAFETY: valid pointers.
        let code = unsafe { relicore_universe_check_parameters(&good, &mut which) };
        assert_eq!((code, which), (RELICORE_OK, -1));
        // SAFETY: NULL params is allowed.
        let code = unsafe { relicore_universe_check_parameters(std::ptr::null(), &mut which) };
        assert_eq!((code, which), (RELICORE_ERROR_NULL_POINTER, -1));
        // SAFETY: NULL which_parameter is allowed.
        let code = unsafe { relicore_universe_check_parameters(&good, std::ptr::null_mut()) };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);
    }

    #[test]
    fn a_universe_without_big_bang_is_refused() {
        // a closed, matter-free universe dominated by a cosmological constant bounces
        let mut p = params(70.0, 0.0);
        p.cmb_temperature_k = 0.0;
        p.omega_curvature = -0.5;
        let mut u = blank();
        let mut which = 99;
        // SAFETY: valid pointers.
        let code = unsafe { relicore_universe_check_parameters(&p, &mut which) };
        assert_eq!((code, which), (RELICORE_ERROR_NO_BIG_BANG, -1));
        // SAFETY: valid pointers.
        assert_eq!(
            unsafe { relicore_universe_init(&p, &mut *u) },
            RELICORE_ERROR_NO_BIG_BANG
        );
        assert_eq!(u.tag, 0);
    }

    #[test]
    fn null_and_foreign_structs_are_refused() {
        let mut v = 1.0;
        // SAFETY: NULL universe is allowed.
        let code = unsafe { relicore_hubble_time_gyr(std::ptr::null(), &mut v) };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);
        assert!(v.is_nan());
        let mut u = blank();
        u.tag = 0x0123_4567_89ab_cdef;
        v = 1.0;
        // SAFETY: valid pointers.
        let code = unsafe { relicore_hubble_time_gyr(&*u, &mut v) };
        assert_eq!(code, RELICORE_ERROR_INVALID_STRUCT);
        assert!(v.is_nan());
        let good = params(70.0, 0.3);
        // SAFETY: NULL out is allowed.
        let code = unsafe { relicore_universe_init(&good, std::ptr::null_mut()) };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);
        // SAFETY: NULL params is allowed; out is writable.
        let code = unsafe { relicore_universe_init(std::ptr::null(), &mut *u) };
        assert_eq!(code, RELICORE_ERROR_NULL_POINTER);
        assert_eq!(u.tag, 0);
        let mut back = params(1.0, 1.0);
        // SAFETY: valid pointers.
        let code = unsafe { relicore_universe_get_parameters(&*u, &mut back) };
        assert_eq!(code, RELICORE_ERROR_INVALID_STRUCT);
        assert!(back.h0_km_s_mpc.is_nan() && back.neutrino_masses_ev.iter().all(|m| m.is_nan()));
    }
}
