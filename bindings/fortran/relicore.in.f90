!! Template of bindings/fortran/relicore.f90, kept by hand. `python3 bindings/generate.py --write`
!! copies it and replaces each `!@ <marker>` line with what bindings/gen/fortran_face.py builds
!! from bindings/functions.toml and the core's rustdoc: the physical constants of src/constants.rs,
!! the coverage rows of the table's functions, their public statement, their bind(C) interfaces
!! and their wrappers. What stays here is what the table cannot describe: the module header,
!! kinds, the status codes and storage sizes, types, the status message and version, the report
!! and NaN helpers, the calibration and response-table procedures, and the construction of
!! universes and thermal histories. Lines starting with `!!` are not copied. A block between
!! `!@ twin` and `!@ end twin` is written twice, the second time as its real(c_float) twin (the
!! rule is in fortran_face.py); `!@64 ` and `!@32 ` start lines of only one of the two copies.
! relicore: the Fortran face of relicore (blackbody radiometry, the cosmological background and
! decoupling), a thin binding of the C ABI declared in include/relicore.h. Physics lives only in
! the Rust core; this module binds the C functions, converts, checks sizes and turns status
! codes into NaN, a stat argument or a stop. Build with any Fortran 2018 compiler
! (gfortran -std=f2018) and link librelicore.a (and -lm):
!     gfortran -std=f2018 -c relicore.f90
!     gfortran prog.f90 relicore.o /path/to/librelicore.a -lm
!
! Conventions (the same in every face; the C side is described in include/relicore.h)
! * Units are SI (m, Hz, m-1, K, W, sr) unless the name says otherwise; kinds are those of
!   iso_c_binding: real(c_double), real(c_float) for the _f32 twins, integer(c_int32_t) status.
!   `use relicore` makes c_double, c_float, c_int, c_int32_t, c_int64_t and c_size_t available.
! * Every C function relicore_<name> has Fortran wrappers with the same words:
!     relicore_<name>(...)                  an elemental function: the result, NaN on failure;
!     call relicore_<name>_s(..., out, stat) the status form, an elemental subroutine: out is
!                                           the result (NaN on failure), stat the status code
!                                           (RELICORE_OK or a negative RELICORE_ERROR_*);
!                                           when stat is absent a failure stops the program
!                                           (error stop) with the routine name and message;
!     call relicore_<name>_array(x, ..., out, stat)   the C array forms (one C call for a
!                                           whole array; out the same size as x; failing
!                                           elements NaN, stat = the first failing element's
!                                           code, RELICORE_ERROR_LENGTH_MISMATCH with every
!                                           element NaN when the sizes differ; an empty array
!                                           is RELICORE_OK, but its universe or history is
!                                           still checked); without stat a failure stops;
!     relicore_<name>_f32 / _f32_s / _array_f32       the single-precision twins.
!   Arguments keep the names (and so the keywords) of the C prototypes, in the same order.
!   The stop message is "<routine>: <status message> (status <code>)", <routine> the C
!   function's name (relicore_<name>, also for the _s form).
! * Above each function's wrappers: what it computes (the first paragraph of the core's
!   documentation, in src/), its arguments and result with units and domain, and its forms.
!   Accuracy, errors and references are in the core's documentation and include/relicore.h.
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
! * Growth: a type(relicore_linear_growth) and a type(relicore_linear_power_spectrum) of 131080
!   bytes each (keep them in a module, a derived type or an allocatable, not as local variables
!   of a small stack), computed once with
!       call relicore_linear_growth_compute(universe, growth, stat)
!       options = relicore_linear_power_spectrum_options_default()  ! then set value and
!       options%value = 2.1d-9; options%spectral_index = 0.965d0    ! spectral_index
!       call relicore_linear_power_spectrum_compute(growth, options, spectrum, stat)
!   and passed first to their queries: d = relicore_growth_factor(growth, z),
!   pk = relicore_linear_power_spectrum_mpc3(spectrum, k, z), s = relicore_sigma8(spectrum).
!   The BAO distances take the universe first, the leapfrog factors the growth. Units: k in Mpc-1, R in
!   Mpc, P in Mpc3 (no hidden h), times in Gyr.
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
!   relicore_thermal_history_options_default                      function
!   relicore_thermal_history_compute                              subroutine (optional stat)
!   relicore_linear_growth_compute                                subroutine (optional stat)
!   relicore_linear_power_spectrum_options_default                function
!   relicore_linear_power_spectrum_compute                        subroutine (optional stat)
!@ coverage
module relicore
  use, intrinsic :: iso_c_binding, only: c_double, c_float, c_int, c_int32_t, c_int64_t, &
      c_size_t, c_char, c_ptr, c_null_char, c_associated, c_f_pointer
  use, intrinsic :: ieee_arithmetic, only: ieee_value, ieee_quiet_nan
  implicit none
  private

  ! The kinds of iso_c_binding that a caller declares its arguments and results with, re-exported
  ! so that `use relicore` alone compiles `real(c_double) :: b` or `1.0_c_double`. They are the
  ! intrinsic module's own entities: a program that also has `use, intrinsic :: iso_c_binding`
  ! sees the same names without conflict.
  public :: c_double, c_float, c_int, c_int32_t, c_int64_t, c_size_t

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
  ! Words of storage in type(relicore_linear_growth) and type(relicore_linear_power_spectrum).
  integer(c_int32_t), parameter, public :: RELICORE_LINEAR_GROWTH_STORAGE_WORDS = 16384_c_int32_t
  integer(c_int32_t), parameter, public :: &
      RELICORE_LINEAR_POWER_SPECTRUM_STORAGE_WORDS = 16384_c_int32_t
  ! The switches of type(relicore_linear_power_spectrum_options).
  integer(c_int32_t), parameter, public :: RELICORE_TRANSFER_BARYON_OSCILLATIONS = 0_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_TRANSFER_NO_WIGGLE = 1_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_NORMALISATION_SCALAR_AMPLITUDE = 0_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_NORMALISATION_SIGMA8 = 1_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_VERSION_MAJOR = 0_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_VERSION_MINOR = 1_c_int32_t
  integer(c_int32_t), parameter, public :: RELICORE_VERSION_PATCH = 0_c_int32_t
  ! The physical constants of src/constants.rs (generated).
!@ constants

  ! ---------------------------------------------------------------- public procedures
  ! Those written here; the table's functions follow (generated).
  public :: relicore_status_message, relicore_version, relicore_two_load_calibration, &
      relicore_two_load_calibration_s, relicore_calibrated_temperature, &
      relicore_calibrated_temperature_s, relicore_calibrated_brightness_temperature, &
      relicore_calibrated_brightness_temperature_s, relicore_two_load_calibration_f32, &
      relicore_two_load_calibration_f32_s, relicore_calibrated_temperature_f32, &
      relicore_calibrated_temperature_f32_s, relicore_calibrated_brightness_temperature_f32, &
      relicore_calibrated_brightness_temperature_f32_s, relicore_response_weighted_radiance, &
      relicore_response_weighted_radiance_s, relicore_response_weighted_radiance_f32, &
      relicore_response_weighted_radiance_f32_s, &
      relicore_temperature_from_response_weighted_radiance, &
      relicore_temperature_from_response_weighted_radiance_s, &
      relicore_temperature_from_response_weighted_radiance_f32, &
      relicore_temperature_from_response_weighted_radiance_f32_s
  public :: relicore_universe_parameters_default, relicore_universe_init, &
      relicore_universe_check_parameters, relicore_universe_get_parameters, &
      relicore_universe_get_parameters_s, relicore_thermal_history_options_default, &
      relicore_thermal_history_compute
  public :: relicore_linear_growth_compute, relicore_linear_power_spectrum_options_default, &
      relicore_linear_power_spectrum_compute
!@ public
  ! The hand-kept parts (bindings/fortran/parts/*.f90).
!@ parts public
  ! ---------------------------------------------------------------- types
!@ twin
  ! struct relicore_two_load_calibration { double frequency_hz; double gain; double offset; };
!@64   ! The gain and offset of a two-load calibration at one frequency: reading = gain * J +
!@64   ! offset, J the Rayleigh-Jeans brightness temperature in K. A plain value the caller owns.
  type, bind(C), public :: relicore_two_load_calibration
    real(c_double) :: frequency_hz  ! channel frequency in Hz
    real(c_double) :: gain          ! reading units per K of brightness temperature J
    real(c_double) :: offset        ! reading units (the reading for J = 0)
  end type relicore_two_load_calibration

!@ end twin
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
  !     double highest_redshift; double helium_reionization_redshift;
  !     double helium_reionization_width; };
  ! The options of a thermal history: fill it with relicore_thermal_history_options_default()
  ! (no reionisation, reionization_redshift NaN (unset), highest_redshift 1e4, helium's second
  ! reionisation at z = 3.5 with width 0.5, Planck Collaboration 2020, A&A 641, A6, Sect. 3.3,
  ! from memory), change what differs, then call relicore_thermal_history_compute.
  type, bind(C), public :: relicore_thermal_history_options
    integer(c_int32_t) :: reionization       ! 0: none; 1: tanh reionisation at
                                             ! reionization_redshift (any other value:
                                             ! RELICORE_ERROR_OUT_OF_DOMAIN)
    real(c_double) :: reionization_redshift  ! z_re, 0 <= z_re <= 100 (used when reionization = 1)
    real(c_double) :: highest_redshift       ! top of the table, 3000 <= z <= 1e4 (above 1e4:
                                             ! RELICORE_ERROR_CAPACITY_TOO_SMALL)
    real(c_double) :: helium_reionization_redshift  ! centre of helium's second reionisation
                                             ! tanh in z, 0 <= z <= 20 (used with reionisation)
    real(c_double) :: helium_reionization_width     ! its width in z, 0.1 <= width <= 10
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

  ! struct relicore_linear_growth { uint64_t tag;
  !     uint64_t storage[RELICORE_LINEAR_GROWTH_STORAGE_WORDS]; };
  ! A computed linear growth of one universe (D_u and f on a table in the scale factor, with a
  ! copy of the universe), built by relicore_linear_growth_compute and passed to its queries. A
  ! plain value of 131080 bytes owned by the caller: keep it in a module, a derived type or an
  ! allocatable rather than as a local variable on a small stack; copy it by assignment; read it
  ! from any number of threads. The tag starts at 0: a growth never computed (or whose compute
  ! failed) is refused with RELICORE_ERROR_INVALID_STRUCT.
  type, bind(C), public :: relicore_linear_growth
    integer(c_int64_t) :: tag = 0_c_int64_t                                ! private
    integer(c_int64_t) :: storage(RELICORE_LINEAR_GROWTH_STORAGE_WORDS)    ! private
  end type relicore_linear_growth

  ! struct relicore_linear_power_spectrum_options { int32_t transfer_form; int32_t normalisation;
  !     double value; double spectral_index; double running; };
  ! The options of a linear power spectrum: fill it with
  ! relicore_linear_power_spectrum_options_default() (baryon oscillations, normalised by A_s,
  ! running 0; value and spectral_index NaN, unset), set value and spectral_index, then call
  ! relicore_linear_power_spectrum_compute.
  type, bind(C), public :: relicore_linear_power_spectrum_options
    integer(c_int32_t) :: transfer_form   ! RELICORE_TRANSFER_BARYON_OSCILLATIONS (0) or
                                          ! RELICORE_TRANSFER_NO_WIGGLE (1)
    integer(c_int32_t) :: normalisation   ! RELICORE_NORMALISATION_SCALAR_AMPLITUDE (0): value is
                                          ! A_s; RELICORE_NORMALISATION_SIGMA8 (1): value is sigma8
    real(c_double) :: value               ! A_s or sigma8, > 0
    real(c_double) :: spectral_index      ! n_s, finite
    real(c_double) :: running             ! alpha_s = dn_s/dln k, finite (default 0)
  end type relicore_linear_power_spectrum_options

  ! struct relicore_linear_power_spectrum { uint64_t tag;
  !     uint64_t storage[RELICORE_LINEAR_POWER_SPECTRUM_STORAGE_WORDS]; };
  ! A computed linear matter power spectrum (a copy of its growth, the Eisenstein & Hu 1998
  ! transfer function, the primordial spectrum and sigma8), built by
  ! relicore_linear_power_spectrum_compute. A plain value of 131080 bytes: the same rules as
  ! type(relicore_linear_growth).
  type, bind(C), public :: relicore_linear_power_spectrum
    integer(c_int64_t) :: tag = 0_c_int64_t                                        ! private
    integer(c_int64_t) :: storage(RELICORE_LINEAR_POWER_SPECTRUM_STORAGE_WORDS)    ! private
  end type relicore_linear_power_spectrum

  ! The result types of the table (generated).
!@ result_types

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

!@ twin
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
!@ end twin
!@ twin
    ! int32_t relicore_response_weighted_radiance(const double *wavelengths_m,
!@64     !     size_t n_wavelengths, const double *response, size_t n_response,
!@64     !     double temperature_k, double *out);
!@32     !     size_t n_wavelengths, const float *response, size_t n_response, float temperature_k,
!@32     !     float *out);
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
!@ end twin

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
    ! int32_t relicore_linear_growth_compute(const struct relicore_universe *universe,
    !     struct relicore_linear_growth *out);
    function c_linear_growth_compute(universe, out) &
        bind(C, name='relicore_linear_growth_compute') result(status)
      import :: c_int32_t, relicore_universe, relicore_linear_growth
      type(relicore_universe), intent(in) :: universe
      type(relicore_linear_growth), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_linear_growth_compute
    ! int32_t relicore_linear_power_spectrum_options_default(
    !     struct relicore_linear_power_spectrum_options *out);
    function c_linear_power_spectrum_options_default(out) &
        bind(C, name='relicore_linear_power_spectrum_options_default') result(status)
      import :: c_int32_t, relicore_linear_power_spectrum_options
      type(relicore_linear_power_spectrum_options), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_linear_power_spectrum_options_default
    ! int32_t relicore_linear_power_spectrum_compute(const struct relicore_linear_growth *growth,
    !     const struct relicore_linear_power_spectrum_options *options,
    !     struct relicore_linear_power_spectrum *out);
    function c_linear_power_spectrum_compute(growth, options, out) &
        bind(C, name='relicore_linear_power_spectrum_compute') result(status)
      import :: c_int32_t, relicore_linear_growth, relicore_linear_power_spectrum_options, &
          relicore_linear_power_spectrum
      type(relicore_linear_growth), intent(in) :: growth
      type(relicore_linear_power_spectrum_options), intent(in) :: options
      type(relicore_linear_power_spectrum), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_linear_power_spectrum_compute

    ! The table's functions (generated):
!@ interfaces

    ! The hand-kept parts (bindings/fortran/parts/*.f90):
!@ parts interfaces
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

  ! ================================================================ response-weighted radiance

!@ twin
  ! Response-weighted radiance: the integral of response(lambda) B_lambda(lambda, T) over the
!@64   ! table.
!@32   ! table. Single-precision twin (real(c_float)).
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

!@64   ! Calls relicore_response_weighted_radiance; a zero-size table is passed as a valid buffer of
!@64   ! length 0, so the C library judges the sizes (RELICORE_ERROR_ARRAY_TOO_SHORT), never a NULL
!@64   ! pointer.
!@32   ! Calls relicore_response_weighted_radiance_f32; a zero-size table is passed as a valid buffer
!@32   ! of length 0, so the C library judges the sizes (RELICORE_ERROR_ARRAY_TOO_SHORT), never a
!@32   ! NULL pointer.
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
!@64   ! relicore_response_weighted_radiance).
!@32   ! relicore_response_weighted_radiance). Single-precision twin (real(c_float)).
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

!@64   ! Calls relicore_temperature_from_response_weighted_radiance; a zero-size table is passed as a
!@64   ! valid buffer of length 0, so the C library judges the sizes
!@32   ! Calls relicore_temperature_from_response_weighted_radiance_f32; a zero-size table is passed
!@32   ! as a valid buffer of length 0, so the C library judges the sizes
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

!@ end twin
  ! ================================================================ two-load calibration

!@ twin
!@64   ! Two-load calibration of a radiometer channel: fits
!@32   ! Two-load calibration of a radiometer channel (single precision): fits
  ! reading = gain * J + offset, J the Rayleigh-Jeans brightness temperature of each load.
  !   frequency_hz: channel frequency in Hz, > 0
  !   reading_hot: raw reading on the hot load (counts, volts: any linear unit)
  !   temperature_hot_k: physical temperature of the hot load in K, > temperature_cold_k
  !   reading_cold: raw reading on the cold load, /= reading_hot
  !   temperature_cold_k: physical temperature of the cold load in K, > 0
!@64   ! Result: type(relicore_two_load_calibration); every field NaN on failure. Referenced through
!@64   ! the generic name relicore_two_load_calibration, which also names the type (whose structure
!@64   ! constructor takes the three fields).
!@32   ! Result: type(relicore_two_load_calibration_f32); every field NaN on failure. Referenced
!@32   ! through the generic name relicore_two_load_calibration_f32, which also names the type (whose
!@32   ! structure constructor takes the three fields).
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

!@64   ! Physical temperature of a blackbody scene from a raw reading.
!@32   ! Physical temperature of a blackbody scene from a raw reading. Single-precision twin.
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

!@64   ! Rayleigh-Jeans brightness temperature J = (reading - offset)/gain of the scene.
!@32   ! Rayleigh-Jeans brightness temperature J = (reading - offset)/gain of the scene. Single-
!@32   ! precision twin.
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

!@ end twin

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

  ! ================================================================ thermal-history construction

  ! The default options of a thermal history: no reionisation (reionization = 0,
  ! reionization_redshift NaN, unset), highest_redshift = 1e4,
  ! helium_reionization_redshift = 3.5, helium_reionization_width = 0.5.
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
  ! switch other than 0 or 1, z_re above 100, a highest redshift below 3000, a helium
  ! reionisation redshift above 20 or width outside [0.1, 10]), RELICORE_ERROR_NON_FINITE,
  ! RELICORE_ERROR_NEGATIVE (z_re < 0 or a negative helium reionisation redshift),
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

  ! ================================================================ growth construction

  ! Computes the linear growth of a universe into out (the growth equation integrated once onto
  ! a table; about 10 ms): compute once, then pass it to every query. stat = RELICORE_OK,
  ! RELICORE_ERROR_INVALID_STRUCT (universe not initialised), RELICORE_ERROR_OUT_OF_DOMAIN (no
  ! clustering matter, or a universe whose growing mode is unknown at a = 2^-47) or
  ! RELICORE_ERROR_NO_CONVERGENCE; on failure out is cleared and every query refuses it
  ! (RELICORE_ERROR_INVALID_STRUCT). Without stat a failure stops with the message.
  subroutine relicore_linear_growth_compute(universe, out, stat)
    type(relicore_universe), intent(in) :: universe
    type(relicore_linear_growth), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    call report(c_linear_growth_compute(universe, out), 'relicore_linear_growth_compute', stat)
  end subroutine relicore_linear_growth_compute

  ! The default options of a power spectrum: transfer_form RELICORE_TRANSFER_BARYON_OSCILLATIONS,
  ! normalisation RELICORE_NORMALISATION_SCALAR_AMPLITUDE, running 0; value and spectral_index
  ! NaN (unset: set them). Result: type(relicore_linear_power_spectrum_options).
  function relicore_linear_power_spectrum_options_default() result(options)
    type(relicore_linear_power_spectrum_options) :: options
    call report(c_linear_power_spectrum_options_default(options), &
        'relicore_linear_power_spectrum_options_default')
  end function relicore_linear_power_spectrum_options_default

  ! Computes a linear matter power spectrum on a computed growth into out (Eisenstein & Hu 1998
  ! transfer function, primordial A_s, n_s, alpha_s at k_p = 0.05 Mpc-1, normalised by A_s or by
  ! sigma8; sigma8 computed once, under a millisecond). stat = RELICORE_OK,
  ! RELICORE_ERROR_INVALID_STRUCT (growth not computed), RELICORE_ERROR_OUT_OF_DOMAIN (a switch
  ! outside its values, or sigma8 not formable), RELICORE_ERROR_NON_FINITE (value, n_s or
  ! alpha_s), RELICORE_ERROR_NON_POSITIVE (A_s or sigma8 <= 0),
  ! RELICORE_ERROR_INVALID_PARAMETER (the oscillating form without baryons, or no radiation) or
  ! RELICORE_ERROR_NO_CONVERGENCE; on failure out is cleared. Without stat a failure stops with
  ! the message.
  subroutine relicore_linear_power_spectrum_compute(growth, options, out, stat)
    type(relicore_linear_growth), intent(in) :: growth
    type(relicore_linear_power_spectrum_options), intent(in) :: options
    type(relicore_linear_power_spectrum), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    call report(c_linear_power_spectrum_compute(growth, options, out), &
        'relicore_linear_power_spectrum_compute', stat)
  end subroutine relicore_linear_power_spectrum_compute

  ! ================================================================ the table's functions
!@ procedures

  ! ================================================================ the hand-kept parts
!@ parts procedures
end module relicore
