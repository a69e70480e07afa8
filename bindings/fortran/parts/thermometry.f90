!! Hand-kept part of the Fortran module relicore (copied into bindings/fortran/relicore.f90 by
!! `python3 bindings/generate.py --write`, section by section at the template's `!@ parts`
!! markers): the radiation-thermometry procedures the table cannot describe. The regular
!! thermometry functions, their frame (image) forms and the type relicore_temperature_uncertainty
!! are generated.
!@@ public
  public :: relicore_measured_response_weighted_radiance, &
      relicore_measured_response_weighted_radiance_s, &
      relicore_measured_response_weighted_radiance_f32, &
      relicore_measured_response_weighted_radiance_f32_s, relicore_object_temperature_response, &
      relicore_object_temperature_response_s, relicore_object_temperature_response_f32, &
      relicore_object_temperature_response_f32_s, &
      relicore_object_temperature_response_with_uncertainty, &
      relicore_object_temperature_response_with_uncertainty_s, &
      relicore_object_temperature_response_with_uncertainty_f32, &
      relicore_object_temperature_response_with_uncertainty_f32_s, &
      relicore_response_weighted_radiance_temperature_derivative, &
      relicore_response_weighted_radiance_temperature_derivative_s, &
      relicore_response_weighted_radiance_temperature_derivative_f32, &
      relicore_combined_standard_uncertainty, relicore_combined_standard_uncertainty_s, &
      relicore_combined_standard_uncertainty_correlated, &
      relicore_combined_standard_uncertainty_correlated_s
  ! relicore_response_weighted_radiance_temperature_derivative_f32_s (more than 63 characters)
  ! is the real(c_float) form of the generic name
  ! relicore_response_weighted_radiance_temperature_derivative_s
  interface relicore_response_weighted_radiance_temperature_derivative_s
    module procedure relicore_response_weighted_radiance_temperature_derivative_s, thermometry_f32_2
  end interface relicore_response_weighted_radiance_temperature_derivative_s
!@@ interfaces
    ! int32_t relicore_measured_response_weighted_radiance(const double *wavelengths_m, size_t
    !     n_wavelengths, const double *response_table, size_t n_response_table, double
    !     object_temperature_k, double emissivity, double reflected_temperature_k, double
    !     transmittance, double path_temperature_k, double *out);
    function c_measured_response_weighted_radiance(wavelengths_m, n_wavelengths, response_table, &
        n_response_table, object_temperature_k, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, out) &
        bind(C, name='relicore_measured_response_weighted_radiance') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_double), intent(in) :: response_table(*)
      integer(c_size_t), value :: n_response_table
      real(c_double), value :: object_temperature_k, emissivity, reflected_temperature_k, &
          transmittance, path_temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_measured_response_weighted_radiance
    ! int32_t relicore_measured_response_weighted_radiance_f32(const float *wavelengths_m, size_t
    !     n_wavelengths, const float *response_table, size_t n_response_table, float
    !     object_temperature_k, float emissivity, float reflected_temperature_k, float
    !     transmittance, float path_temperature_k, float *out);
    function c_measured_response_weighted_radiance_f32(wavelengths_m, n_wavelengths, &
        response_table, n_response_table, object_temperature_k, emissivity, &
        reflected_temperature_k, transmittance, path_temperature_k, out) &
        bind(C, name='relicore_measured_response_weighted_radiance_f32') result(status)
      import :: c_float, c_int32_t, c_size_t
      real(c_float), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_float), intent(in) :: response_table(*)
      integer(c_size_t), value :: n_response_table
      real(c_float), value :: object_temperature_k, emissivity, reflected_temperature_k, &
          transmittance, path_temperature_k
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_measured_response_weighted_radiance_f32
    ! int32_t relicore_object_temperature_response(const double *wavelengths_m, size_t
    !     n_wavelengths, const double *response_table, size_t n_response_table, double signal,
    !     double emissivity, double reflected_temperature_k, double transmittance, double
    !     path_temperature_k, double *out);
    function c_object_temperature_response(wavelengths_m, n_wavelengths, response_table, &
        n_response_table, signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, out) &
        bind(C, name='relicore_object_temperature_response') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_double), intent(in) :: response_table(*)
      integer(c_size_t), value :: n_response_table
      real(c_double), value :: signal, emissivity, reflected_temperature_k, transmittance, &
          path_temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_object_temperature_response
    ! int32_t relicore_object_temperature_response_f32(const float *wavelengths_m, size_t
    !     n_wavelengths, const float *response_table, size_t n_response_table, float signal, float
    !     emissivity, float reflected_temperature_k, float transmittance, float path_temperature_k,
    !     float *out);
    function c_object_temperature_response_f32(wavelengths_m, n_wavelengths, response_table, &
        n_response_table, signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, out) &
        bind(C, name='relicore_object_temperature_response_f32') result(status)
      import :: c_float, c_int32_t, c_size_t
      real(c_float), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_float), intent(in) :: response_table(*)
      integer(c_size_t), value :: n_response_table
      real(c_float), value :: signal, emissivity, reflected_temperature_k, transmittance, &
          path_temperature_k
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_object_temperature_response_f32
    ! int32_t relicore_object_temperature_response_with_uncertainty(const double *wavelengths_m,
    !     size_t n_wavelengths, const double *response_table, size_t n_response_table, double
    !     signal, double emissivity, double reflected_temperature_k, double transmittance, double
    !     path_temperature_k, double signal_uncertainty, double emissivity_uncertainty, double
    !     reflected_temperature_uncertainty_k, double transmittance_uncertainty, double
    !     path_temperature_uncertainty_k, struct relicore_temperature_uncertainty *out);
    function c_object_temperature_response_with_uncertainty(wavelengths_m, n_wavelengths, &
        response_table, n_response_table, signal, emissivity, reflected_temperature_k, &
        transmittance, path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
        reflected_temperature_uncertainty_k, transmittance_uncertainty, &
        path_temperature_uncertainty_k, out) &
        bind(C, name='relicore_object_temperature_response_with_uncertainty') result(status)
      import :: c_double, c_int32_t, c_size_t, relicore_temperature_uncertainty
      real(c_double), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_double), intent(in) :: response_table(*)
      integer(c_size_t), value :: n_response_table
      real(c_double), value :: signal, emissivity, reflected_temperature_k, transmittance, &
          path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
          reflected_temperature_uncertainty_k, transmittance_uncertainty, &
          path_temperature_uncertainty_k
      type(relicore_temperature_uncertainty), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_object_temperature_response_with_uncertainty
    ! int32_t relicore_object_temperature_response_with_uncertainty_f32(const float *wavelengths_m,
    !     size_t n_wavelengths, const float *response_table, size_t n_response_table, float signal,
    !     float emissivity, float reflected_temperature_k, float transmittance, float
    !     path_temperature_k, float signal_uncertainty, float emissivity_uncertainty, float
    !     reflected_temperature_uncertainty_k, float transmittance_uncertainty, float
    !     path_temperature_uncertainty_k, struct relicore_temperature_uncertainty_f32 *out);
    function c_object_temperature_response_with_uncertainty_f32(wavelengths_m, n_wavelengths, &
        response_table, n_response_table, signal, emissivity, reflected_temperature_k, &
        transmittance, path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
        reflected_temperature_uncertainty_k, transmittance_uncertainty, &
        path_temperature_uncertainty_k, out) &
        bind(C, name='relicore_object_temperature_response_with_uncertainty_f32') result(status)
      import :: c_float, c_int32_t, c_size_t, relicore_temperature_uncertainty_f32
      real(c_float), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_float), intent(in) :: response_table(*)
      integer(c_size_t), value :: n_response_table
      real(c_float), value :: signal, emissivity, reflected_temperature_k, transmittance, &
          path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
          reflected_temperature_uncertainty_k, transmittance_uncertainty, &
          path_temperature_uncertainty_k
      type(relicore_temperature_uncertainty_f32), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_object_temperature_response_with_uncertainty_f32
    ! int32_t relicore_response_weighted_radiance_temperature_derivative(const double
    !     *wavelengths_m, size_t n_wavelengths, const double *response_table, size_t
    !     n_response_table, double temperature_k, double *out);
    function c_response_weighted_radiance_temperature_derivative(wavelengths_m, n_wavelengths, &
        response_table, n_response_table, temperature_k, out) &
        bind(C, name='relicore_response_weighted_radiance_temperature_derivative') result(status)
      import :: c_double, c_int32_t, c_size_t
      real(c_double), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_double), intent(in) :: response_table(*)
      integer(c_size_t), value :: n_response_table
      real(c_double), value :: temperature_k
      real(c_double), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_response_weighted_radiance_temperature_derivative
    ! int32_t relicore_response_weighted_radiance_temperature_derivative_f32(const float
    !     *wavelengths_m, size_t n_wavelengths, const float *response_table, size_t
    !     n_response_table, float temperature_k, float *out);
    function c_response_weighted_radiance_temperature_derivative_f32(wavelengths_m, n_wavelengths, &
        response_table, n_response_table, temperature_k, out) &
        bind(C, name='relicore_response_weighted_radiance_temperature_derivative_f32') result(status)
      import :: c_float, c_int32_t, c_size_t
      real(c_float), intent(in) :: wavelengths_m(*)
      integer(c_size_t), value :: n_wavelengths
      real(c_float), intent(in) :: response_table(*)
      integer(c_size_t), value :: n_response_table
      real(c_float), value :: temperature_k
      real(c_float), intent(out) :: out
      integer(c_int32_t) :: status
    end function c_response_weighted_radiance_temperature_derivative_f32
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

  ! Measured response-weighted radiance of a scene (the measurement equation with the
  ! response-weighted radiance of the table): L_meas = tau [epsilon L_r(T_obj) + (1 - epsilon)
  ! L_r(T_refl)] + (1 - tau) L_r(T_path).
  ! wavelengths_m(:), response_table(:): the response table (as relicore_response_weighted_radiance)
  ! object_temperature_k, emissivity, reflected_temperature_k, transmittance, path_temperature_k:
  !     scalars
  ! Result: W m-2 sr-1 (times the unit of the response). Forms:
  !   relicore_measured_response_weighted_radiance, _s, and the real(c_float) twins _f32, _f32_s.

  function relicore_measured_response_weighted_radiance(wavelengths_m, response_table, &
      object_temperature_k, emissivity, reflected_temperature_k, transmittance, &
      path_temperature_k) result(res)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: object_temperature_k, emissivity, reflected_temperature_k, &
        transmittance, path_temperature_k
    real(c_double) :: res
    integer(c_int32_t) :: code
    code = table_measured_response_weighted_radiance(wavelengths_m, response_table, &
        object_temperature_k, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, res)
    if (code /= RELICORE_OK) res = nan64()
  end function relicore_measured_response_weighted_radiance

  subroutine relicore_measured_response_weighted_radiance_s(wavelengths_m, response_table, &
      object_temperature_k, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
      out, stat)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: object_temperature_k, emissivity, reflected_temperature_k, &
        transmittance, path_temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_measured_response_weighted_radiance(wavelengths_m, response_table, &
        object_temperature_k, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_measured_response_weighted_radiance', stat)
  end subroutine relicore_measured_response_weighted_radiance_s

  ! Calls relicore_measured_response_weighted_radiance with the table copied to buffers of at least
  ! one element, so that a zero-size table reaches the C library as a valid buffer of length 0
  ! (which it judges: RELICORE_ERROR_ARRAY_TOO_SHORT), never as a NULL pointer.
  function table_measured_response_weighted_radiance(wavelengths_m, response_table, &
      object_temperature_k, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
      out) result(code)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: object_temperature_k, emissivity, reflected_temperature_k, &
        transmittance, path_temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_double) :: w(max(1, size(wavelengths_m))), r(max(1, size(response_table)))
    w = 0
    r = 0
    w(1:size(wavelengths_m)) = wavelengths_m
    r(1:size(response_table)) = response_table
    code = c_measured_response_weighted_radiance(w, size(wavelengths_m, kind=c_size_t), r, &
        size(response_table, kind=c_size_t), object_temperature_k, emissivity, &
        reflected_temperature_k, transmittance, path_temperature_k, out)
  end function table_measured_response_weighted_radiance

  function relicore_measured_response_weighted_radiance_f32(wavelengths_m, response_table, &
      object_temperature_k, emissivity, reflected_temperature_k, transmittance, &
      path_temperature_k) result(res)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: object_temperature_k, emissivity, reflected_temperature_k, &
        transmittance, path_temperature_k
    real(c_float) :: res
    integer(c_int32_t) :: code
    code = table_measured_response_weighted_radiance_f32(wavelengths_m, response_table, &
        object_temperature_k, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, res)
    if (code /= RELICORE_OK) res = nan32()
  end function relicore_measured_response_weighted_radiance_f32

  subroutine relicore_measured_response_weighted_radiance_f32_s(wavelengths_m, response_table, &
      object_temperature_k, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
      out, stat)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: object_temperature_k, emissivity, reflected_temperature_k, &
        transmittance, path_temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_measured_response_weighted_radiance_f32(wavelengths_m, response_table, &
        object_temperature_k, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_measured_response_weighted_radiance_f32', stat)
  end subroutine relicore_measured_response_weighted_radiance_f32_s

  ! Calls relicore_measured_response_weighted_radiance_f32 with the table copied to buffers of at
  ! least one element, so that a zero-size table reaches the C library as a valid buffer of length 0
  ! (which it judges: RELICORE_ERROR_ARRAY_TOO_SHORT), never as a NULL pointer.
  function table_measured_response_weighted_radiance_f32(wavelengths_m, response_table, &
      object_temperature_k, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
      out) result(code)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: object_temperature_k, emissivity, reflected_temperature_k, &
        transmittance, path_temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_float) :: w(max(1, size(wavelengths_m))), r(max(1, size(response_table)))
    w = 0
    r = 0
    w(1:size(wavelengths_m)) = wavelengths_m
    r(1:size(response_table)) = response_table
    code = c_measured_response_weighted_radiance_f32(w, size(wavelengths_m, kind=c_size_t), r, &
        size(response_table, kind=c_size_t), object_temperature_k, emissivity, &
        reflected_temperature_k, transmittance, path_temperature_k, out)
  end function table_measured_response_weighted_radiance_f32

  ! Object temperature from a response-weighted signal (the inverse measurement equation, by the
  ! shared root finder); OUT_OF_DOMAIN when the corrected object radiance is not positive.
  ! wavelengths_m(:), response_table(:): the response table (as relicore_response_weighted_radiance)
  ! signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k: scalars
  ! Result: T_obj in K. Forms: relicore_object_temperature_response, _s, and the real(c_float) twins
  !   _f32, _f32_s.

  function relicore_object_temperature_response(wavelengths_m, response_table, signal, emissivity, &
      reflected_temperature_k, transmittance, path_temperature_k) result(res)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k
    real(c_double) :: res
    integer(c_int32_t) :: code
    code = table_object_temperature_response(wavelengths_m, response_table, signal, emissivity, &
        reflected_temperature_k, transmittance, path_temperature_k, res)
    if (code /= RELICORE_OK) res = nan64()
  end function relicore_object_temperature_response

  subroutine relicore_object_temperature_response_s(wavelengths_m, response_table, signal, &
      emissivity, reflected_temperature_k, transmittance, path_temperature_k, out, stat)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_object_temperature_response(wavelengths_m, response_table, signal, emissivity, &
        reflected_temperature_k, transmittance, path_temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_object_temperature_response', stat)
  end subroutine relicore_object_temperature_response_s

  ! Calls relicore_object_temperature_response with the table copied to buffers of at least one
  ! element, so that a zero-size table reaches the C library as a valid buffer of length 0 (which it
  ! judges: RELICORE_ERROR_ARRAY_TOO_SHORT), never as a NULL pointer.
  function table_object_temperature_response(wavelengths_m, response_table, signal, emissivity, &
      reflected_temperature_k, transmittance, path_temperature_k, out) result(code)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_double) :: w(max(1, size(wavelengths_m))), r(max(1, size(response_table)))
    w = 0
    r = 0
    w(1:size(wavelengths_m)) = wavelengths_m
    r(1:size(response_table)) = response_table
    code = c_object_temperature_response(w, size(wavelengths_m, kind=c_size_t), r, &
        size(response_table, kind=c_size_t), signal, emissivity, reflected_temperature_k, &
        transmittance, path_temperature_k, out)
  end function table_object_temperature_response

  function relicore_object_temperature_response_f32(wavelengths_m, response_table, signal, &
      emissivity, reflected_temperature_k, transmittance, path_temperature_k) result(res)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k
    real(c_float) :: res
    integer(c_int32_t) :: code
    code = table_object_temperature_response_f32(wavelengths_m, response_table, signal, emissivity, &
        reflected_temperature_k, transmittance, path_temperature_k, res)
    if (code /= RELICORE_OK) res = nan32()
  end function relicore_object_temperature_response_f32

  subroutine relicore_object_temperature_response_f32_s(wavelengths_m, response_table, signal, &
      emissivity, reflected_temperature_k, transmittance, path_temperature_k, out, stat)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_object_temperature_response_f32(wavelengths_m, response_table, signal, emissivity, &
        reflected_temperature_k, transmittance, path_temperature_k, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_object_temperature_response_f32', stat)
  end subroutine relicore_object_temperature_response_f32_s

  ! Calls relicore_object_temperature_response_f32 with the table copied to buffers of at least one
  ! element, so that a zero-size table reaches the C library as a valid buffer of length 0 (which it
  ! judges: RELICORE_ERROR_ARRAY_TOO_SHORT), never as a NULL pointer.
  function table_object_temperature_response_f32(wavelengths_m, response_table, signal, emissivity, &
      reflected_temperature_k, transmittance, path_temperature_k, out) result(code)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_float) :: w(max(1, size(wavelengths_m))), r(max(1, size(response_table)))
    w = 0
    r = 0
    w(1:size(wavelengths_m)) = wavelengths_m
    r(1:size(response_table)) = response_table
    code = c_object_temperature_response_f32(w, size(wavelengths_m, kind=c_size_t), r, &
        size(response_table, kind=c_size_t), signal, emissivity, reflected_temperature_k, &
        transmittance, path_temperature_k, out)
  end function table_object_temperature_response_f32

  ! object_temperature_response with its sensitivity coefficients (signal, emissivity, reflected
  ! temperature, transmittance, path temperature) and combined standard uncertainty (JCGM 100:2008
  ! eq. 10).
  ! wavelengths_m(:), response_table(:): the response table (as relicore_response_weighted_radiance)
  ! signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k,
  !     signal_uncertainty, emissivity_uncertainty, reflected_temperature_uncertainty_k,
  !     transmittance_uncertainty, path_temperature_uncertainty_k: scalars
  ! Result: type(relicore_temperature_uncertainty) (_f32 twin), every real field NaN and inputs 0 on
  !   failure. Forms: relicore_object_temperature_response_with_uncertainty, _s, and the
  !   real(c_float) twins _f32, _f32_s.

  function relicore_object_temperature_response_with_uncertainty(wavelengths_m, response_table, &
      signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
      signal_uncertainty, emissivity_uncertainty, reflected_temperature_uncertainty_k, &
      transmittance_uncertainty, path_temperature_uncertainty_k) result(res)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
        reflected_temperature_uncertainty_k, transmittance_uncertainty, &
        path_temperature_uncertainty_k
    type(relicore_temperature_uncertainty) :: res
    integer(c_int32_t) :: code
    code = table_object_temperature_response_with_uncertainty(wavelengths_m, response_table, &
        signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
        signal_uncertainty, emissivity_uncertainty, reflected_temperature_uncertainty_k, &
        transmittance_uncertainty, path_temperature_uncertainty_k, res)
    if (code /= RELICORE_OK) res = nan_relicore_temperature_uncertainty()
  end function relicore_object_temperature_response_with_uncertainty

  subroutine relicore_object_temperature_response_with_uncertainty_s(wavelengths_m, response_table, &
      signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
      signal_uncertainty, emissivity_uncertainty, reflected_temperature_uncertainty_k, &
      transmittance_uncertainty, path_temperature_uncertainty_k, out, stat)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
        reflected_temperature_uncertainty_k, transmittance_uncertainty, &
        path_temperature_uncertainty_k
    type(relicore_temperature_uncertainty), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_object_temperature_response_with_uncertainty(wavelengths_m, response_table, &
        signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
        signal_uncertainty, emissivity_uncertainty, reflected_temperature_uncertainty_k, &
        transmittance_uncertainty, path_temperature_uncertainty_k, out)
    if (code /= RELICORE_OK) out = nan_relicore_temperature_uncertainty()
    call report(code, 'relicore_object_temperature_response_with_uncertainty', stat)
  end subroutine relicore_object_temperature_response_with_uncertainty_s

  ! Calls relicore_object_temperature_response_with_uncertainty with the table copied to buffers of
  ! at least one element, so that a zero-size table reaches the C library as a valid buffer of
  ! length 0 (which it judges: RELICORE_ERROR_ARRAY_TOO_SHORT), never as a NULL pointer.
  function table_object_temperature_response_with_uncertainty(wavelengths_m, response_table, &
      signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
      signal_uncertainty, emissivity_uncertainty, reflected_temperature_uncertainty_k, &
      transmittance_uncertainty, path_temperature_uncertainty_k, out) result(code)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
        reflected_temperature_uncertainty_k, transmittance_uncertainty, &
        path_temperature_uncertainty_k
    type(relicore_temperature_uncertainty), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_double) :: w(max(1, size(wavelengths_m))), r(max(1, size(response_table)))
    w = 0
    r = 0
    w(1:size(wavelengths_m)) = wavelengths_m
    r(1:size(response_table)) = response_table
    code = c_object_temperature_response_with_uncertainty(w, size(wavelengths_m, kind=c_size_t), r, &
        size(response_table, kind=c_size_t), signal, emissivity, reflected_temperature_k, &
        transmittance, path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
        reflected_temperature_uncertainty_k, transmittance_uncertainty, &
        path_temperature_uncertainty_k, out)
  end function table_object_temperature_response_with_uncertainty

  function relicore_object_temperature_response_with_uncertainty_f32(wavelengths_m, response_table, &
      signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
      signal_uncertainty, emissivity_uncertainty, reflected_temperature_uncertainty_k, &
      transmittance_uncertainty, path_temperature_uncertainty_k) result(res)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
        reflected_temperature_uncertainty_k, transmittance_uncertainty, &
        path_temperature_uncertainty_k
    type(relicore_temperature_uncertainty_f32) :: res
    integer(c_int32_t) :: code
    code = table_object_temperature_response_with_uncertainty_f32(wavelengths_m, response_table, &
        signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
        signal_uncertainty, emissivity_uncertainty, reflected_temperature_uncertainty_k, &
        transmittance_uncertainty, path_temperature_uncertainty_k, res)
    if (code /= RELICORE_OK) res = nan_relicore_temperature_uncertainty_f32()
  end function relicore_object_temperature_response_with_uncertainty_f32

  subroutine relicore_object_temperature_response_with_uncertainty_f32_s(wavelengths_m, &
      response_table, signal, emissivity, reflected_temperature_k, transmittance, &
      path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
      reflected_temperature_uncertainty_k, transmittance_uncertainty, &
      path_temperature_uncertainty_k, out, stat)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
        reflected_temperature_uncertainty_k, transmittance_uncertainty, &
        path_temperature_uncertainty_k
    type(relicore_temperature_uncertainty_f32), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_object_temperature_response_with_uncertainty_f32(wavelengths_m, response_table, &
        signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
        signal_uncertainty, emissivity_uncertainty, reflected_temperature_uncertainty_k, &
        transmittance_uncertainty, path_temperature_uncertainty_k, out)
    if (code /= RELICORE_OK) out = nan_relicore_temperature_uncertainty_f32()
    call report(code, 'relicore_object_temperature_response_with_uncertainty_f32', stat)
  end subroutine relicore_object_temperature_response_with_uncertainty_f32_s

  ! Calls relicore_object_temperature_response_with_uncertainty_f32 with the table copied to buffers
  ! of at least one element, so that a zero-size table reaches the C library as a valid buffer of
  ! length 0 (which it judges: RELICORE_ERROR_ARRAY_TOO_SHORT), never as a NULL pointer.
  function table_object_temperature_response_with_uncertainty_f32(wavelengths_m, response_table, &
      signal, emissivity, reflected_temperature_k, transmittance, path_temperature_k, &
      signal_uncertainty, emissivity_uncertainty, reflected_temperature_uncertainty_k, &
      transmittance_uncertainty, path_temperature_uncertainty_k, out) result(code)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: signal, emissivity, reflected_temperature_k, transmittance, &
        path_temperature_k, signal_uncertainty, emissivity_uncertainty, &
        reflected_temperature_uncertainty_k, transmittance_uncertainty, &
        path_temperature_uncertainty_k
    type(relicore_temperature_uncertainty_f32), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_float) :: w(max(1, size(wavelengths_m))), r(max(1, size(response_table)))
    w = 0
    r = 0
    w(1:size(wavelengths_m)) = wavelengths_m
    r(1:size(response_table)) = response_table
    code = c_object_temperature_response_with_uncertainty_f32(w, size(wavelengths_m, &
        kind=c_size_t), r, size(response_table, kind=c_size_t), signal, emissivity, &
        reflected_temperature_k, transmittance, path_temperature_k, signal_uncertainty, &
        emissivity_uncertainty, reflected_temperature_uncertainty_k, transmittance_uncertainty, &
        path_temperature_uncertainty_k, out)
  end function table_object_temperature_response_with_uncertainty_f32

  ! Temperature derivative of the response-weighted radiance of the table (the shared quadrature).
  ! wavelengths_m(:), response_table(:): the response table (as relicore_response_weighted_radiance)
  ! temperature_k: scalars
  ! Result: W m-2 sr-1 K-1 (times the unit of the response). Forms:
  !   relicore_response_weighted_radiance_temperature_derivative, _s, and the real(c_float) twins
  !   _f32, _f32_s.

  function relicore_response_weighted_radiance_temperature_derivative(wavelengths_m, &
      response_table, temperature_k) result(res)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double) :: res
    integer(c_int32_t) :: code
    code = table_response_weighted_radiance_temperature_derivative(wavelengths_m, response_table, &
        temperature_k, res)
    if (code /= RELICORE_OK) res = nan64()
  end function relicore_response_weighted_radiance_temperature_derivative

  subroutine relicore_response_weighted_radiance_temperature_derivative_s(wavelengths_m, &
      response_table, temperature_k, out, stat)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_response_weighted_radiance_temperature_derivative(wavelengths_m, response_table, &
        temperature_k, out)
    if (code /= RELICORE_OK) out = nan64()
    call report(code, 'relicore_response_weighted_radiance_temperature_derivative', stat)
  end subroutine relicore_response_weighted_radiance_temperature_derivative_s

  ! Calls relicore_response_weighted_radiance_temperature_derivative with the table copied to
  ! buffers of at least one element, so that a zero-size table reaches the C library as a valid
  ! buffer of length 0 (which it judges: RELICORE_ERROR_ARRAY_TOO_SHORT), never as a NULL pointer.
  function table_response_weighted_radiance_temperature_derivative(wavelengths_m, response_table, &
      temperature_k, out) result(code)
    real(c_double), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_double), intent(in) :: temperature_k
    real(c_double), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_double) :: w(max(1, size(wavelengths_m))), r(max(1, size(response_table)))
    w = 0
    r = 0
    w(1:size(wavelengths_m)) = wavelengths_m
    r(1:size(response_table)) = response_table
    code = c_response_weighted_radiance_temperature_derivative(w, size(wavelengths_m, &
        kind=c_size_t), r, size(response_table, kind=c_size_t), temperature_k, out)
  end function table_response_weighted_radiance_temperature_derivative

  function relicore_response_weighted_radiance_temperature_derivative_f32(wavelengths_m, &
      response_table, temperature_k) result(res)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: temperature_k
    real(c_float) :: res
    integer(c_int32_t) :: code
    code = table_response_weighted_radiance_temperature_derivative_f32(wavelengths_m, &
        response_table, temperature_k, res)
    if (code /= RELICORE_OK) res = nan32()
  end function relicore_response_weighted_radiance_temperature_derivative_f32

  subroutine thermometry_f32_2(wavelengths_m, &
      response_table, temperature_k, out, stat)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t), intent(out), optional :: stat
    integer(c_int32_t) :: code
    code = table_response_weighted_radiance_temperature_derivative_f32(wavelengths_m, &
        response_table, temperature_k, out)
    if (code /= RELICORE_OK) out = nan32()
    call report(code, 'relicore_response_weighted_radiance_temperature_derivative_f32', stat)
  end subroutine thermometry_f32_2

  ! Calls relicore_response_weighted_radiance_temperature_derivative_f32 with the table copied to
  ! buffers of at least one element, so that a zero-size table reaches the C library as a valid
  ! buffer of length 0 (which it judges: RELICORE_ERROR_ARRAY_TOO_SHORT), never as a NULL pointer.
  function table_response_weighted_radiance_temperature_derivative_f32(wavelengths_m, &
      response_table, temperature_k, out) result(code)
    real(c_float), intent(in) :: wavelengths_m(:), response_table(:)
    real(c_float), intent(in) :: temperature_k
    real(c_float), intent(out) :: out
    integer(c_int32_t) :: code
    real(c_float) :: w(max(1, size(wavelengths_m))), r(max(1, size(response_table)))
    w = 0
    r = 0
    w(1:size(wavelengths_m)) = wavelengths_m
    r(1:size(response_table)) = response_table
    code = c_response_weighted_radiance_temperature_derivative_f32(w, size(wavelengths_m, &
        kind=c_size_t), r, size(response_table, kind=c_size_t), temperature_k, out)
  end function table_response_weighted_radiance_temperature_derivative_f32

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
