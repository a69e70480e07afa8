! Reference-vector test of the cosmology procedures of the Fortran module relicore
! (bindings/fortran/relicore.f90).
!
!   test_cosmology FILE           builds every universe of FILE (tests/data/cosmology.txt; format
!                                 in tests/data/FORMAT.md: lines "universe NAME h0_km_s_mpc
!                                 omega_matter omega_baryon omega_curvature cmb_temperature_k
!                                 n_eff m1_ev m2_ev m3_ev w0 wa helium_mass_fraction", then
!                                 "function UNIVERSE nargs args... expected kind tolerance
!                                 source"), checks every vector, then the tests written here;
!                                 ends with "N passed, 0 failed", or stops with status 1
!   test_cosmology --dump FILE    for every non-status vector of FILE, in file order, print
!                                 "universe function bits": the IEEE bit pattern of the result
!                                 of the Fortran function form in 16 hex digits (as Z16.16
!                                 prints it), for the bit-for-bit comparison with C and Python
!   test_cosmology --stop-check   prints "EXPECT <message>", then calls relicore_universe_init
!                                 without stat on an invalid parameter set, which must stop
!                                 (error stop) with that message; tests/fortran/run.sh checks it
!
! Every vector is dispatched by name to the elemental function form and the status form (with
! stat), which must agree bit for bit; the result is compared with the line's tolerance (ulp,
! rel, abs; a status line must fail with its code and give NaN in both forms). Failures print
! want/got with 17 significant digits. An unknown function or universe name is a failure, and
! so is a function with no vector. Tests written here: elemental calls on arrays (of redshifts,
! and of universes) equal the scalar calls bit for bit; the C array forms equal the elemental
! forms bit for bit (failing elements, first failing code, reversed and strided arrays, size
! mismatch, empty arrays); a universe that was never initialised, or whose init failed, is
! refused by every procedure; copies of a universe; the parameter checks and their positions;
! the defaults; status messages. The record reader, number parsing, tolerances and failure
! messages it shares with test_blackbody and test_decoupling are in vector_files.f90.
! The dispatch by name of the regular functions (their `case` blocks and name lists) is
! generated from bindings/functions.toml into tests/fortran/generated/*.inc by
! `python3 bindings/generate.py --write`; only the irregular functions are dispatched here.
program test_cosmology
  use, intrinsic :: iso_c_binding, only: c_double, c_int32_t
  use, intrinsic :: ieee_arithmetic, only: ieee_is_nan, ieee_value, ieee_quiet_nan, &
      ieee_positive_inf, ieee_negative_inf
  use, intrinsic :: iso_fortran_env, only: error_unit, output_unit
  use relicore
  use vector_files
  implicit none

  integer, parameter :: dp = c_double
  integer, parameter :: max_tokens = 24, nparams = 12

  ! What one dispatch returned: the function form, the status form and its status.
  type :: outcome
    logical :: known = .false.
    integer :: nargs = -1
    real(dp) :: f64 = 0, s64 = 0
    integer(c_int32_t) :: stat = -huge(0_c_int32_t)
  end type outcome

  type :: named_universe
    character(len=64) :: name = ''
    type(relicore_universe_parameters) :: params
    type(relicore_universe) :: u
  end type named_universe

  ! A vector line, kept for the array tests.
  type :: vector
    character(len=48) :: name = ''
    integer :: universe = 0
    integer :: nargs = 0
    real(dp) :: args(2) = 0
    type(outcome) :: got
  end type vector

  include 'generated/cosmology_names.inc'
  type(named_universe), allocatable :: universes(:)
  type(vector), allocatable :: vectors(:)
  integer :: nuniverses = 0, nvectors = 0
  character(len=:), allocatable :: first, path

  program_name = 'test_cosmology'
  allocate (universes(4), vectors(1024))
  if (command_argument_count() < 1) then
    write (error_unit, '(a)') 'usage: test_cosmology FILE | --dump FILE | --stop-check'
    error stop 2
  end if
  first = argument(1)
  select case (first)
  case ('--dump')
    if (command_argument_count() /= 2) error stop 'usage: test_cosmology --dump FILE'
    path = argument(2)
    call walk(path, 'dump')
  case ('--stop-check')
    call stop_check()
  case default
    if (command_argument_count() /= 1) error stop 'usage: test_cosmology FILE'
    path = first
    call walk(path, 'test')
    call check(nvectors > 0 .and. nuniverses > 0, path // ' holds no vectors or no universe')
    call test_coverage()
    call test_elemental_arrays()
    call test_elemental_universes()
    call test_array_forms()
    call test_universe_values()
    call test_parameters()
    call test_messages()
    write (output_unit, '(a, i0, a, i0, a)') 'universes: ', nuniverses, '; vectors: ', &
        nvectors, ''
    write (output_unit, '(i0, a, i0, a)') passed, ' passed, ', failed, ' failed'
  end select
  deallocate (universes, vectors, first)
  if (allocated(path)) deallocate (path)
  if (failed > 0) error stop 1

contains

  ! ================================================================ bookkeeping

  integer function find_universe(name)
    character(len=*), intent(in) :: name
    integer :: k
    find_universe = 0
    do k = 1, nuniverses
      if (universes(k)%name == name) then
        find_universe = k
        return
      end if
    end do
  end function find_universe

  ! ================================================================ the data file

  subroutine walk(file, mode)
    character(len=*), intent(in) :: file, mode
    character(len=64) :: tokens(max_tokens)
    integer :: unit, ntokens, lineno, nargs, k, which
    logical :: found
    character(len=:), allocatable :: where

    call open_vector_file(file, unit)
    lineno = 0
    do
      call next_record(unit, file, lineno, tokens, ntokens, where, found)
      if (.not. found) exit
      if (tokens(1) == 'universe') then
        if (ntokens /= 2 + nparams) error stop 'test_cosmology: malformed universe at ' // where
        if (find_universe(tokens(2)) /= 0) &
            error stop 'test_cosmology: universe defined twice at ' // where
        call add_universe(where, mode, tokens(2), [(number(tokens(2 + k), where), k = 1, nparams)])
        cycle
      end if
      ! function UNIVERSE nargs args... expected kind tolerance source
      nargs = vector_nargs(tokens, ntokens, where)
      which = find_universe(tokens(2))
      if (which == 0) then
        if (mode == 'dump') error stop 'test_cosmology --dump: unknown universe at ' // where
        call check(.false., where // ': unknown universe ' // trim(tokens(2)))
        cycle
      end if
      call vector_line(where, mode, tokens(1), which, nargs, tokens(4:3 + nargs), &
          tokens(4 + nargs), tokens(5 + nargs), tokens(6 + nargs))
    end do
    close (unit)
  end subroutine walk

  subroutine add_universe(where, mode, name, values)
    character(len=*), intent(in) :: where, mode, name
    real(dp), intent(in) :: values(nparams)
    type(named_universe), allocatable :: grown(:)
    integer(c_int32_t) :: stat, checked, which
    type(relicore_universe_parameters) :: back

    if (nuniverses == size(universes)) then
      allocate (grown(2 * size(universes)))
      grown(1:nuniverses) = universes(1:nuniverses)
      call move_alloc(grown, universes)
    end if
    nuniverses = nuniverses + 1
    associate (nu => universes(nuniverses))
      nu%name = name
      nu%params = universe_parameters(values)
      call relicore_universe_init(nu%params, nu%u, stat)
      if (mode == 'dump') return
      call relicore_universe_check_parameters(nu%params, which, checked)
      call check(stat == RELICORE_OK .and. checked == RELICORE_OK .and. which == -1, where // &
          ': relicore_universe_init(' // trim(name) // ') status ' // int_text(int(stat)) // &
          ', check ' // int_text(int(checked)) // ' parameter ' // int_text(int(which)))
      back = relicore_universe_get_parameters(nu%u)
      call check(same_parameters(back, nu%params), where // ': relicore_universe_get_parameters(' &
          // trim(name) // ') differs from the parameters given')
    end associate
  end subroutine add_universe

  logical function same_parameters(a, b)
    type(relicore_universe_parameters), intent(in) :: a, b
    same_parameters = same64(a%h0_km_s_mpc, b%h0_km_s_mpc) .and. &
        same64(a%omega_matter, b%omega_matter) .and. same64(a%omega_baryon, b%omega_baryon) &
        .and. same64(a%omega_curvature, b%omega_curvature) .and. &
        same64(a%cmb_temperature_k, b%cmb_temperature_k) .and. same64(a%n_eff, b%n_eff) .and. &
        all(same64(a%neutrino_masses_ev, b%neutrino_masses_ev)) .and. same64(a%w0, b%w0) .and. &
        same64(a%wa, b%wa) .and. same64(a%helium_mass_fraction, b%helium_mass_fraction)
  end function same_parameters

  subroutine vector_line(where, mode, name, which, nargs, arg_tokens, expected, kind, tolerance)
    character(len=*), intent(in) :: where, mode, name, expected, kind, tolerance
    integer, intent(in) :: which, nargs
    character(len=64), intent(in) :: arg_tokens(:)
    real(dp) :: args(nargs)
    type(outcome) :: got
    type(vector), allocatable :: grown(:)
    integer :: k
    character(len=:), allocatable :: call_text

    do k = 1, nargs
      args(k) = number(arg_tokens(k), where)
    end do
    call evaluate_one(name, universes(which)%u, args, got)
    if (mode == 'dump') then
      if (.not. got%known .or. got%nargs /= nargs) &
          error stop 'test_cosmology --dump: unknown name or wrong nargs at ' // where
      if (kind /= 'status') write (output_unit, '(a, 1x, a, 1x, a)') &
          trim(universes(which)%name), trim(name), hex64(got%f64)
      return
    end if

    call_text = vector_call_text(where, name, universes(which)%name, args)
    call judge(call_text, name, got, nargs, expected, kind, tolerance)

    if (got%known .and. got%nargs == nargs) then
      if (nvectors == size(vectors)) then
        allocate (grown(2 * size(vectors)))
        grown(1:nvectors) = vectors(1:nvectors)
        call move_alloc(grown, vectors)
      end if
      nvectors = nvectors + 1
      vectors(nvectors)%name = name
      vectors(nvectors)%universe = which
      vectors(nvectors)%nargs = nargs
      vectors(nvectors)%args(1:nargs) = args
      vectors(nvectors)%got = got
    end if
  end subroutine vector_line

  ! Checks one outcome against the line: both forms agree, then the tolerance or the status.
  subroutine judge(call_text, name, got, nargs, expected, kind, tolerance)
    character(len=*), intent(in) :: call_text, name, expected, kind, tolerance
    type(outcome), intent(in) :: got
    integer, intent(in) :: nargs
    real(dp) :: want, allowed, tol
    logical :: ok

    call known_call(call_text, name, got%known, got%nargs, nargs, ok)
    if (.not. ok) return
    tol = number(tolerance, call_text)
    if (kind == 'status') then
      call check_status_line(call_text, tol, got%stat, got%f64, got%s64)
      return
    end if
    want = number(expected, call_text)
    call allowed_deviation(call_text, kind, tol, want, allowed, ok)
    if (.not. ok) return
    ok = same64(got%f64, got%s64) .and. got%stat == RELICORE_OK .and. &
        (got%f64 == want .or. abs(got%f64 - want) <= allowed)
    call check_value_line(ok, call_text, want, got%f64, got%s64, got%stat, abs(got%f64 - want), &
        kind, tolerance, allowed)
  end subroutine judge

  ! ================================================================ dispatch by name

  ! Scalar calls: the elemental function and the status form (with stat) of the name.
  subroutine evaluate_one(name, u, a, got)
    character(len=*), intent(in) :: name
    type(relicore_universe), intent(in) :: u
    real(dp), intent(in) :: a(:)
    type(outcome), intent(out) :: got
    real(dp) :: f64, s64
    integer(c_int32_t) :: stat
    integer :: nargs

    f64 = ieee_value(f64, ieee_quiet_nan)
    s64 = f64
    stat = -huge(stat)
    got%known = .true.
    select case (name)
    include 'generated/cosmology_one.inc'
    case default
      got%known = .false.
      nargs = -1
    end select
    got%nargs = nargs
    got%f64 = f64
    got%s64 = s64
    got%stat = stat
  end subroutine evaluate_one

  ! The elemental forms on arrays of arguments: a(k, j) is argument k of element j.
  subroutine evaluate_many(name, u, a, f64, s64, stat)
    character(len=*), intent(in) :: name
    type(relicore_universe), intent(in) :: u
    real(dp), intent(in) :: a(:, :)
    real(dp), intent(out) :: f64(:), s64(:)
    integer(c_int32_t), intent(out) :: stat(:)
    select case (name)
    include 'generated/cosmology_many.inc'
    case default
      error stop 'test_cosmology: no elemental dispatch for ' // name
    end select
  end subroutine evaluate_many

  ! The C array form of a one-argument name.
  subroutine array_form(name, u, x, out, stat)
    character(len=*), intent(in) :: name
    type(relicore_universe), intent(in) :: u
    real(dp), intent(in) :: x(:)
    real(dp), intent(out) :: out(:)
    integer(c_int32_t), intent(out) :: stat
    select case (name)
    include 'generated/cosmology_array.inc'
    case default
      error stop 'test_cosmology: no array form for ' // name
    end select
  end subroutine array_form

  ! The constants of an array of universes, elementally.
  subroutine evaluate_constants(name, us, f64, s64, stat)
    character(len=*), intent(in) :: name
    type(relicore_universe), intent(in) :: us(:)
    real(dp), intent(out) :: f64(:), s64(:)
    integer(c_int32_t), intent(out) :: stat(:)
    select case (name)
    include 'generated/cosmology_constants.inc'
    case default
      error stop 'test_cosmology: not a constant: ' // name
    end select
  end subroutine evaluate_constants

  ! ================================================================ tests written here

  ! Every procedure has at least one vector (so the data and this test cannot drift apart).
  subroutine test_coverage()
    integer :: k
    do k = 1, size(all_names)
      call check(count(vectors(1:nvectors)%name == all_names(k)) > 0, &
          'no reference vector for relicore_' // trim(all_names(k)))
    end do
  end subroutine test_coverage

  ! For each universe and name with arguments: the arguments of all its vectors as arrays
  ! through the elemental forms give the scalar calls' results and statuses bit for bit.
  subroutine test_elemental_arrays()
    integer :: ui, k, j, n, m
    integer, allocatable :: members(:)
    real(dp), allocatable :: a(:, :), f64(:), s64(:)
    integer(c_int32_t), allocatable :: stat(:)
    logical :: ok

    do ui = 1, nuniverses
      do k = 1, size(all_names)
        members = pack([(j, j = 1, nvectors)], vectors(1:nvectors)%name == all_names(k) .and. &
            vectors(1:nvectors)%universe == ui)
        n = size(members)
        if (n == 0) cycle
        m = vectors(members(1))%nargs
        if (m == 0) cycle
        allocate (a(m, n), f64(n), s64(n), stat(n))
        do j = 1, n
          a(:, j) = vectors(members(j))%args(1:m)
        end do
        call evaluate_many(trim(all_names(k)), universes(ui)%u, a, f64, s64, stat)
        ok = .true.
        do j = 1, n
          associate (one => vectors(members(j))%got)
            ok = ok .and. same64(one%f64, f64(j)) .and. same64(one%s64, s64(j)) .and. &
                one%stat == stat(j)
          end associate
        end do
        call check(ok, 'elemental ' // trim(all_names(k)) // ' on ' // int_text(n) // &
            ' arguments of universe ' // trim(universes(ui)%name) // &
            ' differs from the scalar calls')
        deallocate (a, f64, s64, stat)
      end do
    end do
  end subroutine test_elemental_arrays

  ! The constants of all universes at once (elemental in the universe, on a copy of the
  ! universes made by assignment) equal the scalar calls on the originals.
  subroutine test_elemental_universes()
    type(relicore_universe) :: us(nuniverses)
    real(dp) :: f64(nuniverses), s64(nuniverses)
    integer(c_int32_t) :: stat(nuniverses)
    type(outcome) :: one
    real(dp) :: none(0)
    integer :: k, ui
    logical :: ok

    us(:) = universes(1:nuniverses)%u
    do k = 1, size(constant_names)
      call evaluate_constants(trim(constant_names(k)), us, f64, s64, stat)
      ok = .true.
      do ui = 1, nuniverses
        call evaluate_one(trim(constant_names(k)), universes(ui)%u, none, one)
        ok = ok .and. same64(one%f64, f64(ui)) .and. same64(one%s64, s64(ui)) .and. &
            one%stat == stat(ui)
      end do
      call check(ok, 'elemental ' // trim(constant_names(k)) // ' over ' // int_text(nuniverses) // &
          ' copied universes differs from the scalar calls')
    end do
  end subroutine test_elemental_universes

  ! The C array forms, for every universe and one-argument name: x = the arguments of its
  ! vectors. out equals the elemental function bit for bit (NaN where an element fails), stat
  ! the first failing element's code; a reversed input with a strided output gives the same
  ! values; a too-long out is RELICORE_ERROR_LENGTH_MISMATCH with every element NaN; an empty
  ! array is RELICORE_OK.
  subroutine test_array_forms()
    integer :: ui, k, j, n
    integer, allocatable :: members(:)
    real(dp), allocatable :: x(:), out(:), args(:, :), ref(:), ref_s(:), strided(:), too_long(:)
    integer(c_int32_t), allocatable :: stats(:)
    integer(c_int32_t) :: stat, stat_reversed, stat_mismatch, stat_empty
    real(dp) :: empty(0), empty_out(0)
    logical :: ok

    do ui = 1, nuniverses
      do k = 1, size(one_names)
        members = pack([(j, j = 1, nvectors)], vectors(1:nvectors)%name == one_names(k) .and. &
            vectors(1:nvectors)%universe == ui)
        n = size(members)
        if (n == 0) cycle
        x = [(vectors(members(j))%args(1), j = 1, n)]
        allocate (out(n), args(1, n), ref(n), ref_s(n), stats(n), strided(2 * n), too_long(n + 1))
        args(1, :) = x
        strided = 0
        call array_form(trim(one_names(k)), universes(ui)%u, x, out, stat)
        call array_form(trim(one_names(k)), universes(ui)%u, x(n:1:-1), strided(2 * n:2:-2), &
            stat_reversed)
        call array_form(trim(one_names(k)), universes(ui)%u, x, too_long, stat_mismatch)
        call array_form(trim(one_names(k)), universes(ui)%u, empty, empty_out, stat_empty)
        call evaluate_many(trim(one_names(k)), universes(ui)%u, args, ref, ref_s, stats)
        ok = stat == first_failure(stats) .and. stat_reversed == first_failure(stats(n:1:-1)) &
            .and. stat_empty == RELICORE_OK .and. &
            stat_mismatch == RELICORE_ERROR_LENGTH_MISMATCH .and. all(ieee_is_nan(too_long))
        ok = ok .and. all(same64(out, ref)) .and. all(same64(ref_s, ref)) .and. &
            all(same64(strided(2::2), out)) .and. all(strided(1::2) == 0)
        call check(ok, 'array form ' // trim(one_names(k)) // '_array(' // &
            trim(universes(ui)%name) // ', ' // int_text(n) // ' values): status ' // &
            int_text(int(stat)) // ' (elemental: first failure ' // &
            int_text(int(first_failure(stats))) // '), or values differ from the elemental form')
        deallocate (out, args, ref, ref_s, stats, strided, too_long)
      end do
    end do
  end subroutine test_array_forms

  ! A universe that was never initialised, or whose init failed, is refused by every
  ! procedure (the struct is checked before the arguments); copies work like the original.
  subroutine test_universe_values()
    type(relicore_universe) :: fresh, failed_init, copy
    type(relicore_universe_parameters) :: params, back, failed_parameters
    type(outcome) :: got, again
    integer(c_int32_t) :: stat
    real(dp) :: out(3), none(0), none_out(0)
    integer :: k, nargs
    logical :: ok

    call check(storage_size(fresh) == 64 * (1 + RELICORE_UNIVERSE_STORAGE_WORDS), &
        'type(relicore_universe) is not a tag and RELICORE_UNIVERSE_STORAGE_WORDS words')
    params = relicore_universe_parameters_default(70.0_dp, 0.3_dp)
    params%omega_curvature = ieee_value(1.0_dp, ieee_quiet_nan)
    call relicore_universe_init(params, failed_init, stat)
    call check(stat == RELICORE_ERROR_INVALID_PARAMETER, 'init with a NaN curvature: status ' // &
        int_text(int(stat)))
    do k = 1, size(all_names)
      nargs = 1
      if (all_names(k) == 'angular_diameter_distance_between_mpc') nargs = 2
      call evaluate_one(trim(all_names(k)), fresh, [1.0_dp, 2.0_dp], got)
      if (got%nargs == 0) call evaluate_one(trim(all_names(k)), fresh, none, got)
      if (got%nargs == 1) call evaluate_one(trim(all_names(k)), fresh, [1.0_dp], got)
      call evaluate_one(trim(all_names(k)), failed_init, &
          [(ieee_value(1.0_dp, ieee_quiet_nan), nargs = 1, got%nargs)], again)
      ok = got%stat == RELICORE_ERROR_INVALID_STRUCT .and. ieee_is_nan(got%f64) .and. &
          ieee_is_nan(got%s64) .and. again%stat == RELICORE_ERROR_INVALID_STRUCT .and. &
          ieee_is_nan(again%f64) .and. ieee_is_nan(again%s64)
      call check(ok, trim(all_names(k)) // ' on a universe never initialised / after a failed ' &
          // 'init: status ' // int_text(int(got%stat)) // ' / ' // int_text(int(again%stat)) // &
          ', want ' // int_text(int(RELICORE_ERROR_INVALID_STRUCT)) // ' and NaN')
    end do
    do k = 1, size(one_names)
      out = 1
      call array_form(trim(one_names(k)), fresh, [1.0_dp, 2.0_dp, 3.0_dp], out, stat)
      call check(stat == RELICORE_ERROR_INVALID_STRUCT .and. all(ieee_is_nan(out)), &
          trim(one_names(k)) // '_array on a universe never initialised: status ' // &
          int_text(int(stat)))
      call array_form(trim(one_names(k)), failed_init, none, none_out, stat)
      call check(stat == RELICORE_ERROR_INVALID_STRUCT, trim(one_names(k)) // &
          '_array of no element on the universe of a failed init: status ' // int_text(int(stat)))
    end do
    failed_parameters = relicore_universe_get_parameters(failed_init)
    call relicore_universe_get_parameters_s(fresh, back, stat)
    call check(stat == RELICORE_ERROR_INVALID_STRUCT .and. ieee_is_nan(back%h0_km_s_mpc) .and. &
        all(ieee_is_nan(back%neutrino_masses_ev)) .and. &
        all(ieee_is_nan(failed_parameters%neutrino_masses_ev)), &
        'relicore_universe_get_parameters on an invalid universe: status ' // int_text(int(stat)))

    ! a copy (assignment) of a universe gives the same results as the original
    if (nuniverses > 0) then
      copy = universes(nuniverses)%u
      ok = .true.
      do k = 1, size(one_names)
        call evaluate_one(trim(one_names(k)), universes(nuniverses)%u, [1.5_dp], got)
        call evaluate_one(trim(one_names(k)), copy, [1.5_dp], again)
        ok = ok .and. same64(got%f64, again%f64) .and. got%stat == again%stat
      end do
      call check(ok, 'a copy of a universe gives other results than the original')
    end if
  end subroutine test_universe_values

  ! The parameter checks name each invalid parameter (0-based, as in C); the defaults.
  subroutine test_parameters()
    type(relicore_universe_parameters) :: base, p
    type(relicore_universe) :: u
    integer(c_int32_t) :: stat, which
    real(dp) :: nan
    integer :: k

    nan = ieee_value(nan, ieee_quiet_nan)
    base = relicore_universe_parameters_default(70.0_dp, 0.3_dp)
    call check(base%h0_km_s_mpc == 70 .and. base%omega_matter == 0.3_dp .and. &
        base%omega_baryon == 0 .and. base%omega_curvature == 0 .and. &
        base%cmb_temperature_k == 2.7255_dp .and. base%n_eff == 3.044_dp .and. &
        all(base%neutrino_masses_ev == 0) .and. base%w0 == -1 .and. base%wa == 0 .and. &
        base%helium_mass_fraction == 0.245_dp, &
        'relicore_universe_parameters_default differs from its documented defaults')
    call relicore_universe_check_parameters(base, which, stat)
    call check(stat == RELICORE_OK .and. which == -1, 'the defaults do not pass the check')
    call relicore_universe_init(base, u)
    call check(same64(relicore_hubble_time_gyr(u), relicore_hubble_time_gyr(u)) .and. &
        .not. ieee_is_nan(relicore_age_gyr(u, 0.0_dp)), 'init without stat on valid parameters')
    do k = 0, 9
      p = base
      select case (k)
      case (0)
        p%h0_km_s_mpc = -70
      case (1)
        p%omega_matter = nan
      case (2)
        p%omega_baryon = 0.4_dp
      case (3)
        p%omega_curvature = ieee_value(1.0_dp, ieee_positive_inf)
      case (4)
        p%cmb_temperature_k = -1
      case (5)
        p%n_eff = -3
      case (6)
        p%neutrino_masses_ev(3) = -0.1_dp
      case (7)
        p%w0 = nan
      case (8)
        p%wa = ieee_value(1.0_dp, ieee_negative_inf)
      case default
        p%helium_mass_fraction = 1
      end select
      call relicore_universe_check_parameters(p, which, stat)
      call check(stat == RELICORE_ERROR_INVALID_PARAMETER .and. which == k, 'invalid parameter ' &
          // int_text(k) // ': status ' // int_text(int(stat)) // ', parameter ' // &
          int_text(int(which)))
      call relicore_universe_init(p, u, stat)
      call check(stat == RELICORE_ERROR_INVALID_PARAMETER .and. &
          ieee_is_nan(relicore_hubble_distance_mpc(u)), 'init with invalid parameter ' // &
          int_text(k) // ': status ' // int_text(int(stat)) // ' or the universe is not refused')
    end do
    ! a closed universe with a cosmological constant and nothing else bounces: no big bang
    p = base
    p%omega_matter = 0
    p%cmb_temperature_k = 0
    p%omega_curvature = -0.5_dp
    call relicore_universe_check_parameters(p, which, stat)
    call check(stat == RELICORE_ERROR_NO_BIG_BANG .and. which == -1, 'bouncing universe: status ' &
        // int_text(int(stat)) // ', parameter ' // int_text(int(which)))
    call relicore_universe_init(p, u, stat)
    call check(stat == RELICORE_ERROR_NO_BIG_BANG, 'init of a bouncing universe: status ' // &
        int_text(int(stat)))
  end subroutine test_parameters

  ! The two cosmology status codes: their own distinct messages; the next number is unknown.
  subroutine test_messages()
    character(len=:), allocatable :: unknown
    unknown = relicore_status_message(1_c_int32_t)
    call check(RELICORE_ERROR_INVALID_PARAMETER == -14 .and. RELICORE_ERROR_NO_BIG_BANG == -15, &
        'cosmology status codes are not -14 and -15 (FORMAT.md)')
    call check(relicore_status_message(RELICORE_ERROR_INVALID_PARAMETER) /= unknown .and. &
        relicore_status_message(RELICORE_ERROR_NO_BIG_BANG) /= unknown .and. &
        relicore_status_message(RELICORE_ERROR_NO_BIG_BANG) /= &
        relicore_status_message(RELICORE_ERROR_INVALID_PARAMETER) .and. &
        relicore_status_message(RELICORE_ERROR_CAPACITY_TOO_SMALL - 1_c_int32_t) == unknown, &
        'messages of the cosmology status codes')
  end subroutine test_messages

  ! A failing init without stat must stop with the routine name, the message and the name of
  ! the invalid parameter.
  subroutine stop_check()
    type(relicore_universe_parameters) :: p
    type(relicore_universe) :: u
    write (output_unit, '(a)') 'EXPECT relicore_universe_init: ' // &
        relicore_status_message(RELICORE_ERROR_INVALID_PARAMETER) // ' (status ' // &
        int_text(int(RELICORE_ERROR_INVALID_PARAMETER)) // '): omega_baryon'
    flush (output_unit)
    p = relicore_universe_parameters_default(70.0_dp, 0.3_dp)
    p%omega_baryon = 0.5_dp
    call relicore_universe_init(p, u)
    write (output_unit, '(a)') 'relicore_universe_init returned instead of stopping'
  end subroutine stop_check

end program test_cosmology
