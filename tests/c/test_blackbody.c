/*
 * C test of the relicore blackbody interface (C11).
 *
 *   test_blackbody SCALAR_FILE RESPONSE_FILE
 *       checks every reference vector of tests/data/blackbody.txt and
 *       tests/data/blackbody_response.txt (format: tests/data/FORMAT.md) against the C functions,
 *       with the tolerance of each line, then runs the interface checks written below (NULL
 *       pointers, empty and mismatched arrays, array forms against scalar calls, status
 *       messages). Ends with "N passed, M failed"; exit status 0 only if nothing failed.
 *
 *   test_blackbody --dump SCALAR_FILE [RESPONSE_FILE]
 *       prints "name bits" for every value line (not status lines) in file order, scalar file
 *       first: bits is the IEEE-754 pattern of the result in hex (16 digits for double, 8 for
 *       the _f32 names), so another language can compare its results bit for bit.
 *
 * The regular functions it dispatches to are the lists of tests/c/gen_functions.h (generated
 * from bindings/functions.toml); the calibration and response functions are written here. The
 * array checks take the typical value of the array variable and the fixed argument from the
 * scalar function's first value line in the data file. An unknown function name in a data
 * file is a failure, and so is an exported function with no reference vector, so the data and
 * this harness cannot drift apart silently. The record
 * reader, number parsing, tolerances and check counting it shares with test_cosmology and
 * test_decoupling are in vector_files.c.
 */

#include <float.h>
#include <inttypes.h>
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "gen_functions.h"
#include "relicore.h"
#include "vector_files.h"

#define MAX_TOKENS 16

/* ------------------------------------------------------------------------------------------ */
/* Dispatch table: every scalar function of the blackbody interface.                           */
/* ------------------------------------------------------------------------------------------ */

typedef int32_t (*d1_fn)(double, double *);
typedef int32_t (*d2_fn)(double, double, double *);
typedef int32_t (*d3_fn)(double, double, double, double *);
typedef int32_t (*d4_fn)(double, double, double, double, double *);
typedef int32_t (*f1_fn)(float, float *);
typedef int32_t (*f2_fn)(float, float, float *);
typedef int32_t (*f3_fn)(float, float, float, float *);
typedef int32_t (*f4_fn)(float, float, float, float, float *);
typedef int32_t (*cal_fn)(const struct relicore_two_load_calibration *, double, double *);
typedef int32_t (*calf_fn)(const struct relicore_two_load_calibration_f32 *, float, float *);

/* CAL: the six arguments of the vector are two_load_calibration's five, then the reading. */
enum shape { S_D1, S_D2, S_D3, S_D4, S_CAL, S_F1, S_F2, S_F3, S_F4, S_CALF };
static const int shape_nargs[] = { 1, 2, 3, 4, 6, 1, 2, 3, 4, 6 };
static int shape_is_f32(enum shape s) { return s >= S_F1; }

#define MAX_ARGS 8

struct entry {
    const char *name; /* name in the data files (without the relicore_ prefix) */
    enum shape shape;
    union {
        d1_fn d1;
        d2_fn d2;
        d3_fn d3;
        d4_fn d4;
        f1_fn f1;
        f2_fn f2;
        f3_fn f3;
        f4_fn f4;
        cal_fn cal;
        calf_fn calf;
    } fn;
    long vectors; /* number of lines of the data files that used it */
    int has_sample; /* the arguments of its first value line (not a status line) were kept */
    double sample[MAX_ARGS];
};

#define D1(n) { #n, S_D1, { .d1 = relicore_##n }, 0, 0, { 0 } }
#define D2(n) { #n, S_D2, { .d2 = relicore_##n }, 0, 0, { 0 } }
#define D3(n) { #n, S_D3, { .d3 = relicore_##n }, 0, 0, { 0 } }
#define D4(n) { #n, S_D4, { .d4 = relicore_##n }, 0, 0, { 0 } }
#define CAL(n) { #n, S_CAL, { .cal = relicore_##n }, 0, 0, { 0 } }
#define F1(n) { #n "_f32", S_F1, { .f1 = relicore_##n##_f32 }, 0, 0, { 0 } }
#define F2(n) { #n "_f32", S_F2, { .f2 = relicore_##n##_f32 }, 0, 0, { 0 } }
#define F3(n) { #n "_f32", S_F3, { .f3 = relicore_##n##_f32 }, 0, 0, { 0 } }
#define F4(n) { #n "_f32", S_F4, { .f4 = relicore_##n##_f32 }, 0, 0, { 0 } }
#define CALF(n) { #n "_f32", S_CALF, { .calf = relicore_##n##_f32 }, 0, 0, { 0 } }
/* the entries of the generated lists (tests/c/gen_functions.h), by arity */
#define DOUBLE_ENTRY(n, k, domain, upper, array) D##k(n),
#define FLOAT_ENTRY(n, k, domain, upper, array) F##k(n),

/* the regular functions from the table (bindings/functions.toml), then the calibration */
static struct entry table[] = {
    RELICORE_BLACKBODY_SCALARS(DOUBLE_ENTRY)
    RELICORE_BLACKBODY_SCALARS_F32(FLOAT_ENTRY)
    CAL(calibrated_temperature),
    CAL(calibrated_brightness_temperature),
    CALF(calibrated_temperature),
    CALF(calibrated_brightness_temperature),
};
#define TABLE_LEN (sizeof table / sizeof table[0])

static struct entry *find_entry(const char *name)
{
    for (size_t i = 0; i < TABLE_LEN; i++) {
        if (strcmp(table[i].name, name) == 0) {
            return &table[i];
        }
    }
    return NULL;
}

/* Response functions (array file). */
enum rshape { R_D, R_F };
typedef int32_t (*rd_fn)(const double *, size_t, const double *, size_t, double, double *);
typedef int32_t (*rf_fn)(const float *, size_t, const float *, size_t, float, float *);
struct rentry {
    const char *name;
    enum rshape shape;
    rd_fn d;
    rf_fn f;
    long vectors;
};
static struct rentry rtable[] = {
    { "response_weighted_radiance", R_D, relicore_response_weighted_radiance, NULL, 0 },
    { "temperature_from_response_weighted_radiance", R_D,
      relicore_temperature_from_response_weighted_radiance, NULL, 0 },
    { "response_weighted_radiance_f32", R_F, NULL, relicore_response_weighted_radiance_f32, 0 },
    { "temperature_from_response_weighted_radiance_f32", R_F, NULL,
      relicore_temperature_from_response_weighted_radiance_f32, 0 },
};
#define RTABLE_LEN (sizeof rtable / sizeof rtable[0])

/* ------------------------------------------------------------------------------------------ */
/* Numbers, tolerances, bits                                                                   */
/* ------------------------------------------------------------------------------------------ */

static int is_f32_value(double x) { return isnan(x) || (double)(float)x == x; }

static uint32_t bits32(float x)
{
    uint32_t b;
    memcpy(&b, &x, sizeof b);
    return b;
}

/* ------------------------------------------------------------------------------------------ */
/* Calling one scalar vector                                                                   */
/* ------------------------------------------------------------------------------------------ */

/* Calls the entry on the vector's arguments; the result goes to *out (double) and *out32 (the
 * float result for _f32 names). Checks, as a side condition, that a failed calibration leaves
 * a NaN struct that the second function refuses. */
static int32_t call_entry(const struct entry *e, const double *a, double *out, float *out32,
                          const char *where)
{
    int32_t s = RELICORE_ERROR_PANIC;
    float f = NAN;
    double d = NAN;
    switch (e->shape) {
    case S_D1: s = e->fn.d1(a[0], &d); break;
    case S_D2: s = e->fn.d2(a[0], a[1], &d); break;
    case S_D3: s = e->fn.d3(a[0], a[1], a[2], &d); break;
    case S_D4: s = e->fn.d4(a[0], a[1], a[2], a[3], &d); break;
    case S_F1: s = e->fn.f1((float)a[0], &f); break;
    case S_F2: s = e->fn.f2((float)a[0], (float)a[1], &f); break;
    case S_F3: s = e->fn.f3((float)a[0], (float)a[1], (float)a[2], &f); break;
    case S_F4: s = e->fn.f4((float)a[0], (float)a[1], (float)a[2], (float)a[3], &f); break;
    case S_CAL: {
        struct relicore_two_load_calibration cal;
        s = relicore_two_load_calibration(a[0], a[1], a[2], a[3], a[4], &cal);
        if (s != RELICORE_OK) {
            int nan_struct = isnan(cal.frequency_hz) && isnan(cal.gain) && isnan(cal.offset);
            check(nan_struct, "%s: failed two_load_calibration left a non-NaN field", where);
            double t = 0.0;
            int32_t s2 = e->fn.cal(&cal, a[5], &t);
            check(s2 == RELICORE_ERROR_INVALID_STRUCT && isnan(t),
                  "%s: %s on the NaN struct of a failed calibration returned %d (want %d)",
                  where, e->name, (int)s2, (int)RELICORE_ERROR_INVALID_STRUCT);
            d = NAN;
        } else {
            s = e->fn.cal(&cal, a[5], &d);
        }
        break;
    }
    case S_CALF: {
        struct relicore_two_load_calibration_f32 cal;
        s = relicore_two_load_calibration_f32((float)a[0], (float)a[1], (float)a[2], (float)a[3],
                                              (float)a[4], &cal);
        if (s != RELICORE_OK) {
            int nan_struct = isnan(cal.frequency_hz) && isnan(cal.gain) && isnan(cal.offset);
            check(nan_struct, "%s: failed two_load_calibration_f32 left a non-NaN field", where);
            float t = 0.0f;
            int32_t s2 = e->fn.calf(&cal, (float)a[5], &t);
            check(s2 == RELICORE_ERROR_INVALID_STRUCT && isnan(t),
                  "%s: %s on the NaN struct of a failed calibration returned %d (want %d)",
                  where, e->name, (int)s2, (int)RELICORE_ERROR_INVALID_STRUCT);
            f = NAN;
        } else {
            s = e->fn.calf(&cal, (float)a[5], &f);
        }
        break;
    }
    }
    if (shape_is_f32(e->shape)) {
        *out32 = f;
        *out = (double)f;
    } else {
        *out = d;
    }
    return s;
}

/* ------------------------------------------------------------------------------------------ */
/* Reading the data files                                                                      */
/* ------------------------------------------------------------------------------------------ */

static void run_scalar_file(const char *path, int dump)
{
    struct reader r;
    if (!open_reader(&r, path, MAX_TOKENS)) {
        return;
    }
    char *tok[MAX_TOKENS + 1];
    int ntok = 0;
    long lines = 0;
    while (next_record(&r, tok, &ntok)) {
        lines++;
        char where[160];
        snprintf(where, sizeof where, "%s:%ld", path, r.lineno);
        double nargs_d = 0.0;
        if (ntok < 2 || !parse_number(tok[1], &nargs_d) || nargs_d < 0 || nargs_d > MAX_ARGS) {
            check(0, "%s: malformed line: %s", where, r.copy);
            continue;
        }
        int nargs = (int)nargs_d;
        if (ntok > MAX_TOKENS || ntok < 2 + nargs + 3) {
            check(0, "%s: wrong number of fields: %s", where, r.copy);
            continue;
        }
        const char *name = tok[0];
        double args[MAX_ARGS], want = 0.0, tol = 0.0;
        int ok = 1;
        for (int i = 0; i < nargs; i++) {
            ok = ok && parse_number(tok[2 + i], &args[i]);
        }
        ok = ok && parse_number(tok[2 + nargs], &want) && parse_number(tok[4 + nargs], &tol);
        const char *kind = tok[3 + nargs];
        const char *source = ntok > 5 + nargs ? tok[5 + nargs] : "?";
        if (!ok) {
            check(0, "%s: unreadable number: %s", where, r.copy);
            continue;
        }
        struct entry *e = find_entry(name);
        if (e == NULL) {
            check(0, "%s: unknown function name '%s' (no C dispatch): %s", where, name, r.copy);
            continue;
        }
        if (shape_nargs[e->shape] != nargs) {
            check(0, "%s: %s takes %d arguments, the line has %d", where, name,
                  shape_nargs[e->shape], nargs);
            continue;
        }
        e->vectors++;
        int is_status = strcmp(kind, "status") == 0;
        if (!is_status && !e->has_sample) {
            memcpy(e->sample, args, (size_t)nargs * sizeof args[0]);
            e->has_sample = 1;
        }
        if (shape_is_f32(e->shape)) {
            int representable = 1;
            for (int i = 0; i < nargs; i++) {
                representable = representable && is_f32_value(args[i]);
            }
            if (!representable) {
                check(0, "%s: an argument of %s is not a float value", where, name);
                continue;
            }
        }
        double got = NAN;
        float got32 = NAN;
        int32_t s = call_entry(e, args, &got, &got32, where);
        if (dump) {
            if (!is_status) {
                if (shape_is_f32(e->shape)) {
                    printf("%s %08" PRIx32 "\n", name, bits32(got32));
                } else {
                    printf("%s %016" PRIx64 "\n", name, bits64(got));
                }
            }
            continue;
        }
        if (is_status) {
            check(s == (int32_t)tol && isnan(got),
                  "%s: %s(%s) status want %d got %d, output %.17e (want NaN) [source %s]", where,
                  name, r.copy, (int)tol, (int)s, got, source);
            continue;
        }
        int known = 1;
        int pass = s == RELICORE_OK && within(got, want, kind, tol, 1, &known);
        if (!known) {
            check(0, "%s: unknown tolerance kind '%s'", where, kind);
            continue;
        }
        check(pass, "%s: %s want %.17e got %.17e (status %d: %s) tolerance %s %.17g [source %s]\n"
                    "     line: %s",
              where, name, want, got, (int)s, relicore_status_message(s), kind, tol, source,
              r.copy);
    }
    fclose(r.fp);
    if (!dump) {
        check(lines > 0, "%s holds no vectors", path);
    }
}

static void run_response_file(const char *path, int dump)
{
    struct reader r;
    if (!open_reader(&r, path, MAX_TOKENS)) {
        return;
    }
    char *tok[MAX_TOKENS + 1];
    int ntok = 0;
    long blocks = 0;
    while (next_record(&r, tok, &ntok)) {
        char where[160];
        snprintf(where, sizeof where, "%s:%ld", path, r.lineno);
        double npts_d = 0.0, arg = 0.0, want = 0.0, tol = 0.0;
        if (ntok < 6 || ntok > MAX_TOKENS || !parse_number(tok[1], &npts_d) || npts_d < 0
            || npts_d > 1e6 || !parse_number(tok[2], &arg) || !parse_number(tok[3], &want)
            || !parse_number(tok[5], &tol)) {
            check(0, "%s: malformed block header: %s", where, r.copy);
            fclose(r.fp);
            return; /* the rest of the file cannot be framed */
        }
        blocks++;
        char name[128], kind[32], source[64];
        snprintf(name, sizeof name, "%s", tok[0]);
        snprintf(kind, sizeof kind, "%s", tok[4]);
        snprintf(source, sizeof source, "%s", ntok > 6 ? tok[6] : "?");
        char header[MAX_LINE];
        strcpy(header, r.copy);
        size_t n = (size_t)npts_d;
        double *wl = malloc((n ? n : 1) * sizeof *wl);
        double *resp = malloc((n ? n : 1) * sizeof *resp);
        float *wl32 = malloc((n ? n : 1) * sizeof *wl32);
        float *resp32 = malloc((n ? n : 1) * sizeof *resp32);
        if (!wl || !resp || !wl32 || !resp32) {
            fprintf(stderr, "out of memory\n");
            exit(2);
        }
        int ok = 1, representable = 1;
        for (size_t i = 0; i < n && ok; i++) {
            ok = next_record(&r, tok, &ntok) && ntok == 2 && parse_number(tok[0], &wl[i])
                 && parse_number(tok[1], &resp[i]);
            if (ok) {
                wl32[i] = (float)wl[i];
                resp32[i] = (float)resp[i];
                representable = representable && is_f32_value(wl[i]) && is_f32_value(resp[i]);
            }
        }
        if (!ok) {
            check(0, "%s: block '%s' has a malformed or missing table row", where, header);
            free(wl), free(resp), free(wl32), free(resp32);
            fclose(r.fp);
            return;
        }
        struct rentry *e = NULL;
        for (size_t i = 0; i < RTABLE_LEN; i++) {
            if (strcmp(rtable[i].name, name) == 0) {
                e = &rtable[i];
            }
        }
        if (e == NULL) {
            check(0, "%s: unknown function name '%s' (no C dispatch)", where, name);
        } else if (e->shape == R_F && !(representable && is_f32_value(arg))) {
            check(0, "%s: %s has a table value or argument that is not a float value", where, name);
        } else {
            e->vectors++;
            double got = NAN;
            float got32 = NAN;
            int32_t s;
            if (e->shape == R_D) {
                s = e->d(wl, n, resp, n, arg, &got);
            } else {
                s = e->f(wl32, n, resp32, n, (float)arg, &got32);
                got = (double)got32;
            }
            int is_status = strcmp(kind, "status") == 0;
            if (dump) {
                if (!is_status) {
                    if (e->shape == R_F) {
                        printf("%s %08" PRIx32 "\n", name, bits32(got32));
                    } else {
                        printf("%s %016" PRIx64 "\n", name, bits64(got));
                    }
                }
            } else if (is_status) {
                check(s == (int32_t)tol && isnan(got),
                      "%s: %s status want %d got %d, output %.17e (want NaN) [source %s]", where,
                      name, (int)tol, (int)s, got, source);
            } else {
                int known = 1;
                int pass = s == RELICORE_OK && within(got, want, kind, tol, 1, &known);
                if (!known) {
                    check(0, "%s: unknown tolerance kind '%s'", where, kind);
                } else {
                    check(pass,
                          "%s: %s (%zu points, arg %.17e) want %.17e got %.17e (status %d: %s) "
                          "tolerance %s %.17g [source %s]",
                          where, name, n, arg, want, got, (int)s, relicore_status_message(s), kind,
                          tol, source);
                }
            }
        }
        free(wl);
        free(resp);
        free(wl32);
        free(resp32);
    }
    fclose(r.fp);
    if (!dump) {
        check(blocks > 0, "%s holds no vectors", path);
    }
}

static void check_coverage(void)
{
    for (size_t i = 0; i < TABLE_LEN; i++) {
        check(table[i].vectors > 0, "no reference vector for relicore_%s", table[i].name);
    }
    for (size_t i = 0; i < RTABLE_LEN; i++) {
        check(rtable[i].vectors > 0, "no reference vector for relicore_%s", rtable[i].name);
    }
}

/* ------------------------------------------------------------------------------------------ */
/* Interface checks                                                                            */
/* ------------------------------------------------------------------------------------------ */

static void check_null_scalars(void)
{
    /* every scalar function with a NULL out: -1 whatever the other arguments */
    for (size_t i = 0; i < TABLE_LEN; i++) {
        const struct entry *e = &table[i];
        int32_t s = 0;
        switch (e->shape) {
        case S_D1: s = e->fn.d1(300.0, NULL); break;
        case S_D2: s = e->fn.d2(1e-5, 300.0, NULL); break;
        case S_D3: s = e->fn.d3(1e-6, 2e-6, 300.0, NULL); break;
        case S_D4: s = e->fn.d4(1e-6, 2e-6, 1.0, 1.0, NULL); break;
        case S_F1: s = e->fn.f1(300.0f, NULL); break;
        case S_F2: s = e->fn.f2(1e-5f, 300.0f, NULL); break;
        case S_F3: s = e->fn.f3(1e-6f, 2e-6f, 300.0f, NULL); break;
        case S_F4: s = e->fn.f4(1e-6f, 2e-6f, 1.0f, 1.0f, NULL); break;
        case S_CAL: {
            struct relicore_two_load_calibration cal;
            int32_t c = relicore_two_load_calibration(90e9, 2.0, 300.0, 1.0, 77.0, &cal);
            check(c == RELICORE_OK, "two_load_calibration on valid loads returned %d", (int)c);
            s = e->fn.cal(&cal, 1.5, NULL);
            double t = 0.0;
            int32_t s2 = e->fn.cal(NULL, 1.5, &t);
            check(s2 == RELICORE_ERROR_NULL_POINTER && isnan(t),
                  "relicore_%s(NULL calibration) returned %d, output %g", e->name, (int)s2, t);
            break;
        }
        case S_CALF: {
            struct relicore_two_load_calibration_f32 cal;
            int32_t c = relicore_two_load_calibration_f32(90e9f, 2.0f, 300.0f, 1.0f, 77.0f, &cal);
            check(c == RELICORE_OK, "two_load_calibration_f32 on valid loads returned %d", (int)c);
            s = e->fn.calf(&cal, 1.5f, NULL);
            float t = 0.0f;
            int32_t s2 = e->fn.calf(NULL, 1.5f, &t);
            check(s2 == RELICORE_ERROR_NULL_POINTER && isnan(t),
                  "relicore_%s(NULL calibration) returned %d, output %g", e->name, (int)s2,
                  (double)t);
            break;
        }
        }
        check(s == RELICORE_ERROR_NULL_POINTER, "relicore_%s(..., NULL) returned %d, want %d",
              e->name, (int)s, (int)RELICORE_ERROR_NULL_POINTER);
    }
    check(relicore_two_load_calibration(90e9, 2.0, 300.0, 1.0, 77.0, NULL)
              == RELICORE_ERROR_NULL_POINTER,
          "relicore_two_load_calibration(..., NULL)");
    check(relicore_two_load_calibration_f32(90e9f, 2.0f, 300.0f, 1.0f, 77.0f, NULL)
              == RELICORE_ERROR_NULL_POINTER,
          "relicore_two_load_calibration_f32(..., NULL)");
}

/* Array forms of two-argument functions: the array at position pos (0: out[i] = f(x[i], c),
 * 1: out[i] = f(c, x[i])), c fixed. The typical value of the array variable and the fixed
 * argument are the arguments of the scalar function's first value line in the data file. */
typedef int32_t (*ad0_fn)(const double *, size_t, double, double *);
typedef int32_t (*ad1_fn)(double, const double *, size_t, double *);
typedef int32_t (*af0_fn)(const float *, size_t, float, float *);
typedef int32_t (*af1_fn)(float, const float *, size_t, float *);
struct aentry {
    const char *name;   /* the array form, without relicore_ */
    const char *scalar; /* its scalar function in table[] */
    int is_f32;
    int pos;
    union {
        ad0_fn d0;
        ad1_fn d1;
        af0_fn f0;
        af1_fn f1;
    } fn;
    union {
        d2_fn d;
        f2_fn f;
    } one; /* the scalar function each element must agree with */
};
#define AD0(n) { #n "_array", #n, 0, 0, { .d0 = relicore_##n##_array }, { .d = relicore_##n } }
#define AD1(n) { #n "_array", #n, 0, 1, { .d1 = relicore_##n##_array }, { .d = relicore_##n } }
#define AF0(n) \
    { #n "_array_f32", #n "_f32", 1, 0, { .f0 = relicore_##n##_array_f32 }, \
      { .f = relicore_##n##_f32 } }
#define AF1(n) \
    { #n "_array_f32", #n "_f32", 1, 1, { .f1 = relicore_##n##_array_f32 }, \
      { .f = relicore_##n##_f32 } }
#define DOUBLE_ARRAY(n, k, pos) AD##pos(n),
#define FLOAT_ARRAY(n, k, pos) AF##pos(n),
static const struct aentry atable[] = {
    RELICORE_BLACKBODY_ARRAYS(DOUBLE_ARRAY)
    RELICORE_BLACKBODY_ARRAYS_F32(FLOAT_ARRAY)
};
#define ATABLE_LEN (sizeof atable / sizeof atable[0])

#define NA 12
/* multipliers of the typical value; the bad ones make single elements fail */
static const double amul[NA] = { 0.01, 0.1, 0.5, 1.0, -1.0, 2.0, 0.0, 10.0, NAN, 100.0, INFINITY, 3.3 };

static int32_t call_array(const struct aentry *a, const void *x, size_t n, double fixed, void *out)
{
    if (a->is_f32) {
        return a->pos == 0 ? a->fn.f0((const float *)x, n, (float)fixed, (float *)out)
                           : a->fn.f1((float)fixed, (const float *)x, n, (float *)out);
    }
    return a->pos == 0 ? a->fn.d0((const double *)x, n, fixed, (double *)out)
                       : a->fn.d1(fixed, (const double *)x, n, (double *)out);
}

static int32_t call_scalar(const struct aentry *a, double xi, double fixed, double *out)
{
    double first = a->pos == 0 ? xi : fixed, second = a->pos == 0 ? fixed : xi;
    if (a->is_f32) {
        float o = NAN;
        int32_t s = a->one.f((float)first, (float)second, &o);
        *out = (double)o;
        return s;
    }
    return a->one.d(first, second, out);
}

static int same_bits(const struct aentry *a, const void *p, size_t i, double scalar_result)
{
    if (a->is_f32) {
        float v = ((const float *)p)[i];
        float w = (float)scalar_result;
        return bits32(v) == bits32(w) || (isnan(v) && isnan(w));
    }
    double v = ((const double *)p)[i];
    return bits64(v) == bits64(scalar_result) || (isnan(v) && isnan(scalar_result));
}

static int is_nan_at(const struct aentry *a, const void *p, size_t i)
{
    return a->is_f32 ? isnan(((const float *)p)[i]) : isnan(((const double *)p)[i]);
}

static void check_arrays(void)
{
    for (size_t k = 0; k < ATABLE_LEN; k++) {
        const struct aentry *a = &atable[k];
        const struct entry *one = find_entry(a->scalar);
        if (one == NULL || !one->has_sample || shape_nargs[one->shape] != 2) {
            check(0, "relicore_%s: no value line of %s to take its arguments from", a->name,
                  a->scalar);
            continue;
        }
        const double scale = one->sample[a->pos];     /* typical value of the array variable */
        const double fixed = one->sample[1 - a->pos]; /* the other argument */
        double xd[NA], od[NA];
        float xf[NA], of[NA];
        void *x = a->is_f32 ? (void *)xf : (void *)xd;
        void *o = a->is_f32 ? (void *)of : (void *)od;
        for (int i = 0; i < NA; i++) {
            xd[i] = amul[i] * scale;
            xf[i] = (float)xd[i];
            od[i] = 7.0;
            of[i] = 7.0f;
        }
        /* element-wise agreement with the scalar call, first error code, NaN elements */
        int32_t s = call_array(a, x, NA, fixed, o);
        int32_t first = RELICORE_OK;
        int agree = 1, nan_ok = 1;
        for (int i = 0; i < NA; i++) {
            double xi = a->is_f32 ? (double)xf[i] : xd[i];
            double r = NAN;
            int32_t si = call_scalar(a, xi, fixed, &r);
            if (si != RELICORE_OK && first == RELICORE_OK) {
                first = si;
            }
            agree = agree && same_bits(a, o, (size_t)i, r);
            nan_ok = nan_ok && (si == RELICORE_OK || is_nan_at(a, o, (size_t)i));
        }
        check(agree, "relicore_%s: elements differ from the scalar calls", a->name);
        check(nan_ok, "relicore_%s: a failing element is not NaN", a->name);
        check(first != RELICORE_OK && s == first,
              "relicore_%s: returned %d, the first failing element gives %d", a->name, (int)s,
              (int)first);

        /* in place (out == x) gives the same bits */
        double xd2[NA];
        float xf2[NA];
        memcpy(xd2, xd, sizeof xd2);
        memcpy(xf2, xf, sizeof xf2);
        void *x2 = a->is_f32 ? (void *)xf2 : (void *)xd2;
        int32_t s2 = call_array(a, x2, NA, fixed, x2);
        int inplace = s2 == s;
        for (int i = 0; i < NA; i++) {
            inplace = inplace && (a->is_f32 ? (bits32(xf2[i]) == bits32(of[i])
                                                  || (isnan(xf2[i]) && isnan(of[i])))
                                            : (bits64(xd2[i]) == bits64(od[i])
                                                  || (isnan(xd2[i]) && isnan(od[i]))));
        }
        check(inplace, "relicore_%s: in-place call differs from the out-of-place one", a->name);

        /* all-valid input returns OK */
        s = call_array(a, x, 4, fixed, o); /* the first four multipliers are valid */
        check(s == RELICORE_OK, "relicore_%s: valid elements returned %d", a->name, (int)s);

        /* an invalid fixed argument fails every element */
        s = call_array(a, x, 4, -1.0, o);
        int all_nan = 1;
        for (size_t i = 0; i < 4; i++) {
            all_nan = all_nan && is_nan_at(a, o, i);
        }
        check(s == RELICORE_ERROR_NON_POSITIVE && all_nan,
              "relicore_%s: negative fixed argument returned %d (want %d), all NaN %d", a->name,
              (int)s, (int)RELICORE_ERROR_NON_POSITIVE, all_nan);

        /* n = 0: OK and nothing written */
        for (int i = 0; i < NA; i++) {
            od[i] = 7.0;
            of[i] = 7.0f;
        }
        s = call_array(a, x, 0, fixed, o);
        check(s == RELICORE_OK && (a->is_f32 ? of[0] == 7.0f : od[0] == 7.0),
              "relicore_%s: n = 0 returned %d or wrote an output", a->name, (int)s);

        /* NULL input: -1 and every output NaN; NULL output: -1 */
        s = call_array(a, NULL, 4, fixed, o);
        all_nan = 1;
        for (size_t i = 0; i < 4; i++) {
            all_nan = all_nan && is_nan_at(a, o, i);
        }
        check(s == RELICORE_ERROR_NULL_POINTER && all_nan,
              "relicore_%s: NULL input returned %d, outputs NaN %d", a->name, (int)s, all_nan);
        s = call_array(a, x, 4, fixed, NULL);
        check(s == RELICORE_ERROR_NULL_POINTER, "relicore_%s: NULL output returned %d", a->name,
              (int)s);
        s = call_array(a, NULL, 0, fixed, o);
        check(s == RELICORE_ERROR_NULL_POINTER, "relicore_%s: NULL input with n = 0 returned %d",
              a->name, (int)s);
    }
}

static void check_response(void)
{
    const double wl[5] = { 8e-6, 9e-6, 10e-6, 11e-6, 12e-6 };
    const double rs[5] = { 0.0, 0.8, 1.0, 0.7, 0.0 };
    const float wl32[5] = { 8e-6f, 9e-6f, 10e-6f, 11e-6f, 12e-6f };
    const float rs32[5] = { 0.0f, 0.8f, 1.0f, 0.7f, 0.0f };
    double out = 0.0, radiance = 0.0;
    float out32 = 0.0f;

    int32_t s = relicore_response_weighted_radiance(wl, 5, rs, 5, 300.0, &radiance);
    check(s == RELICORE_OK && radiance > 0.0, "response_weighted_radiance on a valid table: %d",
          (int)s);
    s = relicore_temperature_from_response_weighted_radiance(wl, 5, rs, 5, radiance, &out);
    check(s == RELICORE_OK && fabs(out - 300.0) <= 1e-12 * 300.0,
          "response round trip: status %d, T %.17e (want 300 within 1e-12 relative)", (int)s, out);

    /* NULL for each pointer: -1 and NaN out */
    struct {
        const double *w, *r;
        double *o;
        const char *what;
    } nulls[] = { { NULL, rs, &out, "wavelengths" }, { wl, NULL, &out, "response" },
                  { wl, rs, NULL, "out" } };
    for (size_t i = 0; i < 3; i++) {
        out = 1.0;
        s = relicore_response_weighted_radiance(nulls[i].w, 5, nulls[i].r, 5, 300.0, nulls[i].o);
        check(s == RELICORE_ERROR_NULL_POINTER && (nulls[i].o == NULL || isnan(out)),
              "response_weighted_radiance with NULL %s returned %d", nulls[i].what, (int)s);
        out = 1.0;
        s = relicore_temperature_from_response_weighted_radiance(nulls[i].w, 5, nulls[i].r, 5,
                                                                 radiance, nulls[i].o);
        check(s == RELICORE_ERROR_NULL_POINTER && (nulls[i].o == NULL || isnan(out)),
              "temperature_from_response_weighted_radiance with NULL %s returned %d",
              nulls[i].what, (int)s);
    }
    out32 = 1.0f;
    s = relicore_response_weighted_radiance_f32(NULL, 5, rs32, 5, 300.0f, &out32);
    check(s == RELICORE_ERROR_NULL_POINTER && isnan(out32), "response_weighted_radiance_f32 NULL");
    s = relicore_response_weighted_radiance_f32(wl32, 5, NULL, 5, 300.0f, &out32);
    check(s == RELICORE_ERROR_NULL_POINTER, "response_weighted_radiance_f32 NULL response");
    s = relicore_response_weighted_radiance_f32(wl32, 5, rs32, 5, 300.0f, NULL);
    check(s == RELICORE_ERROR_NULL_POINTER, "response_weighted_radiance_f32 NULL out");
    out32 = 1.0f;
    s = relicore_temperature_from_response_weighted_radiance_f32(NULL, 5, rs32, 5, 1.0f, &out32);
    check(s == RELICORE_ERROR_NULL_POINTER && isnan(out32),
          "temperature_from_response_weighted_radiance_f32 NULL wavelengths");
    s = relicore_temperature_from_response_weighted_radiance_f32(wl32, 5, NULL, 5, 1.0f, &out32);
    check(s == RELICORE_ERROR_NULL_POINTER,
          "temperature_from_response_weighted_radiance_f32 NULL response");
    s = relicore_temperature_from_response_weighted_radiance_f32(wl32, 5, rs32, 5, 1.0f, NULL);
    check(s == RELICORE_ERROR_NULL_POINTER,
          "temperature_from_response_weighted_radiance_f32 NULL out");

    /* lengths: too short, mismatched */
    struct {
        size_t nw, nr;
        int32_t want;
    } lens[] = { { 0, 0, RELICORE_ERROR_ARRAY_TOO_SHORT },
                 { 1, 1, RELICORE_ERROR_ARRAY_TOO_SHORT },
                 { 5, 4, RELICORE_ERROR_LENGTH_MISMATCH },
                 { 4, 5, RELICORE_ERROR_LENGTH_MISMATCH },
                 { 2, 0, RELICORE_ERROR_LENGTH_MISMATCH } };
    for (size_t i = 0; i < sizeof lens / sizeof lens[0]; i++) {
        out = 1.0;
        s = relicore_response_weighted_radiance(wl, lens[i].nw, rs, lens[i].nr, 300.0, &out);
        check(s == lens[i].want && isnan(out),
              "response_weighted_radiance lengths %zu/%zu returned %d, want %d", lens[i].nw,
              lens[i].nr, (int)s, (int)lens[i].want);
        out = 1.0;
        s = relicore_temperature_from_response_weighted_radiance(wl, lens[i].nw, rs, lens[i].nr,
                                                                 radiance, &out);
        check(s == lens[i].want && isnan(out),
              "temperature_from_response_weighted_radiance lengths %zu/%zu returned %d, want %d",
              lens[i].nw, lens[i].nr, (int)s, (int)lens[i].want);
        out32 = 1.0f;
        s = relicore_response_weighted_radiance_f32(wl32, lens[i].nw, rs32, lens[i].nr, 300.0f,
                                                    &out32);
        check(s == lens[i].want && isnan(out32),
              "response_weighted_radiance_f32 lengths %zu/%zu returned %d, want %d", lens[i].nw,
              lens[i].nr, (int)s, (int)lens[i].want);
    }

    /* non-increasing grids: a repeated and a decreasing wavelength */
    const double flat[5] = { 8e-6, 9e-6, 9e-6, 11e-6, 12e-6 };
    const double down[5] = { 8e-6, 9e-6, 10e-6, 9.5e-6, 12e-6 };
    const float down32[5] = { 8e-6f, 9e-6f, 10e-6f, 9.5e-6f, 12e-6f };
    const double *bad_grids[2] = { flat, down };
    for (size_t i = 0; i < 2; i++) {
        out = 1.0;
        s = relicore_response_weighted_radiance(bad_grids[i], 5, rs, 5, 300.0, &out);
        check(s == RELICORE_ERROR_NOT_INCREASING && isnan(out),
              "response_weighted_radiance on non-increasing grid %zu returned %d", i, (int)s);
        out = 1.0;
        s = relicore_temperature_from_response_weighted_radiance(bad_grids[i], 5, rs, 5, radiance,
                                                                 &out);
        check(s == RELICORE_ERROR_NOT_INCREASING && isnan(out),
              "temperature_from_response_weighted_radiance on non-increasing grid %zu returned %d",
              i, (int)s);
    }
    out32 = 1.0f;
    s = relicore_temperature_from_response_weighted_radiance_f32(down32, 5, rs32, 5, 1.0f, &out32);
    check(s == RELICORE_ERROR_NOT_INCREASING && isnan(out32),
          "temperature_from_response_weighted_radiance_f32 on a decreasing grid returned %d",
          (int)s);

    /* negative response, non-finite response, zero response for the inverse, bad temperature */
    const double neg[5] = { 0.0, 0.8, -0.1, 0.7, 0.0 };
    const double inf_r[5] = { 0.0, 0.8, INFINITY, 0.7, 0.0 };
    const double zero[5] = { 0.0, 0.0, 0.0, 0.0, 0.0 };
    out = 1.0;
    s = relicore_response_weighted_radiance(wl, 5, neg, 5, 300.0, &out);
    check(s == RELICORE_ERROR_NEGATIVE && isnan(out), "negative response returned %d", (int)s);
    s = relicore_response_weighted_radiance(wl, 5, inf_r, 5, 300.0, &out);
    check(s == RELICORE_ERROR_NON_FINITE && isnan(out), "infinite response returned %d", (int)s);
    s = relicore_temperature_from_response_weighted_radiance(wl, 5, zero, 5, radiance, &out);
    check(s == RELICORE_ERROR_OUT_OF_DOMAIN && isnan(out),
          "all-zero response in the inverse returned %d", (int)s);
    s = relicore_response_weighted_radiance(wl, 5, rs, 5, 0.0, &out);
    check(s == RELICORE_ERROR_NON_POSITIVE && isnan(out), "T = 0 returned %d", (int)s);
    s = relicore_temperature_from_response_weighted_radiance(wl, 5, rs, 5, -1.0, &out);
    check(s == RELICORE_ERROR_NON_POSITIVE && isnan(out), "radiance < 0 returned %d", (int)s);
}

static void check_calibration_struct(void)
{
    /* a struct the init function cannot produce is refused as such */
    struct relicore_two_load_calibration zero = { 0.0, 0.0, 0.0 };
    double t = 1.0;
    int32_t s = relicore_calibrated_temperature(&zero, 1.0, &t);
    check(s == RELICORE_ERROR_INVALID_STRUCT && isnan(t),
          "calibrated_temperature on a zeroed struct returned %d", (int)s);
    struct relicore_two_load_calibration_f32 zero32 = { 0.0f, 0.0f, 0.0f };
    float t32 = 1.0f;
    s = relicore_calibrated_brightness_temperature_f32(&zero32, 1.0f, &t32);
    check(s == RELICORE_ERROR_INVALID_STRUCT && isnan(t32),
          "calibrated_brightness_temperature_f32 on a zeroed struct returned %d", (int)s);
    /* degenerate loads: every field NaN */
    struct relicore_two_load_calibration cal = { 1.0, 1.0, 1.0 };
    s = relicore_two_load_calibration(90e9, 2.0, 77.0, 1.0, 300.0, &cal);
    check(s == RELICORE_ERROR_DEGENERATE_CALIBRATION && isnan(cal.frequency_hz) && isnan(cal.gain)
              && isnan(cal.offset),
          "two_load_calibration with T_hot < T_cold returned %d", (int)s);
    /* a reading below the zero-radiance level has no physical temperature */
    s = relicore_two_load_calibration(90e9, 2.0, 300.0, 1.0, 77.0, &cal);
    check(s == RELICORE_OK, "two_load_calibration valid returned %d", (int)s);
    s = relicore_calibrated_temperature(&cal, cal.offset - 1.0, &t);
    check(s == RELICORE_ERROR_OUT_OF_DOMAIN && isnan(t),
          "calibrated_temperature below the zero level returned %d", (int)s);
    /* the output may alias nothing else: a struct and its reading round trip */
    double j = NAN;
    s = relicore_calibrated_brightness_temperature(&cal, 2.0, &j);
    check(s == RELICORE_OK && isfinite(j), "calibrated_brightness_temperature at the hot load");
}

static void check_status_messages(void)
{
    const int32_t codes[] = { RELICORE_OK,
                              RELICORE_ERROR_NULL_POINTER,
                              RELICORE_ERROR_NON_FINITE,
                              RELICORE_ERROR_NON_POSITIVE,
                              RELICORE_ERROR_NEGATIVE,
                              RELICORE_ERROR_EMPTY_INTERVAL,
                              RELICORE_ERROR_ARRAY_TOO_SHORT,
                              RELICORE_ERROR_LENGTH_MISMATCH,
                              RELICORE_ERROR_NOT_INCREASING,
                              RELICORE_ERROR_DEGENERATE_CALIBRATION,
                              RELICORE_ERROR_OUT_OF_DOMAIN,
                              RELICORE_ERROR_NO_CONVERGENCE,
                              RELICORE_ERROR_INVALID_STRUCT,
                              RELICORE_ERROR_PANIC,
                              RELICORE_ERROR_INVALID_PARAMETER,
                              RELICORE_ERROR_NO_BIG_BANG,
                              RELICORE_ERROR_CAPACITY_TOO_SMALL };
    const size_t n = sizeof codes / sizeof codes[0];
    for (size_t i = 0; i < n; i++) {
        check(codes[i] == -(int32_t)i, "status constant %zu is %d, FORMAT.md says %d", i,
              (int)codes[i], -(int)i);
    }
    const char *unknown = relicore_status_message(1);
    check(unknown != NULL && strcmp(unknown, "unknown status") == 0,
          "message of an unknown code is '%s'", unknown ? unknown : "(NULL)");
    const int32_t others[] = { -17, 2, INT32_MIN, INT32_MAX };
    for (size_t i = 0; i < sizeof others / sizeof others[0]; i++) {
        const char *m = relicore_status_message(others[i]);
        check(m != NULL && strcmp(m, "unknown status") == 0, "message of code %d is '%s'",
              (int)others[i], m ? m : "(NULL)");
    }
    for (size_t i = 0; i < n; i++) {
        const char *a = relicore_status_message(codes[i]);
        check(a != NULL && a[0] != '\0' && strcmp(a, "unknown status") != 0,
              "code %d has no message of its own", (int)codes[i]);
        for (size_t k = i + 1; k < n && a != NULL; k++) {
            const char *b = relicore_status_message(codes[k]);
            check(b != NULL && strcmp(a, b) != 0, "codes %d and %d share the message '%s'",
                  (int)codes[i], (int)codes[k], a);
        }
    }
    char version[64];
    snprintf(version, sizeof version, "%d.%d.%d", (int)RELICORE_VERSION_MAJOR,
             (int)RELICORE_VERSION_MINOR, (int)RELICORE_VERSION_PATCH);
    const char *v = relicore_version();
    check(v != NULL && strcmp(v, version) == 0, "relicore_version() '%s' differs from %s",
          v ? v : "(NULL)", version);
    /* header constants are usable as double constant expressions */
    static const double c2 = RELICORE_SECOND_RADIATION;
    const double hc_over_k = RELICORE_PLANCK * RELICORE_SPEED_OF_LIGHT / RELICORE_BOLTZMANN;
    check(fabs(c2 - hc_over_k) <= 4 * DBL_EPSILON * c2,
          "RELICORE_SECOND_RADIATION %.17e differs from hc/k %.17e", c2, hc_over_k);
}

int main(int argc, char **argv)
{
    if (argc >= 3 && strcmp(argv[1], "--dump") == 0 && argc <= 4) {
        run_scalar_file(argv[2], 1);
        if (argc == 4) {
            run_response_file(argv[3], 1);
        }
        if (g_failed > 0) {
            fprintf(stderr, "%ld problems while dumping\n", g_failed);
            return 1;
        }
        return 0;
    }
    if (argc != 3) {
        fprintf(stderr,
                "usage: %s SCALAR_FILE RESPONSE_FILE\n"
                "       %s --dump SCALAR_FILE [RESPONSE_FILE]\n",
                argv[0], argv[0]);
        return 2;
    }
    run_scalar_file(argv[1], 0);
    run_response_file(argv[2], 0);
    long vectors = g_passed + g_failed;
    check_coverage();
    check_null_scalars();
    check_arrays();
    check_response();
    check_calibration_struct();
    check_status_messages();
    printf("data-file checks: %ld; interface checks: %ld\n", vectors,
           g_passed + g_failed - vectors);
    printf("%ld passed, %ld failed\n", g_passed, g_failed);
    return g_failed == 0 && g_passed > 0 ? 0 : 1;
}
