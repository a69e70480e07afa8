! Reference-vector test of the growth procedures of the Fortran module relicore
! (bindings/fortran/relicore.f90).
!
!   test_growth FILE           reads FILE (tests/data/growth.txt; format in tests/data/FORMAT.md,
!                              section "Growth file"): builds every universe, computes every growth
!                              ("growth NAME UNIVERSE") with relicore_linear_growth_compute and
!                              every spectrum ("spectrum NAME GROWTH FORM NORMALISATION VALUE n_s
!                              alpha_s") with relicore_linear_power_spectrum_compute, and checks
!                              every vector line (TARGET a universe, a growth, a spectrum or "-");
!                              then the tests written here; ends with "N passed, 0 failed", or
!                              stops with status 1
!   test_growth --dump FILE    for every non-status vector of FILE, in file order, prints
!                              "target function bits" (16 hex digits of the function form's
!                              result) for the bit-for-bit comparison with C and Python
!
! Every vector is dispatched by name (tests/fortran/generated/growth_one.inc, generated from
! bindings/functions.toml) to the elemental function form and the status form, which must agree
! bit for bit; the array forms (growth_array.inc) over the first argument must give the
! elemental results bit for bit on every vector. Tests written here: a growth or spectrum never
! computed is refused; copies; the default options; the construction errors (each clears its
! output). Growths and spectra are allocatable (131080 bytes each: not for the stack).
program test_growth
  use, intrinsic :: iso_c_binding, only: c_double, c_int32_t
  use, intrinsic :: ieee_arithmetic, only: ieee_is_nan, ieee_value, ieee_quiet_nan
  use, intrinsic :: iso_fortran_env, only: output_unit
  use relicore
  use vector_files
  implicit none

  integer, parameter :: dp = c_double
  integer, parameter :: max_tokens = 24, max_named = 32

  include 'generated/growth_names.inc'

  type(relicore_universe), allocatable :: universes(:)
  type(relicore_linear_growth), allocatable :: growths(:)
  type(relicore_linear_power_spectrum), allocatable :: spectra(:)
  character(len=64) :: universe_names(max_named), growth_names(max_named), spectrum_names(max_named)
  integer :: nu = 0, ng = 0, ns = 0, lines = 0, array_checks = 0
  integer :: seen(size(all_names))
  logical :: dump

  allocate (universes(max_named), growths(max_named), spectra(max_named))
  seen = 0
  program_name = 'test_growth'
  if (command_argument_count() == 2) then
    dump = argument(1) == '--dump'
    if (.not. dump) stop 2
    call run_file(argument(2))
    if (failed > 0) error stop 1
    deallocate (universes, growths, spectra)
  else if (command_argument_count() == 1) then
    dump = .false.
    call run_file(argument(1))
    call check_coverage()
    call check_interfaces()
    write (output_unit, '(a)') 'universes: ' // int_text(nu) // '; growths: ' // int_text(ng) // &
        '; spectra: ' // int_text(ns) // '; vector lines: ' // int_text(lines) // &
        '; array-form checks: ' // int_text(array_checks)
    write (output_unit, '(a)') int_text(passed) // ' passed, ' // int_text(failed) // ' failed'
    if (failed > 0 .or. passed == 0) error stop 1
    deallocate (universes, growths, spectra)
  else
    write (output_unit, '(a)') 'usage: test_growth FILE | test_growth --dump FILE'
    stop 2
  end if

contains

  integer function find(names, n, name)
    character(len=64), intent(in) :: names(:)
    integer, intent(in) :: n
    character(len=*), intent(in) :: name
    integer :: k
    find = 0
    do k = 1, n
      if (names(k) == name) then
        find = k
        return
      end if
    end do
  end function find

  subroutine run_file(file)
    character(len=*), intent(in) :: file
    character(len=64) :: tokens(max_tokens)
    character(len=:), allocatable :: where
    integer :: unit, lineno, ntokens, k
    logical :: found
    real(dp) :: values(12)
    type(relicore_linear_power_spectrum_options) :: o
    integer(c_int32_t) :: stat
    call open_vector_file(file, unit)
    lineno = 0
    do
      call next_record(unit, file, lineno, tokens, ntokens, where, found)
      if (.not. found) exit
      select case (tokens(1))
      case ('universe')
        nu = nu + 1
        universe_names(nu) = tokens(2)
        do k = 1, 12
          values(k) = number(tokens(2 + k), where)
        end do
        call relicore_universe_init(universe_parameters(values), universes(nu), stat)
        call check(stat == RELICORE_OK, where // ': universe ' // trim(tokens(2)))
      case ('growth')
        ng = ng + 1
        growth_names(ng) = tokens(2)
        k = find(universe_names, nu, tokens(3))
        call check(k > 0, where // ': unknown universe')
        if (k > 0) then
          call relicore_linear_growth_compute(universes(k), growths(ng), stat)
          call check(stat == RELICORE_OK, where // ': growth ' // trim(tokens(2)))
        end if
      case ('spectrum')
        ns = ns + 1
        spectrum_names(ns) = tokens(2)
        k = find(growth_names, ng, tokens(3))
        o = relicore_linear_power_spectrum_options_default()
        o%transfer_form = merge(RELICORE_TRANSFER_BARYON_OSCILLATIONS, RELICORE_TRANSFER_NO_WIGGLE, &
            tokens(4) == 'oscillations')
        o%normalisation = merge(RELICORE_NORMALISATION_SIGMA8, RELICORE_NORMALISATION_SCALAR_AMPLITUDE, &
            tokens(5) == 'sigma8')
        o%value = number(tokens(6), where)
        o%spectral_index = number(tokens(7), where)
        o%running = number(tokens(8), where)
        call check(k > 0, where // ': unknown growth')
        if (k > 0) then
          call relicore_linear_power_spectrum_compute(growths(k), o, spectra(ns), stat)
          call check(stat == RELICORE_OK, where // ': spectrum ' // trim(tokens(2)))
        end if
      case default
        call vector_line(tokens, ntokens, where)
      end select
    end do
    close (unit)
  end subroutine run_file

  subroutine vector_line(tokens, ntokens, where)
    character(len=64), intent(in) :: tokens(:)
    integer, intent(in) :: ntokens
    character(len=*), intent(in) :: where
    integer :: nargs, k, which, iu, ig, ip
    real(dp), allocatable :: a(:)
    real(dp) :: want, tol, f64, s64
    integer(c_int32_t) :: stat
    character(len=64) :: kind
    logical :: known
    which = 0
    do k = 1, size(all_names)
      if (all_names(k) == tokens(1)) which = k
    end do
    read (tokens(3), *) nargs
    call check(which > 0 .and. ntokens == 6 + nargs + 1, where // ': unknown or malformed line')
    if (which == 0 .or. ntokens /= 7 + nargs) return
    allocate (a(nargs))
    do k = 1, nargs
      a(k) = number(tokens(3 + k), where)
    end do
    want = number(tokens(4 + nargs), where)
    kind = tokens(5 + nargs)
    tol = number(tokens(6 + nargs), where)
    iu = 1
    ig = 1
    ip = 1
    select case (receiver_of(which))
    case ('universe')
      iu = find(universe_names, nu, tokens(2))
      known = iu > 0
    case ('growth')
      ig = find(growth_names, ng, tokens(2))
      known = ig > 0
    case ('power_spectrum')
      ip = find(spectrum_names, ns, tokens(2))
      known = ip > 0
    case default
      known = tokens(2) == '-'
    end select
    call check(known, where // ': unknown target ' // trim(tokens(2)))
    if (.not. known) return
    seen(which) = seen(which) + 1
    lines = lines + 1
    call dispatch(tokens(1), universes(iu), growths(ig), spectra(ip), a, nargs, f64, s64, stat)
    if (dump) then
      if (kind /= 'status') then
        write (output_unit, '(a)') trim(tokens(2)) // ' ' // trim(tokens(1)) // ' ' // hex64(f64)
        call check(stat == RELICORE_OK, where // ': failed')
      end if
      return
    end if
    call check(same64(f64, s64), where // ': function and status forms differ')
    if (kind == 'status') then
      call check(stat == int(tol, c_int32_t) .and. ieee_is_nan(f64), where // ': ' // &
          trim(tokens(1)) // ' status ' // int_text(int(stat)) // ' want ' // trim(tokens(6 + nargs)))
    else if (kind == 'rel') then
      call check(stat == RELICORE_OK .and. (f64 == want .or. abs(f64 - want) <= tol * abs(want)), &
          where // ': ' // trim(tokens(1)) // ' = ' // g17(f64) // ' want ' // g17(want))
    else
      call check(stat == RELICORE_OK .and. (f64 == want .or. abs(f64 - want) <= tol), &
          where // ': ' // trim(tokens(1)) // ' = ' // g17(f64) // ' want ' // g17(want))
    end if
    if (nargs > 0) call array_form(tokens(1), universes(iu), growths(ig), spectra(ip), a, f64, &
        stat, where)
  end subroutine vector_line

  subroutine dispatch(name, u, g, p, a, nargs, f64, s64, stat)
    character(len=*), intent(in) :: name
    type(relicore_universe), intent(in) :: u
    type(relicore_linear_growth), intent(in) :: g
    type(relicore_linear_power_spectrum), intent(in) :: p
    real(dp), intent(in) :: a(:)
    integer, intent(out) :: nargs
    real(dp), intent(out) :: f64, s64
    integer(c_int32_t), intent(out) :: stat
    f64 = ieee_value(f64, ieee_quiet_nan)
    s64 = f64
    stat = -999
    nargs = -1
    select case (name)
    include 'generated/growth_one.inc'
    end select
  end subroutine dispatch

  ! The array form over the first argument (three copies) equals the scalar result bit for bit
  ! and returns its status; the elemental form over the array too.
  subroutine array_form(name, u, g, p, a, want, want_stat, where)
    character(len=*), intent(in) :: name, where
    type(relicore_universe), intent(in) :: u
    type(relicore_linear_growth), intent(in) :: g
    type(relicore_linear_power_spectrum), intent(in) :: p
    real(dp), intent(in) :: a(:), want
    integer(c_int32_t), intent(in) :: want_stat
    real(dp) :: x(3), out(3), ref(3)
    integer(c_int32_t) :: stat
    logical :: has
    x = a(1)
    out = -1
    ref = -1
    has = .true.
    stat = -999
    select case (name)
    include 'generated/growth_array.inc'
    case default
      has = .false.
    end select
    if (.not. has) return
    array_checks = array_checks + 1
    call check(stat == want_stat .and. all(same64(out, want)) .and. all(same64(ref, want)), &
        where // ': ' // trim(name) // '_array differs from the scalar form')
  end subroutine array_form

  subroutine check_coverage()
    integer :: k
    do k = 1, size(all_names)
      call check(seen(k) > 0, 'no vector of ' // trim(all_names(k)))
    end do
  end subroutine check_coverage

  subroutine check_interfaces()
    type(relicore_linear_growth), allocatable :: g2
    type(relicore_linear_power_spectrum), allocatable :: p2
    type(relicore_linear_power_spectrum_options) :: o, bad
    integer(c_int32_t) :: stat
    real(dp) :: v, w
    integer :: ig, iu
    allocate (g2, p2)
    o = relicore_linear_power_spectrum_options_default()
    call check(o%transfer_form == RELICORE_TRANSFER_BARYON_OSCILLATIONS .and. &
        o%normalisation == RELICORE_NORMALISATION_SCALAR_AMPLITUDE .and. ieee_is_nan(o%value) &
        .and. ieee_is_nan(o%spectral_index) .and. o%running == 0, 'default options')
    ! never computed: refused
    call relicore_growth_factor_s(g2, 1.0_dp, v, stat)
    call check(stat == RELICORE_ERROR_INVALID_STRUCT .and. ieee_is_nan(v), 'an unfilled growth')
    call relicore_sigma8_s(p2, v, stat)
    call check(stat == RELICORE_ERROR_INVALID_STRUCT .and. ieee_is_nan(v), 'an unfilled spectrum')
    ig = find(growth_names, ng, 'g_planck_like')
    iu = find(universe_names, nu, 'flat_lcdm')
    call check(ig > 0 .and. iu > 0, 'the planck_like growth and the flat_lcdm universe')
    if (ig == 0 .or. iu == 0) return
    ! a copy by assignment
    g2 = growths(ig)
    v = relicore_growth_rate(g2, 0.7_dp)
    w = relicore_growth_rate(growths(ig), 0.7_dp)
    call check(same64(v, w), 'a copied growth gives the same bits')
    ! construction errors clear the output
    o%value = 2.1e-9_dp
    o%spectral_index = 0.965_dp
    call relicore_linear_power_spectrum_compute(growths(ig), o, p2, stat)
    call check(stat == RELICORE_OK, 'a valid spectrum')
    bad = o
    bad%value = -1
    call relicore_linear_power_spectrum_compute(growths(ig), bad, p2, stat)
    call check(stat == RELICORE_ERROR_NON_POSITIVE .and. p2%tag == 0, 'A_s < 0 clears the output')
    bad = o
    bad%spectral_index = ieee_value(v, ieee_quiet_nan)
    call relicore_linear_power_spectrum_compute(growths(ig), bad, p2, stat)
    call check(stat == RELICORE_ERROR_NON_FINITE, 'n_s NaN')
    bad = o
    bad%transfer_form = 5
    call relicore_linear_power_spectrum_compute(growths(ig), bad, p2, stat)
    call check(stat == RELICORE_ERROR_OUT_OF_DOMAIN, 'an unknown transfer form')
    ! a universe without radiation: the transfer function needs T0
    call relicore_linear_growth_compute(universes(iu), g2, stat)
    call check(stat == RELICORE_OK, 'growth without radiation')
    call relicore_linear_power_spectrum_compute(g2, o, p2, stat)
    call check(stat == RELICORE_ERROR_INVALID_PARAMETER .and. p2%tag == 0, &
        'spectrum without radiation')
    call relicore_sigma8_s(p2, v, stat)
    call check(stat == RELICORE_ERROR_INVALID_STRUCT .and. ieee_is_nan(v), &
        'a failed spectrum is refused')
    deallocate (g2, p2)
  end subroutine check_interfaces

end program test_growth
