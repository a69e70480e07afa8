! The relicore demo, part 3, in Fortran: the INVENTED toy simulation code "Wrenfold" of the
! fictional Marrowgate Simulation Group asks relicore for its starting time and the thermal
! history of its universe.
!
! Reads examples/data/invented_simulation.txt (or the path given as the first argument), builds
! the demo universe and its thermal history (with the invented reionisation redshift) and
! prints, as "key = value" with 17 significant digits: the run's starting time (the age of the
! universe at the invented start redshift, in Myr) and its initial x_e and T_m, the
! last-scattering summary of the history, and x_e, T_m, T_r and T_m/T_r at each invented output
! redshift. The Rust, C and Python versions read the same file and print the same keys;
! examples/run_demo.sh compares the four outputs. Every number is computed by relicore; this
! program only reads, calls, converts Gyr to Myr and radians to 100 theta*, divides T_m by T_r
! and prints.
!
! Build (from the repository root; examples/run_demo.sh does this):
!   cargo build -p relicore-capi --profile release-c
!   gfortran -std=f2018 -c bindings/fortran/relicore.f90 -Jbuild/demo -o build/demo/relicore.o
!   gfortran -std=f2018 -Wall -Wextra -Werror -Ibuild/demo -Jbuild/demo \
!            examples/fortran/simulation_start.f90 \
!            build/demo/relicore.o target/release-c/librelicore.a -lm -o build/demo/simulation_start_f

! The simulation's state: the universe and its thermal history. The history is a plain value
! of 163848 bytes, so it lives here in a module (static storage), not on the stack.
module wrenfold_state
  use relicore, only: relicore_universe, relicore_thermal_history
  implicit none
  private
  type(relicore_universe), public, save :: universe
  type(relicore_thermal_history), public, save :: history
end module wrenfold_state

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
      relicore_reionization_optical_depth_s
  use wrenfold_state, only: universe, history
  implicit none

  character(len=*), parameter :: default_input = 'examples/data/invented_simulation.txt'
  integer, parameter :: max_list = 64

  type(relicore_universe_parameters) :: params
  type(relicore_thermal_history_options) :: options
  integer :: given(0:9) = 0
  integer :: start_given = 0, reionization_given = 0
  real(c_double) :: start_redshift = 0.0_c_double, reionization_redshift = 0.0_c_double
  real(c_double) :: outputs(max_list)
  integer :: n_outputs = 0
  character(len=1024) :: path
  integer :: i, path_length

  if (command_argument_count() >= 1) then
    call get_command_argument(1, path, path_length)
  else
    path = default_input
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
  print '(a)', '# fictional toy code Wrenfold (Marrowgate Simulation Group); ' // &
      'a demo universe, not a published fit'

  call show_state('start_', start_redshift, .false.)

  call show('reionization_redshift', reionization_redshift)
  call show_summary()

  do i = 1, n_outputs
    call show_state(indexed('output', i, ''), outputs(i), .true.)
  end do

contains

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
    character(len=40) :: text
    integer :: k
    write (text, '(es24.16e2)') value
    text = adjustl(text)
    k = index(text, 'E')
    if (k > 0) text(k:k) = 'e'
    print '(a)', key // ' = ' // trim(text)
  end subroutine show

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
    if (start_given /= 1 .or. reionization_given /= 1) &
        error stop 'simulation_start: the start and reionisation redshifts are needed once'
  end subroutine read_inputs

end program simulation_start
