/*
 * Firmware-style use of relicore: every float form of the table (from tests/c/gen_functions.h),
 * single-precision scalar functions, the two-load calibration
 * (float and double), the float response functions and the float array forms, and a universe
 * (built in static storage) with scalar, array, constant and inverse calls, with every other
 * buffer on the stack, and the decoupling functions with a thermal history in static storage.
 * tests/c/run.sh links it against librelicore.a with -Wl,--gc-sections
 * and checks that the executable needs no malloc, calloc, realloc or free.
 * Uses no stdio; the exit status is the number of calls that did not succeed as expected.
 */

#include <math.h>
#include <stddef.h>
#include <stdint.h>

#include "gen_functions.h"
#include "relicore.h"

static int bad(int32_t status, float value)
{
    return status != RELICORE_OK || !isfinite(value);
}

/* 1 unless the status is 0 or a documented error code (never PANIC) */
static int undocumented(int32_t status)
{
    return !(status <= 0 && status >= RELICORE_ERROR_CAPACITY_TOO_SMALL
             && status != RELICORE_ERROR_PANIC);
}

/* Every float form of the table (the lists of tests/c/gen_functions.h), so that each is linked
 * in and none may pull in an allocator: called with arguments 1 (whatever the status, as long
 * as it is a documented one) and, for the array forms, a four-element stack buffer. */
#define ONES_1 1.0f
#define ONES_2 1.0f, 1.0f
#define ONES_3 1.0f, 1.0f, 1.0f
#define ONES_4 1.0f, 1.0f, 1.0f, 1.0f
#define CALL_F32(n, k, domain, upper, array) \
    failures += undocumented(relicore_##n##_f32(ONES_##k, &v));
#define ARRAY_F32_0(n) relicore_##n##_array_f32(xs, 4, 1.0f, ys)
#define ARRAY_F32_1(n) relicore_##n##_array_f32(1.0f, xs, 4, ys)
#define CALL_ARRAY_F32(n, k, pos) failures += undocumented(ARRAY_F32_##pos(n));
static int every_float_form(void)
{
    int failures = 0;
    float v = 0.0f;
    const float xs[4] = { 0.5f, 1.0f, 2.0f, 4.0f };
    float ys[4];
    RELICORE_BLACKBODY_SCALARS_F32(CALL_F32)
    RELICORE_COSMOLOGY_SCALARS_F32(CALL_F32)
    RELICORE_DECOUPLING_SCALARS_F32(CALL_F32)
    RELICORE_BLACKBODY_ARRAYS_F32(CALL_ARRAY_F32)
    RELICORE_COSMOLOGY_ARRAYS_F32(CALL_ARRAY_F32)
    RELICORE_DECOUPLING_ARRAYS_F32(CALL_ARRAY_F32)
    return failures;
}

int main(void)
{
    int failures = every_float_form();
    float v = 0.0f;

    failures += bad(relicore_spectral_radiance_wavelength_f32(10e-6f, 300.0f, &v), v);
    failures += bad(relicore_spectral_radiance_frequency_f32(30e12f, 300.0f, &v), v);
    failures += bad(relicore_spectral_radiance_wavenumber_f32(1e5f, 300.0f, &v), v);
    float radiance = v;
    failures += bad(relicore_brightness_temperature_wavelength_f32(10e-6f, 9.0f, &v), v);
    failures += bad(relicore_brightness_temperature_frequency_f32(30e12f, 1e-11f, &v), v);
    failures += bad(relicore_band_radiance_wavelength_f32(8e-6f, 14e-6f, 300.0f, &v), v);
    (void)radiance;

    /* two-load calibration of a 90 GHz channel, then a scene reading */
    struct relicore_two_load_calibration_f32 cal32;
    failures += relicore_two_load_calibration_f32(90e9f, 2.0f, 300.0f, 1.0f, 77.0f, &cal32)
                != RELICORE_OK;
    failures += bad(relicore_calibrated_temperature_f32(&cal32, 1.5f, &v), v);
    failures += bad(relicore_calibrated_brightness_temperature_f32(&cal32, 1.5f, &v), v);
    struct relicore_two_load_calibration cal;
    double t = 0.0;
    failures += relicore_two_load_calibration(90e9, 2.0, 300.0, 1.0, 77.0, &cal) != RELICORE_OK;
    failures += bad(relicore_calibrated_temperature(&cal, 1.5, &t), (float)t);
    failures += bad(relicore_calibrated_brightness_temperature(&cal, 1.5, &t), (float)t);

    /* an infrared thermometer: 8-14 um response table */
    const float wl[5] = { 8e-6f, 9.5e-6f, 11e-6f, 12.5e-6f, 14e-6f };
    const float rs[5] = { 0.1f, 0.9f, 1.0f, 0.9f, 0.1f };
    float lr = 0.0f;
    failures += bad(relicore_response_weighted_radiance_f32(wl, 5, rs, 5, 310.0f, &lr), lr);
    failures += bad(relicore_temperature_from_response_weighted_radiance_f32(wl, 5, rs, 5, lr, &v),
                    v);

    /* array forms */
    float x[8], out[8];
    for (int i = 0; i < 8; i++) {
        x[i] = 2e-6f * (float)(i + 1);
    }
    failures += relicore_spectral_radiance_wavelength_array_f32(x, 8, 300.0f, out) != RELICORE_OK;
    for (int i = 0; i < 8; i++) {
        x[i] = 1e12f * (float)(i + 1);
    }
    failures += relicore_spectral_radiance_frequency_array_f32(x, 8, 300.0f, out) != RELICORE_OK;
    for (int i = 0; i < 8; i++) {
        x[i] = 1e4f * (float)(i + 1);
    }
    failures += relicore_spectral_radiance_wavenumber_array_f32(x, 8, 300.0f, out) != RELICORE_OK;
    for (int i = 0; i < 8; i++) {
        failures += !isfinite(out[i]);
    }
    /* a universe: caller-owned storage, built once, then distances, times and an inverse */
    static struct relicore_universe universe;
    struct relicore_universe_parameters params;
    failures += relicore_universe_parameters_default(67.0, 0.32, &params) != RELICORE_OK;
    params.neutrino_masses_ev[0] = 0.06;
    failures += relicore_universe_init(&params, &universe) != RELICORE_OK;
    double d = 0.0, z[8], dz[8];
    failures += bad(relicore_luminosity_distance_mpc(&universe, 1.0, &d), (float)d);
    failures += bad(relicore_age_gyr(&universe, 0.0, &d), (float)d);
    failures += bad(relicore_redshift_at_age_gyr(&universe, 0.5 * d, &d), (float)d);
    failures += bad(relicore_hubble_time_gyr(&universe, &d), (float)d);
    for (int i = 0; i < 8; i++) {
        z[i] = 0.5 * (double)i;
    }
    failures += relicore_comoving_distance_mpc_array(&universe, z, 8, dz) != RELICORE_OK;
    failures += !isfinite(dz[7]);
    int32_t which = 0;
    params.h0_km_s_mpc = -1.0;
    failures += relicore_universe_check_parameters(&params, &which)
                != RELICORE_ERROR_INVALID_PARAMETER;
    failures += which != 0;

    /* decoupling: Saha, a fit, and a thermal history in static storage (163848 bytes) */
    static struct relicore_universe with_baryons;
    params.h0_km_s_mpc = 67.0;
    params.omega_baryon = 0.049;
    failures += relicore_universe_init(&params, &with_baryons) != RELICORE_OK;
    failures += bad(relicore_saha_ionized_fraction(&with_baryons, 1400.0, &d), (float)d);
    failures += bad(relicore_drag_redshift_fit(0.0224, 0.143, &d), (float)d);
    static struct relicore_thermal_history history;
    struct relicore_thermal_history_options options;
    failures += relicore_thermal_history_options_default(&options) != RELICORE_OK;
    options.reionization = 1;
    options.reionization_redshift = 7.7;
    failures += relicore_thermal_history_compute(&with_baryons, &options, &history) != RELICORE_OK;
    failures += bad(relicore_last_scattering_redshift(&history, &d), (float)d);
    failures += bad(relicore_visibility(&history, d, &d), (float)d);
    for (int i = 0; i < 8; i++) {
        z[i] = 200.0 * (double)i;
    }
    failures += relicore_ionized_fraction_array(&history, z, 8, dz) != RELICORE_OK;
    failures += !isfinite(dz[7]);
    options.highest_redshift = 2e4;
    failures += relicore_thermal_history_compute(&with_baryons, &options, &history)
                != RELICORE_ERROR_CAPACITY_TOO_SMALL;

    /* a failing call still allocates nothing */
    failures += relicore_spectral_radiance_wavelength_f32(-1.0f, 300.0f, &v)
                != RELICORE_ERROR_NON_POSITIVE;
    return failures;
}
