! The reading and checking of the reference-vector files (tests/data/*.txt, format in
! tests/data/FORMAT.md) shared by the Fortran vector tests test_blackbody, test_cosmology and
! test_decoupling: the pass/fail counters, the text of numbers and bits, the record reader (line
! splitting, comments, number parsing), the tolerance of a line and the failure messages of a
! vector line (status lines, want/got).
!
! A program sets program_name first: it prefixes the error-stop messages of a malformed file
! ("test_cosmology: not a number: ...").
module vector_files
  use, intrinsic :: iso_c_binding, only: c_double, c_int32_t, c_int64_t
  use, intrinsic :: ieee_arithmetic, only: ieee_is_nan
  use, intrinsic :: iso_fortran_env, only: output_unit
  use relicore, only: RELICORE_OK, relicore_universe_parameters
  implicit none
  private

  public :: program_name, passed, failed
  public :: argument, check, g17, int_text, hex64, same64, ulp64, first_failure
  public :: open_vector_file, next_record, split, number
  public :: vector_nargs, universe_parameters, vector_call_text
  public :: known_call, check_status_line, allowed_deviation, check_value_line

  integer, parameter :: dp = c_double
  integer, parameter :: max_line = 4096

  character(len=32) :: program_name = ''
  integer :: passed = 0, failed = 0

contains

  ! ================================================================ bookkeeping

  function argument(k) result(value)
    integer, intent(in) :: k
    character(len=:), allocatable :: value
    integer :: length
    call get_command_argument(k, length=length)
    allocate (character(len=length) :: value)
    call get_command_argument(k, value)
  end function argument

  subroutine check(ok, message)
    logical, intent(in) :: ok
    character(len=*), intent(in) :: message
    if (ok) then
      passed = passed + 1
    else
      failed = failed + 1
      write (output_unit, '(a)') 'FAIL ' // message
    end if
  end subroutine check

  function g17(x) result(s)
    real(dp), intent(in) :: x
    character(len=:), allocatable :: s
    character(len=40) :: buffer
    write (buffer, '(es25.16e3)') x
    s = trim(adjustl(buffer))
  end function g17

  function int_text(k) result(s)
    integer, intent(in) :: k
    character(len=:), allocatable :: s
    character(len=24) :: buffer
    write (buffer, '(i0)') k
    s = trim(buffer)
  end function int_text

  function hex64(x) result(h)
    real(dp), intent(in) :: x
    character(len=16) :: h
    character(len=16), parameter :: digits = '0123456789ABCDEF'
    integer(c_int64_t) :: bits
    integer :: k, nibble
    bits = transfer(x, bits)
    do k = 1, 16
      nibble = int(ibits(bits, 4 * (16 - k), 4))
      h(k:k) = digits(nibble + 1:nibble + 1)
    end do
  end function hex64

  ! Same bits, or both NaN (the payload of a NaN is not part of the interface).
  elemental logical function same64(a, b)
    real(dp), intent(in) :: a, b
    same64 = transfer(a, 0_c_int64_t) == transfer(b, 0_c_int64_t) .or. &
        (ieee_is_nan(a) .and. ieee_is_nan(b))
  end function same64

  ! Spacing of doubles at |w| (at least the spacing at DBL_MIN): 2^-52 times the largest power
  ! of 2 not above max(|w|, DBL_MIN) (FORMAT.md).
  real(dp) function ulp64(w)
    real(dp), intent(in) :: w
    ulp64 = scale(1.0_dp, exponent(max(abs(w), tiny(1.0_dp))) - 1 - 52)
  end function ulp64

  integer(c_int32_t) function first_failure(stats)
    integer(c_int32_t), intent(in) :: stats(:)
    integer :: k
    first_failure = RELICORE_OK
    do k = 1, size(stats)
      if (stats(k) /= RELICORE_OK) then
        first_failure = stats(k)
        return
      end if
    end do
  end function first_failure

  ! ================================================================ reading a file

  subroutine open_vector_file(file, unit)
    character(len=*), intent(in) :: file
    integer, intent(out) :: unit
    integer :: ios
    open (newunit=unit, file=file, status='old', action='read', iostat=ios)
    if (ios /= 0) error stop trim(program_name) // ': cannot open ' // file
  end subroutine open_vector_file

  ! The next line of unit (file; lineno lines read so far) that is neither blank nor a comment,
  ! split into tokens; where is "file:lineno". found is .false. at the end of the file.
  subroutine next_record(unit, file, lineno, tokens, ntokens, where, found)
    integer, intent(in) :: unit
    character(len=*), intent(in) :: file
    integer, intent(inout) :: lineno
    character(len=*), intent(out) :: tokens(:)
    integer, intent(out) :: ntokens
    character(len=:), allocatable, intent(inout) :: where
    logical, intent(out) :: found
    character(len=max_line) :: line
    integer :: ios

    found = .false.
    ntokens = 0
    do
      read (unit, '(a)', iostat=ios) line
      if (ios /= 0) exit
      lineno = lineno + 1
      if (len_trim(line) == len(line)) error stop trim(program_name) // ': line too long in ' // file
      if (len_trim(line) == 0) cycle
      if (adjustl(line(1:1)) == '#') cycle
      call split(line, tokens, ntokens)
      where = file // ':' // int_text(lineno)
      found = .true.
      exit
    end do
  end subroutine next_record

  ! The blank-separated fields of line; at most size(tokens) of them.
  subroutine split(line, tokens, ntokens)
    character(len=*), intent(in) :: line
    character(len=*), intent(out) :: tokens(:)
    integer, intent(out) :: ntokens
    integer :: pos, next
    ntokens = 0
    pos = 1
    do
      do while (pos <= len_trim(line))
        if (line(pos:pos) /= ' ') exit
        pos = pos + 1
      end do
      if (pos > len_trim(line)) exit
      next = index(line(pos:), ' ')
      if (next == 0) next = len(line(pos:)) + 1
      ntokens = ntokens + 1
      if (ntokens > size(tokens)) error stop trim(program_name) // ': too many fields on a line'
      if (next - 1 > len(tokens(1))) error stop trim(program_name) // ': field too long'
      tokens(ntokens) = line(pos:pos + next - 2)
      pos = pos + next
    end do
  end subroutine split

  real(dp) function number(token, where)
    character(len=*), intent(in) :: token, where
    integer :: ios
    read (token, *, iostat=ios) number
    if (ios /= 0) error stop trim(program_name) // ': not a number: "' // trim(token) // '" at ' &
        // where
  end function number

  ! nargs of a vector line "function TARGET nargs args... expected kind tolerance source" of the
  ! universe and decoupling files (0 to 2 arguments); stops on a malformed line.
  integer function vector_nargs(tokens, ntokens, where)
    character(len=*), intent(in) :: tokens(:)
    integer, intent(in) :: ntokens
    character(len=*), intent(in) :: where
    if (ntokens < 3) error stop trim(program_name) // ': malformed vector at ' // where
    vector_nargs = nint(number(tokens(3), where))
    if (vector_nargs < 0 .or. vector_nargs > 2 .or. ntokens /= vector_nargs + 7) &
        error stop trim(program_name) // ': malformed vector at ' // where
  end function vector_nargs

  ! The parameter set of the twelve numbers of a universe line, in the order of FORMAT.md.
  function universe_parameters(values) result(params)
    real(dp), intent(in) :: values(12)
    type(relicore_universe_parameters) :: params
    params = relicore_universe_parameters(values(1), values(2), values(3), values(4), &
        values(5), values(6), values(7:9), values(10), values(11), values(12))
  end function universe_parameters

  ! "where name(target, arg_1, ...)": how the failure messages of a vector line name its call.
  function vector_call_text(where, name, target, args) result(call_text)
    character(len=*), intent(in) :: where, name, target
    real(dp), intent(in) :: args(:)
    character(len=:), allocatable :: call_text
    integer :: k
    call_text = trim(name) // '(' // trim(target)
    do k = 1, size(args)
      call_text = call_text // ', ' // g17(args(k))
    end do
    call_text = where // ' ' // call_text // ')'
  end function vector_call_text

  ! ================================================================ judging a vector line

  ! The first checks of a vector line: its name is known (known) and takes (takes) the nargs
  ! arguments of the line; a failed check and ok = .false. otherwise.
  subroutine known_call(call_text, name, known, takes, nargs, ok)
    character(len=*), intent(in) :: call_text, name
    logical, intent(in) :: known
    integer, intent(in) :: takes, nargs
    logical, intent(out) :: ok
    ok = .false.
    if (.not. known) then
      call check(.false., call_text // ': unknown function name')
      return
    end if
    if (takes /= nargs) then
      call check(.false., call_text // ': ' // trim(name) // ' takes ' // int_text(takes) // &
          ' arguments')
      return
    end if
    ok = .true.
  end subroutine known_call

  ! A status line (tolerance tol: the status code): the call must fail with that code and give
  ! NaN in both forms (value: the function form, value_s: the status form).
  subroutine check_status_line(call_text, tol, stat, value, value_s)
    character(len=*), intent(in) :: call_text
    real(dp), intent(in) :: tol, value, value_s
    integer(c_int32_t), intent(in) :: stat
    integer(c_int32_t) :: code
    logical :: ok
    code = int(nint(tol), c_int32_t)
    ok = stat == code .and. ieee_is_nan(value) .and. ieee_is_nan(value_s)
    call check(ok, call_text // ': want status ' // int_text(int(code)) // ' and NaN, got status ' &
        // int_text(int(stat)) // ', function ' // g17(value) // ', status form ' // &
        g17(value_s))
  end subroutine check_status_line

  ! The allowed |got - want| of a line of kind ulp, rel or abs; for any other kind a failed check
  ! and known = .false.
  subroutine allowed_deviation(call_text, kind, tol, want, allowed, known)
    character(len=*), intent(in) :: call_text, kind
    real(dp), intent(in) :: tol, want
    real(dp), intent(out) :: allowed
    logical, intent(out) :: known
    known = .true.
    select case (kind)
    case ('ulp')
      allowed = tol * ulp64(want)
    case ('rel')
      allowed = tol * abs(want)
    case ('abs')
      allowed = tol
    case default
      allowed = 0
      known = .false.
      call check(.false., call_text // ': unknown tolerance kind ' // trim(kind))
    end select
  end subroutine allowed_deviation

  ! The verdict ok on a value line, with want, the function form value, the status form value_s,
  ! the status and the deviation dev against the tolerance in the message.
  subroutine check_value_line(ok, call_text, want, value, value_s, stat, dev, kind, tolerance, &
      allowed)
    logical, intent(in) :: ok
    character(len=*), intent(in) :: call_text, kind, tolerance
    real(dp), intent(in) :: want, value, value_s, dev, allowed
    integer(c_int32_t), intent(in) :: stat
    call check(ok, call_text // ': want ' // g17(want) // ' got ' // g17(value) // &
        ' (status form ' // g17(value_s) // ', status ' // int_text(int(stat)) // &
        '), |got - want| = ' // g17(dev) // ' > ' // trim(kind) // ' ' // &
        trim(tolerance) // ' = ' // g17(allowed))
  end subroutine check_value_line

end module vector_files
