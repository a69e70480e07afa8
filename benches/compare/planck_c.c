/*
 * Side-by-side timing, in C, of Planck's spectral radiance per wavelength over one array:
 *
 *   relicore_c_abi  relicore_spectral_radiance_wavelength_array (the C ABI, static library
 *                   built with the release-c profile);
 *   c_loop_exp      BASELINE, NOT relicore: the textbook formula a user would otherwise write,
 *                   2hc^2/lambda^5 / (exp(hc/(lambda k T)) - 1), as a plain loop calling exp;
 *   c_loop_expm1    BASELINE, NOT relicore: the same loop with the careful user's expm1.
 *
 * The baselines exist only to be compared with; they are what a user would write without
 * relicore, with the radiation constants formed in double from the exact SI h, c, k and
 * lambda^5 as products (the fastest natural form; pow(lambda, 5) would be slower).
 *
 * Usage: planck_c INPUT.f64 TEMPERATURE_K REPETITIONS OUTPUT_DIR
 *   INPUT.f64: n wavelengths in m as raw native doubles (written by compare.py).
 * Prints one line per method: "timing <method> <median s> <min s> <repetitions> <n>", and
 * writes each method's results to OUTPUT_DIR/<method>.f64 for the accuracy check.
 * A benchmark, not a test: nothing here asserts on speed.
 */
#define _POSIX_C_SOURCE 199309L /* clock_gettime */
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

#include "relicore.h"

#define MAX_REPETITIONS 101

static double now_s(void) {
    struct timespec ts;
    clock_gettime(CLOCK_MONOTONIC, &ts);
    return (double)ts.tv_sec + 1e-9 * (double)ts.tv_nsec;
}

/* BASELINE, NOT relicore: what a user would write with exp. */
static void __attribute__((noinline)) c_loop_exp(const double *lambda, size_t n, double t, double *out) {
    const double h = 6.62607015e-34, c = 299792458.0, k = 1.380649e-23;
    const double c1 = 2.0 * h * c * c; /* 2hc^2 */
    const double c2 = h * c / k;       /* hc/k */
    for (size_t i = 0; i < n; ++i) {
        const double l = lambda[i];
        out[i] = c1 / (l * l * l * l * l) / (exp(c2 / (l * t)) - 1.0);
    }
}

/* BASELINE, NOT relicore: the same with expm1. */
static void __attribute__((noinline)) c_loop_expm1(const double *lambda, size_t n, double t, double *out) {
    const double h = 6.62607015e-34, c = 299792458.0, k = 1.380649e-23;
    const double c1 = 2.0 * h * c * c;
    const double c2 = h * c / k;
    for (size_t i = 0; i < n; ++i) {
        const double l = lambda[i];
        out[i] = c1 / (l * l * l * l * l) / expm1(c2 / (l * t));
    }
}

static int32_t status_of_last_relicore_call = 0;

static void relicore_c_abi(const double *lambda, size_t n, double t, double *out) {
    status_of_last_relicore_call = relicore_spectral_radiance_wavelength_array(lambda, n, t, out);
}

static int cmp_double(const void *a, const void *b) {
    const double x = *(const double *)a, y = *(const double *)b;
    return (x > y) - (x < y);
}

static double median(double *v, int n) {
    qsort(v, (size_t)n, sizeof *v, cmp_double);
    return n % 2 ? v[n / 2] : 0.5 * (v[n / 2 - 1] + v[n / 2]);
}

static int write_doubles(const char *dir, const char *name, const double *v, size_t n) {
    char path[1024];
    snprintf(path, sizeof path, "%s/%s.f64", dir, name);
    FILE *f = fopen(path, "wb");
    if (f == NULL || fwrite(v, sizeof *v, n, f) != n) {
        fprintf(stderr, "planck_c: cannot write %s\n", path);
        if (f != NULL) fclose(f);
        return -1;
    }
    return fclose(f) == 0 ? 0 : -1;
}

typedef void (*method_fn)(const double *, size_t, double, double *);

int main(int argc, char **argv) {
    if (argc != 5) {
        fprintf(stderr, "usage: planck_c INPUT.f64 TEMPERATURE_K REPETITIONS OUTPUT_DIR\n");
        return EXIT_FAILURE;
    }
    const double t = strtod(argv[2], NULL);
    const int reps = atoi(argv[3]);
    if (reps < 1 || reps > MAX_REPETITIONS) {
        fprintf(stderr, "planck_c: repetitions must be 1..%d\n", MAX_REPETITIONS);
        return EXIT_FAILURE;
    }
    FILE *f = fopen(argv[1], "rb");
    if (f == NULL) {
        fprintf(stderr, "planck_c: cannot open %s\n", argv[1]);
        return EXIT_FAILURE;
    }
    fseek(f, 0, SEEK_END);
    const long bytes = ftell(f);
    fseek(f, 0, SEEK_SET);
    const size_t n = (size_t)bytes / sizeof(double);
    double *lambda = malloc(n * sizeof *lambda);
    if (lambda == NULL || fread(lambda, sizeof *lambda, n, f) != n) {
        fprintf(stderr, "planck_c: cannot read %zu doubles from %s\n", n, argv[1]);
        return EXIT_FAILURE;
    }
    fclose(f);

    enum { N_METHODS = 3 };
    const char *names[N_METHODS] = {"relicore_c_abi", "c_loop_exp", "c_loop_expm1"};
    const method_fn fns[N_METHODS] = {relicore_c_abi, c_loop_exp, c_loop_expm1};
    double *outs[N_METHODS];
    double times[N_METHODS][MAX_REPETITIONS];
    for (int m = 0; m < N_METHODS; ++m) {
        outs[m] = malloc(n * sizeof(double));
        if (outs[m] == NULL) {
            fprintf(stderr, "planck_c: out of memory\n");
            return EXIT_FAILURE;
        }
        fns[m](lambda, n, t, outs[m]); /* warm-up: touch the pages, load the code */
    }
    /* interleaved repetitions, so that a slow moment of the machine hits every method alike */
    for (int r = 0; r < reps; ++r) {
        for (int m = 0; m < N_METHODS; ++m) {
            const double t0 = now_s();
            fns[m](lambda, n, t, outs[m]);
            times[m][r] = now_s() - t0;
        }
    }
    if (status_of_last_relicore_call != RELICORE_OK) {
        fprintf(stderr, "planck_c: relicore failed: %s\n", relicore_status_message(status_of_last_relicore_call));
        return EXIT_FAILURE;
    }
    for (int m = 0; m < N_METHODS; ++m) {
        double fastest = times[m][0];
        for (int r = 1; r < reps; ++r) fastest = times[m][r] < fastest ? times[m][r] : fastest;
        printf("timing %s %.9e %.9e %d %zu\n", names[m], median(times[m], reps), fastest, reps, n);
        if (write_doubles(argv[4], names[m], outs[m], n) != 0) return EXIT_FAILURE;
        free(outs[m]);
    }
    free(lambda);
    return EXIT_SUCCESS;
}
