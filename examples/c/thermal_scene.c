/*
 * The relicore demo in C, part 1b: an INVENTED thermal scene (the fictional Glimmerfen Ridge
 * Observatory's workshop seen by a fictional thermal camera through an infrared window) turned
 * into a frame of signals and back into an object-temperature image and a
 * combined-standard-uncertainty image.
 *
 * Usage: thermal_scene [INPUT] [OUT_PREFIX]   (defaults examples/data/invented_thermal_scene.txt,
 * examples/out/thermal_c). Paints the scene's regions onto a width x height frame (integer pixel
 * tests only), computes every pixel's signal with the forward measurement equation
 * (relicore_measured_spectral_radiance_wavelength), turns the frame back into T_obj and u_c with
 * the frame function (relicore_object_temperature_wavelength_with_uncertainty_array: per-pixel
 * emissivity and its uncertainty, the rest shared, passed with length 1), and writes the three
 * images as raw little-endian doubles (row-major, x fastest, y from the top) to
 * OUT_PREFIX_signal.f64, OUT_PREFIX_temperature.f64 and OUT_PREFIX_uncertainty.f64. Prints the
 * region sizes, a summary of the frame and, at each probe pixel, the scalar function's
 * struct relicore_temperature_uncertainty as "key = value" (17 significant digits), after
 * checking that it has the frame pixel's bits. The Rust, Fortran and Python versions do the
 * same; examples/run_demo.sh compares the four outputs and the image files byte for byte.
 *
 * The library allocates nothing; this program owns its image buffers (malloc).
 *
 * Build (from the repository root; examples/run_demo.sh does this):
 *   cargo build -p relicore-capi --profile release-c
 *   cc -std=c11 -Wall -Wextra -Wpedantic -Werror -Iinclude examples/c/thermal_scene.c \
 *      target/release-c/librelicore.a -lm -o build/demo/thermal_scene_c
 */
#define _POSIX_C_SOURCE 200809L /* strtok_r */
#include <errno.h>
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "relicore.h"

#define DEFAULT_INPUT "examples/data/invented_thermal_scene.txt"
#define DEFAULT_PREFIX "examples/out/thermal_c"
#define MAX_REGIONS 64
#define MAX_PROBES 64

/* A surface: region 0 is the background, region k the k-th shape. */
struct region {
    double emissivity, emissivity_uncertainty, temperature_k;
};

/* A shape in integer pixel coordinates: a rectangle x0 <= x < x1, y0 <= y < y1 (a = x0,
 * b = y0, c = x1, d = y1), or a disc (x - a)^2 + (y - b)^2 <= c^2. */
struct shape {
    int is_disc;
    long a, b, c, d;
};

struct scene {
    long width, height;
    double wavelength_m, reflected_temperature_k, transmittance, path_temperature_k;
    double signal_uncertainty, reflected_temperature_uncertainty_k, transmittance_uncertainty,
        path_temperature_uncertainty_k;
    struct region regions[MAX_REGIONS + 1];
    size_t n_regions; /* background included */
    int has_background;
    struct shape shapes[MAX_REGIONS];
    size_t n_shapes;
    long probe_x[MAX_PROBES], probe_y[MAX_PROBES];
    size_t n_probes;
};

static int fail_line(int line_no, const char *message, const char *token) {
    fprintf(stderr, "thermal_scene: line %d: %s%s%s\n", line_no, message, token ? " " : "", token ? token : "");
    return -1;
}

static int next_number(char **cursor, double *value, int line_no) {
    char *token = strtok_r(NULL, " \t\r\n", cursor);
    if (token == NULL) return fail_line(line_no, "missing value", NULL);
    char *end = NULL;
    errno = 0;
    *value = strtod(token, &end);
    if (end == token || *end != '\0' || errno != 0) return fail_line(line_no, "cannot read as a number:", token);
    return 0;
}

static int next_integer(char **cursor, long *value, int line_no) {
    char *token = strtok_r(NULL, " \t\r\n", cursor);
    if (token == NULL) return fail_line(line_no, "missing value", NULL);
    char *end = NULL;
    errno = 0;
    *value = strtol(token, &end, 10);
    if (end == token || *end != '\0' || errno != 0) return fail_line(line_no, "cannot read as an integer:", token);
    return 0;
}

/* Emissivity, its uncertainty, the temperature and the name (which only the plot uses). */
static int read_region(char **cursor, struct region *r, int line_no) {
    if (next_number(cursor, &r->emissivity, line_no) != 0) return -1;
    if (next_number(cursor, &r->emissivity_uncertainty, line_no) != 0) return -1;
    if (next_number(cursor, &r->temperature_k, line_no) != 0) return -1;
    if (strtok_r(NULL, " \t\r\n", cursor) == NULL) return fail_line(line_no, "missing name", NULL);
    return 0;
}

static int read_scene(const char *path, struct scene *s) {
    FILE *f = fopen(path, "r");
    if (f == NULL) {
        fprintf(stderr, "thermal_scene: cannot open %s\n", path);
        return -1;
    }
    memset(s, 0, sizeof *s);
    s->n_regions = 1;
    char line[512];
    int line_no = 0, rc = 0;
    while (rc == 0 && fgets(line, sizeof line, f) != NULL) {
        ++line_no;
        char *cursor = NULL;
        char *key = strtok_r(line, " \t\r\n", &cursor);
        if (key == NULL || key[0] == '#') continue;
        if (strcmp(key, "image_width_px") == 0) {
            rc = next_integer(&cursor, &s->width, line_no);
        } else if (strcmp(key, "image_height_px") == 0) {
            rc = next_integer(&cursor, &s->height, line_no);
        } else if (strcmp(key, "camera_wavelength_m") == 0) {
            rc = next_number(&cursor, &s->wavelength_m, line_no);
        } else if (strcmp(key, "reflected_temperature_k") == 0) {
            rc = next_number(&cursor, &s->reflected_temperature_k, line_no);
        } else if (strcmp(key, "window_transmittance") == 0) {
            rc = next_number(&cursor, &s->transmittance, line_no);
        } else if (strcmp(key, "window_temperature_k") == 0) {
            rc = next_number(&cursor, &s->path_temperature_k, line_no);
        } else if (strcmp(key, "signal_uncertainty_w_m2_sr_m") == 0) {
            rc = next_number(&cursor, &s->signal_uncertainty, line_no);
        } else if (strcmp(key, "reflected_temperature_uncertainty_k") == 0) {
            rc = next_number(&cursor, &s->reflected_temperature_uncertainty_k, line_no);
        } else if (strcmp(key, "window_transmittance_uncertainty") == 0) {
            rc = next_number(&cursor, &s->transmittance_uncertainty, line_no);
        } else if (strcmp(key, "window_temperature_uncertainty_k") == 0) {
            rc = next_number(&cursor, &s->path_temperature_uncertainty_k, line_no);
        } else if (strcmp(key, "background") == 0) {
            rc = read_region(&cursor, &s->regions[0], line_no);
            s->has_background = 1;
        } else if (strcmp(key, "rectangle") == 0 || strcmp(key, "disc") == 0) {
            if (s->n_shapes >= MAX_REGIONS) {
                rc = fail_line(line_no, "too many shapes", NULL);
                break;
            }
            struct shape *sh = &s->shapes[s->n_shapes];
            sh->is_disc = strcmp(key, "disc") == 0;
            rc = next_integer(&cursor, &sh->a, line_no);
            if (rc == 0) rc = next_integer(&cursor, &sh->b, line_no);
            if (rc == 0) rc = next_integer(&cursor, &sh->c, line_no);
            if (rc == 0 && !sh->is_disc) rc = next_integer(&cursor, &sh->d, line_no);
            if (rc == 0) rc = read_region(&cursor, &s->regions[s->n_shapes + 1], line_no);
            s->n_shapes++;
            s->n_regions = s->n_shapes + 1;
        } else if (strcmp(key, "probe") == 0) {
            if (s->n_probes >= MAX_PROBES) {
                rc = fail_line(line_no, "too many probes", NULL);
                break;
            }
            rc = next_integer(&cursor, &s->probe_x[s->n_probes], line_no);
            if (rc == 0) rc = next_integer(&cursor, &s->probe_y[s->n_probes], line_no);
            s->n_probes++;
        } else {
            rc = fail_line(line_no, "unknown key", key);
        }
        if (rc == 0 && strtok_r(NULL, " \t\r\n", &cursor) != NULL) rc = fail_line(line_no, "unexpected extra value", NULL);
    }
    fclose(f);
    if (rc != 0) return rc;
    if (!s->has_background) {
        fprintf(stderr, "thermal_scene: no background line\n");
        return -1;
    }
    if (s->width <= 0 || s->height <= 0) {
        fprintf(stderr, "thermal_scene: the frame needs image_width_px and image_height_px\n");
        return -1;
    }
    for (size_t p = 0; p < s->n_probes; ++p) {
        if (s->probe_x[p] < 0 || s->probe_x[p] >= s->width || s->probe_y[p] < 0 || s->probe_y[p] >= s->height) {
            fprintf(stderr, "thermal_scene: a probe lies outside the frame\n");
            return -1;
        }
    }
    return 0;
}

/* Stops with relicore's message when a call failed. */
static void check(int32_t status, const char *what) {
    if (status != RELICORE_OK) {
        fprintf(stderr, "thermal_scene: %s: %s (status %d)\n", what, relicore_status_message(status), (int)status);
        exit(EXIT_FAILURE);
    }
}

static void print(const char *key, double value) { printf("%s = %.16e\n", key, value); }

static void print_indexed(const char *prefix, size_t n, const char *suffix, double value) {
    char key[128];
    snprintf(key, sizeof key, "%s_%zu_%s", prefix, n, suffix);
    print(key, value);
}

static uint64_t bits(double x) {
    uint64_t u;
    memcpy(&u, &x, sizeof u);
    return u;
}

/* Writes an image as raw little-endian doubles, whatever the byte order of the machine. */
static void write_image(const char *prefix, const char *suffix, const double *image, size_t n) {
    char path[1024];
    snprintf(path, sizeof path, "%s_%s.f64", prefix, suffix);
    FILE *f = fopen(path, "wb");
    if (f == NULL) {
        fprintf(stderr, "thermal_scene: cannot write %s\n", path);
        exit(EXIT_FAILURE);
    }
    for (size_t i = 0; i < n; ++i) {
        unsigned char b[8];
        uint64_t u = bits(image[i]);
        for (int k = 0; k < 8; ++k) b[k] = (unsigned char)(u >> (8 * k));
        if (fwrite(b, 1, 8, f) != 8) {
            fprintf(stderr, "thermal_scene: cannot write %s\n", path);
            exit(EXIT_FAILURE);
        }
    }
    if (fclose(f) != 0) {
        fprintf(stderr, "thermal_scene: cannot write %s\n", path);
        exit(EXIT_FAILURE);
    }
}

static double *image(size_t n) {
    double *p = malloc(n * sizeof *p);
    if (p == NULL) {
        fprintf(stderr, "thermal_scene: out of memory\n");
        exit(EXIT_FAILURE);
    }
    return p;
}

int main(int argc, char **argv) {
    const char *path = argc > 1 ? argv[1] : DEFAULT_INPUT;
    const char *prefix = argc > 2 ? argv[2] : DEFAULT_PREFIX;
    static struct scene s;
    if (read_scene(path, &s) != 0) return EXIT_FAILURE;
    const size_t w = (size_t)s.width, h = (size_t)s.height, n = w * h;
    printf("# relicore thermal-scene demo (C) -- INVENTED SCENE from %s\n", path);
    printf("# fictional Glimmerfen Ridge Observatory workshop; no real camera or measurement\n");

    /* The scene, pixel by pixel: region (shapes painted in file order), emissivity and its
     * uncertainty, temperature. */
    size_t *map = calloc(n, sizeof *map);
    if (map == NULL) {
        fprintf(stderr, "thermal_scene: out of memory\n");
        return EXIT_FAILURE;
    }
    for (size_t k = 0; k < s.n_shapes; ++k) {
        const struct shape *sh = &s.shapes[k];
        for (long y = 0; y < s.height; ++y) {
            for (long x = 0; x < s.width; ++x) {
                int inside = sh->is_disc ? (x - sh->a) * (x - sh->a) + (y - sh->b) * (y - sh->b) <= sh->c * sh->c
                                         : sh->a <= x && x < sh->c && sh->b <= y && y < sh->d;
                if (inside) map[(size_t)y * w + (size_t)x] = k + 1;
            }
        }
    }
    double *emissivity = image(n), *emissivity_u = image(n), *scene_t = image(n);
    double *signals = image(n), *t_obj = image(n), *u_c = image(n);
    for (size_t i = 0; i < n; ++i) {
        emissivity[i] = s.regions[map[i]].emissivity;
        emissivity_u[i] = s.regions[map[i]].emissivity_uncertainty;
        scene_t[i] = s.regions[map[i]].temperature_k;
    }

    /* The frame of signals, by the forward measurement equation at every pixel. */
    for (size_t i = 0; i < n; ++i) {
        check(relicore_measured_spectral_radiance_wavelength(s.wavelength_m, scene_t[i], emissivity[i],
                                                             s.reflected_temperature_k, s.transmittance,
                                                             s.path_temperature_k, &signals[i]),
              "relicore_measured_spectral_radiance_wavelength");
    }

    /* Back to object temperature and u_c with the frame function (shared values: length 1). */
    check(relicore_object_temperature_wavelength_with_uncertainty_array(
              s.wavelength_m, signals, n, emissivity, n, &s.reflected_temperature_k, 1, &s.transmittance, 1,
              &s.path_temperature_k, 1, &s.signal_uncertainty, 1, emissivity_u, n,
              &s.reflected_temperature_uncertainty_k, 1, &s.transmittance_uncertainty, 1,
              &s.path_temperature_uncertainty_k, 1, t_obj, u_c),
          "relicore_object_temperature_wavelength_with_uncertainty_array");

    for (size_t k = 0; k < s.n_regions; ++k) {
        size_t count = 0;
        for (size_t i = 0; i < n; ++i) count += map[i] == k;
        print_indexed("region", k, "pixels", (double)count);
    }
    print("frame_pixels", (double)n);
    double smin = INFINITY, smax = -INFINITY, tmin = INFINITY, tmax = -INFINITY;
    double umin = INFINITY, umax = -INFINITY, round_trip = 0.0;
    for (size_t i = 0; i < n; ++i) {
        smin = fmin(smin, signals[i]);
        smax = fmax(smax, signals[i]);
        tmin = fmin(tmin, t_obj[i]);
        tmax = fmax(tmax, t_obj[i]);
        umin = fmin(umin, u_c[i]);
        umax = fmax(umax, u_c[i]);
        round_trip = fmax(round_trip, fabs(t_obj[i] - scene_t[i]));
    }
    print("frame_signal_min_w_m2_sr_m", smin);
    print("frame_signal_max_w_m2_sr_m", smax);
    print("frame_temperature_min_k", tmin);
    print("frame_temperature_max_k", tmax);
    print("frame_uncertainty_min_k", umin);
    print("frame_uncertainty_max_k", umax);
    print("frame_max_abs_round_trip_error_k", round_trip);

    /* The scalar function's full result at each probe pixel, with the frame's bits. */
    static const char *const names[5] = {"signal_k_per_w_m2_sr_m", "emissivity_k", "reflected_temperature_k_per_k",
                                         "transmittance_k", "window_temperature_k_per_k"};
    for (size_t p = 0; p < s.n_probes; ++p) {
        const size_t i = (size_t)s.probe_y[p] * w + (size_t)s.probe_x[p];
        struct relicore_temperature_uncertainty r;
        check(relicore_object_temperature_wavelength_with_uncertainty(
                  s.wavelength_m, signals[i], emissivity[i], s.reflected_temperature_k, s.transmittance,
                  s.path_temperature_k, s.signal_uncertainty, emissivity_u[i], s.reflected_temperature_uncertainty_k,
                  s.transmittance_uncertainty, s.path_temperature_uncertainty_k, &r),
              "relicore_object_temperature_wavelength_with_uncertainty");
        if (bits(r.temperature_k) != bits(t_obj[i]) || bits(r.combined_standard_uncertainty_k) != bits(u_c[i])) {
            fprintf(stderr, "thermal_scene: probe %zu: the frame pixel differs from the scalar result\n", p + 1);
            return EXIT_FAILURE;
        }
        print_indexed("probe", p + 1, "region", (double)map[i]);
        print_indexed("probe", p + 1, "signal_w_m2_sr_m", signals[i]);
        print_indexed("probe", p + 1, "temperature_k", r.temperature_k);
        print_indexed("probe", p + 1, "combined_standard_uncertainty_k", r.combined_standard_uncertainty_k);
        for (uint32_t c = 0; c < r.inputs && c < 5; ++c) {
            char suffix[96];
            snprintf(suffix, sizeof suffix, "sensitivity_%s", names[c]);
            print_indexed("probe", p + 1, suffix, r.sensitivity_coefficients[c]);
        }
    }

    write_image(prefix, "signal", signals, n);
    write_image(prefix, "temperature", t_obj, n);
    write_image(prefix, "uncertainty", u_c, n);
    free(map);
    free(emissivity);
    free(emissivity_u);
    free(scene_t);
    free(signals);
    free(t_obj);
    free(u_c);
    return EXIT_SUCCESS;
}
