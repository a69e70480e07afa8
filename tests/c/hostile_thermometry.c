/*
 * Hostile inputs to the radiation-thermometry exports (C11), run by tests/c/run.sh under
 * AddressSanitizer + UndefinedBehaviorSanitizer and under valgrind memcheck:
 *
 * - every function of the generated lists RELICORE_BLACKBODY_WIDE, _WIDE_F32, _STRUCTS and
 *   _STRUCTS_F32 (tests/c/gen_functions.h, from bindings/functions.toml), --calls times each with
 *   random and edge-case arguments: the status is RELICORE_OK or a documented error code; OK
 *   gives a finite number (a struct: finite fields, 1 to 5 inputs, zero coefficients beyond
 *   them); an error gives NaN (every real field NaN and inputs 0); a NaN argument or an argument
 *   outside the table's stated domain ('p' > 0, 'n' >= 0) never succeeds; a NULL out gives
 *   RELICORE_ERROR_NULL_POINTER;
 * - the hand-written forms (response tables, combined standard uncertainty, frames), with NULL
 *   pointers, zero and mismatched lengths and random values: no crash, no out-of-bounds access,
 *   the documented codes, NaN outputs on failure.
 *
 *   hostile_thermometry [--calls N] [--no-uninit]      prints "hostile: ..." and FAIL lines
 */
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "gen_functions.h"
#include "relicore.h"

static long g_fail = 0, g_calls = 0;
static uint64_t g_state = 0x9e3779b97f4a7c15ull;

static uint64_t next(void) {
    g_state ^= g_state << 13;
    g_state ^= g_state >> 7;
    g_state ^= g_state << 17;
    return g_state;
}

static const double EDGES[] = {0.0, -0.0, 1.0, -1.0, 0.5, 1e-300, -1e-300, 5e-324, 1e300, -1e300, INFINITY,
                               -INFINITY, NAN, 1e-5, 3e13, 300.0, 2.7255, 1e9, 1.0000000000000002, 0.9999999999999999,
                               1e-40, 1e38, 4e-6, 1.4e-5};
#define NEDGES (sizeof EDGES / sizeof EDGES[0])

/* A hostile double: an edge value, any bit pattern, or a log-uniform magnitude. */
static double value(void) {
    uint64_t r = next();
    switch (r % 4) {
    case 0: return EDGES[(r >> 8) % NEDGES];
    case 1: {
        uint64_t b = next();
        double d;
        memcpy(&d, &b, sizeof d);
        return d;
    }
    default: {
        double e = ((double)((r >> 11) % 1000000) / 1000000.0) * 80.0 - 40.0;
        double m = pow(10.0, e);
        return (r >> 40) % 5 == 0 ? -m : m;
    }
    }
}

static void fail(const char *fn, const char *what, const double *a, int n, int32_t s) {
    g_fail++;
    if (g_fail > 50) return;
    printf("FAIL %s: %s (status %d) args:", fn, what, s);
    for (int i = 0; i < n; i++) printf(" %.17g", a[i]);
    printf("\n");
}

static int known_status(int32_t s) { return s == RELICORE_OK || (s <= -1 && s >= -16 && s != -13); }

typedef void (*any_fn)(void);
struct entry {
    const char *name;
    int nargs, structured, f32;
    const char *domain;
    any_fn fn;
};
#define E64(name, nargs, domain, upper, array) {#name, nargs, 0, 0, domain, (any_fn)relicore_##name},
#define E32(name, nargs, domain, upper, array) {#name "_f32", nargs, 0, 1, domain, (any_fn)relicore_##name##_f32},
#define S64(name, nargs, domain, upper, array) {#name, nargs, 1, 0, domain, (any_fn)relicore_##name},
#define S32(name, nargs, domain, upper, array) {#name "_f32", nargs, 1, 1, domain, (any_fn)relicore_##name##_f32},
static const struct entry ENTRIES[] = {RELICORE_BLACKBODY_WIDE(E64) RELICORE_BLACKBODY_WIDE_F32(E32)
                                           RELICORE_BLACKBODY_STRUCTS(S64) RELICORE_BLACKBODY_STRUCTS_F32(S32)};
#define NENTRIES (sizeof ENTRIES / sizeof ENTRIES[0])

#define D double
#define F float
static int32_t call64(const struct entry *e, const double *a, void *out) {
    switch (e->nargs) {
    case 3: return ((int32_t(*)(D, D, D, void *))e->fn)(a[0], a[1], a[2], out);
    case 6: return ((int32_t(*)(D, D, D, D, D, D, void *))e->fn)(a[0], a[1], a[2], a[3], a[4], a[5], out);
    case 7: return ((int32_t(*)(D, D, D, D, D, D, D, void *))e->fn)(a[0], a[1], a[2], a[3], a[4], a[5], a[6], out);
    case 11:
        return ((int32_t(*)(D, D, D, D, D, D, D, D, D, D, D, void *))e->fn)(
            a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], a[8], a[9], a[10], out);
    case 12:
        return ((int32_t(*)(D, D, D, D, D, D, D, D, D, D, D, D, void *))e->fn)(
            a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], a[8], a[9], a[10], a[11], out);
    default: return -999;
    }
}
static int32_t call32(const struct entry *e, const double *d, void *out) {
    float a[12];
    for (int i = 0; i < e->nargs; i++) a[i] = (float)d[i];
    switch (e->nargs) {
    case 3: return ((int32_t(*)(F, F, F, void *))e->fn)(a[0], a[1], a[2], out);
    case 6: return ((int32_t(*)(F, F, F, F, F, F, void *))e->fn)(a[0], a[1], a[2], a[3], a[4], a[5], out);
    case 7: return ((int32_t(*)(F, F, F, F, F, F, F, void *))e->fn)(a[0], a[1], a[2], a[3], a[4], a[5], a[6], out);
    case 11:
        return ((int32_t(*)(F, F, F, F, F, F, F, F, F, F, F, void *))e->fn)(
            a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], a[8], a[9], a[10], out);
    case 12:
        return ((int32_t(*)(F, F, F, F, F, F, F, F, F, F, F, F, void *))e->fn)(
            a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], a[8], a[9], a[10], a[11], out);
    default: return -999;
    }
}

/* 1 when the (rounded) argument breaks its stated domain or is NaN. */
static int outside(const struct entry *e, const double *a) {
    for (int i = 0; i < e->nargs; i++) {
        double x = e->f32 ? (double)(float)a[i] : a[i];
        if (isnan(x)) return 1;
        if (e->domain[i] == 'p' && !(x > 0)) return 1;
        if (e->domain[i] == 'n' && x < 0) return 1;
    }
    return 0;
}

/* One call with hostile arguments; the contract of the list's functions. */
static void one(const struct entry *e, long k) {
    double a[12];
    /* half of the calls keep a plausible scene so that successful paths are common */
    static const double plausible[12] = {1e-5, 5e6, 0.9, 293.0, 0.95, 280.0, 1e4, 0.01, 1.0, 0.01, 1.0, 1.0};
    for (int i = 0; i < e->nargs; i++) a[i] = (k % 2 == 0 && next() % 3 != 0) ? plausible[i] : value();
    int bad = outside(e, a);
    int32_t s;
    if (e->structured) {
        union {
            struct relicore_temperature_uncertainty d;
            struct relicore_temperature_uncertainty_f32 f;
        } r;
        memset(&r, 0xa5, sizeof r);
        s = e->f32 ? call32(e, a, &r.f) : call64(e, a, &r.d);
        double t, u, c[5];
        uint32_t n;
        if (e->f32) {
            t = r.f.temperature_k, u = r.f.combined_standard_uncertainty_k, n = r.f.inputs;
            for (int i = 0; i < 5; i++) c[i] = r.f.sensitivity_coefficients[i];
        } else {
            t = r.d.temperature_k, u = r.d.combined_standard_uncertainty_k, n = r.d.inputs;
            for (int i = 0; i < 5; i++) c[i] = r.d.sensitivity_coefficients[i];
        }
        if (!known_status(s)) fail(e->name, "unknown status", a, e->nargs, s);
        if (s == RELICORE_OK) {
            int ok = isfinite(t) && t > 0 && isfinite(u) && u >= 0 && n >= 1 && n <= 5;
            for (int i = 0; i < 5; i++) ok = ok && isfinite(c[i]) && ((uint32_t)i < n || c[i] == 0.0);
            if (!ok) fail(e->name, "OK with a value that is not a finite struct", a, e->nargs, s);
            if (bad) fail(e->name, "an argument outside the stated domain succeeded", a, e->nargs, s);
        } else {
            int ok = isnan(t) && isnan(u) && n == 0;
            for (int i = 0; i < 5; i++) ok = ok && isnan(c[i]);
            if (!ok) fail(e->name, "failure without NaN in every field", a, e->nargs, s);
        }
    } else {
        double got;
        if (e->f32) {
            float f = 1.0f;
            s = call32(e, a, &f);
            got = f;
        } else {
            got = 1.0;
            s = call64(e, a, &got);
        }
        if (!known_status(s)) fail(e->name, "unknown status", a, e->nargs, s);
        if (s == RELICORE_OK && !isfinite(got)) fail(e->name, "OK with a non-finite value", a, e->nargs, s);
        if (s == RELICORE_OK && bad) fail(e->name, "an argument outside the stated domain succeeded", a, e->nargs, s);
        if (s != RELICORE_OK && !isnan(got)) fail(e->name, "failure without NaN", a, e->nargs, s);
    }
    g_calls++;
    if (k == 0) { /* NULL out */
        s = e->f32 ? call32(e, a, NULL) : call64(e, a, NULL);
        if (s != RELICORE_ERROR_NULL_POINTER) fail(e->name, "NULL out not refused", a, e->nargs, s);
    }
}

/* A length: 0, 1, 2, the right one, or one more. */
static size_t hostile_len(size_t n) {
    switch (next() % 6) {
    case 0: return 0;
    case 1: return 1;
    case 2: return 2;
    case 3: return n + 1;
    default: return n;
    }
}

#define CAP 32

static void irregular(long calls) {
    double sig[CAP], p[10][CAP], o1[CAP], o2[CAP], w[CAP], q[CAP], c[CAP], u[CAP], r[CAP * CAP];
    for (long k = 0; k < calls; k++) {
        size_t n = (size_t)(next() % 8);
        for (int i = 0; i < CAP; i++) {
            sig[i] = next() % 2 ? 5e6 * (0.8 + 0.01 * i) : value();
            for (int j = 0; j < 10; j++) p[j][i] = next() % 2 ? (j == 1 ? 293.0 : j == 3 ? 280.0 : 0.9) : value();
            w[i] = next() % 3 ? 8e-6 + 1e-6 * i : value();
            q[i] = next() % 3 ? 1.0 : value();
            c[i] = value(), u[i] = next() % 2 ? fabs(value()) : value();
        }
        for (int i = 0; i < CAP * CAP; i++) r[i] = next() % 4 ? (i % (CAP + 1) == 0 ? 1.0 : 0.0) : value();
        size_t l[10];
        for (int j = 0; j < 10; j++) l[j] = hostile_len(n);
        double *maybe_null = next() % 50 == 0 ? NULL : p[0];
        double *out = next() % 50 == 0 ? NULL : o1;
        for (size_t i = 0; i < CAP; i++) o1[i] = o2[i] = 7.0;
        int32_t s;
        switch (k % 10) {
        case 0:
            s = relicore_object_temperature_wavelength_array(value(), sig, n, maybe_null, l[0], p[1], l[1], p[2], l[2],
                                                             p[3], l[3], out);
            break;
        case 1:
            s = relicore_object_temperature_frequency_with_uncertainty_array(
                next() % 2 ? 3e13 : value(), sig, n, maybe_null, l[0], p[1], l[1], p[2], l[2], p[3], l[3], p[4], l[4],
                p[5], l[5], p[6], l[6], p[7], l[7], p[8], l[8], out, o2);
            break;
        case 2:
            s = relicore_object_temperature_band_array(next() % 2 ? 8e-6 : value(), next() % 2 ? 1.4e-5 : value(),
                                                       sig, n, maybe_null, l[0], p[1], l[1], p[2], l[2], p[3], l[3],
                                                       out);
            break;
        case 3: {
            float sf[CAP], pf[10][CAP], of[CAP], of2[CAP];
            for (int i = 0; i < CAP; i++) {
                sf[i] = (float)sig[i], of[i] = 7.0f, of2[i] = 7.0f;
                for (int j = 0; j < 10; j++) pf[j][i] = (float)p[j][i];
            }
            s = relicore_object_temperature_wavelength_with_uncertainty_array_f32(
                1e-5f, sf, n, pf[0], l[0], pf[1], l[1], pf[2], l[2], pf[3], l[3], pf[4], l[4], pf[5], l[5], pf[6],
                l[6], pf[7], l[7], pf[8], l[8], of, of2);
            s = s != RELICORE_OK ? s
                                 : relicore_object_temperature_band_with_uncertainty_array_f32(
                                       8e-6f, 1.4e-5f, sf, n, pf[0], l[0], pf[1], l[1], pf[2], l[2], pf[3], l[3],
                                       pf[4], l[4], pf[5], l[5], pf[6], l[6], pf[7], l[7], pf[8], l[8], of, of2);
            s = s != RELICORE_OK ? s
                                 : relicore_object_temperature_frequency_array_f32(3e13f, sf, n, pf[0], l[0], pf[1],
                                                                                   l[1], pf[2], l[2], pf[3], l[3], of);
            s = s != RELICORE_OK ? s
                                 : relicore_object_temperature_band_array_f32(8e-6f, 1.4e-5f, sf, n, pf[0], l[0],
                                                                              pf[1], l[1], pf[2], l[2], pf[3], l[3],
                                                                              of);
            s = s != RELICORE_OK ? s
                                 : relicore_object_temperature_wavelength_array_f32(1e-5f, sf, n, pf[0], l[0], pf[1],
                                                                                    l[1], pf[2], l[2], pf[3], l[3],
                                                                                    of);
            s = s != RELICORE_OK ? s
                                 : relicore_object_temperature_frequency_with_uncertainty_array_f32(
                                       3e13f, sf, n, pf[0], l[0], pf[1], l[1], pf[2], l[2], pf[3], l[3], pf[4], l[4],
                                       pf[5], l[5], pf[6], l[6], pf[7], l[7], pf[8], l[8], of, of2);
            break;
        }
        case 4:
            s = relicore_object_temperature_wavelength_with_uncertainty_array(
                1e-5, sig, n, p[0], l[0], p[1], l[1], p[2], l[2], p[3], l[3], p[4], l[4], p[5], l[5], p[6], l[6], p[7],
                l[7], p[8], l[8], o1, o2);
            s = s != RELICORE_OK ? s
                                 : relicore_object_temperature_band_with_uncertainty_array(
                                       8e-6, 1.4e-5, sig, n, p[0], l[0], p[1], l[1], p[2], l[2], p[3], l[3], p[4],
                                       l[4], p[5], l[5], p[6], l[6], p[7], l[7], p[8], l[8], o1, o2);
            s = s != RELICORE_OK ? s
                                 : relicore_object_temperature_frequency_array(3e13, sig, n, p[0], l[0], p[1], l[1],
                                                                               p[2], l[2], p[3], l[3], o1);
            break;
        case 5: {
            size_t nw = hostile_len(n + 2), nq = hostile_len(nw);
            double *ww = next() % 40 == 0 ? NULL : w;
            struct relicore_temperature_uncertainty t;
            s = relicore_measured_response_weighted_radiance(ww, nw, q, nq, value(), 0.9, 293.0, 0.9, 280.0, out);
            if (s != RELICORE_OK && out && !isnan(out[0])) fail("response", "no NaN on failure", sig, 0, s);
            s = relicore_object_temperature_response(ww, nw, q, nq, value(), value(), 293.0, 0.9, value(), out);
            if (s != RELICORE_OK && out && !isnan(out[0])) fail("response", "no NaN on failure", sig, 0, s);
            s = relicore_response_weighted_radiance_temperature_derivative(ww, nw, q, nq, value(), out);
            if (!known_status(s)) fail("response", "unknown status", sig, 0, s);
            s = relicore_object_temperature_response_with_uncertainty(ww, nw, q, nq, value(), 0.9, 293.0, 0.9, 280.0,
                                                                      value(), 0, 1, 0, 1, &t);
            if (s != RELICORE_OK && !(isnan(t.temperature_k) && t.inputs == 0))
                fail("response", "struct not NaN on failure", sig, 0, s);
            break;
        }
        case 6: {
            float wf[CAP], qf[CAP], of = 0;
            struct relicore_temperature_uncertainty_f32 tf;
            for (int i = 0; i < CAP; i++) wf[i] = (float)w[i], qf[i] = (float)q[i];
            size_t nw = hostile_len(n + 2);
            s = relicore_measured_response_weighted_radiance_f32(wf, nw, qf, nw, (float)value(), 0.9f, 293.0f, 0.9f,
                                                                 280.0f, &of);
            s = relicore_object_temperature_response_f32(wf, nw, qf, hostile_len(nw), (float)value(), 0.9f, 293.0f,
                                                         0.9f, 280.0f, &of);
            s = relicore_response_weighted_radiance_temperature_derivative_f32(wf, nw, qf, nw, (float)value(), &of);
            s = relicore_object_temperature_response_with_uncertainty_f32(wf, nw, qf, nw, (float)value(), 0.9f,
                                                                          293.0f, 0.9f, 280.0f, 1, 0, 0, 0, 0, &tf);
            if (s != RELICORE_OK && !(isnan(tf.temperature_k) && tf.inputs == 0))
                fail("response_f32", "struct not NaN on failure", sig, 0, s);
            break;
        }
        case 8: {
            /* the budget frames: every pixel a whole struct; a failing pixel NaN with inputs 0 */
            struct relicore_temperature_uncertainty b[CAP];
            struct relicore_temperature_uncertainty_f32 bf[CAP];
            float sf[CAP], pf[10][CAP];
            for (int i = 0; i < CAP; i++) {
                sf[i] = (float)sig[i];
                for (int j = 0; j < 10; j++) pf[j][i] = (float)p[j][i];
            }
            struct relicore_temperature_uncertainty *bo = next() % 50 == 0 ? NULL : b;
            switch (next() % 6) {
            case 0:
                s = relicore_object_temperature_wavelength_budget_array(
                    next() % 2 ? 1e-5 : value(), sig, n, maybe_null, l[0], p[1], l[1], p[2], l[2], p[3], l[3], p[4],
                    l[4], p[5], l[5], p[6], l[6], p[7], l[7], p[8], l[8], bo);
                break;
            case 1:
                s = relicore_object_temperature_frequency_budget_array(
                    next() % 2 ? 3e13 : value(), sig, n, maybe_null, l[0], p[1], l[1], p[2], l[2], p[3], l[3], p[4],
                    l[4], p[5], l[5], p[6], l[6], p[7], l[7], p[8], l[8], bo);
                break;
            case 2:
                s = relicore_object_temperature_band_budget_array(
                    next() % 2 ? 8e-6 : value(), next() % 2 ? 1.4e-5 : value(), sig, n, maybe_null, l[0], p[1], l[1],
                    p[2], l[2], p[3], l[3], p[4], l[4], p[5], l[5], p[6], l[6], p[7], l[7], p[8], l[8], bo);
                break;
            case 3:
                s = relicore_object_temperature_wavelength_budget_array_f32(
                    1e-5f, sf, n, pf[0], l[0], pf[1], l[1], pf[2], l[2], pf[3], l[3], pf[4], l[4], pf[5], l[5], pf[6],
                    l[6], pf[7], l[7], pf[8], l[8], bf);
                break;
            case 4:
                s = relicore_object_temperature_frequency_budget_array_f32(
                    3e13f, sf, n, pf[0], l[0], pf[1], l[1], pf[2], l[2], pf[3], l[3], pf[4], l[4], pf[5], l[5], pf[6],
                    l[6], pf[7], l[7], pf[8], l[8], bf);
                break;
            default:
                s = relicore_object_temperature_band_budget_array_f32(
                    8e-6f, 1.4e-5f, sf, n, pf[0], l[0], pf[1], l[1], pf[2], l[2], pf[3], l[3], pf[4], l[4], pf[5],
                    l[5], pf[6], l[6], pf[7], l[7], pf[8], l[8], bf);
                break;
            }
            break;
        }
        case 7: {
            size_t nc = hostile_len(n), nu = hostile_len(nc);
            s = relicore_combined_standard_uncertainty(next() % 40 ? c : NULL, nc, u, nu, out);
            if (s == RELICORE_OK && out && !(isfinite(out[0]) && out[0] >= 0))
                fail("combined_standard_uncertainty", "OK with a bad value", c, (int)nc, s);
            break;
        }
        default: {
            size_t nc = hostile_len(n), nr = next() % 2 ? nc * nc : hostile_len(nc * nc);
            s = relicore_combined_standard_uncertainty_correlated(c, nc, u, nc, next() % 40 ? r : NULL, nr, out);
            if (s == RELICORE_OK && out && !(isfinite(out[0]) && out[0] >= 0))
                fail("combined_standard_uncertainty_correlated", "OK with a bad value", c, (int)nc, s);
            if (s != RELICORE_OK && out && !isnan(out[0]))
                fail("combined_standard_uncertainty_correlated", "no NaN on failure", c, (int)nc, s);
            break;
        }
        }
        if (!known_status(s)) fail("irregular", "unknown status", sig, 0, s);
        g_calls++;
    }
}

int main(int argc, char **argv) {
    long calls = 100000;
    for (int i = 1; i < argc; i++) {
        if (strcmp(argv[i], "--calls") == 0 && i + 1 < argc) calls = atol(argv[++i]);
        /* --no-uninit: accepted for the run.sh interface; nothing here reads uninitialised memory */
    }
    for (size_t e = 0; e < NENTRIES; e++)
        for (long k = 0; k < calls; k++) one(&ENTRIES[e], k);
    irregular(calls);
    printf("hostile: %zu thermometry functions x %ld calls, irregular forms %ld calls, %ld calls in all, %ld failures\n",
           NENTRIES, calls, calls, g_calls, g_fail);
    return g_fail ? 1 : 0;
}
