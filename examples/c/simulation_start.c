/*
 * The relicore demo, part 3, in C: the starting time, thermal history and initial-condition
 * quantities of the INVENTED toy simulation code "Orvelstep" of the fictional Hollinscarth
 * Simulation Group (both names are coinages for this demo).
 *
 * Reads examples/data/invented_simulation.txt (or the path given as the first argument), builds
 * the demo universe, its thermal history (with the invented reionisation redshift), its linear
 * growth and a linear power spectrum (invented A_s and n_s) and prints, as "key = value" with
 * 17 significant digits: the run's starting time (the age of the universe at the invented start
 * redshift, in Myr) and its initial x_e and T_m, the last-scattering summary of the history,
 * the growth factor and rate at the start redshift, sigma8, S8 and f sigma8, the leapfrog drift
 * and kick factors of the invented first time steps, and x_e, T_m, T_r and T_m/T_r at each
 * invented output redshift. It writes the linear power spectrum at the start redshift as a
 * two-column file (k in Mpc^-1, P in Mpc^3; the path given as the second argument). The Rust,
 * Fortran and Python versions read the same file, print the same keys and write the same
 * spectrum file; examples/run_demo.sh compares the four. Every number is computed by relicore;
 * this program only reads, calls, converts Gyr to Myr and radians to 100 theta*, divides T_m by
 * T_r, forms 8/h Mpc = 800/H0 Mpc, a = 1/(1 + z) and the wavenumber grid (one multiplication per
 * point), and prints. The universe, the history (163848 bytes), the growth and the spectrum
 * (131080 bytes each) and the spectrum's arrays live in caller-owned static storage: nothing is
 * allocated and nothing large is on the stack.
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
#define DEFAULT_SPECTRUM "examples/out/simulation_power_spectrum_c.txt"
#define MAX_LIST 64
#define MAX_POINTS 100000

struct inputs {
    struct relicore_universe_parameters params;
    int given[10]; /* how often each universe_ key was given (masses: three times) */
    double start_redshift;
    int start_given;
    double reionization_redshift;
    int reionization_given;
    double outputs[MAX_LIST];
    size_t n_outputs;
    double steps[MAX_LIST];
    size_t n_steps;
    double spectrum[6]; /* the values of SPECTRUM_KEYS, in that order */
    int spectrum_given[6];
};

/* The spectrum keys of the input file, each given once. */
static const char *const SPECTRUM_KEYS[6] = {
    "spectrum_scalar_amplitude",       "spectrum_spectral_index",   "spectrum_running",
    "spectrum_wavenumber_min_per_mpc", "spectrum_wavenumber_ratio", "spectrum_points",
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
        int spectrum_which = -1;
        for (int k = 0; k < 6; k++) {
            if (strcmp(key, SPECTRUM_KEYS[k]) == 0) spectrum_which = k;
        }
        if (spectrum_which >= 0) {
            status = once(&inp->spectrum[spectrum_which], &inp->spectrum_given[spectrum_which], v);
        } else if (strcmp(key, "simulation_step_redshift") == 0) {
            if (inp->n_steps >= MAX_LIST) {
                fprintf(stderr, "simulation_start: line %d: more than %d step redshifts\n", line_no, MAX_LIST);
                status = -1;
                break;
            }
            inp->steps[inp->n_steps++] = v;
            continue;
        } else if (which >= 0) {
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
    for (int k = 0; status == 0 && k < 6; k++) {
        if (inp->spectrum_given[k] != 1) {
            fprintf(stderr, "simulation_start: %s must be given once\n", SPECTRUM_KEYS[k]);
            status = -1;
        }
    }
    if (status == 0 && inp->n_steps < 2) {
        fprintf(stderr, "simulation_start: simulation_step_redshift must be given at least twice\n");
        status = -1;
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

/* Caller-owned storage (the history is 163848 bytes, the growth and the spectrum 131080 bytes
 * each), static: nothing on the heap or stack. */
static struct relicore_universe universe;
static struct relicore_thermal_history history;
static struct relicore_linear_growth growth;
static struct relicore_linear_power_spectrum spectrum;
static double wavenumbers[MAX_POINTS];
static double powers[MAX_POINTS];

/* The header of the spectrum file (the same text in every language). */
static const char *const SPECTRUM_HEADER[7] = {
    "# relicore demo -- INVENTED scenario: the linear matter power spectrum for the initial conditions",
    "# of the fictional toy simulation code Orvelstep (fictional Hollinscarth Simulation Group), not a real run",
    "# universe: the demo's round-number flat model below, not a published fit (massive neutrinos smooth)",
    "# column 1: k, wavenumber in Mpc^-1 (no factor of h); column 2: P(k, z) in Mpc^3 (no factor of h)",
    "# P(k, z) = (2 pi^2/k^3) A_s (k/k_p)^(n_s - 1 + alpha_s ln(k/k_p)/2) [(2/5) (c k/H0)^2 T(k) D_u(a)/Omega_m]^2",
    "# with k_p = 0.05 Mpc^-1 and T(k) the Eisenstein & Hu 1998 (ApJ 496, 605) formula with baryon oscillations",
    "# computed by relicore at the run's start redshift; the values of the model:",
};

struct named_value {
    const char *name;
    double value;
};

/* Writes the two-column spectrum file: the header, "# name = value" lines, then "k P" rows. */
static int write_spectrum_file(const char *path, const struct named_value *values, size_t n_values,
                               const double *k, const double *p, size_t n) {
    FILE *f = fopen(path, "w");
    if (f == NULL) {
        fprintf(stderr, "simulation_start: cannot write %s\n", path);
        return -1;
    }
    for (size_t i = 0; i < 7; i++) fprintf(f, "%s\n", SPECTRUM_HEADER[i]);
    for (size_t i = 0; i < n_values; i++) fprintf(f, "# %s = %.16e\n", values[i].name, values[i].value);
    for (size_t i = 0; i < n; i++) fprintf(f, "%.16e %.16e\n", k[i], p[i]);
    if (fclose(f) != 0) {
        fprintf(stderr, "simulation_start: cannot write %s\n", path);
        return -1;
    }
    return 0;
}

typedef int32_t (*growth_fn)(const struct relicore_linear_growth *, double, double *);
typedef int32_t (*step_fn)(const struct relicore_linear_growth *, double, double, double *);
typedef int32_t (*spectrum_fn)(const struct relicore_linear_power_spectrum *, double *);

/* A function of the growth at one redshift (stops on failure). */
static double of_growth(growth_fn f, double z, const char *what) {
    double v = 0.0;
    check(f(&growth, z, &v), what);
    return v;
}

/* A leapfrog factor of the step from a1 to a2 (stops on failure). */
static double of_step(step_fn f, double a1, double a2, const char *what) {
    double v = 0.0;
    check(f(&growth, a1, a2, &v), what);
    return v;
}

/* A value of the spectrum (stops on failure). */
static double of_spectrum(spectrum_fn f, const char *what) {
    double v = 0.0;
    check(f(&spectrum, &v), what);
    return v;
}

int main(int argc, char **argv) {
    const char *path = argc > 1 ? argv[1] : DEFAULT_INPUT;
    const char *spectrum_path = argc > 2 ? argv[2] : DEFAULT_SPECTRUM;
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
    printf("# fictional toy code Orvelstep (Hollinscarth Simulation Group); a demo universe, not a published fit\n");

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

    /* the growth and the power spectrum of the initial conditions */
    double z0 = inp.start_redshift;
    check(relicore_linear_growth_compute(u, &growth), "relicore_linear_growth_compute");
    struct relicore_linear_power_spectrum_options spectrum_options;
    check(relicore_linear_power_spectrum_options_default(&spectrum_options),
          "relicore_linear_power_spectrum_options_default");
    double a_s = inp.spectrum[0], n_s = inp.spectrum[1], alpha_s = inp.spectrum[2];
    double k_min = inp.spectrum[3], k_ratio = inp.spectrum[4], n_points = inp.spectrum[5];
    spectrum_options.transfer_form = RELICORE_TRANSFER_BARYON_OSCILLATIONS;
    spectrum_options.normalisation = RELICORE_NORMALISATION_SCALAR_AMPLITUDE;
    spectrum_options.value = a_s;
    spectrum_options.spectral_index = n_s;
    spectrum_options.running = alpha_s;
    check(relicore_linear_power_spectrum_compute(&growth, &spectrum_options, &spectrum),
          "relicore_linear_power_spectrum_compute");
    double d0 = of_growth(relicore_growth_factor, z0, "growth_factor");
    print("growth_start_growth_factor", d0);
    print("growth_start_growth_rate", of_growth(relicore_growth_rate, z0, "growth_rate"));
    print("growth_start_unnormalized_growth_factor",
          of_growth(relicore_unnormalized_growth_factor, z0, "unnormalized_growth_factor"));
    print("growth_unnormalized_growth_factor_today",
          of_growth(relicore_unnormalized_growth_factor, 0.0, "unnormalized_growth_factor"));
    double a_s_out = of_spectrum(relicore_scalar_amplitude, "scalar_amplitude");
    double sigma8 = of_spectrum(relicore_sigma8, "sigma8");
    print("spectrum_scalar_amplitude", a_s_out);
    print("spectrum_spectral_index", n_s);
    print("spectrum_running", alpha_s);
    print("spectrum_sigma8", sigma8);
    print("spectrum_s8", of_spectrum(relicore_s8, "s8"));
    double r8_mpc = 800.0 / inp.params.h0_km_s_mpc;
    double v = 0.0;
    check(relicore_density_rms_in_sphere(&spectrum, r8_mpc, z0, &v), "density_rms_in_sphere");
    print("spectrum_start_sigma_8_over_h_mpc", v);
    check(relicore_growth_rate_times_sigma8(&spectrum, z0, &v), "growth_rate_times_sigma8");
    print("spectrum_start_growth_rate_times_sigma8", v);
    check(relicore_growth_rate_times_sigma8(&spectrum, 0.0, &v), "growth_rate_times_sigma8");
    print("spectrum_growth_rate_times_sigma8_today", v);
    for (size_t i = 0; i + 1 < inp.n_steps; i++) {
        double a1 = 1.0 / (1.0 + inp.steps[i]);
        double a2 = 1.0 / (1.0 + inp.steps[i + 1]);
        print_indexed("step", i + 1, "start_scale_factor", a1);
        print_indexed("step", i + 1, "end_scale_factor", a2);
        print_indexed("step", i + 1, "drift_factor_gyr",
                      of_step(relicore_leapfrog_drift_factor_gyr, a1, a2, "leapfrog_drift_factor_gyr"));
        print_indexed("step", i + 1, "kick_factor_gyr",
                      of_step(relicore_leapfrog_kick_factor_gyr, a1, a2, "leapfrog_kick_factor_gyr"));
    }
    /* the spectrum file: k_0 = k_min, k_(i+1) = k_i * ratio (one multiplication per point) */
    if (!(n_points >= 2.0 && n_points <= (double)MAX_POINTS && n_points == (double)(size_t)n_points)) {
        fprintf(stderr, "simulation_start: spectrum_points must be a whole number from 2 to %d\n", MAX_POINTS);
        return 1;
    }
    size_t n_k = (size_t)n_points;
    double next = k_min;
    for (size_t i = 0; i < n_k; i++) {
        wavenumbers[i] = next;
        next *= k_ratio;
    }
    check(relicore_linear_power_spectrum_mpc3_array(&spectrum, wavenumbers, n_k, z0, powers),
          "linear_power_spectrum_mpc3_array");
    const struct relicore_universe_parameters *pr = &inp.params;
    const struct named_value header_values[] = {
        {"redshift", z0},
        {"h0_km_s_mpc", pr->h0_km_s_mpc},
        {"omega_matter", pr->omega_matter},
        {"omega_baryon", pr->omega_baryon},
        {"omega_curvature", pr->omega_curvature},
        {"cmb_temperature_k", pr->cmb_temperature_k},
        {"n_eff", pr->n_eff},
        {"neutrino_mass_1_ev", pr->neutrino_masses_ev[0]},
        {"neutrino_mass_2_ev", pr->neutrino_masses_ev[1]},
        {"neutrino_mass_3_ev", pr->neutrino_masses_ev[2]},
        {"w0", pr->w0},
        {"wa", pr->wa},
        {"scalar_amplitude", a_s_out},
        {"spectral_index", n_s},
        {"running", alpha_s},
        {"sigma8_today", sigma8},
        {"growth_factor_at_redshift", d0},
        {"points", n_points},
    };
    if (write_spectrum_file(spectrum_path, header_values, sizeof header_values / sizeof header_values[0],
                            wavenumbers, powers, n_k) != 0)
        return 1;
    print("spectrum_file_points", n_points);
    print("spectrum_file_first_wavenumber_per_mpc", wavenumbers[0]);
    print("spectrum_file_last_wavenumber_per_mpc", wavenumbers[n_k - 1]);
    print("spectrum_file_first_power_mpc3", powers[0]);
    print("spectrum_file_last_power_mpc3", powers[n_k - 1]);

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
