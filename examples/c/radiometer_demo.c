/*
 * The relicore demo in C: a fictional observatory's balloon radiometer and a fictional
 * handheld infrared thermometer, from INVENTED data.
 *
 * Reads examples/data/invented_radiometer.txt (or the path given as the first argument) and
 * prints every computed quantity as "key = value" with 17 significant digits. The Rust,
 * Fortran and Python versions read the same file and print the same keys;
 * examples/run_demo.sh compares the four outputs. Every number is computed by relicore; this
 * program only reads, calls and prints.
 *
 * Build (from the repository root; examples/run_demo.sh does this):
 *   cargo build -p relicore-capi --profile release-c
 *   cc -std=c11 -Wall -Wextra -Wpedantic -Werror -Iinclude examples/c/radiometer_demo.c \
 *      target/release-c/librelicore.a -lm -o build/demo/radiometer_demo_c
 */
#define _POSIX_C_SOURCE 200809L /* strtok_r */
#include <errno.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "relicore.h"

#define DEFAULT_INPUT "examples/data/invented_radiometer.txt"
#define MAX_LIST 64

/* The demo inputs, as read from the data file (lists have a fixed capacity; no heap). */
struct inputs {
    double frequency_hz;
    double hot_temperature_k, hot_reading_v;
    double cold_temperature_k, cold_reading_v;
    double sky_readings_v[MAX_LIST];
    size_t n_sky;
    double cmb_temperature_k;
    double band_lower_m, band_upper_m;
    double response_wavelengths_m[MAX_LIST], response[MAX_LIST];
    size_t n_response;
    double check_temperature_k;
    double thermometer_readings_w_m2_sr[MAX_LIST];
    size_t n_thermometer;
    double curve_temperatures_k[MAX_LIST];
    size_t n_curves;
};

/* Reads one number from the next whitespace-separated token of the line; 0 on success. */
static int next_number(char **cursor, double *value, int line_no) {
    char *token = strtok_r(NULL, " \t\r\n", cursor);
    if (token == NULL) {
        fprintf(stderr, "radiometer_demo: line %d: missing value\n", line_no);
        return -1;
    }
    char *end = NULL;
    errno = 0;
    *value = strtod(token, &end);
    if (end == token || *end != '\0' || errno != 0) {
        fprintf(stderr, "radiometer_demo: line %d: cannot read \"%s\" as a number\n", line_no, token);
        return -1;
    }
    return 0;
}

static int append(double *list, size_t *n, double value, int line_no) {
    if (*n >= MAX_LIST) {
        fprintf(stderr, "radiometer_demo: line %d: more than %d entries in a list\n", line_no, MAX_LIST);
        return -1;
    }
    list[(*n)++] = value;
    return 0;
}

static int read_inputs(const char *path, struct inputs *inp) {
    FILE *f = fopen(path, "r");
    if (f == NULL) {
        fprintf(stderr, "radiometer_demo: cannot open %s\n", path);
        return -1;
    }
    memset(inp, 0, sizeof *inp);
    char line[512];
    int line_no = 0;
    int rc = 0;
    while (rc == 0 && fgets(line, sizeof line, f) != NULL) {
        ++line_no;
        char *cursor = NULL;
        char *key = strtok_r(line, " \t\r\n", &cursor);
        if (key == NULL || key[0] == '#') {
            continue;
        }
        double v = 0.0, v2 = 0.0;
        if (next_number(&cursor, &v, line_no) != 0) {
            rc = -1;
            break;
        }
        if (strcmp(key, "radiometer_frequency_hz") == 0) {
            inp->frequency_hz = v;
        } else if (strcmp(key, "hot_load_temperature_k") == 0) {
            inp->hot_temperature_k = v;
        } else if (strcmp(key, "hot_load_reading_v") == 0) {
            inp->hot_reading_v = v;
        } else if (strcmp(key, "cold_load_temperature_k") == 0) {
            inp->cold_temperature_k = v;
        } else if (strcmp(key, "cold_load_reading_v") == 0) {
            inp->cold_reading_v = v;
        } else if (strcmp(key, "sky_reading_v") == 0) {
            rc = append(inp->sky_readings_v, &inp->n_sky, v, line_no);
        } else if (strcmp(key, "cmb_temperature_k") == 0) {
            inp->cmb_temperature_k = v;
        } else if (strcmp(key, "thermometer_band_lower_m") == 0) {
            inp->band_lower_m = v;
        } else if (strcmp(key, "thermometer_band_upper_m") == 0) {
            inp->band_upper_m = v;
        } else if (strcmp(key, "thermometer_response") == 0) {
            size_t n = inp->n_response;
            rc = next_number(&cursor, &v2, line_no);
            if (rc == 0) rc = append(inp->response_wavelengths_m, &n, v, line_no);
            if (rc == 0) rc = append(inp->response, &inp->n_response, v2, line_no);
        } else if (strcmp(key, "thermometer_check_temperature_k") == 0) {
            inp->check_temperature_k = v;
        } else if (strcmp(key, "thermometer_reading_w_m2_sr") == 0) {
            rc = append(inp->thermometer_readings_w_m2_sr, &inp->n_thermometer, v, line_no);
        } else if (strcmp(key, "curve_temperature_k") == 0) {
            rc = append(inp->curve_temperatures_k, &inp->n_curves, v, line_no);
        } else {
            fprintf(stderr, "radiometer_demo: line %d: unknown key \"%s\"\n", line_no, key);
            rc = -1;
        }
        if (rc == 0 && strtok_r(NULL, " \t\r\n", &cursor) != NULL) {
            fprintf(stderr, "radiometer_demo: line %d: unexpected extra value\n", line_no);
            rc = -1;
        }
    }
    fclose(f);
    return rc;
}

/* Stops with relicore's message when a call failed. */
static void check(int32_t status, const char *what) {
    if (status != RELICORE_OK) {
        fprintf(stderr, "radiometer_demo: %s: %s (status %d)\n", what, relicore_status_message(status),
                (int)status);
        exit(EXIT_FAILURE);
    }
}

static void print(const char *key, double value) { printf("%s = %.16e\n", key, value); }

static void print_indexed(const char *prefix, size_t n, const char *suffix, double value) {
    char key[128];
    snprintf(key, sizeof key, "%s_%zu_%s", prefix, n, suffix);
    print(key, value);
}

int main(int argc, char **argv) {
    const char *path = argc > 1 ? argv[1] : DEFAULT_INPUT;
    struct inputs inp;
    if (read_inputs(path, &inp) != 0) {
        return EXIT_FAILURE;
    }
    printf("# relicore radiometer demo (C) -- INVENTED DATA from %s\n", path);
    printf("# fictional Glimmerfen Ridge Observatory; no real instrument or measurement\n");

    /* Part 1: the balloon radiometer. */
    const double nu = inp.frequency_hz;
    struct relicore_two_load_calibration cal;
    check(relicore_two_load_calibration(nu, inp.hot_reading_v, inp.hot_temperature_k, inp.cold_reading_v,
                                        inp.cold_temperature_k, &cal),
          "relicore_two_load_calibration");
    print("calibration_gain_v_per_k", cal.gain);
    print("calibration_offset_v", cal.offset);
    double b_hot, t_hot, j_hot, j_cold;
    check(relicore_spectral_radiance_frequency(nu, inp.hot_temperature_k, &b_hot),
          "relicore_spectral_radiance_frequency");
    print("hot_load_spectral_radiance_w_m2_sr_hz", b_hot);
    check(relicore_brightness_temperature_frequency(nu, b_hot, &t_hot), "relicore_brightness_temperature_frequency");
    print("hot_load_brightness_temperature_k", t_hot);
    check(relicore_calibrated_brightness_temperature(&cal, inp.hot_reading_v, &j_hot),
          "relicore_calibrated_brightness_temperature");
    print("hot_load_rayleigh_jeans_temperature_k", j_hot);
    check(relicore_calibrated_brightness_temperature(&cal, inp.cold_reading_v, &j_cold),
          "relicore_calibrated_brightness_temperature");
    print("cold_load_rayleigh_jeans_temperature_k", j_cold);
    for (size_t i = 0; i < inp.n_sky; ++i) {
        double j, t;
        check(relicore_calibrated_brightness_temperature(&cal, inp.sky_readings_v[i], &j),
              "relicore_calibrated_brightness_temperature");
        print_indexed("sky", i + 1, "rayleigh_jeans_temperature_k", j);
        check(relicore_calibrated_temperature(&cal, inp.sky_readings_v[i], &t), "relicore_calibrated_temperature");
        print_indexed("sky", i + 1, "physical_temperature_k", t);
    }
    double factor;
    check(relicore_thermodynamic_to_rayleigh_jeans_factor(nu, inp.cmb_temperature_k, &factor),
          "relicore_thermodynamic_to_rayleigh_jeans_factor");
    print("cmb_thermodynamic_to_rayleigh_jeans_factor", factor);

    /* Part 2: the handheld infrared thermometer. */
    double check_radiance;
    check(relicore_response_weighted_radiance(inp.response_wavelengths_m, inp.n_response, inp.response,
                                              inp.n_response, inp.check_temperature_k, &check_radiance),
          "relicore_response_weighted_radiance");
    print("thermometer_check_radiance_w_m2_sr", check_radiance);
    for (size_t i = 0; i < inp.n_thermometer; ++i) {
        double t, band;
        check(relicore_temperature_from_response_weighted_radiance(inp.response_wavelengths_m, inp.n_response,
                                                                   inp.response, inp.n_response,
                                                                   inp.thermometer_readings_w_m2_sr[i], &t),
              "relicore_temperature_from_response_weighted_radiance");
        print_indexed("target", i + 1, "temperature_k", t);
        check(relicore_band_radiance_wavelength(inp.band_lower_m, inp.band_upper_m, t, &band),
              "relicore_band_radiance_wavelength");
        print_indexed("target", i + 1, "band_radiance_w_m2_sr", band);
    }

    /* Blackbody curves: the peaks the plot marks. */
    for (size_t i = 0; i < inp.n_curves; ++i) {
        double peak, b;
        check(relicore_peak_wavelength(inp.curve_temperatures_k[i], &peak), "relicore_peak_wavelength");
        print_indexed("curve", i + 1, "peak_wavelength_m", peak);
        check(relicore_spectral_radiance_wavelength(peak, inp.curve_temperatures_k[i], &b),
              "relicore_spectral_radiance_wavelength");
        print_indexed("curve", i + 1, "peak_spectral_radiance_w_m2_sr_m", b);
    }
    return EXIT_SUCCESS;
}
