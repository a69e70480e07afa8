!! Hand-kept part of the Fortran module relicore (copied into bindings/fortran/relicore.f90 by
!! `python3 bindings/generate.py --write`, section by section at the template's `!@ parts`
!! markers): the radiation-thermometry procedures the table cannot describe. The regular
!! thermometry functions, their frame (image) forms and the type relicore_temperature_uncertainty
!! are generated.
!@@ public
!@ tables
  public :: relicore_combined_standard_uncertainty, relicore_combined_standard_uncertainty_s, &
      relicore_combined_standard_uncertainty_correlated, &
      relicore_combined_standard_uncertainty_correlated_s
!@@ interfaces
!@ tables
    ! int32_t relicore_combined_standard_uncertainty(const double *sensitivity_coefficients, size_t
    !     n_coefficients, const double *standard_uncertainties, size_t n_uncertainties, double
    !     *out);
    function c_combined_standard_uncertainty(sensitivity_coefficients, n_coefficients, &
        standard_uncertainties, n_uncertainties, out) &
        bind(C, name='relicore_combined_standard_uncertainty') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: sensitivity_coefficients(*), standard_uncertainties(*)
      integer(c_size_t), value :: n_coefficients, n_uncertainties
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_combined_standard_uncertainty
    ! int32_t relicore_combined_standard_uncertainty_correlated(const double
    !     *sensitivity_coefficients, size_t n_coefficients, const double *standard_uncertainties,
    !     size_t n_uncertainties, const double *correlation, size_t n_correlation, double *out);
    function c_combined_standard_uncertainty_correlated(sensitivity_coefficients, n_coefficients, &
        standard_uncertainties, n_uncertainties, correlation, n_correlation, out) &
        bind(C, name='relicore_combined_standard_uncertainty_correlated') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: sensitivity_coefficients(*), standard_uncertainties(*)
      integer(c_size_t), value :: n_coefficients, n_uncertainties
      real(c_double), intent(in) :: correlation(*)
      integer(c_size_t), value :: n_correlation
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_combined_standard_uncertainty_correlated
!@@ procedures

  ! ---------------------------------------------------------------- radiation thermometry
  ! Radiation thermometry (the measurement equation, object temperatures with their uncertainty):
  ! the forms the table cannot describe, over include/relicore.h. Emissivity and reflections
  ! dominate real errors; the uncertainty covers only the inputs given; fever screening, furnaces,
  ! molten metal and fire safety follow the applicable standards, local codes and licensed practice.
!@ tables

  ! Combined standard uncertainty of uncorrelated inputs, u_c = (sum c_i^2 u_i^2)^(1/2) (JCGM
  ! 100:2008 eq. 10), and of correlated inputs with the n x n correlation matrix r (eq. 13):
  ! sensitivity_coefficients(n) in K per unit of input i (finite), standard_uncertainties(n)
  ! (finite, >= 0), correlation(n, n) (finite, |r| <= 1, unit diagonal, symmetric; being symmetric,
  ! its column order equals the C row order). Result: u_c in K, NaN on failure. Forms: function and
  ! _s.

  function relicore_combined_standard_uncertainty(sensitivity_coefficients, &
      standard_uncertainties) result(res)
    real(c_double), intent(in) :: sensitivity_coefficients(:), standard_uncertainties(:)
    real(c_double) :: res
    if (call_combined_standard_uncertainty(sensitivity_coefficients, standard_uncertainties, &
        res) /= RELICORE_OK) res = nan64()
  end function relicore_combined_standard_uncertainty

  subroutine relicore_combined_standard_uncertainty_s(sensitivity_coefficients, &
      standard_uncertainties, out, stat)
    real(c_double), intent(in) :: sensitivity_coefficients(:), standard_uncertainties(:)
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = call_combined_standard_uncertainty(sensitivity_coefficients, standard_uncertainties, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_combined_standard_uncertainty', stat)
  end subroutine relicore_combined_standard_uncertainty_s

  ! Calls relicore_combined_standard_uncertainty with copies in buffers of at least one element
  ! (zero sizes reach the C library as valid buffers of length 0).
  function call_combined_standard_uncertainty(sensitivity_coefficients, standard_uncertainties, &
      out) result(code)
    real(c_double), intent(in) :: sensitivity_coefficients(:), standard_uncertainties(:)
    real(c_double), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_double) :: c(max(1, size(sensitivity_coefficients)))
    real(c_double) :: u(max(1, size(standard_uncertainties)))
    c = 0
    u = 0
    c(1:size(sensitivity_coefficients)) = sensitivity_coefficients
    u(1:size(standard_uncertainties)) = standard_uncertainties
    code = c_combined_standard_uncertainty(c, size(sensitivity_coefficients, kind=c_size_t), u, &
        size(standard_uncertainties, kind=c_size_t), out)
  end function call_combined_standard_uncertainty

  function relicore_combined_standard_uncertainty_correlated(sensitivity_coefficients, &
      standard_uncertainties, correlation) result(res)
    real(c_double), intent(in) :: sensitivity_coefficients(:), standard_uncertainties(:)
    real(c_double), intent(in) :: correlation(:, :)
    real(c_double) :: res
    if (call_combined_standard_uncertainty_correlated(sensitivity_coefficients, &
        standard_uncertainties, correlation, res) /= RELICORE_OK) res = nan64()
  end function relicore_combined_standard_uncertainty_correlated

  subroutine relicore_combined_standard_uncertainty_correlated_s(sensitivity_coefficients, &
      standard_uncertainties, correlation, out, stat)
    real(c_double), intent(in) :: sensitivity_coefficients(:), standard_uncertainties(:)
    real(c_double), intent(in) :: correlation(:, :)
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = call_combined_standard_uncertainty_correlated(sensitivity_coefficients, &
        standard_uncertainties, correlation, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_combined_standard_uncertainty_correlated', stat)
  end subroutine relicore_combined_standard_uncertainty_correlated_s

  ! Calls relicore_combined_standard_uncertainty_correlated with copies in buffers of at least one
  ! element (zero sizes reach the C library as valid buffers of length 0).
  function call_combined_standard_uncertainty_correlated(sensitivity_coefficients, &
      standard_uncertainties, correlation, out) result(code)
    real(c_double), intent(in) :: sensitivity_coefficients(:), standard_uncertainties(:)
    real(c_double), intent(in) :: correlation(:, :)
    real(c_double), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_double) :: c(max(1, size(sensitivity_coefficients)))
    real(c_double) :: u(max(1, size(standard_uncertainties)))
    real(c_double) :: r(max(1, size(correlation)))
    c = 0
    u = 0
    c(1:size(sensitivity_coefficients)) = sensitivity_coefficients
    u(1:size(standard_uncertainties)) = standard_uncertainties
    r = 0
    r(1:size(correlation)) = reshape(correlation, [size(correlation)])
    code = c_combined_standard_uncertainty_correlated(c, size(sensitivity_coefficients, &
        kind=c_size_t), u, size(standard_uncertainties, kind=c_size_t), r, size(correlation, &
        kind=c_size_t), out)
  end function call_combined_standard_uncertainty_correlated
