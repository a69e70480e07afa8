//! Physical and astronomical constants, each with its unit and source.
//!
//! * "SI 2019, exact": defining constants of the revised SI (BIPM, The International System
//!   of Units, 9th edition, 2019); exact by definition.
//! * "CODATA 2022": Tiesinga, Mohr, Newell & Taylor, CODATA recommended values of the
//!   fundamental physical constants: 2022 (Rev. Mod. Phys. / J. Phys. Chem. Ref. Data). The
//!   Python tests compare each one `scipy.constants` carries with scipy's value.
//! * "derived": computed from the exact constants with 40-digit arithmetic (mpmath,
//!   `tests/reference/blackbody_vectors.py`) and rounded to nearest; the tests recompute them.
//! * "IAU": resolutions of the International Astronomical Union (2012 B2, 2015 B2).

/// Speed of light in vacuum, m s⁻¹ (SI 2019, exact).
pub const SPEED_OF_LIGHT: f64 = 299_792_458.0;
/// Planck constant, J s (SI 2019, exact).
pub const PLANCK: f64 = 6.626_070_15e-34;
/// Boltzmann constant, J K⁻¹ (SI 2019, exact).
pub const BOLTZMANN: f64 = 1.380_649e-23;
/// Elementary charge, C (SI 2019, exact).
pub const ELEMENTARY_CHARGE: f64 = 1.602_176_634e-19;
/// Avogadro constant, mol⁻¹ (SI 2019, exact).
pub const AVOGADRO: f64 = 6.022_140_76e23;
/// Reduced Planck constant h/2π, J s (derived from the exact h).
pub const REDUCED_PLANCK: f64 = 1.054_571_817_646_156_5e-34;

/// Electron mass, kg (CODATA 2022).
pub const ELECTRON_MASS: f64 = 9.109_383_713_9e-31;
/// Proton mass, kg (CODATA 2022).
pub const PROTON_MASS: f64 = 1.672_621_925_95e-27;
/// Thomson cross-section, m² (CODATA 2022).
pub const THOMSON_CROSS_SECTION: f64 = 6.652_458_705_1e-29;
/// Newtonian constant of gravitation, m³ kg⁻¹ s⁻² (CODATA 2022).
pub const GRAVITATIONAL_CONSTANT: f64 = 6.674_30e-11;
/// Fine-structure constant, dimensionless (CODATA 2022).
pub const FINE_STRUCTURE: f64 = 7.297_352_564_3e-3;
/// Rydberg energy R∞hc, J (CODATA 2022).
pub const RYDBERG_ENERGY: f64 = 2.179_872_361_103_0e-18;

/// Atomic mass constant u, kg (CODATA 2022).
pub const ATOMIC_MASS_UNIT: f64 = 1.660_539_068_92e-27;
/// Mass of the hydrogen-1 atom, in u (AME 2020, Wang et al. 2021, Chinese Phys. C 45, 030003;
/// value from memory).
pub const HYDROGEN_ATOM_MASS_U: f64 = 1.007_825_031_898;
/// Mass of the helium-4 atom, in u (AME 2020; value from memory).
pub const HELIUM_ATOM_MASS_U: f64 = 4.002_603_254_130;
/// Ionisation energy of hydrogen (1s), eV (NIST Atomic Spectra Database; value from memory).
pub const HYDROGEN_IONIZATION_EV: f64 = 13.598_434_599_702;
/// First ionisation energy of helium (He I → He II), eV (NIST Atomic Spectra Database; value
/// from memory).
pub const HELIUM_FIRST_IONIZATION_EV: f64 = 24.587_389_011;
/// Second ionisation energy of helium (He II → He III), eV (NIST Atomic Spectra Database; value
/// from memory).
pub const HELIUM_SECOND_IONIZATION_EV: f64 = 54.417_765_5;

/// First radiation constant c₁ = 2πhc², W m² (derived from the exact h and c).
pub const FIRST_RADIATION: f64 = 3.741_771_852_192_758e-16;
/// First radiation constant for spectral radiance c₁L = 2hc², W m² sr⁻¹ (derived).
pub const FIRST_RADIATION_RADIANCE: f64 = 1.191_042_972_397_188_4e-16;
/// Second radiation constant c₂ = hc/k, m K (derived from the exact h, c and k).
pub const SECOND_RADIATION: f64 = 1.438_776_877_503_933_9e-2;
/// Low part of c₂: `SECOND_RADIATION + SECOND_RADIATION_LO` equals hc/k to about 1e-34 m K.
pub const SECOND_RADIATION_LO: f64 = -6.735_986_446_804_958e-19;
/// h/k, s K (derived).
pub const PLANCK_OVER_BOLTZMANN: f64 = 4.799_243_073_366_221e-11;
/// Low part of h/k: `PLANCK_OVER_BOLTZMANN + PLANCK_OVER_BOLTZMANN_LO` equals h/k to ~1e-43.
pub const PLANCK_OVER_BOLTZMANN_LO: f64 = 2.429_594_167_459_689_6e-27;
/// Stefan-Boltzmann constant σ = 2π⁵k⁴/(15h³c²), W m⁻² K⁻⁴ (derived).
pub const STEFAN_BOLTZMANN: f64 = 5.670_374_419_184_429_4e-8;
/// Radiation density constant a = 4σ/c, J m⁻³ K⁻⁴ (derived).
pub const RADIATION_DENSITY: f64 = 7.565_733_250_280_005e-16;
/// Photon analogue of σ: photon exitance per T³, 4πζ(3)k³/(h³c²), photons s⁻¹ m⁻² K⁻³ (derived).
pub const PHOTON_STEFAN_BOLTZMANN: f64 = 1.520_460_859_393_136_2e15;
/// Wien wavelength displacement constant b = c₂/x₅, m K, with x₅ = 5(1 − e^−x₅) (derived).
pub const WIEN_WAVELENGTH: f64 = 2.897_771_955_185_172_7e-3;
/// Wien frequency displacement constant x₃k/h, Hz K⁻¹, with x₃ = 3(1 − e^−x₃) (derived).
pub const WIEN_FREQUENCY: f64 = 5.878_925_757_646_825e10;
/// Wien wavenumber displacement constant x₃/c₂, m⁻¹ K⁻¹ (derived).
pub const WIEN_WAVENUMBER: f64 = 1.960_998_551_086_573_8e2;
/// Photon (N_λ) peak constant c₂/x₄, m K, with x₄ = 4(1 − e^−x₄) (derived).
pub const WIEN_PHOTON_WAVELENGTH: f64 = 3.669_702_865_050_074e-3;
/// Photon (N_ν) peak constant x₂k/h, Hz K⁻¹, with x₂ = 2(1 − e^−x₂) (derived).
pub const WIEN_PHOTON_FREQUENCY: f64 = 3.320_574_173_214_905e10;
/// h/(x₃k), K Hz⁻¹: temperature per hertz of the B_ν peak (derived).
pub const WIEN_FREQUENCY_INVERSE: f64 = 1.700_991_033_437_158_2e-11;

/// Astronomical unit, m (IAU 2012 Resolution B2, exact).
pub const ASTRONOMICAL_UNIT: f64 = 149_597_870_700.0;
/// Parsec, m: au × 648000/π (IAU 2015 Resolution B2).
pub const PARSEC: f64 = 3.085_677_581_491_367e16;
/// Megaparsec, m.
pub const MEGAPARSEC: f64 = 3.085_677_581_491_367e22;
/// Julian year, s (365.25 days of 86400 s; IAU).
pub const JULIAN_YEAR: f64 = 31_557_600.0;

/// Dimensionless roots of the peak conditions, and of the thermal SZ null.
pub mod roots {
    /// Root of x = 5(1 − e^−x): peak of B_λ.
    pub const WAVELENGTH_PEAK: f64 = 4.965_114_231_744_276;
    /// Root of x = 3(1 − e^−x): peak of B_ν (and of the wavenumber form).
    pub const FREQUENCY_PEAK: f64 = 2.821_439_372_122_078_7;
    /// Root of x = 4(1 − e^−x): peak of N_λ (and of λB_λ).
    pub const PHOTON_WAVELENGTH_PEAK: f64 = 3.920_690_394_872_886_4;
    /// Root of x = 2(1 − e^−x): peak of N_ν.
    pub const PHOTON_FREQUENCY_PEAK: f64 = 1.593_624_260_040_04;
    /// Root of x coth(x/2) = 4: null of the thermal Sunyaev-Zeldovich spectral distortion.
    pub const THERMAL_SZ_NULL: f64 = 3.830_016_096_309_075;
}
