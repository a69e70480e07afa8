/*
 * C vector test of the radiation-thermometry functions (C11): every line of
 * tests/data/thermometry.txt and tests/data/thermometry_response.txt (format: tests/data/FORMAT.md;
 * references: mpmath at 50 digits, tests/reference/thermometry_vectors.py) through the C ABI, in
 * double and float, with a name "function@field" selecting one field of the
 * relicore_temperature_uncertainty a _with_uncertainty function writes; status lines must fail
 * with their code and leave NaN in every real field (inputs 0). Then the interface: NULL
 * pointers, the frame (image) forms against the scalar functions pixel by pixel (same bits),
 * per-pixel and shared parameters, length mismatches, n = 0, and the combined standard
 * uncertainty of arrays.
 *
 * The regular functions are dispatched through the lists of tests/c/gen_functions.h (generated
 * from bindings/functions.toml); the response-table, array and frame forms by name.
 *
 *   test_thermometry THERMOMETRY_FILE RESPONSE_FILE           checks, "N passed, M failed"
 *   test_thermometry --dump THERMOMETRY_FILE RESPONSE_FILE    "name bits" per double value line
 */
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "gen_functions.h"
#include "relicore.h"
#include "vector_files.h"

typedef struct relicore_temperature_uncertainty tu64;
typedef struct relicore_temperature_uncertainty_f32 tu32;
typedef void (*any_fn)(void);

/* A function of the lists: its name (without relicore_), arguments and symbol; kind 0 for a
 * number, 1 for a struct; f32 for the float twin. */
struct entry {
    const char *name;
    int nargs, structured, f32;
    any_fn fn;
};

#define E64(name, nargs, domain, upper, array) {#name, nargs, 0, 0, (any_fn)relicore_##name},
#define E32(name, nargs, domain, upper, array) {#name "_f32", nargs, 0, 1, (any_fn)relicore_##name##_f32},
#define S64(name, nargs, domain, upper, array) {#name, nargs, 1, 0, (any_fn)relicore_##name},
#define S32(name, nargs, domain, upper, array) {#name "_f32", nargs, 1, 1, (any_fn)relicore_##name##_f32},

static const struct entry ENTRIES[] = {
    RELICORE_BLACKBODY_SCALARS(E64) RELICORE_BLACKBODY_SCALARS_F32(E32)
    RELICORE_BLACKBODY_WIDE(E64) RELICORE_BLACKBODY_WIDE_F32(E32)
    RELICORE_BLACKBODY_STRUCTS(S64) RELICORE_BLACKBODY_STRUCTS_F32(S32)
};
#define NENTRIES (sizeof ENTRIES / sizeof ENTRIES[0])

static int g_dump = 0;

static const struct entry *find(const char *name) {
    for (size_t i = 0; i < NENTRIES; i++)
        if (strcmp(ENTRIES[i].name, name) == 0) return &ENTRIES[i];
    return NULL;
}

/* d: double arguments; the call by arity (a function pointer converted back to its type). */
#define D double
#define F float
static int32_t call64(const struct entry *e, const double *a, void *out) {
    switch (e->nargs) {
    case 1: return ((int32_t(*)(D, void *))e->fn)(a[0], out);
    case 2: return ((int32_t(*)(D, D, void *))e->fn)(a[0], a[1], out);
    case 3: return ((int32_t(*)(D, D, D, void *))e->fn)(a[0], a[1], a[2], out);
    case 4: return ((int32_t(*)(D, D, D, D, void *))e->fn)(a[0], a[1], a[2], a[3], out);
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
    for (int i = 0; i < e->nargs && i < 12; i++) a[i] = (float)d[i];
    switch (e->nargs) {
    case 1: return ((int32_t(*)(F, void *))e->fn)(a[0], out);
    case 2: return ((int32_t(*)(F, F, void *))e->fn)(a[0], a[1], out);
    case 3: return ((int32_t(*)(F, F, F, void *))e->fn)(a[0], a[1], a[2], out);
    case 4: return ((int32_t(*)(F, F, F, F, void *))e->fn)(a[0], a[1], a[2], a[3], out);
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

/* One field of a struct result ("temperature_k", "combined_standard_uncertainty_k",
 * "sensitivity_<i>"); NaN for an unknown field. */
static double field64(const tu64 *r, const char *f) {
    if (strcmp(f, "temperature_k") == 0) return r->temperature_k;
    if (strcmp(f, "combined_standard_uncertainty_k") == 0) return r->combined_standard_uncertainty_k;
    if (strncmp(f, "sensitivity_", 12) == 0) {
        int i = atoi(f + 12);
        if (i >= 0 && i < 5 && (uint32_t)i < r->inputs) return r->sensitivity_coefficients[i];
    }
    return NAN;
}
static double field32(const tu32 *r, const char *f) {
    tu64 d = {r->temperature_k, r->combined_standard_uncertainty_k, {0}, r->inputs};
    for (int i = 0; i < 5; i++) d.sensitivity_coefficients[i] = r->sensitivity_coefficients[i];
    return field64(&d, f);
}
static int all_nan64(const tu64 *r) {
    int ok = isnan(r->temperature_k) && isnan(r->combined_standard_uncertainty_k) && r->inputs == 0;
    for (int i = 0; i < 5; i++) ok = ok && isnan(r->sensitivity_coefficients[i]);
    return ok;
}
static int all_nan32(const tu32 *r) {
    int ok = isnan(r->temperature_k) && isnan(r->combined_standard_uncertainty_k) && r->inputs == 0;
    for (int i = 0; i < 5; i++) ok = ok && isnan(r->sensitivity_coefficients[i]);
    return ok;
}

/* Checks (or dumps) one value or status line: status s, result got (NaN-filled on failure). */
static void judge(const char *where, const char *name, int f32, int32_t s, double got, int failed_nan,
                  const char *kind, double want, double tol, const char *copy) {
    if (strcmp(kind, "status") == 0) {
        if (g_dump) return;
        check(s == (int32_t)tol && failed_nan, "%s: %s: status %d (want %d), outputs NaN %d: %s", where, name, s,
              (int)tol, failed_nan, copy);
        return;
    }
    if (g_dump) {
        if (!f32) printf("%s %016llx\n", name, (unsigned long long)bits64(got));
        return;
    }
    int known = 1;
    int ok = s == RELICORE_OK && within(got, want, kind, tol, 1, &known);
    check(ok && known, "%s: %s: status %d, want %.17e got %.17e (%s %g): %s", where, name, s, want, got, kind, tol,
          copy);
}

/* A line of thermometry.txt. */
static void scalar_line(const char *where, char **tok, int ntok, const char *copy) {
    char name[160];
    snprintf(name, sizeof name, "%s", tok[0]);
    char *at = strchr(name, '@');
    const char *fieldname = at ? at + 1 : NULL;
    if (at) *at = '\0';
    int nargs = atoi(tok[1]);
    if (ntok != 2 + nargs + 4) {
        check(0, "%s: malformed line: %s", where, copy);
        return;
    }
    double a[200];
    for (int i = 0; i < nargs && i < 200; i++) parse_number(tok[2 + i], &a[i]);
    double want = 0, tol = 0;
    parse_number(tok[2 + nargs], &want);
    parse_number(tok[2 + nargs + 2], &tol);
    const char *kind = tok[2 + nargs + 1];
    if (strcmp(name, "combined_standard_uncertainty") == 0 ||
        strcmp(name, "combined_standard_uncertainty_correlated") == 0) {
        int n = (int)a[0];
        double out = 0;
        int32_t s;
        if (strcmp(name, "combined_standard_uncertainty") == 0)
            s = relicore_combined_standard_uncertainty(a + 1, (size_t)n, a + 1 + n, (size_t)n, &out);
        else
            s = relicore_combined_standard_uncertainty_correlated(a + 1, (size_t)n, a + 1 + n, (size_t)n,
                                                                  a + 1 + 2 * n, (size_t)(n * n), &out);
        judge(where, tok[0], 0, s, out, isnan(out), kind, want, tol, copy);
        return;
    }
    const struct entry *e = find(name);
    if (!e) {
        check(0, "%s: no C dispatch for %s", where, name);
        return;
    }
    if (e->structured != (fieldname != NULL) && strcmp(kind, "status") != 0) {
        check(0, "%s: %s: a field selector goes with a struct result: %s", where, name, copy);
        return;
    }
    if (e->structured) {
        int32_t s;
        double got;
        int nan_ok;
        if (e->f32) {
            tu32 r;
            memset(&r, 0x5a, sizeof r);
            s = call32(e, a, &r);
            got = fieldname ? field32(&r, fieldname) : NAN;
            nan_ok = all_nan32(&r);
        } else {
            tu64 r;
            memset(&r, 0x5a, sizeof r);
            s = call64(e, a, &r);
            got = fieldname ? field64(&r, fieldname) : NAN;
            nan_ok = all_nan64(&r);
        }
        judge(where, tok[0], e->f32, s, got, nan_ok, kind, want, tol, copy);
    } else if (e->f32) {
        float r = 1.0f;
        int32_t s = call32(e, a, &r);
        judge(where, tok[0], 1, s, (double)r, isnan(r), kind, want, tol, copy);
    } else {
        double r = 1.0;
        int32_t s = call64(e, a, &r);
        judge(where, tok[0], 0, s, r, isnan(r), kind, want, tol, copy);
    }
}

/* thermometry_response.txt: a header "name npoints nargs args... expected kind tol source" and
 * npoints table rows. */
static void response_file(const char *path) {
    struct reader r;
    if (!open_reader(&r, path, 64)) return;
    char *tok[65];
    int ntok;
    while (next_record(&r, tok, &ntok)) {
        char where[200], copy[MAX_LINE];
        snprintf(where, sizeof where, "%s", r.where);
        snprintf(copy, sizeof copy, "%s", r.copy);
        char name[160], full[160];
        snprintf(name, sizeof name, "%s", tok[0]);
        snprintf(full, sizeof full, "%s", tok[0]);
        char *at = strchr(name, '@');
        const char *fieldname = at ? at + 1 : NULL;
        if (at) *at = '\0';
        int npoints = atoi(tok[1]), nargs = atoi(tok[2]);
        if (ntok != 3 + nargs + 4 || npoints < 0 || npoints > 4096 || nargs > 12) {
            check(0, "%s: malformed header: %s", where, copy);
            return;
        }
        double a[12], want = 0, tol = 0;
        for (int i = 0; i < nargs; i++) parse_number(tok[3 + i], &a[i]);
        parse_number(tok[3 + nargs], &want);
        char kind[16];
        snprintf(kind, sizeof kind, "%s", tok[3 + nargs + 1]);
        parse_number(tok[3 + nargs + 2], &tol);
        double *w = grow(NULL, (size_t)npoints + 1, sizeof *w), *q = grow(NULL, (size_t)npoints + 1, sizeof *q);
        for (int k = 0; k < npoints; k++) {
            if (!next_record(&r, tok, &ntok) || ntok != 2) {
                check(0, "%s: table ends early", where);
                free(w), free(q);
                return;
            }
            parse_number(tok[0], &w[k]);
            parse_number(tok[1], &q[k]);
        }
        size_t n = (size_t)npoints;
        int32_t s = -999;
        double got = NAN;
        int nan_ok = 0;
        if (strcmp(name, "measured_response_weighted_radiance") == 0 && nargs == 5) {
            s = relicore_measured_response_weighted_radiance(w, n, q, n, a[0], a[1], a[2], a[3], a[4], &got);
            nan_ok = isnan(got);
        } else if (strcmp(name, "object_temperature_response") == 0 && nargs == 5) {
            s = relicore_object_temperature_response(w, n, q, n, a[0], a[1], a[2], a[3], a[4], &got);
            nan_ok = isnan(got);
        } else if (strcmp(name, "response_weighted_radiance_temperature_derivative") == 0 && nargs == 1) {
            s = relicore_response_weighted_radiance_temperature_derivative(w, n, q, n, a[0], &got);
            nan_ok = isnan(got);
        } else if (strcmp(name, "object_temperature_response_with_uncertainty") == 0 && nargs == 10) {
            tu64 t;
            s = relicore_object_temperature_response_with_uncertainty(w, n, q, n, a[0], a[1], a[2], a[3], a[4], a[5],
                                                                      a[6], a[7], a[8], a[9], &t);
            got = fieldname ? field64(&t, fieldname) : NAN;
            nan_ok = all_nan64(&t);
        } else {
            check(0, "%s: no C dispatch for %s/%d", where, name, nargs);
        }
        judge(where, full, 0, s, got, nan_ok, kind, want, tol, copy);
        free(w), free(q);
    }
    fclose(r.fp);
}

static void scalar_file(const char *path) {
    struct reader r;
    if (!open_reader(&r, path, 256)) return;
    char *tok[257];
    int ntok;
    while (next_record(&r, tok, &ntok)) scalar_line(r.where, tok, ntok, r.copy);
    fclose(r.fp);
}

/* ------------------------------------------------------------------------------------------ */
/* Interface: NULL, frames against the scalar functions, lengths                               */
/* ------------------------------------------------------------------------------------------ */

#define NPIX 1000

/* Every field of two structs, bit for bit (not memcmp: the padding after inputs is unspecified). */
static int same_tu64(const tu64 *a, const tu64 *b) {
    int ok = same(a->temperature_k, b->temperature_k) &&
             same(a->combined_standard_uncertainty_k, b->combined_standard_uncertainty_k) && a->inputs == b->inputs;
    for (int k = 0; k < 5; k++) ok = ok && same(a->sensitivity_coefficients[k], b->sensitivity_coefficients[k]);
    return ok;
}

static int same_tu32(const tu32 *a, const tu32 *b) {
    int ok = memcmp(&a->temperature_k, &b->temperature_k, sizeof(float)) == 0 &&
             memcmp(&a->combined_standard_uncertainty_k, &b->combined_standard_uncertainty_k, sizeof(float)) == 0 &&
             a->inputs == b->inputs;
    for (int k = 0; k < 5; k++)
        ok = ok && memcmp(&a->sensitivity_coefficients[k], &b->sensitivity_coefficients[k], sizeof(float)) == 0;
    return ok;
}

static void frames(void) {
    static double sig[NPIX], eps[NPIX], out[NPIX], out_u[NPIX];
    const double lam = 10e-6, tr = 293.0, tau = 0.9, tp = 280.0;
    double l300 = 0;
    check(relicore_spectral_radiance_wavelength(lam, 300.0, &l300) == RELICORE_OK, "B(10 um, 300 K)");
    for (int i = 0; i < NPIX; i++) {
        sig[i] = l300 * (0.8 + 1.0 * i / (double)NPIX);
        eps[i] = 0.5 + 0.5 * (i % 7) / 6.0;
    }
    sig[17] = NAN;  /* one failing pixel */
    sig[23] = -1e9; /* a signal below the surroundings: no object temperature */
    double one_tr[1] = {tr}, one_tau[1] = {tau}, one_tp[1] = {tp};
    double u1[1] = {0.01 * l300}, u2[1] = {0.02}, u3[1] = {1.0}, u4[1] = {0.01}, u5[1] = {2.0};
    int32_t s = relicore_object_temperature_wavelength_array(lam, sig, NPIX, eps, NPIX, one_tr, 1, one_tau, 1, one_tp,
                                                             1, out);
    check(s == RELICORE_ERROR_NON_FINITE, "frame: first failing pixel's code, got %d", s);
    s = relicore_object_temperature_wavelength_with_uncertainty_array(
        lam, sig, NPIX, eps, NPIX, one_tr, 1, one_tau, 1, one_tp, 1, u1, 1, u2, 1, u3, 1, u4, 1, u5, 1, out_u, out_u);
    (void)s; /* outputs overlapping each other are outside the contract; recomputed below */
    static double ot[NPIX], ou[NPIX];
    s = relicore_object_temperature_wavelength_with_uncertainty_array(
        lam, sig, NPIX, eps, NPIX, one_tr, 1, one_tau, 1, one_tp, 1, u1, 1, u2, 1, u3, 1, u4, 1, u5, 1, ot, ou);
    check(s == RELICORE_ERROR_NON_FINITE, "frame with uncertainty: first code, got %d", s);
    int same_bits = 1, same_u = 1;
    for (int i = 0; i < NPIX; i++) {
        double t = 0;
        int32_t si = relicore_object_temperature_wavelength(lam, sig[i], eps[i], tr, tau, tp, &t);
        tu64 r;
        relicore_object_temperature_wavelength_with_uncertainty(lam, sig[i], eps[i], tr, tau, tp, u1[0], u2[0], u3[0],
                                                                u4[0], u5[0], &r);
        same_bits = same_bits && same(t, out[i]) && (si == RELICORE_OK || isnan(out[i]));
        same_u = same_u && same(r.temperature_k, ot[i]) && same(r.combined_standard_uncertainty_k, ou[i]);
    }
    check(same_bits, "frame pixels are the scalar object temperatures bit for bit");
    check(same_u, "frame pixels with uncertainty are the scalar T and u_c bit for bit");
    /* the budget frame: each pixel's whole struct is the scalar function's */
    static struct relicore_temperature_uncertainty budget[NPIX];
    s = relicore_object_temperature_wavelength_budget_array(lam, sig, NPIX, eps, NPIX, one_tr, 1, one_tau, 1, one_tp,
                                                            1, u1, 1, u2, 1, u3, 1, u4, 1, u5, 1, budget);
    check(s == RELICORE_ERROR_NON_FINITE, "budget frame: first code, got %d", s);
    int same_budget = 1;
    for (int i = 0; i < NPIX; i++) {
        tu64 r;
        relicore_object_temperature_wavelength_with_uncertainty(lam, sig[i], eps[i], tr, tau, tp, u1[0], u2[0], u3[0],
                                                                u4[0], u5[0], &r);
        same_budget = same_budget && same(r.temperature_k, budget[i].temperature_k) &&
                      same(r.combined_standard_uncertainty_k, budget[i].combined_standard_uncertainty_k) &&
                      r.inputs == budget[i].inputs;
        for (int k = 0; k < 5; k++)
            same_budget = same_budget && same(r.sensitivity_coefficients[k], budget[i].sensitivity_coefficients[k]);
    }
    check(same_budget, "budget frame pixels are the scalar structs bit for bit");
    check(isnan(budget[17].temperature_k) && budget[17].inputs == 0 && budget[18].inputs == 5,
          "a failing budget pixel is NaN with inputs 0");
    check(isnan(out[17]) && isnan(out[23]) && !isnan(out[18]), "failing pixels NaN, the others computed");

    /* frequency and band frames, float twins: against the scalar functions */
    double nu = 3e13, bnu = 0;
    relicore_spectral_radiance_frequency(nu, 300.0, &bnu);
    double sf[4] = {bnu, 0.5 * bnu, 2 * bnu, bnu}, of[4];
    s = relicore_object_temperature_frequency_array(nu, sf, 4, eps, 4, one_tr, 1, one_tau, 1, one_tp, 1, of);
    int ok = s == RELICORE_OK;
    for (int i = 0; i < 4; i++) {
        double t = 0;
        relicore_object_temperature_frequency(nu, sf[i], eps[i], tr, tau, tp, &t);
        ok = ok && same(t, of[i]);
    }
    check(ok, "frequency frame = scalar bits");
    double lb = 0;
    relicore_band_radiance_wavelength(8e-6, 14e-6, 300.0, &lb);
    double sb[3] = {lb, 1.2 * lb, 0.8 * lb}, ob[3];
    s = relicore_object_temperature_band_array(8e-6, 14e-6, sb, 3, eps, 3, one_tr, 1, one_tau, 1, one_tp, 1, ob);
    ok = s == RELICORE_OK;
    for (int i = 0; i < 3; i++) {
        double t = 0;
        relicore_object_temperature_band(8e-6, 14e-6, sb[i], eps[i], tr, tau, tp, &t);
        ok = ok && same(t, ob[i]);
    }
    check(ok, "band frame = scalar bits");
    float s32[3] = {(float)l300, (float)(0.5 * l300), (float)(1.5 * l300)}, e32[1] = {0.9f}, tr32[1] = {293.0f},
          tau32[1] = {0.9f}, tp32[1] = {280.0f}, o32[3], ou32[3], u32[1] = {0.0f};
    s = relicore_object_temperature_wavelength_array_f32(1e-5f, s32, 3, e32, 1, tr32, 1, tau32, 1, tp32, 1, o32);
    ok = s == RELICORE_OK;
    for (int i = 0; i < 3; i++) {
        float t = 0;
        relicore_object_temperature_wavelength_f32(1e-5f, s32[i], 0.9f, 293.0f, 0.9f, 280.0f, &t);
        ok = ok && memcmp(&t, &o32[i], sizeof t) == 0;
    }
    check(ok, "f32 frame = f32 scalar bits");
    s = relicore_object_temperature_wavelength_with_uncertainty_array_f32(1e-5f, s32, 3, e32, 1, tr32, 1, tau32, 1,
                                                                          tp32, 1, u32, 1, u32, 1, u32, 1, u32, 1,
                                                                          u32, 1, o32, ou32);
    check(s == RELICORE_OK && ou32[0] == 0.0f, "f32 frame with zero uncertainties: u_c = 0, status %d", s);
    /* the frequency and band budgets and the float budgets: against their scalar functions */
    struct relicore_temperature_uncertainty bfq[4], bbd[3];
    double uf[1] = {1e-14};
    s = relicore_object_temperature_frequency_budget_array(nu, sf, 4, eps, 4, one_tr, 1, one_tau, 1, one_tp, 1, uf, 1,
                                                           u2, 1, u3, 1, u4, 1, u5, 1, bfq);
    ok = s == RELICORE_OK;
    for (int i = 0; i < 4; i++) {
        tu64 r;
        relicore_object_temperature_frequency_with_uncertainty(nu, sf[i], eps[i], tr, tau, tp, uf[0], u2[0], u3[0],
                                                               u4[0], u5[0], &r);
        ok = ok && same_tu64(&r, &bfq[i]) && bfq[i].inputs == 5;
    }
    check(ok, "frequency budget frame = scalar structs bit for bit");
    s = relicore_object_temperature_band_budget_array(8e-6, 14e-6, sb, 3, eps, 3, one_tr, 1, one_tau, 1, one_tp, 1, u3,
                                                      1, u2, 1, u3, 1, u4, 1, u5, 1, bbd);
    ok = s == RELICORE_OK;
    for (int i = 0; i < 3; i++) {
        tu64 r;
        relicore_object_temperature_band_with_uncertainty(8e-6, 14e-6, sb[i], eps[i], tr, tau, tp, u3[0], u2[0], u3[0],
                                                          u4[0], u5[0], &r);
        ok = ok && same_tu64(&r, &bbd[i]);
    }
    check(ok, "band budget frame = scalar structs bit for bit");
    struct relicore_temperature_uncertainty_f32 b32[3];
    float uu32[1] = {1e3f};
    s = relicore_object_temperature_wavelength_budget_array_f32(1e-5f, s32, 3, e32, 1, tr32, 1, tau32, 1, tp32, 1,
                                                                uu32, 1, u32, 1, u32, 1, u32, 1, u32, 1, b32);
    ok = s == RELICORE_OK;
    for (int i = 0; i < 3; i++) {
        tu32 r;
        relicore_object_temperature_wavelength_with_uncertainty_f32(1e-5f, s32[i], 0.9f, 293.0f, 0.9f, 280.0f, 1e3f,
                                                                    0.0f, 0.0f, 0.0f, 0.0f, &r);
        ok = ok && same_tu32(&r, &b32[i]);
    }
    check(ok, "f32 budget frame = f32 scalar structs bit for bit");
    struct relicore_temperature_uncertainty_f32 bq32[3], bb32[3];
    float sq32[3] = {(float)bnu, (float)(0.5 * bnu), (float)(2 * bnu)}, uq32[1] = {1e-14f};
    float sb32[3] = {(float)sb[0], (float)sb[1], (float)sb[2]}, ub32[1] = {1.0f};
    s = relicore_object_temperature_frequency_budget_array_f32(3e13f, sq32, 3, e32, 1, tr32, 1, tau32, 1, tp32, 1,
                                                               uq32, 1, u32, 1, u32, 1, u32, 1, u32, 1, bq32);
    ok = s == RELICORE_OK;
    s = relicore_object_temperature_band_budget_array_f32(8e-6f, 14e-6f, sb32, 3, e32, 1, tr32, 1, tau32, 1, tp32, 1,
                                                          ub32, 1, u32, 1, u32, 1, u32, 1, u32, 1, bb32);
    ok = ok && s == RELICORE_OK;
    for (int i = 0; i < 3; i++) {
        tu32 r;
        relicore_object_temperature_frequency_with_uncertainty_f32(3e13f, sq32[i], 0.9f, 293.0f, 0.9f, 280.0f, 1e-14f,
                                                                   0.0f, 0.0f, 0.0f, 0.0f, &r);
        ok = ok && same_tu32(&r, &bq32[i]);
        /* no float scalar band function with uncertainty: the float band budget against the double
           scalar function on the same (float) inputs, as a check that it computes the same quantity
           (the float accuracy itself is checked on the reference vectors) */
        tu64 q;
        relicore_object_temperature_band_with_uncertainty(8e-6f, 14e-6f, sb32[i], 0.9f, 293.0f, 0.9f, 280.0f, 1.0f,
                                                          0.0f, 0.0f, 0.0f, 0.0f, &q);
        ok = ok && bb32[i].inputs == 5 && fabs(bb32[i].temperature_k - q.temperature_k) < 1e-5 * q.temperature_k &&
             fabs(bb32[i].combined_standard_uncertainty_k - q.combined_standard_uncertainty_k) <
                 1e-4 * q.combined_standard_uncertainty_k;
    }
    check(ok, "f32 frequency budget frame = f32 scalar structs bit for bit; f32 band budget near f64");

    /* lengths: a parameter of neither n nor 1 values, every output NaN */
    double two[2] = {0.9, 0.9};
    s = relicore_object_temperature_wavelength_array(lam, sig, 3, two, 2, one_tr, 1, one_tau, 1, one_tp, 1, out);
    check(s == RELICORE_ERROR_LENGTH_MISMATCH && isnan(out[0]) && isnan(out[2]), "length mismatch: %d", s);
    /* n = 0: nothing written, success */
    out[0] = 7.0;
    s = relicore_object_temperature_wavelength_array(lam, sig, 0, eps, 1, one_tr, 1, one_tau, 1, one_tp, 1, out);
    check(s == RELICORE_OK && out[0] == 7.0, "n = 0: %d", s);
    /* NULL anywhere */
    s = relicore_object_temperature_wavelength_array(lam, sig, 3, NULL, 1, one_tr, 1, one_tau, 1, one_tp, 1, out);
    check(s == RELICORE_ERROR_NULL_POINTER && isnan(out[0]), "NULL parameter: %d", s);
    s = relicore_object_temperature_wavelength_array(lam, sig, 3, eps, 1, one_tr, 1, one_tau, 1, one_tp, 1, NULL);
    check(s == RELICORE_ERROR_NULL_POINTER, "NULL out: %d", s);
    /* a bad wavelength fails every pixel, naming the wavelength's error */
    s = relicore_object_temperature_wavelength_array(-1.0, sig, 3, eps, 1, one_tr, 1, one_tau, 1, one_tp, 1, out);
    check(s == RELICORE_ERROR_NON_POSITIVE && isnan(out[0]) && isnan(out[1]), "bad wavelength: %d", s);

    /* NULL struct outputs and the struct's NaN on failure */
    s = relicore_object_temperature_wavelength_with_uncertainty(lam, l300, 0.9, tr, tau, tp, 1, 1, 1, 1, 1, NULL);
    check(s == RELICORE_ERROR_NULL_POINTER, "NULL struct out: %d", s);
    tu64 r;
    s = relicore_object_temperature_wavelength_with_uncertainty(lam, l300, 1.5, tr, tau, tp, 1, 1, 1, 1, 1, &r);
    check(s == RELICORE_ERROR_OUT_OF_DOMAIN && all_nan64(&r), "emissivity 1.5: %d, struct NaN", s);
    s = relicore_object_temperature_wavelength_with_uncertainty(lam, l300, 0.9, tr, tau, tp, 1, 1, -1, 1, 1, &r);
    check(s == RELICORE_ERROR_NEGATIVE && all_nan64(&r), "negative uncertainty: %d", s);
    s = relicore_object_temperature_wavelength_with_uncertainty(lam, l300, 0.9, tr, tau, tp, 1, 0.01, 1, 0.01, 1, &r);
    check(s == RELICORE_OK && r.inputs == 5, "inputs = 5 (%u)", r.inputs);
    /* u_c again from the coefficients through the array function (eq. 10) */
    double u[5] = {1, 0.01, 1, 0.01, 1}, uc = 0, id[25] = {0};
    for (int i = 0; i < 5; i++) id[6 * i] = 1.0;
    s = relicore_combined_standard_uncertainty(r.sensitivity_coefficients, 5, u, 5, &uc);
    check(s == RELICORE_OK && fabs(uc - r.combined_standard_uncertainty_k) <= 1e-15 * uc,
          "u_c of the struct = eq. 10 of its coefficients: %.17g %.17g", uc, r.combined_standard_uncertainty_k);
    double ucr = 0;
    s = relicore_combined_standard_uncertainty_correlated(r.sensitivity_coefficients, 5, u, 5, id, 25, &ucr);
    check(s == RELICORE_OK && fabs(ucr - uc) <= 1e-14 * uc, "identity correlation = uncorrelated: %.17g", ucr);
    s = relicore_combined_standard_uncertainty_correlated(r.sensitivity_coefficients, 5, u, 5, id, 24, &ucr);
    check(s == RELICORE_ERROR_LENGTH_MISMATCH && isnan(ucr), "matrix of 24 values: %d", s);
    s = relicore_combined_standard_uncertainty(NULL, 0, u, 0, &ucr);
    check(s == RELICORE_ERROR_NULL_POINTER, "NULL coefficients: %d", s);
    s = relicore_combined_standard_uncertainty(u, 0, u, 0, &ucr);
    check(s == RELICORE_OK && ucr == 0.0, "no inputs: u_c = 0");
    /* response forms: NULL table */
    double w[3] = {8e-6, 1e-5, 1.2e-5}, q[3] = {0.5, 1, 0.5}, got = 0;
    s = relicore_object_temperature_response(NULL, 3, q, 3, 10.0, 0.9, tr, tau, tp, &got);
    check(s == RELICORE_ERROR_NULL_POINTER && isnan(got), "response: NULL table: %d", s);
    s = relicore_object_temperature_response(w, 3, q, 2, 10.0, 0.9, tr, tau, tp, &got);
    check(s == RELICORE_ERROR_LENGTH_MISMATCH && isnan(got), "response: lengths: %d", s);
    float w32[3] = {8e-6f, 1e-5f, 1.2e-5f}, q32[3] = {0.5f, 1, 0.5f}, m32 = 0, t32 = 0;
    tu32 rr32;
    s = relicore_measured_response_weighted_radiance_f32(w32, 3, q32, 3, 300.0f, 0.9f, 293.0f, 0.9f, 280.0f, &m32);
    check(s == RELICORE_OK, "f32 measured response: %d", s);
    s = relicore_object_temperature_response_f32(w32, 3, q32, 3, m32, 0.9f, 293.0f, 0.9f, 280.0f, &t32);
    check(s == RELICORE_OK && fabsf(t32 - 300.0f) < 0.01f, "f32 response round trip: %g", (double)t32);
    s = relicore_object_temperature_response_with_uncertainty_f32(w32, 3, q32, 3, m32, 0.9f, 293.0f, 0.9f, 280.0f, 1,
                                                                  0, 0, 0, 0, &rr32);
    check(s == RELICORE_OK && rr32.inputs == 5, "f32 response with uncertainty: %d", s);
    float d32 = 0;
    s = relicore_response_weighted_radiance_temperature_derivative_f32(w32, 3, q32, 3, 300.0f, &d32);
    check(s == RELICORE_OK && d32 > 0, "f32 response derivative: %d", s);
}

int main(int argc, char **argv) {
    int k = 1;
    if (argc > 1 && strcmp(argv[1], "--dump") == 0) g_dump = 1, k = 2;
    if (argc - k != 2) {
        fprintf(stderr, "usage: %s [--dump] THERMOMETRY_FILE RESPONSE_FILE\n", argv[0]);
        return 2;
    }
    scalar_file(argv[k]);
    response_file(argv[k + 1]);
    if (g_dump) return g_failed ? 1 : 0;
    frames();
    printf("%ld passed, %ld failed\n", g_passed, g_failed);
    return g_failed ? 1 : 0;
}
