! Reference-vector test of the decoupling procedures of the Fortran module relicore
! (bindings/fortran/relicore.f90).
!
!   test_decoupling FILE           reads FILE (tests/data/decoupling.txt; format in
!                                  tests/data/FORMAT.md, section "Decoupling file"): builds every
!                                  universe ("universe NAME h0_km_s_mpc omega_matter omega_baryon
!                                  omega_curvature cmb_temperature_k n_eff m1_ev m2_ev m3_ev w0 wa
!                                  helium_mass_fraction"), computes every history ("history NAME
!                                  UNIVERSE", "history_reionized NAME UNIVERSE z_re") and checks
!                                  every vector ("function TARGET nargs args... expected kind
!                                  tolerance source"; TARGET a universe for saha_ionized_fraction,
!                                  a history for the queries and the summary, "-" for the fits),
!                                  then the tests written here; prints the largest deviation per
!                                  function; ends with "N passed, 0 failed", or stops with status 1
!   test_decoupling --dump FILE    for every non-status vector of FILE, in file order, prints
!                                  "target function bits": the IEEE bit pattern of the result of
!                                  the Fortran function form in 16 hex digits (as Z16.16 prints
!                                  it), for the bit-for-bit comparison with C and Python
!   test_decoupling --stop-check   prints "EXPECT <message>", then calls
!                                  relicore_thermal_history_compute without stat with a highest
!                                  redshift the table cannot hold, which must stop (error stop)
!                                  with that message; tests/fortran/run.sh checks it
!
! Every vector is dispatched by name to the elemental function form and the status form (with
! stat), which must agree bit for bit; the result is compared with the line's tolerance (ulp,
! rel, abs; a status line must fail with its code and give NaN in both forms). Failures print
! want/got with 17 significant digits. An unknown function, universe or history name is a
! failure, and so is a function with no vector. Tests written here: elemental calls on arrays
! of redshifts and of histories equal the scalar calls bit for bit; the C array forms equal the
! elemental forms bit for bit (failing elements, first failing code, reversed and strided
! arrays, size mismatch, empty arrays); a history that was never computed, or whose compute
! failed, is refused by every procedure; copies of a history; every failure of the compute; the
! default options; the status message of RELICORE_ERROR_CAPACITY_TOO_SMALL. Histories are
! allocatable (163848 bytes each: not for the stack). The record reader, number parsing,
! tolerances and failure messages it shares with test_blackbody and test_cosmology are in
! vector_files.f90.
! The dispatch by name of the regular functions (their `case` blocks and name lists) is
! generated from bindings/functions.toml into tests/fortran/generated/*.inc by
! `python3 bindings/generate.py --write`; only the irregular functions are dispatched here.
program test_decoupling
  use, intrinsic :: iso_c_binding, only: c_double, c_int32_t
  use, intrinsic :: ieee_arithmetic, only: ieee_is_nan, ieee_value, ieee_quiet_nan, &
      ieee_positive_inf
  use, intrinsic :: iso_fortran_env, only: error_unit, output_unit
  use relicore
  use vector_files
  implicit none

  integer, parameter :: dp = c_double
  integer, parameter :: max_tokens = 24, nparams = 12
  integer, parameter :: on_universe = 1, on_history = 2, on_nothing = 3

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

  type :: named_history
    character(len=64) :: name = ''
    integer :: universe = 0
    type(relicore_thermal_history) :: h
  end type named_history

  ! A vector line, kept for the array tests.
  type :: vector
    character(len=48) :: name = ''
    integer :: target = 0
    integer :: nargs = 0
    real(dp) :: args(2) = 0
    type(outcome) :: got
  end type vector

  include 'generated/decoupling_names.inc'

  type(named_universe), allocatable :: universes(:)
  type(named_history), allocatable :: histories(:)
  type(vector), allocatable :: vectors(:)
  ! The largest deviation of a function's value lines of one source (as the C test reports it).
  type :: deviation
    integer :: name = 0
    character(len=40) :: source = ''
    integer :: lines = 0
    real(dp) :: worst_rel = 0, worst_ratio = 0
  end type deviation
  type(deviation) :: deviations(128)
  integer :: ndeviations = 0
  integer :: nuniverses = 0, nhistories = 0, nvectors = 0
  character(len=:), allocatable :: first, path

  program_name = 'test_decoupling'
  allocate (universes(4), histories(4), vectors(1024))
  if (command_argument_count() < 1) then
    write (error_unit, '(a)') 'usage: test_decoupling FILE | --dump FILE | --stop-check'
    error stop 2
  end if
  first = argument(1)
  select case (first)
  case ('--dump')
    if (command_argument_count() /= 2) error stop 'usage: test_decoupling --dump FILE'
    path = argument(2)
    call walk(path, 'dump')
  case ('--stop-check')
    call stop_check()
  case default
    if (command_argument_count() /= 1) error stop 'usage: test_decoupling FILE'
    path = first
    call walk(path, 'test')
    call check(nvectors > 0 .and. nuniverses > 0 .and. nhistories > 0, &
        path // ' holds no vectors, no universe or no history')
    call report_deviations()
    call test_coverage()
    call test_elemental_arrays()
    call test_elemental_histories()
    call test_array_forms()
    call test_fit_arrays()
    call test_history_values()
    call test_messages()
    write (output_unit, '(a, i0, a, i0, a, i0)') 'universes: ', nuniverses, '; histories: ', &
        nhistories, '; vectors: ', nvectors
    write (output_unit, '(i0, a, i0, a)') passed, ' passed, ', failed, ' failed'
  end select
  deallocate (universes, histories, vectors, first)
  if (allocated(path)) deallocate (path)
  if (failed > 0) error stop 1

contains

  ! ================================================================ bookkeeping

  real(dp) function nan()
    nan = ieee_value(1.0_dp, ieee_quiet_nan)
  end function nan

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

  integer function find_history(name)
    character(len=*), intent(in) :: name
    integer :: k
    find_history = 0
    do k = 1, nhistories
      if (histories(k)%name == name) then
        find_history = k
        return
      end if
    end do
  end function find_history

  ! The target of a name: on_universe, on_history, on_nothing (fits), 0 unknown.
  integer function target_of(name)
    character(len=*), intent(in) :: name
    if (any(universe_names == name)) then
      target_of = on_universe
    else if (any(fit_names == name)) then
      target_of = on_nothing
    else if (any(query_names == name) .or. any(summary_names == name)) then
      target_of = on_history
    else
      target_of = 0
    end if
  end function target_of

  integer function name_index(name)
    character(len=*), intent(in) :: name
    integer :: k
    name_index = 0
    do k = 1, size(all_names)
      if (all_names(k) == name) then
        name_index = k
        return
      end if
    end do
  end function name_index

  ! ================================================================ the data file

  subroutine walk(file, mode)
    character(len=*), intent(in) :: file, mode
    character(len=64) :: tokens(max_tokens)
    integer :: unit, ntokens, lineno, nargs, k, which, kind_of_target
    logical :: found
    character(len=:), allocatable :: where

    call open_vector_file(file, unit)
    lineno = 0
    do
      call next_record(unit, file, lineno, tokens, ntokens, where, found)
      if (.not. found) exit
      select case (tokens(1))
      case ('universe')
        if (ntokens /= 2 + nparams) error stop 'test_decoupling: malformed universe at ' // where
        if (find_universe(tokens(2)) /= 0 .or. find_history(tokens(2)) /= 0) &
            error stop 'test_decoupling: name defined twice at ' // where
        call add_universe(where, mode, tokens(2), [(number(tokens(2 + k), where), k = 1, nparams)])
        cycle
      case ('history', 'history_reionized')
        if ((tokens(1) == 'history' .and. ntokens /= 3) .or. &
            (tokens(1) == 'history_reionized' .and. ntokens /= 4)) &
            error stop 'test_decoupling: malformed history at ' // where
        if (find_universe(tokens(2)) /= 0 .or. find_history(tokens(2)) /= 0) &
            error stop 'test_decoupling: name defined twice at ' // where
        which = find_universe(tokens(3))
        if (which == 0) error stop 'test_decoupling: history of an unknown universe at ' // where
        if (tokens(1) == 'history') then
          call add_history(where, mode, tokens(2), which, .false., 0.0_dp)
        else
          call add_history(where, mode, tokens(2), which, .true., number(tokens(4), where))
        end if
        cycle
      end select
      ! function TARGET nargs args... expected kind tolerance source
      nargs = vector_nargs(tokens, ntokens, where)
      kind_of_target = target_of(tokens(1))
      select case (kind_of_target)
      case (on_universe)
        which = find_universe(tokens(2))
      case (on_history)
        which = find_history(tokens(2))
      case (on_nothing)
        which = 0
        if (tokens(2) /= '-') which = -1
      case default
        if (mode == 'dump') error stop 'test_decoupling --dump: unknown function at ' // where
        call check(.false., where // ': unknown function name ' // trim(tokens(1)))
        cycle
      end select
      if ((kind_of_target /= on_nothing .and. which == 0) .or. which < 0) then
        if (mode == 'dump') error stop 'test_decoupling --dump: unknown target at ' // where
        call check(.false., where // ': unknown or wrong target ' // trim(tokens(2)) // ' of ' // &
            trim(tokens(1)))
        cycle
      end if
      call vector_line(where, mode, tokens(1), tokens(2), which, nargs, tokens(4:3 + nargs), &
          tokens(4 + nargs), tokens(5 + nargs), tokens(6 + nargs), tokens(7 + nargs))
    end do
    close (unit)
  end subroutine walk

  subroutine add_universe(where, mode, name, values)
    character(len=*), intent(in) :: where, mode, name
    real(dp), intent(in) :: values(nparams)
    type(named_universe), allocatable :: grown(:)
    integer(c_int32_t) :: stat

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
      call check(stat == RELICORE_OK, where // ': relicore_universe_init(' // trim(name) // &
          ') status ' // int_text(int(stat)))
    end associate
  end subroutine add_universe

  subroutine add_history(where, mode, name, which, reionized, zre)
    character(len=*), intent(in) :: where, mode, name
    integer, intent(in) :: which
    logical, intent(in) :: reionized
    real(dp), intent(in) :: zre
    type(named_history), allocatable :: grown(:)
    type(relicore_thermal_history_options) :: options
    integer(c_int32_t) :: stat

    if (nhistories == size(histories)) then
      allocate (grown(2 * size(histories)))
      grown(1:nhistories) = histories(1:nhistories)
      call move_alloc(grown, histories)
    end if
    nhistories = nhistories + 1
    options = relicore_thermal_history_options_default()
    if (reionized) then
      options%reionization = 1
      options%reionization_redshift = zre
    end if
    histories(nhistories)%name = name
    histories(nhistories)%universe = which
    call relicore_thermal_history_compute(universes(which)%u, options, histories(nhistories)%h, &
        stat)
    if (mode == 'dump') return
    call check(stat == RELICORE_OK, where // ': relicore_thermal_history_compute(' // trim(name) &
        // ') status ' // int_text(int(stat)))
  end subroutine add_history

  subroutine vector_line(where, mode, name, target_name, which, nargs, arg_tokens, expected, &
      kind, tolerance, source)
    character(len=*), intent(in) :: where, mode, name, target_name, expected, kind, tolerance, &
        source
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
    call evaluate_one(name, which, args, got)
    if (mode == 'dump') then
      if (.not. got%known .or. got%nargs /= nargs) &
          error stop 'test_decoupling --dump: unknown name or wrong nargs at ' // where
      if (kind /= 'status') write (output_unit, '(a, 1x, a, 1x, a)') trim(target_name), &
          trim(name), hex64(got%f64)
      return
    end if

    call_text = vector_call_text(where, name, target_name, args)
    call judge(call_text, name, got, nargs, expected, kind, tolerance, source)

    if (got%known .and. got%nargs == nargs) then
      if (nvectors == size(vectors)) then
        allocate (grown(2 * size(vectors)))
        grown(1:nvectors) = vectors(1:nvectors)
        call move_alloc(grown, vectors)
      end if
      nvectors = nvectors + 1
      vectors(nvectors)%name = name
      vectors(nvectors)%target = which
      vectors(nvectors)%nargs = nargs
      vectors(nvectors)%args(1:nargs) = args
      vectors(nvectors)%got = got
    end if
  end subroutine vector_line

  ! Checks one outcome against the line: both forms agree, then the tolerance or the status.
  subroutine judge(call_text, name, got, nargs, expected, kind, tolerance, source)
    character(len=*), intent(in) :: call_text, name, expected, kind, tolerance, source
    type(outcome), intent(in) :: got
    integer, intent(in) :: nargs
    real(dp) :: want, allowed, tol, dev
    logical :: ok
    integer :: k, d, j

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
    dev = abs(got%f64 - want)
    if (got%stat == RELICORE_OK .and. .not. ieee_is_nan(dev)) then
      k = name_index(name)
      d = 0
      do j = 1, ndeviations
        if (deviations(j)%name == k .and. deviations(j)%source == source) then
          d = j
          exit
        end if
      end do
      if (d == 0 .and. ndeviations < size(deviations)) then
        ndeviations = ndeviations + 1
        d = ndeviations
        deviations(d)%name = k
        deviations(d)%source = source
      end if
      if (d > 0) then
        associate (dv => deviations(d))
          dv%lines = dv%lines + 1
          if (want /= 0) then
            dv%worst_rel = max(dv%worst_rel, dev / abs(want))
          else
            dv%worst_rel = max(dv%worst_rel, dev)
          end if
          if (allowed > 0) dv%worst_ratio = max(dv%worst_ratio, dev / allowed)
        end associate
      end if
    end if
    ok = same64(got%f64, got%s64) .and. got%stat == RELICORE_OK .and. &
        (got%f64 == want .or. dev <= allowed)
    call check_value_line(ok, call_text, want, got%f64, got%s64, got%stat, dev, kind, tolerance, &
        allowed)
  end subroutine judge

  subroutine report_deviations()
    integer :: k, d
    character(len=160) :: line
    write (output_unit, '(a)') 'largest deviation from the reference values per function ' // &
        'and source (relative, or absolute where the value is 0; and as a fraction of the ' // &
        'line''s tolerance):'
    do k = 1, size(all_names)
      do d = 1, ndeviations
        if (deviations(d)%name /= k) cycle
        write (line, '(2x, a34, 1x, a24, 1x, i4, a, es10.3, 2x, f9.3, a)') all_names(k), &
            deviations(d)%source, deviations(d)%lines, ' lines ', deviations(d)%worst_rel, &
            deviations(d)%worst_ratio, ' of tolerance'
        write (output_unit, '(a)') trim(line)
      end do
    end do
  end subroutine report_deviations

  ! ================================================================ dispatch by name

  ! Scalar calls: the elemental function and the status form (with stat) of the name; which is
  ! the universe (Saha) or history (queries, summary) index, ignored for the fits.
  subroutine evaluate_one(name, which, a, got)
    character(len=*), intent(in) :: name
    integer, intent(in) :: which
    real(dp), intent(in) :: a(:)
    type(outcome), intent(out) :: got
    select case (target_of(name))
    case (on_universe)
      call evaluate_universe(name, universes(which)%u, a, got)
    case (on_history)
      call evaluate_history(name, histories(which)%h, a, got)
    case (on_nothing)
      call evaluate_fit(name, a, got)
    case default
      got%known = .false.
      got%nargs = -1
    end select
  end subroutine evaluate_one

  subroutine evaluate_universe(name, u, a, got)
    character(len=*), intent(in) :: name
    type(relicore_universe), intent(in) :: u
    real(dp), intent(in) :: a(:)
    type(outcome), intent(out) :: got
    got%f64 = nan()
    got%s64 = nan()
    got%known = .true.
    select case (name)
    include 'generated/decoupling_universe.inc'
    case default
      got%known = .false.
      got%nargs = -1
    end select
  end subroutine evaluate_universe

  subroutine evaluate_fit(name, a, got)
    character(len=*), intent(in) :: name
    real(dp), intent(in) :: a(:)
    type(outcome), intent(out) :: got
    got%f64 = nan()
    got%s64 = nan()
    got%known = .true.
    select case (name)
    include 'generated/decoupling_fit.inc'
    case default
      got%known = .false.
      got%nargs = -1
    end select
  end subroutine evaluate_fit

  subroutine evaluate_history(name, h, a, got)
    character(len=*), intent(in) :: name
    type(relicore_thermal_history), intent(in) :: h
    real(dp), intent(in) :: a(:)
    type(outcome), intent(out) :: got
    got%f64 = nan()
    got%s64 = nan()
    got%known = .true.
    select case (name)
    include 'generated/decoupling_history.inc'
    case default
      got%known = .false.
      got%nargs = -1
    end select
  end subroutine evaluate_history

  ! The elemental forms of a query (or Saha, with u) on an array of redshifts.
  subroutine evaluate_many(name, u, h, z, f64, s64, stat)
    character(len=*), intent(in) :: name
    type(relicore_universe), intent(in) :: u
    type(relicore_thermal_history), intent(in) :: h
    real(dp), intent(in) :: z(:)
    real(dp), intent(out) :: f64(:), s64(:)
    integer(c_int32_t), intent(out) :: stat(:)
    select case (name)
    include 'generated/decoupling_many.inc'
    case default
      error stop 'test_decoupling: no elemental dispatch for ' // name
    end select
  end subroutine evaluate_many

  ! The C array form of a query (or Saha, with u).
  subroutine array_form(name, u, h, x, out, stat)
    character(len=*), intent(in) :: name
    type(relicore_universe), intent(in) :: u
    type(relicore_thermal_history), intent(in) :: h
    real(dp), intent(in) :: x(:)
    real(dp), intent(out) :: out(:)
    integer(c_int32_t), intent(out) :: stat
    select case (name)
    include 'generated/decoupling_array.inc'
    case default
      error stop 'test_decoupling: no array form for ' // name
    end select
  end subroutine array_form

  ! The summary values of an array of histories, elementally.
  subroutine evaluate_summaries(name, hs, f64, s64, stat)
    character(len=*), intent(in) :: name
    type(relicore_thermal_history), intent(in) :: hs(:)
    real(dp), intent(out) :: f64(:), s64(:)
    integer(c_int32_t), intent(out) :: stat(:)
    select case (name)
    include 'generated/decoupling_summaries.inc'
    case default
      error stop 'test_decoupling: not a summary value: ' // name
    end select
  end subroutine evaluate_summaries

  ! ================================================================ tests written here

  ! Every procedure has at least one vector (so the data and this test cannot drift apart).
  subroutine test_coverage()
    integer :: k
    do k = 1, size(all_names)
      call check(count(vectors(1:nvectors)%name == all_names(k)) > 0, &
          'no reference vector for relicore_' // trim(all_names(k)))
    end do
  end subroutine test_coverage

  ! The indices of the vectors of a name and target.
  function members_of(name, which) result(members)
    character(len=*), intent(in) :: name
    integer, intent(in) :: which
    integer, allocatable :: members(:)
    integer :: j
    members = pack([(j, j = 1, nvectors)], vectors(1:nvectors)%name == name .and. &
        vectors(1:nvectors)%target == which)
  end function members_of

  ! For each target and one-argument name: the arguments of all its vectors as an array through
  ! the elemental forms give the scalar calls' results and statuses bit for bit.
  subroutine test_elemental_arrays()
    character(len=48), parameter :: names(*) = [universe_names, query_names]
    integer :: ti, k, j, n, ntargets, hi, ui
    integer, allocatable :: members(:)
    real(dp), allocatable :: z(:), f64(:), s64(:)
    integer(c_int32_t), allocatable :: stat(:)
    logical :: ok

    do k = 1, size(names)
      ntargets = nhistories
      if (k <= size(universe_names)) ntargets = nuniverses
      do ti = 1, ntargets
        members = members_of(trim(names(k)), ti)
        n = size(members)
        if (n == 0) cycle
        z = [(vectors(members(j))%args(1), j = 1, n)]
        allocate (f64(n), s64(n), stat(n))
        ui = 1
        hi = 1
        if (k <= size(universe_names)) ui = ti
        if (k > size(universe_names)) hi = ti
        call evaluate_many(trim(names(k)), universes(ui)%u, histories(hi)%h, z, f64, s64, stat)
        ok = .true.
        do j = 1, n
          associate (one => vectors(members(j))%got)
            ok = ok .and. same64(one%f64, f64(j)) .and. same64(one%s64, s64(j)) .and. &
                one%stat == stat(j)
          end associate
        end do
        call check(ok, 'elemental ' // trim(names(k)) // ' on ' // int_text(n) // &
            ' redshifts of target ' // int_text(ti) // ' differs from the scalar calls')
        deallocate (f64, s64, stat)
      end do
    end do
  end subroutine test_elemental_arrays

  ! The summary values of all histories at once (elemental in the history, on copies made by
  ! assignment) equal the scalar calls on the originals.
  subroutine test_elemental_histories()
    type(relicore_thermal_history), allocatable :: hs(:)
    real(dp) :: f64(nhistories), s64(nhistories)
    integer(c_int32_t) :: stat(nhistories)
    type(outcome) :: one
    real(dp) :: none(0)
    integer :: k, hi
    logical :: ok

    allocate (hs(nhistories))
    hs(:) = histories(1:nhistories)%h
    do k = 1, size(summary_names)
      call evaluate_summaries(trim(summary_names(k)), hs, f64, s64, stat)
      ok = .true.
      do hi = 1, nhistories
        call evaluate_history(trim(summary_names(k)), histories(hi)%h, none, one)
        ok = ok .and. same64(one%f64, f64(hi)) .and. same64(one%s64, s64(hi)) .and. &
            one%stat == stat(hi) .and. one%stat == RELICORE_OK
      end do
      call check(ok, 'elemental ' // trim(summary_names(k)) // ' over ' // int_text(nhistories) &
          // ' copied histories differs from the scalar calls')
    end do
    deallocate (hs)
  end subroutine test_elemental_histories

  ! The C array forms of Saha and the queries, for every target: x = the arguments of its
  ! vectors. out equals the elemental function bit for bit (NaN where an element fails), stat
  ! the first failing element's code; a reversed input with a strided output gives the same
  ! values; a too-long out is RELICORE_ERROR_LENGTH_MISMATCH with every element NaN; an empty
  ! array is RELICORE_OK.
  subroutine test_array_forms()
    character(len=48), parameter :: names(*) = [universe_names, query_names]
    integer :: ti, k, j, n, ntargets, ui, hi
    integer, allocatable :: members(:)
    real(dp), allocatable :: x(:), out(:), ref(:), ref_s(:), strided(:), too_long(:)
    integer(c_int32_t), allocatable :: stats(:)
    integer(c_int32_t) :: stat, stat_reversed, stat_mismatch, stat_empty
    real(dp) :: empty(0), empty_out(0)
    logical :: ok

    do k = 1, size(names)
      ntargets = nhistories
      if (k <= size(universe_names)) ntargets = nuniverses
      do ti = 1, ntargets
        members = members_of(trim(names(k)), ti)
        n = size(members)
        if (n == 0) cycle
        ui = 1
        hi = 1
        if (k <= size(universe_names)) ui = ti
        if (k > size(universe_names)) hi = ti
        x = [(vectors(members(j))%args(1), j = 1, n)]
        allocate (out(n), ref(n), ref_s(n), stats(n), strided(2 * n), too_long(n + 1))
        strided = 0
        associate (u => universes(ui)%u, h => histories(hi)%h)
          call array_form(trim(names(k)), u, h, x, out, stat)
          call array_form(trim(names(k)), u, h, x(n:1:-1), strided(2 * n:2:-2), stat_reversed)
          call array_form(trim(names(k)), u, h, x, too_long, stat_mismatch)
          call array_form(trim(names(k)), u, h, empty, empty_out, stat_empty)
          call evaluate_many(trim(names(k)), u, h, x, ref, ref_s, stats)
        end associate
        ok = stat == first_failure(stats) .and. stat_reversed == first_failure(stats(n:1:-1)) &
            .and. stat_empty == RELICORE_OK .and. &
            stat_mismatch == RELICORE_ERROR_LENGTH_MISMATCH .and. all(ieee_is_nan(too_long))
        ok = ok .and. all(same64(out, ref)) .and. all(same64(ref_s, ref)) .and. &
            all(same64(strided(2::2), out)) .and. all(strided(1::2) == 0)
        call check(ok, 'array form ' // trim(names(k)) // '_array(target ' // int_text(ti) // &
            ', ' // int_text(n) // ' values): status ' // int_text(int(stat)) // &
            ' (elemental: first failure ' // int_text(int(first_failure(stats))) // &
            '), or values differ from the elemental form')
        deallocate (out, ref, ref_s, stats, strided, too_long)
      end do
    end do
  end subroutine test_array_forms

  ! The fits' array forms over omega_baryon_h2, at every second argument of their vectors, on
  ! every first argument of that fit's vectors: bit for bit the elemental forms.
  subroutine test_fit_arrays()
    integer :: k, j, m, n
    integer, allocatable :: members(:)
    real(dp), allocatable :: wb(:), out(:), ref(:), ref_s(:)
    integer(c_int32_t), allocatable :: stats(:)
    integer(c_int32_t) :: stat, stat_mismatch
    real(dp) :: wm, too_long(2)
    logical :: ok

    do k = 1, size(fit_names)
      members = members_of(trim(fit_names(k)), 0)
      n = size(members)
      if (n == 0) cycle
      wb = [(vectors(members(j))%args(1), j = 1, n)]
      allocate (out(n), ref(n), ref_s(n), stats(n))
      do m = 1, n
        wm = vectors(members(m))%args(2)
        if (any(same64([(vectors(members(j))%args(2), j = 1, m - 1)], wm))) cycle
        select case (fit_names(k))
        include 'generated/decoupling_fit_arrays.inc'
        case default
          error stop 'test_decoupling: no array form for ' // trim(fit_names(k))
        end select
        ok = stat == first_failure(stats) .and. all(same64(out, ref)) .and. &
            all(same64(ref_s, ref)) .and. stat_mismatch == RELICORE_ERROR_LENGTH_MISMATCH .and. &
            all(ieee_is_nan(too_long))
        call check(ok, trim(fit_names(k)) // '_array(' // int_text(n) // ' values, ' // &
            'omega_matter_h2 = ' // g17(wm) // '): status ' // int_text(int(stat)) // &
            ', or values differ from the elemental form')
      end do
      deallocate (out, ref, ref_s, stats)
    end do
  end subroutine test_fit_arrays

  ! A history never computed, or whose compute failed, is refused by every procedure (the
  ! struct is checked before the argument); copies work like the original; every failure of the
  ! compute; the default options.
  subroutine test_history_values()
    type(relicore_thermal_history), allocatable :: fresh, failed_compute, copy
    type(relicore_universe) :: no_baryons, never
    type(relicore_universe_parameters) :: params
    type(relicore_thermal_history_options) :: options, o
    type(outcome) :: got, again
    integer(c_int32_t) :: stat, want
    real(dp) :: out(3), none(0), none_out(0)
    integer :: k, c
    logical :: ok
    character(len=:), allocatable :: what

    allocate (fresh, failed_compute, copy)
    call check(storage_size(fresh) == 64 * (1 + RELICORE_THERMAL_HISTORY_STORAGE_WORDS) .and. &
        storage_size(fresh) / 8 == 163848, &
        'type(relicore_thermal_history) is not a tag and its words (163848 bytes)')
    options = relicore_thermal_history_options_default()
    call check(options%reionization == 0 .and. ieee_is_nan(options%reionization_redshift) .and. &
        options%highest_redshift == 1.0e4_dp, 'relicore_thermal_history_options_default: ' // &
        int_text(int(options%reionization)) // ', ' // g17(options%reionization_redshift) // &
        ', ' // g17(options%highest_redshift) // ' (want 0, NaN, 1e4)')

    ! every failure of the compute leaves a refused history
    params = relicore_universe_parameters_default(67.4_dp, 0.315_dp)
    call relicore_universe_init(params, no_baryons)
    do c = 1, 9
      o = options
      failed_compute = histories(1)%h
      select case (c)
      case (1)
        o%reionization = 2
        want = RELICORE_ERROR_OUT_OF_DOMAIN
        what = 'reionization = 2'
      case (2)
        o%reionization = 1
        want = RELICORE_ERROR_NON_FINITE
        what = 'reionization on with the default (NaN) redshift'
      case (3)
        o%reionization = 1
        o%reionization_redshift = -0.5_dp
        want = RELICORE_ERROR_NEGATIVE
        what = 'z_re = -0.5'
      case (4)
        o%reionization = 1
        o%reionization_redshift = 101
        want = RELICORE_ERROR_OUT_OF_DOMAIN
        what = 'z_re = 101'
      case (5)
        o%highest_redshift = 2999
        want = RELICORE_ERROR_OUT_OF_DOMAIN
        what = 'highest redshift 2999'
      case (6)
        o%highest_redshift = ieee_value(1.0_dp, ieee_positive_inf)
        want = RELICORE_ERROR_NON_FINITE
        what = 'highest redshift +inf'
      case (7)
        o%highest_redshift = 2.0e4_dp
        want = RELICORE_ERROR_CAPACITY_TOO_SMALL
        what = 'highest redshift 2e4'
      case (8)
        want = RELICORE_ERROR_INVALID_PARAMETER
        what = 'a universe without baryons'
      case default
        want = RELICORE_ERROR_INVALID_STRUCT
        what = 'a universe never initialised'
      end select
      select case (c)
      case (8)
        call relicore_thermal_history_compute(no_baryons, o, failed_compute, stat)
      case (9)
        call relicore_thermal_history_compute(never, o, failed_compute, stat)
      case default
        call relicore_thermal_history_compute(universes(histories(1)%universe)%u, o, &
            failed_compute, stat)
      end select
      call check(stat == want .and. failed_compute%tag == 0 .and. &
          all(failed_compute%storage == 0), 'relicore_thermal_history_compute with ' // what // &
          ': status ' // int_text(int(stat)) // ', want ' // int_text(int(want)) // &
          ' and a cleared history')
    end do
    call check(ieee_is_nan(relicore_saha_ionized_fraction(no_baryons, 1400.0_dp)), &
        'Saha of a universe without baryons is not NaN')

    do k = 1, size(all_names)
      if (target_of(all_names(k)) /= on_history) cycle
      call evaluate_history(trim(all_names(k)), fresh, [1100.0_dp], got)
      if (got%nargs == 0) call evaluate_history(trim(all_names(k)), fresh, none, got)
      if (got%nargs == 1) then
        call evaluate_history(trim(all_names(k)), failed_compute, [nan()], again)
      else
        call evaluate_history(trim(all_names(k)), failed_compute, none, again)
      end if
      ok = got%stat == RELICORE_ERROR_INVALID_STRUCT .and. ieee_is_nan(got%f64) .and. &
          ieee_is_nan(got%s64) .and. again%stat == RELICORE_ERROR_INVALID_STRUCT .and. &
          ieee_is_nan(again%f64) .and. ieee_is_nan(again%s64)
      call check(ok, trim(all_names(k)) // ' on a history never computed / after a failed ' // &
          'compute: status ' // int_text(int(got%stat)) // ' / ' // int_text(int(again%stat)) // &
          ', want ' // int_text(int(RELICORE_ERROR_INVALID_STRUCT)) // ' and NaN')
    end do
    do k = 1, size(query_names)
      out = 1
      call array_form(trim(query_names(k)), never, fresh, [1.0_dp, 2.0_dp, 3.0_dp], out, stat)
      call check(stat == RELICORE_ERROR_INVALID_STRUCT .and. all(ieee_is_nan(out)), &
          trim(query_names(k)) // '_array on a history never computed: status ' // &
          int_text(int(stat)))
      call array_form(trim(query_names(k)), never, failed_compute, none, none_out, stat)
      call check(stat == RELICORE_ERROR_INVALID_STRUCT, trim(query_names(k)) // &
          '_array of no element on the history of a failed compute: status ' // &
          int_text(int(stat)))
    end do

    ! a copy (assignment) of a history gives the same results as the original
    copy = histories(nhistories)%h
    ok = .true.
    do k = 1, size(all_names)
      if (target_of(all_names(k)) /= on_history) cycle
      if (any(query_names == all_names(k))) then
        call evaluate_history(trim(all_names(k)), histories(nhistories)%h, [1090.0_dp], got)
        call evaluate_history(trim(all_names(k)), copy, [1090.0_dp], again)
      else
        call evaluate_history(trim(all_names(k)), histories(nhistories)%h, none, got)
        call evaluate_history(trim(all_names(k)), copy, none, again)
      end if
      ok = ok .and. same64(got%f64, again%f64) .and. got%stat == again%stat .and. &
          got%stat == RELICORE_OK
    end do
    call check(ok, 'a copy of a history gives other results than the original')
    deallocate (fresh, failed_compute, copy)
  end subroutine test_history_values

  ! The status code of the capacity: its own message; the next number is unknown.
  subroutine test_messages()
    character(len=:), allocatable :: unknown
    unknown = relicore_status_message(1_c_int32_t)
    call check(RELICORE_ERROR_CAPACITY_TOO_SMALL == -16, &
        'RELICORE_ERROR_CAPACITY_TOO_SMALL is not -16 (FORMAT.md)')
    call check(relicore_status_message(RELICORE_ERROR_CAPACITY_TOO_SMALL) /= unknown .and. &
        relicore_status_message(RELICORE_ERROR_CAPACITY_TOO_SMALL) /= &
        relicore_status_message(RELICORE_ERROR_NO_BIG_BANG) .and. &
        relicore_status_message(RELICORE_ERROR_CAPACITY_TOO_SMALL - 1_c_int32_t) == unknown, &
        'message of RELICORE_ERROR_CAPACITY_TOO_SMALL')
  end subroutine test_messages

  ! A failing compute without stat must stop with the routine name, the message and the code.
  subroutine stop_check()
    type(relicore_universe_parameters) :: p
    type(relicore_universe) :: u
    type(relicore_thermal_history), allocatable :: h
    type(relicore_thermal_history_options) :: o
    write (output_unit, '(a)') 'EXPECT relicore_thermal_history_compute: ' // &
        relicore_status_message(RELICORE_ERROR_CAPACITY_TOO_SMALL) // ' (status ' // &
        int_text(int(RELICORE_ERROR_CAPACITY_TOO_SMALL)) // ')'
    flush (output_unit)
    p = relicore_universe_parameters_default(67.4_dp, 0.315_dp)
    p%omega_baryon = 0.049_dp
    call relicore_universe_init(p, u)
    o = relicore_thermal_history_options_default()
    o%highest_redshift = 2.0e4_dp
    allocate (h)
    call relicore_thermal_history_compute(u, o, h)
    write (output_unit, '(a)') 'relicore_thermal_history_compute returned instead of stopping'
  end subroutine stop_check

end program test_decoupling
