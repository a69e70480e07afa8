/*
 * C test of the relicore decoupling interface (C11).
 *
 *   test_decoupling FILE
 *       reads FILE (tests/data/decoupling.txt; format: tests/data/FORMAT.md, section "Decoupling
 *       file"): builds every universe ("universe NAME h0_km_s_mpc omega_matter omega_baryon
 *       omega_curvature cmb_temperature_k n_eff m1_ev m2_ev m3_ev w0 wa helium_mass_fraction")
 *       with relicore_universe_init and computes every history ("history NAME UNIVERSE",
 *       "history_reionized NAME UNIVERSE z_re") with relicore_thermal_history_compute, then
 *       checks every vector ("function TARGET nargs args... expected kind tolerance source";
 *       TARGET is a universe for saha_ionized_fraction, a history for the queries and the
 *       summary, "-" for the two fits) against the C function with the tolerance of its line
 *       (the array form of a one-argument function is called on the same argument too and must
 *       give the same bits and status), then runs the interface checks written below: the array
 *       forms on all the arguments of a target and function at once against the scalar calls
 *       (in place too), NULL pointers, zeroed, garbage and tag-flipped history structs, copies
 *       of a history, a history outliving changes of its universe, every failure of
 *       relicore_thermal_history_compute (the struct cleared, then refused), the options'
 *       defaults, a shorter table, the status message of RELICORE_ERROR_CAPACITY_TOO_SMALL.
 *       Prints, per function, the largest deviation from the reference relative to the
 *       expected value and to the line's tolerance; ends with "N passed, M failed"; exit
 *       status 0 only if nothing failed.
 *
 *   test_decoupling --dump FILE
 *       prints "target function bits" for every value line (not status lines) in file order:
 *       bits is the IEEE-754 pattern of the result in 16 hex digits (lower case), so another
 *       language can compare its results bit for bit.
 *
 * The decoupling functions are the lists of tests/c/gen_functions.h (generated from
 * bindings/functions.toml); the interface checks call each on the arguments of its first value
 * line in the data file. An unknown function, universe or history name in the data file is a
 * failure, and so is an exported decoupling function with no reference vector, so the data and
 * this harness cannot drift apart silently. A history takes 163848 bytes: they are allocated on the heap here.
 * The record reader, number parsing, tolerances, check counting and the reading of universe
 * and vector lines it shares with test_cosmology (and in part test_blackbody) are in
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

_Static_assert(sizeof(struct relicore_thermal_history)
                   == 8 * (1 + (size_t)RELICORE_THERMAL_HISTORY_STORAGE_WORDS),
               "struct relicore_thermal_history is a tag and RELICORE_THERMAL_HISTORY_STORAGE_WORDS "
               "words");
_Static_assert(sizeof(struct relicore_thermal_history) == 163848,
               "the header states 163848 bytes for struct relicore_thermal_history");
_Static_assert(_Alignof(struct relicore_thermal_history) == _Alignof(uint64_t),
               "struct relicore_thermal_history is aligned like uint64_t");
_Static_assert(sizeof(struct relicore_thermal_history_options) == 40,
               "struct relicore_thermal_history_options: int32_t (padded) and four doubles");

/* ------------------------------------------------------------------------------------------ */
/* Dispatch table: every decoupling function.                                                  */
/* ------------------------------------------------------------------------------------------ */

typedef int32_t (*u1_fn)(const struct relicore_universe *, double, double *);
typedef int32_t (*ua_fn)(const struct relicore_universe *, const double *, size_t, double *);
typedef int32_t (*h0_fn)(const struct relicore_thermal_history *, double *);
typedef int32_t (*h1_fn)(const struct relicore_thermal_history *, double, double *);
typedef int32_t (*ha_fn)(const struct relicore_thermal_history *, const double *, size_t,
                         double *);
typedef int32_t (*f2_fn)(double, double, double *);
typedef int32_t (*fa_fn)(const double *, size_t, double, double *);

enum target { ON_UNIVERSE, ON_HISTORY, ON_NOTHING };

struct entry {
    const char *name; /* name in the data file (without the relicore_ prefix) */
    enum target target;
    int nargs;
    u1_fn u1;
    ua_fn ua;
    h0_fn h0;
    h1_fn h1;
    ha_fn ha;
    f2_fn f2;
    fa_fn fa;
    long vectors;  /* number of lines of the data file that used it */
    int has_sample; /* valid arguments for the interface checks were kept: */
    double sample[2]; /* the arguments of its first value line (not a status line) */
};

/* The largest deviation of a function's value lines of one source: |got - want|/|want| (or
 * |got - want| where want = 0) and |got - want| as a fraction of the line's bound. */
struct deviation {
    size_t entry;
    char source[40];
    long lines;
    double worst_rel, worst_ratio;
};
#define MAX_DEVIATIONS 128
static struct deviation g_dev[MAX_DEVIATIONS];
static size_t g_ndev = 0;

static struct deviation *deviation_of(size_t entry, const char *source)
{
    for (size_t i = 0; i < g_ndev; i++) {
        if (g_dev[i].entry == entry && strcmp(g_dev[i].source, source) == 0) {
            return &g_dev[i];
        }
    }
    if (g_ndev == MAX_DEVIATIONS) {
        return NULL;
    }
    struct deviation *d = &g_dev[g_ndev++];
    memset(d, 0, sizeof *d);
    d->entry = entry;
    snprintf(d->source, sizeof d->source, "%s", source);
    return d;
}

#define S0 0, 0, { 0.0, 0.0 } /* vectors, has_sample, sample */
#define U1_0(n) { #n, ON_UNIVERSE, 1, relicore_##n, NULL, NULL, NULL, NULL, NULL, NULL, S0 }
#define U1_1(n) \
    { #n, ON_UNIVERSE, 1, relicore_##n, relicore_##n##_array, NULL, NULL, NULL, NULL, NULL, S0 }
#define H0_0(n) { #n, ON_HISTORY, 0, NULL, NULL, relicore_##n, NULL, NULL, NULL, NULL, S0 }
#define H1_0(n) { #n, ON_HISTORY, 1, NULL, NULL, NULL, relicore_##n, NULL, NULL, NULL, S0 }
#define H1_1(n) \
    { #n, ON_HISTORY, 1, NULL, NULL, NULL, relicore_##n, relicore_##n##_array, NULL, NULL, S0 }
#define N2_0(n) { #n, ON_NOTHING, 2, NULL, NULL, NULL, NULL, NULL, relicore_##n, NULL, S0 }
#define N2_1(n) \
    { #n, ON_NOTHING, 2, NULL, NULL, NULL, NULL, NULL, relicore_##n, relicore_##n##_array, S0 }
/* the entries of the generated lists (tests/c/gen_functions.h), by arity and array form */
#define UNIVERSE_ENTRY(n, k, domain, upper, array) U##k##_##array(n),
#define HISTORY_ENTRY(n, k, domain, upper, array) H##k##_##array(n),
#define NOTHING_ENTRY(n, k, domain, upper, array) N##k##_##array(n),

/* every decoupling function in the table (bindings/functions.toml) */
static struct entry table[] = {
    RELICORE_DECOUPLING_UNIVERSE(UNIVERSE_ENTRY)
    RELICORE_DECOUPLING_SCALARS(NOTHING_ENTRY)
    RELICORE_DECOUPLING_HISTORY(HISTORY_ENTRY)
};
#define TABLE_LEN (sizeof table / sizeof table[0])

/* 1 when the entry has an array form (over its first argument) */
static int has_array(const struct entry *e)
{
    return e->ua != NULL || e->ha != NULL || e->fa != NULL;
}

static struct entry *find_entry(const char *name)
{
    for (size_t i = 0; i < TABLE_LEN; i++) {
        if (strcmp(table[i].name, name) == 0) {
            return &table[i];
        }
    }
    return NULL;
}

/* One call of an entry; u or h is the target (the other is ignored). */
static int32_t call_entry(const struct entry *e, const struct relicore_universe *u,
                          const struct relicore_thermal_history *h, const double *a, double *out)
{
    switch (e->target) {
    case ON_UNIVERSE: return e->u1(u, a[0], out);
    case ON_HISTORY: return e->nargs == 0 ? e->h0(h, out) : e->h1(h, a[0], out);
    default: return e->f2(a[0], a[1], out);
    }
}

/* The array form of a one-argument entry (fits: over omega_baryon_h2 at a[1]). */
static int32_t call_array(const struct entry *e, const struct relicore_universe *u,
                          const struct relicore_thermal_history *h, const double *x, size_t n,
                          double second, double *out)
{
    switch (e->target) {
    case ON_UNIVERSE: return e->ua(u, x, n, out);
    case ON_HISTORY: return e->ha(h, x, n, out);
    default: return e->fa(x, n, second, out);
    }
}

/* ------------------------------------------------------------------------------------------ */
/* Numbers, tolerances, bits                                                                   */
/* ------------------------------------------------------------------------------------------ */

/* The allowed deviation of a line, or -1 for an unknown kind. */
static double bound_of(double want, const char *kind, double tol)
{
    double bound;
    return tolerance_bound(want, kind, tol, 0, &bound) ? bound : -1.0;
}

/* ------------------------------------------------------------------------------------------ */
/* Universes, histories and vectors read from the file                                         */
/* ------------------------------------------------------------------------------------------ */

struct universe_entry {
    char name[64];
    struct relicore_universe_parameters params;
    struct relicore_universe *u; /* heap */
};

struct history_entry {
    char name[64];
    size_t universe;
    int reionized;
    double reionization_redshift;
    struct relicore_thermal_history *h; /* heap: 163848 bytes */
};

struct vector {
    size_t entry, target; /* target: index of the universe or history (0 for the fits) */
    double args[2];
    int is_status;
    int32_t status; /* what the scalar call returned */
    double got;     /* what it wrote */
};

static struct universe_entry *g_universes = NULL;
static size_t g_nuniverses = 0;
static struct history_entry *g_histories = NULL;
static size_t g_nhistories = 0;
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

static struct history_entry *find_history(const char *name)
{
    for (size_t i = 0; i < g_nhistories; i++) {
        if (strcmp(g_histories[i].name, name) == 0) {
            return &g_histories[i];
        }
    }
    return NULL;
}

static struct relicore_thermal_history *new_history(void)
{
    struct relicore_thermal_history *h = malloc(sizeof *h);
    if (h == NULL) {
        fprintf(stderr, "out of memory\n");
        exit(2);
    }
    memset(h, 0, sizeof *h);
    return h;
}

static struct relicore_universe *new_universe(void)
{
    struct relicore_universe *u = malloc(sizeof *u);
    if (u == NULL) {
        fprintf(stderr, "out of memory\n");
        exit(2);
    }
    memset(u, 0, sizeof *u);
    return u;
}

static int name_taken(const char *name)
{
    return find_universe(name) != NULL || find_history(name) != NULL || strcmp(name, "-") == 0;
}

static void add_universe(const char *where, char **tok, int ntok, const char *copy)
{
    struct relicore_universe_parameters params;
    if (!parse_universe_line(where, tok, ntok, copy, sizeof g_universes[0].name, &params)) {
        return;
    }
    if (name_taken(tok[1])) {
        check(0, "%s: name %s defined twice", where, tok[1]);
        return;
    }
    g_universes = grow(g_universes, g_nuniverses + 1, sizeof *g_universes);
    struct universe_entry *ue = &g_universes[g_nuniverses++];
    memset(ue, 0, sizeof *ue);
    snprintf(ue->name, sizeof ue->name, "%s", tok[1]);
    ue->params = params;
    ue->u = new_universe();
    int32_t s = relicore_universe_init(&ue->params, ue->u);
    check(s == RELICORE_OK, "%s: relicore_universe_init(%s) returned %d (%s)", where, ue->name,
          (int)s, relicore_status_message(s));
}

static void add_history(const char *where, char **tok, int ntok, const char *copy)
{
    int reionized = strcmp(tok[0], "history_reionized") == 0;
    double zre = NAN;
    int ok = ntok == (reionized ? 4 : 3) && strlen(tok[1]) < sizeof g_histories[0].name;
    if (ok && reionized) {
        ok = parse_number(tok[3], &zre);
    }
    if (!ok) {
        check(0, "%s: malformed history line: %s", where, copy);
        return;
    }
    if (name_taken(tok[1])) {
        check(0, "%s: name %s defined twice", where, tok[1]);
        return;
    }
    struct universe_entry *ue = find_universe(tok[2]);
    if (ue == NULL) {
        check(0, "%s: history %s of an unknown universe '%s'", where, tok[1], tok[2]);
        return;
    }
    g_histories = grow(g_histories, g_nhistories + 1, sizeof *g_histories);
    struct history_entry *he = &g_histories[g_nhistories++];
    memset(he, 0, sizeof *he);
    snprintf(he->name, sizeof he->name, "%s", tok[1]);
    he->universe = (size_t)(ue - g_universes);
    he->reionized = reionized;
    he->reionization_redshift = zre;
    he->h = new_history();
    struct relicore_thermal_history_options o;
    int32_t s = relicore_thermal_history_options_default(&o);
    check(s == RELICORE_OK, "relicore_thermal_history_options_default returned %d", (int)s);
    if (reionized) {
        o.reionization = 1;
        o.reionization_redshift = zre;
    }
    s = relicore_thermal_history_compute(ue->u, &o, he->h);
    check(s == RELICORE_OK, "%s: relicore_thermal_history_compute(%s of %s) returned %d (%s)",
          where, he->name, ue->name, (int)s, relicore_status_message(s));
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
        if (strcmp(tok[0], "history") == 0 || strcmp(tok[0], "history_reionized") == 0) {
            add_history(where, tok, ntok, copy);
            continue;
        }
        /* function TARGET nargs args... expected kind tolerance source */
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
        const struct relicore_universe *u = NULL;
        const struct relicore_thermal_history *h = NULL;
        size_t target = 0;
        if (e->target == ON_UNIVERSE) {
            struct universe_entry *ue = find_universe(tok[1]);
            if (ue == NULL) {
                check(0, "%s: unknown universe '%s' (no universe line before it)", where, tok[1]);
                continue;
            }
            u = ue->u;
            target = (size_t)(ue - g_universes);
        } else if (e->target == ON_HISTORY) {
            struct history_entry *he = find_history(tok[1]);
            if (he == NULL) {
                check(0, "%s: unknown history '%s' (no history line before it)", where, tok[1]);
                continue;
            }
            h = he->h;
            target = (size_t)(he - g_histories);
        } else if (strcmp(tok[1], "-") != 0) {
            check(0, "%s: %s takes no universe or history, the line names '%s'", where, name,
                  tok[1]);
            continue;
        }
        e->vectors++;
        int is_status = strcmp(kind, "status") == 0;
        double got = NAN;
        int32_t s = call_entry(e, u, h, args, &got);
        if (!is_status && !e->has_sample) {
            e->sample[0] = args[0];
            e->sample[1] = args[1];
            e->has_sample = 1;
        }

        /* the array form on the same single argument: same bits, same status */
        if (nargs >= 1 && has_array(e)) {
            double in = args[0], out = 7.0;
            int32_t sa = call_array(e, u, h, &in, 1, args[1], &out);
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
                                                   .target = target,
                                                   .args = { args[0], args[1] },
                                                   .is_status = is_status,
                                                   .status = s,
                                                   .got = got };
        if (dump) {
            if (!is_status) {
                printf("%s %s %016" PRIx64 "\n", tok[1], name, bits64(got));
            }
            continue;
        }
        if (is_status) {
            check_status_line(where, &v, s, got, copy);
            continue;
        }
        double bound = bound_of(want, kind, tol);
        if (bound < 0.0) {
            check(0, "%s: unknown tolerance kind '%s'", where, kind);
            continue;
        }
        double dev = fabs(got - want);
        int pass = s == RELICORE_OK && isfinite(got) && (got == want || dev <= bound);
        struct deviation *d = deviation_of((size_t)(e - table), source);
        if (d != NULL && s == RELICORE_OK && isfinite(got)) {
            double rel = want != 0.0 ? dev / fabs(want) : dev;
            double ratio = bound > 0.0 ? dev / bound : (dev == 0.0 ? 0.0 : INFINITY);
            d->lines++;
            if (rel > d->worst_rel) {
                d->worst_rel = rel;
            }
            if (ratio > d->worst_ratio) {
                d->worst_ratio = ratio;
            }
        }
        check(pass,
              "%s: %s(%s) want %.17e got %.17e (status %d: %s) tolerance %s %.17g, error %.3g "
              "[source %s]\n     line: %s",
              where, name, tok[1], want, got, (int)s, relicore_status_message(s), kind, tol,
              want != 0.0 ? dev / fabs(want) : dev, source, copy);
    }
    fclose(r.fp);
    if (!dump) {
        check(lines > 0, "%s holds no vectors", path);
        check(g_nuniverses > 0 && g_nhistories > 0, "%s defines no universe or no history", path);
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

static void report_deviations(void)
{
    printf("largest deviation from the reference values per function and source (relative, or "
           "absolute where the value is 0; and as a fraction of the line's tolerance):\n");
    for (size_t i = 0; i < TABLE_LEN; i++) {
        for (size_t k = 0; k < g_ndev; k++) {
            const struct deviation *d = &g_dev[k];
            if (d->entry == i) {
                printf("  %-34s %-24s %4ld lines %10.3e  %6.3f of tolerance\n", table[i].name,
                       d->source, d->lines, d->worst_rel, d->worst_ratio);
            }
        }
    }
}

/* One array call on x[0..n) against the scalar results want[] and statuses st[]: same bits, NaN
 * where an element failed, the first failing code; then the same in place. */
static void array_against(const struct entry *e, const struct relicore_universe *u,
                          const struct relicore_thermal_history *h, double *x, const double *want,
                          const int32_t *st, size_t n, double second, const char *what)
{
    double *out = grow(NULL, n + 1, sizeof *out);
    int32_t first = RELICORE_OK;
    for (size_t k = 0; k < n && first == RELICORE_OK; k++) {
        first = st[k];
    }
    for (size_t k = 0; k < n; k++) {
        out[k] = 7.0;
    }
    int32_t s = call_array(e, u, h, x, n, second, out);
    int agree = s == first;
    size_t bad = n;
    for (size_t k = 0; k < n; k++) {
        int ok = same(out[k], want[k]) && (st[k] == RELICORE_OK ? isfinite(out[k]) : isnan(out[k]));
        if (!ok && bad == n) {
            bad = k;
        }
        agree = agree && ok;
    }
    check(agree,
          "relicore_%s_array(%s, %zu values): status %d (first failing element %d); element %zu "
          "differs from the scalar call",
          e->name, what, n, (int)s, (int)first, bad);
    int32_t s2 = call_array(e, u, h, x, n, second, x); /* in place */
    int inplace = s2 == s;
    for (size_t k = 0; k < n; k++) {
        inplace = inplace && same(x[k], out[k]);
    }
    check(inplace, "relicore_%s_array(%s) in place differs from out of place", e->name, what);
    free(out);
}

/* For every target and one-argument function: all the arguments of its vectors in one array
 * call give the scalar results bit for bit. The fits: for every second argument of their
 * vectors, all first arguments of that fit's vectors at once, against scalar calls. */
static void check_arrays_on_vectors(void)
{
    double *x = grow(NULL, g_nvectors + 1, sizeof *x);
    double *want = grow(NULL, g_nvectors + 1, sizeof *want);
    int32_t *st = grow(NULL, g_nvectors + 1, sizeof *st);
    for (size_t ei = 0; ei < TABLE_LEN; ei++) {
        const struct entry *e = &table[ei];
        if (e->nargs != 1 || !has_array(e)) {
            continue;
        }
        size_t ntargets = e->target == ON_UNIVERSE ? g_nuniverses : g_nhistories;
        for (size_t ti = 0; ti < ntargets; ti++) {
            size_t n = 0;
            for (size_t k = 0; k < g_nvectors; k++) {
                if (g_vectors[k].entry == ei && g_vectors[k].target == ti) {
                    x[n] = g_vectors[k].args[0];
                    want[n] = g_vectors[k].got;
                    st[n] = g_vectors[k].status;
                    n++;
                }
            }
            if (n == 0) {
                continue;
            }
            const struct relicore_universe *u =
                e->target == ON_UNIVERSE ? g_universes[ti].u : NULL;
            const struct relicore_thermal_history *h =
                e->target == ON_HISTORY ? g_histories[ti].h : NULL;
            array_against(e, u, h, x, want, st, n, 0.0,
                          e->target == ON_UNIVERSE ? g_universes[ti].name : g_histories[ti].name);
        }
    }
    for (size_t ei = 0; ei < TABLE_LEN; ei++) {
        const struct entry *e = &table[ei];
        if (e->nargs != 2 || !has_array(e)) {
            continue;
        }
        for (size_t m = 0; m < g_nvectors; m++) {
            if (g_vectors[m].entry != ei) {
                continue;
            }
            double wm = g_vectors[m].args[1];
            int seen = 0; /* this second argument already done */
            for (size_t k = 0; k < m && !seen; k++) {
                seen = g_vectors[k].entry == ei && same(g_vectors[k].args[1], wm);
            }
            if (seen) {
                continue;
            }
            size_t n = 0;
            for (size_t k = 0; k < g_nvectors; k++) {
                if (g_vectors[k].entry == ei) {
                    x[n] = g_vectors[k].args[0];
                    double a[2] = { x[n], wm };
                    want[n] = 7.0;
                    st[n] = e->f2(a[0], a[1], &want[n]);
                    n++;
                }
            }
            char what[64];
            snprintf(what, sizeof what, "omega_matter_h2 = %.17g", wm);
            array_against(e, NULL, NULL, x, want, st, n, wm, what);
        }
    }
    free(x);
    free(want);
    free(st);
}

/* Every history function on a struct that is not a computed history: want_code, NaN outputs
 * (the struct is checked before the argument). */
static void check_refused(const struct relicore_thermal_history *h, int32_t want_code,
                          const char *what)
{
    for (size_t i = 0; i < TABLE_LEN; i++) {
        const struct entry *e = &table[i];
        if (e->target != ON_HISTORY) {
            continue;
        }
        double out = 1.0;
        int32_t s = call_entry(e, NULL, h, e->sample, &out);
        check(s == want_code && isnan(out), "relicore_%s on %s returned %d (want %d), output %g",
              e->name, what, (int)s, (int)want_code, out);
        if (e->nargs == 1) {
            double bad[2] = { NAN, 0.0 };
            s = call_entry(e, NULL, h, bad, &out);
            check(s == want_code, "relicore_%s(NaN) on %s returned %d (want %d)", e->name, what,
                  (int)s, (int)want_code);
        }
        if (e->nargs == 1 && has_array(e)) {
            double x[3] = { e->sample[0], NAN, -1.0 }, o[3] = { 1.0, 1.0, 1.0 };
            s = e->ha(h, x, 3, o);
            check(s == want_code && isnan(o[0]) && isnan(o[1]) && isnan(o[2]),
                  "relicore_%s_array on %s returned %d (want %d) or left a non-NaN element",
                  e->name, what, (int)s, (int)want_code);
            o[0] = 1.0;
            s = e->ha(h, x, 0, o);
            check(s == want_code && o[0] == 1.0,
                  "relicore_%s_array(n = 0) on %s returned %d (want %d) or wrote", e->name, what,
                  (int)s, (int)want_code);
        }
    }
}

static int history_all_zero(const struct relicore_thermal_history *h)
{
    const unsigned char *b = (const unsigned char *)h;
    for (size_t i = 0; i < sizeof *h; i++) {
        if (b[i] != 0) {
            return 0;
        }
    }
    return 1;
}

/* Every history function of h at the sample arguments into out[TABLE_LEN] (NaN for the
 * others), with the statuses. */
static void snapshot(const struct relicore_thermal_history *h, double *out, int32_t *st)
{
    for (size_t i = 0; i < TABLE_LEN; i++) {
        const struct entry *e = &table[i];
        out[i] = NAN;
        st[i] = RELICORE_OK;
        if (e->target == ON_HISTORY) {
            st[i] = call_entry(e, NULL, h, e->sample, &out[i]);
        }
    }
}

static int same_snapshot(const double *a, const int32_t *sa, const double *b, const int32_t *sb)
{
    for (size_t i = 0; i < TABLE_LEN; i++) {
        if (!same(a[i], b[i]) || sa[i] != sb[i]) {
            return 0;
        }
    }
    return 1;
}

static void check_histories(void)
{
    struct relicore_thermal_history *h = new_history(), *copy = new_history();
    struct relicore_universe *u = new_universe(), *other = new_universe();
    struct relicore_universe_parameters p;
    struct relicore_thermal_history_options o;
    int32_t s;

    /* the defaults of the options */
    memset(&o, 0x5a, sizeof o);
    s = relicore_thermal_history_options_default(&o);
    check(s == RELICORE_OK && o.reionization == 0 && isnan(o.reionization_redshift)
              && o.highest_redshift == 1e4,
          "relicore_thermal_history_options_default: status %d, reionization %d, z_re %g, highest "
          "%g (want 0, NaN, 1e4)",
          (int)s, (int)o.reionization, o.reionization_redshift, o.highest_redshift);
    check(relicore_thermal_history_options_default(NULL) == RELICORE_ERROR_NULL_POINTER,
          "relicore_thermal_history_options_default(NULL)");

    /* NULL, zeroed, garbage */
    check_refused(NULL, RELICORE_ERROR_NULL_POINTER, "a NULL history");
    check_refused(h, RELICORE_ERROR_INVALID_STRUCT, "a zeroed struct");
    memset(h, 0xA5, sizeof *h);
    check_refused(h, RELICORE_ERROR_INVALID_STRUCT, "a struct of garbage bytes");

    /* a history of a universe with baryons */
    s = relicore_universe_parameters_default(67.4, 0.315, &p);
    p.omega_baryon = 0.049;
    s = s == RELICORE_OK ? relicore_universe_init(&p, u) : s;
    check(s == RELICORE_OK, "relicore_universe_init of the test universe returned %d", (int)s);
    s = relicore_thermal_history_compute(u, &o, h);
    check(s == RELICORE_OK, "relicore_thermal_history_compute on the defaults returned %d (%s)",
          (int)s, relicore_status_message(s));
    double base[TABLE_LEN], again[TABLE_LEN];
    int32_t base_st[TABLE_LEN], again_st[TABLE_LEN];
    snapshot(h, base, base_st);
    for (size_t i = 0; i < TABLE_LEN; i++) {
        if (table[i].target == ON_HISTORY) {
            check(base_st[i] == RELICORE_OK && isfinite(base[i]),
                  "relicore_%s of a computed history at its sample: status %d, %g", table[i].name,
                  (int)base_st[i], base[i]);
        }
    }

    /* NULL outputs, NULL arrays, n = 0 */
    for (size_t i = 0; i < TABLE_LEN; i++) {
        const struct entry *e = &table[i];
        const double *a = e->sample;
        struct relicore_universe *uu = e->target == ON_UNIVERSE ? u : NULL;
        s = call_entry(e, uu, h, a, NULL);
        check(s == RELICORE_ERROR_NULL_POINTER, "relicore_%s(..., NULL) returned %d", e->name,
              (int)s);
        if (e->nargs >= 1 && has_array(e)) {
            double x[2] = { e->sample[0], e->sample[0] }, o2[2] = { 1.0, 1.0 };
            s = call_array(e, uu, h, NULL, 2, a[1], o2);
            check(s == RELICORE_ERROR_NULL_POINTER && isnan(o2[0]) && isnan(o2[1]),
                  "relicore_%s_array(NULL input) returned %d", e->name, (int)s);
            s = call_array(e, uu, h, x, 2, a[1], NULL);
            check(s == RELICORE_ERROR_NULL_POINTER, "relicore_%s_array(NULL output) returned %d",
                  e->name, (int)s);
            s = call_array(e, uu, h, NULL, 0, a[1], o2);
            check(s == RELICORE_ERROR_NULL_POINTER,
                  "relicore_%s_array(NULL input, n = 0) returned %d", e->name, (int)s);
            o2[0] = 7.0;
            s = call_array(e, uu, h, x, 0, a[1], o2);
            check(s == RELICORE_OK && o2[0] == 7.0,
                  "relicore_%s_array(n = 0) returned %d or wrote", e->name, (int)s);
        }
    }
    /* Saha on NULL and refused universes */
    {
        double out = 1.0;
        s = relicore_saha_ionized_fraction(NULL, 1400.0, &out);
        check(s == RELICORE_ERROR_NULL_POINTER && isnan(out), "saha(NULL universe) = %d", (int)s);
        out = 1.0;
        s = relicore_saha_ionized_fraction(other, 1400.0, &out); /* zeroed */
        check(s == RELICORE_ERROR_INVALID_STRUCT && isnan(out), "saha(zeroed universe) = %d",
              (int)s);
        double x[2] = { 1400.0, 1500.0 }, o2[2] = { 1.0, 1.0 };
        s = relicore_saha_ionized_fraction_array(other, x, 2, o2);
        check(s == RELICORE_ERROR_INVALID_STRUCT && isnan(o2[0]) && isnan(o2[1]),
              "saha_array(zeroed universe) = %d", (int)s);
    }

    /* copies by memcpy and by assignment; a tag with one bit flipped */
    memcpy(copy, h, sizeof *h);
    snapshot(copy, again, again_st);
    check(same_snapshot(base, base_st, again, again_st),
          "a memcpy of a history gives other results than the original");
    *copy = *h;
    snapshot(copy, again, again_st);
    check(same_snapshot(base, base_st, again, again_st),
          "an assigned copy of a history gives other results than the original");
    copy->tag ^= (uint64_t)1 << 37;
    check_refused(copy, RELICORE_ERROR_INVALID_STRUCT, "a history with a flipped tag bit");

    /* the history keeps its own universe: changing or clearing the universe changes nothing */
    struct relicore_universe_parameters q = p;
    q.omega_matter = 1.0;
    s = relicore_universe_init(&q, u);
    check(s == RELICORE_OK, "re-initialising the universe returned %d", (int)s);
    snapshot(h, again, again_st);
    check(same_snapshot(base, base_st, again, again_st),
          "a history changed when its universe was re-initialised");
    memset(u, 0, sizeof *u);
    snapshot(h, again, again_st);
    check(same_snapshot(base, base_st, again, again_st),
          "a history changed when its universe was cleared");
    s = relicore_universe_init(&p, u);

    /* reionisation on, then the switch at 0 ignores the redshift entirely */
    struct relicore_thermal_history_options r = o;
    r.reionization = 1;
    r.reionization_redshift = 8.0;
    s = relicore_thermal_history_compute(u, &r, copy);
    double tau_re = NAN, tau_h = NAN;
    check(s == RELICORE_OK && relicore_reionization_optical_depth(copy, &tau_re) == RELICORE_OK
              && tau_re > 0.0 && relicore_reionization_optical_depth(h, &tau_h) == RELICORE_OK
              && tau_h == 0.0,
          "reionised history: status %d, reionisation optical depth %g (no reionisation: %g)",
          (int)s, tau_re, tau_h);
    r.reionization = 0;
    r.reionization_redshift = -INFINITY;
    s = relicore_thermal_history_compute(u, &r, copy);
    snapshot(copy, again, again_st);
    check(s == RELICORE_OK && same_snapshot(base, base_st, again, again_st),
          "reionization = 0 with a reionisation redshift of -inf: status %d or other results",
          (int)s);

    /* a shorter table: queries above its highest redshift fail, the sound horizon does not */
    r = o;
    r.highest_redshift = 5000.0;
    s = relicore_thermal_history_compute(u, &r, copy);
    check(s == RELICORE_OK, "highest redshift 5000: status %d", (int)s);
    {
        double v = NAN;
        int32_t s1 = relicore_ionized_fraction(copy, 5000.0, &v);
        check(s1 == RELICORE_OK && v > 1.0, "x_e(5000) of a table to 5000: status %d, %g", (int)s1,
              v);
        s1 = relicore_ionized_fraction(copy, 5000.5, &v);
        check(s1 == RELICORE_ERROR_OUT_OF_DOMAIN && isnan(v),
              "x_e(5000.5) of a table to 5000: status %d", (int)s1);
        s1 = relicore_sound_horizon_mpc(copy, 2e4, &v);
        check(s1 == RELICORE_OK && v > 0.0, "r_s(2e4) of a table to 5000: status %d", (int)s1);
    }

    /* every failure of compute clears the struct (a valid history before each) */
    struct relicore_universe *no_baryons = new_universe(), *no_radiation = new_universe();
    q = p;
    q.omega_baryon = 0.0;
    check(relicore_universe_init(&q, no_baryons) == RELICORE_OK, "universe without baryons");
    q = p;
    q.cmb_temperature_k = 0.0;
    check(relicore_universe_init(&q, no_radiation) == RELICORE_OK, "universe without radiation");
    struct {
        const struct relicore_universe *u;
        int32_t reionization;
        double zre, top;
        int32_t want;
        const char *what;
    } cases[] = {
        { u, 2, 8.0, 1e4, RELICORE_ERROR_OUT_OF_DOMAIN, "reionization = 2" },
        { u, -1, 8.0, 1e4, RELICORE_ERROR_OUT_OF_DOMAIN, "reionization = -1" },
        { u, INT32_MIN, 8.0, 1e4, RELICORE_ERROR_OUT_OF_DOMAIN, "reionization = INT32_MIN" },
        { u, 1, NAN, 1e4, RELICORE_ERROR_NON_FINITE, "z_re = NaN (the default) switched on" },
        { u, 1, INFINITY, 1e4, RELICORE_ERROR_NON_FINITE, "z_re = inf" },
        { u, 1, -1.0, 1e4, RELICORE_ERROR_NEGATIVE, "z_re = -1" },
        { u, 1, 100.5, 1e4, RELICORE_ERROR_OUT_OF_DOMAIN, "z_re = 100.5" },
        { u, 0, NAN, 2999.0, RELICORE_ERROR_OUT_OF_DOMAIN, "highest redshift 2999" },
        { u, 0, NAN, -1e4, RELICORE_ERROR_OUT_OF_DOMAIN, "highest redshift -1e4" },
        { u, 0, NAN, NAN, RELICORE_ERROR_NON_FINITE, "highest redshift NaN" },
        { u, 0, NAN, 1.0001e4, RELICORE_ERROR_CAPACITY_TOO_SMALL, "highest redshift 1.0001e4" },
        { u, 0, NAN, 1e6, RELICORE_ERROR_CAPACITY_TOO_SMALL, "highest redshift 1e6" },
        { no_baryons, 0, NAN, 1e4, RELICORE_ERROR_INVALID_PARAMETER, "a universe without baryons" },
        { no_radiation, 0, NAN, 1e4, RELICORE_ERROR_INVALID_PARAMETER,
          "a universe without radiation" },
        { other, 0, NAN, 1e4, RELICORE_ERROR_INVALID_STRUCT, "a zeroed universe" },
        { NULL, 0, NAN, 1e4, RELICORE_ERROR_NULL_POINTER, "a NULL universe" },
    };
    for (size_t i = 0; i < sizeof cases / sizeof cases[0]; i++) {
        memcpy(copy, h, sizeof *h);
        r = o;
        r.reionization = cases[i].reionization;
        r.reionization_redshift = cases[i].zre;
        r.highest_redshift = cases[i].top;
        s = relicore_thermal_history_compute(cases[i].u, &r, copy);
        check(s == cases[i].want && history_all_zero(copy),
              "relicore_thermal_history_compute with %s: status %d (want %d: %s), struct cleared %d",
              cases[i].what, (int)s, (int)cases[i].want, relicore_status_message(cases[i].want),
              history_all_zero(copy));
    }
    check_refused(copy, RELICORE_ERROR_INVALID_STRUCT, "the struct of a failed compute");
    memcpy(copy, h, sizeof *h);
    s = relicore_thermal_history_compute(u, NULL, copy);
    check(s == RELICORE_ERROR_NULL_POINTER && history_all_zero(copy),
          "relicore_thermal_history_compute(NULL options): status %d", (int)s);
    check(relicore_thermal_history_compute(u, &o, NULL) == RELICORE_ERROR_NULL_POINTER,
          "relicore_thermal_history_compute(..., NULL)");
    {
        double out = 1.0;
        s = relicore_saha_ionized_fraction(no_baryons, 1400.0, &out);
        check(s == RELICORE_ERROR_INVALID_PARAMETER && isnan(out),
              "saha of a universe without baryons: status %d", (int)s);
        s = relicore_saha_ionized_fraction(no_radiation, 1400.0, &out);
        check(s == RELICORE_ERROR_INVALID_PARAMETER && isnan(out),
              "saha of a universe without radiation: status %d", (int)s);
    }
    /* the fits with a NULL output and refused second arguments of the array forms */
    for (size_t i = 0; i < TABLE_LEN; i++) {
        const struct entry *e = &table[i];
        if (e->target != ON_NOTHING || !has_array(e)) {
            continue;
        }
        double x[2] = { e->sample[0], e->sample[0] }, o2[2] = { 1.0, 1.0 };
        s = e->fa(x, 2, NAN, o2);
        check(s == RELICORE_ERROR_NON_FINITE && isnan(o2[0]) && isnan(o2[1]),
              "relicore_%s_array(..., omega_matter_h2 = NaN) = %d", e->name, (int)s);
        s = e->fa(x, 2, -0.1, o2);
        check(s == RELICORE_ERROR_NON_POSITIVE && isnan(o2[0]) && isnan(o2[1]),
              "relicore_%s_array(..., omega_matter_h2 = -0.1) = %d", e->name, (int)s);
    }

    free(no_baryons);
    free(no_radiation);
    free(h);
    free(copy);
    free(u);
    free(other);
}

static void check_status_message(void)
{
    check(RELICORE_ERROR_CAPACITY_TOO_SMALL == -16, "RELICORE_ERROR_CAPACITY_TOO_SMALL is %d, "
          "FORMAT.md says -16", (int)RELICORE_ERROR_CAPACITY_TOO_SMALL);
    const char *m = relicore_status_message(RELICORE_ERROR_CAPACITY_TOO_SMALL);
    const char *unknown = relicore_status_message(RELICORE_ERROR_CAPACITY_TOO_SMALL - 1);
    check(m != NULL && unknown != NULL && strcmp(m, "unknown status") != 0
              && strcmp(unknown, "unknown status") == 0,
          "message of -16 '%s', of -17 '%s'", m ? m : "(NULL)", unknown ? unknown : "(NULL)");
    for (int32_t c = 0; c > RELICORE_ERROR_CAPACITY_TOO_SMALL && m != NULL; c--) {
        const char *other = relicore_status_message(c);
        check(other != NULL && strcmp(other, m) != 0, "codes %d and -16 share a message", (int)c);
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
        report_deviations();
        check_coverage();
        check_arrays_on_vectors();
        check_histories();
        check_status_message();
        printf("universes: %zu; histories: %zu; data-file checks: %ld; interface checks: %ld\n",
               g_nuniverses, g_nhistories, vectors, g_passed + g_failed - vectors);
        printf("%ld passed, %ld failed\n", g_passed, g_failed);
        status = g_failed == 0 && g_passed > 0 ? 0 : 1;
    } else {
        fprintf(stderr,
                "usage: %s FILE\n"
                "       %s --dump FILE\n",
                argv[0], argv[0]);
        status = 2;
    }
    for (size_t i = 0; i < g_nuniverses; i++) {
        free(g_universes[i].u);
    }
    for (size_t i = 0; i < g_nhistories; i++) {
        free(g_histories[i].h);
    }
    free(g_universes);
    free(g_histories);
    free(g_vectors);
    return status;
}
