/*
 * Hostile-input harness of the relicore C ABI, built with AddressSanitizer and
 * UndefinedBehaviorSanitizer by tests/c/run.sh. The regular functions come from the lists of
 * tests/c/gen_functions.h (generated from bindings/functions.toml), with the domain the table
 * states for each argument; the irregular ones (calibration, response tables, universe init
 * and parameters, thermal-history compute and options, messages, version) are called by name.
 *
 *   hostile_abi [--calls N] [--seed S] [--no-uninit]
 *
 * Calls every function of include/relicore.h at least N times (default 100000) with random
 * and edge-case arguments: NaN of both signs, +-inf, +-0, subnormals, the largest values, raw
 * bit patterns, log-uniform magnitudes of every scale of either sign; NULL for every pointer;
 * arrays of exact heap size (so any read or write past the end is a sanitizer report; a
 * length-0 array is a 1-element buffer that must stay untouched), of length 0, transformed in place, and (response tables) of mismatched lengths; forged
 * calibration structs; and universe structs that relicore_universe_init did not produce:
 * uninitialised heap memory, zeroed, random bytes, cleared by a failed init, a valid universe
 * with one bit of its validity tag flipped (all must be refused with
 * RELICORE_ERROR_INVALID_STRUCT), and a valid universe with random storage words overwritten
 * behind an intact tag (undetectable by the tag: that case must only stay free of crashes,
 * sanitizer reports and undocumented codes). Thermal histories get the same kinds (computed,
 * copied, NULL, uninitialised, zeroed, random, cleared by a failed compute, tag bit flipped,
 * storage overwritten); relicore_thermal_history_compute gets hostile options and universes
 * (all but about 1 call in 2000 carry something it must refuse: a compute costs milliseconds),
 * and every failed compute must leave the struct cleared.
 *
 * Asserts for every call: the status is 0 or a documented negative code (never PANIC, never an
 * unknown number); a success writes a finite value; an argument outside the domain the table
 * states (NaN, not > 0, < 0, above an upper bound) is not a success, and a history query above
 * the highest redshift of every table is RELICORE_ERROR_OUT_OF_DOMAIN; a failure writes NaN to
 * every output (every field of a struct); NULL pointers give exactly
 * RELICORE_ERROR_NULL_POINTER, an unproduced universe exactly RELICORE_ERROR_INVALID_STRUCT; an
 * array form gives, element by element, the same bits and status as the scalar function and
 * returns the first failing element's code; n = 0 writes nothing; a failed init clears the
 * struct (tag and storage 0); relicore_universe_check_parameters agrees with init;
 * get_parameters returns what init got.
 *
 * --no-uninit skips the uninitialised-memory struct (for memcheck, which reports any read of
 * uninitialised memory, although reading the tag of such a struct is what the library must
 * do to refuse it).
 *
 * Prints the number of calls and the status counts per function, then
 * "hostile: N calls, M checks: P passed, F failed"; exit status 0 only if nothing failed.
 */

#include <float.h>
#include <inttypes.h>
#include <math.h>
#include <stdarg.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "gen_functions.h"
#include "relicore.h"

/* ------------------------------------------------------------------------------------------ */
/* Bookkeeping                                                                                 */
/* ------------------------------------------------------------------------------------------ */

#define NCODES 17 /* statuses 0 .. -16 */

struct stats {
    const char *name;
    long calls;
    long status[NCODES];
};

#define MAX_EXPORTS 160
static struct stats g_stats[MAX_EXPORTS];
static int g_nstats = 0;
static long g_checks = 0;
static long g_failed = 0;
static long g_calls = 0;

static struct stats *stats_for(const char *name)
{
    for (int i = 0; i < g_nstats; i++) {
        if (strcmp(g_stats[i].name, name) == 0) {
            return &g_stats[i];
        }
    }
    if (g_nstats == MAX_EXPORTS) {
        fprintf(stderr, "too many exports\n");
        exit(2);
    }
    g_stats[g_nstats].name = name;
    return &g_stats[g_nstats++];
}

static void check(int ok, const char *fmt, ...)
{
    g_checks++;
    if (ok) {
        return;
    }
    g_failed++;
    if (g_failed > 50) {
        return;
    }
    va_list ap;
    va_start(ap, fmt);
    fputs("FAIL ", stdout);
    vprintf(fmt, ap);
    fputc('\n', stdout);
    va_end(ap);
}

/* A documented status of the header: 0 or -1 .. -16, except PANIC (a bug by definition). */
static int documented(int32_t st)
{
    return st <= 0 && st >= RELICORE_ERROR_CAPACITY_TOO_SMALL && st != RELICORE_ERROR_PANIC;
}

/* Records one call of `name` with status `st` and checks that the status is documented. */
static void record(const char *name, int32_t st)
{
    struct stats *s = stats_for(name);
    s->calls++;
    g_calls++;
    if (st <= 0 && st > -NCODES) {
        s->status[-st]++;
    }
    check(documented(st), "%s returned %" PRId32 " (%s), not a documented status", name, st,
          relicore_status_message(st));
}

/* The contract of one double output: finite on success, NaN on failure. */
static void check_out(const char *name, int32_t st, double out, const char *args)
{
    if (st == RELICORE_OK) {
        check(isfinite(out), "%s(%s) = OK with %.17g: a success must be finite", name, args, out);
    } else {
        check(isnan(out), "%s(%s) = %" PRId32 " with %.17g: a failure must write NaN", name, args,
              st, out);
    }
}

static void check_outf(const char *name, int32_t st, float out, const char *args)
{
    check_out(name, st, (double)out, args);
}

/* ------------------------------------------------------------------------------------------ */
/* Random and hostile values (xorshift64*, deterministic from the seed)                        */
/* ------------------------------------------------------------------------------------------ */

static uint64_t g_rng = 0x9e3779b97f4a7c15u;

static uint64_t next_u64(void)
{
    g_rng ^= g_rng >> 12;
    g_rng ^= g_rng << 25;
    g_rng ^= g_rng >> 27;
    return g_rng * 0x2545f4914f6cdd1du;
}

static double uniform(void) /* [0, 1) */
{
    return (double)(next_u64() >> 11) * 0x1.0p-53;
}

static unsigned below(unsigned n)
{
    return (unsigned)(next_u64() % n);
}

static const double SPECIAL[] = {
    NAN, -NAN, INFINITY, -INFINITY, 0.0, -0.0, 4.9406564584124654e-324, -4.9406564584124654e-324,
    2.2250738585072009e-308, DBL_MIN, -DBL_MIN, DBL_MAX, -DBL_MAX, 1e300, 1e-300, DBL_EPSILON,
    1.0, -1.0, 0.5, 2.7255, 1e-6, 1e4,
};
#define NSPECIAL (sizeof SPECIAL / sizeof SPECIAL[0])

/* Any double: a special value, raw bits, or log-uniform 1e-40 .. 1e40 of either sign. */
static double any_double(void)
{
    switch (below(10)) {
    case 0:
    case 1:
    case 2: return SPECIAL[below(NSPECIAL)];
    case 3: {
        uint64_t b = next_u64();
        double d;
        memcpy(&d, &b, sizeof d);
        return d;
    }
    case 4: return -pow(10.0, -40.0 + 80.0 * uniform());
    default: return pow(10.0, -40.0 + 80.0 * uniform());
    }
}

/* A physical-scale positive value (so that successful paths are common too). */
static double ordinary(double lo_exp, double hi_exp)
{
    return pow(10.0, lo_exp + (hi_exp - lo_exp) * uniform());
}

/* Arguments of a blackbody function: hostile most of the time, physical some of the time. */
static double arg_double(double lo_exp, double hi_exp)
{
    return below(3) == 0 ? ordinary(lo_exp, hi_exp) : any_double();
}

static float any_float(void)
{
    switch (below(10)) {
    case 0: {
        uint32_t b = (uint32_t)next_u64();
        float f;
        memcpy(&f, &b, sizeof f);
        return f;
    }
    case 1: return 1e-45f;
    case 2: return FLT_MAX;
    default: return (float)any_double();
    }
}

static void describe(char *buf, size_t size, int n, const double *a)
{
    size_t used = 0;
    buf[0] = '\0';
    for (int i = 0; i < n && used + 32 < size; i++) {
        used += (size_t)snprintf(buf + used, size - used, "%s%.17g", i ? ", " : "", a[i]);
    }
}

static int same_bits(double a, double b)
{
    return memcmp(&a, &b, sizeof a) == 0;
}

static int same_bits_f(float a, float b)
{
    return memcmp(&a, &b, sizeof a) == 0;
}

static long g_iterations = 100000;
static int g_uninit = 1;

#define SENTINEL 12345.678

/* ------------------------------------------------------------------------------------------ */
/* The regular functions: the lists of tests/c/gen_functions.h (from bindings/functions.toml)  */
/* ------------------------------------------------------------------------------------------ */

/* The topic of a function picks its argument generators and, for a receiver, its universes
 * (the decoupling functions of a universe need one with baryons). */
enum topic { T_BLACKBODY, T_COSMOLOGY, T_DECOUPLING };

typedef int32_t (*s1_fn)(double, double *);
typedef int32_t (*s2_fn)(double, double, double *);
typedef int32_t (*s3_fn)(double, double, double, double *);
typedef int32_t (*s4_fn)(double, double, double, double, double *);
typedef int32_t (*f1_fn)(float, float *);
typedef int32_t (*f2_fn)(float, float, float *);
typedef int32_t (*f3_fn)(float, float, float, float *);
typedef int32_t (*f4_fn)(float, float, float, float, float *);
typedef int32_t (*a0_fn)(const double *, size_t, double, double *); /* array first */
typedef int32_t (*a1_fn)(double, const double *, size_t, double *); /* array second */
typedef int32_t (*fa0_fn)(const float *, size_t, float, float *);
typedef int32_t (*fa1_fn)(float, const float *, size_t, float *);

/* A scalar form without a receiver; domain and upper as in gen_functions.h. */
struct free_fn {
    const char *name;
    enum topic topic;
    int nargs;
    const char *domain;
    double upper;
    union {
        s1_fn s1;
        s2_fn s2;
        s3_fn s3;
        s4_fn s4;
        f1_fn f1;
        f2_fn f2;
        f3_fn f3;
        f4_fn f4;
    } f;
};
#define FREE(t, n, k, domain, upper) \
    { "relicore_" #n, t, k, domain, upper, { .s##k = relicore_##n } },
#define FREE32(t, n, k, domain, upper) \
    { "relicore_" #n "_f32", t, k, domain, upper, { .f##k = relicore_##n##_f32 } },
#define BB_FREE(n, k, domain, upper, array) FREE(T_BLACKBODY, n, k, domain, upper)
#define CO_FREE(n, k, domain, upper, array) FREE(T_COSMOLOGY, n, k, domain, upper)
#define DC_FREE(n, k, domain, upper, array) FREE(T_DECOUPLING, n, k, domain, upper)
#define BB_FREE32(n, k, domain, upper, array) FREE32(T_BLACKBODY, n, k, domain, upper)
#define CO_FREE32(n, k, domain, upper, array) FREE32(T_COSMOLOGY, n, k, domain, upper)
#define DC_FREE32(n, k, domain, upper, array) FREE32(T_DECOUPLING, n, k, domain, upper)
static const struct free_fn FREE_FNS[] = {
    RELICORE_BLACKBODY_SCALARS(BB_FREE)
    RELICORE_COSMOLOGY_SCALARS(CO_FREE)
    RELICORE_DECOUPLING_SCALARS(DC_FREE)
};
static const struct free_fn FREE_FNS32[] = {
    RELICORE_BLACKBODY_SCALARS_F32(BB_FREE32)
    RELICORE_COSMOLOGY_SCALARS_F32(CO_FREE32)
    RELICORE_DECOUPLING_SCALARS_F32(DC_FREE32)
};
#define LEN(a) (sizeof(a) / sizeof((a)[0]))

/* One scalar call through a possibly-NULL output: NULL gives exactly NULL_POINTER. */
static int null_out(void)
{
    return below(16) == 0;
}

/* Physical scales (decimal exponents) of argument i of an nargs-argument function without a
 * receiver: blackbody spectral coordinates and temperatures (1 argument: a temperature or a
 * peak coordinate; 3: band edges and a temperature; 4: two wavelengths, a radiance ratio and
 * an emissivity ratio), the fits' Omega_b h^2 and Omega_m h^2; wide for anything else. */
static void physical_range(enum topic t, int nargs, int i, double *lo, double *hi)
{
    static const double bb[5][4][2] = {
        { { 0 } },
        { { -2.0, 8.0 } },
        { { -9.0, 15.0 }, { -2.0, 8.0 } },
        { { -8.0, 0.0 }, { -8.0, 0.0 }, { -2.0, 8.0 } },
        { { -7.0, -3.0 }, { -7.0, -3.0 }, { -3.0, 3.0 }, { -1.0, 1.0 } },
    };
    static const double fits[2][2] = { { -3.0, 0.0 }, { -2.0, 1.0 } };
    *lo = -9.0;
    *hi = 15.0;
    if (t == T_BLACKBODY && nargs >= 1 && nargs <= 4 && i < nargs) {
        *lo = bb[nargs][i][0];
        *hi = bb[nargs][i][1];
    } else if (t == T_DECOUPLING && nargs == 2 && i < 2) {
        *lo = fits[i][0];
        *hi = fits[i][1];
    }
}

/* Arguments of a function without a receiver: each hostile most of the time, physical some of
 * the time; the blackbody band functions also get a zero lower edge and an infinite upper one. */
static void free_args(enum topic t, int nargs, double *a)
{
    for (int i = 0; i < nargs; i++) {
        double lo, hi;
        physical_range(t, nargs, i, &lo, &hi);
        a[i] = arg_double(lo, hi);
    }
    if (t == T_BLACKBODY && nargs == 3) {
        if (below(4) == 0) {
            a[0] = 0.0;
        }
        if (below(4) == 0) {
            a[1] = INFINITY;
        }
    }
}

/* Float arguments: any float each, or (1 in 3) all of a physical scale. */
static void free_args32(enum topic t, int nargs, float *a)
{
    int physical = below(3) == 0;
    for (int i = 0; i < nargs; i++) {
        double lo, hi;
        physical_range(t, nargs, i, &lo, &hi);
        a[i] = physical ? (float)ordinary(lo, hi) : any_float();
    }
}

/* Outside the domain the table states (gen_functions.h): a NaN argument, a letter 'p' with
 * a <= 0, 'n' or 'h' with a < 0, or a first argument above its upper bound. */
static int outside_domain(const char *domain, double upper, int nargs, const double *a)
{
    for (int i = 0; i < nargs; i++) {
        char d = domain[i];
        if (isnan(a[i]) || (d == 'p' && !(a[i] > 0.0)) || ((d == 'n' || d == 'h') && a[i] < 0.0)
            || (i == 0 && a[i] > upper)) {
            return 1;
        }
    }
    return 0;
}

static int32_t call_free(const struct free_fn *e, const double *a, double *out)
{
    switch (e->nargs) {
    case 1: return e->f.s1(a[0], out);
    case 2: return e->f.s2(a[0], a[1], out);
    case 3: return e->f.s3(a[0], a[1], a[2], out);
    default: return e->f.s4(a[0], a[1], a[2], a[3], out);
    }
}

static int32_t call_free32(const struct free_fn *e, const float *a, float *out)
{
    switch (e->nargs) {
    case 1: return e->f.f1(a[0], out);
    case 2: return e->f.f2(a[0], a[1], out);
    case 3: return e->f.f3(a[0], a[1], a[2], out);
    default: return e->f.f4(a[0], a[1], a[2], a[3], out);
    }
}

static void hostile_free_scalars(void)
{
    char args[256];
    for (long it = 0; it < g_iterations; it++) {
        for (size_t k = 0; k < LEN(FREE_FNS); k++) {
            const struct free_fn *e = &FREE_FNS[k];
            double a[4] = { 0.0, 0.0, 0.0, 0.0 };
            free_args(e->topic, e->nargs, a);
            double out = SENTINEL;
            int nul = null_out();
            int32_t st = call_free(e, a, nul ? NULL : &out);
            record(e->name, st);
            describe(args, sizeof args, e->nargs, a);
            if (nul) {
                check(st == RELICORE_ERROR_NULL_POINTER, "%s(%s, NULL) = %" PRId32, e->name, args,
                      st);
            } else {
                check_out(e->name, st, out, args);
                if (outside_domain(e->domain, e->upper, e->nargs, a)) {
                    check(st != RELICORE_OK, "%s(%s) = OK outside its domain \"%s\"", e->name,
                          args, e->domain);
                }
            }
        }
        for (size_t k = 0; k < LEN(FREE_FNS32); k++) {
            const struct free_fn *e = &FREE_FNS32[k];
            float a[4] = { 0.0f, 0.0f, 0.0f, 0.0f };
            free_args32(e->topic, e->nargs, a);
            float out = (float)SENTINEL;
            int nul = null_out();
            int32_t st = call_free32(e, a, nul ? NULL : &out);
            record(e->name, st);
            double d[4] = { a[0], a[1], a[2], a[3] };
            describe(args, sizeof args, e->nargs, d);
            if (nul) {
                check(st == RELICORE_ERROR_NULL_POINTER, "%s(%s, NULL) = %" PRId32, e->name, args,
                      st);
            } else {
                check_outf(e->name, st, out, args);
                if (outside_domain(e->domain, e->upper, e->nargs, d)) {
                    check(st != RELICORE_OK, "%s(%s) = OK outside its domain \"%s\"", e->name,
                          args, e->domain);
                }
            }
        }
    }
}

/* ------------------------------------------------------------------------------------------ */
/* Array forms: exact-size heap buffers, NULL, n = 0, in place; elements agree with scalars   */
/* ------------------------------------------------------------------------------------------ */

#define MAXN 7

/* The first failing code of a sequence of element statuses (0 if none failed). */
static int32_t first_failure(const int32_t *codes, size_t n)
{
    for (size_t i = 0; i < n; i++) {
        if (codes[i] != RELICORE_OK) {
            return codes[i];
        }
    }
    return RELICORE_OK;
}

/* Calls an array form with hostile pointers and lengths; `call` runs the form on (x, n, out),
 * `scalar` computes element i alone. Returns nothing: every check is counted. */
typedef int32_t (*array_call)(const void *ctx, const double *x, size_t n, double *out);
typedef int32_t (*element_call)(const void *ctx, double x, double *out);

static void hostile_array(const char *name, const void *ctx, array_call call, element_call scalar,
                          double lo_exp, double hi_exp, size_t maxn)
{
    size_t n = below((unsigned)maxn + 1);
    int mode = (int)below(12); /* 0: NULL x, 1: NULL out, 2: both NULL, 3: in place, else plain */
    double *x = calloc(n ? n : 1, sizeof *x);
    double *out = calloc(n ? n : 1, sizeof *out);
    double one = SENTINEL;
    if (x == NULL || out == NULL) {
        fprintf(stderr, "out of memory\n");
        exit(2);
    }
    for (size_t i = 0; i < n; i++) {
        x[i] = arg_double(lo_exp, hi_exp);
        out[i] = SENTINEL;
    }
    int32_t st;
    if (mode == 0) {
        st = call(ctx, NULL, n, out);
        record(name, st);
        check(st == RELICORE_ERROR_NULL_POINTER, "%s(NULL x, n=%zu) = %" PRId32, name, n, st);
        for (size_t i = 0; i < n; i++) {
            check(isnan(out[i]), "%s(NULL x): out[%zu] = %.17g, not NaN", name, i, out[i]);
        }
    } else if (mode == 1 || mode == 2) {
        st = call(ctx, mode == 2 ? NULL : x, n, NULL);
        record(name, st);
        check(st == RELICORE_ERROR_NULL_POINTER, "%s(NULL out, n=%zu) = %" PRId32, name, n, st);
    } else if (n == 0) {
        st = call(ctx, x, 0, &one);
        record(name, st);
        check(st == RELICORE_OK && one == SENTINEL, "%s(n=0) = %" PRId32 ", wrote %.17g", name,
              st, one);
    } else {
        double want[MAXN];
        int32_t codes[MAXN];
        for (size_t i = 0; i < n; i++) {
            want[i] = SENTINEL;
            codes[i] = scalar(ctx, x[i], &want[i]);
        }
        double *dst = mode == 3 ? x : out; /* in place: out is the input buffer */
        st = call(ctx, x, n, dst);
        record(name, st);
        check(st == first_failure(codes, n),
              "%s: returned %" PRId32 ", the first failing element's code is %" PRId32, name, st,
              first_failure(codes, n));
        for (size_t i = 0; i < n; i++) {
            check(same_bits(dst[i], want[i]) || (isnan(dst[i]) && isnan(want[i])),
                  "%s: element %zu = %.17g, the scalar call gives %.17g (status %" PRId32 ")", name,
                  i, dst[i], want[i], codes[i]);
            check((codes[i] == RELICORE_OK) ? isfinite(dst[i]) : isnan(dst[i]),
                  "%s: element %zu = %.17g with element status %" PRId32, name, i, dst[i], codes[i]);
        }
    }
    free(x);
    free(out);
}

/* An array form of a two-argument function without a receiver: the array is argument pos of
 * the scalar function, the other argument c is fixed (out[i] = f(x[i], c) or f(c, x[i])). */
struct free_array {
    const char *name;
    enum topic topic;
    int pos;
    union {
        a0_fn a0;
        a1_fn a1;
        fa0_fn fa0;
        fa1_fn fa1;
    } f;
    union {
        s2_fn s2;
        f2_fn f2;
    } scalar; /* what each element must agree with */
};
#define FARRAY(t, n, pos) \
    { "relicore_" #n "_array", t, pos, { .a##pos = relicore_##n##_array }, { .s2 = relicore_##n } },
#define FARRAY32(t, n, pos) \
    { "relicore_" #n "_array_f32", t, pos, { .fa##pos = relicore_##n##_array_f32 }, \
      { .f2 = relicore_##n##_f32 } },
#define BB_FARRAY(n, k, pos) FARRAY(T_BLACKBODY, n, pos)
#define CO_FARRAY(n, k, pos) FARRAY(T_COSMOLOGY, n, pos)
#define DC_FARRAY(n, k, pos) FARRAY(T_DECOUPLING, n, pos)
#define BB_FARRAY32(n, k, pos) FARRAY32(T_BLACKBODY, n, pos)
#define CO_FARRAY32(n, k, pos) FARRAY32(T_COSMOLOGY, n, pos)
#define DC_FARRAY32(n, k, pos) FARRAY32(T_DECOUPLING, n, pos)
static const struct free_array FREE_ARRAYS[] = {
    RELICORE_BLACKBODY_ARRAYS(BB_FARRAY)
    RELICORE_COSMOLOGY_ARRAYS(CO_FARRAY)
    RELICORE_DECOUPLING_ARRAYS(DC_FARRAY)
};
static const struct free_array FREE_ARRAYS32[] = {
    RELICORE_BLACKBODY_ARRAYS_F32(BB_FARRAY32)
    RELICORE_COSMOLOGY_ARRAYS_F32(CO_FARRAY32)
    RELICORE_DECOUPLING_ARRAYS_F32(DC_FARRAY32)
};

struct fa_ctx {
    const struct free_array *e;
    double c; /* the fixed argument */
};
static int32_t fa_call(const void *ctx, const double *x, size_t n, double *out)
{
    const struct fa_ctx *k = ctx;
    return k->e->pos == 0 ? k->e->f.a0(x, n, k->c, out) : k->e->f.a1(k->c, x, n, out);
}
static int32_t fa_elem(const void *ctx, double x, double *out)
{
    const struct fa_ctx *k = ctx;
    return k->e->pos == 0 ? k->e->scalar.s2(x, k->c, out) : k->e->scalar.s2(k->c, x, out);
}

static int32_t call_float_array(const struct free_array *e, const float *x, size_t n, float c,
                                float *out)
{
    return e->pos == 0 ? e->f.fa0(x, n, c, out) : e->f.fa1(c, x, n, out);
}

static int32_t call_float_elem(const struct free_array *e, float x, float c, float *out)
{
    return e->pos == 0 ? e->scalar.f2(x, c, out) : e->scalar.f2(c, x, out);
}

static void hostile_float_array(const struct free_array *e)
{
    const char *name = e->name;
    double xlo, xhi, clo, chi;
    physical_range(e->topic, 2, e->pos, &xlo, &xhi);
    physical_range(e->topic, 2, 1 - e->pos, &clo, &chi);
    size_t n = below(MAXN + 1);
    float t = below(2) ? any_float() : (float)ordinary(clo, chi);
    float *x = calloc(n ? n : 1, sizeof *x);
    float *out = calloc(n ? n : 1, sizeof *out);
    if (x == NULL || out == NULL) {
        exit(2);
    }
    for (size_t i = 0; i < n; i++) {
        x[i] = below(2) ? any_float() : (float)ordinary(xlo, xhi);
        out[i] = (float)SENTINEL;
    }
    int mode = (int)below(10);
    int32_t st;
    if (mode == 0) {
        st = call_float_array(e, NULL, n, t, out);
        record(name, st);
        check(st == RELICORE_ERROR_NULL_POINTER, "%s(NULL x) = %" PRId32, name, st);
    } else if (mode == 1) {
        st = call_float_array(e, x, n, t, NULL);
        record(name, st);
        check(st == RELICORE_ERROR_NULL_POINTER, "%s(NULL out) = %" PRId32, name, st);
    } else {
        float want[MAXN];
        int32_t codes[MAXN];
        for (size_t i = 0; i < n; i++) {
            codes[i] = call_float_elem(e, x[i], t, &want[i]);
        }
        float *dst = mode == 2 ? x : out;
        st = call_float_array(e, x, n, t, dst);
        record(name, st);
        check(st == first_failure(codes, n), "%s: returned %" PRId32 " not %" PRId32, name, st,
              first_failure(codes, n));
        for (size_t i = 0; i < n; i++) {
            check(same_bits_f(dst[i], want[i]) || (isnan(dst[i]) && isnan(want[i])),
                  "%s: element %zu differs from the scalar call", name, i);
            check(codes[i] == RELICORE_OK ? isfinite(dst[i]) : isnan(dst[i]),
                  "%s: element %zu = %g with status %" PRId32, name, i, (double)dst[i], codes[i]);
        }
    }
    free(x);
    free(out);
}

static void hostile_free_arrays(void)
{
    for (long it = 0; it < g_iterations; it++) {
        for (size_t k = 0; k < LEN(FREE_ARRAYS); k++) {
            const struct free_array *e = &FREE_ARRAYS[k];
            double xlo, xhi, clo, chi;
            physical_range(e->topic, 2, e->pos, &xlo, &xhi);
            physical_range(e->topic, 2, 1 - e->pos, &clo, &chi);
            struct fa_ctx c = { e, arg_double(clo, chi) };
            hostile_array(e->name, &c, fa_call, fa_elem, xlo, xhi, MAXN);
        }
        for (size_t k = 0; k < LEN(FREE_ARRAYS32); k++) {
            hostile_float_array(&FREE_ARRAYS32[k]);
        }
    }
}

/* ------------------------------------------------------------------------------------------ */
/* Calibration and response tables                                                             */
/* ------------------------------------------------------------------------------------------ */

static void hostile_calibration(void)
{
    char args[256];
    for (long it = 0; it < g_iterations; it++) {
        double a[5] = { arg_double(9.0, 12.0), any_double(), arg_double(1.0, 3.0), any_double(),
                        arg_double(0.0, 2.0) };
        struct relicore_two_load_calibration cal = { SENTINEL, SENTINEL, SENTINEL };
        int nul = null_out();
        int32_t st = relicore_two_load_calibration(a[0], a[1], a[2], a[3], a[4], nul ? NULL : &cal);
        record("relicore_two_load_calibration", st);
        describe(args, sizeof args, 5, a);
        if (nul) {
            check(st == RELICORE_ERROR_NULL_POINTER, "two_load_calibration(NULL) = %" PRId32, st);
        } else if (st == RELICORE_OK) {
            check(isfinite(cal.frequency_hz) && isfinite(cal.gain) && isfinite(cal.offset),
                  "two_load_calibration(%s) = OK with a non-finite field", args);
        } else {
            check(isnan(cal.frequency_hz) && isnan(cal.gain) && isnan(cal.offset),
                  "two_load_calibration(%s) = %" PRId32 " without NaN in every field", args, st);
        }
        /* the calibration it made, or a forged one, or NULL */
        if (st != RELICORE_OK || below(2) == 0) {
            cal.frequency_hz = any_double();
            cal.gain = any_double();
            cal.offset = any_double();
        }
        int nulcal = below(16) == 0;
        for (int which = 0; which < 2; which++) {
            double r = any_double();
            double out = SENTINEL;
            const char *name = which ? "relicore_calibrated_brightness_temperature"
                                     : "relicore_calibrated_temperature";
            int32_t (*f)(const struct relicore_two_load_calibration *, double, double *) =
                which ? relicore_calibrated_brightness_temperature : relicore_calibrated_temperature;
            int nulo = null_out();
            int32_t s = f(nulcal ? NULL : &cal, r, nulo ? NULL : &out);
            record(name, s);
            if (nulcal || nulo) {
                check(s == RELICORE_ERROR_NULL_POINTER, "%s with NULL = %" PRId32, name, s);
                if (!nulo) {
                    check(isnan(out), "%s(NULL calibration) did not write NaN", name);
                }
            } else {
                double d[4] = { cal.frequency_hz, cal.gain, cal.offset, r };
                describe(args, sizeof args, 4, d);
                check_out(name, s, out, args);
            }
        }
        /* f32 */
        float b[5] = { any_float(), any_float(), any_float(), any_float(), any_float() };
        if (below(2)) {
            b[0] = 30e9f;
            b[2] = 300.0f;
            b[4] = 77.0f;
        }
        struct relicore_two_load_calibration_f32 c32 = { 1.0f, 1.0f, 1.0f };
        st = relicore_two_load_calibration_f32(b[0], b[1], b[2], b[3], b[4], nul ? NULL : &c32);
        record("relicore_two_load_calibration_f32", st);
        if (nul) {
            check(st == RELICORE_ERROR_NULL_POINTER, "two_load_calibration_f32(NULL) = %" PRId32,
                  st);
        } else if (st == RELICORE_OK) {
            check(isfinite(c32.frequency_hz) && isfinite(c32.gain) && isfinite(c32.offset),
                  "two_load_calibration_f32 = OK with a non-finite field");
        } else {
            check(isnan(c32.frequency_hz) && isnan(c32.gain) && isnan(c32.offset),
                  "two_load_calibration_f32 = %" PRId32 " without NaN fields", st);
        }
        if (st != RELICORE_OK || below(2) == 0) {
            c32.frequency_hz = any_float();
            c32.gain = any_float();
            c32.offset = any_float();
        }
        for (int which = 0; which < 2; which++) {
            float r = any_float();
            float out = (float)SENTINEL;
            const char *name = which ? "relicore_calibrated_brightness_temperature_f32"
                                     : "relicore_calibrated_temperature_f32";
            int32_t (*f)(const struct relicore_two_load_calibration_f32 *, float, float *) =
                which ? relicore_calibrated_brightness_temperature_f32
                      : relicore_calibrated_temperature_f32;
            int32_t s = f(nulcal ? NULL : &c32, r, &out);
            record(name, s);
            if (nulcal) {
                check(s == RELICORE_ERROR_NULL_POINTER && isnan(out), "%s(NULL) = %" PRId32, name,
                      s);
            } else {
                check_outf(name, s, out, "forged or made f32 calibration");
            }
        }
    }
}

/* A response table: exact-size heap arrays of lengths nw and nr (often different), filled with
 * hostile values or with an increasing physical table. */
static void hostile_response(void)
{
    for (long it = 0; it < g_iterations; it++) {
        size_t nw = below(6), nr = below(3) ? nw : below(6);
        double *w = calloc(nw ? nw : 1, sizeof *w);
        double *r = calloc(nr ? nr : 1, sizeof *r);
        float *w32 = calloc(nw ? nw : 1, sizeof *w32);
        float *r32 = calloc(nr ? nr : 1, sizeof *r32);
        if (!w || !r || !w32 || !r32) {
            exit(2);
        }
        int physical = below(3) == 0;
        double l = ordinary(-7.0, -3.0);
        for (size_t i = 0; i < nw; i++) {
            w[i] = physical ? l : any_double();
            l *= 1.0 + uniform();
            w32[i] = (float)w[i];
        }
        for (size_t i = 0; i < nr; i++) {
            r[i] = physical ? uniform() : any_double();
            r32[i] = (float)r[i];
        }
        int nulw = below(12) == 0, nulr = below(12) == 0, nulo = below(12) == 0;
        for (int which = 0; which < 2; which++) {
            double v = which ? arg_double(-10.0, 10.0) : arg_double(0.0, 4.0);
            double out = SENTINEL;
            const char *name = which ? "relicore_temperature_from_response_weighted_radiance"
                                     : "relicore_response_weighted_radiance";
            int32_t (*f)(const double *, size_t, const double *, size_t, double, double *) =
                which ? relicore_temperature_from_response_weighted_radiance
                      : relicore_response_weighted_radiance;
            int32_t st = f(nulw ? NULL : w, nw, nulr ? NULL : r, nr, v, nulo ? NULL : &out);
            record(name, st);
            if (nulw || nulr || nulo) {
                check(st == RELICORE_ERROR_NULL_POINTER, "%s with a NULL pointer = %" PRId32, name,
                      st);
                if (!nulo) {
                    check(isnan(out), "%s(NULL) did not write NaN", name);
                }
            } else {
                check_out(name, st, out, "response table");
                if (nw < 2) {
                    check(st == RELICORE_ERROR_ARRAY_TOO_SHORT, "%s with %zu wavelengths = %" PRId32,
                          name, nw, st);
                } else if (nr != nw) {
                    check(st == RELICORE_ERROR_LENGTH_MISMATCH, "%s with lengths %zu, %zu = %" PRId32,
                          name, nw, nr, st);
                }
            }
            float v32 = (float)v, out32 = (float)SENTINEL;
            const char *name32 = which ? "relicore_temperature_from_response_weighted_radiance_f32"
                                       : "relicore_response_weighted_radiance_f32";
            int32_t (*g)(const float *, size_t, const float *, size_t, float, float *) =
                which ? relicore_temperature_from_response_weighted_radiance_f32
                      : relicore_response_weighted_radiance_f32;
            st = g(nulw ? NULL : w32, nw, nulr ? NULL : r32, nr, v32, nulo ? NULL : &out32);
            record(name32, st);
            if (nulw || nulr || nulo) {
                check(st == RELICORE_ERROR_NULL_POINTER, "%s with a NULL pointer = %" PRId32,
                      name32, st);
            } else {
                check_outf(name32, st, out32, "response table (f32)");
                if (nr != nw && nw >= 2) {
                    check(st == RELICORE_ERROR_LENGTH_MISMATCH, "%s mismatched = %" PRId32, name32,
                          st);
                }
            }
        }
        free(w);
        free(r);
        free(w32);
        free(r32);
    }
}

/* ------------------------------------------------------------------------------------------ */
/* Universes                                                                                   */
/* ------------------------------------------------------------------------------------------ */

typedef int32_t (*u0_fn)(const struct relicore_universe *, double *);
typedef int32_t (*u1_fn)(const struct relicore_universe *, double, double *);
typedef int32_t (*ua_fn)(const struct relicore_universe *, const double *, size_t, double *);

#define NVALID 5
static struct relicore_universe *g_valid[NVALID];
static struct relicore_universe_parameters g_valid_params[NVALID];

/* The kinds of universe pointer a call gets. */
enum ukind {
    U_VALID,       /* built by init */
    U_COPY,        /* memcpy of a valid one */
    U_NULL,        /* NULL */
    U_UNINIT,      /* uninitialised heap memory */
    U_ZERO,        /* all bytes 0 */
    U_RANDOM,      /* random bytes */
    U_FAILED,      /* cleared by a failed init */
    U_TAG_FLIP,    /* valid, one bit of the tag flipped */
    U_STORAGE_BAD, /* valid tag, storage words overwritten */
    U_KINDS
};

static struct relicore_universe *g_scratch;

/* A universe pointer of a random kind, written into *kind. */
static const struct relicore_universe *pick_universe(enum ukind *kind)
{
    unsigned r = below(20);
    enum ukind k = r < 10 ? U_VALID : (enum ukind)(1 + r % (U_KINDS - 1));
    if (k == U_UNINIT && !g_uninit) {
        k = U_ZERO;
    }
    *kind = k;
    struct relicore_universe *v = g_valid[below(NVALID)];
    switch (k) {
    case U_VALID: return v;
    case U_COPY: memcpy(g_scratch, v, sizeof *v); return g_scratch;
    case U_NULL: return NULL;
    case U_UNINIT: {
        /* fresh, never written heap memory: free the scratch and take a new one */
        free(g_scratch);
        g_scratch = malloc(sizeof *g_scratch);
        if (g_scratch == NULL) {
            exit(2);
        }
        return g_scratch;
    }
    case U_ZERO: memset(g_scratch, 0, sizeof *g_scratch); return g_scratch;
    case U_RANDOM: {
        unsigned char *p = (unsigned char *)g_scratch;
        for (size_t i = 0; i < sizeof *g_scratch; i += 8) {
            uint64_t b = next_u64();
            memcpy(p + i, &b, 8);
        }
        return g_scratch;
    }
    case U_FAILED: {
        struct relicore_universe_parameters p = g_valid_params[0];
        p.h0_km_s_mpc = -1.0;
        memcpy(g_scratch, v, sizeof *v);
        int32_t st = relicore_universe_init(&p, g_scratch);
        check(st == RELICORE_ERROR_INVALID_PARAMETER, "init with H0 = -1 = %" PRId32, st);
        return g_scratch;
    }
    case U_TAG_FLIP:
        memcpy(g_scratch, v, sizeof *v);
        g_scratch->tag ^= (uint64_t)1 << below(64);
        return g_scratch;
    case U_STORAGE_BAD:
        memcpy(g_scratch, v, sizeof *v);
        for (int i = 0; i < 8; i++) {
            g_scratch->storage[below(RELICORE_UNIVERSE_STORAGE_WORDS)] = next_u64();
        }
        return g_scratch;
    default: return v;
    }
}

/* The checks of a call on a universe of kind `k`. */
static void check_universe_call(const char *name, enum ukind k, int32_t st, int out_null,
                                double out, const char *args)
{
    if (k == U_NULL || out_null) {
        check(st == RELICORE_ERROR_NULL_POINTER, "%s on a NULL pointer = %" PRId32, name, st);
        if (!out_null) {
            check(isnan(out), "%s(NULL universe) wrote %.17g, not NaN", name, out);
        }
        return;
    }
    if (k == U_VALID || k == U_COPY) {
        check_out(name, st, out, args);
        return;
    }
    if (k == U_STORAGE_BAD) {
        /* undetectable behind an intact tag: no crash, no sanitizer report, a documented code,
         * NaN on failure (the value of a success is not checked: the storage is garbage) */
        if (st != RELICORE_OK) {
            check(isnan(out), "%s on a corrupted storage = %" PRId32 " without NaN", name, st);
        }
        return;
    }
    check(st == RELICORE_ERROR_INVALID_STRUCT && isnan(out),
          "%s on a universe init did not produce (kind %d) = %" PRId32 " with %.17g", name, (int)k,
          st, out);
}

/* Redshift-like arguments of the universe functions: hostile, or ordinary for each use. */
static double universe_arg(void)
{
    switch (below(4)) {
    case 0: return ordinary(-6.0, 4.0);
    case 1: return uniform() * 20.0;
    default: return any_double();
    }
}

struct ua_ctx {
    ua_fn f;
    u1_fn scalar;
    const struct relicore_universe *u;
};
static int32_t ua_call(const void *c, const double *x, size_t n, double *out)
{
    const struct ua_ctx *k = c;
    return k->f(k->u, x, n, out);
}
static int32_t ua_elem(const void *c, double x, double *out)
{
    const struct ua_ctx *k = c;
    return k->scalar(k->u, x, out);
}

/* ------------------------------------------------------------------------------------------ */
/* Thermal histories (and universes with baryons)                                              */
/* ------------------------------------------------------------------------------------------ */

typedef int32_t (*h0_fn)(const struct relicore_thermal_history *, double *);
typedef int32_t (*h1_fn)(const struct relicore_thermal_history *, double, double *);
typedef int32_t (*ha_fn)(const struct relicore_thermal_history *, const double *, size_t,
                         double *);

/* Universes with baryons (the valid universes above have none: Saha and the history refuse
 * those with RELICORE_ERROR_INVALID_PARAMETER) and computed histories. */
#define NDVALID 3
#define NHISTORY 3
static struct relicore_universe *g_dvalid[NDVALID];
static struct relicore_thermal_history *g_history[NHISTORY];
static struct relicore_thermal_history *g_hscratch;

/* The kinds of history pointer a call gets (as enum ukind for universes). */
enum hkind {
    H_VALID,       /* computed by relicore_thermal_history_compute */
    H_COPY,        /* memcpy of a computed one */
    H_NULL,        /* NULL */
    H_UNINIT,      /* uninitialised heap memory */
    H_ZERO,        /* all bytes 0 */
    H_RANDOM,      /* random bytes in the tag and the first storage words, the rest left */
    H_FAILED,      /* cleared by a failed compute */
    H_TAG_FLIP,    /* computed, one bit of the tag flipped */
    H_STORAGE_BAD, /* computed, storage words overwritten behind the intact tag */
    H_KINDS
};

static void build_decoupling(void)
{
    const double ob[NDVALID] = { 0.049, 0.05, 0.04 };
    const double ok[NDVALID] = { 0.0, 0.1, -0.05 };
    const double m0[NDVALID] = { 0.06, 0.0, 0.1 };
    for (int i = 0; i < NDVALID; i++) {
        struct relicore_universe_parameters p;
        relicore_universe_parameters_default(67.4, 0.315, &p);
        p.omega_baryon = ob[i];
        p.omega_curvature = ok[i];
        p.neutrino_masses_ev[0] = m0[i];
        if (i == 2) {
            p.w0 = -0.9;
            p.wa = 0.2;
            p.helium_mass_fraction = 0.3;
        }
        g_dvalid[i] = malloc(sizeof *g_dvalid[i]);
        if (g_dvalid[i] == NULL || relicore_universe_init(&p, g_dvalid[i]) != RELICORE_OK) {
            fprintf(stderr, "cannot build decoupling universe %d\n", i);
            exit(2);
        }
    }
    for (int i = 0; i < NHISTORY; i++) {
        struct relicore_thermal_history_options o;
        relicore_thermal_history_options_default(&o);
        if (i == 1) {
            o.reionization = 1;
            o.reionization_redshift = 7.7;
        }
        if (i == 2) {
            o.highest_redshift = 5000.0;
        }
        g_history[i] = malloc(sizeof *g_history[i]);
        int32_t st = g_history[i] == NULL ? RELICORE_ERROR_NULL_POINTER
                                          : relicore_thermal_history_compute(g_dvalid[i], &o,
                                                                             g_history[i]);
        if (st != RELICORE_OK) {
            fprintf(stderr, "cannot compute history %d: %s\n", i, relicore_status_message(st));
            exit(2);
        }
    }
    g_hscratch = malloc(sizeof *g_hscratch);
    if (g_hscratch == NULL) {
        exit(2);
    }
    memset(g_hscratch, 0, sizeof *g_hscratch);
}

static void free_decoupling(void)
{
    for (int i = 0; i < NDVALID; i++) {
        free(g_dvalid[i]);
    }
    for (int i = 0; i < NHISTORY; i++) {
        free(g_history[i]);
    }
    free(g_hscratch);
}

/* A history pointer of a random kind, written into *kind. */
static const struct relicore_thermal_history *pick_history(enum hkind *kind)
{
    unsigned r = below(20);
    enum hkind k = r < 10 ? H_VALID : (enum hkind)(1 + r % (H_KINDS - 1));
    if (k == H_UNINIT && !g_uninit) {
        k = H_ZERO;
    }
    *kind = k;
    struct relicore_thermal_history *v = g_history[below(NHISTORY)];
    switch (k) {
    case H_VALID: return v;
    case H_COPY: memcpy(g_hscratch, v, sizeof *v); return g_hscratch;
    case H_NULL: return NULL;
    case H_UNINIT:
        /* glibc may hand the same block back with its old contents (a chunk this large is not
         * overwritten by the allocator's bookkeeping): clear the tag first so that no stale
         * computed history comes back; the storage words stay whatever they were (volatile:
         * the compiler would drop a plain store to memory that is freed next) */
        *(volatile uint64_t *)&g_hscratch->tag = 0;
        free(g_hscratch);
        g_hscratch = malloc(sizeof *g_hscratch);
        if (g_hscratch == NULL) {
            exit(2);
        }
        return g_hscratch;
    case H_ZERO: memset(g_hscratch, 0, sizeof *g_hscratch); return g_hscratch;
    case H_RANDOM: {
        g_hscratch->tag = next_u64();
        for (size_t i = 0; i < 64; i++) {
            g_hscratch->storage[i] = next_u64();
        }
        return g_hscratch;
    }
    case H_FAILED: {
        struct relicore_thermal_history_options o;
        relicore_thermal_history_options_default(&o);
        o.highest_redshift = 2e4;
        memcpy(g_hscratch, v, sizeof *v);
        int32_t st = relicore_thermal_history_compute(g_dvalid[0], &o, g_hscratch);
        check(st == RELICORE_ERROR_CAPACITY_TOO_SMALL && g_hscratch->tag == 0,
              "compute with highest redshift 2e4 = %" PRId32, st);
        return g_hscratch;
    }
    case H_TAG_FLIP:
        memcpy(g_hscratch, v, sizeof *v);
        g_hscratch->tag ^= (uint64_t)1 << below(64);
        return g_hscratch;
    case H_STORAGE_BAD:
        memcpy(g_hscratch, v, sizeof *v);
        for (int i = 0; i < 8; i++) {
            g_hscratch->storage[below(RELICORE_THERMAL_HISTORY_STORAGE_WORDS)] = next_u64();
        }
        return g_hscratch;
    default: return v;
    }
}

/* The checks of a call on a history of kind `k` (as check_universe_call). */
static void check_history_call(const char *name, enum hkind k, int32_t st, int out_null,
                               double out, const char *args)
{
    if (k == H_NULL || out_null) {
        check(st == RELICORE_ERROR_NULL_POINTER, "%s on a NULL pointer = %" PRId32, name, st);
        if (!out_null) {
            check(isnan(out), "%s(NULL history) wrote %.17g, not NaN", name, out);
        }
        return;
    }
    if (k == H_VALID || k == H_COPY) {
        check_out(name, st, out, args);
        return;
    }
    if (k == H_STORAGE_BAD) {
        if (st != RELICORE_OK) {
            check(isnan(out), "%s on a corrupted history = %" PRId32 " without NaN", name, st);
        }
        return;
    }
    check(st == RELICORE_ERROR_INVALID_STRUCT && isnan(out),
          "%s on a history compute did not produce (kind %d) = %" PRId32 " with %.17g", name,
          (int)k, st, out);
}

/* Redshift arguments of the history queries: hostile, around recombination, or near the top of
 * the tables (5000 and 1e4). */
static double history_arg(void)
{
    switch (below(6)) {
    case 0: return ordinary(-6.0, 4.0);
    case 1: return uniform() * 2000.0;
    case 2: return uniform() * 20.0;
    case 3: return 4990.0 + 20.0 * uniform() + (below(2) ? 5010.0 : 0.0);
    default: return any_double();
    }
}

struct ha_ctx {
    ha_fn f;
    h1_fn scalar;
    const struct relicore_thermal_history *h;
};
static int32_t ha_call(const void *c, const double *x, size_t n, double *out)
{
    const struct ha_ctx *k = c;
    return k->f(k->h, x, n, out);
}
static int32_t ha_elem(const void *c, double x, double *out)
{
    const struct ha_ctx *k = c;
    return k->scalar(k->h, x, out);
}

/* ------------------------------------------------------------------------------------------ */
/* Functions of a universe and of a thermal history (the lists of tests/c/gen_functions.h)    */
/* ------------------------------------------------------------------------------------------ */

typedef int32_t (*u2_fn)(const struct relicore_universe *, double, double, double *);
typedef int32_t (*h2_fn)(const struct relicore_thermal_history *, double, double, double *);

/* A function of a receiver with its array form over the first argument (NULL when none). */
struct recv_fn {
    const char *name;
    enum topic topic;
    int nargs;
    const char *domain;
    double upper;
    union {
        u0_fn u0;
        u1_fn u1;
        u2_fn u2;
        h0_fn h0;
        h1_fn h1;
        h2_fn h2;
    } f;
    const char *array_name;
    union {
        ua_fn u;
        ha_fn h;
    } array;
};
#define ARRAY_OF_0(r, n) NULL, { .r = NULL }
#define ARRAY_OF_1(r, n) "relicore_" #n "_array", { .r = relicore_##n##_array }
#define RECV(t, r, n, k, domain, upper, array) \
    { "relicore_" #n, t, k, domain, upper, { .r##k = relicore_##n }, ARRAY_OF_##array(r, n) },
#define BB_UNIVERSE(n, k, domain, upper, array) RECV(T_BLACKBODY, u, n, k, domain, upper, array)
#define CO_UNIVERSE(n, k, domain, upper, array) RECV(T_COSMOLOGY, u, n, k, domain, upper, array)
#define DC_UNIVERSE(n, k, domain, upper, array) RECV(T_DECOUPLING, u, n, k, domain, upper, array)
#define BB_HISTORY(n, k, domain, upper, array) RECV(T_BLACKBODY, h, n, k, domain, upper, array)
#define CO_HISTORY(n, k, domain, upper, array) RECV(T_COSMOLOGY, h, n, k, domain, upper, array)
#define DC_HISTORY(n, k, domain, upper, array) RECV(T_DECOUPLING, h, n, k, domain, upper, array)
static const struct recv_fn UNIVERSE_FNS[] = {
    RELICORE_BLACKBODY_UNIVERSE(BB_UNIVERSE)
    RELICORE_COSMOLOGY_UNIVERSE(CO_UNIVERSE)
    RELICORE_DECOUPLING_UNIVERSE(DC_UNIVERSE)
};
static const struct recv_fn HISTORY_FNS[] = {
    RELICORE_BLACKBODY_HISTORY(BB_HISTORY)
    RELICORE_COSMOLOGY_HISTORY(CO_HISTORY)
    RELICORE_DECOUPLING_HISTORY(DC_HISTORY)
};

/* The largest highest redshift of the histories of build_decoupling: a query 'h' above it is
 * outside every table. */
#define HISTORY_TOP 1e4

/* Arguments of a function of a universe: redshift-like (universe_arg) for cosmology; for
 * decoupling (Saha) around recombination or log-uniform 1e-3 .. 1e9. */
static double universe_fn_arg(enum topic t)
{
    if (t == T_DECOUPLING) {
        return below(3) ? history_arg() : ordinary(-3.0, 9.0);
    }
    return universe_arg();
}

static int32_t call_universe_fn(const struct recv_fn *e, const struct relicore_universe *u,
                                const double *a, double *out)
{
    switch (e->nargs) {
    case 0: return e->f.u0(u, out);
    case 1: return e->f.u1(u, a[0], out);
    default: return e->f.u2(u, a[0], a[1], out);
    }
}

static int32_t call_history_fn(const struct recv_fn *e, const struct relicore_thermal_history *h,
                               const double *a, double *out)
{
    switch (e->nargs) {
    case 0: return e->f.h0(h, out);
    case 1: return e->f.h1(h, a[0], out);
    default: return e->f.h2(h, a[0], a[1], out);
    }
}

/* Every function of a universe on a universe of a random kind (the decoupling ones on a
 * universe with baryons half of the time); array forms on valid universes element
 * by element against the scalar form, on the others the refusal; get_parameters. */
static void hostile_universe_functions(void)
{
    char args[128];
    for (long it = 0; it < g_iterations; it++) {
        enum ukind kind;
        const struct relicore_universe *u = pick_universe(&kind); /* no baryons when valid */
        /* the decoupling functions: a universe with baryons, or the same u (one scratch) */
        int baryons = below(2) == 0;
        enum ukind dkind = baryons ? U_VALID : kind;
        const struct relicore_universe *du = baryons ? g_dvalid[below(NDVALID)] : u;
        for (size_t k = 0; k < LEN(UNIVERSE_FNS); k++) {
            const struct recv_fn *e = &UNIVERSE_FNS[k];
            const struct relicore_universe *v = e->topic == T_DECOUPLING ? du : u;
            enum ukind vk = e->topic == T_DECOUPLING ? dkind : kind;
            double a[2] = { universe_fn_arg(e->topic), universe_fn_arg(e->topic) };
            double out = SENTINEL;
            int nul = null_out();
            int32_t st = call_universe_fn(e, v, a, nul ? NULL : &out);
            record(e->name, st);
            describe(args, sizeof args, e->nargs, a);
            check_universe_call(e->name, vk, st, nul, out, args);
            if (!nul && (vk == U_VALID || vk == U_COPY)
                && outside_domain(e->domain, e->upper, e->nargs, a)) {
                check(st != RELICORE_OK, "%s(%s) = OK outside its domain \"%s\"", e->name, args,
                      e->domain);
            }
            if (e->array_name == NULL) {
                continue;
            }
            if (vk == U_VALID || vk == U_COPY) {
                struct ua_ctx c = { e->array.u, e->f.u1, v };
                /* cosmology: up to 3 elements, each costs up to tens of microseconds
                 * (inversions) */
                if (e->topic == T_DECOUPLING) {
                    hostile_array(e->array_name, &c, ua_call, ua_elem, -3.0, 9.0, MAXN);
                } else {
                    hostile_array(e->array_name, &c, ua_call, ua_elem, -6.0, 4.0, 3);
                }
            } else {
                size_t n = below(4);
                double x[4] = { universe_fn_arg(e->topic), universe_fn_arg(e->topic),
                                universe_fn_arg(e->topic), universe_fn_arg(e->topic) };
                double o[4] = { SENTINEL, SENTINEL, SENTINEL, SENTINEL };
                st = e->array.u(v, x, n, o);
                record(e->array_name, st);
                int32_t want = vk == U_NULL ? RELICORE_ERROR_NULL_POINTER
                                            : RELICORE_ERROR_INVALID_STRUCT;
                if (vk == U_STORAGE_BAD) {
                    for (size_t i = 0; i < n; i++) {
                        check(o[i] != SENTINEL, "%s: element %zu not written", e->array_name, i);
                    }
                } else {
                    check(st == want, "%s on a universe of kind %d = %" PRId32, e->array_name,
                          (int)vk, st);
                    for (size_t i = 0; i < n; i++) {
                        check(isnan(o[i]), "%s on a refused universe: out[%zu] = %.17g",
                              e->array_name, i, o[i]);
                    }
                }
            }
        }
        /* get_parameters */
        struct relicore_universe_parameters back;
        memset(&back, 0, sizeof back);
        int nul = null_out();
        int32_t st = relicore_universe_get_parameters(u, nul ? NULL : &back);
        record("relicore_universe_get_parameters", st);
        if (kind == U_NULL || nul) {
            check(st == RELICORE_ERROR_NULL_POINTER, "get_parameters(NULL) = %" PRId32, st);
        } else if (kind == U_VALID || kind == U_COPY || kind == U_STORAGE_BAD) {
            check(documented(st), "get_parameters = %" PRId32, st);
        } else {
            check(st == RELICORE_ERROR_INVALID_STRUCT && isnan(back.h0_km_s_mpc) &&
                      isnan(back.neutrino_masses_ev[2]) && isnan(back.helium_mass_fraction),
                  "get_parameters on an unproduced universe = %" PRId32, st);
        }
    }
}

static void hostile_history_queries(void)
{
    char args[128];
    for (long it = 0; it < g_iterations; it++) {
        enum hkind kind;
        const struct relicore_thermal_history *h = pick_history(&kind);
        for (size_t k = 0; k < LEN(HISTORY_FNS); k++) {
            const struct recv_fn *e = &HISTORY_FNS[k];
            double z[2] = { history_arg(), history_arg() };
            double out = SENTINEL;
            int nul = null_out();
            int32_t st = call_history_fn(e, h, z, nul ? NULL : &out);
            record(e->name, st);
            describe(args, sizeof args, e->nargs, z);
            check_history_call(e->name, kind, st, nul, out, args);
            if (!nul && (kind == H_VALID || kind == H_COPY)) {
                if (outside_domain(e->domain, e->upper, e->nargs, z)) {
                    check(st != RELICORE_OK, "%s(%s) = OK outside its domain \"%s\"", e->name,
                          args, e->domain);
                }
                for (int i = 0; i < e->nargs; i++) {
                    if (e->domain[i] == 'h' && z[i] > HISTORY_TOP && isfinite(z[i])) {
                        check(st == RELICORE_ERROR_OUT_OF_DOMAIN,
                              "%s(%s) above the table = %" PRId32, e->name, args, st);
                    }
                }
            }
        }
        for (size_t k = 0; k < LEN(HISTORY_FNS); k++) {
            const struct recv_fn *e = &HISTORY_FNS[k];
            if (e->array_name == NULL) {
                continue;
            }
            if (kind == H_VALID || kind == H_COPY) {
                struct ha_ctx c = { e->array.h, e->f.h1, h };
                hostile_array(e->array_name, &c, ha_call, ha_elem, -6.0, 4.0, 3);
            } else {
                size_t n = below(4);
                double x[4] = { history_arg(), history_arg(), history_arg(), history_arg() };
                double out[4] = { SENTINEL, SENTINEL, SENTINEL, SENTINEL };
                int32_t st = e->array.h(h, x, n, out);
                record(e->array_name, st);
                int32_t want = kind == H_NULL ? RELICORE_ERROR_NULL_POINTER
                                              : RELICORE_ERROR_INVALID_STRUCT;
                if (kind == H_STORAGE_BAD) {
                    check(documented(st), "%s on a corrupted history = %" PRId32, e->array_name,
                          st);
                    for (size_t i = 0; i < n; i++) {
                        check(out[i] != SENTINEL, "%s: element %zu not written", e->array_name, i);
                    }
                } else {
                    check(st == want, "%s on a history of kind %d = %" PRId32, e->array_name,
                          (int)kind, st);
                    for (size_t i = 0; i < n; i++) {
                        check(isnan(out[i]), "%s on a refused history: out[%zu] = %.17g",
                              e->array_name, i, out[i]);
                    }
                }
            }
        }
    }
}

/* Options: valid ones, or (refuse) with one value compute must refuse; returns whether it
 * injected one (when not, hostile_compute refuses the universe or a pointer instead). */
static int hostile_options(struct relicore_thermal_history_options *o, int refuse)
{
    relicore_thermal_history_options_default(o);
    if (below(2)) {
        o->reionization = 1;
        o->reionization_redshift = below(2) ? uniform() * 100.0 : ordinary(-3.0, 2.0);
    }
    o->highest_redshift = below(2) ? 1e4 : 3000.0 + 7000.0 * uniform();
    if (!refuse) {
        return 0;
    }
    switch (below(6)) {
    case 0: { /* the switch */
        static const int32_t sw[] = { 2, -1, 3, INT32_MIN, INT32_MAX, 255 };
        o->reionization = below(3) ? sw[below(6)] : (int32_t)(uint32_t)next_u64();
        if (o->reionization == 0 || o->reionization == 1) {
            o->reionization = 2;
        }
        return 1;
    }
    case 1: /* a reionisation redshift that is refused */
        o->reionization = 1;
        do {
            o->reionization_redshift = any_double();
        } while (o->reionization_redshift >= 0.0 && o->reionization_redshift <= 100.0);
        return 1;
    case 2: /* a highest redshift below 3000 or not finite */
        do {
            o->highest_redshift = any_double();
        } while (o->highest_redshift >= 3000.0);
        return 1;
    case 3: /* above the capacity */
        /* (the table accepts a rounding allowance of about 9e-12 relative above 1e4) */
        o->highest_redshift = below(2) ? 1e4 * (1.0 + ordinary(-10.0, 3.0)) : any_double();
        if (!(o->highest_redshift > 1e4)) {
            o->highest_redshift = INFINITY;
        }
        return 1;
    default: return 0;
    }
}

/* The struct was cleared: the tag and (every word, or 34 sampled words) of the storage 0. */
static int looks_cleared(const struct relicore_thermal_history *h)
{
    if (h->tag != 0) {
        return 0;
    }
    if (below(64) == 0) {
        for (size_t i = 0; i < RELICORE_THERMAL_HISTORY_STORAGE_WORDS; i++) {
            if (h->storage[i] != 0) {
                return 0;
            }
        }
        return 1;
    }
    if (h->storage[0] != 0 || h->storage[RELICORE_THERMAL_HISTORY_STORAGE_WORDS - 1] != 0) {
        return 0;
    }
    for (int i = 0; i < 32; i++) {
        if (h->storage[below(RELICORE_THERMAL_HISTORY_STORAGE_WORDS)] != 0) {
            return 0;
        }
    }
    return 1;
}

static void hostile_compute(void)
{
    struct relicore_thermal_history *out = malloc(sizeof *out);
    if (out == NULL) {
        exit(2);
    }
    long computed = 0;
    for (long it = 0; it < g_iterations; it++) {
        /* the options default */
        struct relicore_thermal_history_options o;
        memset(&o, 0x33, sizeof o);
        int nul = null_out();
        int32_t st = relicore_thermal_history_options_default(nul ? NULL : &o);
        record("relicore_thermal_history_options_default", st);
        if (nul) {
            check(st == RELICORE_ERROR_NULL_POINTER, "options_default(NULL) = %" PRId32, st);
        } else {
            check(st == RELICORE_OK && o.reionization == 0 && isnan(o.reionization_redshift) &&
                      o.highest_redshift == 1e4,
                  "options_default = %" PRId32 " (%d, %g, %g)", st, (int)o.reionization,
                  o.reionization_redshift, o.highest_redshift);
        }

        /* a compute costs milliseconds: all but about 1 call in 2000 get something to refuse */
        int refuse = below(2000) != 0;
        int injected = hostile_options(&o, refuse);
        enum ukind kind = U_VALID;
        const struct relicore_universe *u = g_dvalid[below(NDVALID)]; /* with baryons */
        int baryons = 1, nulu = 0, nulo = 0;
        if ((refuse && !injected) || (refuse && below(4) == 0) || (!refuse && below(8) == 0)) {
            switch (below(4)) {
            case 0:
                nulu = refuse && !injected;
                if (nulu) {
                    break;
                }
                /* fall through */
            case 1:
                nulo = refuse && !injected;
                if (nulo) {
                    break;
                }
                /* fall through */
            default:
                /* any kind of universe pointer (its valid universes have no baryons); a valid
                 * tag with garbage storage only where a success may follow (rare) */
                do {
                    u = pick_universe(&kind);
                } while (refuse && kind == U_STORAGE_BAD);
                baryons = 0;
                break;
            }
        }
        int nulout = null_out();
        if (!nulout) {
            memcpy(out, g_history[below(NHISTORY)], sizeof *out); /* a valid history before */
        }
        st = relicore_thermal_history_compute(nulu ? NULL : u, nulo ? NULL : &o,
                                              nulout ? NULL : out);
        record("relicore_thermal_history_compute", st);
        const char *what = refuse ? (injected ? "refused options" : "a refused universe")
                                  : "valid options";
        if (nulout || nulu || nulo || kind == U_NULL) {
            check(st == RELICORE_ERROR_NULL_POINTER,
                  "thermal_history_compute with NULL (%s) = %" PRId32, what, st);
        } else if (kind != U_VALID && kind != U_COPY && kind != U_STORAGE_BAD) {
            /* the struct is checked before the options */
            check(st == RELICORE_ERROR_INVALID_STRUCT,
                  "thermal_history_compute on a universe of kind %d (%s) = %" PRId32, (int)kind,
                  what, st);
        } else if (refuse || !baryons) {
            check(st != RELICORE_OK && documented(st),
                  "thermal_history_compute with %s (baryons %d, kind %d) = %" PRId32, what,
                  baryons, (int)kind, st);
            if (!baryons && !injected && kind != U_STORAGE_BAD) {
                check(st == RELICORE_ERROR_INVALID_PARAMETER,
                      "thermal_history_compute of a universe without baryons = %" PRId32, st);
            }
        } else {
            check(st == RELICORE_OK,
                  "compute of a valid universe with valid options = %" PRId32
                  " (z_re %d %.17g, top %.17g)",
                  st, (int)o.reionization, o.reionization_redshift, o.highest_redshift);
        }
        if (!nulout && st == RELICORE_OK) {
            computed++;
            double zs = SENTINEL;
            int32_t s2 = relicore_last_scattering_redshift(out, &zs);
            check(s2 == RELICORE_OK && zs > 0.0 && isfinite(zs),
                  "a computed history: z* = %.17g (status %" PRId32 ")", zs, s2);
        }
        if (!nulout && st != RELICORE_OK) {
            check(looks_cleared(out), "a failed compute (%" PRId32 ") did not clear the struct",
                  st);
        }
    }
    printf("thermal histories computed in the hostile loop: %ld\n", computed);
    /* no stale computed history for a later "uninitialised" block (H_UNINIT) */
    *(volatile uint64_t *)&out->tag = 0;
    free(out);
}

/* Parameters: ordinary ones, with up to three fields replaced by hostile values. */
static void hostile_parameters(struct relicore_universe_parameters *p)
{
    int32_t st = relicore_universe_parameters_default(40.0 + 60.0 * uniform(), 1.5 * uniform(), p);
    check(st == RELICORE_OK, "parameters_default = %" PRId32, st);
    p->omega_baryon = p->omega_matter * uniform();
    if (below(3) == 0) {
        p->omega_curvature = uniform() - 0.5;
    }
    if (below(4) == 0) {
        p->cmb_temperature_k = 0.0;
    }
    if (below(4) == 0) {
        p->neutrino_masses_ev[0] = uniform();
    }
    if (below(4) == 0) {
        p->w0 = -2.0 * uniform();
        p->wa = 2.0 * uniform() - 1.0;
    }
    double *fields = &p->h0_km_s_mpc; /* twelve doubles in a row (static assertion below) */
    /* 1 in 25 parameter sets gets only arbitrary values (often still valid: a build costs
     * about a millisecond); the others also get one value that init must refuse (NaN, +-inf,
     * or a negative H0, matter density, temperature, N_eff or helium fraction) */
    unsigned edits = 1 + below(3);
    for (unsigned e = 0; e < edits; e++) {
        double v = any_double();
        memcpy((char *)fields + sizeof(double) * below(12), &v, sizeof v);
    }
    if (below(25) != 0) {
        static const double bad[] = { NAN, INFINITY, -INFINITY, -1.0, -1e-300 };
        static const unsigned where[] = { 0, 1, 4, 5, 11 }; /* H0, Om, T0, N_eff, Y_p */
        double v = bad[below(5)];
        unsigned i = below(5);
        memcpy((char *)fields + sizeof(double) * (isnan(v) || isinf(v) ? below(12) : where[i]),
               &v, sizeof v);
    }
}

_Static_assert(sizeof(struct relicore_universe_parameters) == 12 * sizeof(double),
               "the parameter struct is twelve doubles");

static void hostile_init(void)
{
    struct relicore_universe_parameters p;
    for (long it = 0; it < g_iterations; it++) {
        hostile_parameters(&p);
        int nulp = below(20) == 0, nulo = below(20) == 0;
        int32_t which = 99;
        int32_t chk = relicore_universe_check_parameters(nulp ? NULL : &p, &which);
        record("relicore_universe_check_parameters", chk);
        check(which >= -1 && which <= 9, "check_parameters named parameter %" PRId32, which);
        int32_t chk_null = relicore_universe_check_parameters(&p, NULL);
        record("relicore_universe_check_parameters", chk_null);
        check(chk_null == RELICORE_ERROR_NULL_POINTER, "check_parameters(NULL) = %" PRId32,
              chk_null);
        /* parameters_default copies any value, refuses only NULL */
        double h = any_double(), m = any_double();
        struct relicore_universe_parameters d;
        int nul = null_out();
        int32_t sd = relicore_universe_parameters_default(h, m, nul ? NULL : &d);
        record("relicore_universe_parameters_default", sd);
        if (nul) {
            check(sd == RELICORE_ERROR_NULL_POINTER, "parameters_default(NULL) = %" PRId32, sd);
        } else {
            check(sd == RELICORE_OK && same_bits(d.h0_km_s_mpc, h) && same_bits(d.omega_matter, m),
                  "parameters_default(%.17g, %.17g) = %" PRId32, h, m, sd);
        }
        memset(g_scratch, 0xa5, sizeof *g_scratch);
        int32_t st = relicore_universe_init(nulp ? NULL : &p, nulo ? NULL : g_scratch);
        record("relicore_universe_init", st);
        if (nulp || nulo) {
            check(st == RELICORE_ERROR_NULL_POINTER, "init with NULL = %" PRId32, st);
            if (nulp && !nulo) {
                check(g_scratch->tag == 0, "init(NULL params) did not clear the struct");
            }
            continue;
        }
        check(st == chk, "init = %" PRId32 " but check_parameters = %" PRId32, st, chk);
        if (st == RELICORE_OK) {
            double out = SENTINEL;
            int32_t s2 = relicore_hubble_time_gyr(g_scratch, &out);
            check(s2 == RELICORE_OK && isfinite(out) && out > 0.0, "a fresh universe: t_H = %.17g",
                  out);
            struct relicore_universe_parameters back;
            s2 = relicore_universe_get_parameters(g_scratch, &back);
            check(s2 == RELICORE_OK && memcmp(&back, &p, sizeof p) == 0,
                  "get_parameters does not return what init got");
        } else {
            int clear = g_scratch->tag == 0;
            for (size_t i = 0; i < RELICORE_UNIVERSE_STORAGE_WORDS && clear; i++) {
                clear = g_scratch->storage[i] == 0;
            }
            check(clear, "a failed init (%" PRId32 ") did not clear the struct", st);
            check(st == RELICORE_ERROR_INVALID_PARAMETER || st == RELICORE_ERROR_NO_BIG_BANG ||
                      st == RELICORE_ERROR_NO_CONVERGENCE,
                  "init = %" PRId32 ", not a code init documents", st);
        }
    }
}

/* ------------------------------------------------------------------------------------------ */
/* Messages and version                                                                        */
/* ------------------------------------------------------------------------------------------ */

static void hostile_messages(void)
{
    for (long it = 0; it < g_iterations; it++) {
        int32_t code = below(4) == 0 ? -(int32_t)below(20) : (int32_t)(uint32_t)next_u64();
        const char *m = relicore_status_message(code);
        record("relicore_status_message", RELICORE_OK);
        check(m != NULL && m[0] != '\0', "status_message(%" PRId32 ") is empty", code);
        if (m != NULL && documented(code)) {
            check(strcmp(m, "unknown status") != 0, "documented code %" PRId32 " unknown", code);
        }
        const char *v = relicore_version();
        record("relicore_version", RELICORE_OK);
        char want[32];
        snprintf(want, sizeof want, "%d.%d.%d", RELICORE_VERSION_MAJOR, RELICORE_VERSION_MINOR,
                 RELICORE_VERSION_PATCH);
        check(v != NULL && strcmp(v, want) == 0, "version %s, header %s", v ? v : "NULL", want);
    }
}

/* ------------------------------------------------------------------------------------------ */

static void build_valid_universes(void)
{
    const double om[NVALID] = { 0.3, 0.315, 0.3, 1.0, 0.25 };
    const double ok[NVALID] = { 0.0, 0.0, 0.1, 0.0, -0.05 };
    const double t0[NVALID] = { 2.7255, 2.7255, 2.7255, 0.0, 2.7255 };
    const double m0[NVALID] = { 0.0, 0.06, 0.0, 0.0, 0.1 };
    for (int i = 0; i < NVALID; i++) {
        struct relicore_universe_parameters p;
        relicore_universe_parameters_default(67.7, om[i], &p);
        p.omega_curvature = ok[i];
        p.cmb_temperature_k = t0[i];
        p.neutrino_masses_ev[0] = m0[i];
        if (i == 4) {
            p.w0 = -0.9;
            p.wa = 0.2;
        }
        g_valid[i] = malloc(sizeof *g_valid[i]);
        if (g_valid[i] == NULL) {
            exit(2);
        }
        int32_t st = relicore_universe_init(&p, g_valid[i]);
        if (st != RELICORE_OK) {
            fprintf(stderr, "cannot build universe %d: %s\n", i, relicore_status_message(st));
            exit(2);
        }
        g_valid_params[i] = p;
    }
    g_scratch = malloc(sizeof *g_scratch);
    if (g_scratch == NULL) {
        exit(2);
    }
}

int main(int argc, char **argv)
{
    for (int i = 1; i < argc; i++) {
        if (strcmp(argv[i], "--calls") == 0 && i + 1 < argc) {
            g_iterations = strtol(argv[++i], NULL, 10);
        } else if (strcmp(argv[i], "--seed") == 0 && i + 1 < argc) {
            g_rng = strtoull(argv[++i], NULL, 0) | 1u;
        } else if (strcmp(argv[i], "--no-uninit") == 0) {
            g_uninit = 0;
        } else {
            fprintf(stderr, "usage: %s [--calls N] [--seed S] [--no-uninit]\n", argv[0]);
            return 2;
        }
    }
    build_valid_universes();
    build_decoupling();
    hostile_messages();
    hostile_free_scalars();
    hostile_free_arrays();
    hostile_calibration();
    hostile_response();
    hostile_init();
    hostile_universe_functions();
    hostile_compute();
    hostile_history_queries();

    printf("%-62s %9s %9s  statuses (code:count)\n", "function", "calls", "ok");
    long fewest = -1;
    for (int i = 0; i < g_nstats; i++) {
        const struct stats *s = &g_stats[i];
        printf("%-62s %9ld %9ld ", s->name, s->calls, s->status[0]);
        for (int c = 1; c < NCODES; c++) {
            if (s->status[c]) {
                printf(" %d:%ld", -c, s->status[c]);
            }
        }
        printf("\n");
        if (fewest < 0 || s->calls < fewest) {
            fewest = s->calls;
        }
    }
    long totals[NCODES] = { 0 };
    for (int i = 0; i < g_nstats; i++) {
        for (int c = 0; c < NCODES; c++) {
            totals[c] += g_stats[i].status[c];
        }
    }
    printf("statuses over all calls:");
    for (int c = 0; c < NCODES; c++) {
        if (totals[c]) {
            printf(" %d:%ld", -c, totals[c]);
        }
    }
    printf("\n");
    check(fewest >= g_iterations, "a function was called only %ld times (< %ld)", fewest,
          g_iterations);
    free_decoupling();
    free(g_scratch);
    for (int i = 0; i < NVALID; i++) {
        free(g_valid[i]);
    }
    printf("hostile: %ld calls to %d functions (each at least %ld times), %ld checks: %ld passed, "
           "%ld failed\n",
           g_calls, g_nstats, fewest, g_checks, g_checks - g_failed, g_failed);
    printf("%ld passed, %ld failed\n", g_checks - g_failed, g_failed);
    return g_failed == 0 ? 0 : 1;
}
