! relicore: the Fortran face of relicore (blackbody radiometry, the cosmological background and
! decoupling), a
! thin binding of the C ABI
! declared in include/relicore.h. Physics lives only in the Rust core; this module binds the
! C functions, converts, checks sizes and turns status codes into NaN, a stat argument or a
! stop. Build with any Fortran 2018 compiler (gfortran -std=f2018) and link librelicore.a
! (and -lm):
!     gfortran -std=f2018 -c relicore.f90
!     gfortran prog.f90 relicore.o /path/to/librelicore.a -lm
!
! Conventions (DESIGN 3, 5)
! * Units are SI (m, Hz, m-1, K, W, sr) unless the name says otherwise; kinds are those of
!   iso_c_binding: real(c_double), real(c_float) for the _f32 twins, integer(c_int32_t) status.
! * Every C function relicore_<name> has Fortran wrappers with the same words:
!     relicore_<name>(...)                  an elemental function: the result, NaN on failure;
!     call relicore_<name>_s(..., out, stat) the status form, an elemental subroutine: out is
!                                           the result (NaN on failure), stat the status code
!                                           (RELICORE_OK or a negative RELICORE_ERROR_*);
!                                           when stat is absent a failure stops the program
!                                           (error stop) with the routine name and message;
!     call relicore_<name>_array(x, ..., out, stat)   the C array forms (one C call for a
!                                           whole array; failing elements NaN, stat = the first
!                                           failing element's code);
!     relicore_<name>_f32 / _f32_s / _array_f32       the single-precision twins.
!   Arguments keep the names (and so the keywords) of the C prototypes, in the same order.
! * The wrappers are "impure elemental": they call C functions that write through pointers,
!   which no Fortran interface may declare pure; elemental use on conformable arrays works
!   as usual (the status form then needs array out and stat of the same shape).
! * The two-load calibration is the bind(C) type relicore_two_load_calibration (and _f32),
!   built by the generic function of the same name from five numbers:
!       cal = relicore_two_load_calibration(frequency_hz, reading_hot, temperature_hot_k,
!                                           reading_cold, temperature_cold_k)
!   (its structure constructor with the three fields frequency_hz, gain, offset also works).
! * Cosmology: fill a type(relicore_universe_parameters) with
!   relicore_universe_parameters_default(h0_km_s_mpc, omega_matter), change what differs, build a
!   type(relicore_universe) once with call relicore_universe_init(params, universe, stat), then
!   pass the universe first to every cosmology procedure:
!       d = relicore_luminosity_distance_mpc(universe, z)       ! elemental in z (and universe)
!       call relicore_age_gyr_array(universe, redshifts, ages, stat)
!   Constants of a universe (relicore_hubble_distance_mpc(universe), ...) are functions of it.
!   Units: Mpc, Gyr, km s-1 Mpc-1, kg m-3, Gpc3, as the names say.
! * Decoupling: relicore_saha_ionized_fraction(universe, z) and the two fits of (omega_b h^2,
!   omega_m h^2) are elemental functions like the others. The thermal history is a
!   type(relicore_thermal_history) of 163848 bytes (keep it in a module, a derived type or an
!   allocatable, not as a local variable of a small stack), computed once with
!       options = relicore_thermal_history_options_default()   ! then change what differs
!       call relicore_thermal_history_compute(universe, options, history, stat)
!   and passed first to its queries and summary:
!       xe = relicore_ionized_fraction(history, z)               ! elemental in z
!       zstar = relicore_last_scattering_redshift(history)
!   It keeps its own copy of the universe. Units: K, years, Mpc, Mpc-1 as the names say.
! * relicore_status_message(code) and relicore_version() return allocatable strings.
! * Nothing here allocates on the C side, keeps state or is thread-unsafe.
!
! Caution: radiation thermometry misleads when trusted beyond its emissivity and calibration
! (fever screening, furnace and molten-metal work, fire safety). Follow the applicable
! standards, local codes and licensed practice.
!
! Coverage: every function of include/relicore.h and the Fortran procedures that bind it
! (tests/fortran/check_interfaces.py fails when a header function has no interface here or
! an interface's arguments differ from the prototype; "function" is relicore_<name>, "_s"
! its status form relicore_<name>_s, "subroutine" the array form of the same name):
!   C function                                                    Fortran procedures
!   relicore_status_message                                       function
!   relicore_version                                              function
!   relicore_spectral_radiance_wavelength                         function, _s
!   relicore_spectral_radiance_frequency                          function, _s
!   relicore_spectral_radiance_wavenumber                         function, _s
!   relicore_photon_radiance_wavelength                           function, _s
!   relicore_photon_radiance_frequency                            function, _s
!   relicore_photon_radiance_wavenumber                           function, _s
!   relicore_radiance_temperature_derivative_wavelength           function, _s
!   relicore_radiance_temperature_derivative_frequency            function, _s
!   relicore_radiant_exitance                                     function, _s
!   relicore_photon_exitance                                      function, _s
!   relicore_peak_wavelength                                      function, _s
!   relicore_peak_frequency                                       function, _s
!   relicore_peak_wavenumber                                      function, _s
!   relicore_photon_peak_wavelength                               function, _s
!   relicore_photon_peak_frequency                                function, _s
!   relicore_temperature_from_peak_wavelength                     function, _s
!   relicore_temperature_from_peak_frequency                      function, _s
!   relicore_band_fraction_wavelength                             function, _s
!   relicore_band_radiance_wavelength                             function, _s
!   relicore_band_photon_radiance_wavelength                      function, _s
!   relicore_band_radiance_frequency                              function, _s
!   relicore_temperature_from_band_radiance_wavelength            function, _s
!   relicore_brightness_temperature_wavelength                    function, _s
!   relicore_brightness_temperature_frequency                     function, _s
!   relicore_rayleigh_jeans_temperature                           function, _s
!   relicore_ratio_temperature                                    function, _s
!   relicore_thermodynamic_to_rayleigh_jeans_factor               function, _s
!   relicore_kcmb_to_mjy_per_sr                                   function, _s
!   relicore_thermal_sz_spectral_shape                            function, _s
!   relicore_thermal_sz_temperature_shape                         function, _s
!   relicore_thermal_sz_null_frequency                            function, _s
!   relicore_spectral_radiance_wavelength_array                   subroutine
!   relicore_spectral_radiance_frequency_array                    subroutine
!   relicore_spectral_radiance_wavenumber_array                   subroutine
!   relicore_photon_radiance_wavelength_array                     subroutine
!   relicore_photon_radiance_frequency_array                      subroutine
!   relicore_photon_radiance_wavenumber_array                     subroutine
!   relicore_radiance_temperature_derivative_wavelength_array     subroutine
!   relicore_radiance_temperature_derivative_frequency_array      subroutine
!   relicore_brightness_temperature_wavelength_array              subroutine
!   relicore_brightness_temperature_frequency_array               subroutine
!   relicore_spectral_radiance_wavelength_array_f32               subroutine
!   relicore_spectral_radiance_frequency_array_f32                subroutine
!   relicore_spectral_radiance_wavenumber_array_f32               subroutine
!   relicore_spectral_radiance_wavelength_f32                     function, _s
!   relicore_spectral_radiance_frequency_f32                      function, _s
!   relicore_spectral_radiance_wavenumber_f32                     function, _s
!   relicore_band_radiance_wavelength_f32                         function, _s
!   relicore_brightness_temperature_wavelength_f32                function, _s
!   relicore_brightness_temperature_frequency_f32                 function, _s
!   relicore_two_load_calibration                                 generic function (= type), _s
!   relicore_calibrated_temperature                               function, _s
!   relicore_calibrated_brightness_temperature                    function, _s
!   relicore_two_load_calibration_f32                             generic function (= type), _s
!   relicore_calibrated_temperature_f32                           function, _s
!   relicore_calibrated_brightness_temperature_f32                function, _s
!   relicore_response_weighted_radiance                           function, _s
!   relicore_temperature_from_response_weighted_radiance          function, _s
!   relicore_response_weighted_radiance_f32                       function, _s
!   relicore_temperature_from_response_weighted_radiance_f32      function, _s
!   relicore_universe_parameters_default                          function
!   relicore_universe_init                                        subroutine (optional stat)
!   relicore_universe_check_parameters                            subroutine (optional stat)
!   relicore_universe_get_parameters                              function, _s
!   relicore_hubble_distance_mpc                                  function, _s
!   relicore_dimensionless_hubble                                 function, _s
!   relicore_hubble_parameter_km_s_mpc                            function, _s
!   relicore_omega_matter_at                                      function, _s
!   relicore_omega_radiation_at                                   function, _s
!   relicore_omega_dark_energy_at                                 function, _s
!   relicore_omega_curvature_at                                   function, _s
!   relicore_critical_density_kg_m3                               function, _s
!   relicore_cmb_temperature_at_k                                 function, _s
!   relicore_comoving_distance_mpc                                function, _s
!   relicore_transverse_comoving_distance_mpc                     function, _s
!   relicore_angular_diameter_distance_mpc                        function, _s
!   relicore_luminosity_distance_mpc                              function, _s
!   relicore_distance_modulus                                     function, _s
!   relicore_comoving_volume_gpc3                                 function, _s
!   relicore_differential_comoving_volume_mpc3_sr                 function, _s
!   relicore_transverse_scale_kpc_per_arcsec                      function, _s
!   relicore_lookback_time_gyr                                    function, _s
!   relicore_age_gyr                                              function, _s
!   relicore_conformal_time_mpc                                   function, _s
!   relicore_angular_diameter_distance_between_mpc                function, _s
!   relicore_redshift_at_age_gyr                                  function, _s
!   relicore_redshift_at_lookback_time_gyr                        function, _s
!   relicore_redshift_at_comoving_distance_mpc                    function, _s
!   relicore_redshift_at_luminosity_distance_mpc                  function, _s
!   relicore_dimensionless_hubble_array                           subroutine
!   relicore_hubble_parameter_km_s_mpc_array                      subroutine
!   relicore_omega_matter_at_array                                subroutine
!   relicore_omega_radiation_at_array                             subroutine
!   relicore_omega_dark_energy_at_array                           subroutine
!   relicore_omega_curvature_at_array                             subroutine
!   relicore_critical_density_kg_m3_array                         subroutine
!   relicore_cmb_temperature_at_k_array                           subroutine
!   relicore_comoving_distance_mpc_array                          subroutine
!   relicore_transverse_comoving_distance_mpc_array               subroutine
!   relicore_angular_diameter_distance_mpc_array                  subroutine
!   relicore_luminosity_distance_mpc_array                        subroutine
!   relicore_distance_modulus_array                               subroutine
!   relicore_comoving_volume_gpc3_array                           subroutine
!   relicore_differential_comoving_volume_mpc3_sr_array           subroutine
!   relicore_transverse_scale_kpc_per_arcsec_array                subroutine
!   relicore_lookback_time_gyr_array                              subroutine
!   relicore_age_gyr_array                                        subroutine
!   relicore_conformal_time_mpc_array                             subroutine
!   relicore_redshift_at_age_gyr_array                            subroutine
!   relicore_redshift_at_lookback_time_gyr_array                  subroutine
!   relicore_redshift_at_comoving_distance_mpc_array              subroutine
!   relicore_redshift_at_luminosity_distance_mpc_array            subroutine
!   relicore_hubble_time_gyr                                      function, _s
!   relicore_omega_radiation                                      function, _s
!   relicore_omega_dark_energy                                    function, _s
!   relicore_matter_radiation_equality_redshift                   function, _s
!   relicore_saha_ionized_fraction                                function, _s
!   relicore_last_scattering_redshift_fit                         function, _s
!   relicore_drag_redshift_fit                                    function, _s
!   relicore_thermal_history_options_default                      function
!   relicore_thermal_history_compute                              subroutine (optional stat)
!   relicore_ionized_fraction                                     function, _s
!   relicore_matter_temperature_k                                 function, _s
!   relicore_optical_depth                                        function, _s
!   relicore_visibility                                           function, _s
!   relicore_sound_horizon_mpc                                    function, _s
!   relicore_last_scattering_redshift                             function, _s
!   relicore_drag_redshift                                        function, _s
!   relicore_sound_horizon_last_scattering_mpc                    function, _s
!   relicore_sound_horizon_drag_mpc                               function, _s
!   relicore_angular_scale_last_scattering                        function, _s
!   relicore_age_at_last_scattering_yr                            function, _s
!   relicore_temperature_at_last_scattering_k                     function, _s
!   relicore_visibility_peak_redshift                             function, _s
!   relicore_thermal_decoupling_redshift                          function, _s
!   relicore_reionization_optical_depth                           function, _s
!   relicore_saha_ionized_fraction_array                          subroutine
!   relicore_last_scattering_redshift_fit_array                   subroutine
!   relicore_drag_redshift_fit_array                              subroutine
!   relicore_ionized_fraction_array                               subroutine
!   relicore_matter_temperature_k_array                           subroutine
!   relicore_optical_depth_array                                  subroutine
!   relicore_visibility_array                                     subroutine
!   relicore_sound_horizon_mpc_array                              subroutine
module relicore
  use, intrinsic :: iso_c_binding, only: c_double, c_float, c_int32_t, c_int64_t, c_size_t, &
      c_char, c_ptr, c_null_char, c_associated, c_f_pointer
  use, intrinsic :: ieee_arithmetic, only: ieee_value, ieee_quiet_nan
  implicit none
  private

  ! ---------------------------------------------------------------- status codes and constants
  ! The #defines of include/relicore.h (tests/fortran/check_interfaces.py compares values).
  integer(c_int32_t), parameter, public :: RELICORE_OK = 0_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_NULL_POINTER = -1_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_NON_FINITE = -2_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_NON_POSITIVE = -3_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_NEGATIVE = -4_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_EMPTY_INTERVAL = -5_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_ARRAY_TOO_SHORT = -6_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_LENGTH_MISMATCH = -7_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_NOT_INCREASING = -8_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_DEGENERATE_CALIBRATION = -9_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_OUT_OF_DOMAIN = -10_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_NO_CONVERGENCE = -11_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_INVALID_STRUCT = -12_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_PANIC = -13_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_INVALID_PARAMETER = -14_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_NO_BIG_BANG = -15_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_ERROR_CAPACITY_TOO_SMALL = -16_c_int32_t
  ! Words of storage in type(relicore_universe) (struct relicore_universe).
  integer(c_int32_t), parameter, public :: RELICORE_UNIVERSE_STORAGE_WORDS = 1920_c_int32_t
  ! Words of storage in type(relicore_thermal_history) (struct relicore_thermal_history).
  integer(c_int32_t), parameter, public :: RELICORE_THERMAL_HISTORY_STORAGE_WORDS = 20480_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_VERSION_MAJOR = 0_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_VERSION_MINOR = 1_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_VERSION_PATCH = 0_c_int32_t
  real(c_double), parameter, public :: RELICORE_SPEED_OF_LIGHT = 299792458.0e0_c_double
  real(c_double), parameter, public :: RELICORE_PLANCK = 6.62607015e-34_c_double
  real(c_double), parameter, public :: RELICORE_BOLTZMANN = 1.380649e-23_c_double
  real(c_double), parameter, public :: RELICORE_ELEMENTARY_CHARGE = 1.602176634e-19_c_double
  real(c_double), parameter, public :: RELICORE_AVOGADRO = 6.02214076e23_c_double
  real(c_double), parameter, public :: RELICORE_REDUCED_PLANCK = 1.0545718176461565e-34_c_double
  real(c_double), parameter, public :: RELICORE_ELECTRON_MASS = 9.1093837139e-31_c_double
  real(c_double), parameter, public :: RELICORE_PROTON_MASS = 1.67262192595e-27_c_double
  real(c_double), parameter, public :: &
      RELICORE_THOMSON_CROSS_SECTION = 6.6524587051e-29_c_double
  real(c_double), parameter, public :: RELICORE_GRAVITATIONAL_CONSTANT = 6.67430e-11_c_double
  real(c_double), parameter, public :: RELICORE_FINE_STRUCTURE = 7.2973525643e-3_c_double
  real(c_double), parameter, public :: RELICORE_RYDBERG_ENERGY = 2.1798723611030e-18_c_double
  real(c_double), parameter, public :: RELICORE_ATOMIC_MASS_UNIT = 1.66053906892e-27_c_double
  real(c_double), parameter, public :: RELICORE_HYDROGEN_ATOM_MASS_U = 1.007825031898e0_c_double
  real(c_double), parameter, public :: RELICORE_HELIUM_ATOM_MASS_U = 4.002603254130e0_c_double
  real(c_double), parameter, public :: RELICORE_HYDROGEN_IONIZATION_EV = 13.598434599702e0_c_double
  real(c_double), parameter, public :: &
      RELICORE_HELIUM_FIRST_IONIZATION_EV = 24.587389011e0_c_double
  real(c_double), parameter, public :: &
      RELICORE_HELIUM_SECOND_IONIZATION_EV = 54.4177655e0_c_double
  real(c_double), parameter, public :: RELICORE_FIRST_RADIATION = 3.741771852192758e-16_c_double
  real(c_double), parameter, public :: &
      RELICORE_FIRST_RADIATION_RADIANCE = 1.1910429723971884e-16_c_double
  real(c_double), parameter, public :: &
      RELICORE_SECOND_RADIATION = 1.4387768775039339e-2_c_double
  real(c_double), parameter, public :: &
      RELICORE_SECOND_RADIATION_LO = -6.735986446804958e-19_c_double
  real(c_double), parameter, public :: &
      RELICORE_PLANCK_OVER_BOLTZMANN = 4.799243073366221e-11_c_double
  real(c_double), parameter, public :: &
      RELICORE_PLANCK_OVER_BOLTZMANN_LO = 2.4295941674596896e-27_c_double
  real(c_double), parameter, public :: &
      RELICORE_STEFAN_BOLTZMANN = 5.6703744191844294e-8_c_double
  real(c_double), parameter, public :: &
      RELICORE_RADIATION_DENSITY = 7.565733250280005e-16_c_double
  real(c_double), parameter, public :: &
      RELICORE_PHOTON_STEFAN_BOLTZMANN = 1.5204608593931362e15_c_double
  real(c_double), parameter, public :: RELICORE_WIEN_WAVELENGTH = 2.8977719551851727e-3_c_double
  real(c_double), parameter, public :: RELICORE_WIEN_FREQUENCY = 5.878925757646825e10_c_double
  real(c_double), parameter, public :: RELICORE_WIEN_WAVENUMBER = 1.9609985510865738e2_c_double
  real(c_double), parameter, public :: &
      RELICORE_WIEN_PHOTON_WAVELENGTH = 3.669702865050074e-3_c_double
  real(c_double), parameter, public :: &
      RELICORE_WIEN_PHOTON_FREQUENCY = 3.320574173214905e10_c_double
  real(c_double), parameter, public :: &
      RELICORE_WIEN_FREQUENCY_INVERSE = 1.7009910334371582e-11_c_double
  real(c_double), parameter, public :: RELICORE_ASTRONOMICAL_UNIT = 149597870700.0e0_c_double
  real(c_double), parameter, public :: RELICORE_PARSEC = 3.085677581491367e16_c_double
  real(c_double), parameter, public :: RELICORE_MEGAPARSEC = 3.085677581491367e22_c_double
  real(c_double), parameter, public :: RELICORE_JULIAN_YEAR = 31557600.0e0_c_double
  real(c_double), parameter, public :: &
      RELICORE_ROOT_WAVELENGTH_PEAK = 4.965114231744276e0_c_double
  real(c_double), parameter, public :: &
      RELICORE_ROOT_FREQUENCY_PEAK = 2.8214393721220787e0_c_double
  real(c_double), parameter, public :: &
      RELICORE_ROOT_PHOTON_WAVELENGTH_PEAK = 3.9206903948728864e0_c_double
  real(c_double), parameter, public :: &
      RELICORE_ROOT_PHOTON_FREQUENCY_PEAK = 1.59362426004004e0_c_double
  real(c_double), parameter, public :: &
      RELICORE_ROOT_THERMAL_SZ_NULL = 3.830016096309075e0_c_double

  ! ---------------------------------------------------------------- public procedures
  public :: relicore_spectral_radiance_wavelength, relicore_spectral_radiance_wavelength_s, &
      relicore_spectral_radiance_frequency, relicore_spectral_radiance_frequency_s, &
      relicore_spectral_radiance_wavenumber, relicore_spectral_radiance_wavenumber_s, &
      relicore_photon_radiance_wavelength, relicore_photon_radiance_wavelength_s, &
      relicore_photon_radiance_frequency, relicore_photon_radiance_frequency_s, &
      relicore_photon_radiance_wavenumber, relicore_photon_radiance_wavenumber_s, &
      relicore_radiance_temperature_derivative_wavelength, &
      relicore_radiance_temperature_derivative_wavelength_s, &
      relicore_radiance_temperature_derivative_frequency, &
      relicore_radiance_temperature_derivative_frequency_s, relicore_radiant_exitance, &
      relicore_radiant_exitance_s, relicore_photon_exitance, relicore_photon_exitance_s, &
      relicore_peak_wavelength, relicore_peak_wavelength_s, relicore_peak_frequency, &
      relicore_peak_frequency_s, relicore_peak_wavenumber, relicore_peak_wavenumber_s, &
      relicore_photon_peak_wavelength, relicore_photon_peak_wavelength_s, &
      relicore_photon_peak_frequency, relicore_photon_peak_frequency_s, &
      relicore_temperature_from_peak_wavelength, relicore_temperature_from_peak_wavelength_s, &
      relicore_temperature_from_peak_frequency, relicore_temperature_from_peak_frequency_s, &
      relicore_band_fraction_wavelength, relicore_band_fraction_wavelength_s, &
      relicore_band_radiance_wavelength, relicore_band_radiance_wavelength_s, &
      relicore_band_photon_radiance_wavelength, relicore_band_photon_radiance_wavelength_s, &
      relicore_band_radiance_frequency, relicore_band_radiance_frequency_s, &
      relicore_temperature_from_band_radiance_wavelength, &
      relicore_temperature_from_band_radiance_wavelength_s, &
      relicore_brightness_temperature_wavelength, &
      relicore_brightness_temperature_wavelength_s, &
      relicore_brightness_temperature_frequency, relicore_brightness_temperature_frequency_s, &
      relicore_rayleigh_jeans_temperature, relicore_rayleigh_jeans_temperature_s, &
      relicore_ratio_temperature, relicore_ratio_temperature_s, &
      relicore_thermodynamic_to_rayleigh_jeans_factor, &
      relicore_thermodynamic_to_rayleigh_jeans_factor_s, relicore_kcmb_to_mjy_per_sr, &
      relicore_kcmb_to_mjy_per_sr_s, relicore_thermal_sz_spectral_shape, &
      relicore_thermal_sz_spectral_shape_s, relicore_thermal_sz_temperature_shape, &
      relicore_thermal_sz_temperature_shape_s, relicore_thermal_sz_null_frequency, &
      relicore_thermal_sz_null_frequency_s, relicore_spectral_radiance_wavelength_f32, &
      relicore_spectral_radiance_wavelength_f32_s, relicore_spectral_radiance_frequency_f32, &
      relicore_spectral_radiance_frequency_f32_s, relicore_spectral_radiance_wavenumber_f32, &
      relicore_spectral_radiance_wavenumber_f32_s, &
      relicore_brightness_temperature_wavelength_f32, &
      relicore_brightness_temperature_wavelength_f32_s, &
      relicore_brightness_temperature_frequency_f32, &
      relicore_brightness_temperature_frequency_f32_s, relicore_band_radiance_wavelength_f32, &
      relicore_band_radiance_wavelength_f32_s, relicore_spectral_radiance_wavelength_array, &
      relicore_spectral_radiance_frequency_array, &
      relicore_spectral_radiance_wavenumber_array, relicore_photon_radiance_wavelength_array, &
      relicore_photon_radiance_frequency_array, relicore_photon_radiance_wavenumber_array, &
      relicore_radiance_temperature_derivative_wavelength_array, &
      relicore_radiance_temperature_derivative_frequency_array, &
      relicore_brightness_temperature_wavelength_array, &
      relicore_brightness_temperature_frequency_array, &
      relicore_spectral_radiance_wavelength_array_f32, &
      relicore_spectral_radiance_frequency_array_f32, &
      relicore_spectral_radiance_wavenumber_array_f32, relicore_response_weighted_radiance, &
      relicore_response_weighted_radiance_s, relicore_response_weighted_radiance_f32, &
      relicore_response_weighted_radiance_f32_s, &
      relicore_temperature_from_response_weighted_radiance, &
      relicore_temperature_from_response_weighted_radiance_s, &
      relicore_temperature_from_response_weighted_radiance_f32, &
      relicore_temperature_from_response_weighted_radiance_f32_s, &
      relicore_two_load_calibration, relicore_two_load_calibration_s, &
      relicore_calibrated_temperature, relicore_calibrated_temperature_s, &
      relicore_calibrated_brightness_temperature, &
      relicore_calibrated_brightness_temperature_s, relicore_two_load_calibration_f32, &
      relicore_two_load_calibration_f32_s, relicore_calibrated_temperature_f32, &
      relicore_calibrated_temperature_f32_s, relicore_calibrated_brightness_temperature_f32, &
      relicore_calibrated_brightness_temperature_f32_s, relicore_status_message, &
      relicore_version
  public :: relicore_universe_parameters_default, relicore_universe_init, &
      relicore_universe_check_parameters, relicore_universe_get_parameters, &
      relicore_universe_get_parameters_s, relicore_dimensionless_hubble, &
      relicore_dimensionless_hubble_s, relicore_hubble_parameter_km_s_mpc, &
      relicore_hubble_parameter_km_s_mpc_s, relicore_omega_matter_at, relicore_omega_matter_at_s, &
      relicore_omega_radiation_at, relicore_omega_radiation_at_s, relicore_omega_dark_energy_at, &
      relicore_omega_dark_energy_at_s, relicore_omega_curvature_at, &
      relicore_omega_curvature_at_s, relicore_critical_density_kg_m3, &
      relicore_critical_density_kg_m3_s, relicore_cmb_temperature_at_k, &
      relicore_cmb_temperature_at_k_s, relicore_comoving_distance_mpc, &
      relicore_comoving_distance_mpc_s, relicore_transverse_comoving_distance_mpc, &
      relicore_transverse_comoving_distance_mpc_s, relicore_angular_diameter_distance_mpc, &
      relicore_angular_diameter_distance_mpc_s, relicore_luminosity_distance_mpc, &
      relicore_luminosity_distance_mpc_s, relicore_distance_modulus, relicore_distance_modulus_s, &
      relicore_comoving_volume_gpc3, relicore_comoving_volume_gpc3_s, &
      relicore_differential_comoving_volume_mpc3_sr, &
      relicore_differential_comoving_volume_mpc3_sr_s, relicore_transverse_scale_kpc_per_arcsec, &
      relicore_transverse_scale_kpc_per_arcsec_s, relicore_lookback_time_gyr, &
      relicore_lookback_time_gyr_s, relicore_age_gyr, relicore_age_gyr_s, &
      relicore_conformal_time_mpc, relicore_conformal_time_mpc_s, &
      relicore_angular_diameter_distance_between_mpc, &
      relicore_angular_diameter_distance_between_mpc_s, relicore_redshift_at_age_gyr, &
      relicore_redshift_at_age_gyr_s, relicore_redshift_at_lookback_time_gyr, &
      relicore_redshift_at_lookback_time_gyr_s, relicore_redshift_at_comoving_distance_mpc, &
      relicore_redshift_at_comoving_distance_mpc_s, relicore_redshift_at_luminosity_distance_mpc, &
      relicore_redshift_at_luminosity_distance_mpc_s, relicore_dimensionless_hubble_array, &
      relicore_hubble_parameter_km_s_mpc_array, relicore_omega_matter_at_array, &
      relicore_omega_radiation_at_array, relicore_omega_dark_energy_at_array, &
      relicore_omega_curvature_at_array, relicore_critical_density_kg_m3_array, &
      relicore_cmb_temperature_at_k_array, relicore_comoving_distance_mpc_array, &
      relicore_transverse_comoving_distance_mpc_array, &
      relicore_angular_diameter_distance_mpc_array, relicore_luminosity_distance_mpc_array, &
      relicore_distance_modulus_array, relicore_comoving_volume_gpc3_array, &
      relicore_differential_comoving_volume_mpc3_sr_array, &
      relicore_transverse_scale_kpc_per_arcsec_array, relicore_lookback_time_gyr_array, &
      relicore_age_gyr_array, relicore_conformal_time_mpc_array, &
      relicore_redshift_at_age_gyr_array, relicore_redshift_at_lookback_time_gyr_array, &
      relicore_redshift_at_comoving_distance_mpc_array, &
      relicore_redshift_at_luminosity_distance_mpc_array, relicore_hubble_distance_mpc, &
      relicore_hubble_distance_mpc_s, relicore_hubble_time_gyr, relicore_hubble_time_gyr_s, &
      relicore_omega_radiation, relicore_omega_radiation_s, relicore_omega_dark_energy, &
      relicore_omega_dark_energy_s, relicore_matter_radiation_equality_redshift, &
      relicore_matter_radiation_equality_redshift_s
  public :: relicore_saha_ionized_fraction, relicore_saha_ionized_fraction_s, &
      relicore_saha_ionized_fraction_array, relicore_last_scattering_redshift_fit, &
      relicore_last_scattering_redshift_fit_s, relicore_last_scattering_redshift_fit_array, &
      relicore_drag_redshift_fit, relicore_drag_redshift_fit_s, &
      relicore_drag_redshift_fit_array, relicore_thermal_history_options_default, &
      relicore_thermal_history_compute, relicore_ionized_fraction, relicore_ionized_fraction_s, &
      relicore_ionized_fraction_array, relicore_matter_temperature_k, &
      relicore_matter_temperature_k_s, relicore_matter_temperature_k_array, &
      relicore_optical_depth, relicore_optical_depth_s, relicore_optical_depth_array, &
      relicore_visibility, relicore_visibility_s, relicore_visibility_array, &
      relicore_sound_horizon_mpc, relicore_sound_horizon_mpc_s, &
      relicore_sound_horizon_mpc_array, relicore_last_scattering_redshift, &
      relicore_last_scattering_redshift_s, relicore_drag_redshift, relicore_drag_redshift_s, &
      relicore_sound_horizon_last_scattering_mpc, relicore_sound_horizon_last_scattering_mpc_s, &
      relicore_sound_horizon_drag_mpc, relicore_sound_horizon_drag_mpc_s, &
      relicore_angular_scale_last_scattering, relicore_angular_scale_last_scattering_s, &
      relicore_age_at_last_scattering_yr, relicore_age_at_last_scattering_yr_s, &
      relicore_temperature_at_last_scattering_k, relicore_temperature_at_last_scattering_k_s, &
      relicore_visibility_peak_redshift, relicore_visibility_peak_redshift_s, &
      relicore_thermal_decoupling_redshift, relicore_thermal_decoupling_redshift_s, &
      relicore_reionization_optical_depth, relicore_reionization_optical_depth_s

  ! ---------------------------------------------------------------- types
  ! struct relicore_two_load_calibration { double frequency_hz; double gain; double offset; };
  ! The gain and offset of a two-load calibration at one frequency: reading = gain * J +
  ! offset, J the Rayleigh-Jeans brightness temperature in K. A plain value the caller owns.
  type, bind(C), public :: relicore_two_load_calibration
    real(c_double) :: frequency_hz  ! channel frequency in Hz
    real(c_double) :: gain          ! reading units per K of brightness temperature J
    real(c_double) :: offset        ! reading units (the reading for J = 0)
  end type relicore_two_load_calibration

  ! struct relicore_two_load_calibration_f32 { float frequency_hz; float gain; float offset; };
  type, bind(C), public :: relicore_two_load_calibration_f32
    real(c_float) :: frequency_hz  ! channel frequency in Hz
    real(c_float) :: gain          ! reading units per K of brightness temperature J
    real(c_float) :: offset        ! reading units (the reading for J = 0)
  end type relicore_two_load_calibration_f32

  ! struct relicore_universe_parameters { double h0_km_s_mpc; double omega_matter;
  !     double omega_baryon; double omega_curvature; double cmb_temperature_k; double n_eff;
  !     double neutrino_masses_ev[3]; double w0; double wa; double helium_mass_fraction; };
  ! The parameters of a universe. Fill it with relicore_universe_parameters_default (the
  ! common-practice defaults for everything but H0 and Omega_m), change what differs, then
  ! build the universe with relicore_universe_init. Positions named by
  ! relicore_universe_check_parameters (0-based, as in C and Python): 0 h0_km_s_mpc,
  ! 1 omega_matter, 2 omega_baryon, 3 omega_curvature, 4 cmb_temperature_k, 5 n_eff,
  ! 6 neutrino_masses_ev, 7 w0, 8 wa, 9 helium_mass_fraction.
  type, bind(C), public :: relicore_universe_parameters
    real(c_double) :: h0_km_s_mpc            ! Hubble constant in km s-1 Mpc-1, > 0
    real(c_double) :: omega_matter           ! all non-relativistic matter today (massive
                                             ! neutrinos included), >= 0
    real(c_double) :: omega_baryon           ! baryons today, 0 <= Omega_b <= Omega_m
    real(c_double) :: omega_curvature        ! Omega_k today (0 flat, > 0 open, < 0 closed)
    real(c_double) :: cmb_temperature_k      ! T0 in K, >= 0 (0: no photons, no neutrinos)
    real(c_double) :: n_eff                  ! effective number of neutrino species, >= 0
    real(c_double) :: neutrino_masses_ev(3)  ! the three neutrino masses in eV, >= 0
    real(c_double) :: w0                     ! dark-energy equation of state today
    real(c_double) :: wa                     ! its slope: w(a) = w0 + wa (1 - a)
    real(c_double) :: helium_mass_fraction   ! primordial helium mass fraction, [0, 1)
  end type relicore_universe_parameters

  ! struct relicore_universe { uint64_t tag; uint64_t storage[RELICORE_UNIVERSE_STORAGE_WORDS]; };
  ! A validated universe (derived constants and a precomputed distance table), built by
  ! relicore_universe_init and passed to every cosmology procedure. A plain value of 15368
  ! bytes owned by the caller: copy it by assignment, keep it in a module or a derived type,
  ! read it from any number of threads; there is nothing to free. Its components are private
  ! to the library: do not read or write them. The tag starts at 0, so a universe that was
  ! never initialised (or whose init failed) is refused with RELICORE_ERROR_INVALID_STRUCT.
  type, bind(C), public :: relicore_universe
    integer(c_int64_t) :: tag = 0_c_int64_t                              ! private
    integer(c_int64_t) :: storage(RELICORE_UNIVERSE_STORAGE_WORDS)       ! private
  end type relicore_universe

  ! struct relicore_thermal_history_options { int32_t reionization; double reionization_redshift;
  !     double highest_redshift; };
  ! The options of a thermal history: fill it with relicore_thermal_history_options_default()
  ! (no reionisation, reionization_redshift NaN (unset), highest_redshift 1e4), change what
  ! differs, then call relicore_thermal_history_compute.
  type, bind(C), public :: relicore_thermal_history_options
    integer(c_int32_t) :: reionization       ! 0: none; 1: tanh reionisation at
                                             ! reionization_redshift (any other value:
                                             ! RELICORE_ERROR_OUT_OF_DOMAIN)
    real(c_double) :: reionization_redshift  ! z_re, 0 <= z_re <= 100 (used when reionization = 1)
    real(c_double) :: highest_redshift       ! top of the table, 3000 <= z <= 1e4 (above 1e4:
                                             ! RELICORE_ERROR_CAPACITY_TOO_SMALL)
  end type relicore_thermal_history_options

  ! struct relicore_thermal_history { uint64_t tag;
  !     uint64_t storage[RELICORE_THERMAL_HISTORY_STORAGE_WORDS]; };
  ! A computed recombination and thermal history (2048 table nodes and its summary, with a copy
  ! of its universe), built by relicore_thermal_history_compute and passed to its queries. A
  ! plain value of 163848 bytes owned by the caller: keep it in a module, a derived type or an
  ! allocatable rather than as a local variable on a small stack; copy it by assignment; read it
  ! from any number of threads; there is nothing to free. Its components are private to the
  ! library. The tag starts at 0, so a history that was never computed (or whose compute failed)
  ! is refused with RELICORE_ERROR_INVALID_STRUCT.
  type, bind(C), public :: relicore_thermal_history
    integer(c_int64_t) :: tag = 0_c_int64_t                                 ! private
    integer(c_int64_t) :: storage(RELICORE_THERMAL_HISTORY_STORAGE_WORDS)   ! private
  end type relicore_thermal_history

  ! The calibration from two loads, under the name of its type (see the conventions above).
  interface relicore_two_load_calibration
    module procedure make_two_load_calibration
  end interface relicore_two_load_calibration

  interface relicore_two_load_calibration_f32
    module procedure make_two_load_calibration_f32
  end interface relicore_two_load_calibration_f32

  ! Longest C string read by c_string (the library's strings are a few dozen characters).
  integer, parameter :: max_c_string = 4096

  ! ---------------------------------------------------------------- raw C interfaces (private)
  ! One per function of include/relicore.h, its C prototype above it; checked mechanically
  ! against the header by tests/fortran/check_interfaces.py.
  interface
    ! const char *relicore_status_message(int32_t status);
    function c_status_message(status) bind(C, name='relicore_status_message') result(message)
      import :: c_int32_t, c_ptr
      integer(c_int32_t), value :: status
      type(c_ptr) :: message
    end function c_status_message
    ! const char *relicore_version(void);
    function c_version() bind(C, name='relicore_version') result(version)
      import :: c_ptr
      type(c_ptr) :: version
    end function c_version

    ! int32_t relicore_spectral_radiance_wavelength(double wavelength_m, double temperature_k,
    !     double *out);
    function c_spectral_radiance_wavelength(wavelength_m, temperature_k, out) &
        bind(C, name='relicore_spectral_radiance_wavelength') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: wavelength_m, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_spectral_radiance_wavelength
    ! int32_t relicore_spectral_radiance_frequency(double frequency_hz, double temperature_k,
    !     double *out);
    function c_spectral_radiance_frequency(frequency_hz, temperature_k, out) &
        bind(C, name='relicore_spectral_radiance_frequency') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: frequency_hz, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_spectral_radiance_frequency
    ! int32_t relicore_spectral_radiance_wavenumber(double wavenumber_per_m,
    !     double temperature_k, double *out);
    function c_spectral_radiance_wavenumber(wavenumber_per_m, temperature_k, out) &
        bind(C, name='relicore_spectral_radiance_wavenumber') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: wavenumber_per_m, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_spectral_radiance_wavenumber
    ! int32_t relicore_photon_radiance_wavelength(double wavelength_m, double temperature_k,
    !     double *out);
    function c_photon_radiance_wavelength(wavelength_m, temperature_k, out) &
        bind(C, name='relicore_photon_radiance_wavelength') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: wavelength_m, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_photon_radiance_wavelength
    ! int32_t relicore_photon_radiance_frequency(double frequency_hz, double temperature_k,
    !     double *out);
    function c_photon_radiance_frequency(frequency_hz, temperature_k, out) &
        bind(C, name='relicore_photon_radiance_frequency') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: frequency_hz, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_photon_radiance_frequency
    ! int32_t relicore_photon_radiance_wavenumber(double wavenumber_per_m,
    !     double temperature_k, double *out);
    function c_photon_radiance_wavenumber(wavenumber_per_m, temperature_k, out) &
        bind(C, name='relicore_photon_radiance_wavenumber') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: wavenumber_per_m, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_photon_radiance_wavenumber
    ! int32_t relicore_radiance_temperature_derivative_wavelength(double wavelength_m,
    !     double temperature_k, double *out);
    function c_radiance_temperature_derivative_wavelength(wavelength_m, temperature_k, out) &
        bind(C, name='relicore_radiance_temperature_derivative_wavelength') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: wavelength_m, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_radiance_temperature_derivative_wavelength
    ! int32_t relicore_radiance_temperature_derivative_frequency(double frequency_hz,
    !     double temperature_k, double *out);
    function c_radiance_temperature_derivative_frequency(frequency_hz, temperature_k, out) &
        bind(C, name='relicore_radiance_temperature_derivative_frequency') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: frequency_hz, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_radiance_temperature_derivative_frequency
    ! int32_t relicore_radiant_exitance(double temperature_k, double *out);
    function c_radiant_exitance(temperature_k, out) &
        bind(C, name='relicore_radiant_exitance') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_radiant_exitance
    ! int32_t relicore_photon_exitance(double temperature_k, double *out);
    function c_photon_exitance(temperature_k, out) &
        bind(C, name='relicore_photon_exitance') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_photon_exitance
    ! int32_t relicore_peak_wavelength(double temperature_k, double *out);
    function c_peak_wavelength(temperature_k, out) &
        bind(C, name='relicore_peak_wavelength') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_peak_wavelength
    ! int32_t relicore_peak_frequency(double temperature_k, double *out);
    function c_peak_frequency(temperature_k, out) &
        bind(C, name='relicore_peak_frequency') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_peak_frequency
    ! int32_t relicore_peak_wavenumber(double temperature_k, double *out);
    function c_peak_wavenumber(temperature_k, out) &
        bind(C, name='relicore_peak_wavenumber') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_peak_wavenumber
    ! int32_t relicore_photon_peak_wavelength(double temperature_k, double *out);
    function c_photon_peak_wavelength(temperature_k, out) &
        bind(C, name='relicore_photon_peak_wavelength') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_photon_peak_wavelength
    ! int32_t relicore_photon_peak_frequency(double temperature_k, double *out);
    function c_photon_peak_frequency(temperature_k, out) &
        bind(C, name='relicore_photon_peak_frequency') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_photon_peak_frequency
    ! int32_t relicore_temperature_from_peak_wavelength(double wavelength_m, double *out);
    function c_temperature_from_peak_wavelength(wavelength_m, out) &
        bind(C, name='relicore_temperature_from_peak_wavelength') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: wavelength_m
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_temperature_from_peak_wavelength
    ! int32_t relicore_temperature_from_peak_frequency(double frequency_hz, double *out);
    function c_temperature_from_peak_frequency(frequency_hz, out) &
        bind(C, name='relicore_temperature_from_peak_frequency') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: frequency_hz
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_temperature_from_peak_frequency
    ! int32_t relicore_band_fraction_wavelength(double lower_m, double upper_m,
    !     double temperature_k, double *out);
    function c_band_fraction_wavelength(lower_m, upper_m, temperature_k, out) &
        bind(C, name='relicore_band_fraction_wavelength') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: lower_m, upper_m, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_band_fraction_wavelength
    ! int32_t relicore_band_radiance_wavelength(double lower_m, double upper_m,
    !     double temperature_k, double *out);
    function c_band_radiance_wavelength(lower_m, upper_m, temperature_k, out) &
        bind(C, name='relicore_band_radiance_wavelength') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: lower_m, upper_m, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_band_radiance_wavelength
    ! int32_t relicore_band_photon_radiance_wavelength(double lower_m, double upper_m,
    !     double temperature_k, double *out);
    function c_band_photon_radiance_wavelength(lower_m, upper_m, temperature_k, out) &
        bind(C, name='relicore_band_photon_radiance_wavelength') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: lower_m, upper_m, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_band_photon_radiance_wavelength
    ! int32_t relicore_band_radiance_frequency(double lower_hz, double upper_hz,
    !     double temperature_k, double *out);
    function c_band_radiance_frequency(lower_hz, upper_hz, temperature_k, out) &
        bind(C, name='relicore_band_radiance_frequency') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: lower_hz, upper_hz, temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_band_radiance_frequency
    ! int32_t relicore_temperature_from_band_radiance_wavelength(double lower_m,
    !     double upper_m, double radiance, double *out);
    function c_temperature_from_band_radiance_wavelength(lower_m, upper_m, radiance, out) &
        bind(C, name='relicore_temperature_from_band_radiance_wavelength') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: lower_m, upper_m, radiance
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_temperature_from_band_radiance_wavelength
    ! int32_t relicore_brightness_temperature_wavelength(double wavelength_m,
    !     double spectral_radiance, double *out);
    function c_brightness_temperature_wavelength(wavelength_m, spectral_radiance, out) &
        bind(C, name='relicore_brightness_temperature_wavelength') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: wavelength_m, spectral_radiance
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_brightness_temperature_wavelength
    ! int32_t relicore_brightness_temperature_frequency(double frequency_hz,
    !     double spectral_radiance, double *out);
    function c_brightness_temperature_frequency(frequency_hz, spectral_radiance, out) &
        bind(C, name='relicore_brightness_temperature_frequency') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: frequency_hz, spectral_radiance
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_brightness_temperature_frequency
    ! int32_t relicore_rayleigh_jeans_temperature(double frequency_hz,
    !     double spectral_radiance, double *out);
    function c_rayleigh_jeans_temperature(frequency_hz, spectral_radiance, out) &
        bind(C, name='relicore_rayleigh_jeans_temperature') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: frequency_hz, spectral_radiance
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_rayleigh_jeans_temperature
    ! int32_t relicore_ratio_temperature(double wavelength_1_m, double wavelength_2_m,
    !     double radiance_ratio, double emissivity_ratio, double *out);
    function c_ratio_temperature(wavelength_1_m, wavelength_2_m, radiance_ratio, &
        emissivity_ratio, out) &
        bind(C, name='relicore_ratio_temperature') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: wavelength_1_m, wavelength_2_m, radiance_ratio, emissivity_ratio
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_ratio_temperature
    ! int32_t relicore_thermodynamic_to_rayleigh_jeans_factor(double frequency_hz,
    !     double cmb_temperature_k, double *out);
    function c_thermodynamic_to_rayleigh_jeans_factor(frequency_hz, cmb_temperature_k, out) &
        bind(C, name='relicore_thermodynamic_to_rayleigh_jeans_factor') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: frequency_hz, cmb_temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_thermodynamic_to_rayleigh_jeans_factor
    ! int32_t relicore_kcmb_to_mjy_per_sr(double frequency_hz, double cmb_temperature_k,
    !     double *out);
    function c_kcmb_to_mjy_per_sr(frequency_hz, cmb_temperature_k, out) &
        bind(C, name='relicore_kcmb_to_mjy_per_sr') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: frequency_hz, cmb_temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_kcmb_to_mjy_per_sr
    ! int32_t relicore_thermal_sz_spectral_shape(double frequency_hz,
    !     double cmb_temperature_k, double *out);
    function c_thermal_sz_spectral_shape(frequency_hz, cmb_temperature_k, out) &
        bind(C, name='relicore_thermal_sz_spectral_shape') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: frequency_hz, cmb_temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_thermal_sz_spectral_shape
    ! int32_t relicore_thermal_sz_temperature_shape(double frequency_hz,
    !     double cmb_temperature_k, double *out);
    function c_thermal_sz_temperature_shape(frequency_hz, cmb_temperature_k, out) &
        bind(C, name='relicore_thermal_sz_temperature_shape') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: frequency_hz, cmb_temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_thermal_sz_temperature_shape
    ! int32_t relicore_thermal_sz_null_frequency(double cmb_temperature_k, double *out);
    function c_thermal_sz_null_frequency(cmb_temperature_k, out) &
        bind(C, name='relicore_thermal_sz_null_frequency') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: cmb_temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_thermal_sz_null_frequency
    ! int32_t relicore_spectral_radiance_wavelength_array(const double *wavelengths_m,
    !     size_t n, double temperature_k, double *out);
    function c_spectral_radiance_wavelength_array(wavelengths_m, n, temperature_k, out) &
        bind(C, name='relicore_spectral_radiance_wavelength_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_spectral_radiance_wavelength_array
    ! int32_t relicore_spectral_radiance_frequency_array(const double *frequencies_hz,
    !     size_t n, double temperature_k, double *out);
    function c_spectral_radiance_frequency_array(frequencies_hz, n, temperature_k, out) &
        bind(C, name='relicore_spectral_radiance_frequency_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: frequencies_hz(*)
      integer(c_size_t), value :: n
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_spectral_radiance_frequency_array
    ! int32_t relicore_spectral_radiance_wavenumber_array(const double *wavenumbers_per_m,
    !     size_t n, double temperature_k, double *out);
    function c_spectral_radiance_wavenumber_array(wavenumbers_per_m, n, temperature_k, out) &
        bind(C, name='relicore_spectral_radiance_wavenumber_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: wavenumbers_per_m(*)
      integer(c_size_t), value :: n
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_spectral_radiance_wavenumber_array
    ! int32_t relicore_photon_radiance_wavelength_array(const double *wavelengths_m, size_t n,
    !     double temperature_k, double *out);
    function c_photon_radiance_wavelength_array(wavelengths_m, n, temperature_k, out) &
        bind(C, name='relicore_photon_radiance_wavelength_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_photon_radiance_wavelength_array
    ! int32_t relicore_photon_radiance_frequency_array(const double *frequencies_hz, size_t n,
    !     double temperature_k, double *out);
    function c_photon_radiance_frequency_array(frequencies_hz, n, temperature_k, out) &
        bind(C, name='relicore_photon_radiance_frequency_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: frequencies_hz(*)
      integer(c_size_t), value :: n
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_photon_radiance_frequency_array
    ! int32_t relicore_photon_radiance_wavenumber_array(const double *wavenumbers_per_m,
    !     size_t n, double temperature_k, double *out);
    function c_photon_radiance_wavenumber_array(wavenumbers_per_m, n, temperature_k, out) &
        bind(C, name='relicore_photon_radiance_wavenumber_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: wavenumbers_per_m(*)
      integer(c_size_t), value :: n
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_photon_radiance_wavenumber_array
    ! int32_t relicore_radiance_temperature_derivative_wavelength_array(
    !     const double *wavelengths_m, size_t n, double temperature_k, double *out);
    function c_radiance_temperature_derivative_wavelength_array(wavelengths_m, n, &
        temperature_k, out) &
        bind(C, name='relicore_radiance_temperature_derivative_wavelength_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_radiance_temperature_derivative_wavelength_array
    ! int32_t relicore_radiance_temperature_derivative_frequency_array(
    !     const double *frequencies_hz, size_t n, double temperature_k, double *out);
    function c_radiance_temperature_derivative_frequency_array(frequencies_hz, n, &
        temperature_k, out) &
        bind(C, name='relicore_radiance_temperature_derivative_frequency_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: frequencies_hz(*)
      integer(c_size_t), value :: n
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_radiance_temperature_derivative_frequency_array
    ! int32_t relicore_brightness_temperature_wavelength_array(double wavelength_m,
    !     const double *spectral_radiance, size_t n, double *out);
    function c_brightness_temperature_wavelength_array(wavelength_m, spectral_radiance, n, &
        out) &
        bind(C, name='relicore_brightness_temperature_wavelength_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), value :: wavelength_m
      real(c_double), intent(in) :: spectral_radiance(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_brightness_temperature_wavelength_array
    ! int32_t relicore_brightness_temperature_frequency_array(double frequency_hz,
    !     const double *spectral_radiance, size_t n, double *out);
    function c_brightness_temperature_frequency_array(frequency_hz, spectral_radiance, n, out) &
        bind(C, name='relicore_brightness_temperature_frequency_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), value :: frequency_hz
      real(c_double), intent(in) :: spectral_radiance(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_brightness_temperature_frequency_array
    ! int32_t relicore_spectral_radiance_wavelength_array_f32(const float *wavelengths_m,
    !     size_t n, float temperature_k, float *out);
    function c_spectral_radiance_wavelength_array_f32(wavelengths_m, n, temperature_k, out) &
        bind(C, name='relicore_spectral_radiance_wavelength_array_f32') result(status)
      import :: c_float, c_int32_t, c_size_t
      real(c_float), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n
      real(c_float), value :: temperature_k
      real(c_float), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_spectral_radiance_wavelength_array_f32
    ! int32_t relicore_spectral_radiance_frequency_array_f32(const float *frequencies_hz,
    !     size_t n, float temperature_k, float *out);
    function c_spectral_radiance_frequency_array_f32(frequencies_hz, n, temperature_k, out) &
        bind(C, name='relicore_spectral_radiance_frequency_array_f32') result(status)
      import :: c_float, c_int32_t, c_size_t
      real(c_float), intent(in) :: frequencies_hz(*)
      integer(c_size_t), value :: n
      real(c_float), value :: temperature_k
      real(c_float), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_spectral_radiance_frequency_array_f32
    ! int32_t relicore_spectral_radiance_wavenumber_array_f32(const float *wavenumbers_per_m,
    !     size_t n, float temperature_k, float *out);
    function c_spectral_radiance_wavenumber_array_f32(wavenumbers_per_m, n, temperature_k, &
        out) &
        bind(C, name='relicore_spectral_radiance_wavenumber_array_f32') result(status)
      import :: c_float, c_int32_t, c_size_t
      real(c_float), intent(in) :: wavenumbers_per_m(*)
      integer(c_size_t), value :: n
      real(c_float), value :: temperature_k
      real(c_float), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_spectral_radiance_wavenumber_array_f32
    ! int32_t relicore_spectral_radiance_wavelength_f32(float wavelength_m,
    !     float temperature_k, float *out);
    function c_spectral_radiance_wavelength_f32(wavelength_m, temperature_k, out) &
        bind(C, name='relicore_spectral_radiance_wavelength_f32') result(status)
      import :: c_float, c_int32_t
      real(c_float), value :: wavelength_m, temperature_k
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_spectral_radiance_wavelength_f32
    ! int32_t relicore_spectral_radiance_frequency_f32(float frequency_hz,
    !     float temperature_k, float *out);
    function c_spectral_radiance_frequency_f32(frequency_hz, temperature_k, out) &
        bind(C, name='relicore_spectral_radiance_frequency_f32') result(status)
      import :: c_float, c_int32_t
      real(c_float), value :: frequency_hz, temperature_k
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_spectral_radiance_frequency_f32
    ! int32_t relicore_spectral_radiance_wavenumber_f32(float wavenumber_per_m,
    !     float temperature_k, float *out);
    function c_spectral_radiance_wavenumber_f32(wavenumber_per_m, temperature_k, out) &
        bind(C, name='relicore_spectral_radiance_wavenumber_f32') result(status)
      import :: c_float, c_int32_t
      real(c_float), value :: wavenumber_per_m, temperature_k
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_spectral_radiance_wavenumber_f32
    ! int32_t relicore_brightness_temperature_wavelength_f32(float wavelength_m,
    !     float spectral_radiance, float *out);
    function c_brightness_temperature_wavelength_f32(wavelength_m, spectral_radiance, out) &
        bind(C, name='relicore_brightness_temperature_wavelength_f32') result(status)
      import :: c_float, c_int32_t
      real(c_float), value :: wavelength_m, spectral_radiance
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_brightness_temperature_wavelength_f32
    ! int32_t relicore_brightness_temperature_frequency_f32(float frequency_hz,
    !     float spectral_radiance, float *out);
    function c_brightness_temperature_frequency_f32(frequency_hz, spectral_radiance, out) &
        bind(C, name='relicore_brightness_temperature_frequency_f32') result(status)
      import :: c_float, c_int32_t
      real(c_float), value :: frequency_hz, spectral_radiance
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_brightness_temperature_frequency_f32
    ! int32_t relicore_band_radiance_wavelength_f32(float lower_m, float upper_m,
    !     float temperature_k, float *out);
    function c_band_radiance_wavelength_f32(lower_m, upper_m, temperature_k, out) &
        bind(C, name='relicore_band_radiance_wavelength_f32') result(status)
      import :: c_float, c_int32_t
      real(c_float), value :: lower_m, upper_m, temperature_k
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_band_radiance_wavelength_f32
    ! int32_t relicore_two_load_calibration(double frequency_hz, double reading_hot,
    !     double temperature_hot_k, double reading_cold, double temperature_cold_k,
    !     struct relicore_two_load_calibration *out);
    function c_two_load_calibration(frequency_hz, reading_hot, temperature_hot_k, &
        reading_cold, temperature_cold_k, out) &
        bind(C, name='relicore_two_load_calibration') result(status)
      import :: c_double, c_int32_t, relicore_two_load_calibration
      real(c_double), value :: frequency_hz, reading_hot, temperature_hot_k, reading_cold, &
          temperature_cold_k
      type(relicore_two_load_calibration), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_two_load_calibration
    ! int32_t relicore_calibrated_temperature(
    !     const struct relicore_two_load_calibration *calibration, double reading,
    !     double *out);
    function c_calibrated_temperature(calibration, reading, out) &
        bind(C, name='relicore_calibrated_temperature') result(status)
      import :: c_double, c_int32_t, relicore_two_load_calibration
      type(relicore_two_load_calibration), intent(in) :: calibration
      real(c_double), value :: reading
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_calibrated_temperature
    ! int32_t relicore_calibrated_brightness_temperature(
    !     const struct relicore_two_load_calibration *calibration, double reading,
    !     double *out);
    function c_calibrated_brightness_temperature(calibration, reading, out) &
        bind(C, name='relicore_calibrated_brightness_temperature') result(status)
      import :: c_double, c_int32_t, relicore_two_load_calibration
      type(relicore_two_load_calibration), intent(in) :: calibration
      real(c_double), value :: reading
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_calibrated_brightness_temperature
    ! int32_t relicore_two_load_calibration_f32(float frequency_hz, float reading_hot,
    !     float temperature_hot_k, float reading_cold, float temperature_cold_k,
    !     struct relicore_two_load_calibration_f32 *out);
    function c_two_load_calibration_f32(frequency_hz, reading_hot, temperature_hot_k, &
        reading_cold, temperature_cold_k, out) &
        bind(C, name='relicore_two_load_calibration_f32') result(status)
      import :: c_float, c_int32_t, relicore_two_load_calibration_f32
      real(c_float), value :: frequency_hz, reading_hot, temperature_hot_k, reading_cold, &
          temperature_cold_k
      type(relicore_two_load_calibration_f32), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_two_load_calibration_f32
    ! int32_t relicore_calibrated_temperature_f32(
    !     const struct relicore_two_load_calibration_f32 *calibration, float reading,
    !     float *out);
    function c_calibrated_temperature_f32(calibration, reading, out) &
        bind(C, name='relicore_calibrated_temperature_f32') result(status)
      import :: c_float, c_int32_t, relicore_two_load_calibration_f32
      type(relicore_two_load_calibration_f32), intent(in) :: calibration
      real(c_float), value :: reading
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_calibrated_temperature_f32
    ! int32_t relicore_calibrated_brightness_temperature_f32(
    !     const struct relicore_two_load_calibration_f32 *calibration, float reading,
    !     float *out);
    function c_calibrated_brightness_temperature_f32(calibration, reading, out) &
        bind(C, name='relicore_calibrated_brightness_temperature_f32') result(status)
      import :: c_float, c_int32_t, relicore_two_load_calibration_f32
      type(relicore_two_load_calibration_f32), intent(in) :: calibration
      real(c_float), value :: reading
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_calibrated_brightness_temperature_f32
    ! int32_t relicore_response_weighted_radiance(const double *wavelengths_m,
    !     size_t n_wavelengths, const double *response, size_t n_response,
    !     double temperature_k, double *out);
    function c_response_weighted_radiance(wavelengths_m, n_wavelengths, response, &
        n_response, temperature_k, out) &
        bind(C, name='relicore_response_weighted_radiance') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_double), intent(in) :: response(*)
      integer(c_size_t), value :: n_response
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_response_weighted_radiance
    ! int32_t relicore_temperature_from_response_weighted_radiance(
    !     const double *wavelengths_m, size_t n_wavelengths, const double *response,
    !     size_t n_response, double radiance, double *out);
    function c_temperature_from_response_weighted_radiance(wavelengths_m, n_wavelengths, &
        response, n_response, radiance, out) &
        bind(C, name='relicore_temperature_from_response_weighted_radiance') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_double), intent(in) :: response(*)
      integer(c_size_t), value :: n_response
      real(c_double), value :: radiance
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_temperature_from_response_weighted_radiance
    ! int32_t relicore_response_weighted_radiance_f32(const float *wavelengths_m,
    !     size_t n_wavelengths, const float *response, size_t n_response, float temperature_k,
    !     float *out);
    function c_response_weighted_radiance_f32(wavelengths_m, n_wavelengths, response, &
        n_response, temperature_k, out) &
        bind(C, name='relicore_response_weighted_radiance_f32') result(status)
      import :: c_float, c_int32_t, c_size_t
      real(c_float), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_float), intent(in) :: response(*)
      integer(c_size_t), value :: n_response
      real(c_float), value :: temperature_k
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_response_weighted_radiance_f32
    ! int32_t relicore_temperature_from_response_weighted_radiance_f32(
    !     const float *wavelengths_m, size_t n_wavelengths, const float *response,
    !     size_t n_response, float radiance, float *out);
    function c_temperature_from_response_weighted_radiance_f32(wavelengths_m, &
        n_wavelengths, response, n_response, radiance, out) &
        bind(C, name='relicore_temperature_from_response_weighted_radiance_f32') result(status)
      import :: c_float, c_int32_t, c_size_t
      real(c_float), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_float), intent(in) :: response(*)
      integer(c_size_t), value :: n_response
      real(c_float), value :: radiance
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_temperature_from_response_weighted_radiance_f32

    ! int32_t relicore_universe_parameters_default(double h0_km_s_mpc, double omega_matter,
    !     struct relicore_universe_parameters *out);
    function c_universe_parameters_default(h0_km_s_mpc, omega_matter, out) &
        bind(C, name='relicore_universe_parameters_default') result(status)
      import :: c_double, c_int32_t, relicore_universe_parameters
      real(c_double), value :: h0_km_s_mpc, omega_matter
      type(relicore_universe_parameters), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_universe_parameters_default
    ! int32_t relicore_universe_init(const struct relicore_universe_parameters *params,
    !     struct relicore_universe *out);
    function c_universe_init(params, out) bind(C, name='relicore_universe_init') result(status)
      import :: c_int32_t, relicore_universe_parameters, relicore_universe
      type(relicore_universe_parameters), intent(in) :: params
      type(relicore_universe), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_universe_init
    ! int32_t relicore_universe_check_parameters(const struct relicore_universe_parameters *params,
    !     int32_t *which_parameter);
    function c_universe_check_parameters(params, which_parameter) &
        bind(C, name='relicore_universe_check_parameters') result(status)
      import :: c_int32_t, relicore_universe_parameters
      type(relicore_universe_parameters), intent(in) :: params
      integer(c_int32_t), intent(out) :: which_parameter
      integer(c_int32_t) :: status
    end function c_universe_check_parameters
    ! int32_t relicore_universe_get_parameters(const struct relicore_universe *universe,
    !     struct relicore_universe_parameters *out);
    function c_universe_get_parameters(universe, out) &
        bind(C, name='relicore_universe_get_parameters') result(status)
      import :: c_int32_t, relicore_universe, relicore_universe_parameters
      type(relicore_universe), intent(in) :: universe
      type(relicore_universe_parameters), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_universe_get_parameters

    ! int32_t relicore_dimensionless_hubble(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_dimensionless_hubble(universe, z, out) &
        bind(C, name='relicore_dimensionless_hubble') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_dimensionless_hubble
    ! int32_t relicore_hubble_parameter_km_s_mpc(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_hubble_parameter_km_s_mpc(universe, z, out) &
        bind(C, name='relicore_hubble_parameter_km_s_mpc') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_hubble_parameter_km_s_mpc
    ! int32_t relicore_omega_matter_at(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_omega_matter_at(universe, z, out) &
        bind(C, name='relicore_omega_matter_at') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_omega_matter_at
    ! int32_t relicore_omega_radiation_at(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_omega_radiation_at(universe, z, out) &
        bind(C, name='relicore_omega_radiation_at') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_omega_radiation_at
    ! int32_t relicore_omega_dark_energy_at(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_omega_dark_energy_at(universe, z, out) &
        bind(C, name='relicore_omega_dark_energy_at') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_omega_dark_energy_at
    ! int32_t relicore_omega_curvature_at(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_omega_curvature_at(universe, z, out) &
        bind(C, name='relicore_omega_curvature_at') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_omega_curvature_at
    ! int32_t relicore_critical_density_kg_m3(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_critical_density_kg_m3(universe, z, out) &
        bind(C, name='relicore_critical_density_kg_m3') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_critical_density_kg_m3
    ! int32_t relicore_cmb_temperature_at_k(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_cmb_temperature_at_k(universe, z, out) &
        bind(C, name='relicore_cmb_temperature_at_k') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_cmb_temperature_at_k
    ! int32_t relicore_comoving_distance_mpc(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_comoving_distance_mpc(universe, z, out) &
        bind(C, name='relicore_comoving_distance_mpc') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_comoving_distance_mpc
    ! int32_t relicore_transverse_comoving_distance_mpc(const struct relicore_universe *universe,
    !     double z, double *out);
    function c_transverse_comoving_distance_mpc(universe, z, out) &
        bind(C, name='relicore_transverse_comoving_distance_mpc') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_transverse_comoving_distance_mpc
    ! int32_t relicore_angular_diameter_distance_mpc(const struct relicore_universe *universe,
    !     double z, double *out);
    function c_angular_diameter_distance_mpc(universe, z, out) &
        bind(C, name='relicore_angular_diameter_distance_mpc') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_angular_diameter_distance_mpc
    ! int32_t relicore_luminosity_distance_mpc(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_luminosity_distance_mpc(universe, z, out) &
        bind(C, name='relicore_luminosity_distance_mpc') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_luminosity_distance_mpc
    ! int32_t relicore_distance_modulus(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_distance_modulus(universe, z, out) &
        bind(C, name='relicore_distance_modulus') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_distance_modulus
    ! int32_t relicore_comoving_volume_gpc3(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_comoving_volume_gpc3(universe, z, out) &
        bind(C, name='relicore_comoving_volume_gpc3') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_comoving_volume_gpc3
    ! int32_t relicore_differential_comoving_volume_mpc3_sr(
    !     const struct relicore_universe *universe, double z, double *out);
    function c_differential_comoving_volume_mpc3_sr(universe, z, out) &
        bind(C, name='relicore_differential_comoving_volume_mpc3_sr') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_differential_comoving_volume_mpc3_sr
    ! int32_t relicore_transverse_scale_kpc_per_arcsec(const struct relicore_universe *universe,
    !     double z, double *out);
    function c_transverse_scale_kpc_per_arcsec(universe, z, out) &
        bind(C, name='relicore_transverse_scale_kpc_per_arcsec') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_transverse_scale_kpc_per_arcsec
    ! int32_t relicore_lookback_time_gyr(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_lookback_time_gyr(universe, z, out) &
        bind(C, name='relicore_lookback_time_gyr') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_lookback_time_gyr
    ! int32_t relicore_age_gyr(const struct relicore_universe *universe, double z, double *out);
    function c_age_gyr(universe, z, out) &
        bind(C, name='relicore_age_gyr') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_age_gyr
    ! int32_t relicore_conformal_time_mpc(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_conformal_time_mpc(universe, z, out) &
        bind(C, name='relicore_conformal_time_mpc') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_conformal_time_mpc
    ! int32_t relicore_angular_diameter_distance_between_mpc(
    !     const struct relicore_universe *universe, double z1, double z2, double *out);
    function c_angular_diameter_distance_between_mpc(universe, z1, z2, out) &
        bind(C, name='relicore_angular_diameter_distance_between_mpc') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z1
      real(c_double), value :: z2
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_angular_diameter_distance_between_mpc
    ! int32_t relicore_redshift_at_age_gyr(const struct relicore_universe *universe, double age_gyr,
    !     double *out);
    function c_redshift_at_age_gyr(universe, age_gyr, out) &
        bind(C, name='relicore_redshift_at_age_gyr') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: age_gyr
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_redshift_at_age_gyr
    ! int32_t relicore_redshift_at_lookback_time_gyr(const struct relicore_universe *universe,
    !     double lookback_gyr, double *out);
    function c_redshift_at_lookback_time_gyr(universe, lookback_gyr, out) &
        bind(C, name='relicore_redshift_at_lookback_time_gyr') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: lookback_gyr
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_redshift_at_lookback_time_gyr
    ! int32_t relicore_redshift_at_comoving_distance_mpc(const struct relicore_universe *universe,
    !     double distance_mpc, double *out);
    function c_redshift_at_comoving_distance_mpc(universe, distance_mpc, out) &
        bind(C, name='relicore_redshift_at_comoving_distance_mpc') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: distance_mpc
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_redshift_at_comoving_distance_mpc
    ! int32_t relicore_redshift_at_luminosity_distance_mpc(const struct relicore_universe *universe,
    !     double distance_mpc, double *out);
    function c_redshift_at_luminosity_distance_mpc(universe, distance_mpc, out) &
        bind(C, name='relicore_redshift_at_luminosity_distance_mpc') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: distance_mpc
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_redshift_at_luminosity_distance_mpc
    ! int32_t relicore_dimensionless_hubble_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_dimensionless_hubble_array(universe, redshifts, n, out) &
        bind(C, name='relicore_dimensionless_hubble_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_dimensionless_hubble_array
    ! int32_t relicore_hubble_parameter_km_s_mpc_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_hubble_parameter_km_s_mpc_array(universe, redshifts, n, out) &
        bind(C, name='relicore_hubble_parameter_km_s_mpc_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_hubble_parameter_km_s_mpc_array
    ! int32_t relicore_omega_matter_at_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_omega_matter_at_array(universe, redshifts, n, out) &
        bind(C, name='relicore_omega_matter_at_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_omega_matter_at_array
    ! int32_t relicore_omega_radiation_at_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_omega_radiation_at_array(universe, redshifts, n, out) &
        bind(C, name='relicore_omega_radiation_at_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_omega_radiation_at_array
    ! int32_t relicore_omega_dark_energy_at_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_omega_dark_energy_at_array(universe, redshifts, n, out) &
        bind(C, name='relicore_omega_dark_energy_at_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_omega_dark_energy_at_array
    ! int32_t relicore_omega_curvature_at_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_omega_curvature_at_array(universe, redshifts, n, out) &
        bind(C, name='relicore_omega_curvature_at_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_omega_curvature_at_array
    ! int32_t relicore_critical_density_kg_m3_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_critical_density_kg_m3_array(universe, redshifts, n, out) &
        bind(C, name='relicore_critical_density_kg_m3_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_critical_density_kg_m3_array
    ! int32_t relicore_cmb_temperature_at_k_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_cmb_temperature_at_k_array(universe, redshifts, n, out) &
        bind(C, name='relicore_cmb_temperature_at_k_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_cmb_temperature_at_k_array
    ! int32_t relicore_comoving_distance_mpc_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_comoving_distance_mpc_array(universe, redshifts, n, out) &
        bind(C, name='relicore_comoving_distance_mpc_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_comoving_distance_mpc_array
    ! int32_t relicore_transverse_comoving_distance_mpc_array(
    !     const struct relicore_universe *universe, const double *redshifts, size_t n, double *out);
    function c_transverse_comoving_distance_mpc_array(universe, redshifts, n, out) &
        bind(C, name='relicore_transverse_comoving_distance_mpc_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_transverse_comoving_distance_mpc_array
    ! int32_t relicore_angular_diameter_distance_mpc_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_angular_diameter_distance_mpc_array(universe, redshifts, n, out) &
        bind(C, name='relicore_angular_diameter_distance_mpc_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_angular_diameter_distance_mpc_array
    ! int32_t relicore_luminosity_distance_mpc_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_luminosity_distance_mpc_array(universe, redshifts, n, out) &
        bind(C, name='relicore_luminosity_distance_mpc_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_luminosity_distance_mpc_array
    ! int32_t relicore_distance_modulus_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_distance_modulus_array(universe, redshifts, n, out) &
        bind(C, name='relicore_distance_modulus_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_distance_modulus_array
    ! int32_t relicore_comoving_volume_gpc3_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_comoving_volume_gpc3_array(universe, redshifts, n, out) &
        bind(C, name='relicore_comoving_volume_gpc3_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_comoving_volume_gpc3_array
    ! int32_t relicore_differential_comoving_volume_mpc3_sr_array(
    !     const struct relicore_universe *universe, const double *redshifts, size_t n, double *out);
    function c_differential_comoving_volume_mpc3_sr_array(universe, redshifts, n, out) &
        bind(C, name='relicore_differential_comoving_volume_mpc3_sr_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_differential_comoving_volume_mpc3_sr_array
    ! int32_t relicore_transverse_scale_kpc_per_arcsec_array(
    !     const struct relicore_universe *universe, const double *redshifts, size_t n, double *out);
    function c_transverse_scale_kpc_per_arcsec_array(universe, redshifts, n, out) &
        bind(C, name='relicore_transverse_scale_kpc_per_arcsec_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_transverse_scale_kpc_per_arcsec_array
    ! int32_t relicore_lookback_time_gyr_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_lookback_time_gyr_array(universe, redshifts, n, out) &
        bind(C, name='relicore_lookback_time_gyr_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_lookback_time_gyr_array
    ! int32_t relicore_age_gyr_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_age_gyr_array(universe, redshifts, n, out) &
        bind(C, name='relicore_age_gyr_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_age_gyr_array
    ! int32_t relicore_conformal_time_mpc_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_conformal_time_mpc_array(universe, redshifts, n, out) &
        bind(C, name='relicore_conformal_time_mpc_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_conformal_time_mpc_array
    ! int32_t relicore_redshift_at_age_gyr_array(const struct relicore_universe *universe,
    !     const double *ages_gyr, size_t n, double *out);
    function c_redshift_at_age_gyr_array(universe, ages_gyr, n, out) &
        bind(C, name='relicore_redshift_at_age_gyr_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: ages_gyr(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_redshift_at_age_gyr_array
    ! int32_t relicore_redshift_at_lookback_time_gyr_array(const struct relicore_universe *universe,
    !     const double *lookback_times_gyr, size_t n, double *out);
    function c_redshift_at_lookback_time_gyr_array(universe, lookback_times_gyr, n, out) &
        bind(C, name='relicore_redshift_at_lookback_time_gyr_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: lookback_times_gyr(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_redshift_at_lookback_time_gyr_array
    ! int32_t relicore_redshift_at_comoving_distance_mpc_array(
    !     const struct relicore_universe *universe, const double *distances_mpc, size_t n,
    !     double *out);
    function c_redshift_at_comoving_distance_mpc_array(universe, distances_mpc, n, out) &
        bind(C, name='relicore_redshift_at_comoving_distance_mpc_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: distances_mpc(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_redshift_at_comoving_distance_mpc_array
    ! int32_t relicore_redshift_at_luminosity_distance_mpc_array(
    !     const struct relicore_universe *universe, const double *distances_mpc, size_t n,
    !     double *out);
    function c_redshift_at_luminosity_distance_mpc_array(universe, distances_mpc, n, out) &
        bind(C, name='relicore_redshift_at_luminosity_distance_mpc_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: distances_mpc(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_redshift_at_luminosity_distance_mpc_array
    ! int32_t relicore_hubble_distance_mpc(const struct relicore_universe *universe, double *out);
    function c_hubble_distance_mpc(universe, out) &
        bind(C, name='relicore_hubble_distance_mpc') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_hubble_distance_mpc
    ! int32_t relicore_hubble_time_gyr(const struct relicore_universe *universe, double *out);
    function c_hubble_time_gyr(universe, out) &
        bind(C, name='relicore_hubble_time_gyr') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_hubble_time_gyr
    ! int32_t relicore_omega_radiation(const struct relicore_universe *universe, double *out);
    function c_omega_radiation(universe, out) &
        bind(C, name='relicore_omega_radiation') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_omega_radiation
    ! int32_t relicore_omega_dark_energy(const struct relicore_universe *universe, double *out);
    function c_omega_dark_energy(universe, out) &
        bind(C, name='relicore_omega_dark_energy') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_omega_dark_energy
    ! int32_t relicore_matter_radiation_equality_redshift(const struct relicore_universe *universe,
    !     double *out);
    function c_matter_radiation_equality_redshift(universe, out) &
        bind(C, name='relicore_matter_radiation_equality_redshift') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_matter_radiation_equality_redshift
    ! int32_t relicore_saha_ionized_fraction(const struct relicore_universe *universe, double z,
    !     double *out);
    function c_saha_ionized_fraction(universe, z, out) &
        bind(C, name='relicore_saha_ionized_fraction') result(status)
      import :: c_double, c_int32_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_saha_ionized_fraction
    ! int32_t relicore_saha_ionized_fraction_array(const struct relicore_universe *universe,
    !     const double *redshifts, size_t n, double *out);
    function c_saha_ionized_fraction_array(universe, redshifts, n, out) &
        bind(C, name='relicore_saha_ionized_fraction_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_universe
      type(relicore_universe), intent(in) :: universe
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_saha_ionized_fraction_array
    ! int32_t relicore_last_scattering_redshift_fit(double omega_baryon_h2, double omega_matter_h2,
    !     double *out);
    function c_last_scattering_redshift_fit(omega_baryon_h2, omega_matter_h2, out) &
        bind(C, name='relicore_last_scattering_redshift_fit') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: omega_baryon_h2, omega_matter_h2
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_last_scattering_redshift_fit
    ! int32_t relicore_last_scattering_redshift_fit_array(const double *omega_baryon_h2, size_t n,
    !     double omega_matter_h2, double *out);
    function c_last_scattering_redshift_fit_array(omega_baryon_h2, n, omega_matter_h2, out) &
        bind(C, name='relicore_last_scattering_redshift_fit_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: omega_baryon_h2(*)
      integer(c_size_t), value :: n
      real(c_double), value :: omega_matter_h2
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_last_scattering_redshift_fit_array
    ! int32_t relicore_drag_redshift_fit(double omega_baryon_h2, double omega_matter_h2,
    !     double *out);
    function c_drag_redshift_fit(omega_baryon_h2, omega_matter_h2, out) &
        bind(C, name='relicore_drag_redshift_fit') result(status)
      import :: c_double, c_int32_t
      real(c_double), value :: omega_baryon_h2, omega_matter_h2
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_drag_redshift_fit
    ! int32_t relicore_drag_redshift_fit_array(const double *omega_baryon_h2, size_t n,
    !     double omega_matter_h2, double *out);
    function c_drag_redshift_fit_array(omega_baryon_h2, n, omega_matter_h2, out) &
        bind(C, name='relicore_drag_redshift_fit_array') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: omega_baryon_h2(*)
      integer(c_size_t), value :: n
      real(c_double), value :: omega_matter_h2
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_drag_redshift_fit_array
    ! int32_t relicore_thermal_history_options_default(
    !     struct relicore_thermal_history_options *out);
    function c_thermal_history_options_default(out) &
        bind(C, name='relicore_thermal_history_options_default') result(status)
      import :: c_int32_t, relicore_thermal_history_options
      type(relicore_thermal_history_options), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_thermal_history_options_default
    ! int32_t relicore_thermal_history_compute(const struct relicore_universe *universe,
    !     const struct relicore_thermal_history_options *options,
    !     struct relicore_thermal_history *out);
    function c_thermal_history_compute(universe, options, out) &
        bind(C, name='relicore_thermal_history_compute') result(status)
      import :: c_int32_t, relicore_universe, relicore_thermal_history_options, &
          relicore_thermal_history
      type(relicore_universe), intent(in) :: universe
      type(relicore_thermal_history_options), intent(in) :: options
      type(relicore_thermal_history), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_thermal_history_compute
    ! int32_t relicore_ionized_fraction(const struct relicore_thermal_history *history, double z,
    !     double *out);
    function c_ionized_fraction(history, z, out) &
        bind(C, name='relicore_ionized_fraction') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_ionized_fraction
    ! int32_t relicore_ionized_fraction_array(const struct relicore_thermal_history *history,
    !     const double *redshifts, size_t n, double *out);
    function c_ionized_fraction_array(history, redshifts, n, out) &
        bind(C, name='relicore_ionized_fraction_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_ionized_fraction_array
    ! int32_t relicore_matter_temperature_k(const struct relicore_thermal_history *history,
    !     double z,
    !     double *out);
    function c_matter_temperature_k(history, z, out) &
        bind(C, name='relicore_matter_temperature_k') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_matter_temperature_k
    ! int32_t relicore_matter_temperature_k_array(const struct relicore_thermal_history *history,
    !     const double *redshifts, size_t n, double *out);
    function c_matter_temperature_k_array(history, redshifts, n, out) &
        bind(C, name='relicore_matter_temperature_k_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_matter_temperature_k_array
    ! int32_t relicore_optical_depth(const struct relicore_thermal_history *history, double z,
    !     double *out);
    function c_optical_depth(history, z, out) &
        bind(C, name='relicore_optical_depth') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_optical_depth
    ! int32_t relicore_optical_depth_array(const struct relicore_thermal_history *history,
    !     const double *redshifts, size_t n, double *out);
    function c_optical_depth_array(history, redshifts, n, out) &
        bind(C, name='relicore_optical_depth_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_optical_depth_array
    ! int32_t relicore_visibility(const struct relicore_thermal_history *history, double z,
    !     double *out);
    function c_visibility(history, z, out) &
        bind(C, name='relicore_visibility') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_visibility
    ! int32_t relicore_visibility_array(const struct relicore_thermal_history *history,
    !     const double *redshifts, size_t n, double *out);
    function c_visibility_array(history, redshifts, n, out) &
        bind(C, name='relicore_visibility_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_visibility_array
    ! int32_t relicore_sound_horizon_mpc(const struct relicore_thermal_history *history, double z,
    !     double *out);
    function c_sound_horizon_mpc(history, z, out) &
        bind(C, name='relicore_sound_horizon_mpc') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), value :: z
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_sound_horizon_mpc
    ! int32_t relicore_sound_horizon_mpc_array(const struct relicore_thermal_history *history,
    !     const double *redshifts, size_t n, double *out);
    function c_sound_horizon_mpc_array(history, redshifts, n, out) &
        bind(C, name='relicore_sound_horizon_mpc_array') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(in) :: redshifts(*)
      integer(c_size_t), value :: n
      real(c_double), intent(out) :: out(*)
      integer(c_int32_t) :: status
    end function c_sound_horizon_mpc_array
    ! int32_t relicore_last_scattering_redshift(const struct relicore_thermal_history *history,
    !     double *out);
    function c_last_scattering_redshift(history, out) &
        bind(C, name='relicore_last_scattering_redshift') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_last_scattering_redshift
    ! int32_t relicore_drag_redshift(const struct relicore_thermal_history *history,
    !     double *out);
    function c_drag_redshift(history, out) &
        bind(C, name='relicore_drag_redshift') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_drag_redshift
    ! int32_t relicore_sound_horizon_last_scattering_mpc(const struct relicore_thermal_history
    !     *history,
    !     double *out);
    function c_sound_horizon_last_scattering_mpc(history, out) &
        bind(C, name='relicore_sound_horizon_last_scattering_mpc') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_sound_horizon_last_scattering_mpc
    ! int32_t relicore_sound_horizon_drag_mpc(const struct relicore_thermal_history *history,
    !     double *out);
    function c_sound_horizon_drag_mpc(history, out) &
        bind(C, name='relicore_sound_horizon_drag_mpc') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_sound_horizon_drag_mpc
    ! int32_t relicore_angular_scale_last_scattering(const struct relicore_thermal_history *history,
    !     double *out);
    function c_angular_scale_last_scattering(history, out) &
        bind(C, name='relicore_angular_scale_last_scattering') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_angular_scale_last_scattering
    ! int32_t relicore_age_at_last_scattering_yr(const struct relicore_thermal_history *history,
    !     double *out);
    function c_age_at_last_scattering_yr(history, out) &
        bind(C, name='relicore_age_at_last_scattering_yr') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_age_at_last_scattering_yr
    ! int32_t relicore_temperature_at_last_scattering_k(const struct relicore_thermal_history
    !     *history,
    !     double *out);
    function c_temperature_at_last_scattering_k(history, out) &
        bind(C, name='relicore_temperature_at_last_scattering_k') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_temperature_at_last_scattering_k
    ! int32_t relicore_visibility_peak_redshift(const struct relicore_thermal_history *history,
    !     double *out);
    function c_visibility_peak_redshift(history, out) &
        bind(C, name='relicore_visibility_peak_redshift') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_visibility_peak_redshift
    ! int32_t relicore_thermal_decoupling_redshift(const struct relicore_thermal_history *history,
    !     double *out);
    function c_thermal_decoupling_redshift(history, out) &
        bind(C, name='relicore_thermal_decoupling_redshift') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_thermal_decoupling_redshift
    ! int32_t relicore_reionization_optical_depth(const struct relicore_thermal_history *history,
    !     double *out);
    function c_reionization_optical_depth(history, out) &
        bind(C, name='relicore_reionization_optical_depth') result(status)
      import :: c_double, c_int32_t, relicore_thermal_history
      type(relicore_thermal_history), intent(in) :: history
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_reionization_optical_depth
  end interface

contains

  ! ================================================================ status, version, helpers

  ! The English message of a status code (static text of the C library); "unknown status" for
  ! a number that is not a relicore status code.
  function relicore_status_message(status) result(message)
    integer(c_int32_t), intent(in) :: status
    character(len=:), allocatable :: message
    message = c_string(c_status_message(status))
  end function relicore_status_message

  ! The version of the C library, "major.minor.patch".
  function relicore_version() result(version)
    character(len=:), allocatable :: version
    version = c_string(c_version())
  end function relicore_version

  ! A Fortran copy of a NUL-terminated C string ('' for a NULL pointer).
  function c_string(pointer) result(string)
    type(c_ptr), intent(in) :: pointer
    character(len=:), allocatable :: string
    character(kind=c_char), pointer :: chars(:)
    integer :: i, length
    if (.not. c_associated(pointer)) then
      string = ''
      return
    end if
    call c_f_pointer(pointer, chars, [max_c_string])
    length = max_c_string
    do i = 1, max_c_string
      if (chars(i) == c_null_char) then
        length = i - 1
        exit
      end if
    end do
    allocate (character(len=length) :: string)
    do i = 1, length
      string(i:i) = chars(i)
    end do
  end function c_string

  ! Hands a status code to the caller's stat, or stops on failure when stat is absent.
  subroutine report(code, routine, stat)
    integer(c_int32_t), intent(in) :: code
    character(len=*), intent(in) :: routine
    integer(c_int32_t), intent(out), optional :: stat
    character(len=12) :: number
    if (present(stat)) then
      stat = code
    else if (code /= RELICORE_OK) then
      write (number, '(i0)') code
      error stop routine // ': ' // relicore_status_message(code) // ' (status ' // &
          trim(number) // ')'
    end if
  end subroutine report

  ! A quiet NaN of each kind, the value of every output on failure.
  elemental function nan64() result(x)
    real(c_double) :: x
    x = ieee_value(0.0_c_double, ieee_quiet_nan)
  end function nan64

  elemental function nan32() result(x)
    real(c_float) :: x
    x = ieee_value(0.0_c_float, ieee_quiet_nan)
  end function nan32

  ! ================================================================ scalar functions (double)

  ! Planck spectral radiance per unit wavelength.
  !   wavelength_m: wavelength in m, > 0
  !   temperature_k: temperature in K, > 0
  ! Result: B_lambda in W m-2 sr-1 m-1; NaN on failure.
  impure elemental function relicore_spectral_radiance_wavelength(wavelength_m, &
      temperature_k) result(res)
    real(c_double), intent(in) :: wavelength_m, temperature_k
    real(c_double) :: res
    if (c_spectral_radiance_wavelength(wavelength_m, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_spectral_radiance_wavelength

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_spectral_radiance_wavelength_s(wavelength_m, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: wavelength_m, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_spectral_radiance_wavelength(wavelength_m, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_spectral_radiance_wavelength', stat)
  end subroutine relicore_spectral_radiance_wavelength_s

  ! Planck spectral radiance per unit frequency.
  !   frequency_hz: frequency in Hz, > 0
  !   temperature_k: temperature in K, > 0
  ! Result: B_nu in W m-2 sr-1 Hz-1; NaN on failure.
  impure elemental function relicore_spectral_radiance_frequency(frequency_hz, &
      temperature_k) result(res)
    real(c_double), intent(in) :: frequency_hz, temperature_k
    real(c_double) :: res
    if (c_spectral_radiance_frequency(frequency_hz, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_spectral_radiance_frequency

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_spectral_radiance_frequency_s(frequency_hz, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: frequency_hz, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_spectral_radiance_frequency(frequency_hz, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_spectral_radiance_frequency', stat)
  end subroutine relicore_spectral_radiance_frequency_s

  ! Planck spectral radiance per unit wavenumber (m-1).
  !   wavenumber_per_m: wavenumber in m-1, > 0
  !   temperature_k: temperature in K, > 0
  ! Result: B_wavenumber in W m-2 sr-1 m; NaN on failure.
  impure elemental function relicore_spectral_radiance_wavenumber(wavenumber_per_m, &
      temperature_k) result(res)
    real(c_double), intent(in) :: wavenumber_per_m, temperature_k
    real(c_double) :: res
    if (c_spectral_radiance_wavenumber(wavenumber_per_m, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_spectral_radiance_wavenumber

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_spectral_radiance_wavenumber_s(wavenumber_per_m, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: wavenumber_per_m, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_spectral_radiance_wavenumber(wavenumber_per_m, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_spectral_radiance_wavenumber', stat)
  end subroutine relicore_spectral_radiance_wavenumber_s

  ! Planck photon spectral radiance per unit wavelength.
  !   wavelength_m: wavelength in m, > 0
  !   temperature_k: temperature in K, > 0
  ! Result: N_lambda in photons s-1 m-2 sr-1 m-1; NaN on failure.
  impure elemental function relicore_photon_radiance_wavelength(wavelength_m, &
      temperature_k) result(res)
    real(c_double), intent(in) :: wavelength_m, temperature_k
    real(c_double) :: res
    if (c_photon_radiance_wavelength(wavelength_m, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_photon_radiance_wavelength

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_photon_radiance_wavelength_s(wavelength_m, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: wavelength_m, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_photon_radiance_wavelength(wavelength_m, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_photon_radiance_wavelength', stat)
  end subroutine relicore_photon_radiance_wavelength_s

  ! Planck photon spectral radiance per unit frequency.
  !   frequency_hz: frequency in Hz, > 0
  !   temperature_k: temperature in K, > 0
  ! Result: N_nu in photons s-1 m-2 sr-1 Hz-1; NaN on failure.
  impure elemental function relicore_photon_radiance_frequency(frequency_hz, &
      temperature_k) result(res)
    real(c_double), intent(in) :: frequency_hz, temperature_k
    real(c_double) :: res
    if (c_photon_radiance_frequency(frequency_hz, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_photon_radiance_frequency

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_photon_radiance_frequency_s(frequency_hz, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: frequency_hz, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_photon_radiance_frequency(frequency_hz, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_photon_radiance_frequency', stat)
  end subroutine relicore_photon_radiance_frequency_s

  ! Planck photon spectral radiance per unit wavenumber.
  !   wavenumber_per_m: wavenumber in m-1, > 0
  !   temperature_k: temperature in K, > 0
  ! Result: photons s-1 m-2 sr-1 m; NaN on failure.
  impure elemental function relicore_photon_radiance_wavenumber(wavenumber_per_m, &
      temperature_k) result(res)
    real(c_double), intent(in) :: wavenumber_per_m, temperature_k
    real(c_double) :: res
    if (c_photon_radiance_wavenumber(wavenumber_per_m, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_photon_radiance_wavenumber

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_photon_radiance_wavenumber_s(wavenumber_per_m, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: wavenumber_per_m, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_photon_radiance_wavenumber(wavenumber_per_m, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_photon_radiance_wavenumber', stat)
  end subroutine relicore_photon_radiance_wavenumber_s

  ! Temperature derivative of the spectral radiance per unit wavelength.
  !   wavelength_m: wavelength in m, > 0
  !   temperature_k: temperature in K, > 0
  ! Result: dB_lambda/dT in W m-2 sr-1 m-1 K-1; NaN on failure.
  impure elemental function relicore_radiance_temperature_derivative_wavelength(wavelength_m, &
      temperature_k) result(res)
    real(c_double), intent(in) :: wavelength_m, temperature_k
    real(c_double) :: res
    if (c_radiance_temperature_derivative_wavelength(wavelength_m, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_radiance_temperature_derivative_wavelength

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_radiance_temperature_derivative_wavelength_s( &
      wavelength_m, temperature_k, out, stat)
    real(c_double), intent(in) :: wavelength_m, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_radiance_temperature_derivative_wavelength(wavelength_m, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_radiance_temperature_derivative_wavelength', stat)
  end subroutine relicore_radiance_temperature_derivative_wavelength_s

  ! Temperature derivative of the spectral radiance per unit frequency.
  !   frequency_hz: frequency in Hz, > 0
  !   temperature_k: temperature in K, > 0
  ! Result: dB_nu/dT in W m-2 sr-1 Hz-1 K-1; NaN on failure.
  impure elemental function relicore_radiance_temperature_derivative_frequency(frequency_hz, &
      temperature_k) result(res)
    real(c_double), intent(in) :: frequency_hz, temperature_k
    real(c_double) :: res
    if (c_radiance_temperature_derivative_frequency(frequency_hz, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_radiance_temperature_derivative_frequency

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_radiance_temperature_derivative_frequency_s( &
      frequency_hz, temperature_k, out, stat)
    real(c_double), intent(in) :: frequency_hz, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_radiance_temperature_derivative_frequency(frequency_hz, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_radiance_temperature_derivative_frequency', stat)
  end subroutine relicore_radiance_temperature_derivative_frequency_s

  ! Radiant exitance of a blackbody (Stefan-Boltzmann law).
  !   temperature_k: temperature in K, > 0
  ! Result: W m-2; NaN on failure.
  impure elemental function relicore_radiant_exitance(temperature_k) result(res)
    real(c_double), intent(in) :: temperature_k
    real(c_double) :: res
    if (c_radiant_exitance(temperature_k, res) /= RELICORE_OK) res = nan64()
  end function relicore_radiant_exitance

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_radiant_exitance_s(temperature_k, out, stat)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_radiant_exitance(temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_radiant_exitance', stat)
  end subroutine relicore_radiant_exitance_s

  ! Photon exitance of a blackbody.
  !   temperature_k: temperature in K, > 0
  ! Result: photons s-1 m-2; NaN on failure.
  impure elemental function relicore_photon_exitance(temperature_k) result(res)
    real(c_double), intent(in) :: temperature_k
    real(c_double) :: res
    if (c_photon_exitance(temperature_k, res) /= RELICORE_OK) res = nan64()
  end function relicore_photon_exitance

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_photon_exitance_s(temperature_k, out, stat)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_photon_exitance(temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_photon_exitance', stat)
  end subroutine relicore_photon_exitance_s

  ! Wavelength of the peak of B_lambda (Wien displacement law).
  !   temperature_k: temperature in K, > 0
  ! Result: m; NaN on failure.
  impure elemental function relicore_peak_wavelength(temperature_k) result(res)
    real(c_double), intent(in) :: temperature_k
    real(c_double) :: res
    if (c_peak_wavelength(temperature_k, res) /= RELICORE_OK) res = nan64()
  end function relicore_peak_wavelength

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_peak_wavelength_s(temperature_k, out, stat)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_peak_wavelength(temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_peak_wavelength', stat)
  end subroutine relicore_peak_wavelength_s

  ! Frequency of the peak of B_nu.
  !   temperature_k: temperature in K, > 0
  ! Result: Hz; NaN on failure.
  impure elemental function relicore_peak_frequency(temperature_k) result(res)
    real(c_double), intent(in) :: temperature_k
    real(c_double) :: res
    if (c_peak_frequency(temperature_k, res) /= RELICORE_OK) res = nan64()
  end function relicore_peak_frequency

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_peak_frequency_s(temperature_k, out, stat)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_peak_frequency(temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_peak_frequency', stat)
  end subroutine relicore_peak_frequency_s

  ! Wavenumber of the peak of the per-wavenumber radiance.
  !   temperature_k: temperature in K, > 0
  ! Result: m-1; NaN on failure.
  impure elemental function relicore_peak_wavenumber(temperature_k) result(res)
    real(c_double), intent(in) :: temperature_k
    real(c_double) :: res
    if (c_peak_wavenumber(temperature_k, res) /= RELICORE_OK) res = nan64()
  end function relicore_peak_wavenumber

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_peak_wavenumber_s(temperature_k, out, stat)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_peak_wavenumber(temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_peak_wavenumber', stat)
  end subroutine relicore_peak_wavenumber_s

  ! Wavelength of the peak of N_lambda (also the peak of lambda B_lambda).
  !   temperature_k: temperature in K, > 0
  ! Result: m; NaN on failure.
  impure elemental function relicore_photon_peak_wavelength(temperature_k) result(res)
    real(c_double), intent(in) :: temperature_k
    real(c_double) :: res
    if (c_photon_peak_wavelength(temperature_k, res) /= RELICORE_OK) res = nan64()
  end function relicore_photon_peak_wavelength

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_photon_peak_wavelength_s(temperature_k, out, stat)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_photon_peak_wavelength(temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_photon_peak_wavelength', stat)
  end subroutine relicore_photon_peak_wavelength_s

  ! Frequency of the peak of N_nu.
  !   temperature_k: temperature in K, > 0
  ! Result: Hz; NaN on failure.
  impure elemental function relicore_photon_peak_frequency(temperature_k) result(res)
    real(c_double), intent(in) :: temperature_k
    real(c_double) :: res
    if (c_photon_peak_frequency(temperature_k, res) /= RELICORE_OK) res = nan64()
  end function relicore_photon_peak_frequency

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_photon_peak_frequency_s(temperature_k, out, stat)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_photon_peak_frequency(temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_photon_peak_frequency', stat)
  end subroutine relicore_photon_peak_frequency_s

  ! Temperature whose B_lambda peaks at the given wavelength.
  !   wavelength_m: wavelength of the B_lambda peak in m, > 0
  ! Result: K; NaN on failure.
  impure elemental function relicore_temperature_from_peak_wavelength(wavelength_m) result(res)
    real(c_double), intent(in) :: wavelength_m
    real(c_double) :: res
    if (c_temperature_from_peak_wavelength(wavelength_m, res) /= RELICORE_OK) res = nan64()
  end function relicore_temperature_from_peak_wavelength

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_temperature_from_peak_wavelength_s(wavelength_m, out, &
      stat)
    real(c_double), intent(in) :: wavelength_m
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_temperature_from_peak_wavelength(wavelength_m, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_temperature_from_peak_wavelength', stat)
  end subroutine relicore_temperature_from_peak_wavelength_s

  ! Temperature whose B_nu peaks at the given frequency.
  !   frequency_hz: frequency of the B_nu peak in Hz, > 0
  ! Result: K; NaN on failure.
  impure elemental function relicore_temperature_from_peak_frequency(frequency_hz) result(res)
    real(c_double), intent(in) :: frequency_hz
    real(c_double) :: res
    if (c_temperature_from_peak_frequency(frequency_hz, res) /= RELICORE_OK) res = nan64()
  end function relicore_temperature_from_peak_frequency

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_temperature_from_peak_frequency_s(frequency_hz, out, &
      stat)
    real(c_double), intent(in) :: frequency_hz
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_temperature_from_peak_frequency(frequency_hz, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_temperature_from_peak_frequency', stat)
  end subroutine relicore_temperature_from_peak_frequency_s

  ! Fraction of the total radiance emitted between two wavelengths.
  !   lower_m: lower band edge in m, >= 0
  !   upper_m: upper band edge in m, > lower_m, may be +Inf
  !   temperature_k: temperature in K, > 0
  ! Result: fraction in [0, 1]; NaN on failure.
  impure elemental function relicore_band_fraction_wavelength(lower_m, upper_m, &
      temperature_k) result(res)
    real(c_double), intent(in) :: lower_m, upper_m, temperature_k
    real(c_double) :: res
    if (c_band_fraction_wavelength(lower_m, upper_m, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_band_fraction_wavelength

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_band_fraction_wavelength_s(lower_m, upper_m, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: lower_m, upper_m, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_band_fraction_wavelength(lower_m, upper_m, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_band_fraction_wavelength', stat)
  end subroutine relicore_band_fraction_wavelength_s

  ! Radiance emitted between two wavelengths.
  !   lower_m: lower band edge in m, >= 0
  !   upper_m: upper band edge in m, > lower_m, may be +Inf
  !   temperature_k: temperature in K, > 0
  ! Result: W m-2 sr-1; NaN on failure.
  impure elemental function relicore_band_radiance_wavelength(lower_m, upper_m, &
      temperature_k) result(res)
    real(c_double), intent(in) :: lower_m, upper_m, temperature_k
    real(c_double) :: res
    if (c_band_radiance_wavelength(lower_m, upper_m, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_band_radiance_wavelength

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_band_radiance_wavelength_s(lower_m, upper_m, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: lower_m, upper_m, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_band_radiance_wavelength(lower_m, upper_m, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_band_radiance_wavelength', stat)
  end subroutine relicore_band_radiance_wavelength_s

  ! Photon radiance emitted between two wavelengths.
  !   lower_m: lower band edge in m, >= 0
  !   upper_m: upper band edge in m, > lower_m, may be +Inf
  !   temperature_k: temperature in K, > 0
  ! Result: photons s-1 m-2 sr-1; NaN on failure.
  impure elemental function relicore_band_photon_radiance_wavelength(lower_m, upper_m, &
      temperature_k) result(res)
    real(c_double), intent(in) :: lower_m, upper_m, temperature_k
    real(c_double) :: res
    if (c_band_photon_radiance_wavelength(lower_m, upper_m, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_band_photon_radiance_wavelength

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_band_photon_radiance_wavelength_s(lower_m, upper_m, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: lower_m, upper_m, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_band_photon_radiance_wavelength(lower_m, upper_m, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_band_photon_radiance_wavelength', stat)
  end subroutine relicore_band_photon_radiance_wavelength_s

  ! Radiance emitted between two frequencies.
  !   lower_hz: lower band edge in Hz, >= 0
  !   upper_hz: upper band edge in Hz, > lower_hz, may be +Inf
  !   temperature_k: temperature in K, > 0
  ! Result: W m-2 sr-1; NaN on failure.
  impure elemental function relicore_band_radiance_frequency(lower_hz, upper_hz, &
      temperature_k) result(res)
    real(c_double), intent(in) :: lower_hz, upper_hz, temperature_k
    real(c_double) :: res
    if (c_band_radiance_frequency(lower_hz, upper_hz, temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_band_radiance_frequency

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_band_radiance_frequency_s(lower_hz, upper_hz, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: lower_hz, upper_hz, temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_band_radiance_frequency(lower_hz, upper_hz, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_band_radiance_frequency', stat)
  end subroutine relicore_band_radiance_frequency_s

  ! Temperature whose band radiance between two wavelengths is the given one.
  !   lower_m: lower band edge in m, >= 0
  !   upper_m: upper band edge in m, > lower_m, may be +Inf
  !   radiance: band radiance in W m-2 sr-1, > 0
  ! Result: K; NaN on failure.
  impure elemental function relicore_temperature_from_band_radiance_wavelength(lower_m, &
      upper_m, radiance) result(res)
    real(c_double), intent(in) :: lower_m, upper_m, radiance
    real(c_double) :: res
    if (c_temperature_from_band_radiance_wavelength(lower_m, upper_m, radiance, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_temperature_from_band_radiance_wavelength

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_temperature_from_band_radiance_wavelength_s(lower_m, &
      upper_m, radiance, out, stat)
    real(c_double), intent(in) :: lower_m, upper_m, radiance
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_temperature_from_band_radiance_wavelength(lower_m, upper_m, radiance, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_temperature_from_band_radiance_wavelength', stat)
  end subroutine relicore_temperature_from_band_radiance_wavelength_s

  ! Brightness temperature from a spectral radiance per unit wavelength.
  !   wavelength_m: wavelength in m, > 0
  !   spectral_radiance: B_lambda in W m-2 sr-1 m-1, > 0
  ! Result: K; NaN on failure.
  impure elemental function relicore_brightness_temperature_wavelength(wavelength_m, &
      spectral_radiance) result(res)
    real(c_double), intent(in) :: wavelength_m, spectral_radiance
    real(c_double) :: res
    if (c_brightness_temperature_wavelength(wavelength_m, spectral_radiance, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_brightness_temperature_wavelength

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_brightness_temperature_wavelength_s(wavelength_m, &
      spectral_radiance, out, stat)
    real(c_double), intent(in) :: wavelength_m, spectral_radiance
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_brightness_temperature_wavelength(wavelength_m, spectral_radiance, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_brightness_temperature_wavelength', stat)
  end subroutine relicore_brightness_temperature_wavelength_s

  ! Brightness temperature from a spectral radiance per unit frequency.
  !   frequency_hz: frequency in Hz, > 0
  !   spectral_radiance: B_nu in W m-2 sr-1 Hz-1, > 0
  ! Result: K; NaN on failure.
  impure elemental function relicore_brightness_temperature_frequency(frequency_hz, &
      spectral_radiance) result(res)
    real(c_double), intent(in) :: frequency_hz, spectral_radiance
    real(c_double) :: res
    if (c_brightness_temperature_frequency(frequency_hz, spectral_radiance, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_brightness_temperature_frequency

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_brightness_temperature_frequency_s(frequency_hz, &
      spectral_radiance, out, stat)
    real(c_double), intent(in) :: frequency_hz, spectral_radiance
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_brightness_temperature_frequency(frequency_hz, spectral_radiance, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_brightness_temperature_frequency', stat)
  end subroutine relicore_brightness_temperature_frequency_s

  ! Rayleigh-Jeans temperature c**2 B_nu / (2 k nu**2).
  !   frequency_hz: frequency in Hz, > 0
  !   spectral_radiance: B_nu in W m-2 sr-1 Hz-1, > 0
  ! Result: K; NaN on failure.
  impure elemental function relicore_rayleigh_jeans_temperature(frequency_hz, &
      spectral_radiance) result(res)
    real(c_double), intent(in) :: frequency_hz, spectral_radiance
    real(c_double) :: res
    if (c_rayleigh_jeans_temperature(frequency_hz, spectral_radiance, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_rayleigh_jeans_temperature

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_rayleigh_jeans_temperature_s(frequency_hz, &
      spectral_radiance, out, stat)
    real(c_double), intent(in) :: frequency_hz, spectral_radiance
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_rayleigh_jeans_temperature(frequency_hz, spectral_radiance, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_rayleigh_jeans_temperature', stat)
  end subroutine relicore_rayleigh_jeans_temperature_s

  ! Two-colour (ratio) temperature.
  !   wavelength_1_m: first wavelength in m, > 0
  !   wavelength_2_m: second wavelength in m, > 0
  !   radiance_ratio: L(lambda_1)/L(lambda_2), > 0
  !   emissivity_ratio: emissivity(lambda_1)/emissivity(lambda_2), > 0
  ! Result: K; NaN on failure.
  impure elemental function relicore_ratio_temperature(wavelength_1_m, wavelength_2_m, &
      radiance_ratio, emissivity_ratio) result(res)
    real(c_double), intent(in) :: wavelength_1_m, wavelength_2_m, radiance_ratio, &
        emissivity_ratio
    real(c_double) :: res
    if (c_ratio_temperature(wavelength_1_m, wavelength_2_m, radiance_ratio, emissivity_ratio, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_ratio_temperature

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_ratio_temperature_s(wavelength_1_m, wavelength_2_m, &
      radiance_ratio, emissivity_ratio, out, stat)
    real(c_double), intent(in) :: wavelength_1_m, wavelength_2_m, radiance_ratio, &
        emissivity_ratio
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_ratio_temperature(wavelength_1_m, wavelength_2_m, radiance_ratio, &
        emissivity_ratio, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_ratio_temperature', stat)
  end subroutine relicore_ratio_temperature_s

  ! Thermodynamic to Rayleigh-Jeans temperature conversion factor x**2 e**x/(e**x - 1)**2.
  !   frequency_hz: frequency in Hz, > 0
  !   cmb_temperature_k: CMB temperature T0 in K, > 0
  ! Result: dT_RJ/dT_CMB, in (0, 1); NaN on failure.
  impure elemental function relicore_thermodynamic_to_rayleigh_jeans_factor(frequency_hz, &
      cmb_temperature_k) result(res)
    real(c_double), intent(in) :: frequency_hz, cmb_temperature_k
    real(c_double) :: res
    if (c_thermodynamic_to_rayleigh_jeans_factor(frequency_hz, cmb_temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_thermodynamic_to_rayleigh_jeans_factor

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_thermodynamic_to_rayleigh_jeans_factor_s(frequency_hz, &
      cmb_temperature_k, out, stat)
    real(c_double), intent(in) :: frequency_hz, cmb_temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_thermodynamic_to_rayleigh_jeans_factor(frequency_hz, cmb_temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_thermodynamic_to_rayleigh_jeans_factor', stat)
  end subroutine relicore_thermodynamic_to_rayleigh_jeans_factor_s

  ! dB_nu/dT at the CMB temperature in MJy sr-1 K-1.
  !   frequency_hz: frequency in Hz, > 0
  !   cmb_temperature_k: CMB temperature T0 in K, > 0
  ! Result: MJy sr-1 per K_CMB; NaN on failure.
  impure elemental function relicore_kcmb_to_mjy_per_sr(frequency_hz, &
      cmb_temperature_k) result(res)
    real(c_double), intent(in) :: frequency_hz, cmb_temperature_k
    real(c_double) :: res
    if (c_kcmb_to_mjy_per_sr(frequency_hz, cmb_temperature_k, res) /= RELICORE_OK) res = nan64()
  end function relicore_kcmb_to_mjy_per_sr

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_kcmb_to_mjy_per_sr_s(frequency_hz, cmb_temperature_k, &
      out, stat)
    real(c_double), intent(in) :: frequency_hz, cmb_temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_kcmb_to_mjy_per_sr(frequency_hz, cmb_temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_kcmb_to_mjy_per_sr', stat)
  end subroutine relicore_kcmb_to_mjy_per_sr_s

  ! Thermal Sunyaev-Zeldovich intensity shape g(x) = x**4 e**x/(e**x - 1)**2 (x coth(x/2) - 4).
  !   frequency_hz: frequency in Hz, > 0
  !   cmb_temperature_k: CMB temperature T0 in K, > 0
  ! Result: g(x), dimensionless; NaN on failure.
  impure elemental function relicore_thermal_sz_spectral_shape(frequency_hz, &
      cmb_temperature_k) result(res)
    real(c_double), intent(in) :: frequency_hz, cmb_temperature_k
    real(c_double) :: res
    if (c_thermal_sz_spectral_shape(frequency_hz, cmb_temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_thermal_sz_spectral_shape

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_thermal_sz_spectral_shape_s(frequency_hz, &
      cmb_temperature_k, out, stat)
    real(c_double), intent(in) :: frequency_hz, cmb_temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_thermal_sz_spectral_shape(frequency_hz, cmb_temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_thermal_sz_spectral_shape', stat)
  end subroutine relicore_thermal_sz_spectral_shape_s

  ! Thermal Sunyaev-Zeldovich temperature shape f(x) = x coth(x/2) - 4.
  !   frequency_hz: frequency in Hz, > 0
  !   cmb_temperature_k: CMB temperature T0 in K, > 0
  ! Result: f(x), dimensionless; NaN on failure.
  impure elemental function relicore_thermal_sz_temperature_shape(frequency_hz, &
      cmb_temperature_k) result(res)
    real(c_double), intent(in) :: frequency_hz, cmb_temperature_k
    real(c_double) :: res
    if (c_thermal_sz_temperature_shape(frequency_hz, cmb_temperature_k, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_thermal_sz_temperature_shape

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_thermal_sz_temperature_shape_s(frequency_hz, &
      cmb_temperature_k, out, stat)
    real(c_double), intent(in) :: frequency_hz, cmb_temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_thermal_sz_temperature_shape(frequency_hz, cmb_temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_thermal_sz_temperature_shape', stat)
  end subroutine relicore_thermal_sz_temperature_shape_s

  ! Frequency of the null of the thermal Sunyaev-Zeldovich effect.
  !   cmb_temperature_k: CMB temperature T0 in K, > 0
  ! Result: Hz; NaN on failure.
  impure elemental function relicore_thermal_sz_null_frequency(cmb_temperature_k) result(res)
    real(c_double), intent(in) :: cmb_temperature_k
    real(c_double) :: res
    if (c_thermal_sz_null_frequency(cmb_temperature_k, res) /= RELICORE_OK) res = nan64()
  end function relicore_thermal_sz_null_frequency

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_thermal_sz_null_frequency_s(cmb_temperature_k, out, stat)
    real(c_double), intent(in) :: cmb_temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_thermal_sz_null_frequency(cmb_temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_thermal_sz_null_frequency', stat)
  end subroutine relicore_thermal_sz_null_frequency_s

  ! ================================================================ single-precision twins

  ! Planck spectral radiance per unit wavelength. Single-precision twin (real(c_float)).
  !   wavelength_m: wavelength in m, > 0
  !   temperature_k: temperature in K, > 0
  ! Result: B_lambda in W m-2 sr-1 m-1; NaN on failure.
  impure elemental function relicore_spectral_radiance_wavelength_f32(wavelength_m, &
      temperature_k) result(res)
    real(c_float), intent(in) :: wavelength_m, temperature_k
    real(c_float) :: res
    if (c_spectral_radiance_wavelength_f32(wavelength_m, temperature_k, &
        res) /= RELICORE_OK) res = nan32()
  end function relicore_spectral_radiance_wavelength_f32

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_spectral_radiance_wavelength_f32_s(wavelength_m, &
      temperature_k, out, stat)
    real(c_float), intent(in) :: wavelength_m, temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_spectral_radiance_wavelength_f32(wavelength_m, temperature_k, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_spectral_radiance_wavelength_f32', stat)
  end subroutine relicore_spectral_radiance_wavelength_f32_s

  ! Planck spectral radiance per unit frequency. Single-precision twin (real(c_float)).
  !   frequency_hz: frequency in Hz, > 0
  !   temperature_k: temperature in K, > 0
  ! Result: B_nu in W m-2 sr-1 Hz-1; NaN on failure.
  impure elemental function relicore_spectral_radiance_frequency_f32(frequency_hz, &
      temperature_k) result(res)
    real(c_float), intent(in) :: frequency_hz, temperature_k
    real(c_float) :: res
    if (c_spectral_radiance_frequency_f32(frequency_hz, temperature_k, &
        res) /= RELICORE_OK) res = nan32()
  end function relicore_spectral_radiance_frequency_f32

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_spectral_radiance_frequency_f32_s(frequency_hz, &
      temperature_k, out, stat)
    real(c_float), intent(in) :: frequency_hz, temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_spectral_radiance_frequency_f32(frequency_hz, temperature_k, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_spectral_radiance_frequency_f32', stat)
  end subroutine relicore_spectral_radiance_frequency_f32_s

  ! Planck spectral radiance per unit wavenumber (m-1). Single-precision twin (real(c_float)).
  !   wavenumber_per_m: wavenumber in m-1, > 0
  !   temperature_k: temperature in K, > 0
  ! Result: B_wavenumber in W m-2 sr-1 m; NaN on failure.
  impure elemental function relicore_spectral_radiance_wavenumber_f32(wavenumber_per_m, &
      temperature_k) result(res)
    real(c_float), intent(in) :: wavenumber_per_m, temperature_k
    real(c_float) :: res
    if (c_spectral_radiance_wavenumber_f32(wavenumber_per_m, temperature_k, &
        res) /= RELICORE_OK) res = nan32()
  end function relicore_spectral_radiance_wavenumber_f32

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_spectral_radiance_wavenumber_f32_s(wavenumber_per_m, &
      temperature_k, out, stat)
    real(c_float), intent(in) :: wavenumber_per_m, temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_spectral_radiance_wavenumber_f32(wavenumber_per_m, temperature_k, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_spectral_radiance_wavenumber_f32', stat)
  end subroutine relicore_spectral_radiance_wavenumber_f32_s

  ! Brightness temperature from a spectral radiance per unit wavelength. Single-precision twin
  ! (real(c_float)).
  !   wavelength_m: wavelength in m, > 0
  !   spectral_radiance: B_lambda in W m-2 sr-1 m-1, > 0
  ! Result: K; NaN on failure.
  impure elemental function relicore_brightness_temperature_wavelength_f32(wavelength_m, &
      spectral_radiance) result(res)
    real(c_float), intent(in) :: wavelength_m, spectral_radiance
    real(c_float) :: res
    if (c_brightness_temperature_wavelength_f32(wavelength_m, spectral_radiance, &
        res) /= RELICORE_OK) res = nan32()
  end function relicore_brightness_temperature_wavelength_f32

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_brightness_temperature_wavelength_f32_s(wavelength_m, &
      spectral_radiance, out, stat)
    real(c_float), intent(in) :: wavelength_m, spectral_radiance
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_brightness_temperature_wavelength_f32(wavelength_m, spectral_radiance, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_brightness_temperature_wavelength_f32', stat)
  end subroutine relicore_brightness_temperature_wavelength_f32_s

  ! Brightness temperature from a spectral radiance per unit frequency. Single-precision twin
  ! (real(c_float)).
  !   frequency_hz: frequency in Hz, > 0
  !   spectral_radiance: B_nu in W m-2 sr-1 Hz-1, > 0
  ! Result: K; NaN on failure.
  impure elemental function relicore_brightness_temperature_frequency_f32(frequency_hz, &
      spectral_radiance) result(res)
    real(c_float), intent(in) :: frequency_hz, spectral_radiance
    real(c_float) :: res
    if (c_brightness_temperature_frequency_f32(frequency_hz, spectral_radiance, &
        res) /= RELICORE_OK) res = nan32()
  end function relicore_brightness_temperature_frequency_f32

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_brightness_temperature_frequency_f32_s(frequency_hz, &
      spectral_radiance, out, stat)
    real(c_float), intent(in) :: frequency_hz, spectral_radiance
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_brightness_temperature_frequency_f32(frequency_hz, spectral_radiance, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_brightness_temperature_frequency_f32', stat)
  end subroutine relicore_brightness_temperature_frequency_f32_s

  ! Radiance emitted between two wavelengths. Single-precision twin (real(c_float)).
  !   lower_m: lower band edge in m, >= 0
  !   upper_m: upper band edge in m, > lower_m, may be +Inf
  !   temperature_k: temperature in K, > 0
  ! Result: W m-2 sr-1; NaN on failure.
  impure elemental function relicore_band_radiance_wavelength_f32(lower_m, upper_m, &
      temperature_k) result(res)
    real(c_float), intent(in) :: lower_m, upper_m, temperature_k
    real(c_float) :: res
    if (c_band_radiance_wavelength_f32(lower_m, upper_m, temperature_k, &
        res) /= RELICORE_OK) res = nan32()
  end function relicore_band_radiance_wavelength_f32

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_band_radiance_wavelength_f32_s(lower_m, upper_m, &
      temperature_k, out, stat)
    real(c_float), intent(in) :: lower_m, upper_m, temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_band_radiance_wavelength_f32(lower_m, upper_m, temperature_k, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_band_radiance_wavelength_f32', stat)
  end subroutine relicore_band_radiance_wavelength_f32_s

  ! ================================================================ array forms

  ! Array form of relicore_spectral_radiance_wavelength, one C call for the whole array: out(i)
  ! at wavelengths_m(i) and one temperature. wavelengths_m: wavelength in m, > 0; temperature_k:
  ! temperature in K, > 0; out: same size as wavelengths_m (B_lambda in W m-2 sr-1 m-1). Failing
  ! elements are NaN, the others computed; stat is the first failing element's code
  ! (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a failure stops with
  ! its message.
  subroutine relicore_spectral_radiance_wavelength_array(wavelengths_m, temperature_k, out, &
      stat)
    real(c_double), intent(in) :: wavelengths_m(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(wavelengths_m)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(wavelengths_m) == 0) then
      code = RELICORE_OK
    else
      code = c_spectral_radiance_wavelength_array(wavelengths_m, &
          size(wavelengths_m, kind=c_size_t), temperature_k, out)
    end if
    call report(code, 'relicore_spectral_radiance_wavelength_array', stat)
  end subroutine relicore_spectral_radiance_wavelength_array

  ! Array form of relicore_spectral_radiance_frequency, one C call for the whole array: out(i)
  ! at frequencies_hz(i) and one temperature. frequencies_hz: frequency in Hz, > 0;
  ! temperature_k: temperature in K, > 0; out: same size as frequencies_hz (B_nu in W m-2 sr-1
  ! Hz-1). Failing elements are NaN, the others computed; stat is the first failing element's
  ! code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a failure stops
  ! with its message.
  subroutine relicore_spectral_radiance_frequency_array(frequencies_hz, temperature_k, out, &
      stat)
    real(c_double), intent(in) :: frequencies_hz(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(frequencies_hz)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(frequencies_hz) == 0) then
      code = RELICORE_OK
    else
      code = c_spectral_radiance_frequency_array(frequencies_hz, &
          size(frequencies_hz, kind=c_size_t), temperature_k, out)
    end if
    call report(code, 'relicore_spectral_radiance_frequency_array', stat)
  end subroutine relicore_spectral_radiance_frequency_array

  ! Array form of relicore_spectral_radiance_wavenumber, one C call for the whole array: out(i)
  ! at wavenumbers_per_m(i) and one temperature. wavenumbers_per_m: wavenumber in m-1, > 0;
  ! temperature_k: temperature in K, > 0; out: same size as wavenumbers_per_m (B_wavenumber in W
  ! m-2 sr-1 m). Failing elements are NaN, the others computed; stat is the first failing
  ! element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a
  ! failure stops with its message.
  subroutine relicore_spectral_radiance_wavenumber_array(wavenumbers_per_m, temperature_k, &
      out, stat)
    real(c_double), intent(in) :: wavenumbers_per_m(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(wavenumbers_per_m)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(wavenumbers_per_m) == 0) then
      code = RELICORE_OK
    else
      code = c_spectral_radiance_wavenumber_array(wavenumbers_per_m, &
          size(wavenumbers_per_m, kind=c_size_t), temperature_k, out)
    end if
    call report(code, 'relicore_spectral_radiance_wavenumber_array', stat)
  end subroutine relicore_spectral_radiance_wavenumber_array

  ! Array form of relicore_photon_radiance_wavelength, one C call for the whole array: out(i) at
  ! wavelengths_m(i) and one temperature. wavelengths_m: wavelength in m, > 0; temperature_k:
  ! temperature in K, > 0; out: same size as wavelengths_m (N_lambda in photons s-1 m-2 sr-1
  ! m-1). Failing elements are NaN, the others computed; stat is the first failing element's
  ! code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a failure stops
  ! with its message.
  subroutine relicore_photon_radiance_wavelength_array(wavelengths_m, temperature_k, out, stat)
    real(c_double), intent(in) :: wavelengths_m(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(wavelengths_m)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(wavelengths_m) == 0) then
      code = RELICORE_OK
    else
      code = c_photon_radiance_wavelength_array(wavelengths_m, &
          size(wavelengths_m, kind=c_size_t), temperature_k, out)
    end if
    call report(code, 'relicore_photon_radiance_wavelength_array', stat)
  end subroutine relicore_photon_radiance_wavelength_array

  ! Array form of relicore_photon_radiance_frequency, one C call for the whole array: out(i) at
  ! frequencies_hz(i) and one temperature. frequencies_hz: frequency in Hz, > 0; temperature_k:
  ! temperature in K, > 0; out: same size as frequencies_hz (N_nu in photons s-1 m-2 sr-1 Hz-1).
  ! Failing elements are NaN, the others computed; stat is the first failing element's code
  ! (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a failure stops with
  ! its message.
  subroutine relicore_photon_radiance_frequency_array(frequencies_hz, temperature_k, out, stat)
    real(c_double), intent(in) :: frequencies_hz(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(frequencies_hz)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(frequencies_hz) == 0) then
      code = RELICORE_OK
    else
      code = c_photon_radiance_frequency_array(frequencies_hz, &
          size(frequencies_hz, kind=c_size_t), temperature_k, out)
    end if
    call report(code, 'relicore_photon_radiance_frequency_array', stat)
  end subroutine relicore_photon_radiance_frequency_array

  ! Array form of relicore_photon_radiance_wavenumber, one C call for the whole array: out(i) at
  ! wavenumbers_per_m(i) and one temperature. wavenumbers_per_m: wavenumber in m-1, > 0;
  ! temperature_k: temperature in K, > 0; out: same size as wavenumbers_per_m (photons s-1 m-2
  ! sr-1 m). Failing elements are NaN, the others computed; stat is the first failing element's
  ! code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a failure stops
  ! with its message.
  subroutine relicore_photon_radiance_wavenumber_array(wavenumbers_per_m, temperature_k, &
      out, stat)
    real(c_double), intent(in) :: wavenumbers_per_m(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(wavenumbers_per_m)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(wavenumbers_per_m) == 0) then
      code = RELICORE_OK
    else
      code = c_photon_radiance_wavenumber_array(wavenumbers_per_m, &
          size(wavenumbers_per_m, kind=c_size_t), temperature_k, out)
    end if
    call report(code, 'relicore_photon_radiance_wavenumber_array', stat)
  end subroutine relicore_photon_radiance_wavenumber_array

  ! Array form of relicore_radiance_temperature_derivative_wavelength, one C call for the whole
  ! array: out(i) at wavelengths_m(i) and one temperature. wavelengths_m: wavelength in m, > 0;
  ! temperature_k: temperature in K, > 0; out: same size as wavelengths_m (dB_lambda/dT in W m-2
  ! sr-1 m-1 K-1). Failing elements are NaN, the others computed; stat is the first failing
  ! element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a
  ! failure stops with its message.
  subroutine relicore_radiance_temperature_derivative_wavelength_array(wavelengths_m, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: wavelengths_m(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(wavelengths_m)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(wavelengths_m) == 0) then
      code = RELICORE_OK
    else
      code = c_radiance_temperature_derivative_wavelength_array(wavelengths_m, &
          size(wavelengths_m, kind=c_size_t), temperature_k, out)
    end if
    call report(code, 'relicore_radiance_temperature_derivative_wavelength_array', stat)
  end subroutine relicore_radiance_temperature_derivative_wavelength_array

  ! Array form of relicore_radiance_temperature_derivative_frequency, one C call for the whole
  ! array: out(i) at frequencies_hz(i) and one temperature. frequencies_hz: frequency in Hz, >
  ! 0; temperature_k: temperature in K, > 0; out: same size as frequencies_hz (dB_nu/dT in W m-2
  ! sr-1 Hz-1 K-1). Failing elements are NaN, the others computed; stat is the first failing
  ! element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a
  ! failure stops with its message.
  subroutine relicore_radiance_temperature_derivative_frequency_array(frequencies_hz, &
      temperature_k, out, stat)
    real(c_double), intent(in) :: frequencies_hz(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(frequencies_hz)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(frequencies_hz) == 0) then
      code = RELICORE_OK
    else
      code = c_radiance_temperature_derivative_frequency_array(frequencies_hz, &
          size(frequencies_hz, kind=c_size_t), temperature_k, out)
    end if
    call report(code, 'relicore_radiance_temperature_derivative_frequency_array', stat)
  end subroutine relicore_radiance_temperature_derivative_frequency_array

  ! Array form of relicore_brightness_temperature_wavelength, one C call for the whole array:
  ! out(i) for spectral_radiance(i) at one wavelength. wavelength_m: wavelength in m, > 0;
  ! spectral_radiance: B_lambda in W m-2 sr-1 m-1, > 0; out: same size as spectral_radiance (K).
  ! Failing elements are NaN, the others computed; stat is the first failing element's code
  ! (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a failure stops with
  ! its message.
  subroutine relicore_brightness_temperature_wavelength_array(wavelength_m, &
      spectral_radiance, out, stat)
    real(c_double), intent(in) :: wavelength_m
    real(c_double), intent(in) :: spectral_radiance(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(spectral_radiance)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(spectral_radiance) == 0) then
      code = RELICORE_OK
    else
      code = c_brightness_temperature_wavelength_array(wavelength_m, spectral_radiance, &
          size(spectral_radiance, kind=c_size_t), out)
    end if
    call report(code, 'relicore_brightness_temperature_wavelength_array', stat)
  end subroutine relicore_brightness_temperature_wavelength_array

  ! Array form of relicore_brightness_temperature_frequency, one C call for the whole array:
  ! out(i) for spectral_radiance(i) at one frequency. frequency_hz: frequency in Hz, > 0;
  ! spectral_radiance: B_nu in W m-2 sr-1 Hz-1, > 0; out: same size as spectral_radiance (K).
  ! Failing elements are NaN, the others computed; stat is the first failing element's code
  ! (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a failure stops with
  ! its message.
  subroutine relicore_brightness_temperature_frequency_array(frequency_hz, &
      spectral_radiance, out, stat)
    real(c_double), intent(in) :: frequency_hz
    real(c_double), intent(in) :: spectral_radiance(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(spectral_radiance)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(spectral_radiance) == 0) then
      code = RELICORE_OK
    else
      code = c_brightness_temperature_frequency_array(frequency_hz, spectral_radiance, &
          size(spectral_radiance, kind=c_size_t), out)
    end if
    call report(code, 'relicore_brightness_temperature_frequency_array', stat)
  end subroutine relicore_brightness_temperature_frequency_array

  ! Array form of relicore_spectral_radiance_wavelength_f32, one C call for the whole array:
  ! out(i) at wavelengths_m(i) and one temperature. wavelengths_m: wavelength in m, > 0;
  ! temperature_k: temperature in K, > 0; out: same size as wavelengths_m (B_lambda in W m-2
  ! sr-1 m-1). Failing elements are NaN, the others computed; stat is the first failing
  ! element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a
  ! failure stops with its message.
  subroutine relicore_spectral_radiance_wavelength_array_f32(wavelengths_m, temperature_k, &
      out, stat)
    real(c_float), intent(in) :: wavelengths_m(:)
    real(c_float), intent(in) :: temperature_k
    real(c_float), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(wavelengths_m)) then
      out = nan32()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(wavelengths_m) == 0) then
      code = RELICORE_OK
    else
      code = c_spectral_radiance_wavelength_array_f32(wavelengths_m, &
          size(wavelengths_m, kind=c_size_t), temperature_k, out)
    end if
    call report(code, 'relicore_spectral_radiance_wavelength_array_f32', stat)
  end subroutine relicore_spectral_radiance_wavelength_array_f32

  ! Array form of relicore_spectral_radiance_frequency_f32, one C call for the whole array:
  ! out(i) at frequencies_hz(i) and one temperature. frequencies_hz: frequency in Hz, > 0;
  ! temperature_k: temperature in K, > 0; out: same size as frequencies_hz (B_nu in W m-2 sr-1
  ! Hz-1). Failing elements are NaN, the others computed; stat is the first failing element's
  ! code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a failure stops
  ! with its message.
  subroutine relicore_spectral_radiance_frequency_array_f32(frequencies_hz, temperature_k, &
      out, stat)
    real(c_float), intent(in) :: frequencies_hz(:)
    real(c_float), intent(in) :: temperature_k
    real(c_float), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(frequencies_hz)) then
      out = nan32()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(frequencies_hz) == 0) then
      code = RELICORE_OK
    else
      code = c_spectral_radiance_frequency_array_f32(frequencies_hz, &
          size(frequencies_hz, kind=c_size_t), temperature_k, out)
    end if
    call report(code, 'relicore_spectral_radiance_frequency_array_f32', stat)
  end subroutine relicore_spectral_radiance_frequency_array_f32

  ! Array form of relicore_spectral_radiance_wavenumber_f32, one C call for the whole array:
  ! out(i) at wavenumbers_per_m(i) and one temperature. wavenumbers_per_m: wavenumber in m-1, >
  ! 0; temperature_k: temperature in K, > 0; out: same size as wavenumbers_per_m (B_wavenumber
  ! in W m-2 sr-1 m). Failing elements are NaN, the others computed; stat is the first failing
  ! element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a
  ! failure stops with its message.
  subroutine relicore_spectral_radiance_wavenumber_array_f32(wavenumbers_per_m, &
      temperature_k, out, stat)
    real(c_float), intent(in) :: wavenumbers_per_m(:)
    real(c_float), intent(in) :: temperature_k
    real(c_float), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(wavenumbers_per_m)) then
      out = nan32()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(wavenumbers_per_m) == 0) then
      code = RELICORE_OK
    else
      code = c_spectral_radiance_wavenumber_array_f32(wavenumbers_per_m, &
          size(wavenumbers_per_m, kind=c_size_t), temperature_k, out)
    end if
    call report(code, 'relicore_spectral_radiance_wavenumber_array_f32', stat)
  end subroutine relicore_spectral_radiance_wavenumber_array_f32

  ! ================================================================ response-weighted radiance

  ! Response-weighted radiance: the integral of response(lambda) B_lambda(lambda, T) over the
  ! table.
  !   wavelengths_m: strictly increasing wavelengths in m (> 0), at least 2
  !   response: relative spectral response at those wavelengths (>= 0), same size;
  !             linear between the points and zero outside
  !   temperature_k: temperature in K, > 0
  ! Result: W m-2 sr-1 (times the unit of the response); NaN on failure.
  function relicore_response_weighted_radiance(wavelengths_m, response, &
      temperature_k) result(res)
    real(c_double), intent(in) :: wavelengths_m(:), response(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double) :: res
    if (table_response_weighted_radiance(wavelengths_m, response, temperature_k, &
        res) /= RELICORE_OK) &
        res = nan64()
  end function relicore_response_weighted_radiance

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  subroutine relicore_response_weighted_radiance_s(wavelengths_m, response, temperature_k, &
      out, stat)
    real(c_double), intent(in) :: wavelengths_m(:), response(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_response_weighted_radiance(wavelengths_m, response, temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_response_weighted_radiance', stat)
  end subroutine relicore_response_weighted_radiance_s

  ! Calls relicore_response_weighted_radiance; a zero-size table is passed as a valid buffer of
  ! length 0, so the C library judges the sizes (RELICORE_ERROR_ARRAY_TOO_SHORT), never a NULL
  ! pointer.
  function table_response_weighted_radiance(wavelengths_m, response, temperature_k, &
      out) result(code)
    real(c_double), intent(in) :: wavelengths_m(:), response(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_double) :: empty(1)
    integer(c_size_t) :: n_wavelengths, n_response
    empty = 0
    n_wavelengths = size(wavelengths_m, kind=c_size_t)
    n_response = size(response, kind=c_size_t)
    if (n_wavelengths > 0 .and. n_response > 0) then
      code = c_response_weighted_radiance(wavelengths_m, n_wavelengths, response, n_response, &
          temperature_k, out)
    else if (n_wavelengths > 0) then
      code = c_response_weighted_radiance(wavelengths_m, n_wavelengths, empty, n_response, &
          temperature_k, out)
    else if (n_response > 0) then
      code = c_response_weighted_radiance(empty, n_wavelengths, response, n_response, &
          temperature_k, out)
    else
      code = c_response_weighted_radiance(empty, n_wavelengths, empty, n_response, &
          temperature_k, out)
    end if
  end function table_response_weighted_radiance

  ! Temperature whose response-weighted radiance is the given one (inverse of
  ! relicore_response_weighted_radiance).
  !   wavelengths_m: strictly increasing wavelengths in m (> 0), at least 2
  !   response: relative spectral response at those wavelengths (>= 0), same size;
  !             linear between the points and zero outside
  !   radiance: response-weighted radiance in W m-2 sr-1, > 0
  ! Result: K; NaN on failure.
  function relicore_temperature_from_response_weighted_radiance(wavelengths_m, response, &
      radiance) result(res)
    real(c_double), intent(in) :: wavelengths_m(:), response(:)
    real(c_double), intent(in) :: radiance
    real(c_double) :: res
    if (table_temperature_from_response_weighted_radiance(wavelengths_m, response, &
        radiance, res) /= RELICORE_OK) &
        res = nan64()
  end function relicore_temperature_from_response_weighted_radiance

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  subroutine relicore_temperature_from_response_weighted_radiance_s(wavelengths_m, &
      response, radiance, out, stat)
    real(c_double), intent(in) :: wavelengths_m(:), response(:)
    real(c_double), intent(in) :: radiance
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_temperature_from_response_weighted_radiance(wavelengths_m, response, &
        radiance, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_temperature_from_response_weighted_radiance', stat)
  end subroutine relicore_temperature_from_response_weighted_radiance_s

  ! Calls relicore_temperature_from_response_weighted_radiance; a zero-size table is passed as a
  ! valid buffer of length 0, so the C library judges the sizes
  ! (RELICORE_ERROR_ARRAY_TOO_SHORT), never a NULL pointer.
  function table_temperature_from_response_weighted_radiance(wavelengths_m, response, &
      radiance, out) result(code)
    real(c_double), intent(in) :: wavelengths_m(:), response(:)
    real(c_double), intent(in) :: radiance
    real(c_double), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_double) :: empty(1)
    integer(c_size_t) :: n_wavelengths, n_response
    empty = 0
    n_wavelengths = size(wavelengths_m, kind=c_size_t)
    n_response = size(response, kind=c_size_t)
    if (n_wavelengths > 0 .and. n_response > 0) then
      code = c_temperature_from_response_weighted_radiance(wavelengths_m, n_wavelengths, &
          response, n_response, radiance, out)
    else if (n_wavelengths > 0) then
      code = c_temperature_from_response_weighted_radiance(wavelengths_m, n_wavelengths, &
          empty, n_response, radiance, out)
    else if (n_response > 0) then
      code = c_temperature_from_response_weighted_radiance(empty, n_wavelengths, response, &
          n_response, radiance, out)
    else
      code = c_temperature_from_response_weighted_radiance(empty, n_wavelengths, empty, &
          n_response, radiance, out)
    end if
  end function table_temperature_from_response_weighted_radiance

  ! Response-weighted radiance: the integral of response(lambda) B_lambda(lambda, T) over the
  ! table. Single-precision twin (real(c_float)).
  !   wavelengths_m: strictly increasing wavelengths in m (> 0), at least 2
  !   response: relative spectral response at those wavelengths (>= 0), same size;
  !             linear between the points and zero outside
  !   temperature_k: temperature in K, > 0
  ! Result: W m-2 sr-1 (times the unit of the response); NaN on failure.
  function relicore_response_weighted_radiance_f32(wavelengths_m, response, &
      temperature_k) result(res)
    real(c_float), intent(in) :: wavelengths_m(:), response(:)
    real(c_float), intent(in) :: temperature_k
    real(c_float) :: res
    if (table_response_weighted_radiance_f32(wavelengths_m, response, temperature_k, &
        res) /= RELICORE_OK) &
        res = nan32()
  end function relicore_response_weighted_radiance_f32

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  subroutine relicore_response_weighted_radiance_f32_s(wavelengths_m, response, &
      temperature_k, out, stat)
    real(c_float), intent(in) :: wavelengths_m(:), response(:)
    real(c_float), intent(in) :: temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_response_weighted_radiance_f32(wavelengths_m, response, temperature_k, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_response_weighted_radiance_f32', stat)
  end subroutine relicore_response_weighted_radiance_f32_s

  ! Calls relicore_response_weighted_radiance_f32; a zero-size table is passed as a valid buffer
  ! of length 0, so the C library judges the sizes (RELICORE_ERROR_ARRAY_TOO_SHORT), never a
  ! NULL pointer.
  function table_response_weighted_radiance_f32(wavelengths_m, response, temperature_k, &
      out) result(code)
    real(c_float), intent(in) :: wavelengths_m(:), response(:)
    real(c_float), intent(in) :: temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_float) :: empty(1)
    integer(c_size_t) :: n_wavelengths, n_response
    empty = 0
    n_wavelengths = size(wavelengths_m, kind=c_size_t)
    n_response = size(response, kind=c_size_t)
    if (n_wavelengths > 0 .and. n_response > 0) then
      code = c_response_weighted_radiance_f32(wavelengths_m, n_wavelengths, response, &
          n_response, temperature_k, out)
    else if (n_wavelengths > 0) then
      code = c_response_weighted_radiance_f32(wavelengths_m, n_wavelengths, empty, &
          n_response, temperature_k, out)
    else if (n_response > 0) then
      code = c_response_weighted_radiance_f32(empty, n_wavelengths, response, n_response, &
          temperature_k, out)
    else
      code = c_response_weighted_radiance_f32(empty, n_wavelengths, empty, n_response, &
          temperature_k, out)
    end if
  end function table_response_weighted_radiance_f32

  ! Temperature whose response-weighted radiance is the given one (inverse of
  ! relicore_response_weighted_radiance). Single-precision twin (real(c_float)).
  !   wavelengths_m: strictly increasing wavelengths in m (> 0), at least 2
  !   response: relative spectral response at those wavelengths (>= 0), same size;
  !             linear between the points and zero outside
  !   radiance: response-weighted radiance in W m-2 sr-1, > 0
  ! Result: K; NaN on failure.
  function relicore_temperature_from_response_weighted_radiance_f32(wavelengths_m, &
      response, radiance) result(res)
    real(c_float), intent(in) :: wavelengths_m(:), response(:)
    real(c_float), intent(in) :: radiance
    real(c_float) :: res
    if (table_temperature_from_response_weighted_radiance_f32(wavelengths_m, response, &
        radiance, res) /= RELICORE_OK) &
        res = nan32()
  end function relicore_temperature_from_response_weighted_radiance_f32

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  subroutine relicore_temperature_from_response_weighted_radiance_f32_s(wavelengths_m, &
      response, radiance, out, stat)
    real(c_float), intent(in) :: wavelengths_m(:), response(:)
    real(c_float), intent(in) :: radiance
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_temperature_from_response_weighted_radiance_f32(wavelengths_m, response, &
        radiance, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_temperature_from_response_weighted_radiance_f32', stat)
  end subroutine relicore_temperature_from_response_weighted_radiance_f32_s

  ! Calls relicore_temperature_from_response_weighted_radiance_f32; a zero-size table is passed
  ! as a valid buffer of length 0, so the C library judges the sizes
  ! (RELICORE_ERROR_ARRAY_TOO_SHORT), never a NULL pointer.
  function table_temperature_from_response_weighted_radiance_f32(wavelengths_m, response, &
      radiance, out) result(code)
    real(c_float), intent(in) :: wavelengths_m(:), response(:)
    real(c_float), intent(in) :: radiance
    real(c_float), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_float) :: empty(1)
    integer(c_size_t) :: n_wavelengths, n_response
    empty = 0
    n_wavelengths = size(wavelengths_m, kind=c_size_t)
    n_response = size(response, kind=c_size_t)
    if (n_wavelengths > 0 .and. n_response > 0) then
      code = c_temperature_from_response_weighted_radiance_f32(wavelengths_m, n_wavelengths, &
          response, n_response, radiance, out)
    else if (n_wavelengths > 0) then
      code = c_temperature_from_response_weighted_radiance_f32(wavelengths_m, n_wavelengths, &
          empty, n_response, radiance, out)
    else if (n_response > 0) then
      code = c_temperature_from_response_weighted_radiance_f32(empty, n_wavelengths, &
          response, n_response, radiance, out)
    else
      code = c_temperature_from_response_weighted_radiance_f32(empty, n_wavelengths, empty, &
          n_response, radiance, out)
    end if
  end function table_temperature_from_response_weighted_radiance_f32

  ! ================================================================ two-load calibration

  ! Two-load calibration of a radiometer channel: fits
  ! reading = gain * J + offset, J the Rayleigh-Jeans brightness temperature of each load.
  !   frequency_hz: channel frequency in Hz, > 0
  !   reading_hot: raw reading on the hot load (counts, volts: any linear unit)
  !   temperature_hot_k: physical temperature of the hot load in K, > temperature_cold_k
  !   reading_cold: raw reading on the cold load, /= reading_hot
  !   temperature_cold_k: physical temperature of the cold load in K, > 0
  ! Result: type(relicore_two_load_calibration); every field NaN on failure. Referenced through
  ! the generic name relicore_two_load_calibration, which also names the type (whose structure
  ! constructor takes the three fields).
  impure elemental function make_two_load_calibration(frequency_hz, reading_hot, &
      temperature_hot_k, reading_cold, temperature_cold_k) result(res)
    real(c_double), intent(in) :: frequency_hz, reading_hot, temperature_hot_k, &
        reading_cold, temperature_cold_k
    type(relicore_two_load_calibration) :: res
    if (c_two_load_calibration(frequency_hz, reading_hot, temperature_hot_k, reading_cold, &
        temperature_cold_k, res) /= RELICORE_OK) &
        res = relicore_two_load_calibration(nan64(), nan64(), nan64())
  end function make_two_load_calibration

  ! Status form: calibration = the fit (every field NaN on failure), stat = RELICORE_OK or
  ! RELICORE_ERROR_*; without stat a failure stops with its message.
  impure elemental subroutine relicore_two_load_calibration_s(frequency_hz, reading_hot, &
      temperature_hot_k, reading_cold, temperature_cold_k, calibration, stat)
    real(c_double), intent(in) :: frequency_hz, reading_hot, temperature_hot_k, &
        reading_cold, temperature_cold_k
    type(relicore_two_load_calibration), intent(out) :: calibration
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_two_load_calibration(frequency_hz, reading_hot, temperature_hot_k, reading_cold, &
        temperature_cold_k, calibration)
    if (code /= RELICORE_OK) calibration = relicore_two_load_calibration(nan64(), nan64(), &
        nan64())
    call report(code, 'relicore_two_load_calibration', stat)
  end subroutine relicore_two_load_calibration_s

  ! Physical temperature of a blackbody scene from a raw reading.
  !   calibration: from relicore_two_load_calibration
  !   reading: raw reading, finite
  ! Result: K, > 0; NaN on failure.
  impure elemental function relicore_calibrated_temperature(calibration, reading) result(res)
    type(relicore_two_load_calibration), intent(in) :: calibration
    real(c_double), intent(in) :: reading
    real(c_double) :: res
    if (c_calibrated_temperature(calibration, reading, res) /= RELICORE_OK) res = nan64()
  end function relicore_calibrated_temperature

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_calibrated_temperature_s(calibration, reading, out, stat)
    type(relicore_two_load_calibration), intent(in) :: calibration
    real(c_double), intent(in) :: reading
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_calibrated_temperature(calibration, reading, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_calibrated_temperature', stat)
  end subroutine relicore_calibrated_temperature_s

  ! Rayleigh-Jeans brightness temperature J = (reading - offset)/gain of the scene.
  !   calibration: from relicore_two_load_calibration
  !   reading: raw reading, finite
  ! Result: K (may be <= 0 below the zero-radiance level); NaN on failure.
  impure elemental function relicore_calibrated_brightness_temperature(calibration, &
      reading) result(res)
    type(relicore_two_load_calibration), intent(in) :: calibration
    real(c_double), intent(in) :: reading
    real(c_double) :: res
    if (c_calibrated_brightness_temperature(calibration, reading, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_calibrated_brightness_temperature

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_calibrated_brightness_temperature_s(calibration, &
      reading, out, stat)
    type(relicore_two_load_calibration), intent(in) :: calibration
    real(c_double), intent(in) :: reading
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_calibrated_brightness_temperature(calibration, reading, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_calibrated_brightness_temperature', stat)
  end subroutine relicore_calibrated_brightness_temperature_s

  ! Two-load calibration of a radiometer channel (single precision): fits
  ! reading = gain * J + offset, J the Rayleigh-Jeans brightness temperature of each load.
  !   frequency_hz: channel frequency in Hz, > 0
  !   reading_hot: raw reading on the hot load (counts, volts: any linear unit)
  !   temperature_hot_k: physical temperature of the hot load in K, > temperature_cold_k
  !   reading_cold: raw reading on the cold load, /= reading_hot
  !   temperature_cold_k: physical temperature of the cold load in K, > 0
  ! Result: type(relicore_two_load_calibration_f32); every field NaN on failure. Referenced
  ! through the generic name relicore_two_load_calibration_f32, which also names the type (whose
  ! structure constructor takes the three fields).
  impure elemental function make_two_load_calibration_f32(frequency_hz, reading_hot, &
      temperature_hot_k, reading_cold, temperature_cold_k) result(res)
    real(c_float), intent(in) :: frequency_hz, reading_hot, temperature_hot_k, &
        reading_cold, temperature_cold_k
    type(relicore_two_load_calibration_f32) :: res
    if (c_two_load_calibration_f32(frequency_hz, reading_hot, temperature_hot_k, &
        reading_cold, temperature_cold_k, res) /= RELICORE_OK) &
        res = relicore_two_load_calibration_f32(nan32(), nan32(), nan32())
  end function make_two_load_calibration_f32

  ! Status form: calibration = the fit (every field NaN on failure), stat = RELICORE_OK or
  ! RELICORE_ERROR_*; without stat a failure stops with its message.
  impure elemental subroutine relicore_two_load_calibration_f32_s(frequency_hz, reading_hot, &
      temperature_hot_k, reading_cold, temperature_cold_k, calibration, stat)
    real(c_float), intent(in) :: frequency_hz, reading_hot, temperature_hot_k, &
        reading_cold, temperature_cold_k
    type(relicore_two_load_calibration_f32), intent(out) :: calibration
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_two_load_calibration_f32(frequency_hz, reading_hot, temperature_hot_k, &
        reading_cold, temperature_cold_k, calibration)
    if (code /= RELICORE_OK) calibration = relicore_two_load_calibration_f32(nan32(), &
        nan32(), nan32())
    call report(code, 'relicore_two_load_calibration_f32', stat)
  end subroutine relicore_two_load_calibration_f32_s

  ! Physical temperature of a blackbody scene from a raw reading. Single-precision twin.
  !   calibration: from relicore_two_load_calibration_f32
  !   reading: raw reading, finite
  ! Result: K, > 0; NaN on failure.
  impure elemental function relicore_calibrated_temperature_f32(calibration, &
      reading) result(res)
    type(relicore_two_load_calibration_f32), intent(in) :: calibration
    real(c_float), intent(in) :: reading
    real(c_float) :: res
    if (c_calibrated_temperature_f32(calibration, reading, res) /= RELICORE_OK) res = nan32()
  end function relicore_calibrated_temperature_f32

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_calibrated_temperature_f32_s(calibration, reading, &
      out, stat)
    type(relicore_two_load_calibration_f32), intent(in) :: calibration
    real(c_float), intent(in) :: reading
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_calibrated_temperature_f32(calibration, reading, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_calibrated_temperature_f32', stat)
  end subroutine relicore_calibrated_temperature_f32_s

  ! Rayleigh-Jeans brightness temperature J = (reading - offset)/gain of the scene. Single-
  ! precision twin.
  !   calibration: from relicore_two_load_calibration_f32
  !   reading: raw reading, finite
  ! Result: K (may be <= 0 below the zero-radiance level); NaN on failure.
  impure elemental function relicore_calibrated_brightness_temperature_f32(calibration, &
      reading) result(res)
    type(relicore_two_load_calibration_f32), intent(in) :: calibration
    real(c_float), intent(in) :: reading
    real(c_float) :: res
    if (c_calibrated_brightness_temperature_f32(calibration, reading, &
        res) /= RELICORE_OK) res = nan32()
  end function relicore_calibrated_brightness_temperature_f32

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_calibrated_brightness_temperature_f32_s(calibration, &
      reading, out, stat)
    type(relicore_two_load_calibration_f32), intent(in) :: calibration
    real(c_float), intent(in) :: reading
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_calibrated_brightness_temperature_f32(calibration, reading, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_calibrated_brightness_temperature_f32', stat)
  end subroutine relicore_calibrated_brightness_temperature_f32_s


  ! ================================================================ the universe

  ! A parameter set with the common-practice defaults and the given H0 and Omega_m:
  ! Omega_b = 0, Omega_k = 0 (flat), T0 = 2.7255 K, N_eff = 3.044, massless neutrinos,
  ! w0 = -1, wa = 0 (a cosmological constant), Y_p = 0.245. Nothing is validated here
  ! (relicore_universe_init and relicore_universe_check_parameters do that).
  !   h0_km_s_mpc: Hubble constant in km s-1 Mpc-1
  !   omega_matter: matter density parameter today, massive neutrinos included
  ! Result: type(relicore_universe_parameters).
  impure elemental function relicore_universe_parameters_default(h0_km_s_mpc, &
      omega_matter) result(params)
    real(c_double), intent(in) :: h0_km_s_mpc, omega_matter
    type(relicore_universe_parameters) :: params
    if (c_universe_parameters_default(h0_km_s_mpc, omega_matter, params) /= RELICORE_OK) &
        params = nan_parameters()
  end function relicore_universe_parameters_default

  ! Validates the parameters and builds the universe into out (derived constants and the
  ! distance table; of the order of a millisecond): build once, then pass it to every
  ! cosmology procedure. stat = RELICORE_OK, RELICORE_ERROR_INVALID_PARAMETER (which one:
  ! relicore_universe_check_parameters), RELICORE_ERROR_NO_BIG_BANG (E(z)^2 <= 0 somewhere on
  ! the way back) or RELICORE_ERROR_NO_CONVERGENCE; on failure out is cleared and every
  ! procedure refuses it (RELICORE_ERROR_INVALID_STRUCT). Without stat a failure stops with the
  ! message and, for an invalid parameter, its name.
  subroutine relicore_universe_init(params, out, stat)
    type(relicore_universe_parameters), intent(in) :: params
    type(relicore_universe), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    call report_parameters(c_universe_init(params, out), 'relicore_universe_init', params, stat)
  end subroutine relicore_universe_init

  ! Checks a parameter set as relicore_universe_init does (at the same cost: it builds the
  ! universe and discards it). which_parameter = the 0-based position of the invalid parameter
  ! when stat is RELICORE_ERROR_INVALID_PARAMETER (see type relicore_universe_parameters),
  ! otherwise -1; stat = the status relicore_universe_init would return. Without stat a failure
  ! stops with the message and the name of the parameter.
  subroutine relicore_universe_check_parameters(params, which_parameter, stat)
    type(relicore_universe_parameters), intent(in) :: params
    integer(c_int32_t), intent(out) :: which_parameter
    integer(c_int32_t), intent(out), optional :: stat
    call report_parameters(c_universe_check_parameters(params, which_parameter), &
        'relicore_universe_check_parameters', params, stat)
  end subroutine relicore_universe_check_parameters

  ! The parameters a universe was built from.
  !   universe: from relicore_universe_init
  ! Result: type(relicore_universe_parameters); every component NaN on failure.
  impure elemental function relicore_universe_get_parameters(universe) result(params)
    type(relicore_universe), intent(in) :: universe
    type(relicore_universe_parameters) :: params
    if (c_universe_get_parameters(universe, params) /= RELICORE_OK) params = nan_parameters()
  end function relicore_universe_get_parameters

  ! Status form: out = the parameters (every component NaN on failure), stat = RELICORE_OK or
  ! RELICORE_ERROR_*; without stat a failure stops with its message.
  impure elemental subroutine relicore_universe_get_parameters_s(universe, out, stat)
    type(relicore_universe), intent(in) :: universe
    type(relicore_universe_parameters), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_universe_get_parameters(universe, out)
    if (code /= RELICORE_OK) out = nan_parameters()
    call report(code, 'relicore_universe_get_parameters', stat)
  end subroutine relicore_universe_get_parameters_s

  ! A parameter set whose every component is NaN (the value of a failed call).
  elemental function nan_parameters() result(params)
    type(relicore_universe_parameters) :: params
    params = relicore_universe_parameters(nan64(), nan64(), nan64(), nan64(), nan64(), &
        nan64(), [nan64(), nan64(), nan64()], nan64(), nan64(), nan64())
  end function nan_parameters

  ! As report, for a call on a parameter set: the stop message names an invalid parameter.
  subroutine report_parameters(code, routine, params, stat)
    integer(c_int32_t), intent(in) :: code
    character(len=*), intent(in) :: routine
    type(relicore_universe_parameters), intent(in) :: params
    integer(c_int32_t), intent(out), optional :: stat
    character(len=*), parameter :: names(0:9) = [character(len=20) :: 'h0_km_s_mpc', &
        'omega_matter', 'omega_baryon', 'omega_curvature', 'cmb_temperature_k', 'n_eff', &
        'neutrino_masses_ev', 'w0', 'wa', 'helium_mass_fraction']
    integer(c_int32_t) :: which
    character(len=12) :: number
    if (present(stat) .or. code /= RELICORE_ERROR_INVALID_PARAMETER) then
      call report(code, routine, stat)
      return
    end if
    if (c_universe_check_parameters(params, which) /= code) which = -1
    write (number, '(i0)') code
    if (which >= lbound(names, 1) .and. which <= ubound(names, 1)) then
      error stop routine // ': ' // relicore_status_message(code) // ' (status ' // &
          trim(number) // '): ' // trim(names(which))
    end if
    call report(code, routine, stat)
  end subroutine report_parameters

  ! ================================================================ cosmology

  ! Dimensionless Hubble rate E(z) = H(z)/H0 (Friedmann equation with radiation, massive neutrinos,
  ! curvature and w0-wa dark energy).
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: E, dimensionless (>= 1 for ordinary models); NaN on failure.
  impure elemental function relicore_dimensionless_hubble(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_dimensionless_hubble(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_dimensionless_hubble

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_dimensionless_hubble_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_dimensionless_hubble(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_dimensionless_hubble', stat)
  end subroutine relicore_dimensionless_hubble_s

  ! Hubble parameter H(z) = H0 E(z).
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: H in km s-1 Mpc-1; NaN on failure.
  impure elemental function relicore_hubble_parameter_km_s_mpc(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_hubble_parameter_km_s_mpc(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_hubble_parameter_km_s_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_hubble_parameter_km_s_mpc_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_hubble_parameter_km_s_mpc(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_hubble_parameter_km_s_mpc', stat)
  end subroutine relicore_hubble_parameter_km_s_mpc_s

  ! Matter density parameter at z: cold dark matter, baryons and massive neutrinos (the bookkeeping
  ! of omega_matter) over the critical density at z.
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: Omega_m(z), dimensionless (in [0, 1] for flat models); NaN on failure.
  impure elemental function relicore_omega_matter_at(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_omega_matter_at(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_omega_matter_at

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_omega_matter_at_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_omega_matter_at(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_omega_matter_at', stat)
  end subroutine relicore_omega_matter_at_s

  ! Radiation density parameter at z: photons and massless neutrino species over the critical
  ! density at z.
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: Omega_r(z), dimensionless; NaN on failure.
  impure elemental function relicore_omega_radiation_at(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_omega_radiation_at(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_omega_radiation_at

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_omega_radiation_at_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_omega_radiation_at(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_omega_radiation_at', stat)
  end subroutine relicore_omega_radiation_at_s

  ! Dark-energy density parameter at z, Omega_de f_de(z)/E^2.
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: Omega_de(z), dimensionless; NaN on failure.
  impure elemental function relicore_omega_dark_energy_at(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_omega_dark_energy_at(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_omega_dark_energy_at

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_omega_dark_energy_at_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_omega_dark_energy_at(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_omega_dark_energy_at', stat)
  end subroutine relicore_omega_dark_energy_at_s

  ! Curvature density parameter at z, Omega_k(1+z)^2/E^2.
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: Omega_k(z), dimensionless; NaN on failure.
  impure elemental function relicore_omega_curvature_at(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_omega_curvature_at(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_omega_curvature_at

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_omega_curvature_at_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_omega_curvature_at(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_omega_curvature_at', stat)
  end subroutine relicore_omega_curvature_at_s

  ! Critical density at z, rho_c(z) = 3H(z)^2/(8piG), with G of CODATA 2022.
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: rho_c in kg m-^3, > 0; NaN on failure.
  impure elemental function relicore_critical_density_kg_m3(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_critical_density_kg_m3(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_critical_density_kg_m3

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_critical_density_kg_m3_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_critical_density_kg_m3(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_critical_density_kg_m3', stat)
  end subroutine relicore_critical_density_kg_m3_s

  ! CMB (radiation) temperature at z, T0(1+z).
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: T in K, >= 0; NaN on failure.
  impure elemental function relicore_cmb_temperature_at_k(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_cmb_temperature_at_k(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_cmb_temperature_at_k

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_cmb_temperature_at_k_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_cmb_temperature_at_k(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_cmb_temperature_at_k', stat)
  end subroutine relicore_cmb_temperature_at_k_s

  ! Line-of-sight comoving distance D_C = (c/H0) int_0^z dz'/E(z').
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: D_C in Mpc, >= 0; NaN on failure.
  impure elemental function relicore_comoving_distance_mpc(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_comoving_distance_mpc(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_comoving_distance_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_comoving_distance_mpc_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_comoving_distance_mpc(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_comoving_distance_mpc', stat)
  end subroutine relicore_comoving_distance_mpc_s

  ! Transverse comoving distance D_M: D_C in a flat universe, (D_H/sqrtOmega_k) sinh(sqrtOmega_k
  ! D_C/D_H) in an open one, the sin form in a closed one.
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: D_M in Mpc (>= 0 except past the antipode of a closed universe); NaN on failure.
  impure elemental function relicore_transverse_comoving_distance_mpc(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_transverse_comoving_distance_mpc(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_transverse_comoving_distance_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_transverse_comoving_distance_mpc_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_transverse_comoving_distance_mpc(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_transverse_comoving_distance_mpc', stat)
  end subroutine relicore_transverse_comoving_distance_mpc_s

  ! Angular-diameter distance D_A = D_M/(1+z).
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: D_A in Mpc; NaN on failure.
  impure elemental function relicore_angular_diameter_distance_mpc(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_angular_diameter_distance_mpc(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_angular_diameter_distance_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_angular_diameter_distance_mpc_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_angular_diameter_distance_mpc(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_angular_diameter_distance_mpc', stat)
  end subroutine relicore_angular_diameter_distance_mpc_s

  ! Luminosity distance D_L = (1+z) D_M.
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: D_L in Mpc; NaN on failure.
  impure elemental function relicore_luminosity_distance_mpc(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_luminosity_distance_mpc(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_luminosity_distance_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_luminosity_distance_mpc_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_luminosity_distance_mpc(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_luminosity_distance_mpc', stat)
  end subroutine relicore_luminosity_distance_mpc_s

  ! Distance modulus 5 log10(D_L / 10 pc).
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: the distance modulus in magnitudes; NaN on failure.
  impure elemental function relicore_distance_modulus(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_distance_modulus(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_distance_modulus

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_distance_modulus_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_distance_modulus(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_distance_modulus', stat)
  end subroutine relicore_distance_modulus_s

  ! Comoving volume inside redshift z over the whole sky (open, flat and closed models).
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: V_C in Gpc^3, >= 0; NaN on failure.
  impure elemental function relicore_comoving_volume_gpc3(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_comoving_volume_gpc3(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_comoving_volume_gpc3

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_comoving_volume_gpc3_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_comoving_volume_gpc3(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_comoving_volume_gpc3', stat)
  end subroutine relicore_comoving_volume_gpc3_s

  ! Differential comoving volume dV_C/dz/dOmega = D_H D_M^2/E(z).
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: dV_C/dz/dOmega in Mpc^3 sr-1, >= 0; NaN on failure.
  impure elemental function relicore_differential_comoving_volume_mpc3_sr(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_differential_comoving_volume_mpc3_sr(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_differential_comoving_volume_mpc3_sr

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_differential_comoving_volume_mpc3_sr_s(universe, z, out, &
      stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_differential_comoving_volume_mpc3_sr(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_differential_comoving_volume_mpc3_sr', stat)
  end subroutine relicore_differential_comoving_volume_mpc3_sr_s

  ! Proper transverse size subtended by one arcsecond at z, D_A * pi/648000.
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: kpc per arcsec; NaN on failure.
  impure elemental function relicore_transverse_scale_kpc_per_arcsec(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_transverse_scale_kpc_per_arcsec(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_transverse_scale_kpc_per_arcsec

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_transverse_scale_kpc_per_arcsec_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_transverse_scale_kpc_per_arcsec(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_transverse_scale_kpc_per_arcsec', stat)
  end subroutine relicore_transverse_scale_kpc_per_arcsec_s

  ! Lookback time t(0) - t(z) = (1/H0) int_0^z dz'/((1+z')E(z')).
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: the lookback time in Gyr (Julian years), >= 0; NaN on failure.
  impure elemental function relicore_lookback_time_gyr(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_lookback_time_gyr(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_lookback_time_gyr

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_lookback_time_gyr_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_lookback_time_gyr(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_lookback_time_gyr', stat)
  end subroutine relicore_lookback_time_gyr_s

  ! Age of the universe at redshift z, (1/H0) int_z^inf dz'/((1+z')E(z')) (z = 0: the age today).
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: the age in Gyr (Julian years), > 0; NaN on failure.
  impure elemental function relicore_age_gyr(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_age_gyr(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_age_gyr

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_age_gyr_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_age_gyr(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_age_gyr', stat)
  end subroutine relicore_age_gyr_s

  ! Conformal time at z times c, c*eta(z) = (c/H0) int_z^inf dz'/E(z'): the comoving particle
  ! horizon.
  !   universe: from relicore_universe_init
  !   z: redshift, finite and >= 0
  ! Result: c*eta in Mpc, > 0; NaN on failure.
  impure elemental function relicore_conformal_time_mpc(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_conformal_time_mpc(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_conformal_time_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_conformal_time_mpc_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_conformal_time_mpc(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_conformal_time_mpc', stat)
  end subroutine relicore_conformal_time_mpc_s

  ! Angular-diameter distance of an object at z2 seen from z1 <= z2, D_M(chi2 - chi1)/(1 + z2).
  !   universe: from relicore_universe_init
  !   z1: redshift of the observer, >= 0
  !   z2: redshift of the source, >= z1
  ! Result: D_A(z1, z2) in Mpc; NaN on failure.
  impure elemental function relicore_angular_diameter_distance_between_mpc(universe, z1, &
      z2) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z1, z2
    real(c_double) :: res
    if (c_angular_diameter_distance_between_mpc(universe, z1, z2, res) /= RELICORE_OK) &
        res = nan64()
  end function relicore_angular_diameter_distance_between_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_angular_diameter_distance_between_mpc_s(universe, z1, z2, &
      out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z1, z2
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_angular_diameter_distance_between_mpc(universe, z1, z2, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_angular_diameter_distance_between_mpc', stat)
  end subroutine relicore_angular_diameter_distance_between_mpc_s

  ! Redshift at which the age of the universe equals age_gyr (inverse of relicore_age_gyr).
  !   universe: from relicore_universe_init
  !   age_gyr: age in Gyr, > 0, at most the age today
  ! Result: the redshift z, >= 0; NaN on failure.
  impure elemental function relicore_redshift_at_age_gyr(universe, age_gyr) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: age_gyr
    real(c_double) :: res
    if (c_redshift_at_age_gyr(universe, age_gyr, res) /= RELICORE_OK) res = nan64()
  end function relicore_redshift_at_age_gyr

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_redshift_at_age_gyr_s(universe, age_gyr, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: age_gyr
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_redshift_at_age_gyr(universe, age_gyr, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_redshift_at_age_gyr', stat)
  end subroutine relicore_redshift_at_age_gyr_s

  ! Redshift at which the lookback time equals lookback_gyr (inverse of relicore_lookback_time_gyr).
  !   universe: from relicore_universe_init
  !   lookback_gyr: lookback time in Gyr, >= 0, below the age today
  ! Result: the redshift z, >= 0; NaN on failure.
  impure elemental function relicore_redshift_at_lookback_time_gyr(universe, &
      lookback_gyr) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: lookback_gyr
    real(c_double) :: res
    if (c_redshift_at_lookback_time_gyr(universe, lookback_gyr, res) /= RELICORE_OK) res = nan64()
  end function relicore_redshift_at_lookback_time_gyr

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_redshift_at_lookback_time_gyr_s(universe, lookback_gyr, &
      out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: lookback_gyr
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_redshift_at_lookback_time_gyr(universe, lookback_gyr, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_redshift_at_lookback_time_gyr', stat)
  end subroutine relicore_redshift_at_lookback_time_gyr_s

  ! Redshift at which the line-of-sight comoving distance equals distance_mpc (inverse of
  ! relicore_comoving_distance_mpc).
  !   universe: from relicore_universe_init
  !   distance_mpc: comoving distance in Mpc, >= 0
  ! Result: the redshift z, >= 0; NaN on failure.
  impure elemental function relicore_redshift_at_comoving_distance_mpc(universe, &
      distance_mpc) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: distance_mpc
    real(c_double) :: res
    if (c_redshift_at_comoving_distance_mpc(universe, distance_mpc, res) /= RELICORE_OK) &
        res = nan64()
  end function relicore_redshift_at_comoving_distance_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_redshift_at_comoving_distance_mpc_s(universe, distance_mpc, &
      out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: distance_mpc
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_redshift_at_comoving_distance_mpc(universe, distance_mpc, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_redshift_at_comoving_distance_mpc', stat)
  end subroutine relicore_redshift_at_comoving_distance_mpc_s

  ! Redshift at which the luminosity distance equals distance_mpc (inverse of
  ! relicore_luminosity_distance_mpc). In a closed universe D_L need not grow monotonically; the
  ! root found in the bracket is returned.
  !   universe: from relicore_universe_init
  !   distance_mpc: luminosity distance in Mpc, >= 0
  ! Result: the redshift z, >= 0; NaN on failure.
  impure elemental function relicore_redshift_at_luminosity_distance_mpc(universe, &
      distance_mpc) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: distance_mpc
    real(c_double) :: res
    if (c_redshift_at_luminosity_distance_mpc(universe, distance_mpc, res) /= RELICORE_OK) &
        res = nan64()
  end function relicore_redshift_at_luminosity_distance_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_redshift_at_luminosity_distance_mpc_s(universe, &
      distance_mpc, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: distance_mpc
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_redshift_at_luminosity_distance_mpc(universe, distance_mpc, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_redshift_at_luminosity_distance_mpc', stat)
  end subroutine relicore_redshift_at_luminosity_distance_mpc_s

  ! Array form of relicore_dimensionless_hubble, one C call for the whole array: out(i) =
  ! relicore_dimensionless_hubble(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same
  ! size as redshifts (E = H(z)/H0, dimensionless). Failing elements are NaN, the others computed;
  ! stat is the first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ,
  ! every element NaN); an empty array still has its universe checked; without stat a failure stops
  ! with its message.
  subroutine relicore_dimensionless_hubble_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_dimensionless_hubble_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_dimensionless_hubble_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_dimensionless_hubble_array', stat)
  end subroutine relicore_dimensionless_hubble_array

  ! Array form of relicore_hubble_parameter_km_s_mpc, one C call for the whole array: out(i) =
  ! relicore_hubble_parameter_km_s_mpc(universe, redshifts(i)). redshifts: redshifts, >= 0; out:
  ! same size as redshifts (H(z) in km s-1 Mpc-1). Failing elements are NaN, the others computed;
  ! stat is the first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ,
  ! every element NaN); an empty array still has its universe checked; without stat a failure stops
  ! with its message.
  subroutine relicore_hubble_parameter_km_s_mpc_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_hubble_parameter_km_s_mpc_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_hubble_parameter_km_s_mpc_array(universe, redshifts, &
          size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_hubble_parameter_km_s_mpc_array', stat)
  end subroutine relicore_hubble_parameter_km_s_mpc_array

  ! Array form of relicore_omega_matter_at, one C call for the whole array: out(i) =
  ! relicore_omega_matter_at(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same size as
  ! redshifts (Omega_m(z)). Failing elements are NaN, the others computed; stat is the first failing
  ! element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element NaN); an
  ! empty array still has its universe checked; without stat a failure stops with its message.
  subroutine relicore_omega_matter_at_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_omega_matter_at_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_omega_matter_at_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_omega_matter_at_array', stat)
  end subroutine relicore_omega_matter_at_array

  ! Array form of relicore_omega_radiation_at, one C call for the whole array: out(i) =
  ! relicore_omega_radiation_at(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same size
  ! as redshifts (Omega_r(z)). Failing elements are NaN, the others computed; stat is the first
  ! failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element
  ! NaN); an empty array still has its universe checked; without stat a failure stops with its
  ! message.
  subroutine relicore_omega_radiation_at_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_omega_radiation_at_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_omega_radiation_at_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_omega_radiation_at_array', stat)
  end subroutine relicore_omega_radiation_at_array

  ! Array form of relicore_omega_dark_energy_at, one C call for the whole array: out(i) =
  ! relicore_omega_dark_energy_at(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same
  ! size as redshifts (Omega_de(z)). Failing elements are NaN, the others computed; stat is the
  ! first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every
  ! element NaN); an empty array still has its universe checked; without stat a failure stops with
  ! its message.
  subroutine relicore_omega_dark_energy_at_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_omega_dark_energy_at_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_omega_dark_energy_at_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_omega_dark_energy_at_array', stat)
  end subroutine relicore_omega_dark_energy_at_array

  ! Array form of relicore_omega_curvature_at, one C call for the whole array: out(i) =
  ! relicore_omega_curvature_at(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same size
  ! as redshifts (Omega_k(z)). Failing elements are NaN, the others computed; stat is the first
  ! failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element
  ! NaN); an empty array still has its universe checked; without stat a failure stops with its
  ! message.
  subroutine relicore_omega_curvature_at_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_omega_curvature_at_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_omega_curvature_at_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_omega_curvature_at_array', stat)
  end subroutine relicore_omega_curvature_at_array

  ! Array form of relicore_critical_density_kg_m3, one C call for the whole array: out(i) =
  ! relicore_critical_density_kg_m3(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same
  ! size as redshifts (rho_crit(z) in kg m-3). Failing elements are NaN, the others computed; stat
  ! is the first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every
  ! element NaN); an empty array still has its universe checked; without stat a failure stops with
  ! its message.
  subroutine relicore_critical_density_kg_m3_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_critical_density_kg_m3_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_critical_density_kg_m3_array(universe, redshifts, &
          size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_critical_density_kg_m3_array', stat)
  end subroutine relicore_critical_density_kg_m3_array

  ! Array form of relicore_cmb_temperature_at_k, one C call for the whole array: out(i) =
  ! relicore_cmb_temperature_at_k(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same
  ! size as redshifts (T0 (1+z) in K). Failing elements are NaN, the others computed; stat is the
  ! first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every
  ! element NaN); an empty array still has its universe checked; without stat a failure stops with
  ! its message.
  subroutine relicore_cmb_temperature_at_k_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_cmb_temperature_at_k_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_cmb_temperature_at_k_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_cmb_temperature_at_k_array', stat)
  end subroutine relicore_cmb_temperature_at_k_array

  ! Array form of relicore_comoving_distance_mpc, one C call for the whole array: out(i) =
  ! relicore_comoving_distance_mpc(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same
  ! size as redshifts (D_C in Mpc). Failing elements are NaN, the others computed; stat is the first
  ! failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element
  ! NaN); an empty array still has its universe checked; without stat a failure stops with its
  ! message.
  subroutine relicore_comoving_distance_mpc_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_comoving_distance_mpc_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_comoving_distance_mpc_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_comoving_distance_mpc_array', stat)
  end subroutine relicore_comoving_distance_mpc_array

  ! Array form of relicore_transverse_comoving_distance_mpc, one C call for the whole array: out(i)
  ! = relicore_transverse_comoving_distance_mpc(universe, redshifts(i)). redshifts: redshifts, >= 0;
  ! out: same size as redshifts (D_M in Mpc). Failing elements are NaN, the others computed; stat is
  ! the first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every
  ! element NaN); an empty array still has its universe checked; without stat a failure stops with
  ! its message.
  subroutine relicore_transverse_comoving_distance_mpc_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_transverse_comoving_distance_mpc_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_transverse_comoving_distance_mpc_array(universe, redshifts, &
          size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_transverse_comoving_distance_mpc_array', stat)
  end subroutine relicore_transverse_comoving_distance_mpc_array

  ! Array form of relicore_angular_diameter_distance_mpc, one C call for the whole array: out(i) =
  ! relicore_angular_diameter_distance_mpc(universe, redshifts(i)). redshifts: redshifts, >= 0; out:
  ! same size as redshifts (D_A in Mpc). Failing elements are NaN, the others computed; stat is the
  ! first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every
  ! element NaN); an empty array still has its universe checked; without stat a failure stops with
  ! its message.
  subroutine relicore_angular_diameter_distance_mpc_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_angular_diameter_distance_mpc_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_angular_diameter_distance_mpc_array(universe, redshifts, &
          size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_angular_diameter_distance_mpc_array', stat)
  end subroutine relicore_angular_diameter_distance_mpc_array

  ! Array form of relicore_luminosity_distance_mpc, one C call for the whole array: out(i) =
  ! relicore_luminosity_distance_mpc(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same
  ! size as redshifts (D_L in Mpc). Failing elements are NaN, the others computed; stat is the first
  ! failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element
  ! NaN); an empty array still has its universe checked; without stat a failure stops with its
  ! message.
  subroutine relicore_luminosity_distance_mpc_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_luminosity_distance_mpc_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_luminosity_distance_mpc_array(universe, redshifts, &
          size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_luminosity_distance_mpc_array', stat)
  end subroutine relicore_luminosity_distance_mpc_array

  ! Array form of relicore_distance_modulus, one C call for the whole array: out(i) =
  ! relicore_distance_modulus(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same size as
  ! redshifts (distance modulus in mag). Failing elements are NaN, the others computed; stat is the
  ! first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every
  ! element NaN); an empty array still has its universe checked; without stat a failure stops with
  ! its message.
  subroutine relicore_distance_modulus_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_distance_modulus_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_distance_modulus_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_distance_modulus_array', stat)
  end subroutine relicore_distance_modulus_array

  ! Array form of relicore_comoving_volume_gpc3, one C call for the whole array: out(i) =
  ! relicore_comoving_volume_gpc3(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same
  ! size as redshifts (V_C in Gpc3). Failing elements are NaN, the others computed; stat is the
  ! first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every
  ! element NaN); an empty array still has its universe checked; without stat a failure stops with
  ! its message.
  subroutine relicore_comoving_volume_gpc3_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_comoving_volume_gpc3_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_comoving_volume_gpc3_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_comoving_volume_gpc3_array', stat)
  end subroutine relicore_comoving_volume_gpc3_array

  ! Array form of relicore_differential_comoving_volume_mpc3_sr, one C call for the whole array:
  ! out(i) = relicore_differential_comoving_volume_mpc3_sr(universe, redshifts(i)). redshifts:
  ! redshifts, >= 0; out: same size as redshifts (dV_C/dz/dOmega in Mpc3 sr-1). Failing elements are
  ! NaN, the others computed; stat is the first failing element's code
  ! (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element NaN); an empty array still
  ! has its universe checked; without stat a failure stops with its message.
  subroutine relicore_differential_comoving_volume_mpc3_sr_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_differential_comoving_volume_mpc3_sr_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_differential_comoving_volume_mpc3_sr_array(universe, redshifts, &
          size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_differential_comoving_volume_mpc3_sr_array', stat)
  end subroutine relicore_differential_comoving_volume_mpc3_sr_array

  ! Array form of relicore_transverse_scale_kpc_per_arcsec, one C call for the whole array: out(i) =
  ! relicore_transverse_scale_kpc_per_arcsec(universe, redshifts(i)). redshifts: redshifts, >= 0;
  ! out: same size as redshifts (kpc per arcsec). Failing elements are NaN, the others computed;
  ! stat is the first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ,
  ! every element NaN); an empty array still has its universe checked; without stat a failure stops
  ! with its message.
  subroutine relicore_transverse_scale_kpc_per_arcsec_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_transverse_scale_kpc_per_arcsec_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_transverse_scale_kpc_per_arcsec_array(universe, redshifts, &
          size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_transverse_scale_kpc_per_arcsec_array', stat)
  end subroutine relicore_transverse_scale_kpc_per_arcsec_array

  ! Array form of relicore_lookback_time_gyr, one C call for the whole array: out(i) =
  ! relicore_lookback_time_gyr(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same size
  ! as redshifts (lookback time in Gyr). Failing elements are NaN, the others computed; stat is the
  ! first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every
  ! element NaN); an empty array still has its universe checked; without stat a failure stops with
  ! its message.
  subroutine relicore_lookback_time_gyr_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_lookback_time_gyr_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_lookback_time_gyr_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_lookback_time_gyr_array', stat)
  end subroutine relicore_lookback_time_gyr_array

  ! Array form of relicore_age_gyr, one C call for the whole array: out(i) =
  ! relicore_age_gyr(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same size as
  ! redshifts (age in Gyr). Failing elements are NaN, the others computed; stat is the first failing
  ! element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element NaN); an
  ! empty array still has its universe checked; without stat a failure stops with its message.
  subroutine relicore_age_gyr_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_age_gyr_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_age_gyr_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_age_gyr_array', stat)
  end subroutine relicore_age_gyr_array

  ! Array form of relicore_conformal_time_mpc, one C call for the whole array: out(i) =
  ! relicore_conformal_time_mpc(universe, redshifts(i)). redshifts: redshifts, >= 0; out: same size
  ! as redshifts (c eta in Mpc). Failing elements are NaN, the others computed; stat is the first
  ! failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element
  ! NaN); an empty array still has its universe checked; without stat a failure stops with its
  ! message.
  subroutine relicore_conformal_time_mpc_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_conformal_time_mpc_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_conformal_time_mpc_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_conformal_time_mpc_array', stat)
  end subroutine relicore_conformal_time_mpc_array

  ! Array form of relicore_redshift_at_age_gyr, one C call for the whole array: out(i) =
  ! relicore_redshift_at_age_gyr(universe, ages_gyr(i)). ages_gyr: ages in Gyr, > 0, at most the age
  ! today; out: same size as ages_gyr (redshifts z). Failing elements are NaN, the others computed;
  ! stat is the first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ,
  ! every element NaN); an empty array still has its universe checked; without stat a failure stops
  ! with its message.
  subroutine relicore_redshift_at_age_gyr_array(universe, ages_gyr, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: ages_gyr(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(ages_gyr)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(ages_gyr) == 0) then
      empty = 0
      code = c_redshift_at_age_gyr_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_redshift_at_age_gyr_array(universe, ages_gyr, size(ages_gyr, kind=c_size_t), out)
    end if
    call report(code, 'relicore_redshift_at_age_gyr_array', stat)
  end subroutine relicore_redshift_at_age_gyr_array

  ! Array form of relicore_redshift_at_lookback_time_gyr, one C call for the whole array: out(i) =
  ! relicore_redshift_at_lookback_time_gyr(universe, lookback_times_gyr(i)). lookback_times_gyr:
  ! lookback times in Gyr, >= 0, below the age today; out: same size as lookback_times_gyr
  ! (redshifts z). Failing elements are NaN, the others computed; stat is the first failing
  ! element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element NaN); an
  ! empty array still has its universe checked; without stat a failure stops with its message.
  subroutine relicore_redshift_at_lookback_time_gyr_array(universe, lookback_times_gyr, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: lookback_times_gyr(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(lookback_times_gyr)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(lookback_times_gyr) == 0) then
      empty = 0
      code = c_redshift_at_lookback_time_gyr_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_redshift_at_lookback_time_gyr_array(universe, lookback_times_gyr, &
          size(lookback_times_gyr, kind=c_size_t), out)
    end if
    call report(code, 'relicore_redshift_at_lookback_time_gyr_array', stat)
  end subroutine relicore_redshift_at_lookback_time_gyr_array

  ! Array form of relicore_redshift_at_comoving_distance_mpc, one C call for the whole array: out(i)
  ! = relicore_redshift_at_comoving_distance_mpc(universe, distances_mpc(i)). distances_mpc:
  ! comoving distances in Mpc, >= 0; out: same size as distances_mpc (redshifts z). Failing elements
  ! are NaN, the others computed; stat is the first failing element's code
  ! (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element NaN); an empty array still
  ! has its universe checked; without stat a failure stops with its message.
  subroutine relicore_redshift_at_comoving_distance_mpc_array(universe, distances_mpc, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: distances_mpc(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(distances_mpc)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(distances_mpc) == 0) then
      empty = 0
      code = c_redshift_at_comoving_distance_mpc_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_redshift_at_comoving_distance_mpc_array(universe, distances_mpc, &
          size(distances_mpc, kind=c_size_t), out)
    end if
    call report(code, 'relicore_redshift_at_comoving_distance_mpc_array', stat)
  end subroutine relicore_redshift_at_comoving_distance_mpc_array

  ! Array form of relicore_redshift_at_luminosity_distance_mpc, one C call for the whole array:
  ! out(i) = relicore_redshift_at_luminosity_distance_mpc(universe, distances_mpc(i)).
  ! distances_mpc: luminosity distances in Mpc, >= 0; out: same size as distances_mpc (redshifts z).
  ! Failing elements are NaN, the others computed; stat is the first failing element's code
  ! (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element NaN); an empty array still
  ! has its universe checked; without stat a failure stops with its message.
  subroutine relicore_redshift_at_luminosity_distance_mpc_array(universe, distances_mpc, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: distances_mpc(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(distances_mpc)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(distances_mpc) == 0) then
      empty = 0
      code = c_redshift_at_luminosity_distance_mpc_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_redshift_at_luminosity_distance_mpc_array(universe, distances_mpc, &
          size(distances_mpc, kind=c_size_t), out)
    end if
    call report(code, 'relicore_redshift_at_luminosity_distance_mpc_array', stat)
  end subroutine relicore_redshift_at_luminosity_distance_mpc_array

  ! Hubble distance c/H0 of the universe.
  !   universe: from relicore_universe_init
  ! Result: D_H in Mpc; NaN on failure.
  impure elemental function relicore_hubble_distance_mpc(universe) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double) :: res
    if (c_hubble_distance_mpc(universe, res) /= RELICORE_OK) res = nan64()
  end function relicore_hubble_distance_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_hubble_distance_mpc_s(universe, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_hubble_distance_mpc(universe, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_hubble_distance_mpc', stat)
  end subroutine relicore_hubble_distance_mpc_s

  ! Hubble time 1/H0 of the universe (Julian years).
  !   universe: from relicore_universe_init
  ! Result: t_H in Gyr; NaN on failure.
  impure elemental function relicore_hubble_time_gyr(universe) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double) :: res
    if (c_hubble_time_gyr(universe, res) /= RELICORE_OK) res = nan64()
  end function relicore_hubble_time_gyr

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_hubble_time_gyr_s(universe, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_hubble_time_gyr(universe, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_hubble_time_gyr', stat)
  end subroutine relicore_hubble_time_gyr_s

  ! Radiation density parameter today: photons plus massless neutrino species.
  !   universe: from relicore_universe_init
  ! Result: Omega_r; NaN on failure.
  impure elemental function relicore_omega_radiation(universe) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double) :: res
    if (c_omega_radiation(universe, res) /= RELICORE_OK) res = nan64()
  end function relicore_omega_radiation

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_omega_radiation_s(universe, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_omega_radiation(universe, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_omega_radiation', stat)
  end subroutine relicore_omega_radiation_s

  ! Dark-energy density parameter today, 1 - Omega_m - Omega_r - Omega_k.
  !   universe: from relicore_universe_init
  ! Result: Omega_de; NaN on failure.
  impure elemental function relicore_omega_dark_energy(universe) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double) :: res
    if (c_omega_dark_energy(universe, res) /= RELICORE_OK) res = nan64()
  end function relicore_omega_dark_energy

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_omega_dark_energy_s(universe, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_omega_dark_energy(universe, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_omega_dark_energy', stat)
  end subroutine relicore_omega_dark_energy_s

  ! Redshift of matter-radiation equality, Omega_cb/Omega_r,all - 1 (all N_eff neutrino species
  ! counted as massless); fails (RELICORE_ERROR_OUT_OF_DOMAIN) without radiation.
  !   universe: from relicore_universe_init
  ! Result: z_eq; NaN on failure.
  impure elemental function relicore_matter_radiation_equality_redshift(universe) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double) :: res
    if (c_matter_radiation_equality_redshift(universe, res) /= RELICORE_OK) res = nan64()
  end function relicore_matter_radiation_equality_redshift

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_matter_radiation_equality_redshift_s(universe, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_matter_radiation_equality_redshift(universe, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_matter_radiation_equality_redshift', stat)
  end subroutine relicore_matter_radiation_equality_redshift_s

  ! ================================================================ decoupling

  ! Ionised fraction x_e = n_e/n_H in Saha equilibrium at z: hydrogen and both helium stages in
  ! equilibrium with the radiation at T0 (1+z), coupled through the electron density (above 1
  ! while helium is ionised). Fails with RELICORE_ERROR_INVALID_PARAMETER for a universe without
  ! baryons or without radiation.
  !   universe: from relicore_universe_init (Omega_b > 0, T0 > 0)
  !   z: redshift, finite, 0 <= z <= 1e8
  ! Result: x_e, dimensionless; NaN on failure.
  impure elemental function relicore_saha_ionized_fraction(universe, z) result(res)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_saha_ionized_fraction(universe, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_saha_ionized_fraction

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_saha_ionized_fraction_s(universe, z, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_saha_ionized_fraction(universe, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_saha_ionized_fraction', stat)
  end subroutine relicore_saha_ionized_fraction_s

  ! Array form of relicore_saha_ionized_fraction, one C call for the whole array: out(i) =
  ! relicore_saha_ionized_fraction(universe, redshifts(i)). redshifts: 0 <= z <= 1e8; out: same
  ! size as redshifts (x_e). Failing elements are NaN, the others computed; stat is the first
  ! failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element
  ! NaN); an empty array still has its universe checked; without stat a failure stops with its
  ! message.
  subroutine relicore_saha_ionized_fraction_array(universe, redshifts, out, stat)
    type(relicore_universe), intent(in) :: universe
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_saha_ionized_fraction_array(universe, empty, 0_c_size_t, empty_out)
    else
      code = c_saha_ionized_fraction_array(universe, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_saha_ionized_fraction_array', stat)
  end subroutine relicore_saha_ionized_fraction_array

  ! Redshift of last scattering by the fit of Hu & Sugiyama 1996 (ApJ 471, 542; about 1 %).
  !   omega_baryon_h2: Omega_b h^2, > 0
  !   omega_matter_h2: Omega_m h^2, > 0
  ! Result: z*, dimensionless; NaN on failure.
  impure elemental function relicore_last_scattering_redshift_fit(omega_baryon_h2, &
      omega_matter_h2) result(res)
    real(c_double), intent(in) :: omega_baryon_h2, omega_matter_h2
    real(c_double) :: res
    if (c_last_scattering_redshift_fit(omega_baryon_h2, omega_matter_h2, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_last_scattering_redshift_fit

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_last_scattering_redshift_fit_s(omega_baryon_h2, &
      omega_matter_h2, out, stat)
    real(c_double), intent(in) :: omega_baryon_h2, omega_matter_h2
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_last_scattering_redshift_fit(omega_baryon_h2, omega_matter_h2, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_last_scattering_redshift_fit', stat)
  end subroutine relicore_last_scattering_redshift_fit_s

  ! Array form of relicore_last_scattering_redshift_fit, one C call for the whole array: out(i)
  ! at omega_baryon_h2(i) and one omega_matter_h2 (both > 0); out: same size as omega_baryon_h2
  ! (z*). Failing elements are NaN, the others computed; stat is the first failing element's
  ! code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a failure stops
  ! with its message.
  subroutine relicore_last_scattering_redshift_fit_array(omega_baryon_h2, omega_matter_h2, &
      out, stat)
    real(c_double), intent(in) :: omega_baryon_h2(:)
    real(c_double), intent(in) :: omega_matter_h2
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(omega_baryon_h2)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(omega_baryon_h2) == 0) then
      code = RELICORE_OK
    else
      code = c_last_scattering_redshift_fit_array(omega_baryon_h2, &
          size(omega_baryon_h2, kind=c_size_t), omega_matter_h2, out)
    end if
    call report(code, 'relicore_last_scattering_redshift_fit_array', stat)
  end subroutine relicore_last_scattering_redshift_fit_array

  ! Redshift of the drag epoch by the fit of Eisenstein & Hu 1998 (ApJ 496, 605; a few per
  ! cent).
  !   omega_baryon_h2: Omega_b h^2, > 0
  !   omega_matter_h2: Omega_m h^2, > 0
  ! Result: z_drag, dimensionless; NaN on failure.
  impure elemental function relicore_drag_redshift_fit(omega_baryon_h2, omega_matter_h2) result(res)
    real(c_double), intent(in) :: omega_baryon_h2, omega_matter_h2
    real(c_double) :: res
    if (c_drag_redshift_fit(omega_baryon_h2, omega_matter_h2, res) /= RELICORE_OK) res = nan64()
  end function relicore_drag_redshift_fit

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_drag_redshift_fit_s(omega_baryon_h2, omega_matter_h2, &
      out, stat)
    real(c_double), intent(in) :: omega_baryon_h2, omega_matter_h2
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_drag_redshift_fit(omega_baryon_h2, omega_matter_h2, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_drag_redshift_fit', stat)
  end subroutine relicore_drag_redshift_fit_s

  ! Array form of relicore_drag_redshift_fit, one C call for the whole array: out(i) at
  ! omega_baryon_h2(i) and one omega_matter_h2 (both > 0); out: same size as omega_baryon_h2
  ! (z_drag). Failing elements are NaN, the others computed; stat is the first failing element's
  ! code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ); without stat a failure stops
  ! with its message.
  subroutine relicore_drag_redshift_fit_array(omega_baryon_h2, omega_matter_h2, out, stat)
    real(c_double), intent(in) :: omega_baryon_h2(:)
    real(c_double), intent(in) :: omega_matter_h2
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    if (size(out) /= size(omega_baryon_h2)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(omega_baryon_h2) == 0) then
      code = RELICORE_OK
    else
      code = c_drag_redshift_fit_array(omega_baryon_h2, &
          size(omega_baryon_h2, kind=c_size_t), omega_matter_h2, out)
    end if
    call report(code, 'relicore_drag_redshift_fit_array', stat)
  end subroutine relicore_drag_redshift_fit_array

  ! The default options of a thermal history: no reionisation (reionization = 0,
  ! reionization_redshift NaN, unset), highest_redshift = 1e4.
  ! Result: type(relicore_thermal_history_options).
  function relicore_thermal_history_options_default() result(options)
    type(relicore_thermal_history_options) :: options
    call report(c_thermal_history_options_default(options), &
        'relicore_thermal_history_options_default')
  end function relicore_thermal_history_options_default

  ! Computes the recombination and thermal history of a universe into out (Peebles atom, helium
  ! in Saha equilibrium, Compton-coupled matter temperature, optional tanh reionisation; of the
  ! order of milliseconds): compute once, then pass it to every query. stat = RELICORE_OK,
  ! RELICORE_ERROR_INVALID_STRUCT (universe not initialised), RELICORE_ERROR_INVALID_PARAMETER
  ! (a universe without baryons or radiation), RELICORE_ERROR_OUT_OF_DOMAIN (a reionization
  ! switch other than 0 or 1, z_re above 100, a highest redshift below 3000),
  ! RELICORE_ERROR_NON_FINITE, RELICORE_ERROR_NEGATIVE (z_re < 0),
  ! RELICORE_ERROR_CAPACITY_TOO_SMALL (a highest redshift above 1e4) or
  ! RELICORE_ERROR_NO_CONVERGENCE; on failure out is cleared and every query refuses it
  ! (RELICORE_ERROR_INVALID_STRUCT). Without stat a failure stops with the message.
  subroutine relicore_thermal_history_compute(universe, options, out, stat)
    type(relicore_universe), intent(in) :: universe
    type(relicore_thermal_history_options), intent(in) :: options
    type(relicore_thermal_history), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    call report(c_thermal_history_compute(universe, options, out), &
        'relicore_thermal_history_compute', stat)
  end subroutine relicore_thermal_history_compute

  ! Ionised fraction x_e = n_e/n_H of the history at z (reionisation included when it was
  ! requested; above 1 while helium is ionised).
  !   history: from relicore_thermal_history_compute
  !   z: redshift, finite, 0 <= z <= the highest redshift of the history
  ! Result: x_e, dimensionless; NaN on failure.
  impure elemental function relicore_ionized_fraction(history, z) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_ionized_fraction(history, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_ionized_fraction

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_ionized_fraction_s(history, z, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_ionized_fraction(history, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_ionized_fraction', stat)
  end subroutine relicore_ionized_fraction_s

  ! Matter (gas) temperature T_m of the history at z (no reionisation heating).
  !   history: from relicore_thermal_history_compute
  !   z: redshift, finite, 0 <= z <= the highest redshift of the history
  ! Result: T_m in K; NaN on failure.
  impure elemental function relicore_matter_temperature_k(history, z) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_matter_temperature_k(history, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_matter_temperature_k

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_matter_temperature_k_s(history, z, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_matter_temperature_k(history, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_matter_temperature_k', stat)
  end subroutine relicore_matter_temperature_k_s

  ! Thomson optical depth from today to z (reionisation included when it was requested).
  !   history: from relicore_thermal_history_compute
  !   z: redshift, finite, 0 <= z <= the highest redshift of the history
  ! Result: tau, dimensionless; NaN on failure.
  impure elemental function relicore_optical_depth(history, z) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_optical_depth(history, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_optical_depth

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_optical_depth_s(history, z, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_optical_depth(history, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_optical_depth', stat)
  end subroutine relicore_optical_depth_s

  ! Visibility function per unit conformal distance, g = -dtau/deta exp(-tau), at z.
  !   history: from relicore_thermal_history_compute
  !   z: redshift, finite, 0 <= z <= the highest redshift of the history
  ! Result: g in Mpc-1; NaN on failure.
  impure elemental function relicore_visibility(history, z) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_visibility(history, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_visibility

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_visibility_s(history, z, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_visibility(history, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_visibility', stat)
  end subroutine relicore_visibility_s

  ! Comoving sound horizon r_s(z) of the photon-baryon fluid.
  !   history: from relicore_thermal_history_compute
  !   z: redshift, finite and >= 0 (any z)
  ! Result: r_s in Mpc; NaN on failure.
  impure elemental function relicore_sound_horizon_mpc(history, z) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: z
    real(c_double) :: res
    if (c_sound_horizon_mpc(history, z, res) /= RELICORE_OK) res = nan64()
  end function relicore_sound_horizon_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_sound_horizon_mpc_s(history, z, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: z
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_sound_horizon_mpc(history, z, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_sound_horizon_mpc', stat)
  end subroutine relicore_sound_horizon_mpc_s

  ! Array form of relicore_ionized_fraction, one C call for the whole array: out(i) =
  ! relicore_ionized_fraction(history, redshifts(i)). redshifts: finite, 0 <= z <= the highest
  ! redshift of the history; out: same size as redshifts (x_e, dimensionless). Failing elements
  ! are NaN, the others computed; stat is the first failing element's code
  ! (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element NaN); an empty array
  ! still has its history checked; without stat a failure stops with its message.
  subroutine relicore_ionized_fraction_array(history, redshifts, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_ionized_fraction_array(history, empty, 0_c_size_t, empty_out)
    else
      code = c_ionized_fraction_array(history, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_ionized_fraction_array', stat)
  end subroutine relicore_ionized_fraction_array

  ! Array form of relicore_matter_temperature_k, one C call for the whole array: out(i) =
  ! relicore_matter_temperature_k(history, redshifts(i)). redshifts: finite, 0 <= z <= the
  ! highest redshift of the history; out: same size as redshifts (T_m in K). Failing elements
  ! are NaN, the others computed; stat is the first failing element's code
  ! (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element NaN); an empty array
  ! still has its history checked; without stat a failure stops with its message.
  subroutine relicore_matter_temperature_k_array(history, redshifts, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_matter_temperature_k_array(history, empty, 0_c_size_t, empty_out)
    else
      code = c_matter_temperature_k_array(history, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_matter_temperature_k_array', stat)
  end subroutine relicore_matter_temperature_k_array

  ! Array form of relicore_optical_depth, one C call for the whole array: out(i) =
  ! relicore_optical_depth(history, redshifts(i)). redshifts: finite, 0 <= z <= the highest
  ! redshift of the history; out: same size as redshifts (tau, dimensionless). Failing elements
  ! are NaN, the others computed; stat is the first failing element's code
  ! (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element NaN); an empty array
  ! still has its history checked; without stat a failure stops with its message.
  subroutine relicore_optical_depth_array(history, redshifts, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_optical_depth_array(history, empty, 0_c_size_t, empty_out)
    else
      code = c_optical_depth_array(history, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_optical_depth_array', stat)
  end subroutine relicore_optical_depth_array

  ! Array form of relicore_visibility, one C call for the whole array: out(i) =
  ! relicore_visibility(history, redshifts(i)). redshifts: finite, 0 <= z <= the highest
  ! redshift of the history; out: same size as redshifts (g in Mpc-1). Failing elements are NaN,
  ! the others computed; stat is the first failing element's code
  ! (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ, every element NaN); an empty array
  ! still has its history checked; without stat a failure stops with its message.
  subroutine relicore_visibility_array(history, redshifts, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_visibility_array(history, empty, 0_c_size_t, empty_out)
    else
      code = c_visibility_array(history, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_visibility_array', stat)
  end subroutine relicore_visibility_array

  ! Array form of relicore_sound_horizon_mpc, one C call for the whole array: out(i) =
  ! relicore_sound_horizon_mpc(history, redshifts(i)). redshifts: finite and >= 0 (any z); out:
  ! same size as redshifts (r_s in Mpc). Failing elements are NaN, the others computed; stat is
  ! the first failing element's code (RELICORE_ERROR_LENGTH_MISMATCH when the sizes differ,
  ! every element NaN); an empty array still has its history checked; without stat a failure
  ! stops with its message.
  subroutine relicore_sound_horizon_mpc_array(history, redshifts, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(in) :: redshifts(:)
    real(c_double), intent(out) :: out(:)
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    real(c_double) :: empty(1), empty_out(1)
    if (size(out) /= size(redshifts)) then
      out = nan64()
      code = RELICORE_ERROR_LENGTH_MISMATCH
    else if (size(redshifts) == 0) then
      empty = 0
      code = c_sound_horizon_mpc_array(history, empty, 0_c_size_t, empty_out)
    else
      code = c_sound_horizon_mpc_array(history, redshifts, size(redshifts, kind=c_size_t), out)
    end if
    call report(code, 'relicore_sound_horizon_mpc_array', stat)
  end subroutine relicore_sound_horizon_mpc_array

  ! Redshift of last scattering z*, where the Thomson optical depth (reionisation excluded)
  ! reaches 1.
  !   history: from relicore_thermal_history_compute
  ! Result: z*; NaN on failure.
  impure elemental function relicore_last_scattering_redshift(history) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double) :: res
    if (c_last_scattering_redshift(history, res) /= RELICORE_OK) res = nan64()
  end function relicore_last_scattering_redshift

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_last_scattering_redshift_s(history, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_last_scattering_redshift(history, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_last_scattering_redshift', stat)
  end subroutine relicore_last_scattering_redshift_s

  ! Redshift of the drag epoch, where the baryon-drag optical depth reaches 1.
  !   history: from relicore_thermal_history_compute
  ! Result: z_drag; NaN on failure.
  impure elemental function relicore_drag_redshift(history) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double) :: res
    if (c_drag_redshift(history, res) /= RELICORE_OK) res = nan64()
  end function relicore_drag_redshift

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_drag_redshift_s(history, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_drag_redshift(history, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_drag_redshift', stat)
  end subroutine relicore_drag_redshift_s

  ! Comoving sound horizon at last scattering r_s(z*).
  !   history: from relicore_thermal_history_compute
  ! Result: r_s(z*) in Mpc; NaN on failure.
  impure elemental function relicore_sound_horizon_last_scattering_mpc(history) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double) :: res
    if (c_sound_horizon_last_scattering_mpc(history, res) /= RELICORE_OK) res = nan64()
  end function relicore_sound_horizon_last_scattering_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_sound_horizon_last_scattering_mpc_s(history, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_sound_horizon_last_scattering_mpc(history, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_sound_horizon_last_scattering_mpc', stat)
  end subroutine relicore_sound_horizon_last_scattering_mpc_s

  ! Comoving sound horizon at the drag epoch r_s(z_drag).
  !   history: from relicore_thermal_history_compute
  ! Result: r_s(z_drag) in Mpc; NaN on failure.
  impure elemental function relicore_sound_horizon_drag_mpc(history) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double) :: res
    if (c_sound_horizon_drag_mpc(history, res) /= RELICORE_OK) res = nan64()
  end function relicore_sound_horizon_drag_mpc

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_sound_horizon_drag_mpc_s(history, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_sound_horizon_drag_mpc(history, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_sound_horizon_drag_mpc', stat)
  end subroutine relicore_sound_horizon_drag_mpc_s

  ! Angular scale of the sound horizon at last scattering theta* = r_s(z*)/D_M(z*).
  !   history: from relicore_thermal_history_compute
  ! Result: theta* in radians; NaN on failure.
  impure elemental function relicore_angular_scale_last_scattering(history) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double) :: res
    if (c_angular_scale_last_scattering(history, res) /= RELICORE_OK) res = nan64()
  end function relicore_angular_scale_last_scattering

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_angular_scale_last_scattering_s(history, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_angular_scale_last_scattering(history, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_angular_scale_last_scattering', stat)
  end subroutine relicore_angular_scale_last_scattering_s

  ! Age of the universe at last scattering.
  !   history: from relicore_thermal_history_compute
  ! Result: t(z*) in years (Julian); NaN on failure.
  impure elemental function relicore_age_at_last_scattering_yr(history) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double) :: res
    if (c_age_at_last_scattering_yr(history, res) /= RELICORE_OK) res = nan64()
  end function relicore_age_at_last_scattering_yr

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_age_at_last_scattering_yr_s(history, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_age_at_last_scattering_yr(history, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_age_at_last_scattering_yr', stat)
  end subroutine relicore_age_at_last_scattering_yr_s

  ! Radiation temperature at last scattering T0 (1 + z*).
  !   history: from relicore_thermal_history_compute
  ! Result: T(z*) in K; NaN on failure.
  impure elemental function relicore_temperature_at_last_scattering_k(history) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double) :: res
    if (c_temperature_at_last_scattering_k(history, res) /= RELICORE_OK) res = nan64()
  end function relicore_temperature_at_last_scattering_k

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_temperature_at_last_scattering_k_s(history, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_temperature_at_last_scattering_k(history, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_temperature_at_last_scattering_k', stat)
  end subroutine relicore_temperature_at_last_scattering_k_s

  ! Redshift of the peak of the visibility function (per conformal time) at recombination.
  !   history: from relicore_thermal_history_compute
  ! Result: the redshift of the peak; NaN on failure.
  impure elemental function relicore_visibility_peak_redshift(history) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double) :: res
    if (c_visibility_peak_redshift(history, res) /= RELICORE_OK) res = nan64()
  end function relicore_visibility_peak_redshift

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_visibility_peak_redshift_s(history, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_visibility_peak_redshift(history, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_visibility_peak_redshift', stat)
  end subroutine relicore_visibility_peak_redshift_s

  ! Thermal decoupling: the highest redshift where T_m/T_r = 0.99.
  !   history: from relicore_thermal_history_compute
  ! Result: the redshift; NaN on failure.
  impure elemental function relicore_thermal_decoupling_redshift(history) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double) :: res
    if (c_thermal_decoupling_redshift(history, res) /= RELICORE_OK) res = nan64()
  end function relicore_thermal_decoupling_redshift

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_thermal_decoupling_redshift_s(history, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_thermal_decoupling_redshift(history, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_thermal_decoupling_redshift', stat)
  end subroutine relicore_thermal_decoupling_redshift_s

  ! Thomson optical depth of reionisation (0 without reionisation).
  !   history: from relicore_thermal_history_compute
  ! Result: tau_reion; NaN on failure.
  impure elemental function relicore_reionization_optical_depth(history) result(res)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double) :: res
    if (c_reionization_optical_depth(history, res) /= RELICORE_OK) res = nan64()
  end function relicore_reionization_optical_depth

  ! Status form: out = the result (NaN on failure), stat = RELICORE_OK or RELICORE_ERROR_*;
  ! without stat a failure stops with its message.
  impure elemental subroutine relicore_reionization_optical_depth_s(history, out, stat)
    type(relicore_thermal_history), intent(in) :: history
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = c_reionization_optical_depth(history, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_reionization_optical_depth', stat)
  end subroutine relicore_reionization_optical_depth_s

end module relicore
