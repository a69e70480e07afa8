//! The options of helium's second reionisation (redshift and width of its tanh in z): the
//! defaults are the values of the model (z = 3.5, Δz = 0.5, Planck Collaboration 2020, A&A 641,
//! A6, Sect. 3.3, from memory), and a changed option changes the late-time ionised fraction by
//! exactly the difference of the two tanh steps of the model's equation (module doc of
//! `relicore::decoupling`), f_He · ½[tanh((z_He − z)/Δz_He) − tanh((3.5 − z)/0.5)], with f_He
//! computed here from Y_p and the atom masses printed in that doc (AME 2020, from memory).

use relicore::cosmology::{Universe, UniverseParameters};
use relicore::decoupling::{HistoryOptions, ThermalHistory};
use relicore::{Error, arg};

/// Base ΛCDM parameters of Planck Collaboration 2020 (A&A 641, A6, Table 2; from memory).
fn planck() -> Universe<f64> {
    let h = 0.6736;
    let mut p = UniverseParameters::new(67.36, 0.3153);
    p.omega_baryon = 0.02237 / (h * h);
    p.n_eff = 3.046;
    p.neutrino_masses_ev = [0.06, 0.0, 0.0];
    Universe::new(p).unwrap()
}

fn history(options: HistoryOptions<f64>) -> Box<ThermalHistory<f64>> {
    // a history is about 180 KB: keep it off the test thread's stack
    let mut h = Box::new(ThermalHistory::<f64>::new(&planck(), HistoryOptions::default()).unwrap());
    h.compute_in_place(&planck(), options).unwrap();
    h
}

fn reionized(helium_z: f64, helium_width: f64) -> HistoryOptions<f64> {
    HistoryOptions {
        reionization_redshift: Some(7.67),
        helium_reionization_redshift: helium_z,
        helium_reionization_width: helium_width,
        ..HistoryOptions::default()
    }
}

#[test]
fn defaults_are_the_values_of_the_model() {
    let d = HistoryOptions::<f64>::default();
    assert_eq!(d.helium_reionization_redshift, 3.5);
    assert_eq!(d.helium_reionization_width, 0.5);
    // the same history, bit for bit, whether the defaults are implied or spelled out
    let implied = history(HistoryOptions {
        reionization_redshift: Some(7.67),
        ..HistoryOptions::default()
    });
    let explicit = history(reionized(3.5, 0.5));
    for z in [0.0, 1.0, 3.0, 3.5, 4.0, 6.0, 7.67, 10.0, 30.0, 1089.0] {
        assert_eq!(
            implied.ionized_fraction(z).unwrap().to_bits(),
            explicit.ionized_fraction(z).unwrap().to_bits()
        );
        assert_eq!(
            implied.optical_depth(z).unwrap().to_bits(),
            explicit.optical_depth(z).unwrap().to_bits()
        );
    }
    assert_eq!(
        implied.reionization_optical_depth().to_bits(),
        explicit.reionization_optical_depth().to_bits()
    );
}

#[test]
fn a_later_or_earlier_helium_reionisation_moves_the_late_time_ionisation() {
    let y = 0.245f64;
    let f_he = y / (1.0 - y) * (1.007_825_031_898 / 4.002_603_254_130);
    let step = |w: f64| 0.5 * (1.0 + w.tanh());
    let base = history(reionized(3.5, 0.5));
    for (hz, hw) in [(5.0, 1.0), (2.5, 0.2), (0.0, 0.1), (20.0, 10.0)] {
        let other = history(reionized(hz, hw));
        for z in [0.0, 0.5, 1.0, 2.0, 2.5, 3.0, 3.5, 4.0, 5.0, 6.0, 8.0, 12.0] {
            let want = f_he * (step((hz - z) / hw) - step((3.5 - z) / 0.5));
            let got = other.ionized_fraction(z).unwrap() - base.ionized_fraction(z).unwrap();
            assert!(
                (got - want).abs() <= 1e-13,
                "z_He {hz}, width {hw}, z {z}: difference {got:e}, model {want:e}"
            );
        }
        // recombination is untouched
        for z in [1089.0, 3000.0] {
            assert_eq!(
                other.ionized_fraction(z).unwrap().to_bits(),
                base.ionized_fraction(z).unwrap().to_bits()
            );
        }
        assert_eq!(
            other.last_scattering_redshift().to_bits(),
            base.last_scattering_redshift().to_bits()
        );
    }
    // more electrons at late times: a larger reionisation optical depth
    let later = history(reionized(2.5, 0.5));
    let earlier = history(reionized(5.0, 0.5));
    assert!(earlier.reionization_optical_depth() > base.reionization_optical_depth());
    assert!(later.reionization_optical_depth() < base.reionization_optical_depth());
}

#[test]
fn the_options_are_checked() {
    let u = planck();
    let cases = [
        (
            f64::NAN,
            0.5,
            Error::NonFinite(arg!(3, helium_reionization_redshift)),
        ),
        (
            -0.1,
            0.5,
            Error::Negative(arg!(3, helium_reionization_redshift)),
        ),
        (
            20.5,
            0.5,
            Error::OutOfDomain(arg!(3, helium_reionization_redshift)),
        ),
        (
            3.5,
            f64::INFINITY,
            Error::NonFinite(arg!(4, helium_reionization_width)),
        ),
        (
            3.5,
            0.05,
            Error::OutOfDomain(arg!(4, helium_reionization_width)),
        ),
        (
            3.5,
            10.5,
            Error::OutOfDomain(arg!(4, helium_reionization_width)),
        ),
        (
            3.5,
            -1.0,
            Error::OutOfDomain(arg!(4, helium_reionization_width)),
        ),
    ];
    for (hz, hw, want) in cases {
        let mut h = Box::new(ThermalHistory::<f64>::new(&u, HistoryOptions::default()).unwrap());
        // checked with and without reionisation
        for zr in [None, Some(7.67)] {
            let o = HistoryOptions {
                reionization_redshift: zr,
                helium_reionization_redshift: hz,
                helium_reionization_width: hw,
                ..HistoryOptions::default()
            };
            assert_eq!(h.compute_in_place(&u, o), Err(want), "{hz} {hw} {zr:?}");
        }
    }
}
