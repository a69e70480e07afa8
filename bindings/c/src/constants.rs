//! Physical and astronomical constants of the core as `#define`s for C, written as literals
//! (cbindgen drops `pub const X: f64 = relicore::constants::X`); a unit test checks every one
//! equals the core's bit for bit and that every constant of the core has its C counterpart.
//! `RELICORE_ROOT_*` are the dimensionless roots of `relicore::constants::roots`.

/// Speed of light in vacuum, m s⁻¹ (SI 2019, exact).
pub const RELICORE_SPEED_OF_LIGHT: f64 = 299_792_458.0;
/// Planck constant, J s (SI 2019, exact).
pub const RELICORE_PLANCK: f64 = 6.626_070_15e-34;
/// Boltzmann constant, J K⁻¹ (SI 2019, exact).
pub const RELICORE_BOLTZMANN: f64 = 1.380_649e-23;
/// Elementary charge, C (SI 2019, exact).
pub const RELICORE_ELEMENTARY_CHARGE: f64 = 1.602_176_634e-19;
/// Avogadro constant, mol⁻¹ (SI 2019, exact).
pub const RELICORE_AVOGADRO: f64 = 6.022_140_76e23;
/// Reduced Planck constant h/2π, J s (derived from the exact h).
pub const RELICORE_REDUCED_PLANCK: f64 = 1.054_571_817_646_156_5e-34;
/// Electron mass, kg (CODATA 2022).
pub const RELICORE_ELECTRON_MASS: f64 = 9.109_383_713_9e-31;
/// Proton mass, kg (CODATA 2022).
pub const RELICORE_PROTON_MASS: f64 = 1.672_621_925_95e-27;
/// Thomson cross-section, m² (CODATA 2022).
pub const RELICORE_THOMSON_CROSS_SECTION: f64 = 6.652_458_705_1e-29;
/// Newtonian constant of gravitation, m³ kg⁻¹ s⁻² (CODATA 2022).
pub const RELICORE_GRAVITATIONAL_CONSTANT: f64 = 6.674_30e-11;
/// Fine-structure constant, dimensionless (CODATA 2022).
pub const RELICORE_FINE_STRUCTURE: f64 = 7.297_352_564_3e-3;
/// Rydberg energy R∞hc, J (CODATA 2022).
pub const RELICORE_RYDBERG_ENERGY: f64 = 2.179_872_361_103_0e-18;
/// Atomic mass constant u, kg (CODATA 2022).
pub const RELICORE_ATOMIC_MASS_UNIT: f64 = 1.660_539_068_92e-27;
/// Mass of the hydrogen-1 atom, in u (AME 2020, Wang et al. 2021, Chinese Phys. C 45, 030003;
/// value from memory).
pub const RELICORE_HYDROGEN_ATOM_MASS_U: f64 = 1.007_825_031_898;
/// Mass of the helium-4 atom, in u (AME 2020; value from memory).
pub const RELICORE_HELIUM_ATOM_MASS_U: f64 = 4.002_603_254_130;
/// Ionisation energy of hydrogen (1s), eV (NIST Atomic Spectra Database; value from memory).
pub const RELICORE_HYDROGEN_IONIZATION_EV: f64 = 13.598_434_599_702;
/// First ionisation energy of helium (He I → He II), eV (NIST Atomic Spectra Database; value
/// from memory).
pub const RELICORE_HELIUM_FIRST_IONIZATION_EV: f64 = 24.587_389_011;
/// Second ionisation energy of helium (He II → He III), eV (NIST Atomic Spectra Database; value
/// from memory).
pub const RELICORE_HELIUM_SECOND_IONIZATION_EV: f64 = 54.417_765_5;
/// First radiation constant c₁ = 2πhc², W m² (derived from the exact h and c).
pub const RELICORE_FIRST_RADIATION: f64 = 3.741_771_852_192_758e-16;
/// First radiation constant for spectral radiance c₁L = 2hc², W m² sr⁻¹ (derived).
pub const RELICORE_FIRST_RADIATION_RADIANCE: f64 = 1.191_042_972_397_188_4e-16;
/// Second radiation constant c₂ = hc/k, m K (derived from the exact h, c and k).
pub const RELICORE_SECOND_RADIATION: f64 = 1.438_776_877_503_933_9e-2;
/// Low part of c₂: `SECOND_RADIATION + SECOND_RADIATION_LO` equals hc/k to about 1e-34 m K.
pub const RELICORE_SECOND_RADIATION_LO: f64 = -6.735_986_446_804_958e-19;
/// h/k, s K (derived).
pub const RELICORE_PLANCK_OVER_BOLTZMANN: f64 = 4.799_243_073_366_221e-11;
/// Low part of h/k: `PLANCK_OVER_BOLTZMANN + PLANCK_OVER_BOLTZMANN_LO` equals h/k to ~1e-43.
pub const RELICORE_PLANCK_OVER_BOLTZMANN_LO: f64 = 2.429_594_167_459_689_6e-27;
/// Stefan-Boltzmann constant σ = 2π⁵k⁴/(15h³c²), W m⁻² K⁻⁴ (derived).
pub const RELICORE_STEFAN_BOLTZMANN: f64 = 5.670_374_419_184_429_4e-8;
/// Radiation density constant a = 4σ/c, J m⁻³ K⁻⁴ (derived).
pub const RELICORE_RADIATION_DENSITY: f64 = 7.565_733_250_280_005e-16;
/// Photon analogue of σ: photon exitance per T³, 4πζ(3)k³/(h³c²), photons s⁻¹ m⁻² K⁻³ (derived).
pub const RELICORE_PHOTON_STEFAN_BOLTZMANN: f64 = 1.520_460_859_393_136_2e15;
/// Wien wavelength displacement constant b = c₂/x₅, m K, with x₅ = 5(1 − e^−x₅) (derived).
pub const RELICORE_WIEN_WAVELENGTH: f64 = 2.897_771_955_185_172_7e-3;
/// Wien frequency displacement constant x₃k/h, Hz K⁻¹, with x₃ = 3(1 − e^−x₃) (derived).
pub const RELICORE_WIEN_FREQUENCY: f64 = 5.878_925_757_646_825e10;
/// Wien wavenumber displacement constant x₃/c₂, m⁻¹ K⁻¹ (derived).
pub const RELICORE_WIEN_WAVENUMBER: f64 = 1.960_998_551_086_573_8e2;
/// Photon (N_λ) peak constant c₂/x₄, m K, with x₄ = 4(1 − e^−x₄) (derived).
pub const RELICORE_WIEN_PHOTON_WAVELENGTH: f64 = 3.669_702_865_050_074e-3;
/// Photon (N_ν) peak constant x₂k/h, Hz K⁻¹, with x₂ = 2(1 − e^−x₂) (derived).
pub const RELICORE_WIEN_PHOTON_FREQUENCY: f64 = 3.320_574_173_214_905e10;
/// h/(x₃k), K Hz⁻¹: temperature per hertz of the B_ν peak (derived).
pub const RELICORE_WIEN_FREQUENCY_INVERSE: f64 = 1.700_991_033_437_158_2e-11;
/// Astronomical unit, m (IAU 2012 Resolution B2, exact).
pub const RELICORE_ASTRONOMICAL_UNIT: f64 = 149_597_870_700.0;
/// Parsec, m: au × 648000/π (IAU 2015 Resolution B2).
pub const RELICORE_PARSEC: f64 = 3.085_677_581_491_367e16;
/// Megaparsec, m.
pub const RELICORE_MEGAPARSEC: f64 = 3.085_677_581_491_367e22;
/// Julian year, s (365.25 days of 86400 s; IAU).
pub const RELICORE_JULIAN_YEAR: f64 = 31_557_600.0;
/// Root of x = 5(1 − e^−x): peak of B_λ.
pub const RELICORE_ROOT_WAVELENGTH_PEAK: f64 = 4.965_114_231_744_276;
/// Root of x = 3(1 − e^−x): peak of B_ν (and of the wavenumber form).
pub const RELICORE_ROOT_FREQUENCY_PEAK: f64 = 2.821_439_372_122_078_7;
/// Root of x = 4(1 − e^−x): peak of N_λ (and of λB_λ).
pub const RELICORE_ROOT_PHOTON_WAVELENGTH_PEAK: f64 = 3.920_690_394_872_886_4;
/// Root of x = 2(1 − e^−x): peak of N_ν.
pub const RELICORE_ROOT_PHOTON_FREQUENCY_PEAK: f64 = 1.593_624_260_040_04;
/// Root of x coth(x/2) = 4: null of the thermal Sunyaev-Zeldovich spectral distortion.
pub const RELICORE_ROOT_THERMAL_SZ_NULL: f64 = 3.830_016_096_309_075;

#[cfg(test)]
mod tests {
    use super::*;

    /// (C name, C value, core value).
    const PAIRS: &[(&str, f64, f64)] = &[
        (
            "RELICORE_SPEED_OF_LIGHT",
            RELICORE_SPEED_OF_LIGHT,
            relicore::constants::SPEED_OF_LIGHT,
        ),
        (
            "RELICORE_PLANCK",
            RELICORE_PLANCK,
            relicore::constants::PLANCK,
        ),
        (
            "RELICORE_BOLTZMANN",
            RELICORE_BOLTZMANN,
            relicore::constants::BOLTZMANN,
        ),
        (
            "RELICORE_ELEMENTARY_CHARGE",
            RELICORE_ELEMENTARY_CHARGE,
            relicore::constants::ELEMENTARY_CHARGE,
        ),
        (
            "RELICORE_AVOGADRO",
            RELICORE_AVOGADRO,
            relicore::constants::AVOGADRO,
        ),
        (
            "RELICORE_REDUCED_PLANCK",
            RELICORE_REDUCED_PLANCK,
            relicore::constants::REDUCED_PLANCK,
        ),
        (
            "RELICORE_ELECTRON_MASS",
            RELICORE_ELECTRON_MASS,
            relicore::constants::ELECTRON_MASS,
        ),
        (
            "RELICORE_PROTON_MASS",
            RELICORE_PROTON_MASS,
            relicore::constants::PROTON_MASS,
        ),
        (
            "RELICORE_THOMSON_CROSS_SECTION",
            RELICORE_THOMSON_CROSS_SECTION,
            relicore::constants::THOMSON_CROSS_SECTION,
        ),
        (
            "RELICORE_GRAVITATIONAL_CONSTANT",
            RELICORE_GRAVITATIONAL_CONSTANT,
            relicore::constants::GRAVITATIONAL_CONSTANT,
        ),
        (
            "RELICORE_FINE_STRUCTURE",
            RELICORE_FINE_STRUCTURE,
            relicore::constants::FINE_STRUCTURE,
        ),
        (
            "RELICORE_RYDBERG_ENERGY",
            RELICORE_RYDBERG_ENERGY,
            relicore::constants::RYDBERG_ENERGY,
        ),
        (
            "RELICORE_ATOMIC_MASS_UNIT",
            RELICORE_ATOMIC_MASS_UNIT,
            relicore::constants::ATOMIC_MASS_UNIT,
        ),
        (
            "RELICORE_HYDROGEN_ATOM_MASS_U",
            RELICORE_HYDROGEN_ATOM_MASS_U,
            relicore::constants::HYDROGEN_ATOM_MASS_U,
        ),
        (
            "RELICORE_HELIUM_ATOM_MASS_U",
            RELICORE_HELIUM_ATOM_MASS_U,
            relicore::constants::HELIUM_ATOM_MASS_U,
        ),
        (
            "RELICORE_HYDROGEN_IONIZATION_EV",
            RELICORE_HYDROGEN_IONIZATION_EV,
            relicore::constants::HYDROGEN_IONIZATION_EV,
        ),
        (
            "RELICORE_HELIUM_FIRST_IONIZATION_EV",
            RELICORE_HELIUM_FIRST_IONIZATION_EV,
            relicore::constants::HELIUM_FIRST_IONIZATION_EV,
        ),
        (
            "RELICORE_HELIUM_SECOND_IONIZATION_EV",
            RELICORE_HELIUM_SECOND_IONIZATION_EV,
            relicore::constants::HELIUM_SECOND_IONIZATION_EV,
        ),
        (
            "RELICORE_FIRST_RADIATION",
            RELICORE_FIRST_RADIATION,
            relicore::constants::FIRST_RADIATION,
        ),
        (
            "RELICORE_FIRST_RADIATION_RADIANCE",
            RELICORE_FIRST_RADIATION_RADIANCE,
            relicore::constants::FIRST_RADIATION_RADIANCE,
        ),
        (
            "RELICORE_SECOND_RADIATION",
            RELICORE_SECOND_RADIATION,
            relicore::constants::SECOND_RADIATION,
        ),
        (
            "RELICORE_SECOND_RADIATION_LO",
            RELICORE_SECOND_RADIATION_LO,
            relicore::constants::SECOND_RADIATION_LO,
        ),
        (
            "RELICORE_PLANCK_OVER_BOLTZMANN",
            RELICORE_PLANCK_OVER_BOLTZMANN,
            relicore::constants::PLANCK_OVER_BOLTZMANN,
        ),
        (
            "RELICORE_PLANCK_OVER_BOLTZMANN_LO",
            RELICORE_PLANCK_OVER_BOLTZMANN_LO,
            relicore::constants::PLANCK_OVER_BOLTZMANN_LO,
        ),
        (
            "RELICORE_STEFAN_BOLTZMANN",
            RELICORE_STEFAN_BOLTZMANN,
            relicore::constants::STEFAN_BOLTZMANN,
        ),
        (
            "RELICORE_RADIATION_DENSITY",
            RELICORE_RADIATION_DENSITY,
            relicore::constants::RADIATION_DENSITY,
        ),
        (
            "RELICORE_PHOTON_STEFAN_BOLTZMANN",
            RELICORE_PHOTON_STEFAN_BOLTZMANN,
            relicore::constants::PHOTON_STEFAN_BOLTZMANN,
        ),
        (
            "RELICORE_WIEN_WAVELENGTH",
            RELICORE_WIEN_WAVELENGTH,
            relicore::constants::WIEN_WAVELENGTH,
        ),
        (
            "RELICORE_WIEN_FREQUENCY",
            RELICORE_WIEN_FREQUENCY,
            relicore::constants::WIEN_FREQUENCY,
        ),
        (
            "RELICORE_WIEN_WAVENUMBER",
            RELICORE_WIEN_WAVENUMBER,
            relicore::constants::WIEN_WAVENUMBER,
        ),
        (
            "RELICORE_WIEN_PHOTON_WAVELENGTH",
            RELICORE_WIEN_PHOTON_WAVELENGTH,
            relicore::constants::WIEN_PHOTON_WAVELENGTH,
        ),
        (
            "RELICORE_WIEN_PHOTON_FREQUENCY",
            RELICORE_WIEN_PHOTON_FREQUENCY,
            relicore::constants::WIEN_PHOTON_FREQUENCY,
        ),
        (
            "RELICORE_WIEN_FREQUENCY_INVERSE",
            RELICORE_WIEN_FREQUENCY_INVERSE,
            relicore::constants::WIEN_FREQUENCY_INVERSE,
        ),
        (
            "RELICORE_ASTRONOMICAL_UNIT",
            RELICORE_ASTRONOMICAL_UNIT,
            relicore::constants::ASTRONOMICAL_UNIT,
        ),
        (
            "RELICORE_PARSEC",
            RELICORE_PARSEC,
            relicore::constants::PARSEC,
        ),
        (
            "RELICORE_MEGAPARSEC",
            RELICORE_MEGAPARSEC,
            relicore::constants::MEGAPARSEC,
        ),
        (
            "RELICORE_JULIAN_YEAR",
            RELICORE_JULIAN_YEAR,
            relicore::constants::JULIAN_YEAR,
        ),
        (
            "RELICORE_ROOT_WAVELENGTH_PEAK",
            RELICORE_ROOT_WAVELENGTH_PEAK,
            relicore::constants::roots::WAVELENGTH_PEAK,
        ),
        (
            "RELICORE_ROOT_FREQUENCY_PEAK",
            RELICORE_ROOT_FREQUENCY_PEAK,
            relicore::constants::roots::FREQUENCY_PEAK,
        ),
        (
            "RELICORE_ROOT_PHOTON_WAVELENGTH_PEAK",
            RELICORE_ROOT_PHOTON_WAVELENGTH_PEAK,
            relicore::constants::roots::PHOTON_WAVELENGTH_PEAK,
        ),
        (
            "RELICORE_ROOT_PHOTON_FREQUENCY_PEAK",
            RELICORE_ROOT_PHOTON_FREQUENCY_PEAK,
            relicore::constants::roots::PHOTON_FREQUENCY_PEAK,
        ),
        (
            "RELICORE_ROOT_THERMAL_SZ_NULL",
            RELICORE_ROOT_THERMAL_SZ_NULL,
            relicore::constants::roots::THERMAL_SZ_NULL,
        ),
    ];

    #[test]
    fn literals_equal_the_core_constants_bit_for_bit() {
        for &(name, c, core) in PAIRS {
            assert_eq!(
                c.to_bits(),
                core.to_bits(),
                "{name} = {c:e} differs from the core's {core:e}"
            );
        }
    }

    #[test]
    fn every_core_constant_has_a_c_literal() {
        // the core's constants file, read as text: every `pub const NAME: f64` must be in PAIRS
        let path = concat!(env!("CARGO_MANIFEST_DIR"), "/../../src/constants.rs");
        let text = std::fs::read_to_string(path).unwrap_or_default();
        assert!(!text.is_empty(), "cannot read {path}");
        let mut in_roots = false;
        let mut missing = Vec::new();
        for line in text.lines().map(str::trim) {
            if line.starts_with("pub mod roots") {
                in_roots = true;
            }
            if let Some(rest) = line.strip_prefix("pub const ") {
                let name = rest.split(':').next().unwrap_or_default();
                let c_name = format!(
                    "{}{name}",
                    if in_roots {
                        "RELICORE_ROOT_"
                    } else {
                        "RELICORE_"
                    }
                );
                if !PAIRS.iter().any(|p| p.0 == c_name) {
                    missing.push(c_name);
                }
            }
        }
        assert!(
            missing.is_empty(),
            "core constants without a C literal in bindings/c/src/constants.rs: {missing:?}"
        );
    }
}
