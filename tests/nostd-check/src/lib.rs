//! Calls the core from a `#![no_std]` crate with its own panic handler.
#![no_std]

use core::panic::PanicInfo;

#[panic_handler]
fn panic(_: &PanicInfo) -> ! {
    loop {}
}

/// Planck radiance in f32 and its inverse, the band radiance and a calibration: the firmware
/// set, to prove it builds without std or an allocator.
#[unsafe(no_mangle)]
pub extern "C" fn nostd_check(wavelength_m: f32, temperature_k: f32) -> f32 {
    let b = relicore::blackbody::spectral_radiance_wavelength(wavelength_m, temperature_k).unwrap_or(f32::NAN);
    let t = relicore::blackbody::brightness_temperature_wavelength(wavelength_m, b).unwrap_or(f32::NAN);
    let band = relicore::blackbody::band_radiance_wavelength(8e-6f32, 14e-6, t).unwrap_or(f32::NAN);
    let w = [8e-6f32, 10e-6, 14e-6];
    let r = [0.2f32, 1.0, 0.3];
    let rw = relicore::blackbody::response_weighted_radiance(&w, &r, t).unwrap_or(f32::NAN);
    let cal = relicore::blackbody::two_load_calibration(90e9f32, 2.0, 300.0, 1.0, 77.0);
    let c = cal.and_then(|c| relicore::blackbody::calibrated_temperature(&c, 1.5)).unwrap_or(f32::NAN);
    t + band + rw + c
}
