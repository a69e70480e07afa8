! Fortran vector test of the radiation-thermometry procedures of module relicore: every line of
! tests/data/thermometry.txt and thermometry_response.txt (format: tests/data/FORMAT.md;
! references: mpmath at 50 digits, tests/reference/thermometry_vectors.py) through the elemental
! function and the status subroutine of each procedure, real(c_double) and real(c_float), a
! name "function@field" selecting one component of type(relicore_temperature_uncertainty); status
! lines must give their code and NaN in every real component (inputs 0). Then the frame (image)
! subroutines against the elemental functions (same bits), lengths and the combined standard
! uncertainty. The regular procedures are called through the generated dispatch
! tests/fortran/generated/thermometry_one.inc (from bindings/functions.toml).
!
!   test_thermometry THERMOMETRY_FILE RESPONSE_FILE          checks, "N passed, M failed"
!   test_thermometry --dump THERMOMETRY_FILE RESPONSE_FILE   "name bits" per double value line
program test_thermometry
  use, intrinsic :: iso_c_binding, only: c_double, c_float, c_int32_t
  use, intrinsic :: ieee_arithmetic, only: ieee_is_nan, ieee_value, ieee_quiet_nan
  use relicore
  use vector_files
  implicit none

  integer, parameter :: dp = c_double
  logical :: dump
  integer :: k

  program_name = 'test_thermometry'
  dump = .false.
  k = 1
  if (command_argument_count() >= 1) then
    if (argument(1) == '--dump') then
      dump = .true.
      k = 2
    end if
  end if
  if (command_argument_count() /= k + 1) error stop 'usage: test_thermometry [--dump] FILE RESPONSE_FILE'
  call scalar_file(argument(k))
  call response_file(argument(k + 1))
  if (dump) stop
  call frames()
  write (*, '(i0, a, i0, a)') passed, ' passed, ', failed, ' failed'
  if (failed > 0) error stop 1

contains

  ! One field of a result by the file's name.
  real(dp) function field64(r, name)
    type(relicore_temperature_uncertainty), intent(in) :: r
    character(len=*), intent(in) :: name
    integer :: i
    select case (name)
    case ('temperature_k')
      field64 = r%temperature_k
    case ('combined_standard_uncertainty_k')
      field64 = r%combined_standard_uncertainty_k
    case default
      ! sensitivity_<i>; no field (a status line): the temperature, NaN after a failure
      field64 = r%temperature_k
      if (len(name) > 12) then
        read (name(13:), *) i
        field64 = ieee_value(1.0_dp, ieee_quiet_nan)
        if (i >= 0 .and. i < r%inputs) field64 = r%sensitivity_coefficients(i + 1)
      end if
    end select
  end function field64

  real(dp) function field32(r, name)
    type(relicore_temperature_uncertainty_f32), intent(in) :: r
    character(len=*), intent(in) :: name
    type(relicore_temperature_uncertainty) :: d
    d%temperature_k = r%temperature_k
    d%combined_standard_uncertainty_k = r%combined_standard_uncertainty_k
    d%sensitivity_coefficients = real(r%sensitivity_coefficients, dp)
    d%inputs = r%inputs
    field32 = field64(d, name)
  end function field32

  logical function nan64(r)
    type(relicore_temperature_uncertainty), intent(in) :: r
    nan64 = ieee_is_nan(r%temperature_k) .and. ieee_is_nan(r%combined_standard_uncertainty_k) .and. &
        all(ieee_is_nan(r%sensitivity_coefficients)) .and. r%inputs == 0
  end function nan64

  logical function nan32(r)
    type(relicore_temperature_uncertainty_f32), intent(in) :: r
    nan32 = ieee_is_nan(r%temperature_k) .and. ieee_is_nan(r%combined_standard_uncertainty_k) .and. &
        all(ieee_is_nan(r%sensitivity_coefficients)) .and. r%inputs == 0
  end function nan32

  ! The verdict on one line: value (function form) and value_s (status form) of status stat.
  subroutine judge(where, name, f32, kind, want, tol, stat, value, value_s, nan_both)
    character(len=*), intent(in) :: where, name, kind
    logical, intent(in) :: f32, nan_both
    real(dp), intent(in) :: want, tol, value, value_s
    integer(c_int32_t), intent(in) :: stat
    real(dp) :: allowed
    if (kind == 'status') then
      if (dump) return
      call check(stat == int(nint(tol), c_int32_t) .and. nan_both, where // ' ' // name // &
          ': want status ' // int_text(nint(tol)) // ' and NaN, got ' // int_text(int(stat)))
      return
    end if
    if (dump) then
      if (.not. f32) write (*, '(a, 1x, a)') name, hex64(value)
      return
    end if
    select case (kind)
    case ('ulp32')
      allowed = tol * real(spacing(real(abs(want), c_float)), dp)
    case ('ulp')
      allowed = tol * ulp64(want)
    case ('rel')
      allowed = tol * abs(want)
    case default
      allowed = tol
    end select
    call check(stat == RELICORE_OK .and. abs(value - want) <= allowed .and. same64(value, value_s), &
        where // ' ' // name // ': want ' // g17(want) // ' got ' // g17(value) // ' (status form ' // &
        g17(value_s) // ', status ' // int_text(int(stat)) // ', allowed ' // g17(allowed) // ')')
  end subroutine judge

  subroutine scalar_file(file)
    character(len=*), intent(in) :: file
    integer :: unit, lineno, ntokens, nargs, at, n, k
    character(len=128) :: tokens(256)
    character(len=:), allocatable :: where, name, fieldname
    logical :: found, structured
    real(dp), allocatable :: a(:)
    real(dp) :: want, tol, f64, s64, got, got_s
    real(c_float) :: f32, s32
    type(relicore_temperature_uncertainty) :: r64, rs64
    type(relicore_temperature_uncertainty_f32) :: r32, rs32
    integer(c_int32_t) :: stat
    logical :: is32
    call open_vector_file(file, unit)
    lineno = 0
    where = ''
    do
      call next_record(unit, file, lineno, tokens, ntokens, where, found)
      if (.not. found) exit
      read (tokens(2), *) nargs
      allocate (a(nargs))
      do k = 1, nargs
        a(k) = number(tokens(2 + k), where)
      end do
      want = number(tokens(3 + nargs), where)
      tol = number(tokens(5 + nargs), where)
      at = index(tokens(1), '@')
      if (at > 0) then
        name = tokens(1)(1:at - 1)
        fieldname = trim(tokens(1)(at + 1:))
      else
        name = trim(tokens(1))
        fieldname = ''
      end if
      is32 = index(name, '_f32') == len(name) - 3 .and. len(name) > 4
      nargs = -1
      structured = .false.
      stat = -999
      f64 = 0; s64 = 0; f32 = 0; s32 = 0
      if (name == 'combined_standard_uncertainty' .or. &
          name == 'combined_standard_uncertainty_correlated') then
        n = nint(a(1))
        nargs = size(a)
        if (name == 'combined_standard_uncertainty') then
          f64 = relicore_combined_standard_uncertainty(a(2:1 + n), a(2 + n:1 + 2 * n))
          call relicore_combined_standard_uncertainty_s(a(2:1 + n), a(2 + n:1 + 2 * n), s64, stat)
        else
          f64 = relicore_combined_standard_uncertainty_correlated(a(2:1 + n), a(2 + n:1 + 2 * n), &
              reshape(a(2 + 2 * n:), [n, n]))
          call relicore_combined_standard_uncertainty_correlated_s(a(2:1 + n), a(2 + n:1 + 2 * n), &
              reshape(a(2 + 2 * n:), [n, n]), s64, stat)
        end if
      else
        select case (name)
        include 'generated/thermometry_one.inc'
        end select
      end if
      call check(nargs == size(a), where // ': no dispatch for ' // name // '/' // int_text(size(a)))
      if (structured .and. is32) then
        got = field32(r32, fieldname)
        got_s = field32(rs32, fieldname)
        call judge(where, trim(tokens(1)), .true., tokens(4 + size(a)), want, tol, stat, got, got_s, &
            nan32(r32) .and. nan32(rs32))
      else if (structured) then
        got = field64(r64, fieldname)
        got_s = field64(rs64, fieldname)
        call judge(where, trim(tokens(1)), .false., tokens(4 + size(a)), want, tol, stat, got, got_s, &
            nan64(r64) .and. nan64(rs64))
      else if (is32) then
        call judge(where, trim(tokens(1)), .true., tokens(4 + size(a)), want, tol, stat, real(f32, dp), &
            real(s32, dp), ieee_is_nan(f32) .and. ieee_is_nan(s32))
      else
        call judge(where, trim(tokens(1)), .false., tokens(4 + size(a)), want, tol, stat, f64, s64, &
            ieee_is_nan(f64) .and. ieee_is_nan(s64))
      end if
      deallocate (a)
    end do
    close (unit)
  end subroutine scalar_file

  subroutine response_file(file)
    character(len=*), intent(in) :: file
    integer :: unit, lineno, ntokens, nargs, npoints, at, j, k
    character(len=128) :: tokens(64), row(64)
    character(len=:), allocatable :: where, rwhere, name, fieldname
    logical :: found
    real(dp) :: a(12), want, tol, f64, s64
    real(dp), allocatable :: w(:), q(:)
    type(relicore_temperature_uncertainty) :: r64, rs64
    integer(c_int32_t) :: stat
    call open_vector_file(file, unit)
    lineno = 0
    where = ''
    rwhere = ''
    do
      call next_record(unit, file, lineno, tokens, ntokens, where, found)
      if (.not. found) exit
      read (tokens(2), *) npoints
      read (tokens(3), *) nargs
      do k = 1, nargs
        a(k) = number(tokens(3 + k), where)
      end do
      want = number(tokens(4 + nargs), where)
      tol = number(tokens(6 + nargs), where)
      allocate (w(npoints), q(npoints))
      do j = 1, npoints
        call next_record(unit, file, lineno, row, ntokens, rwhere, found)
        w(j) = number(row(1), rwhere)
        q(j) = number(row(2), rwhere)
      end do
      at = index(tokens(1), '@')
      if (at > 0) then
        name = tokens(1)(1:at - 1)
        fieldname = trim(tokens(1)(at + 1:))
      else
        name = trim(tokens(1))
        fieldname = ''
      end if
      stat = -999
      select case (name)
      case ('measured_response_weighted_radiance')
        f64 = relicore_measured_response_weighted_radiance(w, q, a(1), a(2), a(3), a(4), a(5))
        call relicore_measured_response_weighted_radiance_s(w, q, a(1), a(2), a(3), a(4), a(5), s64, stat)
      case ('object_temperature_response')
        f64 = relicore_object_temperature_response(w, q, a(1), a(2), a(3), a(4), a(5))
        call relicore_object_temperature_response_s(w, q, a(1), a(2), a(3), a(4), a(5), s64, stat)
      case ('response_weighted_radiance_temperature_derivative')
        f64 = relicore_response_weighted_radiance_temperature_derivative(w, q, a(1))
        call relicore_response_weighted_radiance_temperature_derivative_s(w, q, a(1), s64, stat)
      case ('object_temperature_response_with_uncertainty')
        r64 = relicore_object_temperature_response_with_uncertainty(w, q, a(1), a(2), a(3), a(4), &
            a(5), a(6), a(7), a(8), a(9), a(10))
        call relicore_object_temperature_response_with_uncertainty_s(w, q, a(1), a(2), a(3), a(4), &
            a(5), a(6), a(7), a(8), a(9), a(10), rs64, stat)
      case default
        call check(.false., where // ': no dispatch for ' // name)
      end select
      if (name == 'object_temperature_response_with_uncertainty') then
        if (len(fieldname) > 0) then
          f64 = field64(r64, fieldname)
          s64 = field64(rs64, fieldname)
        end if
        call judge(where, trim(tokens(1)), .false., tokens(5 + nargs), want, tol, stat, f64, s64, &
            nan64(r64) .and. nan64(rs64))
      else
        call judge(where, trim(tokens(1)), .false., tokens(5 + nargs), want, tol, stat, f64, s64, &
            ieee_is_nan(f64) .and. ieee_is_nan(s64))
      end if
      deallocate (w, q)
    end do
    close (unit)
  end subroutine response_file

  ! The budget frames: every pixel the whole value of the elemental _with_uncertainty function,
  ! bit for bit (double: wavelength, frequency, band; float: wavelength and frequency against their
  ! float elementals).
  subroutine budgets(s, e)
    real(dp), intent(in) :: s(:), e(:)
    type(relicore_temperature_uncertainty) :: b(size(s)), r, bf(3), bb(3)
    type(relicore_temperature_uncertainty_f32) :: b32(3), r32
    real(dp) :: sf(3), sb(3)
    real(c_float) :: s32(3)
    integer(c_int32_t) :: stat
    integer :: i
    logical :: ok
    call relicore_object_temperature_wavelength_budget_array(10e-6_dp, s, e, [293.0_dp], [0.9_dp], &
        [280.0_dp], [1e4_dp], [0.01_dp], [1.0_dp], [0.01_dp], [1.0_dp], b, stat)
    call check(stat == RELICORE_ERROR_OUT_OF_DOMAIN .and. nan64(b(17)) .and. b(17)%inputs == 0, &
        'budget frame: the first failing pixel''s code and its NaN value ' // int_text(int(stat)))
    ok = .true.
    do i = 1, size(s)
      r = relicore_object_temperature_wavelength_with_uncertainty(10e-6_dp, s(i), e(i), 293.0_dp, &
          0.9_dp, 280.0_dp, 1e4_dp, 0.01_dp, 1.0_dp, 0.01_dp, 1.0_dp)
      ok = ok .and. same_value(r, b(i))
    end do
    call check(ok, 'budget frame = elemental values, bit for bit')
    sf = relicore_spectral_radiance_frequency(3e13_dp, [300.0_dp, 320.0_dp, 350.0_dp])
    call relicore_object_temperature_frequency_budget_array(3e13_dp, sf, [0.9_dp], [293.0_dp], [0.9_dp], &
        [280.0_dp], [1e-14_dp], [0.01_dp], [1.0_dp], [0.01_dp], [1.0_dp], bf, stat)
    ok = stat == RELICORE_OK
    do i = 1, 3
      r = relicore_object_temperature_frequency_with_uncertainty(3e13_dp, sf(i), 0.9_dp, 293.0_dp, &
          0.9_dp, 280.0_dp, 1e-14_dp, 0.01_dp, 1.0_dp, 0.01_dp, 1.0_dp)
      ok = ok .and. same_value(r, bf(i))
    end do
    call check(ok, 'frequency budget frame = elemental values, bit for bit')
    sb = relicore_band_radiance_wavelength(8e-6_dp, 14e-6_dp, [300.0_dp, 320.0_dp, 350.0_dp])
    call relicore_object_temperature_band_budget_array(8e-6_dp, 14e-6_dp, sb, [0.9_dp], [293.0_dp], &
        [0.9_dp], [280.0_dp], [1.0_dp], [0.01_dp], [1.0_dp], [0.01_dp], [1.0_dp], bb, stat)
    ok = stat == RELICORE_OK
    do i = 1, 3
      r = relicore_object_temperature_band_with_uncertainty(8e-6_dp, 14e-6_dp, sb(i), 0.9_dp, 293.0_dp, &
          0.9_dp, 280.0_dp, 1.0_dp, 0.01_dp, 1.0_dp, 0.01_dp, 1.0_dp)
      ok = ok .and. same_value(r, bb(i))
    end do
    call check(ok, 'band budget frame = elemental values, bit for bit')
    s32 = real(relicore_spectral_radiance_wavelength(10e-6_dp, [300.0_dp, 320.0_dp, 350.0_dp]), c_float)
    call relicore_object_temperature_wavelength_budget_array_f32(1e-5_c_float, s32, [0.9_c_float], &
        [293.0_c_float], [0.9_c_float], [280.0_c_float], [1e3_c_float], [0.01_c_float], [1.0_c_float], &
        [0.01_c_float], [1.0_c_float], b32, stat)
    ok = stat == RELICORE_OK
    do i = 1, 3
      r32 = relicore_object_temperature_wavelength_with_uncertainty_f32(1e-5_c_float, s32(i), 0.9_c_float, &
          293.0_c_float, 0.9_c_float, 280.0_c_float, 1e3_c_float, 0.01_c_float, 1.0_c_float, 0.01_c_float, &
          1.0_c_float)
      ok = ok .and. transfer(r32%temperature_k, 0) == transfer(b32(i)%temperature_k, 0) .and. &
          transfer(r32%combined_standard_uncertainty_k, 0) == &
          transfer(b32(i)%combined_standard_uncertainty_k, 0) .and. &
          all(transfer(r32%sensitivity_coefficients, [0]) == transfer(b32(i)%sensitivity_coefficients, [0])) &
          .and. r32%inputs == b32(i)%inputs
    end do
    call check(ok, 'f32 budget frame = f32 elemental values, bit for bit')
    s32 = real(sf, c_float)
    call relicore_object_temperature_frequency_budget_array_f32(3e13_c_float, s32, [0.9_c_float], &
        [293.0_c_float], [0.9_c_float], [280.0_c_float], [1e-14_c_float], [0.01_c_float], [1.0_c_float], &
        [0.01_c_float], [1.0_c_float], b32, stat)
    call check(stat == RELICORE_OK .and. all(b32%inputs == 5), 'f32 frequency budget frame')
    s32 = real(sb, c_float)
    call relicore_object_temperature_band_budget_array_f32(8e-6_c_float, 14e-6_c_float, s32, [0.9_c_float], &
        [293.0_c_float], [0.9_c_float], [280.0_c_float], [1.0_c_float], [0.01_c_float], [1.0_c_float], &
        [0.01_c_float], [1.0_c_float], b32, stat)
    call check(stat == RELICORE_OK .and. all(b32%inputs == 5), 'f32 band budget frame')
    call relicore_object_temperature_wavelength_budget_array(10e-6_dp, s, e, [293.0_dp], [0.9_dp], &
        [280.0_dp], [1e4_dp], [0.01_dp], [1.0_dp], [0.01_dp], [1.0_dp], b(1:3), stat)
    call check(stat == RELICORE_ERROR_LENGTH_MISMATCH .and. nan64(b(1)), 'budget frame: out of the wrong size')
  end subroutine budgets

  ! Every field of two values, bit for bit.
  logical function same_value(a, b)
    type(relicore_temperature_uncertainty), intent(in) :: a, b
    same_value = same64(a%temperature_k, b%temperature_k) .and. &
        same64(a%combined_standard_uncertainty_k, b%combined_standard_uncertainty_k) .and. &
        all(same64(a%sensitivity_coefficients, b%sensitivity_coefficients)) .and. a%inputs == b%inputs
  end function same_value

  subroutine frames()
    integer, parameter :: n = 1000
    real(dp) :: s(n), e(n), t(n), tu(n), uu(n), l300, one
    real(c_float) :: s32(n), t32(n)
    type(relicore_temperature_uncertainty) :: r
    integer(c_int32_t) :: stat
    integer :: i
    logical :: ok
    l300 = relicore_spectral_radiance_wavelength(10e-6_dp, 300.0_dp)
    do i = 1, n
      s(i) = l300 * (0.8_dp + real(i, dp) / n)
      e(i) = 0.5_dp + 0.5_dp * real(mod(i, 7), dp) / 6
    end do
    s(17) = -1e9_dp
    call relicore_object_temperature_wavelength_array(10e-6_dp, s, e, [293.0_dp], [0.9_dp], [280.0_dp], &
        t, stat)
    call check(stat == RELICORE_ERROR_OUT_OF_DOMAIN .and. ieee_is_nan(t(17)), &
        'frame: the first failing pixel''s code ' // int_text(int(stat)))
    ok = all(same64(t, relicore_object_temperature_wavelength(10e-6_dp, s, e, 293.0_dp, 0.9_dp, 280.0_dp)))
    call check(ok, 'frame = elemental function, bit for bit')
    call relicore_object_temperature_wavelength_with_uncertainty_array(10e-6_dp, s, e, [293.0_dp], &
        [0.9_dp], [280.0_dp], [1e4_dp], [0.01_dp], [1.0_dp], [0.01_dp], [1.0_dp], tu, uu, stat)
    ok = .true.
    do i = 1, n
      r = relicore_object_temperature_wavelength_with_uncertainty(10e-6_dp, s(i), e(i), 293.0_dp, &
          0.9_dp, 280.0_dp, 1e4_dp, 0.01_dp, 1.0_dp, 0.01_dp, 1.0_dp)
      ok = ok .and. same64(r%temperature_k, tu(i)) .and. same64(r%combined_standard_uncertainty_k, uu(i))
    end do
    call check(ok, 'frame with uncertainty = elemental T and u_c, bit for bit')
    call budgets(s, e)
    call relicore_object_temperature_wavelength_array(10e-6_dp, s, e(1:2), [293.0_dp], [0.9_dp], &
        [280.0_dp], t, stat)
    call check(stat == RELICORE_ERROR_LENGTH_MISMATCH .and. all(ieee_is_nan(t)), 'frame: 2 emissivities')
    call relicore_object_temperature_wavelength_array(10e-6_dp, s(1:0), e(1:0), [293.0_dp], [0.9_dp], &
        [280.0_dp], t(1:0), stat)
    call check(stat == RELICORE_OK, 'frame: n = 0')
    call relicore_object_temperature_wavelength_array(10e-6_dp, s, e(1:0), [293.0_dp], [0.9_dp], &
        [280.0_dp], t, stat)
    call check(stat == RELICORE_ERROR_LENGTH_MISMATCH, 'frame: an empty parameter')
    s32 = real(s, c_float)
    call relicore_object_temperature_wavelength_array_f32(1e-5_c_float, s32, [0.9_c_float], &
        [293.0_c_float], [0.9_c_float], [280.0_c_float], t32, stat)
    ok = .true.
    do i = 1, n
      ok = ok .and. (transfer(t32(i), 0) == transfer(relicore_object_temperature_wavelength_f32( &
          1e-5_c_float, s32(i), 0.9_c_float, 293.0_c_float, 0.9_c_float, 280.0_c_float), 0))
    end do
    call check(ok, 'f32 frame = f32 elemental function, bit for bit')
    call relicore_object_temperature_band_array(8e-6_dp, 14e-6_dp, &
        [relicore_band_radiance_wavelength(8e-6_dp, 14e-6_dp, 310.0_dp)], [1.0_dp], [0.0_dp], [1.0_dp], &
        [0.0_dp], t(1:1), stat)
    call check(stat == RELICORE_OK .and. abs(t(1) - 310.0_dp) < 1e-10_dp, 'band frame, emissivity 1')
    call relicore_object_temperature_frequency_array(3e13_dp, &
        [relicore_spectral_radiance_frequency(3e13_dp, 310.0_dp)], [1.0_dp], [0.0_dp], [1.0_dp], &
        [0.0_dp], t(1:1), stat)
    call check(stat == RELICORE_OK .and. abs(t(1) - 310.0_dp) < 1e-10_dp, 'frequency frame, emissivity 1')
    ! the status forms name their routine; a bad emissivity gives the struct of NaN
    call relicore_object_temperature_wavelength_with_uncertainty_s(10e-6_dp, l300, 1.5_dp, 293.0_dp, &
        0.9_dp, 280.0_dp, 1.0_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.0_dp, r, stat)
    call check(stat == RELICORE_ERROR_OUT_OF_DOMAIN .and. nan64(r), 'emissivity 1.5: status and NaN')
    one = relicore_combined_standard_uncertainty([3.0_dp, 4.0_dp], [1.0_dp, 1.0_dp])
    call check(one == 5.0_dp, 'u_c of (3, 4) = 5')
    call relicore_combined_standard_uncertainty_correlated_s([3.0_dp, 4.0_dp], [1.0_dp, 1.0_dp], &
        reshape([1.0_dp, 2.0_dp, 2.0_dp, 1.0_dp], [2, 2]), one, stat)
    call check(stat == RELICORE_ERROR_OUT_OF_DOMAIN .and. ieee_is_nan(one), 'not a correlation matrix')
  end subroutine frames

end program test_thermometry
