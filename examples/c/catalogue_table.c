/*
 * The relicore demo, part 2, in C: the table of the INVENTED Quillmere Deep Field Survey's
 * follow-up objects (per object: luminosity distance, distance modulus, apparent magnitude,
 * half-light radius as an angle, lookback time, age of the universe when the light left).
 *
 * Reads examples/data/invented_catalogue.txt (or the path given as the first argument) and
 * prints every computed quantity as "key = value" with 17 significant digits. The Rust,
 * Fortran and Python versions read the same file and print the same keys;
 * examples/run_demo.sh compares the four outputs. Every number is computed by relicore; this
 * program only reads, calls and prints. The universe lives in caller-owned storage (a static
 * struct relicore_universe): nothing is allocated.
 *
 * Build (from the repository root; examples/run_demo.sh does this):
 *   cargo build -p relicore-capi --profile release-c
 *   cc -std=c11 -Wall -Wextra -Wpedantic -Werror -Iinclude examples/c/catalogue_table.c \
 *      target/release-c/librelicore.a -lm -o build/demo/catalogue_table_c
 */
#define _POSIX_C_SOURCE 200809L /* strtok_r */
#include <errno.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "relicore.h"

#define DEFAULT_INPUT "examples/data/invented_catalogue.txt"
#define MAX_LIST 64

struct inputs {
    struct relicore_universe_parameters params;
    int given[10]; /* how often each universe_ key was given (masses: three times) */
    /* the follow-up objects: redshift, absolute magnitude, half-light radius (kpc) */
    double objects[3][MAX_LIST];
    size_t n_objects[3];
};

static const char *const OBJECT_KEYS[3] = {
    "object_redshift",
    "object_absolute_magnitude",
    "object_half_light_radius_kpc",
};

static const char *const UNIVERSE_KEYS[10] = {
    "universe_h0_km_s_mpc",      "universe_omega_matter",      "universe_omega_baryon",
    "universe_omega_curvature",  "universe_cmb_temperature_k", "universe_n_eff",
    "universe_neutrino_mass_ev", "universe_w0",                "universe_wa",
    "universe_helium_mass_fraction",
};

static int append(double *list, size_t *n, double value, int line_no) {
    if (*n >= MAX_LIST) {
        fprintf(stderr, "catalogue_table: line %d: more than %d entries in a list\n", line_no, MAX_LIST);
        return -1;
    }
    list[(*n)++] = value;
    return 0;
}

/* Stores parameter `which` (the position of UNIVERSE_KEYS); -1 when given too often. */
static int store(struct inputs *inp, int which, double v) {
    struct relicore_universe_parameters *p = &inp->params;
    int n = inp->given[which]++;
    if (which == 6) {
        if (n >= 3) return -1;
        p->neutrino_masses_ev[n] = v;
        return 0;
    }
    if (n >= 1) return -1;
    switch (which) {
    case 0: p->h0_km_s_mpc = v; break;
    case 1: p->omega_matter = v; break;
    case 2: p->omega_baryon = v; break;
    case 3: p->omega_curvature = v; break;
    case 4: p->cmb_temperature_k = v; break;
    case 5: p->n_eff = v; break;
    case 7: p->w0 = v; break;
    case 8: p->wa = v; break;
    default: p->helium_mass_fraction = v; break;
    }
    return 0;
}

static int read_inputs(const char *path, struct inputs *inp) {
    FILE *f = fopen(path, "r");
    if (f == NULL) {
        fprintf(stderr, "catalogue_table: cannot open %s\n", path);
        return -1;
    }
    memset(inp, 0, sizeof *inp);
    char line[512];
    int line_no = 0;
    int status = 0;
    while (status == 0 && fgets(line, sizeof line, f) != NULL) {
        line_no++;
        char *cursor = NULL;
        char *key = strtok_r(line, " \t\r\n", &cursor);
        if (key == NULL || key[0] == '#') continue;
        if (strncmp(key, "catalogue_", 10) == 0) continue; /* the Python catalogue demo's keys */
        char *token = strtok_r(NULL, " \t\r\n", &cursor);
        if (token == NULL || strtok_r(NULL, " \t\r\n", &cursor) != NULL) {
            fprintf(stderr, "catalogue_table: line %d: want \"key value\"\n", line_no);
            status = -1;
            break;
        }
        char *end = NULL;
        errno = 0;
        double v = strtod(token, &end);
        if (end == token || *end != '\0' || errno != 0) {
            fprintf(stderr, "catalogue_table: line %d: cannot read \"%s\" as a number\n", line_no, token);
            status = -1;
            break;
        }
        int which = -1, object = -1;
        for (int k = 0; k < 10; k++) {
            if (strcmp(key, UNIVERSE_KEYS[k]) == 0) which = k;
        }
        for (int k = 0; k < 3; k++) {
            if (strcmp(key, OBJECT_KEYS[k]) == 0) object = k;
        }
        if (which >= 0) {
            if (store(inp, which, v) != 0) {
                fprintf(stderr, "catalogue_table: line %d: %s given too often\n", line_no, key);
                status = -1;
            }
        } else if (object >= 0) {
            status = append(inp->objects[object], &inp->n_objects[object], v, line_no);
        } else {
            fprintf(stderr, "catalogue_table: line %d: unknown key \"%s\"\n", line_no, key);
            status = -1;
        }
    }
    fclose(f);
    for (int k = 0; status == 0 && k < 10; k++) {
        if (inp->given[k] != (k == 6 ? 3 : 1)) {
            fprintf(stderr, "catalogue_table: %s must be given %s\n", UNIVERSE_KEYS[k],
                    k == 6 ? "three times" : "once");
            status = -1;
        }
    }
    if (status == 0 && (inp->n_objects[1] != inp->n_objects[0] || inp->n_objects[2] != inp->n_objects[0])) {
        fprintf(stderr, "catalogue_table: %s, %s and %s must be given equally often\n", OBJECT_KEYS[0],
                OBJECT_KEYS[1], OBJECT_KEYS[2]);
        status = -1;
    }
    return status;
}

static void print(const char *key, double value) { printf("%s = %.16e\n", key, value); }

static void print_indexed(const char *prefix, size_t n, const char *suffix, double value) {
    char key[128];
    snprintf(key, sizeof key, "%s_%zu_%s", prefix, n, suffix);
    print(key, value);
}

/* Stops with relicore's message when a call failed. */
static void check(int32_t status, const char *what) {
    if (status != RELICORE_OK) {
        fprintf(stderr, "catalogue_table: %s: %s (status %d)\n", what, relicore_status_message(status), (int)status);
        exit(1);
    }
}

/* A function of the universe at one argument (stops on failure). */
static double at(int32_t (*f)(const struct relicore_universe *, double, double *),
                 const struct relicore_universe *u, double x, const char *what) {
    double v = 0.0;
    check(f(u, x, &v), what);
    return v;
}

/* Caller-owned storage for the universe (about 15 KB), static: nothing on the heap. */
static struct relicore_universe universe;

int main(int argc, char **argv) {
    const char *path = argc > 1 ? argv[1] : DEFAULT_INPUT;
    struct inputs inp;
    if (read_inputs(path, &inp) != 0) return 1;
    const struct relicore_universe *u = &universe;
    check(relicore_universe_init(&inp.params, &universe), "relicore_universe_init");
    printf("# relicore catalogue table (C) -- INVENTED DATA from %s\n", path);
    printf("# fictional Quillmere Deep Field Survey; an invented universe, not a published fit\n");

    print("universe_age_today_gyr", at(relicore_age_gyr, u, 0.0, "age_gyr"));
    /* per object, in the order every language prints them */
    for (size_t i = 0; i < inp.n_objects[0]; i++) {
        double z = inp.objects[0][i], m_abs = inp.objects[1][i], radius_kpc = inp.objects[2][i];
        print_indexed("object", i + 1, "redshift", z);
        print_indexed("object", i + 1, "absolute_magnitude", m_abs);
        print_indexed("object", i + 1, "half_light_radius_kpc", radius_kpc);
        print_indexed("object", i + 1, "luminosity_distance_mpc",
                      at(relicore_luminosity_distance_mpc, u, z, "luminosity_distance_mpc"));
        double modulus = at(relicore_distance_modulus, u, z, "distance_modulus");
        print_indexed("object", i + 1, "distance_modulus", modulus);
        print_indexed("object", i + 1, "apparent_magnitude", m_abs + modulus);
        double scale = at(relicore_transverse_scale_kpc_per_arcsec, u, z, "transverse_scale_kpc_per_arcsec");
        print_indexed("object", i + 1, "half_light_radius_arcsec", radius_kpc / scale);
        print_indexed("object", i + 1, "lookback_time_gyr", at(relicore_lookback_time_gyr, u, z, "lookback_time_gyr"));
        print_indexed("object", i + 1, "age_at_emission_gyr", at(relicore_age_gyr, u, z, "age_gyr"));
    }
    return 0;
}
