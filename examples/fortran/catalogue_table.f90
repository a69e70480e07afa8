! The relicore demo, part 2, in Fortran: the table of the INVENTED Quillmere Deep Field Survey's
! follow-up objects (per object: luminosity distance, distance modulus, apparent magnitude,
! half-light radius as an angle, lookback time, age of the universe when the light left).
!
! Reads examples/data/invented_catalogue.txt (or the path given as the first argument) and
! prints every computed quantity as "key = value" with 17 significant digits. The Rust, C and
! Python versions read the same file and print the same keys; examples/run_demo.sh compares
! the four outputs. Every number is computed by relicore; this program only reads, calls and
! prints.
!
! Build (from the repository root; examples/run_demo.sh does this):
!   cargo build -p relicore-capi --profile release-c
!   gfortran -std=f2018 -c bindings/fortran/relicore.f90 -Jbuild/demo -o build/demo/relicore.o
!   gfortran -std=f2018 -Wall -Wextra -Werror -Ibuild/demo examples/fortran/catalogue_table.f90 \
!            build/demo/relicore.o target/release-c/librelicore.a -lm -o build/demo/catalogue_table_f
program catalogue_table
  use, intrinsic :: iso_c_binding, only: c_double
  use relicore, only: relicore_universe, relicore_universe_parameters, &
      relicore_universe_parameters_default, relicore_universe_init, &
      relicore_luminosity_distance_mpc_s, relicore_distance_modulus_s, &
      relicore_transverse_scale_kpc_per_arcsec_s, relicore_lookback_time_gyr_s, relicore_age_gyr_s
  implicit none

  character(len=*), parameter :: default_input = 'examples/data/invented_catalogue.txt'
  integer, parameter :: max_list = 64

  type(relicore_universe_parameters) :: params
  type(relicore_universe) :: universe
  integer :: given(0:9) = 0
  ! the follow-up objects: redshift, absolute magnitude, half-light radius (kpc)
  real(c_double) :: redshifts(max_list), magnitudes(max_list), radii_kpc(max_list)
  integer :: n_redshifts = 0, n_magnitudes = 0, n_radii = 0
  character(len=1024) :: path
  real(c_double) :: z, v, modulus, scale
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
  print '(a)', '# relicore catalogue table (Fortran) -- INVENTED DATA from ' // trim(path)
  print '(a)', '# fictional Quillmere Deep Field Survey; an invented universe, not a published fit'

  call relicore_age_gyr_s(universe, 0.0_c_double, v)
  call show('universe_age_today_gyr', v)
  ! per object, in the order every language prints them
  do i = 1, n_redshifts
    z = redshifts(i)
    call show(indexed('object', i, 'redshift'), z)
    call show(indexed('object', i, 'absolute_magnitude'), magnitudes(i))
    call show(indexed('object', i, 'half_light_radius_kpc'), radii_kpc(i))
    call relicore_luminosity_distance_mpc_s(universe, z, v)
    call show(indexed('object', i, 'luminosity_distance_mpc'), v)
    call relicore_distance_modulus_s(universe, z, modulus)
    call show(indexed('object', i, 'distance_modulus'), modulus)
    call show(indexed('object', i, 'apparent_magnitude'), magnitudes(i) + modulus)
    call relicore_transverse_scale_kpc_per_arcsec_s(universe, z, scale)
    call show(indexed('object', i, 'half_light_radius_arcsec'), radii_kpc(i) / scale)
    call relicore_lookback_time_gyr_s(universe, z, v)
    call show(indexed('object', i, 'lookback_time_gyr'), v)
    call relicore_age_gyr_s(universe, z, v)
    call show(indexed('object', i, 'age_at_emission_gyr'), v)
  end do

contains

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
    error stop 'catalogue_table: line ' // trim(digits) // ': ' // message
  end subroutine fail

  subroutine append(list, n, value, line_no)
    real(c_double), intent(inout) :: list(:)
    integer, intent(inout) :: n
    real(c_double), intent(in) :: value
    integer, intent(in) :: line_no
    if (n >= size(list)) call fail(line_no, 'too many entries in a list')
    n = n + 1
    list(n) = value
  end subroutine append

  ! Counts how often parameter `which` (0-based, the order of the C struct) was given.
  subroutine count_given(which, line_no)
    integer, intent(in) :: which, line_no
    given(which) = given(which) + 1
    if (which == 6 .and. given(which) > 3) call fail(line_no, 'more than three neutrino masses')
    if (which /= 6 .and. given(which) > 1) call fail(line_no, 'a universe parameter given twice')
  end subroutine count_given

  subroutine read_inputs(file)
    character(len=*), intent(in) :: file
    character(len=512) :: line
    character(len=64) :: key
    real(c_double) :: v
    integer :: unit, ios, line_no, k
    open (newunit=unit, file=file, status='old', action='read', iostat=ios)
    if (ios /= 0) error stop 'catalogue_table: cannot open ' // file
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
      read (line, *) key
      if (index(key, 'catalogue_') == 1) cycle  ! the Python catalogue demo's keys
      read (line, *, iostat=ios) key, v
      if (ios /= 0) call fail(line_no, 'cannot read the value of ' // trim(key))
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
      case ('object_redshift')
        call append(redshifts, n_redshifts, v, line_no)
      case ('object_absolute_magnitude')
        call append(magnitudes, n_magnitudes, v, line_no)
      case ('object_half_light_radius_kpc')
        call append(radii_kpc, n_radii, v, line_no)
      case default
        call fail(line_no, 'unknown key ' // trim(key))
      end select
    end do
    close (unit)
    do k = 0, 9
      if (k == 6 .and. given(k) /= 3) error stop 'catalogue_table: three neutrino masses are needed'
      if (k /= 6 .and. given(k) /= 1) error stop 'catalogue_table: every universe parameter is needed once'
    end do
    if (n_magnitudes /= n_redshifts .or. n_radii /= n_redshifts) error stop &
        'catalogue_table: object_redshift, object_absolute_magnitude and object_half_light_radius_kpc ' // &
        'must be given equally often'
  end subroutine read_inputs

end program catalogue_table
