/*
 * C test of the relicore cosmology interface (C11).
 *
 *   test_cosmology FILE
 *       builds every universe of FILE (tests/data/cosmology.txt; format: tests/data/FORMAT.md,
 *       universe lines "universe NAME h0_km_s_mpc omega_matter omega_baryon omega_curvature
 *       cmb_temperature_k n_eff m1_ev m2_ev m3_ev w0 wa helium_mass_fraction", vector lines
 *       "function UNIVERSE nargs args... expected kind tolerance source") with
 *       relicore_universe_init, checks every vector against the C function with the tolerance
 *       of its line (the array form of a one-argument function is called on the same argument
 *       too and must give the same bits and status), then runs the interface checks written
 *       below: the array forms on all the arguments of a universe and function at once against
 *       the scalar calls, NULL pointers, uninitialised, zeroed and failed structs, copies of a
 *       universe, the parameter checks, the defaults, status messages. Ends with
 *       "N passed, M failed"; exit status 0 only if nothing failed.
 *
 *   test_cosmology --dump FILE
 *       prints "universe function bits" for every value line (not status lines) in file order:
 *       bits is the IEEE-754 pattern of the result in 16 hex digits, so another language can
 *       compare its results bit for bit.
 *
 * The functions of a universe are the list of tests/c/gen_functions.h (generated from
 * bindings/functions.toml); the interface checks call each on the arguments of its first value
 * line in the data file. An unknown function or universe name in the data file is a failure,
 * and so is an exported function with no reference vector, so the data and this harness cannot
 * drift apart silently. The record reader, number parsing, tolerances, check counting and the reading of
 * universe and vector lines it shares with test_decoupling (and in part test_blackbody) are in
 * vector_files.c.
 */

#include <inttypes.h>
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

#include "gen_functions.h"
#include "relicore.h"
#include "vector_files.h"

#define MAX_TOKENS 24

_Static_assert(sizeof(struct relicore_universe) == 8 * (1 + (size_t)RELICORE_UNIVERSE_STORAGE_WORDS),
               "struct relicore_universe is a tag and RELICORE_UNIVERSE_STORAGE_WORDS words");
_Static_assert(sizeof(struct relicore_universe_parameters) == 12 * sizeof(double),
               "struct relicore_universe_parameters is twelve doubles");

/* ------------------------------------------------------------------------------------------ */
/* Dispatch table: every function of a universe.                                               */
/* ------------------------------------------------------------------------------------------ */

typedef int32_t (*u0_fn)(const struct relicore_universe *, double *);
typedef int32_t (*u1_fn)(const struct relicore_universe *, double, double *);
typedef int32_t (*u2_fn)(const struct relicore_universe *, double, double, double *);
typedef int32_t (*ua_fn)(const struct relicore_universe *, const double *, size_t, double *);

struct entry {
    const char *name; /* name in the data file (without the relicore_ prefix) */
    int nargs;        /* 0: a constant of the universe; 1: one argument; 2: two */
    u0_fn f0;
    u1_fn f1;
    u2_fn f2;
    ua_fn array; /* the array form of a one-argument function */
    long vectors;  /* number of lines of the data file that used it */
    int has_sample; /* valid arguments for the interface checks were kept: */
    double sample[2]; /* the arguments of its first value line (not a status line) */
};

#define U0_0(n) { #n, 0, relicore_##n, NULL, NULL, NULL, 0, 0, { 0.0, 0.0 } }
#define U1_0(n) { #n, 1, NULL, relicore_##n, NULL, NULL, 0, 0, { 0.0, 0.0 } }
#define U1_1(n) { #n, 1, NULL, relicore_##n, NULL, relicore_##n##_array, 0, 0, { 0.0, 0.0 } }
#define U2_0(n) { #n, 2, NULL, NULL, relicore_##n, NULL, 0, 0, { 0.0, 0.0 } }
/* an entry of the generated list (tests/c/gen_functions.h), by arity and array form */
#define UNIVERSE_ENTRY(n, k, domain, upper, array) U##k##_##array(n),

/* every function of a universe in the table (bindings/functions.toml) */
static struct entry table[] = { RELICORE_COSMOLOGY_UNIVERSE(UNIVERSE_ENTRY) };
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

static int32_t call_entry(const struct entry *e, const struct relicore_universe *u,
                          const double *a, double *out)
{
    switch (e->nargs) {
    case 0: return e->f0(u, out);
    case 1: return e->f1(u, a[0], out);
    default: return e->f2(u, a[0], a[1], out);
    }
}

/* ------------------------------------------------------------------------------------------ */
/* Universes and vectors read from the file                                                    */
/* ------------------------------------------------------------------------------------------ */

struct universe_entry {
    char name[64];
    struct relicore_universe_parameters params;
    struct relicore_universe u;
    int32_t init_status;
};

struct vector {
    size_t entry, universe;
    double args[2];
    int is_status;
    int32_t status; /* what the scalar call returned */
    double got;     /* what it wrote */
};

static struct universe_entry *g_universes = NULL;
static size_t g_nuniverses = 0;
static struct vector *g_vectors = NULL;
static size_t g_nvectors = 0, g_cap_vectors = 0;

static struct universe_entry *find_universe(const char *name)
{
    for (size_t i = 0; i < g_nuniverses; i++) {
        if (strcmp(g_universes[i].name, name) == 0) {
            return &g_universes[i];
        }
    }
    return NULL;
}

static int same_params(const struct relicore_universe_parameters *a,
                       const struct relicore_universe_parameters *b)
{
    return same(a->h0_km_s_mpc, b->h0_km_s_mpc) && same(a->omega_matter, b->omega_matter)
           && same(a->omega_baryon, b->omega_baryon)
           && same(a->omega_curvature, b->omega_curvature)
           && same(a->cmb_temperature_k, b->cmb_temperature_k) && same(a->n_eff, b->n_eff)
           && same(a->neutrino_masses_ev[0], b->neutrino_masses_ev[0])
           && same(a->neutrino_masses_ev[1], b->neutrino_masses_ev[1])
           && same(a->neutrino_masses_ev[2], b->neutrino_masses_ev[2]) && same(a->w0, b->w0)
           && same(a->wa, b->wa) && same(a->helium_mass_fraction, b->helium_mass_fraction);
}

static void add_universe(const char *where, char **tok, int ntok, const char *copy)
{
    struct relicore_universe_parameters params;
    if (!parse_universe_line(where, tok, ntok, copy, sizeof g_universes[0].name, &params)) {
        return;
    }
    if (find_universe(tok[1]) != NULL) {
        check(0, "%s: universe %s defined twice", where, tok[1]);
        return;
    }
    g_universes = grow(g_universes, g_nuniverses + 1, sizeof *g_universes);
    struct universe_entry *ue = &g_universes[g_nuniverses++];
    memset(ue, 0, sizeof *ue);
    snprintf(ue->name, sizeof ue->name, "%s", tok[1]);
    ue->params = params;
    ue->init_status = relicore_universe_init(&ue->params, &ue->u);
    int32_t which = 99;
    int32_t checked = relicore_universe_check_parameters(&ue->params, &which);
    check(ue->init_status == RELICORE_OK,
          "%s: relicore_universe_init(%s) returned %d (%s); relicore_universe_check_parameters "
          "says %d, parameter %d",
          where, ue->name, (int)ue->init_status, relicore_status_message(ue->init_status),
          (int)checked, (int)which);
    check(checked == ue->init_status && (checked == RELICORE_ERROR_INVALID_PARAMETER || which == -1),
          "%s: relicore_universe_check_parameters(%s) returned %d, parameter %d; init %d", where,
          ue->name, (int)checked, (int)which, (int)ue->init_status);
    if (ue->init_status == RELICORE_OK) {
        struct relicore_universe_parameters back;
        int32_t s = relicore_universe_get_parameters(&ue->u, &back);
        check(s == RELICORE_OK && same_params(&back, &ue->params),
              "%s: relicore_universe_get_parameters(%s) does not return the parameters given",
              where, ue->name);
    }
}

static void run_file(const char *path, int dump)
{
    struct reader r;
    if (!open_reader(&r, path, MAX_TOKENS)) {
        return;
    }
    char *tok[MAX_TOKENS];
    int ntok = 0;
    long lines = 0;
    while (next_record(&r, tok, &ntok)) {
        const char *where = r.where, *copy = r.copy;
        if (ntok > MAX_TOKENS) {
            check(0, "%s: too many fields: %s", where, copy);
            continue;
        }
        if (strcmp(tok[0], "universe") == 0) {
            add_universe(where, tok, ntok, copy);
            continue;
        }
        /* function UNIVERSE nargs args... expected kind tolerance source */
        lines++;
        struct vector_line v;
        if (!parse_vector_line(where, tok, ntok, copy, &v)) {
            continue;
        }
        const char *name = v.name, *kind = v.kind, *source = v.source;
        const double *args = v.args;
        double want = v.want, tol = v.tol;
        int nargs = v.nargs;
        struct entry *e = find_entry(name);
        if (e == NULL) {
            check(0, "%s: unknown function name '%s' (no C dispatch): %s", where, name, copy);
            continue;
        }
        if (e->nargs != nargs) {
            check(0, "%s: %s takes %d arguments, the line has %d", where, name, e->nargs, nargs);
            continue;
        }
        struct universe_entry *ue = find_universe(tok[1]);
        if (ue == NULL) {
            check(0, "%s: unknown universe '%s' (no universe line before it)", where, tok[1]);
            continue;
        }
        e->vectors++;
        int is_status = strcmp(kind, "status") == 0;
        double got = NAN;
        int32_t s = call_entry(e, &ue->u, args, &got);
        if (!is_status && !e->has_sample) {
            e->sample[0] = args[0];
            e->sample[1] = args[1];
            e->has_sample = 1;
        }

        /* the array form on the same single argument: same bits, same status */
        if (e->array != NULL) {
            double in = args[0], out = 7.0;
            int32_t sa = e->array(&ue->u, &in, 1, &out);
            check(sa == s && same(out, got),
                  "%s: relicore_%s_array on one element gives %.17e (status %d), the scalar "
                  "call %.17e (status %d)",
                  where, name, out, (int)sa, got, (int)s);
        }
        if (g_nvectors == g_cap_vectors) {
            g_cap_vectors = g_cap_vectors ? 2 * g_cap_vectors : 1024;
            g_vectors = grow(g_vectors, g_cap_vectors, sizeof *g_vectors);
        }
        g_vectors[g_nvectors++] = (struct vector){ .entry = (size_t)(e - table),
                                                   .universe = (size_t)(ue - g_universes),
                                                   .args = { args[0], args[1] },
                                                   .is_status = is_status,
                                                   .status = s,
                                                   .got = got };
        if (dump) {
            if (!is_status) {
                printf("%s %s %016" PRIx64 "\n", ue->name, name, bits64(got));
            }
            continue;
        }
        if (is_status) {
            check_status_line(where, &v, s, got, copy);
            continue;
        }
        int known = 1;
        int pass = s == RELICORE_OK && within(got, want, kind, tol, 0, &known);
        if (!known) {
            check(0, "%s: unknown tolerance kind '%s'", where, kind);
            continue;
        }
        check(pass,
              "%s: %s want %.17e got %.17e (status %d: %s) tolerance %s %.17g, error %.3g "
              "[source %s]\n     line: %s",
              where, name, want, got, (int)s, relicore_status_message(s), kind, tol,
              want != 0.0 ? fabs(got - want) / fabs(want) : fabs(got - want), source, copy);
    }
    fclose(r.fp);
    if (!dump) {
        check(lines > 0, "%s holds no vectors", path);
        check(g_nuniverses > 0, "%s defines no universe", path);
    }
}

/* ------------------------------------------------------------------------------------------ */
/* Interface checks                                                                            */
/* ------------------------------------------------------------------------------------------ */

static void check_coverage(void)
{
    for (size_t i = 0; i < TABLE_LEN; i++) {
        check(table[i].vectors > 0, "no reference vector for relicore_%s", table[i].name);
        check(table[i].has_sample || table[i].nargs == 0,
              "no value line of relicore_%s (its arguments serve the interface checks)",
              table[i].name);
    }
}

/* For every universe and one-argument function: all the arguments of its vectors in one array
 * call give the scalar results bit for bit, NaN where an element failed, and the first failing
 * element's code; the same in place (out == x). */
static void check_arrays_on_vectors(void)
{
    double *x = grow(NULL, g_nvectors + 1, sizeof *x);
    double *out = grow(NULL, g_nvectors + 1, sizeof *out);
    double *want = grow(NULL, g_nvectors + 1, sizeof *want);
    int32_t *st = grow(NULL, g_nvectors + 1, sizeof *st);
    for (size_t ui = 0; ui < g_nuniverses; ui++) {
        for (size_t ei = 0; ei < TABLE_LEN; ei++) {
            const struct entry *e = &table[ei];
            if (e->array == NULL) {
                continue;
            }
            size_t n = 0;
            for (size_t k = 0; k < g_nvectors; k++) {
                if (g_vectors[k].entry == ei && g_vectors[k].universe == ui) {
                    x[n] = g_vectors[k].args[0];
                    want[n] = g_vectors[k].got;
                    st[n] = g_vectors[k].status;
                    n++;
                }
            }
            if (n == 0) {
                continue;
            }
            const struct relicore_universe *u = &g_universes[ui].u;
            int32_t first = RELICORE_OK;
            for (size_t k = 0; k < n && first == RELICORE_OK; k++) {
                first = st[k];
            }
            for (size_t k = 0; k < n; k++) {
                out[k] = 7.0;
            }
            int32_t s = e->array(u, x, n, out);
            int agree = s == first;
            size_t bad = n;
            for (size_t k = 0; k < n; k++) {
                int ok = same(out[k], want[k]) && (st[k] == RELICORE_OK || isnan(out[k]));
                if (!ok && bad == n) {
                    bad = k;
                }
                agree = agree && ok;
            }
            check(agree,
                  "relicore_%s_array(%s, %zu values): status %d (first failing element %d); "
                  "element %zu differs from the scalar call",
                  e->name, g_universes[ui].name, n, (int)s, (int)first, bad);
            /* in place */
            int32_t s2 = e->array(u, x, n, x);
            int inplace = s2 == s;
            for (size_t k = 0; k < n; k++) {
                inplace = inplace && same(x[k], out[k]);
            }
            check(inplace, "relicore_%s_array(%s) in place differs from out of place", e->name,
                  g_universes[ui].name);
        }
    }
    free(x);
    free(out);
    free(want);
    free(st);
}

/* Every function on a struct that is not an initialised universe: want_code, NaN outputs. */
static void check_refused(const struct relicore_universe *u, int32_t want_code, const char *what)
{
    for (size_t i = 0; i < TABLE_LEN; i++) {
        const struct entry *e = &table[i];
        const double *a = e->sample;
        double out = 1.0;
        int32_t s = call_entry(e, u, a, &out);
        check(s == want_code && isnan(out), "relicore_%s on %s returned %d (want %d), output %g",
              e->name, what, (int)s, (int)want_code, out);
        /* the struct is checked before the argument */
        double bad[2] = { NAN, -1.0 };
        s = call_entry(e, u, bad, &out);
        check(s == want_code, "relicore_%s(NaN) on %s returned %d (want %d)", e->name, what,
              (int)s, (int)want_code);
        if (e->array != NULL) {
            double x[3] = { e->sample[0], NAN, -1.0 }, o[3] = { 1.0, 1.0, 1.0 };
            s = e->array(u, x, 3, o);
            check(s == want_code && isnan(o[0]) && isnan(o[1]) && isnan(o[2]),
                  "relicore_%s_array on %s returned %d (want %d) or left a non-NaN element",
                  e->name, what, (int)s, (int)want_code);
        }
    }
    struct relicore_universe_parameters p;
    memset(&p, 0, sizeof p);
    int32_t s = relicore_universe_get_parameters(u, &p);
    check(s == want_code && isnan(p.h0_km_s_mpc) && isnan(p.neutrino_masses_ev[2])
              && isnan(p.helium_mass_fraction),
          "relicore_universe_get_parameters on %s returned %d (want %d), fields NaN?", what,
          (int)s, (int)want_code);
}

static int all_zero(const struct relicore_universe *u)
{
    const unsigned char *b = (const unsigned char *)u;
    for (size_t i = 0; i < sizeof *u; i++) {
        if (b[i] != 0) {
            return 0;
        }
    }
    return 1;
}

static void check_structs(void)
{
    static struct relicore_universe u, copy;
    struct relicore_universe_parameters p;

    /* NULL universe */
    check_refused(NULL, RELICORE_ERROR_NULL_POINTER, "a NULL universe");
    /* a zeroed struct and one full of garbage bytes */
    memset(&u, 0, sizeof u);
    check_refused(&u, RELICORE_ERROR_INVALID_STRUCT, "a zeroed struct");
    memset(&u, 0xA5, sizeof u);
    check_refused(&u, RELICORE_ERROR_INVALID_STRUCT, "a struct of garbage bytes");

    /* NULL out: every function */
    int32_t s = relicore_universe_parameters_default(70.0, 0.3, &p);
    check(s == RELICORE_OK, "relicore_universe_parameters_default returned %d", (int)s);
    s = relicore_universe_init(&p, &u);
    check(s == RELICORE_OK, "relicore_universe_init on the defaults returned %d", (int)s);
    for (size_t i = 0; i < TABLE_LEN; i++) {
        const struct entry *e = &table[i];
        const double *a = e->sample;
        s = call_entry(e, &u, a, NULL);
        check(s == RELICORE_ERROR_NULL_POINTER, "relicore_%s(..., NULL) returned %d", e->name,
              (int)s);
        if (e->array != NULL) {
            double x[2] = { e->sample[0], e->sample[0] }, o[2] = { 1.0, 1.0 };
            s = e->array(&u, NULL, 2, o);
            check(s == RELICORE_ERROR_NULL_POINTER && isnan(o[0]) && isnan(o[1]),
                  "relicore_%s_array(NULL input) returned %d", e->name, (int)s);
            s = e->array(&u, x, 2, NULL);
            check(s == RELICORE_ERROR_NULL_POINTER, "relicore_%s_array(NULL output) returned %d",
                  e->name, (int)s);
            s = e->array(&u, NULL, 0, o);
            check(s == RELICORE_ERROR_NULL_POINTER,
                  "relicore_%s_array(NULL input, n = 0) returned %d", e->name, (int)s);
            o[0] = 7.0;
            s = e->array(&u, x, 0, o);
            check(s == RELICORE_OK && o[0] == 7.0, "relicore_%s_array(n = 0) returned %d or wrote",
                  e->name, (int)s);
        }
    }
    check(relicore_universe_init(NULL, &copy) == RELICORE_ERROR_NULL_POINTER && all_zero(&copy),
          "relicore_universe_init(NULL params) must fail and clear the struct");
    check(relicore_universe_init(&p, NULL) == RELICORE_ERROR_NULL_POINTER,
          "relicore_universe_init(..., NULL)");
    check(relicore_universe_parameters_default(70.0, 0.3, NULL) == RELICORE_ERROR_NULL_POINTER,
          "relicore_universe_parameters_default(..., NULL)");
    check(relicore_universe_get_parameters(&u, NULL) == RELICORE_ERROR_NULL_POINTER,
          "relicore_universe_get_parameters(..., NULL)");
    int32_t which = 5;
    check(relicore_universe_check_parameters(NULL, &which) == RELICORE_ERROR_NULL_POINTER
              && which == -1,
          "relicore_universe_check_parameters(NULL, ...) returned a parameter %d", (int)which);
    check(relicore_universe_check_parameters(&p, NULL) == RELICORE_ERROR_NULL_POINTER,
          "relicore_universe_check_parameters(..., NULL)");

    /* copies: memcpy and assignment give the same results as the original */
    memcpy(&copy, &u, sizeof u);
    struct relicore_universe *assigned = malloc(sizeof *assigned);
    if (assigned == NULL) {
        fprintf(stderr, "out of memory\n");
        exit(2);
    }
    *assigned = u;
    for (size_t i = 0; i < TABLE_LEN; i++) {
        const struct entry *e = &table[i];
        const double *a = e->sample;
        double o1 = NAN, o2 = NAN, o3 = NAN;
        int32_t s1 = call_entry(e, &u, a, &o1);
        int32_t s2 = call_entry(e, &copy, a, &o2);
        int32_t s3 = call_entry(e, assigned, a, &o3);
        check(s1 == RELICORE_OK && s2 == s1 && s3 == s1 && same(o1, o2) && same(o1, o3),
              "relicore_%s on copies of a universe: %d %.17e / %d %.17e / %d %.17e", e->name,
              (int)s1, o1, (int)s2, o2, (int)s3, o3);
    }
    free(assigned);

    /* the documented defaults */
    check(p.h0_km_s_mpc == 70.0 && p.omega_matter == 0.3 && p.omega_baryon == 0.0
              && p.omega_curvature == 0.0 && p.cmb_temperature_k == 2.7255 && p.n_eff == 3.044
              && p.neutrino_masses_ev[0] == 0.0 && p.neutrino_masses_ev[1] == 0.0
              && p.neutrino_masses_ev[2] == 0.0 && p.w0 == -1.0 && p.wa == 0.0
              && p.helium_mass_fraction == 0.245,
          "relicore_universe_parameters_default differs from its documented defaults");

    /* each parameter made invalid: the check names it, init fails and clears the struct */
    for (int w = 0; w < 10; w++) {
        struct relicore_universe_parameters q = p;
        switch (w) {
        case 0: q.h0_km_s_mpc = 0.0; break;
        case 1: q.omega_matter = -0.1; break;
        case 2: q.omega_baryon = 0.5; break; /* above omega_matter */
        case 3: q.omega_curvature = INFINITY; break;
        case 4: q.cmb_temperature_k = -1.0; break;
        case 5: q.n_eff = -1.0; break;
        case 6: q.neutrino_masses_ev[1] = -0.01; break;
        case 7: q.w0 = NAN; break;
        case 8: q.wa = -INFINITY; break;
        default: q.helium_mass_fraction = 1.0; break;
        }
        which = 99;
        s = relicore_universe_check_parameters(&q, &which);
        check(s == RELICORE_ERROR_INVALID_PARAMETER && which == w,
              "invalid parameter %d: relicore_universe_check_parameters returned %d, parameter %d",
              w, (int)s, (int)which);
        memcpy(&copy, &u, sizeof u);
        s = relicore_universe_init(&q, &copy);
        check(s == RELICORE_ERROR_INVALID_PARAMETER && all_zero(&copy),
              "invalid parameter %d: relicore_universe_init returned %d, struct cleared %d", w,
              (int)s, all_zero(&copy));
    }
    /* a positive neutrino mass without a neutrino background, neutrinos denser than matter */
    struct relicore_universe_parameters q = p;
    q.cmb_temperature_k = 0.0;
    q.neutrino_masses_ev[0] = 0.1;
    which = 99;
    s = relicore_universe_check_parameters(&q, &which);
    check(s == RELICORE_ERROR_INVALID_PARAMETER && which == 6,
          "mass with T0 = 0: status %d, parameter %d", (int)s, (int)which);
    q = p;
    q.omega_matter = 1e-4;
    q.neutrino_masses_ev[0] = 1.0;
    s = relicore_universe_check_parameters(&q, &which);
    check(s == RELICORE_ERROR_INVALID_PARAMETER && which == 6,
          "neutrinos denser than matter: status %d, parameter %d", (int)s, (int)which);
    /* no big bang: a closed, empty universe with a cosmological constant bounces */
    q = p;
    q.omega_matter = 0.0;
    q.cmb_temperature_k = 0.0;
    q.omega_curvature = -0.5;
    which = 99;
    s = relicore_universe_check_parameters(&q, &which);
    check(s == RELICORE_ERROR_NO_BIG_BANG && which == -1,
          "bouncing universe: relicore_universe_check_parameters returned %d, parameter %d",
          (int)s, (int)which);
    memcpy(&copy, &u, sizeof u);
    s = relicore_universe_init(&q, &copy);
    check(s == RELICORE_ERROR_NO_BIG_BANG && all_zero(&copy),
          "bouncing universe: relicore_universe_init returned %d", (int)s);
    check_refused(&copy, RELICORE_ERROR_INVALID_STRUCT, "the struct of a failed init");
    which = 99;
    s = relicore_universe_check_parameters(&p, &which);
    check(s == RELICORE_OK && which == -1, "valid parameters: check returned %d, parameter %d",
          (int)s, (int)which);

    /* a universe initialised again with other parameters becomes the new universe */
    q = p;
    q.omega_matter = 1.0;
    s = relicore_universe_init(&q, &u);
    double e1 = 0.0;
    check(s == RELICORE_OK && relicore_dimensionless_hubble(&u, 3.0, &e1) == RELICORE_OK
              && relicore_universe_get_parameters(&u, &p) == RELICORE_OK && p.omega_matter == 1.0,
          "re-initialising a universe");
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
    const char *unknown = relicore_status_message(-(int32_t)n);
    check(unknown != NULL && strcmp(unknown, "unknown status") == 0,
          "message of the first unused code is '%s'", unknown ? unknown : "(NULL)");
    for (size_t i = 0; i < n; i++) {
        const char *a = relicore_status_message(codes[i]);
        check(a != NULL && strcmp(a, "unknown status") != 0, "code %d has no message",
              (int)codes[i]);
        for (size_t k = i + 1; k < n && a != NULL; k++) {
            const char *b = relicore_status_message(codes[k]);
            check(b != NULL && strcmp(a, b) != 0, "codes %d and %d share the message '%s'",
                  (int)codes[i], (int)codes[k], a);
        }
    }
}

int main(int argc, char **argv)
{
    int status = 0;
    if (argc == 3 && strcmp(argv[1], "--dump") == 0) {
        run_file(argv[2], 1);
        if (g_failed > 0) {
            fprintf(stderr, "%ld problems while dumping\n", g_failed);
            status = 1;
        }
    } else if (argc == 2) {
        run_file(argv[1], 0);
        long vectors = g_passed + g_failed;
        check_coverage();
        check_arrays_on_vectors();
        check_structs();
        check_status_messages();
        printf("universes: %zu; data-file checks: %ld; interface checks: %ld\n", g_nuniverses,
               vectors, g_passed + g_failed - vectors);
        printf("%ld passed, %ld failed\n", g_passed, g_failed);
        status = g_failed == 0 && g_passed > 0 ? 0 : 1;
    } else {
        fprintf(stderr,
                "usage: %s FILE\n"
                "       %s --dump FILE\n",
                argv[0], argv[0]);
        status = 2;
    }
    free(g_universes);
    free(g_vectors);
    return status;
}
