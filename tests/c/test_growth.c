/*
 * C vector test of relicore's structure growth (C11):
 *
 *   test_growth FILE          checks every value and status line of tests/data/growth.txt
 *                             (format: tests/data/FORMAT.md, "Growth file"): universes by
 *                             relicore_universe_init, growths by relicore_linear_growth_compute,
 *                             spectra by relicore_linear_power_spectrum_compute; every array form
 *                             on the vectors of its function (bit for bit with the scalar form);
 *                             the options default, copies, NULL pointers, forged and unfilled
 *                             structs, and every documented construction error.
 *   test_growth --dump FILE   prints "target function bits" for every value line, in file order
 *                             (the cross-language test compares them with Python's bits).
 *
 * The functions are called through the lists of tests/c/gen_functions.h (generated from
 * bindings/functions.toml), so a new growth entry of the table is reached without an edit here.
 * The growth and spectrum structs (131080 bytes each) are allocated, never on the stack.
 */
#include <inttypes.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "gen_functions.h"
#include "relicore.h"
#include "vector_files.h"

#define NAME 64
#define MAXARGS 4
#define LEN(a) (sizeof(a) / sizeof((a)[0]))

/* ------------------------------------------------------------------------------------------ */
/* The functions of the topic, from the generated lists                                        */
/* ------------------------------------------------------------------------------------------ */

enum receiver { R_NONE, R_UNIVERSE, R_GROWTH, R_SPECTRUM };

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

struct entry {
    const char *name;
    enum receiver receiver;
    int nargs;
    void (*f)(void); /* the scalar form, cast back by call_entry */
    void (*array)(void); /* the array form over the first argument, or NULL */
    long vectors;        /* value and status lines seen */
};

#define FN(f) ((void (*)(void))(f))
#define NOARRAY(n) NULL
#define ARR(n) FN(relicore_##n##_array)
#define ARRAY_0(n) NOARRAY(n)
#define ARRAY_1(n) ARR(n)
#define E_NONE(n, k, d, u, a) { #n, R_NONE, k, FN(relicore_##n), ARRAY_##a(n), 0 },
#define E_UNIVERSE(n, k, d, u, a) { #n, R_UNIVERSE, k, FN(relicore_##n), ARRAY_##a(n), 0 },
#define E_GROWTH(n, k, d, u, a) { #n, R_GROWTH, k, FN(relicore_##n), ARRAY_##a(n), 0 },
#define E_SPECTRUM(n, k, d, u, a) { #n, R_SPECTRUM, k, FN(relicore_##n), ARRAY_##a(n), 0 },
static struct entry g_entries[] = {
    RELICORE_GROWTH_SCALARS(E_NONE)
    RELICORE_GROWTH_UNIVERSE(E_UNIVERSE)
    RELICORE_GROWTH_GROWTH(E_GROWTH)
    RELICORE_GROWTH_POWER_SPECTRUM(E_SPECTRUM)
};

static struct entry *find_entry(const char *name)
{
    for (size_t i = 0; i < LEN(g_entries); i++) {
        if (strcmp(g_entries[i].name, name) == 0) {
            return &g_entries[i];
        }
    }
    return NULL;
}

/* ------------------------------------------------------------------------------------------ */
/* Named values of the file                                                                    */
/* ------------------------------------------------------------------------------------------ */

struct named_universe {
    char name[NAME];
    struct relicore_universe *u;
};
struct named_growth {
    char name[NAME];
    struct relicore_linear_growth *g;
};
struct named_spectrum {
    char name[NAME];
    struct relicore_linear_power_spectrum *p;
};

static struct named_universe *g_universes;
static size_t g_nuniverses;
static struct named_growth *g_growths;
static size_t g_ngrowths;
static struct named_spectrum *g_spectra;
static size_t g_nspectra;

static const struct relicore_universe *find_universe(const char *name)
{
    for (size_t i = 0; i < g_nuniverses; i++) {
        if (strcmp(g_universes[i].name, name) == 0) {
            return g_universes[i].u;
        }
    }
    return NULL;
}
static const struct relicore_linear_growth *find_growth(const char *name)
{
    for (size_t i = 0; i < g_ngrowths; i++) {
        if (strcmp(g_growths[i].name, name) == 0) {
            return g_growths[i].g;
        }
    }
    return NULL;
}
static const struct relicore_linear_power_spectrum *find_spectrum(const char *name)
{
    for (size_t i = 0; i < g_nspectra; i++) {
        if (strcmp(g_spectra[i].name, name) == 0) {
            return g_spectra[i].p;
        }
    }
    return NULL;
}

/* A receiver of any kind: the pointer of its kind. */
struct target {
    const struct relicore_universe *u;
    const struct relicore_linear_growth *g;
    const struct relicore_linear_power_spectrum *p;
};

static int32_t call_entry(const struct entry *e, const struct target *t, const double *a,
                          double *out)
{
    switch (e->receiver) {
    case R_NONE:
        return ((n4_fn)e->f)(a[0], a[1], a[2], a[3], out);
    case R_UNIVERSE:
        return e->nargs == 1 ? ((u1_fn)e->f)(t->u, a[0], out)
                             : ((u2_fn)e->f)(t->u, a[0], a[1], out);
    case R_GROWTH:
        return e->nargs == 1 ? ((g1_fn)e->f)(t->g, a[0], out)
                             : ((g2_fn)e->f)(t->g, a[0], a[1], out);
    case R_SPECTRUM:
        switch (e->nargs) {
        case 0: return ((p0_fn)e->f)(t->p, out);
        case 1: return ((p1_fn)e->f)(t->p, a[0], out);
        default: return ((p2_fn)e->f)(t->p, a[0], a[1], out);
        }
    }
    return -999;
}

/* The array form over the first argument (the others single values). */
static int32_t call_array(const struct entry *e, const struct target *t, const double *x,
                          size_t n, const double *a, double *out)
{
    switch (e->receiver) {
    case R_UNIVERSE:
        return e->nargs == 1 ? ((ua1_fn)e->array)(t->u, x, n, out)
                             : ((ua2_fn)e->array)(t->u, x, n, a[1], out);
    case R_GROWTH:
        return ((ga1_fn)e->array)(t->g, x, n, out);
    case R_SPECTRUM:
        return e->nargs == 1 ? ((pa1_fn)e->array)(t->p, x, n, out)
                             : ((pa2_fn)e->array)(t->p, x, n, a[1], out);
    default:
        return -999;
    }
}

static void *alloc_zeroed(size_t size)
{
    void *p = calloc(1, size);
    if (p == NULL) {
        fprintf(stderr, "out of memory\n");
        exit(2);
    }
    return p;
}

/* ------------------------------------------------------------------------------------------ */
/* The file                                                                                    */
/* ------------------------------------------------------------------------------------------ */

static long g_array_checks;
static long g_lines; /* value and status lines checked */
static double g_worst_rel; /* of the rel lines, relative to their tolerance */

static void growth_line(const char *where, char **tok, int ntok)
{
    const struct relicore_universe *u = ntok == 3 ? find_universe(tok[2]) : NULL;
    check(u != NULL && strlen(tok[1]) < NAME, "%s: malformed growth line", where);
    if (u == NULL || strlen(tok[1]) >= NAME) {
        return;
    }
    struct relicore_linear_growth *g = alloc_zeroed(sizeof *g);
    int32_t s = relicore_linear_growth_compute(u, g);
    check(s == RELICORE_OK, "%s: relicore_linear_growth_compute(%s) = %d", where, tok[2], (int)s);
    g_growths = grow(g_growths, g_ngrowths + 1, sizeof *g_growths);
    snprintf(g_growths[g_ngrowths].name, NAME, "%s", tok[1]);
    g_growths[g_ngrowths++].g = g;
}

static void spectrum_line(const char *where, char **tok, int ntok)
{
    const struct relicore_linear_growth *g = ntok == 8 ? find_growth(tok[2]) : NULL;
    struct relicore_linear_power_spectrum_options o;
    check(relicore_linear_power_spectrum_options_default(&o) == RELICORE_OK, "options default");
    int ok = g != NULL && strlen(tok[1]) < NAME && parse_number(tok[5], &o.value) &&
             parse_number(tok[6], &o.spectral_index) && parse_number(tok[7], &o.running);
    if (ok && strcmp(tok[3], "oscillations") == 0) {
        o.transfer_form = RELICORE_TRANSFER_BARYON_OSCILLATIONS;
    } else if (ok && strcmp(tok[3], "no_wiggle") == 0) {
        o.transfer_form = RELICORE_TRANSFER_NO_WIGGLE;
    } else {
        ok = 0;
    }
    if (ok && strcmp(tok[4], "scalar_amplitude") == 0) {
        o.normalisation = RELICORE_NORMALISATION_SCALAR_AMPLITUDE;
    } else if (ok && strcmp(tok[4], "sigma8") == 0) {
        o.normalisation = RELICORE_NORMALISATION_SIGMA8;
    } else {
        ok = 0;
    }
    check(ok, "%s: malformed spectrum line", where);
    if (!ok) {
        return;
    }
    struct relicore_linear_power_spectrum *p = alloc_zeroed(sizeof *p);
    int32_t s = relicore_linear_power_spectrum_compute(g, &o, p);
    check(s == RELICORE_OK, "%s: relicore_linear_power_spectrum_compute(%s) = %d", where, tok[1],
          (int)s);
    g_spectra = grow(g_spectra, g_nspectra + 1, sizeof *g_spectra);
    snprintf(g_spectra[g_nspectra].name, NAME, "%s", tok[1]);
    g_spectra[g_nspectra++].p = p;
}

/* The array form of e at the arguments a: three copies of a[0] in place and one out of place,
 * each element the scalar form's bits and status. */
static void check_array_at(const char *where, const struct entry *e, const struct target *t,
                           const double *a, int32_t s_scalar, double want)
{
    double x[3] = { a[0], a[0], a[0] };
    double out[3] = { -1.0, -1.0, -1.0 };
    int32_t s = call_array(e, t, x, 3, a, out);
    int32_t s2 = call_array(e, t, x, 3, a, x); /* in place */
    g_array_checks++;
    int ok = s == s_scalar && s2 == s_scalar;
    for (int i = 0; i < 3; i++) {
        ok = ok && same(out[i], want) && same(x[i], want);
    }
    check(ok, "%s: relicore_%s_array gives %d/%d %.17g, the scalar form %d %.17g", where,
          e->name, (int)s, (int)s2, out[0], (int)s_scalar, want);
}

static void function_line(const char *where, char **tok, int ntok, const char *copy, int dump)
{
    struct entry *e = find_entry(tok[0]);
    double a[MAXARGS] = { NAN, NAN, NAN, NAN };
    double want = NAN, tol = NAN;
    int nargs = -1;
    int ok = e != NULL && ntok >= 7 && sscanf(tok[2], "%d", &nargs) == 1 && nargs >= 0 &&
             nargs <= MAXARGS && ntok == 7 + nargs && nargs == e->nargs;
    for (int i = 0; ok && i < nargs; i++) {
        ok = parse_number(tok[3 + i], &a[i]);
    }
    ok = ok && parse_number(tok[3 + nargs], &want) && parse_number(tok[5 + nargs], &tol);
    check(ok, "%s: malformed or unknown vector line: %s", where, copy);
    if (!ok) {
        return;
    }
    const char *kind = tok[4 + nargs];
    struct target t = { NULL, NULL, NULL };
    int found = 1;
    switch (e->receiver) {
    case R_NONE: found = strcmp(tok[1], "-") == 0; break;
    case R_UNIVERSE: found = (t.u = find_universe(tok[1])) != NULL; break;
    case R_GROWTH: found = (t.g = find_growth(tok[1])) != NULL; break;
    case R_SPECTRUM: found = (t.p = find_spectrum(tok[1])) != NULL; break;
    }
    check(found, "%s: unknown target %s of %s", where, tok[1], e->name);
    if (!found) {
        return;
    }
    e->vectors++;
    g_lines++;
    double got = -1.0;
    int32_t s = call_entry(e, &t, a, &got);
    if (dump) {
        if (strcmp(kind, "status") != 0) {
            printf("%s %s %016" PRIx64 "\n", tok[1], e->name, bits64(got));
            check(s == RELICORE_OK, "%s: %s failed with %d", where, e->name, (int)s);
        }
        return;
    }
    if (strcmp(kind, "status") == 0) {
        check(s == (int32_t)tol && isnan(got), "%s: %s returned %d and %.17g: %s", where,
              e->name, (int)s, got, copy);
    } else {
        int known = 0;
        int in = s == RELICORE_OK && within(got, want, kind, tol, 0, &known);
        check(known && in, "%s: %s = %.17e (status %d): %s", where, e->name, got, (int)s, copy);
        if (strcmp(kind, "rel") == 0 && s == RELICORE_OK && want != 0.0) {
            double r = fabs(got - want) / fabs(want) / tol;
            g_worst_rel = r > g_worst_rel ? r : g_worst_rel;
        }
    }
    if (e->array != NULL && nargs > 0) {
        check_array_at(where, e, &t, a, s, got);
    }
}

static void run_file(const char *path, int dump)
{
    struct reader r;
    char *tok[16];
    int ntok;
    if (!open_reader(&r, path, 15)) {
        return;
    }
    while (next_record(&r, tok, &ntok)) {
        if (strcmp(tok[0], "universe") == 0) {
            struct relicore_universe_parameters p;
            char name[NAME];
            if (!parse_universe_line(r.where, tok, ntok, r.copy, NAME, &p)) {
                continue;
            }
            snprintf(name, NAME, "%s", tok[1]);
            struct relicore_universe *u = alloc_zeroed(sizeof *u);
            int32_t s = relicore_universe_init(&p, u);
            check(s == RELICORE_OK, "%s: relicore_universe_init(%s) = %d", r.where, name, (int)s);
            g_universes = grow(g_universes, g_nuniverses + 1, sizeof *g_universes);
            snprintf(g_universes[g_nuniverses].name, NAME, "%s", name);
            g_universes[g_nuniverses++].u = u;
        } else if (strcmp(tok[0], "growth") == 0) {
            growth_line(r.where, tok, ntok);
        } else if (strcmp(tok[0], "spectrum") == 0) {
            spectrum_line(r.where, tok, ntok);
        } else {
            function_line(r.where, tok, ntok, r.copy, dump);
        }
    }
    fclose(r.fp);
}

/* ------------------------------------------------------------------------------------------ */
/* Interface checks                                                                            */
/* ------------------------------------------------------------------------------------------ */

static void check_coverage(void)
{
    for (size_t i = 0; i < LEN(g_entries); i++) {
        check(g_entries[i].vectors > 0, "relicore_%s has no vector in the file", g_entries[i].name);
    }
}

static void check_interfaces(void)
{
    const struct relicore_universe *u = find_universe("planck_like");
    const struct relicore_universe *u0 = find_universe("flat_lcdm"); /* no radiation */
    const struct relicore_linear_growth *g = find_growth("g_planck_like");
    check(u != NULL && u0 != NULL && g != NULL, "the planck_like universe and growth exist");
    if (u == NULL || u0 == NULL || g == NULL) {
        return;
    }
    struct relicore_linear_power_spectrum_options o;
    memset(&o, 0x55, sizeof o);
    check(relicore_linear_power_spectrum_options_default(&o) == RELICORE_OK &&
              o.transfer_form == RELICORE_TRANSFER_BARYON_OSCILLATIONS &&
              o.normalisation == RELICORE_NORMALISATION_SCALAR_AMPLITUDE && isnan(o.value) &&
              isnan(o.spectral_index) && o.running == 0.0,
          "relicore_linear_power_spectrum_options_default");
    check(relicore_linear_power_spectrum_options_default(NULL) == RELICORE_ERROR_NULL_POINTER,
          "options default of NULL");
    struct relicore_linear_growth *g2 = alloc_zeroed(sizeof *g2);
    struct relicore_linear_power_spectrum *p = alloc_zeroed(sizeof *p);
    double v = 1.0;
    /* unfilled structs are refused, NaN written */
    check(relicore_growth_factor(g2, 1.0, &v) == RELICORE_ERROR_INVALID_STRUCT && isnan(v),
          "an unfilled growth is refused");
    v = 1.0;
    check(relicore_sigma8(p, &v) == RELICORE_ERROR_INVALID_STRUCT && isnan(v),
          "an unfilled spectrum is refused");
    /* a copy of a growth is a growth */
    memcpy(g2, g, sizeof *g2);
    double a = 0.0, b = 0.0;
    check(relicore_growth_rate(g, 0.7, &a) == RELICORE_OK &&
              relicore_growth_rate(g2, 0.7, &b) == RELICORE_OK && same(a, b),
          "a copied growth gives the same bits");
    /* a forged tag is refused */
    g2->tag ^= 1;
    v = 1.0;
    check(relicore_growth_factor(g2, 1.0, &v) == RELICORE_ERROR_INVALID_STRUCT && isnan(v),
          "a forged growth tag is refused");
    /* NULL pointers */
    v = 1.0;
    check(relicore_growth_factor(NULL, 1.0, &v) == RELICORE_ERROR_NULL_POINTER && isnan(v),
          "a NULL growth");
    check(relicore_growth_factor(g, 1.0, NULL) == RELICORE_ERROR_NULL_POINTER, "a NULL out");
    check(relicore_linear_growth_compute(NULL, g2) == RELICORE_ERROR_NULL_POINTER &&
              g2->tag == 0,
          "compute of a NULL universe clears its output");
    check(relicore_linear_growth_compute(u, NULL) == RELICORE_ERROR_NULL_POINTER,
          "compute into NULL");
    o.value = 2.1e-9;
    o.spectral_index = 0.965;
    check(relicore_linear_power_spectrum_compute(NULL, &o, p) == RELICORE_ERROR_NULL_POINTER,
          "spectrum of a NULL growth");
    check(relicore_linear_power_spectrum_compute(g, NULL, p) == RELICORE_ERROR_NULL_POINTER,
          "spectrum with NULL options");
    check(relicore_linear_power_spectrum_compute(g, &o, NULL) == RELICORE_ERROR_NULL_POINTER,
          "spectrum into NULL");
    check(relicore_linear_power_spectrum_compute(g2, &o, p) == RELICORE_ERROR_INVALID_STRUCT &&
              p->tag == 0,
          "spectrum of a forged growth");
    /* the documented construction errors, each after a valid spectrum, each clearing it */
    struct relicore_linear_growth *g0 = alloc_zeroed(sizeof *g0);
    check(relicore_linear_growth_compute(u0, g0) == RELICORE_OK, "growth without radiation");
    struct relicore_universe_parameters q;
    struct relicore_universe *nb = alloc_zeroed(sizeof *nb);
    check(relicore_universe_parameters_default(67.0, 0.3, &q) == RELICORE_OK &&
              relicore_universe_init(&q, nb) == RELICORE_OK,
          "a universe without baryons");
    struct relicore_linear_growth *gnb = alloc_zeroed(sizeof *gnb);
    check(relicore_linear_growth_compute(nb, gnb) == RELICORE_OK, "growth without baryons");
    struct {
        const struct relicore_linear_growth *g;
        int form, norm;
        double value, ns, alpha;
        int32_t want;
        const char *what;
    } cases[] = {
        { g, 2, 0, 2.1e-9, 0.965, 0.0, RELICORE_ERROR_OUT_OF_DOMAIN, "transfer_form 2" },
        { g, 0, 7, 2.1e-9, 0.965, 0.0, RELICORE_ERROR_OUT_OF_DOMAIN, "normalisation 7" },
        { g, 0, 0, 0.0, 0.965, 0.0, RELICORE_ERROR_NON_POSITIVE, "A_s = 0" },
        { g, 0, 0, -2e-9, 0.965, 0.0, RELICORE_ERROR_NON_POSITIVE, "A_s < 0" },
        { g, 0, 1, -0.8, 0.965, 0.0, RELICORE_ERROR_NON_POSITIVE, "sigma8 < 0" },
        { g, 0, 1, NAN, 0.965, 0.0, RELICORE_ERROR_NON_FINITE, "sigma8 NaN" },
        { g, 0, 0, 2.1e-9, NAN, 0.0, RELICORE_ERROR_NON_FINITE, "n_s NaN" },
        { g, 1, 0, 2.1e-9, 0.965, INFINITY, RELICORE_ERROR_NON_FINITE, "alpha_s inf" },
        { gnb, 0, 0, 2.1e-9, 0.965, 0.0, RELICORE_ERROR_INVALID_PARAMETER, "no baryons" },
        { g0, 1, 1, 0.8, 0.965, 0.0, RELICORE_ERROR_INVALID_PARAMETER, "no radiation" },
    };
    for (size_t i = 0; i < LEN(cases); i++) {
        struct relicore_linear_power_spectrum_options good;
        relicore_linear_power_spectrum_options_default(&good);
        good.value = 2.1e-9;
        good.spectral_index = 0.965;
        check(relicore_linear_power_spectrum_compute(g, &good, p) == RELICORE_OK, "a valid spectrum");
        struct relicore_linear_power_spectrum_options bad = good;
        bad.transfer_form = cases[i].form;
        bad.normalisation = cases[i].norm;
        bad.value = cases[i].value;
        bad.spectral_index = cases[i].ns;
        bad.running = cases[i].alpha;
        int32_t s = relicore_linear_power_spectrum_compute(cases[i].g, &bad, p);
        v = 1.0;
        check(s == cases[i].want && p->tag == 0 &&
                  relicore_s8(p, &v) == RELICORE_ERROR_INVALID_STRUCT && isnan(v),
              "spectrum with %s: %d, want %d", cases[i].what, (int)s, (int)cases[i].want);
    }
    /* the no-wiggle form needs no baryons; sigma8 given is returned */
    struct relicore_linear_power_spectrum_options nw;
    relicore_linear_power_spectrum_options_default(&nw);
    nw.transfer_form = RELICORE_TRANSFER_NO_WIGGLE;
    nw.normalisation = RELICORE_NORMALISATION_SIGMA8;
    nw.value = 0.8;
    nw.spectral_index = 1.0;
    v = 0.0;
    check(relicore_linear_power_spectrum_compute(gnb, &nw, p) == RELICORE_OK &&
              relicore_sigma8(p, &v) == RELICORE_OK && v == 0.8,
          "no-wiggle spectrum without baryons, sigma8 = %.17g", v);
    /* array forms: NULL pointers fail whole, n = 0 writes nothing, an unfilled struct refused */
    double x[2] = { 0.5, -1.0 }, out[2] = { 7.0, 7.0 };
    check(relicore_growth_factor_array(g, NULL, 2, out) == RELICORE_ERROR_NULL_POINTER &&
              isnan(out[0]) && isnan(out[1]),
          "array form with a NULL input");
    out[0] = out[1] = 7.0;
    check(relicore_growth_factor_array(g, x, 0, out) == RELICORE_OK && out[0] == 7.0,
          "array form of no elements");
    check(relicore_growth_factor_array(g, x, 2, out) == RELICORE_ERROR_NEGATIVE &&
              !isnan(out[0]) && isnan(out[1]),
          "array form with one failing element");
    memset(g2, 0, sizeof *g2);
    check(relicore_growth_rate_array(g2, x, 2, out) == RELICORE_ERROR_INVALID_STRUCT &&
              isnan(out[0]) && isnan(out[1]),
          "array form on an unfilled growth");
    free(g0);
    free(gnb);
    free(nb);
    free(g2);
    free(p);
}

int main(int argc, char **argv)
{
    int status;
    if (argc == 3 && strcmp(argv[1], "--dump") == 0) {
        run_file(argv[2], 1);
        status = g_failed > 0;
        if (status) {
            fprintf(stderr, "%ld problems while dumping\n", g_failed);
        }
    } else if (argc == 2) {
        run_file(argv[1], 0);
        long vectors = g_passed + g_failed;
        check_coverage();
        check_interfaces();
        printf("universes: %zu; growths: %zu; spectra: %zu; vector lines: %ld (array-form "
               "checks %ld; worst rel error %.2f of its tolerance); checks on the file: %ld; "
               "interface checks: %ld\n",
               g_nuniverses, g_ngrowths, g_nspectra, g_lines, g_array_checks, g_worst_rel, vectors,
               g_passed + g_failed - vectors);
        printf("%ld passed, %ld failed\n", g_passed, g_failed);
        status = g_failed == 0 && g_passed > 0 ? 0 : 1;
    } else {
        fprintf(stderr, "usage: %s FILE\n       %s --dump FILE\n", argv[0], argv[0]);
        return 2;
    }
    for (size_t i = 0; i < g_nuniverses; i++) {
        free(g_universes[i].u);
    }
    for (size_t i = 0; i < g_ngrowths; i++) {
        free(g_growths[i].g);
    }
    for (size_t i = 0; i < g_nspectra; i++) {
        free(g_spectra[i].p);
    }
    free(g_universes);
    free(g_growths);
    free(g_spectra);
    return status;
}
