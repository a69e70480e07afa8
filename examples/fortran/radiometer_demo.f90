! The relicore demo in Fortran: a fictional observatory's balloon radiometer and a fictional
! handheld infrared thermometer, from INVENTED data.
!
! Reads examples/data/invented_radiometer.txt (or the path given as the first argument) and
! prints every computed quantity as "key = value" with 17 significant digits. The Rust, C and
! Python versions read the same file and print the same keys; examples/run_demo.sh compares
! the four outputs. Every number is computed by relicore; this program only reads, calls and
! prints.
!
! Build (from the repository root; examples/run_demo.sh does this):
!   cargo build -p relicore-capi --profile release-c
!   gfortran -std=f2018 -c bindings/fortran/relicore.f90 -Jbuild/demo -o build/demo/relicore.o
!   gfortran -std=f2018 -Wall -Wextra -Werror -Ibuild/demo examples/fortran/radiometer_demo.f90 \
!            build/demo/relicore.o target/release-c/librelicore.a -lm -o build/demo/radiometer_demo_f
program radiometer_demo
  use, intrinsic :: iso_c_binding, only: c_double
  use relicore, only: relicore_two_load_calibration, relicore_two_load_calibration_s, &
      relicore_spectral_radiance_frequency_s, relicore_brightness_temperature_frequency_s, &
      relicore_calibrated_brightness_temperature_s, relicore_calibrated_temperature_s, &
      relicore_thermodynamic_to_rayleigh_jeans_factor_s, relicore_response_weighted_radiance_s, &
      relicore_temperature_from_response_weighted_radiance_s, &
      relicore_band_radiance_wavelength_s, relicore_peak_wavelength_s, &
      relicore_spectral_radiance_wavelength_s
  implicit none

  character(len=*), parameter :: default_input = 'examples/data/invented_radiometer.txt'
  integer, parameter :: max_list = 64

  ! the demo inputs, as read from the data file (lists have a fixed capacity)
  real(c_double) :: frequency_hz = 0, hot_temperature_k = 0, hot_reading_v = 0
  real(c_double) :: cold_temperature_k = 0, cold_reading_v = 0, cmb_temperature_k = 0
  real(c_double) :: band_lower_m = 0, band_upper_m = 0, check_temperature_k = 0
  real(c_double) :: sky_readings_v(max_list), thermometer_readings_w_m2_sr(max_list)
  real(c_double) :: response_wavelengths_m(max_list), response(max_list)
  real(c_double) :: curve_temperatures_k(max_list)
  integer :: n_sky = 0, n_thermometer = 0, n_response = 0, n_curves = 0

  type(relicore_two_load_calibration) :: cal
  character(len=1024) :: path
  real(c_double) :: nu, b_hot, t_hot, j, t, factor, radiance, band, peak, b
  integer :: i, path_length

  if (command_argument_count() >= 1) then
    call get_command_argument(1, path, path_length)
  else
    path = default_input
  end if
  call read_inputs(trim(path))
  print '(a)', '# relicore radiometer demo (Fortran) -- INVENTED DATA from ' // trim(path)
  print '(a)', '# fictional Glimmerfen Ridge Observatory; no real instrument or measurement'

  ! Part 1: the balloon radiometer. The status forms (_s) without stat stop with relicore's
  ! message on failure.
  nu = frequency_hz
  call relicore_two_load_calibration_s(nu, hot_reading_v, hot_temperature_k, cold_reading_v, &
      cold_temperature_k, cal)
  call show('calibration_gain_v_per_k', cal%gain)
  call show('calibration_offset_v', cal%offset)
  call relicore_spectral_radiance_frequency_s(nu, hot_temperature_k, b_hot)
  call show('hot_load_spectral_radiance_w_m2_sr_hz', b_hot)
  call relicore_brightness_temperature_frequency_s(nu, b_hot, t_hot)
  call show('hot_load_brightness_temperature_k', t_hot)
  call relicore_calibrated_brightness_temperature_s(cal, hot_reading_v, j)
  call show('hot_load_rayleigh_jeans_temperature_k', j)
  call relicore_calibrated_brightness_temperature_s(cal, cold_reading_v, j)
  call show('cold_load_rayleigh_jeans_temperature_k', j)
  do i = 1, n_sky
    call relicore_calibrated_brightness_temperature_s(cal, sky_readings_v(i), j)
    call show(indexed('sky', i, 'rayleigh_jeans_temperature_k'), j)
    call relicore_calibrated_temperature_s(cal, sky_readings_v(i), t)
    call show(indexed('sky', i, 'physical_temperature_k'), t)
  end do
  call relicore_thermodynamic_to_rayleigh_jeans_factor_s(nu, cmb_temperature_k, factor)
  call show('cmb_thermodynamic_to_rayleigh_jeans_factor', factor)

  ! Part 2: the handheld infrared thermometer.
  call relicore_response_weighted_radiance_s(response_wavelengths_m(1:n_response), &
      response(1:n_response), check_temperature_k, radiance)
  call show('thermometer_check_radiance_w_m2_sr', radiance)
  do i = 1, n_thermometer
    call relicore_temperature_from_response_weighted_radiance_s( &
        response_wavelengths_m(1:n_response), response(1:n_response), &
        thermometer_readings_w_m2_sr(i), t)
    call show(indexed('target', i, 'temperature_k'), t)
    call relicore_band_radiance_wavelength_s(band_lower_m, band_upper_m, t, band)
    call show(indexed('target', i, 'band_radiance_w_m2_sr'), band)
  end do

  ! Blackbody curves: the peaks the plot marks.
  do i = 1, n_curves
    call relicore_peak_wavelength_s(curve_temperatures_k(i), peak)
    call show(indexed('curve', i, 'peak_wavelength_m'), peak)
    call relicore_spectral_radiance_wavelength_s(peak, curve_temperatures_k(i), b)
    call show(indexed('curve', i, 'peak_spectral_radiance_w_m2_sr_m'), b)
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
    error stop 'radiometer_demo: line ' // trim(digits) // ': ' // message
  end subroutine fail

  ! Number of blank-separated tokens in a line.
  integer function count_tokens(line) result(n)
    character(len=*), intent(in) :: line
    integer :: k
    logical :: in_token
    n = 0
    in_token = .false.
    do k = 1, len_trim(line)
      if (line(k:k) == ' ' .or. line(k:k) == char(9)) then
        in_token = .false.
      else if (.not. in_token) then
        in_token = .true.
        n = n + 1
      end if
    end do
  end function count_tokens

  subroutine append(list, n, value, line_no)
    real(c_double), intent(inout) :: list(:)
    integer, intent(inout) :: n
    real(c_double), intent(in) :: value
    integer, intent(in) :: line_no
    if (n >= size(list)) call fail(line_no, 'too many entries in a list')
    n = n + 1
    list(n) = value
  end subroutine append

  subroutine read_inputs(file)
    character(len=*), intent(in) :: file
    character(len=512) :: line
    character(len=64) :: key
    real(c_double) :: v, v2
    integer :: unit, ios, line_no, want
    open (newunit=unit, file=file, status='old', action='read', iostat=ios)
    if (ios /= 0) error stop 'radiometer_demo: cannot open ' // file
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
      want = 2
      if (key == 'thermometer_response') want = 3
      if (count_tokens(line) /= want) call fail(line_no, 'wrong number of values for ' // trim(key))
      if (want == 3) then
        read (line, *, iostat=ios) key, v, v2
      else
        read (line, *, iostat=ios) key, v
      end if
      if (ios /= 0) call fail(line_no, 'cannot read the value(s) of ' // trim(key))
      select case (trim(key))
      case ('radiometer_frequency_hz')
        frequency_hz = v
      case ('hot_load_temperature_k')
        hot_temperature_k = v
      case ('hot_load_reading_v')
        hot_reading_v = v
      case ('cold_load_temperature_k')
        cold_temperature_k = v
      case ('cold_load_reading_v')
        cold_reading_v = v
      case ('sky_reading_v')
        call append(sky_readings_v, n_sky, v, line_no)
      case ('cmb_temperature_k')
        cmb_temperature_k = v
      case ('thermometer_band_lower_m')
        band_lower_m = v
      case ('thermometer_band_upper_m')
        band_upper_m = v
      case ('thermometer_response')
        call append(response_wavelengths_m, n_response, v, line_no)
        response(n_response) = v2
      case ('thermometer_check_temperature_k')
        check_temperature_k = v
      case ('thermometer_reading_w_m2_sr')
        call append(thermometer_readings_w_m2_sr, n_thermometer, v, line_no)
      case ('curve_temperature_k')
        call append(curve_temperatures_k, n_curves, v, line_no)
      case default
        call fail(line_no, 'unknown key ' // trim(key))
      end select
    end do
    close (unit)
  end subroutine read_inputs

end program radiometer_demo
