! The relicore demo, part 3, in Fortran: the INVENTED toy simulation code "Orvelstep" of the
! fictional Hollinscarth Simulation Group (both names are coinages for this demo) asks relicore
! for its starting time, the thermal history of its universe and what its initial conditions
! need.
!
! Reads examples/data/invented_simulation.txt (or the path given as the first argument), builds
! the demo universe, its thermal history (with the invented reionisation redshift), its linear
! growth and a linear power spectrum (invented A_s and n_s) and prints, as "key = value" with 17
! significant digits: the run's starting time (the age of the universe at the invented start
! redshift, in Myr) and its initial x_e and T_m, the last-scattering summary of the history, the
! growth factor and rate at the start redshift, sigma8, S8 and f sigma8, the leapfrog drift and
! kick factors of the invented first time steps, and x_e, T_m, T_r and T_m/T_r at each invented
! output redshift. It writes the linear power spectrum at the start redshift as a two-column
! file (k in Mpc^-1, P in Mpc^3; the path given as the second argument). The Rust, C and Python
! versions read the same file, print the same keys and write the same spectrum file;
! examples/run_demo.sh compares the four. Every number is computed by relicore; this program
! only reads, calls, converts Gyr to Myr and radians to 100 theta*, divides T_m by T_r, forms
! 8/h Mpc = 800/H0 Mpc, a = 1/(1 + z) and the wavenumber grid (one multiplication per point),
! and prints.
!
! Build (from the repository root; examples/run_demo.sh does this):
!   cargo build -p relicore-capi --profile release-c
!   gfortran -std=f2018 -c bindings/fortran/relicore.f90 -Jbuild/demo -o build/demo/relicore.o
!   gfortran -std=f2018 -Wall -Wextra -Werror -Ibuild/demo -Jbuild/demo \
!            examples/fortran/simulation_start.f90 \
!            build/demo/relicore.o target/release-c/librelicore.a -lm -o build/demo/simulation_start_f

! The simulation's state: the universe, its thermal history, its linear growth and the power
! spectrum of the initial conditions. The history (163848 bytes), the growth and the spectrum
! (131080 bytes each) are plain values, so they live here in a module (static storage), not on
! the stack.
module orvelstep_state
  use relicore, only: relicore_universe, relicore_thermal_history, relicore_linear_growth, &
      relicore_linear_power_spectrum
  implicit none
  private
  type(relicore_universe), public, save :: universe
  type(relicore_thermal_history), public, save :: history
  type(relicore_linear_growth), public, save :: growth
  type(relicore_linear_power_spectrum), public, save :: spectrum
end module orvelstep_state

program simulation_start
  use, intrinsic :: iso_c_binding, only: c_double
  use relicore, only: relicore_universe_parameters, relicore_universe_parameters_default, &
      relicore_universe_init, relicore_age_gyr_s, relicore_cmb_temperature_at_k_s, &
      relicore_thermal_history_options, relicore_thermal_history_options_default, &
      relicore_thermal_history_compute, relicore_ionized_fraction_s, &
      relicore_matter_temperature_k_s, relicore_last_scattering_redshift_s, &
      relicore_drag_redshift_s, relicore_sound_horizon_last_scattering_mpc_s, &
      relicore_sound_horizon_drag_mpc_s, relicore_angular_scale_last_scattering_s, &
      relicore_age_at_last_scattering_yr_s, relicore_temperature_at_last_scattering_k_s, &
      relicore_visibility_peak_redshift_s, relicore_thermal_decoupling_redshift_s, &
      relicore_reionization_optical_depth_s, relicore_linear_growth_compute, &
      relicore_linear_power_spectrum_options, relicore_linear_power_spectrum_options_default, &
      relicore_linear_power_spectrum_compute, RELICORE_TRANSFER_BARYON_OSCILLATIONS, &
      RELICORE_NORMALISATION_SCALAR_AMPLITUDE, relicore_growth_factor_s, relicore_growth_rate_s, &
      relicore_unnormalized_growth_factor_s, relicore_scalar_amplitude_s, relicore_sigma8_s, &
      relicore_s8_s, relicore_density_rms_in_sphere_s, relicore_growth_rate_times_sigma8_s, &
      relicore_leapfrog_drift_factor_gyr_s, relicore_leapfrog_kick_factor_gyr_s, &
      relicore_linear_power_spectrum_mpc3_array
  use orvelstep_state, only: universe, history, growth, spectrum
  implicit none

  character(len=*), parameter :: default_input = 'examples/data/invented_simulation.txt'
  character(len=*), parameter :: default_spectrum = 'examples/out/simulation_power_spectrum_fortran.txt'
  integer, parameter :: max_list = 64, max_points = 100000
  ! the spectrum keys of the input file, each given once
  character(len=*), parameter :: spectrum_keys(6) = [character(len=31) :: &
      'spectrum_scalar_amplitude', 'spectrum_spectral_index', 'spectrum_running', &
      'spectrum_wavenumber_min_per_mpc', 'spectrum_wavenumber_ratio', 'spectrum_points']
  ! the header of the spectrum file (the same text in every language)
  character(len=*), parameter :: spectrum_header(7) = [character(len=110) :: &
      '# relicore demo -- INVENTED scenario: the linear matter power spectrum for the initial conditions', &
      '# of the fictional toy simulation code Orvelstep (fictional Hollinscarth Simulation Group), ' // &
      'not a real run', &
      '# universe: the demo''s round-number flat model below, not a published fit (massive neutrinos smooth)', &
      '# column 1: k, wavenumber in Mpc^-1 (no factor of h); column 2: P(k, z) in Mpc^3 (no factor of h)', &
      '# P(k, z) = (2 pi^2/k^3) A_s (k/k_p)^(n_s - 1 + alpha_s ln(k/k_p)/2) ' // &
      '[(2/5) (c k/H0)^2 T(k) D_u(a)/Omega_m]^2', &
      '# with k_p = 0.05 Mpc^-1 and T(k) the Eisenstein & Hu 1998 (ApJ 496, 605) formula with baryon ' // &
      'oscillations', &
      '# computed by relicore at the run''s start redshift; the values of the model:']

  type(relicore_universe_parameters) :: params
  type(relicore_thermal_history_options) :: options
  integer :: given(0:9) = 0
  integer :: start_given = 0, reionization_given = 0
  real(c_double) :: start_redshift = 0.0_c_double, reionization_redshift = 0.0_c_double
  real(c_double) :: outputs(max_list)
  integer :: n_outputs = 0
  real(c_double) :: steps(max_list)
  integer :: n_steps = 0
  real(c_double) :: spectrum_values(6)
  integer :: spectrum_given(6) = 0
  ! the spectrum file's arrays (static: 1.6 MB, not on the stack)
  real(c_double), save :: wavenumbers(max_points), powers(max_points)
  type(relicore_linear_power_spectrum_options) :: spectrum_options
  character(len=1024) :: path, spectrum_path
  integer :: i, path_length

  if (command_argument_count() >= 1) then
    call get_command_argument(1, path, path_length)
  else
    path = default_input
  end if
  if (command_argument_count() >= 2) then
    call get_command_argument(2, spectrum_path, path_length)
  else
    spectrum_path = default_spectrum
  end if
  ! every parameter is read from the file; the defaults only fill the type first
  params = relicore_universe_parameters_default(70.0_c_double, 0.3_c_double)
  call read_inputs(trim(path))
  ! without stat, a failure stops with relicore's message
  call relicore_universe_init(params, universe)
  options = relicore_thermal_history_options_default()
  options%reionization = 1
  options%reionization_redshift = reionization_redshift
  call relicore_thermal_history_compute(universe, options, history)
  print '(a)', '# relicore simulation start (Fortran) -- INVENTED DATA from ' // trim(path)
  print '(a)', '# fictional toy code Orvelstep (Hollinscarth Simulation Group); ' // &
      'a demo universe, not a published fit'

  call show_state('start_', start_redshift, .false.)

  call show('reionization_redshift', reionization_redshift)
  call show_summary()
  call show_initial_conditions()

  do i = 1, n_outputs
    call show_state(indexed('output', i, ''), outputs(i), .true.)
  end do

contains

  ! The growth and the power spectrum of the initial conditions: D, f and D_u at the start
  ! redshift, sigma8, S8 and f sigma8, the leapfrog factors of the steps, and the spectrum file.
  subroutine show_initial_conditions()
    real(c_double) :: z0, d0, v, a_s_out, sigma8, a1, a2, next, n_points
    integer :: k, n_k, unit, ios
    character(len=32) :: names(18)
    real(c_double) :: values(18)
    z0 = start_redshift
    call relicore_linear_growth_compute(universe, growth)
    spectrum_options = relicore_linear_power_spectrum_options_default()
    spectrum_options%transfer_form = RELICORE_TRANSFER_BARYON_OSCILLATIONS
    spectrum_options%normalisation = RELICORE_NORMALISATION_SCALAR_AMPLITUDE
    spectrum_options%value = spectrum_values(1)
    spectrum_options%spectral_index = spectrum_values(2)
    spectrum_options%running = spectrum_values(3)
    call relicore_linear_power_spectrum_compute(growth, spectrum_options, spectrum)
    call relicore_growth_factor_s(growth, z0, d0)
    call show('growth_start_growth_factor', d0)
    call relicore_growth_rate_s(growth, z0, v)
    call show('growth_start_growth_rate', v)
    call relicore_unnormalized_growth_factor_s(growth, z0, v)
    call show('growth_start_unnormalized_growth_factor', v)
    call relicore_unnormalized_growth_factor_s(growth, 0.0_c_double, v)
    call show('growth_unnormalized_growth_factor_today', v)
    call relicore_scalar_amplitude_s(spectrum, a_s_out)
    call show('spectrum_scalar_amplitude', a_s_out)
    call show('spectrum_spectral_index', spectrum_values(2))
    call show('spectrum_running', spectrum_values(3))
    call relicore_sigma8_s(spectrum, sigma8)
    call show('spectrum_sigma8', sigma8)
    call relicore_s8_s(spectrum, v)
    call show('spectrum_s8', v)
    call relicore_density_rms_in_sphere_s(spectrum, 800.0_c_double / params%h0_km_s_mpc, z0, v)
    call show('spectrum_start_sigma_8_over_h_mpc', v)
    call relicore_growth_rate_times_sigma8_s(spectrum, z0, v)
    call show('spectrum_start_growth_rate_times_sigma8', v)
    call relicore_growth_rate_times_sigma8_s(spectrum, 0.0_c_double, v)
    call show('spectrum_growth_rate_times_sigma8_today', v)
    do k = 1, n_steps - 1
      a1 = 1.0_c_double / (1.0_c_double + steps(k))
      a2 = 1.0_c_double / (1.0_c_double + steps(k + 1))
      call show(indexed('step', k, 'start_scale_factor'), a1)
      call show(indexed('step', k, 'end_scale_factor'), a2)
      call relicore_leapfrog_drift_factor_gyr_s(growth, a1, a2, v)
      call show(indexed('step', k, 'drift_factor_gyr'), v)
      call relicore_leapfrog_kick_factor_gyr_s(growth, a1, a2, v)
      call show(indexed('step', k, 'kick_factor_gyr'), v)
    end do
    ! the spectrum file: k_0 = k_min, k_(i+1) = k_i * ratio (one multiplication per point)
    n_points = spectrum_values(6)
    if (.not. (n_points >= 2.0_c_double .and. n_points <= real(max_points, c_double))) &
        error stop 'simulation_start: spectrum_points must be a whole number from 2 to 100000'
    n_k = int(n_points)
    if (n_points - real(n_k, c_double) > 0.0_c_double) &
        error stop 'simulation_start: spectrum_points must be a whole number from 2 to 100000'
    next = spectrum_values(4)
    do k = 1, n_k
      wavenumbers(k) = next
      next = next * spectrum_values(5)
    end do
    call relicore_linear_power_spectrum_mpc3_array(spectrum, wavenumbers(1:n_k), z0, powers(1:n_k))
    names = [character(len=32) :: 'redshift', 'h0_km_s_mpc', 'omega_matter', 'omega_baryon', &
        'omega_curvature', 'cmb_temperature_k', 'n_eff', 'neutrino_mass_1_ev', &
        'neutrino_mass_2_ev', 'neutrino_mass_3_ev', 'w0', 'wa', 'scalar_amplitude', &
        'spectral_index', 'running', 'sigma8_today', 'growth_factor_at_redshift', 'points']
    values = [z0, params%h0_km_s_mpc, params%omega_matter, params%omega_baryon, &
        params%omega_curvature, params%cmb_temperature_k, params%n_eff, &
        params%neutrino_masses_ev(1), params%neutrino_masses_ev(2), params%neutrino_masses_ev(3), &
        params%w0, params%wa, a_s_out, spectrum_values(2), spectrum_values(3), sigma8, d0, n_points]
    open (newunit=unit, file=trim(spectrum_path), status='replace', action='write', iostat=ios)
    if (ios /= 0) error stop 'simulation_start: cannot write ' // trim(spectrum_path)
    do k = 1, size(spectrum_header)
      write (unit, '(a)') trim(spectrum_header(k))
    end do
    do k = 1, size(names)
      write (unit, '(a)') '# ' // trim(names(k)) // ' = ' // formatted(values(k))
    end do
    do k = 1, n_k
      write (unit, '(a)') formatted(wavenumbers(k)) // ' ' // formatted(powers(k))
    end do
    close (unit)
    call show('spectrum_file_points', n_points)
    call show('spectrum_file_first_wavenumber_per_mpc', wavenumbers(1))
    call show('spectrum_file_last_wavenumber_per_mpc', wavenumbers(n_k))
    call show('spectrum_file_first_power_mpc3', powers(1))
    call show('spectrum_file_last_power_mpc3', powers(n_k))
  end subroutine show_initial_conditions

  ! The run's state at redshift z under the key prefix: age (Myr), x_e, T_m, T_r, T_m/T_r
  ! (with_z: the output's "z" key first; the start prints its own "redshift" key).
  subroutine show_state(prefix, z, with_z)
    character(len=*), intent(in) :: prefix
    real(c_double), intent(in) :: z
    logical, intent(in) :: with_z
    real(c_double) :: age_gyr, x_e, t_m, t_r
    call relicore_age_gyr_s(universe, z, age_gyr)
    call relicore_ionized_fraction_s(history, z, x_e)
    call relicore_matter_temperature_k_s(history, z, t_m)
    call relicore_cmb_temperature_at_k_s(universe, z, t_r)
    if (with_z) then
      call show(prefix // 'z', z)
    else
      call show(prefix // 'redshift', z)
    end if
    call show(prefix // 'age_myr', age_gyr * 1000.0_c_double)
    call show(prefix // 'ionized_fraction', x_e)
    call show(prefix // 'matter_temperature_k', t_m)
    call show(prefix // 'radiation_temperature_k', t_r)
    call show(prefix // 'temperature_ratio', t_m / t_r)
  end subroutine show_state

  ! The last-scattering summary of the history.
  subroutine show_summary()
    real(c_double) :: v
    call relicore_last_scattering_redshift_s(history, v)
    call show('history_last_scattering_redshift', v)
    call relicore_drag_redshift_s(history, v)
    call show('history_drag_redshift', v)
    call relicore_sound_horizon_last_scattering_mpc_s(history, v)
    call show('history_sound_horizon_last_scattering_mpc', v)
    call relicore_sound_horizon_drag_mpc_s(history, v)
    call show('history_sound_horizon_drag_mpc', v)
    call relicore_angular_scale_last_scattering_s(history, v)
    call show('history_100_theta_star', v * 100.0_c_double)
    call relicore_age_at_last_scattering_yr_s(history, v)
    call show('history_age_at_last_scattering_yr', v)
    call relicore_temperature_at_last_scattering_k_s(history, v)
    call show('history_temperature_at_last_scattering_k', v)
    call relicore_visibility_peak_redshift_s(history, v)
    call show('history_visibility_peak_redshift', v)
    call relicore_thermal_decoupling_redshift_s(history, v)
    call show('history_thermal_decoupling_redshift', v)
    call relicore_reionization_optical_depth_s(history, v)
    call show('history_reionization_optical_depth', v)
  end subroutine show_summary

  ! Prints "key = value" with 17 significant digits, in the C "%.16e" form.
  subroutine show(key, value)
    character(len=*), intent(in) :: key
    real(c_double), intent(in) :: value
    print '(a)', key // ' = ' // formatted(value)
  end subroutine show

  ! The value with 17 significant digits, in the C "%.16e" form (two-digit exponent).
  function formatted(value) result(text)
    real(c_double), intent(in) :: value
    character(len=:), allocatable :: text
    character(len=40) :: buffer
    integer :: k
    write (buffer, '(es24.16e2)') value
    buffer = adjustl(buffer)
    k = index(buffer, 'E')
    if (k > 0) buffer(k:k) = 'e'
    text = trim(buffer)
  end function formatted

  ! "prefix_<n>_suffix"
  function indexed(prefix, n, suffix) result(key)
    character(len=*), intent(in) :: prefix, suffix
    integer, intent(in) :: n
    character(len=:), allocatable :: key
    character(len=16) :: digits
    write (digits, '(i0)') n
    key = prefix // '_' // trim(digits) // '_' // suffix
  end function indexed

  subroutine fail(line_no, message)
    integer, intent(in) :: line_no
    character(len=*), intent(in) :: message
    character(len=16) :: digits
    write (digits, '(i0)') line_no
    error stop 'simulation_start: line ' // trim(digits) // ': ' // message
  end subroutine fail

  ! Counts how often parameter `which` (0-based, the order of the C struct) was given.
  subroutine count_given(which, line_no)
    integer, intent(in) :: which, line_no
    given(which) = given(which) + 1
    if (which == 6 .and. given(which) > 3) call fail(line_no, 'more than three neutrino masses')
    if (which /= 6 .and. given(which) > 1) call fail(line_no, 'a universe parameter given twice')
  end subroutine count_given

  ! A key that must be given once.
  subroutine once(slot, count, value, line_no)
    real(c_double), intent(inout) :: slot
    integer, intent(inout) :: count
    real(c_double), intent(in) :: value
    integer, intent(in) :: line_no
    count = count + 1
    if (count > 1) call fail(line_no, 'a simulation key given twice')
    slot = value
  end subroutine once

  subroutine read_inputs(file)
    character(len=*), intent(in) :: file
    character(len=512) :: line
    character(len=64) :: key
    real(c_double) :: v
    integer :: unit, ios, line_no, k
    open (newunit=unit, file=file, status='old', action='read', iostat=ios)
    if (ios /= 0) error stop 'simulation_start: cannot open ' // file
    line_no = 0
    do
      read (unit, '(a)', iostat=ios) line
      if (ios /= 0) exit
      line_no = line_no + 1
      line = adjustl(line)
      do while (index(line, char(9)) > 0)
        line(index(line, char(9)):index(line, char(9))) = ' '
      end do
      if (len_trim(line) == 0 .or. line(1:1) == '#') cycle
      read (line, *, iostat=ios) key, v
      if (ios /= 0) call fail(line_no, 'cannot read "key value"')
      select case (trim(key))
      case ('universe_h0_km_s_mpc')
        call count_given(0, line_no)
        params%h0_km_s_mpc = v
      case ('universe_omega_matter')
        call count_given(1, line_no)
        params%omega_matter = v
      case ('universe_omega_baryon')
        call count_given(2, line_no)
        params%omega_baryon = v
      case ('universe_omega_curvature')
        call count_given(3, line_no)
        params%omega_curvature = v
      case ('universe_cmb_temperature_k')
        call count_given(4, line_no)
        params%cmb_temperature_k = v
      case ('universe_n_eff')
        call count_given(5, line_no)
        params%n_eff = v
      case ('universe_neutrino_mass_ev')
        call count_given(6, line_no)
        params%neutrino_masses_ev(given(6)) = v
      case ('universe_w0')
        call count_given(7, line_no)
        params%w0 = v
      case ('universe_wa')
        call count_given(8, line_no)
        params%wa = v
      case ('universe_helium_mass_fraction')
        call count_given(9, line_no)
        params%helium_mass_fraction = v
      case ('simulation_start_redshift')
        call once(start_redshift, start_given, v, line_no)
      case ('simulation_reionization_redshift')
        call once(reionization_redshift, reionization_given, v, line_no)
      case ('simulation_step_redshift')
        if (n_steps >= max_list) call fail(line_no, 'too many step redshifts')
        n_steps = n_steps + 1
        steps(n_steps) = v
      case ('spectrum_scalar_amplitude', 'spectrum_spectral_index', 'spectrum_running', &
          'spectrum_wavenumber_min_per_mpc', 'spectrum_wavenumber_ratio', 'spectrum_points')
        k = findloc(spectrum_keys, trim(key), dim=1)
        call once(spectrum_values(k), spectrum_given(k), v, line_no)
      case ('simulation_output_redshift')
        if (n_outputs >= max_list) call fail(line_no, 'too many output redshifts')
        n_outputs = n_outputs + 1
        outputs(n_outputs) = v
      case default
        call fail(line_no, 'unknown key ' // trim(key))
      end select
    end do
    close (unit)
    do k = 0, 9
      if (k == 6 .and. given(k) /= 3) error stop 'simulation_start: three neutrino masses are needed'
      if (k /= 6 .and. given(k) /= 1) error stop 'simulation_start: every universe parameter is needed once'
    end do
    if (any(spectrum_given /= 1)) error stop 'simulation_start: every spectrum key is needed once'
    if (n_steps < 2) error stop 'simulation_start: simulation_step_redshift is needed at least twice'
    if (start_given /= 1 .or. reionization_given /= 1) &
        error stop 'simulation_start: the start and reionisation redshifts are needed once'
  end subroutine read_inputs

end program simulation_start
