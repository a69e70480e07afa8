/*
 * The reading and checking of the reference-vector files shared by the C vector tests: see
 * vector_files.h.
 */

#include "vector_files.h"

#include <float.h>
#include <math.h>
#include <stdarg.h>
#include <stdlib.h>
#include <string.h>

long g_passed = 0;
long g_failed = 0;

void check(int ok, const char *fmt, ...)
{
    if (ok) {
        g_passed++;
        return;
    }
    g_failed++;
    va_list ap;
    va_start(ap, fmt);
    fputs("FAIL ", stdout);
    vprintf(fmt, ap);
    fputc('\n', stdout);
    va_end(ap);
}

void *grow(void *p, size_t count, size_t size)
{
    void *q = realloc(p, count * size);
    if (q == NULL) {
        fprintf(stderr, "out of memory\n");
        exit(2);
    }
    return q;
}

/* ------------------------------------------------------------------------------------------ */
/* Numbers, tolerances, bits                                                                   */
/* ------------------------------------------------------------------------------------------ */

int parse_number(const char *s, double *v)
{
    char *end = NULL;
    *v = strtod(s, &end);
    return end != s && *end == '\0';
}

double ulp_at(double w, int precision_bits, double min_normal)
{
    double a = fabs(w);
    if (!(a >= min_normal)) {
        a = min_normal;
    }
    int e = 0;
    (void)frexp(a, &e); /* a = m 2^e, 0.5 <= m < 1 */
    return ldexp(1.0, e - 1 - (precision_bits - 1));
}

int tolerance_bound(double want, const char *kind, double tol, int f32_kinds, double *bound)
{
    if (strcmp(kind, "ulp") == 0) {
        *bound = tol * ulp_at(want, 53, DBL_MIN);
    } else if (f32_kinds && strcmp(kind, "ulp32") == 0) {
        *bound = tol * ulp_at(want, 24, (double)FLT_MIN);
    } else if (strcmp(kind, "rel") == 0) {
        *bound = tol * fabs(want);
    } else if (strcmp(kind, "abs") == 0) {
        *bound = tol;
    } else {
        return 0;
    }
    return 1;
}

int within(double got, double want, const char *kind, double tol, int f32_kinds, int *known_kind)
{
    double bound;
    *known_kind = tolerance_bound(want, kind, tol, f32_kinds, &bound);
    if (!*known_kind) {
        return 0;
    }
    return got == want || (isfinite(got) && fabs(got - want) <= bound);
}

uint64_t bits64(double x)
{
    uint64_t b;
    memcpy(&b, &x, sizeof b);
    return b;
}

int same(double a, double b) { return bits64(a) == bits64(b) || (isnan(a) && isnan(b)); }

/* ------------------------------------------------------------------------------------------ */
/* Reading the data files                                                                      */
/* ------------------------------------------------------------------------------------------ */

int open_reader(struct reader *r, const char *path, int max_tokens)
{
    r->fp = fopen(path, "r");
    r->path = path;
    r->lineno = 0;
    r->max_tokens = max_tokens;
    r->where[0] = '\0';
    if (r->fp == NULL) {
        check(0, "cannot open %s", path);
        return 0;
    }
    return 1;
}

int next_record(struct reader *r, char **tok, int *ntok)
{
    while (fgets(r->line, sizeof r->line, r->fp) != NULL) {
        r->lineno++;
        snprintf(r->where, sizeof r->where, "%s:%ld", r->path, r->lineno);
        size_t len = strlen(r->line);
        if (len == sizeof r->line - 1 && r->line[len - 1] != '\n') {
            check(0, "%s: line longer than %d characters", r->where, MAX_LINE);
            int c;
            while ((c = fgetc(r->fp)) != EOF && c != '\n') {
            }
            continue;
        }
        char *p = r->line;
        while (*p == ' ' || *p == '\t') {
            p++;
        }
        if (*p == '#' || *p == '\n' || *p == '\r' || *p == '\0') {
            continue;
        }
        strcpy(r->copy, r->line);
        r->copy[strcspn(r->copy, "\r\n")] = '\0';
        int n = 0;
        for (char *t = strtok(r->line, " \t\r\n"); t != NULL; t = strtok(NULL, " \t\r\n")) {
            if (n == r->max_tokens) {
                n++;
                break;
            }
            tok[n++] = t;
        }
        *ntok = n;
        return 1;
    }
    return 0;
}

/* ------------------------------------------------------------------------------------------ */
/* Universe and vector lines of the cosmology and decoupling files                            */
/* ------------------------------------------------------------------------------------------ */

int parse_universe_line(const char *where, char **tok, int ntok, const char *copy,
                        size_t name_size, struct relicore_universe_parameters *p)
{
    double v[NPARAMS];
    int ok = ntok == 2 + NPARAMS && strlen(tok[1]) < name_size;
    for (int i = 0; ok && i < NPARAMS; i++) {
        ok = parse_number(tok[2 + i], &v[i]);
    }
    if (!ok) {
        check(0, "%s: malformed universe line: %s", where, copy);
        return 0;
    }
    p->h0_km_s_mpc = v[0];
    p->omega_matter = v[1];
    p->omega_baryon = v[2];
    p->omega_curvature = v[3];
    p->cmb_temperature_k = v[4];
    p->n_eff = v[5];
    p->neutrino_masses_ev[0] = v[6];
    p->neutrino_masses_ev[1] = v[7];
    p->neutrino_masses_ev[2] = v[8];
    p->w0 = v[9];
    p->wa = v[10];
    p->helium_mass_fraction = v[11];
    return 1;
}

int parse_vector_line(const char *where, char **tok, int ntok, const char *copy,
                      struct vector_line *v)
{
    double nargs_d = -1.0;
    if (ntok < 3 || !parse_number(tok[2], &nargs_d) || nargs_d < 0 || nargs_d > 2
        || nargs_d != floor(nargs_d)) {
        check(0, "%s: malformed line: %s", where, copy);
        return 0;
    }
    int nargs = (int)nargs_d;
    if (ntok != 3 + nargs + 4) {
        check(0, "%s: wrong number of fields: %s", where, copy);
        return 0;
    }
    v->name = tok[0];
    v->target = tok[1];
    v->nargs = nargs;
    v->args[0] = 0.0;
    v->args[1] = 0.0;
    v->want = 0.0;
    v->tol = 0.0;
    int ok = 1;
    for (int i = 0; i < nargs; i++) {
        ok = ok && parse_number(tok[3 + i], &v->args[i]);
    }
    ok = ok && parse_number(tok[3 + nargs], &v->want) && parse_number(tok[5 + nargs], &v->tol);
    v->kind = tok[4 + nargs];
    v->source = tok[6 + nargs];
    if (!ok) {
        check(0, "%s: unreadable number: %s", where, copy);
        return 0;
    }
    return 1;
}

void check_status_line(const char *where, const struct vector_line *v, int32_t s, double got,
                       const char *copy)
{
    check(s == (int32_t)v->tol && isnan(got),
          "%s: %s status want %d got %d (%s), output %.17e (want NaN) [source %s]\n"
          "     line: %s",
          where, v->name, (int)v->tol, (int)s, relicore_status_message(s), got, v->source, copy);
}
