/*
 * The relicore demo, part 3, in C: the starting time and thermal history of the INVENTED toy
 * simulation code "Wrenfold" of the fictional Marrowgate Simulation Group.
 *
 * Reads examples/data/invented_simulation.txt (or the path given as the first argument), builds
 * the demo universe and its thermal history (with the invented reionisation redshift) and
 * prints, as "key = value" with 17 significant digits: the run's starting time (the age of the
 * universe at the invented start redshift, in Myr) and its initial x_e and T_m, the
 * last-scattering summary of the history, and x_e, T_m, T_r and T_m/T_r at each invented output
 * redshift. The Rust, Fortran and Python versions read the same file and print the same keys;
 * examples/run_demo.sh compares the four outputs. Every number is computed by relicore; this
 * program only reads, calls, converts Gyr to Myr and radians to 100 theta*, divides T_m by T_r
 * and prints. The universe and the history (163848 bytes) live in caller-owned static storage:
 * nothing is allocated and nothing large is on the stack.
 *
 * Build (from the repository root; examples/run_demo.sh does this):
 *   cargo build -p relicore-capi --profile release-c
 *   cc -std=c11 -Wall -Wextra -Wpedantic -Werror -Iinclude examples/c/simulation_start.c \
 *      target/release-c/librelicore.a -lm -o build/demo/simulation_start_c
 */
#define _POSIX_C_SOURCE 200809L /* strtok_r */
#include <errno.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "relicore.h"

#define DEFAULT_INPUT "examples/data/invented_simulation.txt"
#define MAX_LIST 64

struct inputs {
    struct relicore_universe_parameters params;
    int given[10]; /* how often each universe_ key was given (masses: three times) */
    double start_redshift;
    int start_given;
    double reionization_redshift;
    int reionization_given;
    double outputs[MAX_LIST];
    size_t n_outputs;
};

static const char *const UNIVERSE_KEYS[10] = {
    "universe_h0_km_s_mpc",      "universe_omega_matter",      "universe_omega_baryon",
    "universe_omega_curvature",  "universe_cmb_temperature_k", "universe_n_eff",
    "universe_neutrino_mass_ev", "universe_w0",                "universe_wa",
    "universe_helium_mass_fraction",
};

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

/* A key that must be given once; -1 when given twice. */
static int once(double *slot, int *given, double v) {
    if ((*given)++ > 0) return -1;
    *slot = v;
    return 0;
}

static int read_inputs(const char *path, struct inputs *inp) {
    FILE *f = fopen(path, "r");
    if (f == NULL) {
        fprintf(stderr, "simulation_start: cannot open %s\n", path);
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
        char *token = strtok_r(NULL, " \t\r\n", &cursor);
        if (token == NULL || strtok_r(NULL, " \t\r\n", &cursor) != NULL) {
            fprintf(stderr, "simulation_start: line %d: want \"key value\"\n", line_no);
            status = -1;
            break;
        }
        char *end = NULL;
        errno = 0;
        double v = strtod(token, &end);
        if (end == token || *end != '\0' || errno != 0) {
            fprintf(stderr, "simulation_start: line %d: cannot read \"%s\" as a number\n", line_no, token);
            status = -1;
            break;
        }
        int which = -1;
        for (int k = 0; k < 10; k++) {
            if (strcmp(key, UNIVERSE_KEYS[k]) == 0) which = k;
        }
        if (which >= 0) {
            status = store(inp, which, v);
        } else if (strcmp(key, "simulation_start_redshift") == 0) {
            status = once(&inp->start_redshift, &inp->start_given, v);
        } else if (strcmp(key, "simulation_reionization_redshift") == 0) {
            status = once(&inp->reionization_redshift, &inp->reionization_given, v);
        } else if (strcmp(key, "simulation_output_redshift") == 0) {
            if (inp->n_outputs >= MAX_LIST) {
                fprintf(stderr, "simulation_start: line %d: more than %d output redshifts\n", line_no, MAX_LIST);
                status = -1;
                break;
            }
            inp->outputs[inp->n_outputs++] = v;
            continue;
        } else {
            fprintf(stderr, "simulation_start: line %d: unknown key \"%s\"\n", line_no, key);
            status = -1;
            break;
        }
        if (status != 0) fprintf(stderr, "simulation_start: line %d: %s given too often\n", line_no, key);
    }
    fclose(f);
    for (int k = 0; status == 0 && k < 10; k++) {
        if (inp->given[k] != (k == 6 ? 3 : 1)) {
            fprintf(stderr, "simulation_start: %s must be given %s\n", UNIVERSE_KEYS[k],
                    k == 6 ? "three times" : "once");
            status = -1;
        }
    }
    if (status == 0 && (inp->start_given != 1 || inp->reionization_given != 1)) {
        fprintf(stderr, "simulation_start: simulation_start_redshift and simulation_reionization_redshift "
                        "must be given once\n");
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
        fprintf(stderr, "simulation_start: %s: %s (status %d)\n", what, relicore_status_message(status), (int)status);
        exit(1);
    }
}

typedef int32_t (*universe_fn)(const struct relicore_universe *, double, double *);
typedef int32_t (*query_fn)(const struct relicore_thermal_history *, double, double *);
typedef int32_t (*summary_fn)(const struct relicore_thermal_history *, double *);

/* A function of the universe at one redshift (stops on failure). */
static double of_universe(universe_fn f, const struct relicore_universe *u, double z, const char *what) {
    double v = 0.0;
    check(f(u, z, &v), what);
    return v;
}

/* A query of the history at one redshift (stops on failure). */
static double of_history(query_fn f, const struct relicore_thermal_history *h, double z, const char *what) {
    double v = 0.0;
    check(f(h, z, &v), what);
    return v;
}

/* A summary value of the history (stops on failure). */
static double summary(summary_fn f, const struct relicore_thermal_history *h, const char *what) {
    double v = 0.0;
    check(f(h, &v), what);
    return v;
}

/* Caller-owned storage (the history is 163848 bytes), static: nothing on the heap or stack. */
static struct relicore_universe universe;
static struct relicore_thermal_history history;

int main(int argc, char **argv) {
    const char *path = argc > 1 ? argv[1] : DEFAULT_INPUT;
    struct inputs inp;
    if (read_inputs(path, &inp) != 0) return 1;
    const struct relicore_universe *u = &universe;
    const struct relicore_thermal_history *h = &history;
    check(relicore_universe_init(&inp.params, &universe), "relicore_universe_init");
    struct relicore_thermal_history_options options;
    check(relicore_thermal_history_options_default(&options), "relicore_thermal_history_options_default");
    options.reionization = 1;
    options.reionization_redshift = inp.reionization_redshift;
    check(relicore_thermal_history_compute(u, &options, &history), "relicore_thermal_history_compute");
    printf("# relicore simulation start (C) -- INVENTED DATA from %s\n", path);
    printf("# fictional toy code Wrenfold (Marrowgate Simulation Group); a demo universe, not a published fit\n");

    double z = inp.start_redshift;
    double t_m = of_history(relicore_matter_temperature_k, h, z, "matter_temperature_k");
    double t_r = of_universe(relicore_cmb_temperature_at_k, u, z, "cmb_temperature_at_k");
    print("start_redshift", z);
    print("start_age_myr", of_universe(relicore_age_gyr, u, z, "age_gyr") * 1000.0);
    print("start_ionized_fraction", of_history(relicore_ionized_fraction, h, z, "ionized_fraction"));
    print("start_matter_temperature_k", t_m);
    print("start_radiation_temperature_k", t_r);
    print("start_temperature_ratio", t_m / t_r);

    print("reionization_redshift", inp.reionization_redshift);
    print("history_last_scattering_redshift",
          summary(relicore_last_scattering_redshift, h, "last_scattering_redshift"));
    print("history_drag_redshift", summary(relicore_drag_redshift, h, "drag_redshift"));
    print("history_sound_horizon_last_scattering_mpc",
          summary(relicore_sound_horizon_last_scattering_mpc, h, "sound_horizon_last_scattering_mpc"));
    print("history_sound_horizon_drag_mpc", summary(relicore_sound_horizon_drag_mpc, h, "sound_horizon_drag_mpc"));
    print("history_100_theta_star",
          summary(relicore_angular_scale_last_scattering, h, "angular_scale_last_scattering") * 100.0);
    print("history_age_at_last_scattering_yr",
          summary(relicore_age_at_last_scattering_yr, h, "age_at_last_scattering_yr"));
    print("history_temperature_at_last_scattering_k",
          summary(relicore_temperature_at_last_scattering_k, h, "temperature_at_last_scattering_k"));
    print("history_visibility_peak_redshift",
          summary(relicore_visibility_peak_redshift, h, "visibility_peak_redshift"));
    print("history_thermal_decoupling_redshift",
          summary(relicore_thermal_decoupling_redshift, h, "thermal_decoupling_redshift"));
    print("history_reionization_optical_depth",
          summary(relicore_reionization_optical_depth, h, "reionization_optical_depth"));

    for (size_t i = 0; i < inp.n_outputs; i++) {
        z = inp.outputs[i];
        t_m = of_history(relicore_matter_temperature_k, h, z, "matter_temperature_k");
        t_r = of_universe(relicore_cmb_temperature_at_k, u, z, "cmb_temperature_at_k");
        print_indexed("output", i + 1, "z", z);
        print_indexed("output", i + 1, "age_myr", of_universe(relicore_age_gyr, u, z, "age_gyr") * 1000.0);
        print_indexed("output", i + 1, "ionized_fraction",
                      of_history(relicore_ionized_fraction, h, z, "ionized_fraction"));
        print_indexed("output", i + 1, "matter_temperature_k", t_m);
        print_indexed("output", i + 1, "radiation_temperature_k", t_r);
        print_indexed("output", i + 1, "temperature_ratio", t_m / t_r);
    }
    return 0;
}
