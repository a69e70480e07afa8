//! The relicore demo, part 3, in Rust: the starting time, thermal history and initial-condition
//! quantities of the INVENTED toy simulation code "Orvelstep" of the fictional Hollinscarth
//! Simulation Group (both names are coinages for this demo).
//!
//! Reads `examples/data/invented_simulation.txt` (or the path given as the first argument),
//! builds the demo universe, its thermal history (with the invented reionisation redshift), its
//! linear growth and a linear power spectrum (invented A_s and n_s) and prints, as
//! `key = value` with 17 significant digits: the run's starting time (the age of the universe
//! at the invented start redshift, in Myr) and its initial x_e and T_m, the last-scattering
//! summary of the history, the growth factor and rate at the start redshift, σ8, S8 and fσ8,
//! the leapfrog drift and kick factors of the invented first time steps, and x_e, T_m, T_r and
//! T_m/T_r at each invented output redshift. It writes the linear power spectrum at the start
//! redshift as a two-column file (k in Mpc⁻¹, P in Mpc³; the path given as the second
//! argument). The C, Fortran and Python versions read the same file, print the same keys and
//! write the same spectrum file; `examples/run_demo.sh` compares the four. Every number is
//! computed by the core; this program only reads, calls, converts Gyr to Myr and radians to
//! 100 θ*, divides T_m by T_r, forms 8 h⁻¹ Mpc = 800/H0 Mpc, a = 1/(1 + z) and the wavenumber
//! grid (one multiplication per point), and prints.
//!
//! Run from the repository root: `cargo run --release --example simulation_start`.

use relicore::cosmology::{Universe, UniverseParameters};
use relicore::decoupling::{HistoryOptions, ThermalHistory};
use relicore::growth::{LinearGrowth, LinearPowerSpectrum, TransferForm};
use std::fmt::Write as _;
use std::process::ExitCode;

const DEFAULT_INPUT: &str = "examples/data/invented_simulation.txt";
const DEFAULT_SPECTRUM: &str = "examples/out/simulation_power_spectrum_rust.txt";

/// The spectrum keys of the input file, each given once.
const SPECTRUM_KEYS: [&str; 6] = [
    "spectrum_scalar_amplitude",
    "spectrum_spectral_index",
    "spectrum_running",
    "spectrum_wavenumber_min_per_mpc",
    "spectrum_wavenumber_ratio",
    "spectrum_points",
];

const UNIVERSE_KEYS: [&str; 10] = [
    "universe_h0_km_s_mpc",
    "universe_omega_matter",
    "universe_omega_baryon",
    "universe_omega_curvature",
    "universe_cmb_temperature_k",
    "universe_n_eff",
    "universe_neutrino_mass_ev",
    "universe_w0",
    "universe_wa",
    "universe_helium_mass_fraction",
];

struct Inputs {
    params: UniverseParameters<f64>,
    start_redshift: f64,
    reionization_redshift: f64,
    outputs: Vec<f64>,
    steps: Vec<f64>,
    /// The values of SPECTRUM_KEYS, in that order.
    spectrum: [f64; 6],
}

fn read_inputs(path: &str) -> Result<Inputs, String> {
    let text = std::fs::read_to_string(path).map_err(|e| format!("cannot read {path}: {e}"))?;
    // every parameter is read from the file; the defaults only fill the struct first
    let mut p = UniverseParameters::new(0.0, 0.0);
    let mut given = [0usize; 10];
    let mut start: Vec<f64> = Vec::new();
    let mut reionization: Vec<f64> = Vec::new();
    let mut outputs = Vec::new();
    let mut steps = Vec::new();
    let mut spectrum = [f64::NAN; 6];
    let mut spectrum_given = [0usize; 6];
    for (i, line) in text.lines().enumerate() {
        let line_no = i + 1;
        let line = line.trim();
        if line.is_empty() || line.starts_with('#') {
            continue;
        }
        let fields: Vec<&str> = line.split_whitespace().collect();
        let [key, value] = fields.as_slice() else {
            return Err(format!("line {line_no}: want \"key value\""));
        };
        let v: f64 = value
            .parse()
            .map_err(|e| format!("line {line_no}: cannot read {value:?} as a number: {e}"))?;
        if let Some(which) = UNIVERSE_KEYS.iter().position(|k| k == key) {
            let n = given[which];
            given[which] += 1;
            let slot = match which {
                0 => &mut p.h0_km_s_mpc,
                1 => &mut p.omega_matter,
                2 => &mut p.omega_baryon,
                3 => &mut p.omega_curvature,
                4 => &mut p.cmb_temperature_k,
                5 => &mut p.n_eff,
                6 => p
                    .neutrino_masses_ev
                    .get_mut(n)
                    .ok_or_else(|| format!("line {line_no}: more than three neutrino masses"))?,
                7 => &mut p.w0,
                8 => &mut p.wa,
                _ => &mut p.helium_mass_fraction,
            };
            if which != 6 && n > 0 {
                return Err(format!("line {line_no}: {key} given twice"));
            }
            *slot = v;
        } else if *key == "simulation_start_redshift" {
            start.push(v);
        } else if *key == "simulation_reionization_redshift" {
            reionization.push(v);
        } else if *key == "simulation_output_redshift" {
            outputs.push(v);
        } else if *key == "simulation_step_redshift" {
            steps.push(v);
        } else if let Some(which) = SPECTRUM_KEYS.iter().position(|k| k == key) {
            if let (Some(slot), Some(n)) = (spectrum.get_mut(which), spectrum_given.get_mut(which))
            {
                *n += 1;
                if *n > 1 {
                    return Err(format!("line {line_no}: {key} given twice"));
                }
                *slot = v;
            }
        } else {
            return Err(format!("line {line_no}: unknown key {key:?}"));
        }
    }
    for (k, n) in UNIVERSE_KEYS.iter().zip(given) {
        let want = if *k == "universe_neutrino_mass_ev" {
            3
        } else {
            1
        };
        if n != want {
            return Err(format!("{k} must be given {want} time(s), got {n}"));
        }
    }
    if let Some(k) = SPECTRUM_KEYS
        .iter()
        .zip(spectrum_given)
        .find_map(|(k, n)| (n != 1).then_some(k))
    {
        return Err(format!("{k} must be given once"));
    }
    if steps.len() < 2 {
        return Err("simulation_step_redshift must be given at least twice".to_string());
    }
    let ([start_redshift], [reionization_redshift]) = (start.as_slice(), reionization.as_slice())
    else {
        return Err(
            "simulation_start_redshift and simulation_reionization_redshift must be given once"
                .to_string(),
        );
    };
    Ok(Inputs {
        params: p,
        start_redshift: *start_redshift,
        reionization_redshift: *reionization_redshift,
        outputs,
        steps,
        spectrum,
    })
}

/// 17 significant digits in the C `%.16e` form, so the four programs print alike.
fn fmt17(v: f64) -> String {
    let s = format!("{v:.16e}");
    match s.split_once('e') {
        Some((mantissa, exp)) => {
            let (sign, digits) = match exp.strip_prefix('-') {
                Some(d) => ('-', d),
                None => ('+', exp),
            };
            format!("{mantissa}e{sign}{digits:0>2}")
        }
        None => s,
    }
}

fn print(key: &str, value: f64) {
    println!("{key} = {}", fmt17(value));
}

/// The header of the spectrum file (the same text in every language).
const SPECTRUM_HEADER: [&str; 7] = [
    "# relicore demo -- INVENTED scenario: the linear matter power spectrum for the initial conditions",
    "# of the fictional toy simulation code Orvelstep (fictional Hollinscarth Simulation Group), not a real run",
    "# universe: the demo's round-number flat model below, not a published fit (massive neutrinos smooth)",
    "# column 1: k, wavenumber in Mpc^-1 (no factor of h); column 2: P(k, z) in Mpc^3 (no factor of h)",
    "# P(k, z) = (2 pi^2/k^3) A_s (k/k_p)^(n_s - 1 + alpha_s ln(k/k_p)/2) [(2/5) (c k/H0)^2 T(k) D_u(a)/Omega_m]^2",
    "# with k_p = 0.05 Mpc^-1 and T(k) the Eisenstein & Hu 1998 (ApJ 496, 605) formula with baryon oscillations",
    "# computed by relicore at the run's start redshift; the values of the model:",
];

/// Writes the two-column spectrum file: the header, `# name = value` lines, then `k P` rows.
fn write_spectrum_file(
    path: &str,
    header_values: &[(&str, f64)],
    k: &[f64],
    p: &[f64],
) -> Result<(), String> {
    let mut text = String::new();
    for line in SPECTRUM_HEADER {
        text.push_str(line);
        text.push('\n');
    }
    for (name, v) in header_values {
        let _ = writeln!(text, "# {name} = {}", fmt17(*v));
    }
    for (k, p) in k.iter().zip(p) {
        let _ = writeln!(text, "{} {}", fmt17(*k), fmt17(*p));
    }
    std::fs::write(path, text).map_err(|e| format!("cannot write {path}: {e}"))
}

fn run(path: &str, spectrum_path: &str) -> Result<(), String> {
    let inp = read_inputs(path)?;
    let u = Universe::new(inp.params).map_err(|e| format!("Universe::new: {e}"))?;
    let options = HistoryOptions {
        reionization_redshift: Some(inp.reionization_redshift),
        ..HistoryOptions::default()
    };
    // a plain value of about 160 KB, on the main thread's stack (megabytes on the usual
    // platforms; on a small stack use compute_in_place into storage of your own)
    let h: ThermalHistory<f64> =
        ThermalHistory::new(&u, options).map_err(|e| format!("ThermalHistory::new: {e}"))?;
    println!("# relicore simulation start (Rust) -- INVENTED DATA from {path}");
    println!(
        "# fictional toy code Orvelstep (Hollinscarth Simulation Group); a demo universe, not a published fit"
    );
    let call = |what: &str, r: relicore::Result<f64>| r.map_err(|e| format!("{what}: {e}"));

    let z = inp.start_redshift;
    let t_m = call("matter_temperature_k", h.matter_temperature_k(z))?;
    let t_r = call("cmb_temperature_at_k", u.cmb_temperature_at_k(z))?;
    print("start_redshift", z);
    print("start_age_myr", call("age_gyr", u.age_gyr(z))? * 1000.0);
    print(
        "start_ionized_fraction",
        call("ionized_fraction", h.ionized_fraction(z))?,
    );
    print("start_matter_temperature_k", t_m);
    print("start_radiation_temperature_k", t_r);
    print("start_temperature_ratio", t_m / t_r);

    print("reionization_redshift", inp.reionization_redshift);
    print(
        "history_last_scattering_redshift",
        h.last_scattering_redshift(),
    );
    print("history_drag_redshift", h.drag_redshift());
    print(
        "history_sound_horizon_last_scattering_mpc",
        h.sound_horizon_last_scattering_mpc(),
    );
    print("history_sound_horizon_drag_mpc", h.sound_horizon_drag_mpc());
    print(
        "history_100_theta_star",
        h.angular_scale_last_scattering() * 100.0,
    );
    print(
        "history_age_at_last_scattering_yr",
        h.age_at_last_scattering_yr(),
    );
    print(
        "history_temperature_at_last_scattering_k",
        h.temperature_at_last_scattering_k(),
    );
    print(
        "history_visibility_peak_redshift",
        h.visibility_peak_redshift(),
    );
    print(
        "history_thermal_decoupling_redshift",
        h.thermal_decoupling_redshift(),
    );
    print(
        "history_reionization_optical_depth",
        h.reionization_optical_depth(),
    );

    // the growth and the power spectrum of the initial conditions (plain values of about
    // 100 KB each, on the main thread's stack like the history)
    let z0 = inp.start_redshift;
    let g: LinearGrowth<f64> =
        LinearGrowth::new(&u).map_err(|e| format!("LinearGrowth::new: {e}"))?;
    let [a_s, n_s, alpha_s, k_min, k_ratio, n_points] = inp.spectrum;
    let ps = LinearPowerSpectrum::with_scalar_amplitude(
        &g,
        TransferForm::BaryonOscillations,
        a_s,
        n_s,
        alpha_s,
    )
    .map_err(|e| format!("LinearPowerSpectrum::with_scalar_amplitude: {e}"))?;
    let d0 = call("growth_factor", g.growth_factor(z0))?;
    print("growth_start_growth_factor", d0);
    print(
        "growth_start_growth_rate",
        call("growth_rate", g.growth_rate(z0))?,
    );
    print(
        "growth_start_unnormalized_growth_factor",
        call(
            "unnormalized_growth_factor",
            g.unnormalized_growth_factor(z0),
        )?,
    );
    print(
        "growth_unnormalized_growth_factor_today",
        g.unnormalized_growth_factor_today(),
    );
    print("spectrum_scalar_amplitude", ps.scalar_amplitude());
    print("spectrum_spectral_index", n_s);
    print("spectrum_running", alpha_s);
    print("spectrum_sigma8", ps.sigma8());
    print("spectrum_s8", ps.s8());
    let r8_mpc = 800.0 / inp.params.h0_km_s_mpc;
    print(
        "spectrum_start_sigma_8_over_h_mpc",
        call(
            "density_rms_in_sphere",
            ps.density_rms_in_sphere(r8_mpc, z0),
        )?,
    );
    print(
        "spectrum_start_growth_rate_times_sigma8",
        call("growth_rate_times_sigma8", ps.growth_rate_times_sigma8(z0))?,
    );
    print(
        "spectrum_growth_rate_times_sigma8_today",
        call("growth_rate_times_sigma8", ps.growth_rate_times_sigma8(0.0))?,
    );
    for (i, pair) in inp.steps.windows(2).enumerate() {
        let [z1, z2] = pair else { continue };
        let (a1, a2) = (1.0 / (1.0 + z1), 1.0 / (1.0 + z2));
        let p = format!("step_{}_", i + 1);
        print(&format!("{p}start_scale_factor"), a1);
        print(&format!("{p}end_scale_factor"), a2);
        print(
            &format!("{p}drift_factor_gyr"),
            call(
                "leapfrog_drift_factor_gyr",
                g.leapfrog_drift_factor_gyr(a1, a2),
            )?,
        );
        print(
            &format!("{p}kick_factor_gyr"),
            call(
                "leapfrog_kick_factor_gyr",
                g.leapfrog_kick_factor_gyr(a1, a2),
            )?,
        );
    }
    // the spectrum file: k_0 = k_min, k_(i+1) = k_i * ratio (one multiplication per point)
    if !((2.0..=100_000.0).contains(&n_points) && n_points.fract() == 0.0) {
        return Err("spectrum_points must be a whole number from 2 to 100000".to_string());
    }
    let mut k = vec![0.0; n_points as usize];
    let mut next = k_min;
    for slot in k.iter_mut() {
        *slot = next;
        next *= k_ratio;
    }
    let mut p = vec![0.0; k.len()];
    ps.linear_power_spectrum_mpc3_array(&k, z0, &mut p)
        .map_err(|e| format!("linear_power_spectrum_mpc3_array: {e:?}"))?;
    let (k_first, k_last) = (k.first().copied(), k.last().copied());
    let (p_first, p_last) = (p.first().copied(), p.last().copied());
    let pr = &inp.params;
    let [m1, m2, m3] = pr.neutrino_masses_ev;
    let header_values = [
        ("redshift", z0),
        ("h0_km_s_mpc", pr.h0_km_s_mpc),
        ("omega_matter", pr.omega_matter),
        ("omega_baryon", pr.omega_baryon),
        ("omega_curvature", pr.omega_curvature),
        ("cmb_temperature_k", pr.cmb_temperature_k),
        ("n_eff", pr.n_eff),
        ("neutrino_mass_1_ev", m1),
        ("neutrino_mass_2_ev", m2),
        ("neutrino_mass_3_ev", m3),
        ("w0", pr.w0),
        ("wa", pr.wa),
        ("scalar_amplitude", ps.scalar_amplitude()),
        ("spectral_index", n_s),
        ("running", alpha_s),
        ("sigma8_today", ps.sigma8()),
        ("growth_factor_at_redshift", d0),
        ("points", n_points),
    ];
    write_spectrum_file(spectrum_path, &header_values, &k, &p)?;
    print("spectrum_file_points", n_points);
    print(
        "spectrum_file_first_wavenumber_per_mpc",
        k_first.unwrap_or(f64::NAN),
    );
    print(
        "spectrum_file_last_wavenumber_per_mpc",
        k_last.unwrap_or(f64::NAN),
    );
    print(
        "spectrum_file_first_power_mpc3",
        p_first.unwrap_or(f64::NAN),
    );
    print("spectrum_file_last_power_mpc3", p_last.unwrap_or(f64::NAN));

    for (i, &z) in inp.outputs.iter().enumerate() {
        let p = format!("output_{}_", i + 1);
        let t_m = call("matter_temperature_k", h.matter_temperature_k(z))?;
        let t_r = call("cmb_temperature_at_k", u.cmb_temperature_at_k(z))?;
        print(&format!("{p}z"), z);
        print(
            &format!("{p}age_myr"),
            call("age_gyr", u.age_gyr(z))? * 1000.0,
        );
        print(
            &format!("{p}ionized_fraction"),
            call("ionized_fraction", h.ionized_fraction(z))?,
        );
        print(&format!("{p}matter_temperature_k"), t_m);
        print(&format!("{p}radiation_temperature_k"), t_r);
        print(&format!("{p}temperature_ratio"), t_m / t_r);
    }
    Ok(())
}

fn main() -> ExitCode {
    let path = std::env::args()
        .nth(1)
        .unwrap_or_else(|| DEFAULT_INPUT.to_string());
    let spectrum_path = std::env::args()
        .nth(2)
        .unwrap_or_else(|| DEFAULT_SPECTRUM.to_string());
    match run(&path, &spectrum_path) {
        Ok(()) => ExitCode::SUCCESS,
        Err(e) => {
            eprintln!("simulation_start: {e}");
            ExitCode::FAILURE
        }
    }
}
