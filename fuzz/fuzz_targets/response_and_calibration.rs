//! The response-table functions and the two-load calibration functions (`f64`, or `f32` when
//! the top bit of the first byte is set) with arbitrary slices, lengths and values, and the
//! uncertainty of caller arrays. Oracle: no panic; `Ok` holds finite values and no NaN was
//! accepted; the inverse of the response-weighted radiance (`f64`) reproduces the temperature
//! within its documented 1e-14 relative when the forward call succeeded with a normal radiance
//! and T inside [1e-100, 1e100] K (the inverse searches about 1e-120 … 1e120 K), or fails
//! with the documented `NoConvergence`.
#![no_main]

use libfuzzer_sys::fuzz_target;
use relicore::Result;
use relicore::blackbody::{self as bb, TwoLoadCalibration};
use relicore_fuzz::{Float, Input, normal, rel};

const MAX: usize = 24;

fuzz_target!(|data: &[u8]| {
    let mut input = Input::new(data);
    let selector = input.byte();
    if selector & 0x80 == 0 {
        run::<f64>(selector, &mut input);
    } else {
        run::<f32>(selector & 0x7f, &mut input);
    }
});

fn ok<T: Float>(name: &str, args: &[T], r: Result<T>) -> Option<T> {
    let v = r.ok()?;
    assert!(v.is_finite(), "{name}{args:?} = Ok({v:?}): not finite");
    assert!(
        !args.iter().any(|a| a.is_nan()),
        "{name}{args:?}: NaN accepted"
    );
    Some(v)
}

fn ok_uncertainty<T: Float>(name: &str, args: &[T], r: Result<bb::TemperatureUncertainty<T>>) {
    if let Ok(v) = r {
        assert!(
            v.temperature_k.is_finite() && v.combined_standard_uncertainty_k.is_finite(),
            "{name}{args:?} = Ok({v:?}): not finite"
        );
        let n = usize::try_from(v.inputs).unwrap_or(usize::MAX);
        assert!(
            n <= v.sensitivity_coefficients.len(),
            "{name}{args:?}: inputs {n}"
        );
        assert!(
            v.sensitivity_coefficients
                .iter()
                .take(n)
                .all(|c| c.is_finite()),
            "{name}{args:?} = Ok({v:?}): a coefficient is not finite"
        );
        assert!(
            !args.iter().any(|a| a.is_nan()),
            "{name}{args:?}: NaN accepted"
        );
    }
}

/// A slice of up to `MAX` values: wavelengths increasing by log-uniform steps from a start, or
/// (mode byte ≡ 0 mod 4) each value read on its own (any order, any bit pattern).
fn table<T: Float>(
    input: &mut Input<'_>,
    out: &mut [T; MAX],
    lo: f64,
    hi: f64,
    increasing: bool,
) -> usize {
    let n = input.len(MAX);
    let free = !increasing || input.byte().is_multiple_of(4);
    let mut previous = input.real::<T>(lo, hi);
    for slot in out.iter_mut().take(n) {
        *slot = if free {
            input.real::<T>(lo, hi)
        } else {
            previous + previous * input.real::<T>(-4.0, 0.5)
        };
        previous = *slot;
    }
    n
}

fn run<T: Float>(selector: u8, input: &mut Input<'_>) {
    match selector % 3 {
        0 => response::<T>(input),
        1 => calibration::<T>(input),
        _ => uncertainty::<T>(input),
    }
}

fn response<T: Float>(input: &mut Input<'_>) {
    let mut w = [T::zero(); MAX];
    let mut r = [T::zero(); MAX];
    let nw = table(input, &mut w, -7.0, -4.0, true);
    let nr = if input.byte().is_multiple_of(8) {
        table(input, &mut r, -3.0, 0.0, false)
    } else {
        for slot in r.iter_mut().take(nw) {
            *slot = input.real::<T>(-3.0, 0.0);
        }
        nw
    };
    let (w, r) = (&w[..nw], &r[..nr]);
    let t = input.real::<T>(-1.0, 5.0);
    let s = input.real::<T>(-10.0, 10.0);
    let (e, tr, tau, tp) = (
        input.real::<T>(-3.0, 0.0),
        input.real::<T>(-1.0, 5.0),
        input.real::<T>(-3.0, 0.0),
        input.real::<T>(-1.0, 5.0),
    );
    let u: [T; 5] = core::array::from_fn(|_| input.real::<T>(-4.0, 1.0));
    ok(
        "L_r dT",
        &[t],
        bb::response_weighted_radiance_temperature_derivative(w, r, t),
    );
    ok(
        "T(L_r)",
        &[s],
        bb::temperature_from_response_weighted_radiance(w, r, s),
    );
    ok(
        "measured L_r",
        &[t, e, tr, tau, tp],
        bb::measured_response_weighted_radiance(w, r, t, e, tr, tau, tp),
    );
    ok(
        "T_obj response",
        &[s, e, tr, tau, tp],
        bb::object_temperature_response(w, r, s, e, tr, tau, tp),
    );
    ok_uncertainty(
        "T_obj response with u",
        &[s, e, tr, tau, tp, u[0], u[1], u[2], u[3], u[4]],
        bb::object_temperature_response_with_uncertainty(
            w, r, s, e, tr, tau, tp, u[0], u[1], u[2], u[3], u[4],
        ),
    );
    let Some(l) = ok("L_r", &[t], bb::response_weighted_radiance(w, r, t)) else {
        return;
    };
    let back = bb::temperature_from_response_weighted_radiance(w, r, l);
    if T::MANTISSA_DIGITS == 53 && normal(l) && (1e-100..=1e100).contains(&t.to_f64_exact()) {
        match back {
            Ok(back) => {
                let e = rel(back.to_f64_exact(), t.to_f64_exact());
                assert!(
                    e <= 1e-14,
                    "T(L_r(T)): T = {t:?} -> {l:?} -> {back:?} (relative {e:.3e}) for {w:?} {r:?}"
                );
            }
            // documented ("as response_weighted_radiance"): the quadrature may fail its
            // tolerance for tables far outside physical ones (found: wavelengths to 1e187 m)
            Err(relicore::Error::NoConvergence) => {}
            Err(err) => panic!("L_r({t:?}) = {l:?} but its inverse fails: {err:?} for {w:?} {r:?}"),
        }
    } else {
        ok("T(L_r)", &[l], back);
    }
}

fn calibration<T: Float>(input: &mut Input<'_>) {
    let a: [T; 6] = [
        input.real(8.0, 12.0),
        input.real(-3.0, 6.0),
        input.real(0.0, 3.0),
        input.real(-3.0, 6.0),
        input.real(0.0, 3.0),
        input.real(-3.0, 6.0),
    ];
    let u: [T; 5] = core::array::from_fn(|_| input.real::<T>(-4.0, 1.0));
    let [nu, rh, th, rc, tc, reading] = a;
    ok_uncertainty(
        "calibrated T with u",
        &[nu, rh, th, rc, tc, reading, u[0], u[1], u[2], u[3], u[4]],
        bb::calibrated_temperature_with_uncertainty(
            nu, rh, th, rc, tc, reading, u[0], u[1], u[2], u[3], u[4],
        ),
    );
    let cal = match bb::two_load_calibration(nu, rh, th, rc, tc) {
        Ok(cal) => {
            assert!(
                cal.frequency_hz.is_finite() && cal.gain.is_finite() && cal.offset.is_finite(),
                "two_load_calibration{a:?} = {cal:?}"
            );
            assert!(
                !a[..5].iter().any(|x| x.is_nan()),
                "two_load_calibration{a:?}: NaN accepted"
            );
            cal
        }
        // a calibration value two_load_calibration cannot have produced, from raw reads
        Err(_) => TwoLoadCalibration {
            frequency_hz: nu,
            gain: input.real(-3.0, 3.0),
            offset: input.real(-3.0, 3.0),
        },
    };
    ok(
        "J",
        &[reading],
        bb::calibrated_brightness_temperature(&cal, reading),
    );
    ok("T", &[reading], bb::calibrated_temperature(&cal, reading));
}

fn uncertainty<T: Float>(input: &mut Input<'_>) {
    let mut c = [T::zero(); MAX];
    let mut u = [T::zero(); MAX];
    let nc = table(input, &mut c, -3.0, 3.0, false);
    let nu = if input.byte().is_multiple_of(8) {
        table(input, &mut u, -3.0, 3.0, false)
    } else {
        for slot in u.iter_mut().take(nc) {
            *slot = input.real::<T>(-3.0, 3.0);
        }
        nc
    };
    let (c, u) = (&c[..nc], &u[..nu]);
    ok("u_c", &[], bb::combined_standard_uncertainty(c, u));
    // a correlation matrix: the identity with a few off-diagonal pairs set symmetrically, or
    // (mode byte ≡ 0 mod 4) arbitrary values
    let n = nc.min(8);
    let mut rho = [T::zero(); 64];
    let free = input.byte().is_multiple_of(4);
    for i in 0..n {
        for j in 0..n {
            let v = if free {
                input.real::<T>(-2.0, 0.0)
            } else if i == j {
                T::one()
            } else if j < i {
                rho[j * n + i]
            } else {
                input.real::<T>(-2.0, 0.0)
                    * if input.byte().is_multiple_of(2) {
                        T::one()
                    } else {
                        -T::one()
                    }
            };
            rho[i * n + j] = v;
        }
    }
    let m = if input.byte() == 0xff {
        n * n + 1
    } else {
        n * n
    };
    ok(
        "u_c correlated",
        &[],
        bb::combined_standard_uncertainty_correlated(&c[..n], &u[..n.min(nu)], &rho[..m.min(64)]),
    );
}
