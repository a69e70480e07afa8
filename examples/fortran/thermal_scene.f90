! The relicore demo in Fortran, part 1b: an INVENTED thermal scene (the fictional Glimmerfen
! Ridge Observatory's workshop seen by a fictional thermal camera through an infrared window)
! turned into a frame of signals and back into an object-temperature image and a
! combined-standard-uncertainty image.
!
! Usage: thermal_scene [INPUT] [OUT_PREFIX]   (defaults
! examples/data/invented_thermal_scene.txt, examples/out/thermal_fortran). Paints the scene's
! regions onto a width x height frame (integer pixel tests only), computes every pixel's signal
! with the forward measurement equation (the elemental relicore_measured_spectral_radiance_
! wavelength_s over the whole frame), turns the frame back into T_obj and u_c with the frame
! subroutine relicore_object_temperature_wavelength_with_uncertainty_array (per-pixel emissivity
! and its uncertainty, the rest shared as arrays of one element), and writes the three images
! as raw little-endian real(c_double) (row-major, x fastest, y from the top: a rank-1 array
! indexed y*width + x + 1) to OUT_PREFIX_signal.f64, OUT_PREFIX_temperature.f64 and
! OUT_PREFIX_uncertainty.f64. Prints the region sizes, a summary of the frame and, at each probe
! pixel, the scalar function's type(relicore_temperature_uncertainty) as "key = value" (17
! significant digits), after checking that it has the frame pixel's bits. The Rust, C and
! Python versions do the same; examples/run_demo.sh compares the four outputs and the image
! files byte for byte.
!
! Build (from the repository root; examples/run_demo.sh does this):
!   cargo build -p relicore-capi --profile release-c
!   gfortran -std=f2018 -c bindings/fortran/relicore.f90 -Jbuild/demo -o build/demo/relicore.o
!   gfortran -std=f2018 -Wall -Wextra -Werror -Ibuild/demo examples/fortran/thermal_scene.f90 \
!            build/demo/relicore.o target/release-c/librelicore.a -lm -o build/demo/thermal_scene_f
program thermal_scene
  use, intrinsic :: iso_c_binding, only: c_double, c_int32_t
  use, intrinsic :: iso_fortran_env, only: int8, int32, int64
  use relicore, only: relicore_temperature_uncertainty, &
      relicore_measured_spectral_radiance_wavelength_s, &
      relicore_object_temperature_wavelength_with_uncertainty_s, &
      relicore_object_temperature_wavelength_with_uncertainty_array
  implicit none

  character(len=*), parameter :: default_input = 'examples/data/invented_thermal_scene.txt'
  character(len=*), parameter :: default_prefix = 'examples/out/thermal_fortran'
  integer, parameter :: max_regions = 64, max_probes = 64

  ! the scene, as read from the data file
  integer :: width = 0, height = 0
  real(c_double) :: wavelength_m = 0, reflected_temperature_k = 0, transmittance = 0
  real(c_double) :: path_temperature_k = 0, signal_uncertainty = 0
  real(c_double) :: reflected_temperature_uncertainty_k = 0, transmittance_uncertainty = 0
  real(c_double) :: path_temperature_uncertainty_k = 0
  ! region 0 is the background, region k the k-th shape
  real(c_double) :: region_emissivity(0:max_regions) = 0, region_emissivity_u(0:max_regions) = 0
  real(c_double) :: region_temperature_k(0:max_regions) = 0
  ! shape k: a rectangle a <= x < c, b <= y < d, or a disc (x - a)^2 + (y - b)^2 <= c^2
  logical :: shape_is_disc(max_regions) = .false.
  integer :: shape_a(max_regions) = 0, shape_b(max_regions) = 0, shape_c(max_regions) = 0
  integer :: shape_d(max_regions) = 0
  integer :: n_shapes = 0, n_probes = 0
  integer :: probe_x(max_probes) = 0, probe_y(max_probes) = 0
  logical :: has_background = .false.

  character(len=1024) :: path, prefix
  integer :: path_length, n, k, x, y, i, p, c
  integer, allocatable :: map(:)
  real(c_double), allocatable :: emissivity(:), emissivity_u(:), scene_t(:)
  real(c_double), allocatable :: signals(:), t_obj(:), u_c(:)
  type(relicore_temperature_uncertainty) :: r
  logical :: inside
  character(len=40), parameter :: names(5) = [character(len=40) :: 'signal_k_per_w_m2_sr_m', &
      'emissivity_k', 'reflected_temperature_k_per_k', 'transmittance_k', &
      'window_temperature_k_per_k']

  path = default_input
  prefix = default_prefix
  if (command_argument_count() >= 1) call get_command_argument(1, path, path_length)
  if (command_argument_count() >= 2) call get_command_argument(2, prefix, path_length)
  call read_scene(trim(path))
  n = width * height
  print '(a)', '# relicore thermal-scene demo (Fortran) -- INVENTED SCENE from ' // trim(path)
  print '(a)', '# fictional Glimmerfen Ridge Observatory workshop; no real camera or measurement'

  ! The scene, pixel by pixel: region (shapes painted in file order), emissivity and its
  ! uncertainty, temperature.
  allocate (map(n), emissivity(n), emissivity_u(n), scene_t(n), signals(n), t_obj(n), u_c(n))
  map = 0
  do k = 1, n_shapes
    do y = 0, height - 1
      do x = 0, width - 1
        if (shape_is_disc(k)) then
          inside = (x - shape_a(k))**2 + (y - shape_b(k))**2 <= shape_c(k)**2
        else
          inside = shape_a(k) <= x .and. x < shape_c(k) .and. shape_b(k) <= y .and. y < shape_d(k)
        end if
        if (inside) map(y * width + x + 1) = k
      end do
    end do
  end do
  emissivity = region_emissivity(map)
  emissivity_u = region_emissivity_u(map)
  scene_t = region_temperature_k(map)

  ! The frame of signals, by the forward measurement equation at every pixel (elemental; the
  ! _s form without stat stops with relicore's message on failure).
  call relicore_measured_spectral_radiance_wavelength_s(wavelength_m, scene_t, emissivity, &
      reflected_temperature_k, transmittance, path_temperature_k, signals)

  ! Back to object temperature and u_c with the frame subroutine (shared values: one element).
  call relicore_object_temperature_wavelength_with_uncertainty_array(wavelength_m, signals, &
      emissivity, [reflected_temperature_k], [transmittance], [path_temperature_k], &
      [signal_uncertainty], emissivity_u, [reflected_temperature_uncertainty_k], &
      [transmittance_uncertainty], [path_temperature_uncertainty_k], t_obj, u_c)

  do k = 0, n_shapes
    call show(indexed('region', k, 'pixels'), real(count(map == k), c_double))
  end do
  call show('frame_pixels', real(n, c_double))
  call show('frame_signal_min_w_m2_sr_m', minval(signals))
  call show('frame_signal_max_w_m2_sr_m', maxval(signals))
  call show('frame_temperature_min_k', minval(t_obj))
  call show('frame_temperature_max_k', maxval(t_obj))
  call show('frame_uncertainty_min_k', minval(u_c))
  call show('frame_uncertainty_max_k', maxval(u_c))
  call show('frame_max_abs_round_trip_error_k', maxval(abs(t_obj - scene_t)))

  ! The scalar function's full result at each probe pixel, with the frame's bits.
  do p = 1, n_probes
    i = probe_y(p) * width + probe_x(p) + 1
    call relicore_object_temperature_wavelength_with_uncertainty_s(wavelength_m, signals(i), &
        emissivity(i), reflected_temperature_k, transmittance, path_temperature_k, &
        signal_uncertainty, emissivity_u(i), reflected_temperature_uncertainty_k, &
        transmittance_uncertainty, path_temperature_uncertainty_k, r)
    if (transfer(r%temperature_k, 0_int64) /= transfer(t_obj(i), 0_int64) .or. &
        transfer(r%combined_standard_uncertainty_k, 0_int64) /= transfer(u_c(i), 0_int64)) then
      error stop 'thermal_scene: a probe''s frame pixel differs from the scalar result'
    end if
    call show(indexed('probe', p, 'region'), real(map(i), c_double))
    call show(indexed('probe', p, 'signal_w_m2_sr_m'), signals(i))
    call show(indexed('probe', p, 'temperature_k'), r%temperature_k)
    call show(indexed('probe', p, 'combined_standard_uncertainty_k'), &
        r%combined_standard_uncertainty_k)
    do c = 1, min(int(r%inputs), 5)
      call show(indexed('probe', p, 'sensitivity_' // trim(names(c))), &
          r%sensitivity_coefficients(c))
    end do
  end do

  call write_image(trim(prefix) // '_signal.f64', signals)
  call write_image(trim(prefix) // '_temperature.f64', t_obj)
  call write_image(trim(prefix) // '_uncertainty.f64', u_c)

contains

  ! Prints "key = value" with 17 significant digits, in the C "%.16e" form.
  subroutine show(key, value)
    character(len=*), intent(in) :: key
    real(c_double), intent(in) :: value
    character(len=40) :: text
    integer :: e
    write (text, '(es24.16e2)') value
    text = adjustl(text)
    e = index(text, 'E')
    if (e > 0) text(e:e) = 'e'
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

  ! Writes an image as raw little-endian real(c_double): stream access writes the machine's
  ! byte order, so the program refuses a big-endian machine rather than write other bytes.
  subroutine write_image(file, image)
    character(len=*), intent(in) :: file
    real(c_double), intent(in) :: image(:)
    integer(int8) :: first_byte(4)
    integer :: unit, ios
    first_byte = transfer(1_int32, first_byte)
    if (first_byte(1) /= 1_int8) error stop 'thermal_scene: this program writes little-endian files only'
    open (newunit=unit, file=file, access='stream', form='unformatted', status='replace', &
        action='write', iostat=ios)
    if (ios /= 0) error stop 'thermal_scene: cannot write ' // file
    write (unit, iostat=ios) image
    if (ios /= 0) error stop 'thermal_scene: cannot write ' // file
    close (unit)
  end subroutine write_image

  subroutine fail(line_no, message)
    integer, intent(in) :: line_no
    character(len=*), intent(in) :: message
    character(len=16) :: digits
    write (digits, '(i0)') line_no
    error stop 'thermal_scene: line ' // trim(digits) // ': ' // message
  end subroutine fail

  ! Number of blank-separated tokens in a line.
  integer function count_tokens(line) result(m)
    character(len=*), intent(in) :: line
    integer :: j
    logical :: in_token
    m = 0
    in_token = .false.
    do j = 1, len_trim(line)
      if (line(j:j) == ' ') then
        in_token = .false.
      else if (.not. in_token) then
        in_token = .true.
        m = m + 1
      end if
    end do
  end function count_tokens

  subroutine read_scene(file)
    character(len=*), intent(in) :: file
    character(len=512) :: line
    character(len=64) :: key, name
    real(c_double) :: v, e, ue, t
    integer :: unit, ios, line_no, want, ia, ib, ic, id
    open (newunit=unit, file=file, status='old', action='read', iostat=ios)
    if (ios /= 0) error stop 'thermal_scene: cannot open ' // file
    line_no = 0
    do
      read (unit, '(a)', iostat=ios) line
      if (ios /= 0) exit
      line_no = line_no + 1
      do while (index(line, char(9)) > 0)
        line(index(line, char(9)):index(line, char(9))) = ' '
      end do
      line = adjustl(line)
      if (len_trim(line) == 0 .or. line(1:1) == '#') cycle
      read (line, *) key
      select case (trim(key))
      case ('background')
        want = 5
      case ('rectangle')
        want = 9
      case ('disc')
        want = 8
      case ('probe')
        want = 3
      case default
        want = 2
      end select
      if (count_tokens(line) /= want) call fail(line_no, 'wrong number of values for ' // trim(key))
      select case (trim(key))
      case ('background')
        read (line, *, iostat=ios) key, e, ue, t, name
        if (ios /= 0) call fail(line_no, 'cannot read the values of background')
        region_emissivity(0) = e
        region_emissivity_u(0) = ue
        region_temperature_k(0) = t
        has_background = .true.
      case ('rectangle', 'disc')
        if (n_shapes >= max_regions) call fail(line_no, 'too many shapes')
        id = 0
        if (trim(key) == 'rectangle') then
          read (line, *, iostat=ios) key, ia, ib, ic, id, e, ue, t, name
        else
          read (line, *, iostat=ios) key, ia, ib, ic, e, ue, t, name
        end if
        if (ios /= 0) call fail(line_no, 'cannot read the values of ' // trim(key))
        n_shapes = n_shapes + 1
        shape_is_disc(n_shapes) = trim(key) == 'disc'
        shape_a(n_shapes) = ia
        shape_b(n_shapes) = ib
        shape_c(n_shapes) = ic
        shape_d(n_shapes) = id
        region_emissivity(n_shapes) = e
        region_emissivity_u(n_shapes) = ue
        region_temperature_k(n_shapes) = t
      case ('probe')
        if (n_probes >= max_probes) call fail(line_no, 'too many probes')
        read (line, *, iostat=ios) key, ia, ib
        if (ios /= 0) call fail(line_no, 'cannot read the values of probe')
        n_probes = n_probes + 1
        probe_x(n_probes) = ia
        probe_y(n_probes) = ib
      case ('image_width_px', 'image_height_px')
        read (line, *, iostat=ios) key, ia
        if (ios /= 0) call fail(line_no, 'cannot read the value of ' // trim(key))
        if (trim(key) == 'image_width_px') then
          width = ia
        else
          height = ia
        end if
      case default
        read (line, *, iostat=ios) key, v
        if (ios /= 0) call fail(line_no, 'cannot read the value of ' // trim(key))
        select case (trim(key))
        case ('camera_wavelength_m')
          wavelength_m = v
        case ('reflected_temperature_k')
          reflected_temperature_k = v
        case ('window_transmittance')
          transmittance = v
        case ('window_temperature_k')
          path_temperature_k = v
        case ('signal_uncertainty_w_m2_sr_m')
          signal_uncertainty = v
        case ('reflected_temperature_uncertainty_k')
          reflected_temperature_uncertainty_k = v
        case ('window_transmittance_uncertainty')
          transmittance_uncertainty = v
        case ('window_temperature_uncertainty_k')
          path_temperature_uncertainty_k = v
        case default
          call fail(line_no, 'unknown key ' // trim(key))
        end select
      end select
    end do
    close (unit)
    if (.not. has_background) error stop 'thermal_scene: no background line'
    if (width <= 0 .or. height <= 0) error stop 'thermal_scene: the frame needs image_width_px and image_height_px'
    if (any(probe_x(1:n_probes) < 0 .or. probe_x(1:n_probes) >= width .or. &
        probe_y(1:n_probes) < 0 .or. probe_y(1:n_probes) >= height)) then
      error stop 'thermal_scene: a probe lies outside the frame'
    end if
  end subroutine read_scene

end program thermal_scene
