! Reference-vector test of the Fortran module relicore (bindings/fortran/relicore.f90).
!
!   test_blackbody FILE...        run the vectors of each file (tests/data/blackbody.txt,
!                                 tests/data/blackbody_response.txt; format in
!                                 tests/data/FORMAT.md), then the tests written here; ends with
!                                 "N passed, 0 failed", or stops with status 1 on any failure
!   test_blackbody --dump FILE    for every non-status vector of FILE, in file order, print
!                                 "name bits": the IEEE bit pattern of the result of the
!                                 Fortran function form, 16 hex digits (8 for _f32 names), as
!                                 Z16.16 / Z8.8 would print it; the Python tests compare
!                                 these bit for bit with their own and C's
!   test_blackbody --stop-check   prints "EXPECT <message>", then calls a status form without
!                                 stat on a failing input, which must stop (error stop) with
!                                 that message; tests/fortran/run.sh checks it
!
! Every line of a data file is dispatched by name to the Fortran wrappers: the elemental
! function form and the status form (with stat) are both called and must agree bit for bit;
! the result is compared with the line's tolerance (ulp, ulp32, rel, abs; a status line must
! fail with its code and give NaN in both forms). Failures print want/got with 17 significant
! digits. An unknown name is a failure. Tests written here: elemental calls on arrays equal
! the scalar calls bit for bit; the C array forms equal the elemental forms bit for bit
! (including failing elements and the first failing code), also for strided arrays; size
! checks; the response and calibration wrappers; stat and error stop; status messages and
! the version string. The record reader, number parsing, tolerances and failure messages it shares
! with test_cosmology and test_decoupling are in vector_files.f90 (module vector_files).
! The dispatch by name of the regular functions (their `case` blocks and name lists) is
! generated from bindings/functions.toml into tests/fortran/generated/*.inc by
! `python3 bindings/generate.py --write`; only the irregular functions are dispatched here.
program test_blackbody
  use, intrinsic :: iso_c_binding, only: c_double, c_float, c_int32_t, c_int64_t
  use, intrinsic :: ieee_arithmetic, only: ieee_is_nan, ieee_value, ieee_quiet_nan
  use, intrinsic :: iso_fortran_env, only: error_unit, output_unit
  use relicore
  ! same64 is not taken: the one below compares bits only (a NaN equals only the same NaN)
  use vector_files, only: program_name, passed, failed, argument, check, g17, int_text, hex64, &
      ulp64, first_failure, open_vector_file, next_record, split, number, known_call, &
      check_status_line, allowed_deviation, check_value_line
  implicit none

  integer, parameter :: dp = c_double, sp = c_float
  integer, parameter :: max_line = 4096, max_tokens = 40, max_args = 8

  ! What one dispatch returned: both forms in the precision of the name, and the status.
  type :: outcome
    logical :: known = .false.
    integer :: nargs = -1
    real(dp) :: f64 = 0, s64 = 0
    real(sp) :: f32 = 0, s32 = 0
    integer(c_int32_t) :: stat = -huge(0_c_int32_t)
  end type outcome

  ! A scalar vector line, kept for the array tests.
  type :: vector
    character(len=64) :: name = ''
    integer :: nargs = 0
    real(dp) :: args(max_args) = 0
    type(outcome) :: got
  end type vector

  type(vector), allocatable :: vectors(:)
  integer :: nvectors = 0
  character(len=:), allocatable :: first, path
  integer :: i

  program_name = 'test_blackbody'
  allocate (vectors(256))
  if (command_argument_count() < 1) then
    write (error_unit, '(a)') 'usage: test_blackbody FILE... | --dump FILE | --stop-check'
    error stop 2
  end if
  first = argument(1)
  select case (first)
  case ('--dump')
    if (command_argument_count() /= 2) error stop 'usage: test_blackbody --dump FILE'
    path = argument(2)
    call dump(path)
  case ('--stop-check')
    call stop_check()
  case default
    do i = 1, command_argument_count()
      path = argument(i)
      call run_file(path)
    end do
    call test_elemental_arrays()
    call test_array_forms()
    call test_status_forms()
    call test_calibration()
    call test_messages()
    write (output_unit, '(i0, a, i0, a)') passed, ' passed, ', failed, ' failed'
  end select
  deallocate (vectors, first)
  if (allocated(path)) deallocate (path)
  if (failed > 0) error stop 1

contains

  ! ================================================================ bookkeeping

  function hex32(x) result(h)
    real(sp), intent(in) :: x
    character(len=8) :: h
    character(len=16), parameter :: digits = '0123456789ABCDEF'
    integer(c_int32_t) :: bits
    integer :: k, nibble
    bits = transfer(x, bits)
    do k = 1, 8
      nibble = int(ibits(bits, 4 * (8 - k), 4))
      h(k:k) = digits(nibble + 1:nibble + 1)
    end do
  end function hex32

  logical function same64(a, b)
    real(dp), intent(in) :: a, b
    same64 = transfer(a, 0_c_int64_t) == transfer(b, 0_c_int64_t)
  end function same64

  logical function same32(a, b)
    real(sp), intent(in) :: a, b
    same32 = transfer(a, 0_c_int32_t) == transfer(b, 0_c_int32_t)
  end function same32

  ! Spacing of floats at |w| (at least the spacing at FLT_MIN): ulp64 of vector_files.f90 with
  ! f32 spacing (2^-23, FLT_MIN), computed exactly in double.
  real(dp) function ulp32(w)
    real(dp), intent(in) :: w
    ulp32 = scale(1.0_dp, exponent(max(abs(w), real(tiny(1.0_sp), dp))) - 1 - 23)
  end function ulp32

  logical function is_response(name)
    character(len=*), intent(in) :: name
    is_response = name == 'response_weighted_radiance' .or. &
        name == 'response_weighted_radiance_f32' .or. &
        name == 'temperature_from_response_weighted_radiance' .or. &
        name == 'temperature_from_response_weighted_radiance_f32'
  end function is_response

  logical function ends_with_f32(name)
    character(len=*), intent(in) :: name
    integer :: n
    n = len_trim(name)
    ends_with_f32 = .false.
    if (n >= 4) ends_with_f32 = name(n - 3:n) == '_f32'
  end function ends_with_f32

  ! ================================================================ the data files

  ! Reads every vector of a data file; calls action(...) for each. mode 'test' checks, mode
  ! 'dump' prints the bits.
  subroutine run_file(file)
    character(len=*), intent(in) :: file
    call walk(file, 'test')
  end subroutine run_file

  subroutine dump(file)
    character(len=*), intent(in) :: file
    call walk(file, 'dump')
  end subroutine dump

  subroutine walk(file, mode)
    character(len=*), intent(in) :: file, mode
    character(len=max_line) :: line
    character(len=64) :: tokens(max_tokens), point(max_tokens)
    integer :: unit, ios, ntokens, npoint_tokens, lineno, nargs, npoints, k
    logical :: found
    real(dp), allocatable :: wavelengths(:), response(:)
    character(len=:), allocatable :: where

    call open_vector_file(file, unit)
    lineno = 0
    do
      call next_record(unit, file, lineno, tokens, ntokens, where, found)
      if (.not. found) exit
      if (ntokens < 2) error stop 'test_blackbody: malformed line at ' // where
      if (is_response(tokens(1))) then
        ! name npoints arg expected kind tolerance source, then npoints lines of 2 numbers
        if (ntokens /= 7) error stop 'test_blackbody: malformed table header at ' // where
        npoints = nint(number(tokens(2), where))
        if (npoints < 0) error stop 'test_blackbody: negative npoints at ' // where
        allocate (wavelengths(npoints), response(npoints))
        do k = 1, npoints
          read (unit, '(a)', iostat=ios) line
          if (ios /= 0) error stop 'test_blackbody: table ends early after ' // where
          lineno = lineno + 1
          call split(line, point, npoint_tokens)
          if (npoint_tokens /= 2) error stop 'test_blackbody: malformed table row after ' // where
          wavelengths(k) = number(point(1), where)
          response(k) = number(point(2), where)
        end do
        call table_vector(where, mode, tokens(1), wavelengths, response, &
            number(tokens(3), where), tokens(4), tokens(5), tokens(6))
        deallocate (wavelengths, response)
      else
        ! name nargs arg_1 ... arg_nargs expected kind tolerance source
        nargs = nint(number(tokens(2), where))
        if (nargs < 0 .or. nargs > max_args .or. ntokens /= nargs + 6) &
            error stop 'test_blackbody: malformed vector at ' // where
        call scalar_vector(where, mode, tokens(1), nargs, tokens(3:2 + nargs), &
            tokens(3 + nargs), tokens(4 + nargs), tokens(5 + nargs))
      end if
    end do
    close (unit)
  end subroutine walk

  subroutine scalar_vector(where, mode, name, nargs, arg_tokens, expected, kind, tolerance)
    character(len=*), intent(in) :: where, mode, name, expected, kind, tolerance
    integer, intent(in) :: nargs
    character(len=64), intent(in) :: arg_tokens(:)
    real(dp) :: args(nargs)
    type(outcome) :: got
    type(vector), allocatable :: grown(:)
    integer :: k
    character(len=:), allocatable :: call_text

    do k = 1, nargs
      args(k) = number(arg_tokens(k), where)
    end do
    call evaluate_one(name, args, got)
    if (mode == 'dump') then
      if (.not. got%known .or. got%nargs /= nargs) &
          error stop 'test_blackbody --dump: unknown name or wrong nargs at ' // where
      if (kind == 'status') return
      if (ends_with_f32(name)) then
        write (output_unit, '(a, 1x, a)') trim(name), hex32(got%f32)
      else
        write (output_unit, '(a, 1x, a)') trim(name), hex64(got%f64)
      end if
      return
    end if

    call_text = trim(name) // '('
    do k = 1, nargs
      call_text = call_text // g17(args(k))
      if (k < nargs) call_text = call_text // ', '
    end do
    call_text = where // ' ' // call_text // ')'
    call judge(call_text, name, got, nargs, expected, kind, tolerance)

    if (got%known .and. got%nargs == nargs) then
      if (nvectors == size(vectors)) then
        allocate (grown(2 * size(vectors)))
        grown(1:nvectors) = vectors(1:nvectors)
        call move_alloc(grown, vectors)
      end if
      nvectors = nvectors + 1
      vectors(nvectors)%name = name
      vectors(nvectors)%nargs = nargs
      vectors(nvectors)%args(1:nargs) = args
      vectors(nvectors)%got = got
    end if
  end subroutine scalar_vector

  ! Checks one outcome against the line: both forms agree, then the tolerance or the status.
  subroutine judge(call_text, name, got, nargs, expected, kind, tolerance)
    character(len=*), intent(in) :: call_text, name, expected, kind, tolerance
    type(outcome), intent(in) :: got
    integer, intent(in) :: nargs
    real(dp) :: want, value, value_s, allowed, tol
    logical :: is32, ok

    call known_call(call_text, name, got%known, got%nargs, nargs, ok)
    if (.not. ok) return
    is32 = ends_with_f32(name)
    if (is32) then
      value = real(got%f32, dp)
      value_s = real(got%s32, dp)
    else
      value = got%f64
      value_s = got%s64
    end if
    tol = number(tolerance, call_text)

    if (kind == 'status') then
      call check_status_line(call_text, tol, got%stat, value, value_s)
      return
    end if

    want = number(expected, call_text)
    if (kind == 'ulp32') then
      allowed = tol * ulp32(want)
    else
      call allowed_deviation(call_text, kind, tol, want, allowed, ok)
      if (.not. ok) return
    end if
    if (is32) then
      ok = same32(got%f32, got%s32)
    else
      ok = same64(got%f64, got%s64)
    end if
    ok = ok .and. got%stat == RELICORE_OK .and. abs(value - want) <= allowed
    call check_value_line(ok, call_text, want, value, value_s, got%stat, abs(value - want), kind, &
        tolerance, allowed)
  end subroutine judge

  ! A response-table vector: function and status forms, then the same table passed as
  ! strided (non-contiguous) arrays must give the same bits.
  subroutine table_vector(where, mode, name, wavelengths, response, arg, expected, kind, tolerance)
    character(len=*), intent(in) :: where, mode, name, expected, kind, tolerance
    real(dp), intent(in) :: wavelengths(:), response(:), arg
    type(outcome) :: got, strided
    real(dp), allocatable :: wide(:, :)
    real(sp), allocatable :: wide32(:, :)
    integer :: n

    n = size(wavelengths)
    allocate (wide(2, n), wide32(2, n))
    wide(1, :) = wavelengths
    wide(2, :) = response
    wide32 = real(wide, sp)
    got%known = .true.
    got%nargs = 1
    strided = got
    select case (name)
    case ('response_weighted_radiance')
      got%f64 = relicore_response_weighted_radiance(wavelengths, response, arg)
      call relicore_response_weighted_radiance_s(wavelengths, response, arg, got%s64, got%stat)
      strided%f64 = relicore_response_weighted_radiance(wide(1, :), wide(2, :), arg)
    case ('temperature_from_response_weighted_radiance')
      got%f64 = relicore_temperature_from_response_weighted_radiance(wavelengths, response, arg)
      call relicore_temperature_from_response_weighted_radiance_s(wavelengths, response, arg, &
          got%s64, got%stat)
      strided%f64 = relicore_temperature_from_response_weighted_radiance(wide(1, :), &
          wide(2, :), arg)
    case ('response_weighted_radiance_f32')
      got%f32 = relicore_response_weighted_radiance_f32(real(wavelengths, sp), &
          real(response, sp), real(arg, sp))
      call relicore_response_weighted_radiance_f32_s(real(wavelengths, sp), &
          real(response, sp), real(arg, sp), got%s32, got%stat)
      strided%f32 = relicore_response_weighted_radiance_f32(wide32(1, :), wide32(2, :), &
          real(arg, sp))
    case ('temperature_from_response_weighted_radiance_f32')
      got%f32 = relicore_temperature_from_response_weighted_radiance_f32(real(wavelengths, sp), &
          real(response, sp), real(arg, sp))
      call relicore_temperature_from_response_weighted_radiance_f32_s(real(wavelengths, sp), &
          real(response, sp), real(arg, sp), got%s32, got%stat)
      strided%f32 = relicore_temperature_from_response_weighted_radiance_f32(wide32(1, :), &
          wide32(2, :), real(arg, sp))
    end select

    if (mode == 'dump') then
      if (kind == 'status') return
      if (ends_with_f32(name)) then
        write (output_unit, '(a, 1x, a)') trim(name), hex32(got%f32)
      else
        write (output_unit, '(a, 1x, a)') trim(name), hex64(got%f64)
      end if
      return
    end if
    call judge(where // ' ' // trim(name) // '(table of ' // int_text(n) // ' points, ' // &
        g17(arg) // ')', name, got, 1, expected, kind, tolerance)
    if (ends_with_f32(name)) then
      call check(same32(got%f32, strided%f32), where // ' ' // trim(name) // &
          ': strided table gives ' // g17(real(strided%f32, dp)) // ', contiguous ' // &
          g17(real(got%f32, dp)))
    else
      call check(same64(got%f64, strided%f64), where // ' ' // trim(name) // &
          ': strided table gives ' // g17(strided%f64) // ', contiguous ' // g17(got%f64))
    end if
  end subroutine table_vector

  ! ================================================================ dispatch by name

  ! Scalar calls: the elemental function and the status form (with stat) of the name.
  subroutine evaluate_one(name, a, got)
    character(len=*), intent(in) :: name
    real(dp), intent(in) :: a(:)
    type(outcome), intent(out) :: got
    real(dp) :: f64, s64
    real(sp) :: f32, s32
    integer(c_int32_t) :: stat, stat2
    type(relicore_two_load_calibration) :: cal64
    type(relicore_two_load_calibration_f32) :: cal32
    integer :: nargs

    f64 = ieee_value(f64, ieee_quiet_nan)
    s64 = f64
    f32 = ieee_value(f32, ieee_quiet_nan)
    s32 = f32
    stat = -huge(stat)
    stat2 = stat
    got%known = .true.
    select case (name)
    include 'generated/blackbody_one.inc'
    case ('calibrated_temperature')
      nargs = 6
      if (size(a, 1) == nargs) then
        cal64 = relicore_two_load_calibration(a(1), a(2), a(3), a(4), a(5))
        f64 = relicore_calibrated_temperature(cal64, a(6))
        call relicore_two_load_calibration_s(a(1), a(2), a(3), a(4), a(5), cal64, stat)
        call relicore_calibrated_temperature_s(cal64, a(6), s64, stat2)
        if (stat == RELICORE_OK) stat = stat2
      end if
    case ('calibrated_brightness_temperature')
      nargs = 6
      if (size(a, 1) == nargs) then
        cal64 = relicore_two_load_calibration(a(1), a(2), a(3), a(4), a(5))
        f64 = relicore_calibrated_brightness_temperature(cal64, a(6))
        call relicore_two_load_calibration_s(a(1), a(2), a(3), a(4), a(5), cal64, stat)
        call relicore_calibrated_brightness_temperature_s(cal64, a(6), s64, stat2)
        if (stat == RELICORE_OK) stat = stat2
      end if
    case ('calibrated_temperature_f32')
      nargs = 6
      if (size(a, 1) == nargs) then
        cal32 = relicore_two_load_calibration_f32(real(a(1), c_float), real(a(2), c_float), &
            real(a(3), c_float), real(a(4), c_float), real(a(5), c_float))
        f32 = relicore_calibrated_temperature_f32(cal32, real(a(6), c_float))
        call relicore_two_load_calibration_f32_s(real(a(1), c_float), real(a(2), c_float), &
            real(a(3), c_float), real(a(4), c_float), real(a(5), c_float), cal32, stat)
        call relicore_calibrated_temperature_f32_s(cal32, real(a(6), c_float), s32, stat2)
        if (stat == RELICORE_OK) stat = stat2
      end if
    case ('calibrated_brightness_temperature_f32')
      nargs = 6
      if (size(a, 1) == nargs) then
        cal32 = relicore_two_load_calibration_f32(real(a(1), c_float), real(a(2), c_float), &
            real(a(3), c_float), real(a(4), c_float), real(a(5), c_float))
        f32 = relicore_calibrated_brightness_temperature_f32(cal32, real(a(6), c_float))
        call relicore_two_load_calibration_f32_s(real(a(1), c_float), real(a(2), c_float), &
            real(a(3), c_float), real(a(4), c_float), real(a(5), c_float), cal32, stat)
        call relicore_calibrated_brightness_temperature_f32_s(cal32, real(a(6), c_float), &
            s32, stat2)
        if (stat == RELICORE_OK) stat = stat2
      end if
    case default
      got%known = .false.
      return
    end select
    got%nargs = nargs
    got%f64 = f64
    got%s64 = s64
    got%f32 = f32
    got%s32 = s32
    got%stat = stat
  end subroutine evaluate_one

  ! The same calls with every argument an array (one column of a per call): elemental use.
  subroutine evaluate_many(name, a, got)
    character(len=*), intent(in) :: name
    real(dp), intent(in) :: a(:, :)
    type(outcome), intent(out) :: got(:)
    real(dp) :: f64(size(a, 2)), s64(size(a, 2))
    real(sp) :: f32(size(a, 2)), s32(size(a, 2))
    integer(c_int32_t) :: stat(size(a, 2)), stat2(size(a, 2))
    type(relicore_two_load_calibration) :: cal64(size(a, 2))
    type(relicore_two_load_calibration_f32) :: cal32(size(a, 2))
    integer :: nargs

    f64 = ieee_value(f64, ieee_quiet_nan)
    s64 = f64
    f32 = ieee_value(f32, ieee_quiet_nan)
    s32 = f32
    stat = -huge(stat)
    stat2 = stat
    got%known = .true.
    select case (name)
    include 'generated/blackbody_many.inc'
    case ('calibrated_temperature')
      nargs = 6
      if (size(a, 1) == nargs) then
        cal64 = relicore_two_load_calibration(a(1, :), a(2, :), a(3, :), a(4, :), a(5, :))
        f64 = relicore_calibrated_temperature(cal64, a(6, :))
        call relicore_two_load_calibration_s(a(1, :), a(2, :), a(3, :), a(4, :), a(5, :), &
            cal64, stat)
        call relicore_calibrated_temperature_s(cal64, a(6, :), s64, stat2)
        where (stat == RELICORE_OK) stat = stat2
      end if
    case ('calibrated_brightness_temperature')
      nargs = 6
      if (size(a, 1) == nargs) then
        cal64 = relicore_two_load_calibration(a(1, :), a(2, :), a(3, :), a(4, :), a(5, :))
        f64 = relicore_calibrated_brightness_temperature(cal64, a(6, :))
        call relicore_two_load_calibration_s(a(1, :), a(2, :), a(3, :), a(4, :), a(5, :), &
            cal64, stat)
        call relicore_calibrated_brightness_temperature_s(cal64, a(6, :), s64, stat2)
        where (stat == RELICORE_OK) stat = stat2
      end if
    case ('calibrated_temperature_f32')
      nargs = 6
      if (size(a, 1) == nargs) then
        cal32 = relicore_two_load_calibration_f32(real(a(1, :), c_float), real(a(2, :), &
            c_float), real(a(3, :), c_float), real(a(4, :), c_float), real(a(5, :), c_float))
        f32 = relicore_calibrated_temperature_f32(cal32, real(a(6, :), c_float))
        call relicore_two_load_calibration_f32_s(real(a(1, :), c_float), real(a(2, :), &
            c_float), real(a(3, :), c_float), real(a(4, :), c_float), real(a(5, :), &
            c_float), cal32, stat)
        call relicore_calibrated_temperature_f32_s(cal32, real(a(6, :), c_float), s32, stat2)
        where (stat == RELICORE_OK) stat = stat2
      end if
    case ('calibrated_brightness_temperature_f32')
      nargs = 6
      if (size(a, 1) == nargs) then
        cal32 = relicore_two_load_calibration_f32(real(a(1, :), c_float), real(a(2, :), &
            c_float), real(a(3, :), c_float), real(a(4, :), c_float), real(a(5, :), c_float))
        f32 = relicore_calibrated_brightness_temperature_f32(cal32, real(a(6, :), c_float))
        call relicore_two_load_calibration_f32_s(real(a(1, :), c_float), real(a(2, :), &
            c_float), real(a(3, :), c_float), real(a(4, :), c_float), real(a(5, :), &
            c_float), cal32, stat)
        call relicore_calibrated_brightness_temperature_f32_s(cal32, real(a(6, :), &
            c_float), s32, stat2)
        where (stat == RELICORE_OK) stat = stat2
      end if
    case default
      got%known = .false.
      return
    end select
    got%nargs = nargs
    got%f64 = f64
    got%s64 = s64
    got%f32 = f32
    got%s32 = s32
    got%stat = stat
  end subroutine evaluate_many

  ! ================================================================ tests written here

  ! For each name: all its vectors' arguments as arrays through the elemental forms give the
  ! scalar calls' results bit for bit, and the per-element status codes.
  subroutine test_elemental_arrays()
    logical :: done(nvectors)
    integer :: k, j, n, m
    integer, allocatable :: members(:)
    real(dp), allocatable :: a(:, :)
    type(outcome), allocatable :: got(:)
    logical :: ok, is32
    character(len=:), allocatable :: detail

    done = .false.
    do k = 1, nvectors
      if (done(k)) cycle
      members = pack([(j, j = 1, nvectors)], vectors(1:nvectors)%name == vectors(k)%name)
      done(members) = .true.
      n = size(members)
      m = vectors(k)%nargs
      allocate (a(m, n), got(n))
      do j = 1, n
        a(:, j) = vectors(members(j))%args(1:m)
      end do
      call evaluate_many(trim(vectors(k)%name), a, got)
      is32 = ends_with_f32(vectors(k)%name)
      ok = .true.
      detail = ''
      do j = 1, n
        associate (one => vectors(members(j))%got, many => got(j))
          if (is32) then
            ok = same32(one%f32, many%f32) .and. same32(one%s32, many%s32)
          else
            ok = same64(one%f64, many%f64) .and. same64(one%s64, many%s64)
          end if
          ok = ok .and. one%stat == many%stat
          if (.not. ok) then
            detail = ': element ' // int_text(j) // ' scalar ' // g17(one%f64) // ' ' // &
                g17(real(one%f32, dp)) // ' status ' // int_text(int(one%stat)) // &
                ', elemental ' // g17(many%f64) // ' ' // g17(real(many%f32, dp)) // &
                ' status ' // int_text(int(many%stat))
            exit
          end if
        end associate
      end do
      call check(ok, 'elemental ' // trim(vectors(k)%name) // ' on arrays of ' // &
          int_text(n) // ' differs from the scalar calls' // detail)
      deallocate (a, got)
    end do
  end subroutine test_elemental_arrays

  ! The C array forms, for every vector name that has one: x = the first argument of all its
  ! vectors (the second for brightness temperature), at each distinct fixed argument of those
  ! vectors. out must equal the elemental function bit for bit (NaN where an element fails),
  ! stat the first failing element's code; a reversed input with a strided output gives the
  ! same values; a too-long out is RELICORE_ERROR_LENGTH_MISMATCH with every element NaN; an
  ! empty array is RELICORE_OK.
  subroutine test_array_forms()
    include 'generated/blackbody_names.inc'
    integer :: k, j, which, vary, hold
    integer, allocatable :: members(:)
    real(dp), allocatable :: values(:), fixed_values(:)

    do k = 1, size(array_names)
      members = pack([(j, j = 1, nvectors)], vectors(1:nvectors)%name == array_names(k))
      call check(size(members) > 1, 'array forms: fewer than 2 vectors of ' // trim(array_names(k)))
      if (size(members) < 2) cycle
      vary = array_positions(k)
      hold = 3 - vary
      values = [(vectors(members(j))%args(vary), j = 1, size(members))]
      fixed_values = [(vectors(members(j))%args(hold), j = 1, size(members))]
      do which = 1, size(fixed_values)
        if (any(same_value(fixed_values(1:which - 1), fixed_values(which)))) cycle
        if (ends_with_f32(array_names(k))) then
          call array_form_32(array_names(k), real(values, sp), real(fixed_values(which), sp))
        else
          call array_form_64(array_names(k), values, fixed_values(which))
        end if
      end do
    end do
  end subroutine test_array_forms

  elemental logical function same_value(a, b)
    real(dp), intent(in) :: a, b
    same_value = transfer(a, 0_c_int64_t) == transfer(b, 0_c_int64_t)
  end function same_value

  subroutine array_form_64(name, x, fixed)
    character(len=*), intent(in) :: name
    real(dp), intent(in) :: x(:), fixed
    real(dp) :: out(size(x)), ref(size(x)), ref_s(size(x)), out_strided(2 * size(x))
    real(dp) :: too_long(size(x) + 1)
    integer(c_int32_t) :: stat, stat_reversed, stat_mismatch, stat_empty, stats(size(x))
    integer :: n, k
    logical :: ok
    n = size(x)
    out_strided = 0
    select case (name)
    include 'generated/blackbody_array_64.inc'
    case default
      error stop 'test_blackbody: no array form for ' // name
    end select
    ok = stat == first_failure(stats) .and. stat_empty == RELICORE_OK
    ok = ok .and. stat_mismatch == RELICORE_ERROR_LENGTH_MISMATCH .and. all(ieee_is_nan(too_long))
    do k = 1, n
      ok = ok .and. same64(out(k), ref(k)) .and. same64(ref_s(k), ref(k)) .and. &
          same64(out_strided(2 * k), out(k))
    end do
    ok = ok .and. all(out_strided(1::2) == 0)
    call check(ok, 'array form ' // trim(name) // '_array(' // int_text(n) // ' values, ' // &
        g17(fixed) // '): status ' // int_text(int(stat)) // ' (elemental: first failure ' // &
        int_text(int(first_failure(stats))) // '), or values differ from the elemental form')
  end subroutine array_form_64

  subroutine array_form_32(name, x, fixed)
    character(len=*), intent(in) :: name
    real(sp), intent(in) :: x(:), fixed
    real(sp) :: out(size(x)), ref(size(x)), ref_s(size(x)), out_strided(2 * size(x))
    real(sp) :: too_long(size(x) + 1)
    integer(c_int32_t) :: stat, stat_reversed, stat_mismatch, stat_empty, stats(size(x))
    integer :: n, k
    logical :: ok
    n = size(x)
    out_strided = 0
    select case (name)
    include 'generated/blackbody_array_32.inc'
    case default
      error stop 'test_blackbody: no array form for ' // name
    end select
    ok = stat == first_failure(stats) .and. stat_empty == RELICORE_OK
    ok = ok .and. stat_mismatch == RELICORE_ERROR_LENGTH_MISMATCH .and. all(ieee_is_nan(too_long))
    do k = 1, n
      ok = ok .and. same32(out(k), ref(k)) .and. same32(ref_s(k), ref(k)) .and. &
          same32(out_strided(2 * k), out(k))
    end do
    ok = ok .and. all(out_strided(1::2) == 0)
    call check(ok, 'array form ' // trim(name) // '(' // int_text(n) // ' values, ' // &
        g17(real(fixed, dp)) // '): status ' // int_text(int(stat)) // &
        ' (elemental: first failure ' // int_text(int(first_failure(stats))) // &
        '), or values differ from the elemental form')
  end subroutine array_form_32

  ! stat present or absent; elemental status forms with array stat.
  subroutine test_status_forms()
    real(dp) :: out, with_stat, outs(3)
    integer(c_int32_t) :: stat, stats(3)
    real(dp), parameter :: temperatures(3) = [300.0_dp, -1.0_dp, 5800.0_dp]

    ! without stat, a successful call neither stops nor differs from the call with stat
    call relicore_peak_wavelength_s(300.0_dp, out)
    call relicore_peak_wavelength_s(300.0_dp, with_stat, stat)
    call check(stat == RELICORE_OK .and. same64(out, with_stat) .and. &
        same64(out, relicore_peak_wavelength(300.0_dp)), &
        'status form without stat differs from the form with stat')
    ! the array status of an elemental status form: one code per element
    call relicore_peak_wavelength_s(temperatures, outs, stats)
    call check(stats(1) == RELICORE_OK .and. stats(2) == RELICORE_ERROR_NON_POSITIVE .and. &
        stats(3) == RELICORE_OK .and. ieee_is_nan(outs(2)) .and. &
        same64(outs(1), relicore_peak_wavelength(temperatures(1))) .and. &
        same64(outs(3), relicore_peak_wavelength(temperatures(3))), &
        'elemental status form on an array: want statuses 0, ' // &
        int_text(int(RELICORE_ERROR_NON_POSITIVE)) // ', 0, got ' // int_text(int(stats(1))) // &
        ', ' // int_text(int(stats(2))) // ', ' // int_text(int(stats(3))))
    ! keyword arguments carry the C names
    call check(same64(relicore_band_radiance_wavelength(temperature_k=1000.0_dp, &
        upper_m=2.0e-6_dp, lower_m=1.0e-6_dp), &
        relicore_band_radiance_wavelength(1.0e-6_dp, 2.0e-6_dp, 1000.0_dp)), &
        'keyword arguments in another order give another result')
    call test_response_sizes()
  end subroutine test_status_forms

  ! The response wrappers pass sizes; the C library judges them (an empty table is never a
  ! NULL pointer).
  subroutine test_response_sizes()
    real(dp) :: wavelengths(3), response(3), out
    real(sp) :: out32
    integer(c_int32_t) :: stat
    wavelengths = [8.0e-6_dp, 1.0e-5_dp, 1.2e-5_dp]
    response = [0.5_dp, 1.0_dp, 0.5_dp]

    call relicore_response_weighted_radiance_s(wavelengths, response, 300.0_dp, out, stat)
    call check(stat == RELICORE_OK .and. out > 0, 'response-weighted radiance of a valid table')
    call relicore_response_weighted_radiance_s(wavelengths, response(1:2), 300.0_dp, out, stat)
    call check(stat == RELICORE_ERROR_LENGTH_MISMATCH .and. ieee_is_nan(out), &
        'tables of different sizes: want RELICORE_ERROR_LENGTH_MISMATCH, got ' // &
        int_text(int(stat)))
    call relicore_response_weighted_radiance_s(wavelengths(1:0), response(1:0), 300.0_dp, out, &
        stat)
    call check(stat == RELICORE_ERROR_ARRAY_TOO_SHORT .and. ieee_is_nan(out), &
        'empty table: want RELICORE_ERROR_ARRAY_TOO_SHORT, got ' // int_text(int(stat)))
    call relicore_response_weighted_radiance_s(wavelengths(1:0), response, 300.0_dp, out, stat)
    call check((stat == RELICORE_ERROR_LENGTH_MISMATCH .or. &
        stat == RELICORE_ERROR_ARRAY_TOO_SHORT) .and. ieee_is_nan(out), &
        'empty wavelengths, 3 responses: want a length error, got ' // int_text(int(stat)))
    call relicore_temperature_from_response_weighted_radiance_s(wavelengths(1:1), &
        response(1:1), 1.0_dp, out, stat)
    call check(stat == RELICORE_ERROR_ARRAY_TOO_SHORT .and. ieee_is_nan(out), &
        'one-point table: want RELICORE_ERROR_ARRAY_TOO_SHORT, got ' // int_text(int(stat)))
    call relicore_response_weighted_radiance_s(wavelengths(3:1:-1), response, 300.0_dp, out, &
        stat)
    call check(stat == RELICORE_ERROR_NOT_INCREASING .and. ieee_is_nan(out) .and. &
        ieee_is_nan(relicore_response_weighted_radiance(wavelengths(3:1:-1), response, &
        300.0_dp)), 'decreasing wavelengths: want RELICORE_ERROR_NOT_INCREASING, got ' // &
        int_text(int(stat)))
    call relicore_response_weighted_radiance_f32_s(real(wavelengths(1:0), sp), &
        real(response(1:0), sp), 300.0_sp, out32, stat)
    call check(stat == RELICORE_ERROR_ARRAY_TOO_SHORT .and. ieee_is_nan(out32), &
        'empty f32 table: want RELICORE_ERROR_ARRAY_TOO_SHORT, got ' // int_text(int(stat)))
  end subroutine test_response_sizes

  ! The calibration types: layout of the C structs, the structure constructor and the
  ! generic constructor, a struct no calibration can produce.
  subroutine test_calibration()
    type(relicore_two_load_calibration) :: cal, by_status, bad
    type(relicore_two_load_calibration_f32) :: cal32, bad32
    integer(c_int32_t) :: stat
    real(dp) :: t
    real(sp) :: t32

    call check(storage_size(cal) == 3 * storage_size(1.0_dp) .and. &
        storage_size(cal32) == 3 * storage_size(1.0_sp), &
        'calibration types are not three packed reals')
    cal = relicore_two_load_calibration(9.0e10_dp, 2.0_dp, 300.0_dp, 1.0_dp, 77.0_dp)
    call relicore_two_load_calibration_s(9.0e10_dp, 2.0_dp, 300.0_dp, 1.0_dp, 77.0_dp, &
        by_status, stat)
    call check(stat == RELICORE_OK .and. same64(cal%frequency_hz, by_status%frequency_hz) .and. &
        same64(cal%gain, by_status%gain) .and. same64(cal%offset, by_status%offset) .and. &
        cal%frequency_hz == 9.0e10_dp, &
        'generic calibration constructor and status form disagree')
    ! the structure constructor (three fields) rebuilds the same calibration
    call check(same64(relicore_calibrated_temperature(relicore_two_load_calibration( &
        cal%frequency_hz, cal%gain, cal%offset), 1.5_dp), &
        relicore_calibrated_temperature(cal, 1.5_dp)), &
        'structure constructor of the calibration type')
    ! a struct that relicore_two_load_calibration cannot produce
    bad = relicore_two_load_calibration(9.0e10_dp, 0.0_dp, 0.0_dp)
    call relicore_calibrated_temperature_s(bad, 1.5_dp, t, stat)
    call check(stat == RELICORE_ERROR_INVALID_STRUCT .and. ieee_is_nan(t), &
        'zero gain: want RELICORE_ERROR_INVALID_STRUCT, got ' // int_text(int(stat)))
    bad32 = relicore_two_load_calibration_f32(9.0e10_sp, 0.0_sp, 0.0_sp)
    call relicore_calibrated_brightness_temperature_f32_s(bad32, 1.5_sp, t32, stat)
    call check(stat == RELICORE_ERROR_INVALID_STRUCT .and. ieee_is_nan(t32), &
        'zero gain (f32): want RELICORE_ERROR_INVALID_STRUCT, got ' // int_text(int(stat)))
    ! degenerate loads: every field NaN
    call relicore_two_load_calibration_s(9.0e10_dp, 2.0_dp, 77.0_dp, 1.0_dp, 300.0_dp, cal, stat)
    call check(stat == RELICORE_ERROR_DEGENERATE_CALIBRATION .and. &
        ieee_is_nan(cal%frequency_hz) .and. ieee_is_nan(cal%gain) .and. &
        ieee_is_nan(cal%offset), 'degenerate loads: want every field NaN and status ' // &
        int_text(int(RELICORE_ERROR_DEGENERATE_CALIBRATION)) // ', got ' // int_text(int(stat)))
    cal32 = relicore_two_load_calibration_f32(9.0e10_sp, 2.0_sp, 77.0_sp, 1.0_sp, 300.0_sp)
    call check(ieee_is_nan(cal32%frequency_hz) .and. ieee_is_nan(cal32%gain) .and. &
        ieee_is_nan(cal32%offset), 'degenerate loads (f32): want every field NaN')
  end subroutine test_calibration

  ! Status messages: one per code, distinct, none the "unknown" message; the version string
  ! matches the header's version numbers.
  subroutine test_messages()
    integer(c_int32_t), parameter :: codes(*) = [RELICORE_OK, RELICORE_ERROR_NULL_POINTER, &
        RELICORE_ERROR_NON_FINITE, RELICORE_ERROR_NON_POSITIVE, RELICORE_ERROR_NEGATIVE, &
        RELICORE_ERROR_EMPTY_INTERVAL, RELICORE_ERROR_ARRAY_TOO_SHORT, &
        RELICORE_ERROR_LENGTH_MISMATCH, RELICORE_ERROR_NOT_INCREASING, &
        RELICORE_ERROR_DEGENERATE_CALIBRATION, RELICORE_ERROR_OUT_OF_DOMAIN, &
        RELICORE_ERROR_NO_CONVERGENCE, RELICORE_ERROR_INVALID_STRUCT, RELICORE_ERROR_PANIC, &
        RELICORE_ERROR_INVALID_PARAMETER, RELICORE_ERROR_NO_BIG_BANG, &
        RELICORE_ERROR_CAPACITY_TOO_SMALL]
    character(len=:), allocatable :: unknown, a, version
    integer :: k, j
    logical :: ok

    unknown = relicore_status_message(1_c_int32_t)
    call check(len(unknown) > 0 .and. &
        relicore_status_message(-huge(1_c_int32_t)) == unknown .and. &
        relicore_status_message(RELICORE_ERROR_CAPACITY_TOO_SMALL - 1_c_int32_t) == unknown, &
        'codes that are not relicore status codes share one message')
    do k = 1, size(codes)
      a = relicore_status_message(codes(k))
      ok = len(a) > 0 .and. len(a) < 4096 .and. a /= unknown .and. index(a, achar(0)) == 0
      do j = k + 1, size(codes)
        ok = ok .and. a /= relicore_status_message(codes(j))
      end do
      call check(ok, 'status ' // int_text(int(codes(k))) // ': message "' // a // &
          '" is empty, unknown or shared')
    end do
    call check(codes(1) == 0 .and. all(codes(2:) == [(-k, k = 1, size(codes) - 1)]), &
        'status codes are not 0, -1, ..., -16 (FORMAT.md)')
    version = relicore_version()
    call check(version == int_text(int(RELICORE_VERSION_MAJOR)) // '.' // &
        int_text(int(RELICORE_VERSION_MINOR)) // '.' // int_text(int(RELICORE_VERSION_PATCH)), &
        'relicore_version() = "' // version // '" differs from the RELICORE_VERSION_* constants')
  end subroutine test_messages

  ! A failing status form without stat must stop with the routine name and the message.
  subroutine stop_check()
    real(dp) :: out
    write (output_unit, '(a)') 'EXPECT relicore_spectral_radiance_wavelength: ' // &
        relicore_status_message(RELICORE_ERROR_NON_POSITIVE) // ' (status ' // &
        int_text(int(RELICORE_ERROR_NON_POSITIVE)) // ')'
    flush (output_unit)
    call relicore_spectral_radiance_wavelength_s(1.0e-6_dp, -1.0_dp, out)
    write (output_unit, '(a)') 'the call returned ' // g17(out) // ' instead of stopping'
  end subroutine stop_check

end program test_blackbody
