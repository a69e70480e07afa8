/*
 * Hostile inputs to every export of relicore's growth topic (C11), in the manner of
 * hostile_abi.c: every function of the growth lists of tests/c/gen_functions.h (generated from
 * bindings/functions.toml) and the irregular ones (relicore_linear_growth_compute,
 * relicore_linear_power_spectrum_options_default, relicore_linear_power_spectrum_compute) are
 * called --calls N times (default 100000) with random and edge-case arguments (NaN, ±inf, ±0,
 * subnormals, huge values, random bit patterns), on valid receivers, copies, NULL, never-filled
 * structs, forged tags and overwritten storage; array forms with n from 0 to 8, NULL pointers
 * and in-place outputs. Checks: every status is documented (0 or a RELICORE_ERROR_* code); a
 * failing scalar call writes NaN; an argument outside the domain stated in the table never
 * succeeds; an array element equals its scalar call bit for bit (status included) on a valid
 * receiver, and a refused receiver gives NaN everywhere; a compute that fails clears its output.
 * Ends with "hostile: N calls, 0 failures" (exit status 1 on any failure). Run by
 * tests/c/run.sh under ASan + UBSan and under valgrind.
 */
#include <inttypes.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "gen_functions.h"
#include "relicore.h"

#define LEN(a) (sizeof(a) / sizeof((a)[0]))
#define SENTINEL 12345.678

static long g_calls, g_failures;
static uint64_t g_state = 0x9E3779B97F4A7C15u;

static void check(int ok, const char *fmt, ...) __attribute__((format(printf, 2, 3)));
#include <stdarg.h>
static void check(int ok, const char *fmt, ...)
{
    if (ok) {
        return;
    }
    if (g_failures++ < 40) {
        va_list ap;
        va_start(ap, fmt);
        printf("FAIL ");
        vprintf(fmt, ap);
        printf("\n");
        va_end(ap);
    }
}

static uint64_t next_u64(void)
{
    g_state ^= g_state << 13;
    g_state ^= g_state >> 7;
    g_state ^= g_state << 17;
    return g_state;
}
static unsigned below(unsigned n) { return (unsigned)(next_u64() % n); }

/* A hostile double: edge cases, random bit patterns, or ordinary values of the topic's scales. */
static double hostile(void)
{
    static const double edge[] = { 0.0, -0.0, 1.0, -1.0, 0.5, 8.0, 1e-300, 5e-324, -5e-324,
                                   1e300, -1e300, 1e70, 2.0, 1089.0, 1e5, 0.05 };
    switch (below(6)) {
    case 0: return NAN;
    case 1: return below(2) ? INFINITY : -INFINITY;
    case 2: return edge[below(LEN(edge))];
    case 3: {
        uint64_t b = next_u64();
        double x;
        memcpy(&x, &b, sizeof x);
        return x;
    }
    default: return pow(10.0, -4.0 + 8.0 * (double)below(100000) / 1e5) * (below(8) ? 1 : -1);
    }
}

static int documented(int32_t s) { return s == RELICORE_OK || (s <= -1 && s >= -16); }

/* 'p' > 0, 'n' >= 0, '-' unchecked; the first argument also <= upper */
static int outside(const char *domain, double upper, int nargs, const double *a)
{
    for (int i = 0; i < nargs; i++) {
        if (!isfinite(a[i]) && !(domain[i] == '-' && isinf(a[i]))) {
            return 1;
        }
        if ((domain[i] == 'p' && !(a[i] > 0)) || (domain[i] == 'n' && !(a[i] >= 0))) {
            return 1;
        }
    }
    return nargs > 0 && a[0] > upper;
}

/* ------------------------------------------------------------------------------------------ */

enum receiver { R_NONE, R_UNIVERSE, R_GROWTH, R_SPECTRUM };
struct entry {
    const char *name;
    enum receiver receiver;
    int nargs;
    const char *domain;
    double upper;
    void (*f)(void);
    const char *array_name;
    void (*array)(void);
};
#define FN(f) ((void (*)(void))(f))
#define ARRAY_0(n) NULL, NULL
#define ARRAY_1(n) "relicore_" #n "_array", FN(relicore_##n##_array)
#define E(r, n, k, d, u, a) { "relicore_" #n, r, k, d, u, FN(relicore_##n), ARRAY_##a(n) },
#define E_NONE(n, k, d, u, a) E(R_NONE, n, k, d, u, a)
#define E_UNIVERSE(n, k, d, u, a) E(R_UNIVERSE, n, k, d, u, a)
#define E_GROWTH(n, k, d, u, a) E(R_GROWTH, n, k, d, u, a)
#define E_SPECTRUM(n, k, d, u, a) E(R_SPECTRUM, n, k, d, u, a)
static const struct entry ENTRIES[] = {
    RELICORE_GROWTH_SCALARS(E_NONE)
    RELICORE_GROWTH_UNIVERSE(E_UNIVERSE)
    RELICORE_GROWTH_GROWTH(E_GROWTH)
    RELICORE_GROWTH_POWER_SPECTRUM(E_SPECTRUM)
};
/* the array lists must match the entries' array flags (both come from the table) */
#define COUNT(n, k, p) +1
enum { NARRAYS = 0 RELICORE_GROWTH_UNIVERSE_ARRAYS(COUNT) RELICORE_GROWTH_GROWTH_ARRAYS(COUNT)
                  RELICORE_GROWTH_POWER_SPECTRUM_ARRAYS(COUNT) RELICORE_GROWTH_ARRAYS(COUNT) };

typedef int32_t (*n4_fn)(double, double, double, double, double *);
typedef int32_t (*u1_fn)(const struct relicore_universe *, double, double *);
typedef int32_t (*u2_fn)(const struct relicore_universe *, double, double, double *);
typedef int32_t (*g1_fn)(const struct relicore_linear_growth *, double, double *);
typedef int32_t (*g2_fn)(const struct relicore_linear_growth *, double, double, double *);
typedef int32_t (*p0_fn)(const struct relicore_linear_power_spectrum *, double *);
typedef int32_t (*p1_fn)(const struct relicore_linear_power_spectrum *, double, double *);
typedef int32_t (*p2_fn)(const struct relicore_linear_power_spectrum *, double, double, double *);
typedef int32_t (*ua1_fn)(const struct relicore_universe *, const double *, size_t, double *);
typedef int32_t (*ua2_fn)(const struct relicore_universe *, const double *, size_t, double,
                          double *);
typedef int32_t (*ga1_fn)(const struct relicore_linear_growth *, const double *, size_t, double *);
typedef int32_t (*pa1_fn)(const struct relicore_linear_power_spectrum *, const double *, size_t,
                          double *);
typedef int32_t (*pa2_fn)(const struct relicore_linear_power_spectrum *, const double *, size_t,
                          double, double *);

struct recv {
    const struct relicore_universe *u;
    const struct relicore_linear_growth *g;
    const struct relicore_linear_power_spectrum *p;
};

static int32_t call(const struct entry *e, const struct recv *r, const double *a, double *out)
{
    switch (e->receiver) {
    case R_NONE: return ((n4_fn)e->f)(a[0], a[1], a[2], a[3], out);
    case R_UNIVERSE:
        return e->nargs == 1 ? ((u1_fn)e->f)(r->u, a[0], out) : ((u2_fn)e->f)(r->u, a[0], a[1], out);
    case R_GROWTH:
        return e->nargs == 1 ? ((g1_fn)e->f)(r->g, a[0], out) : ((g2_fn)e->f)(r->g, a[0], a[1], out);
    case R_SPECTRUM:
        return e->nargs == 0   ? ((p0_fn)e->f)(r->p, out)
               : e->nargs == 1 ? ((p1_fn)e->f)(r->p, a[0], out)
                               : ((p2_fn)e->f)(r->p, a[0], a[1], out);
    }
    return -999;
}

static int32_t call_array(const struct entry *e, const struct recv *r, const double *x, size_t n,
                          const double *a, double *out)
{
    switch (e->receiver) {
    case R_UNIVERSE:
        return e->nargs == 1 ? ((ua1_fn)e->array)(r->u, x, n, out)
                             : ((ua2_fn)e->array)(r->u, x, n, a[1], out);
    case R_GROWTH: return ((ga1_fn)e->array)(r->g, x, n, out);
    case R_SPECTRUM:
        return e->nargs == 1 ? ((pa1_fn)e->array)(r->p, x, n, out)
                             : ((pa2_fn)e->array)(r->p, x, n, a[1], out);
    default: return -999;
    }
}

/* ------------------------------------------------------------------------------------------ */

static struct relicore_universe *g_universe, *g_universe_copy, *g_universe_blank;
static struct relicore_linear_growth *g_growth, *g_growth_copy, *g_growth_blank, *g_growth_bad;
static struct relicore_linear_power_spectrum *g_spectrum, *g_spectrum_copy, *g_spectrum_blank,
    *g_spectrum_bad;

static void *zalloc(size_t n)
{
    void *p = calloc(1, n);
    if (p == NULL) {
        exit(2);
    }
    return p;
}

static void build(void)
{
    struct relicore_universe_parameters q;
    g_universe = zalloc(sizeof *g_universe);
    g_universe_copy = zalloc(sizeof *g_universe_copy);
    g_universe_blank = zalloc(sizeof *g_universe_blank);
    g_growth = zalloc(sizeof *g_growth);
    g_growth_copy = zalloc(sizeof *g_growth_copy);
    g_growth_blank = zalloc(sizeof *g_growth_blank);
    g_growth_bad = zalloc(sizeof *g_growth_bad);
    g_spectrum = zalloc(sizeof *g_spectrum);
    g_spectrum_copy = zalloc(sizeof *g_spectrum_copy);
    g_spectrum_blank = zalloc(sizeof *g_spectrum_blank);
    g_spectrum_bad = zalloc(sizeof *g_spectrum_bad);
    relicore_universe_parameters_default(67.36, 0.3153, &q);
    q.omega_baryon = 0.0493;
    check(relicore_universe_init(&q, g_universe) == RELICORE_OK, "universe");
    memcpy(g_universe_copy, g_universe, sizeof *g_universe);
    check(relicore_linear_growth_compute(g_universe, g_growth) == RELICORE_OK, "growth");
    memcpy(g_growth_copy, g_growth, sizeof *g_growth);
    struct relicore_linear_power_spectrum_options o;
    relicore_linear_power_spectrum_options_default(&o);
    o.value = 2.1e-9;
    o.spectral_index = 0.9649;
    check(relicore_linear_power_spectrum_compute(g_growth, &o, g_spectrum) == RELICORE_OK,
          "spectrum");
    memcpy(g_spectrum_copy, g_spectrum, sizeof *g_spectrum);
    /* a valid tag over overwritten storage (NaN words): documented statuses, never a crash */
    memcpy(g_growth_bad, g_growth, sizeof *g_growth);
    memcpy(g_spectrum_bad, g_spectrum, sizeof *g_spectrum);
    for (size_t i = 0; i < RELICORE_LINEAR_GROWTH_STORAGE_WORDS; i++) {
        g_growth_bad->storage[i] = next_u64();
    }
    for (size_t i = 0; i < RELICORE_LINEAR_POWER_SPECTRUM_STORAGE_WORDS; i++) {
        g_spectrum_bad->storage[i] = next_u64() | 0x7ff8000000000000u;
    }
    g_growth_blank->tag = next_u64(); /* a forged tag */
}

/* kind 0 valid, 1 copy, 2 NULL, 3 never filled / forged, 4 overwritten storage */
static struct recv pick(int *kind)
{
    struct recv r = { g_universe, g_growth, g_spectrum };
    *kind = (int)below(8);
    if (*kind > 4) {
        *kind = 0;
    }
    switch (*kind) {
    case 1: r.u = g_universe_copy; r.g = g_growth_copy; r.p = g_spectrum_copy; break;
    case 2: r.u = NULL; r.g = NULL; r.p = NULL; break;
    case 3: r.u = g_universe_blank; r.g = g_growth_blank; r.p = g_spectrum_blank; break;
    case 4: r.u = g_universe; r.g = g_growth_bad; r.p = g_spectrum_bad; break;
    }
    return r;
}

static void hostile_functions(long iterations)
{
    for (long it = 0; it < iterations; it++) {
        for (size_t k = 0; k < LEN(ENTRIES); k++) {
            const struct entry *e = &ENTRIES[k];
            int kind;
            struct recv r = pick(&kind);
            if (e->receiver == R_NONE) {
                kind = 0;
            }
            if (e->receiver == R_SPECTRUM && e->nargs == 2 && below(4)) {
                kind = kind == 4 ? 0 : kind; /* sigma(R) on garbage storage is slow: rarely */
            }
            double a[4] = { hostile(), hostile(), hostile(), hostile() };
            double out = SENTINEL;
            int nul = below(16) == 0;
            int32_t s = call(e, &r, a, nul ? NULL : &out);
            g_calls++;
            check(documented(s), "%s: undocumented status %d", e->name, (int)s);
            if (nul) {
                check(s == RELICORE_ERROR_NULL_POINTER, "%s(NULL out) = %d", e->name, (int)s);
                continue;
            }
            if (kind == 2) {
                check(s == RELICORE_ERROR_NULL_POINTER && isnan(out), "%s(NULL) = %d", e->name,
                      (int)s);
            } else if (kind == 3) {
                check(s == RELICORE_ERROR_INVALID_STRUCT && isnan(out), "%s(unfilled) = %d",
                      e->name, (int)s);
            }
            check(s == RELICORE_OK ? out != SENTINEL : isnan(out), "%s: status %d with %.17g",
                  e->name, (int)s, out);
            if (kind <= 1 && outside(e->domain, e->upper, e->nargs, a)) {
                check(s != RELICORE_OK, "%s(%.17g, %.17g, ...) = OK outside its domain \"%s\"",
                      e->name, a[0], a[1], e->domain);
            }
            if (e->array == NULL) {
                continue;
            }
            size_t n = below(9);
            double x[8], o[8], want[8];
            int32_t ws[8];
            for (size_t i = 0; i < 8; i++) {
                x[i] = below(2) ? hostile() : a[0];
                o[i] = SENTINEL;
            }
            int in_place = below(4) == 0;
            int null_x = below(32) == 0;
            int32_t first = RELICORE_OK;
            for (size_t i = 0; i < n; i++) {
                double ai[4] = { x[i], a[1], a[2], a[3] };
                want[i] = SENTINEL;
                ws[i] = call(e, &r, ai, &want[i]);
                if (first == RELICORE_OK) {
                    first = ws[i];
                }
            }
            if (in_place) {
                memcpy(o, x, sizeof o);
            }
            s = call_array(e, &r, null_x ? NULL : (in_place ? o : x), n, a, o);
            g_calls++;
            check(documented(s), "%s: undocumented status %d", e->array_name, (int)s);
            if (null_x || kind == 2) {
                check(s == RELICORE_ERROR_NULL_POINTER, "%s(NULL) = %d", e->array_name, (int)s);
                continue;
            }
            if (kind == 3) {
                check(s == RELICORE_ERROR_INVALID_STRUCT, "%s(unfilled) = %d", e->array_name,
                      (int)s);
                for (size_t i = 0; i < n; i++) {
                    check(isnan(o[i]), "%s(unfilled): out[%zu] = %.17g", e->array_name, i, o[i]);
                }
                continue;
            }
            if (kind == 4) {
                continue; /* overwritten storage: documented statuses only */
            }
            check(s == first, "%s: status %d, first element status %d", e->array_name, (int)s,
                  (int)first);
            for (size_t i = 0; i < n; i++) {
                uint64_t b1, b2;
                memcpy(&b1, &o[i], 8);
                memcpy(&b2, &want[i], 8);
                check(b1 == b2 || (isnan(o[i]) && isnan(want[i])),
                      "%s: element %zu = %.17g, scalar %.17g (status %d)", e->array_name, i, o[i],
                      want[i], (int)ws[i]);
            }
        }
    }
}

static void hostile_compute(long iterations)
{
    struct relicore_linear_growth *g = zalloc(sizeof *g);
    struct relicore_linear_power_spectrum *p = zalloc(sizeof *p);
    for (long it = 0; it < iterations; it++) {
        int kind;
        struct recv r = pick(&kind);
        int nul_out = below(16) == 0;
        /* the growth: only the universe varies (each compute costs about 10 ms: rarely valid) */
        if (kind == 2 || kind == 3 || nul_out) {
            int32_t s = relicore_linear_growth_compute(r.u, nul_out ? NULL : g);
            g_calls++;
            check(s != RELICORE_OK && documented(s), "growth compute on kind %d = %d", kind, (int)s);
            if (!nul_out) {
                check(g->tag == 0, "a failed growth compute left a tag");
            }
        }
        /* the options: random switches and numbers (NULL now and then) */
        struct relicore_linear_power_spectrum_options o;
        int32_t s = relicore_linear_power_spectrum_options_default(below(32) ? &o : NULL);
        g_calls++;
        check(s == RELICORE_OK || s == RELICORE_ERROR_NULL_POINTER, "options default = %d", (int)s);
        if (s != RELICORE_OK) {
            relicore_linear_power_spectrum_options_default(&o);
        }
        o.transfer_form = below(4) ? (int32_t)below(2) : (int32_t)next_u64();
        o.normalisation = below(4) ? (int32_t)below(2) : (int32_t)next_u64();
        o.value = below(2) ? hostile() : (o.normalisation ? 0.8 : 2.1e-9);
        o.spectral_index = below(2) ? hostile() : 0.965;
        o.running = below(2) ? hostile() : 0.0;
        int valid_inputs = (o.transfer_form == 0 || o.transfer_form == 1) &&
                           (o.normalisation == 0 || o.normalisation == 1) && o.value > 0 &&
                           isfinite(o.value) && isfinite(o.spectral_index) && isfinite(o.running);
        /* a full spectrum compute costs a quadrature: do most of the refused ones, few others */
        if (kind == 0 && valid_inputs && below(64)) {
            continue;
        }
        int nul_opt = below(16) == 0;
        s = relicore_linear_power_spectrum_compute(r.g, nul_opt ? NULL : &o, nul_out ? NULL : p);
        g_calls++;
        check(documented(s), "spectrum compute: undocumented %d", (int)s);
        if (nul_out || nul_opt || kind == 2) {
            check(s == RELICORE_ERROR_NULL_POINTER, "spectrum compute with NULL = %d", (int)s);
        } else if (kind == 3) {
            check(s == RELICORE_ERROR_INVALID_STRUCT, "spectrum of an unfilled growth = %d", (int)s);
        } else if (!valid_inputs && kind <= 1) {
            check(s != RELICORE_OK, "spectrum compute accepted bad options (%d %d %g %g %g)",
                  (int)o.transfer_form, (int)o.normalisation, o.value, o.spectral_index,
                  o.running);
        }
        if (!nul_out) {
            check(s == RELICORE_OK ? p->tag != 0 : p->tag == 0, "spectrum tag after status %d",
                  (int)s);
        }
    }
    free(g);
    free(p);
}

int main(int argc, char **argv)
{
    long calls = 100000;
    for (int i = 1; i < argc; i++) {
        if (strcmp(argv[i], "--calls") == 0 && i + 1 < argc) {
            calls = strtol(argv[++i], NULL, 10);
        } else if (strcmp(argv[i], "--no-uninit") == 0) {
            /* accepted for symmetry with hostile_abi.c: every struct here is initialised */
        }
    }
    check(NARRAYS > 0, "no array forms in the growth lists");
    build();
    /* each iteration calls every function once: calls per function = calls */
    hostile_functions(calls);
    hostile_compute(calls / 100 > 0 ? calls / 100 : 1);
    printf("hostile: %ld calls, %ld failures (%zu growth functions, %d array forms)\n", g_calls,
           g_failures, LEN(ENTRIES), (int)NARRAYS);
    free(g_universe);
    free(g_universe_copy);
    free(g_universe_blank);
    free(g_growth);
    free(g_growth_copy);
    free(g_growth_blank);
    free(g_growth_bad);
    free(g_spectrum);
    free(g_spectrum_copy);
    free(g_spectrum_blank);
    free(g_spectrum_bad);
    return g_failures == 0 ? 0 : 1;
}
