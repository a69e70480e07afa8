//! The relicore demo in Rust: a fictional observatory's balloon radiometer and a fictional
//! handheld infrared thermometer, from INVENTED data.
//!
//! Reads `examples/data/invented_radiometer.txt` (or the path given as the first argument) and
//! prints every computed quantity as `key = value` with 17 significant digits. The C, Fortran
//! and Python versions read the same file and print the same keys; `examples/run_demo.sh`
//! compares the four outputs. Every number is computed by the core; this program only reads,
//! calls and prints.
//!
//! Run from the repository root: `cargo run --release --example radiometer_demo`.

use relicore::blackbody::{
    band_radiance_wavelength, brightness_temperature_frequency, calibrated_brightness_temperature,
    calibrated_temperature, peak_wavelength, response_weighted_radiance,
    spectral_radiance_frequency, spectral_radiance_wavelength,
    temperature_from_response_weighted_radiance, thermodynamic_to_rayleigh_jeans_factor,
    two_load_calibration,
};
use std::process::ExitCode;

const DEFAULT_INPUT: &str = "examples/data/invented_radiometer.txt";

/// The demo inputs, as read from the data file.
#[derive(Default)]
struct Inputs {
    frequency_hz: f64,
    hot_temperature_k: f64,
    hot_reading_v: f64,
    cold_temperature_k: f64,
    cold_reading_v: f64,
    sky_readings_v: Vec<f64>,
    cmb_temperature_k: f64,
    band_lower_m: f64,
    band_upper_m: f64,
    response_wavelengths_m: Vec<f64>,
    response: Vec<f64>,
    check_temperature_k: f64,
    thermometer_readings_w_m2_sr: Vec<f64>,
    curve_temperatures_k: Vec<f64>,
}

fn number(token: Option<&str>, line_no: usize) -> Result<f64, String> {
    let t = token.ok_or_else(|| format!("line {line_no}: missing value"))?;
    t.parse::<f64>()
        .map_err(|e| format!("line {line_no}: cannot read {t:?} as a number: {e}"))
}

fn read_inputs(path: &str) -> Result<Inputs, String> {
    let text = std::fs::read_to_string(path).map_err(|e| format!("cannot read {path}: {e}"))?;
    let mut inp = Inputs::default();
    for (i, line) in text.lines().enumerate() {
        let line_no = i + 1;
        let line = line.trim();
        if line.is_empty() || line.starts_with('#') {
            continue;
        }
        let mut tokens = line.split_whitespace();
        let key = tokens.next().unwrap_or_default();
        let v = number(tokens.next(), line_no)?;
        match key {
            "radiometer_frequency_hz" => inp.frequency_hz = v,
            "hot_load_temperature_k" => inp.hot_temperature_k = v,
            "hot_load_reading_v" => inp.hot_reading_v = v,
            "cold_load_temperature_k" => inp.cold_temperature_k = v,
            "cold_load_reading_v" => inp.cold_reading_v = v,
            "sky_reading_v" => inp.sky_readings_v.push(v),
            "cmb_temperature_k" => inp.cmb_temperature_k = v,
            "thermometer_band_lower_m" => inp.band_lower_m = v,
            "thermometer_band_upper_m" => inp.band_upper_m = v,
            "thermometer_response" => {
                inp.response_wavelengths_m.push(v);
                inp.response.push(number(tokens.next(), line_no)?);
            }
            "thermometer_check_temperature_k" => inp.check_temperature_k = v,
            "thermometer_reading_w_m2_sr" => inp.thermometer_readings_w_m2_sr.push(v),
            "curve_temperature_k" => inp.curve_temperatures_k.push(v),
            _ => return Err(format!("line {line_no}: unknown key {key:?}")),
        }
        if tokens.next().is_some() {
            return Err(format!("line {line_no}: unexpected extra value"));
        }
    }
    Ok(inp)
}

/// 17 significant digits in the C `%.16e` form (e.g. `2.9960000000000002e+02`), so the four
/// programs print alike.
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

fn fail<E: std::fmt::Display>(what: &str) -> impl FnOnce(E) -> String + '_ {
    move |e| format!("{what}: {e}")
}

fn run(path: &str) -> Result<(), String> {
    let inp = read_inputs(path)?;
    println!("# relicore radiometer demo (Rust) -- INVENTED DATA from {path}");
    println!("# fictional Glimmerfen Ridge Observatory; no real instrument or measurement");

    // Part 1: the balloon radiometer.
    let nu = inp.frequency_hz;
    let cal = two_load_calibration(
        nu,
        inp.hot_reading_v,
        inp.hot_temperature_k,
        inp.cold_reading_v,
        inp.cold_temperature_k,
    )
    .map_err(fail("two_load_calibration"))?;
    print("calibration_gain_v_per_k", cal.gain);
    print("calibration_offset_v", cal.offset);
    let b_hot = spectral_radiance_frequency(nu, inp.hot_temperature_k)
        .map_err(fail("spectral_radiance_frequency"))?;
    print("hot_load_spectral_radiance_w_m2_sr_hz", b_hot);
    let t_hot = brightness_temperature_frequency(nu, b_hot)
        .map_err(fail("brightness_temperature_frequency"))?;
    print("hot_load_brightness_temperature_k", t_hot);
    let j_hot = calibrated_brightness_temperature(&cal, inp.hot_reading_v)
        .map_err(fail("calibrated_brightness_temperature"))?;
    print("hot_load_rayleigh_jeans_temperature_k", j_hot);
    let j_cold = calibrated_brightness_temperature(&cal, inp.cold_reading_v)
        .map_err(fail("calibrated_brightness_temperature"))?;
    print("cold_load_rayleigh_jeans_temperature_k", j_cold);
    for (i, &reading) in inp.sky_readings_v.iter().enumerate() {
        let n = i + 1;
        let j = calibrated_brightness_temperature(&cal, reading)
            .map_err(fail("calibrated_brightness_temperature"))?;
        print(&format!("sky_{n}_rayleigh_jeans_temperature_k"), j);
        let t = calibrated_temperature(&cal, reading).map_err(fail("calibrated_temperature"))?;
        print(&format!("sky_{n}_physical_temperature_k"), t);
    }
    let factor = thermodynamic_to_rayleigh_jeans_factor(nu, inp.cmb_temperature_k)
        .map_err(fail("thermodynamic_to_rayleigh_jeans_factor"))?;
    print("cmb_thermodynamic_to_rayleigh_jeans_factor", factor);

    // Part 2: the handheld infrared thermometer.
    let (w, r) = (&inp.response_wavelengths_m, &inp.response);
    let check = response_weighted_radiance(w, r, inp.check_temperature_k)
        .map_err(fail("response_weighted_radiance"))?;
    print("thermometer_check_radiance_w_m2_sr", check);
    for (i, &reading) in inp.thermometer_readings_w_m2_sr.iter().enumerate() {
        let n = i + 1;
        let t = temperature_from_response_weighted_radiance(w, r, reading)
            .map_err(fail("temperature_from_response_weighted_radiance"))?;
        print(&format!("target_{n}_temperature_k"), t);
        let band = band_radiance_wavelength(inp.band_lower_m, inp.band_upper_m, t)
            .map_err(fail("band_radiance_wavelength"))?;
        print(&format!("target_{n}_band_radiance_w_m2_sr"), band);
    }

    // Blackbody curves: the peaks the plot marks.
    for (i, &t) in inp.curve_temperatures_k.iter().enumerate() {
        let n = i + 1;
        let peak = peak_wavelength(t).map_err(fail("peak_wavelength"))?;
        print(&format!("curve_{n}_peak_wavelength_m"), peak);
        let b =
            spectral_radiance_wavelength(peak, t).map_err(fail("spectral_radiance_wavelength"))?;
        print(&format!("curve_{n}_peak_spectral_radiance_w_m2_sr_m"), b);
    }
    Ok(())
}

fn main() -> ExitCode {
    let path = std::env::args()
        .nth(1)
        .unwrap_or_else(|| DEFAULT_INPUT.to_string());
    match run(&path) {
        Ok(()) => ExitCode::SUCCESS,
        Err(e) => {
            eprintln!("radiometer_demo: {e}");
            ExitCode::FAILURE
        }
    }
}
