//! The thermal history of an arbitrary universe with arbitrary options (`f64`, or `f32` when
//! the top bit of the first byte is set). Bounded work: the history is computed only when the
//! universe's construction succeeds, once per input, on the heap. Oracle: no panic; on success,
//! at 65 redshifts uniform in ln(1+z) over the table and at one arbitrary redshift, `Ok` is
//! finite and 0 ≤ x_e ≤ 1 + 2 f_He (hydrogen and helium fully ionised, the bound the model
//! states in `src/decoupling/mod.rs`), T_m > 0, the optical depth does not decrease with z, and
//! z* and z_drag lie inside the table (0 < z ≤ its highest redshift).
#![no_main]

use libfuzzer_sys::fuzz_target;
use relicore::Result;
use relicore::constants::{HELIUM_ATOM_MASS_U, HYDROGEN_ATOM_MASS_U};
use relicore::cosmology::Universe;
use relicore::decoupling::{HistoryOptions, ThermalHistory};
use relicore_fuzz::{Float, Input};

fuzz_target!(|data: &[u8]| {
    let mut input = Input::new(data);
    if input.byte() & 0x80 == 0 {
        run::<f64>(&mut input);
    } else {
        run::<f32>(&mut input);
    }
});

fn ok<T: Float>(name: &str, z: T, r: Result<T>) -> Option<T> {
    let v = r.ok()?;
    assert!(v.is_finite(), "{name}({z:?}) = Ok({v:?}): not finite");
    assert!(!z.is_nan(), "{name}: NaN accepted");
    Some(v)
}

fn run<T: Float>(input: &mut Input<'_>) {
    let p = relicore_fuzz::parameters::<T>(input);
    let options = HistoryOptions {
        reionization_redshift: if input.byte().is_multiple_of(2) {
            None
        } else {
            Some(input.real::<T>(-1.0, 2.1))
        },
        highest_redshift: if input.byte().is_multiple_of(2) {
            T::c(1e4)
        } else {
            input.real::<T>(3.4, 4.1)
        },
        ..HistoryOptions::default()
    };
    let Ok(u) = Universe::new(p) else {
        return;
    };
    let Ok(h) = ThermalHistory::<T>::new(&u, options).map(Box::new) else {
        return;
    };
    let top = options.highest_redshift.to_f64_exact();
    let y = p.helium_mass_fraction.to_f64_exact();
    let f_he = y / (1.0 - y) * (HYDROGEN_ATOM_MASS_U / HELIUM_ATOM_MASS_U);
    let x_max = 1.0 + 2.0 * f_he;
    let what = || format!("{p:?} {options:?}");

    let zs = h.last_scattering_redshift().to_f64_exact();
    let zd = h.drag_redshift().to_f64_exact();
    assert!(
        zs > 0.0 && zs <= top,
        "z* = {zs} outside the table (0, {top}] for {}",
        what()
    );
    assert!(
        zd > 0.0 && zd <= top,
        "z_drag = {zd} outside the table (0, {top}] for {}",
        what()
    );
    for (name, v) in [
        ("r_s(z*)", h.sound_horizon_last_scattering_mpc()),
        ("r_s(z_drag)", h.sound_horizon_drag_mpc()),
        ("theta*", h.angular_scale_last_scattering()),
        ("age(z*)", h.age_at_last_scattering_yr()),
        ("T(z*)", h.temperature_at_last_scattering_k()),
        ("z visibility peak", h.visibility_peak_redshift()),
        ("z thermal", h.thermal_decoupling_redshift()),
        ("tau reion", h.reionization_optical_depth()),
    ] {
        assert!(v.is_finite(), "{name} = {v:?} for {}", what());
    }

    let mut previous_tau = f64::NEG_INFINITY;
    let n = 64;
    let u_top = top.ln_1p();
    for i in 0..=n {
        let z = T::c((u_top * f64::from(i) / f64::from(n)).exp_m1()).min(options.highest_redshift);
        let x = ok("x_e", z, h.ionized_fraction(z));
        let upper = x_max * (1.0 + 8.0 * T::epsilon().to_f64_exact());
        if let Some(x) = x {
            let x = x.to_f64_exact();
            assert!(
                // the bound rounded to T and a few roundings of x_p + f_He (y₁ + 2y₂): 8 ε
                (0.0..=upper).contains(&x),
                "x_e({z:?}) = {x:e} outside [0, 1 + 2 f_He = {x_max}] for {}",
                what()
            );
        }
        if let Some(t) = ok("T_m", z, h.matter_temperature_k(z)) {
            assert!(t > T::zero(), "T_m({z:?}) = {t:?} for {}", what());
        }
        if let Some(tau) = ok("tau", z, h.optical_depth(z)) {
            let tau = tau.to_f64_exact();
            assert!(
                tau >= previous_tau,
                "tau decreases: {previous_tau:e} then {tau:e} at z = {z:?} for {}",
                what()
            );
            previous_tau = tau;
        }
        ok("visibility", z, h.visibility(z));
        ok("r_s", z, h.sound_horizon_mpc(z));
    }
    let z = input.real::<T>(-3.0, 4.2);
    ok("x_e", z, h.ionized_fraction(z));
    ok("T_m", z, h.matter_temperature_k(z));
    ok("tau", z, h.optical_depth(z));
    ok("visibility", z, h.visibility(z));
    ok("r_s", z, h.sound_horizon_mpc(z));
}
