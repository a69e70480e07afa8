/*
 * The reading and checking of the reference-vector files (the .txt files of tests/data, format in
 * tests/data/FORMAT.md) shared by the C vector tests test_blackbody, test_cosmology and
 * test_decoupling (C11): the pass/fail counters, number parsing, tolerances and bits, the reader
 * of the records of a file, and what test_cosmology and test_decoupling read alike: universe
 * lines, vector lines "function TARGET nargs args... expected kind tolerance source" and their
 * status checks. Compiled with each of them (tests/c/vector_files.c).
 */
#ifndef RELICORE_TESTS_VECTOR_FILES_H
#define RELICORE_TESTS_VECTOR_FILES_H

#include <stddef.h>
#include <stdint.h>
#include <stdio.h>

#include "relicore.h"

#define MAX_LINE 8192
#define NPARAMS 12 /* the numbers of a universe line */

/* ------------------------------------------------------------------------------------------ */
/* Counting checks                                                                             */
/* ------------------------------------------------------------------------------------------ */

extern long g_passed;
extern long g_failed;

/* Counts one check; prints the message when it failed. */
void check(int ok, const char *fmt, ...);

/* realloc, or exit(2) with "out of memory". */
void *grow(void *p, size_t count, size_t size);

/* ------------------------------------------------------------------------------------------ */
/* Numbers, tolerances, bits                                                                   */
/* ------------------------------------------------------------------------------------------ */

/* The whole of s as a number (strtod); 0 when it is not one. */
int parse_number(const char *s, double *v);

/* Spacing of floating-point numbers at |w| as FORMAT.md defines it: 2^-(p-1) times |w| (at
 * least the smallest normal) rounded down to a power of two. */
double ulp_at(double w, int precision_bits, double min_normal);

/* The allowed |got - want| of a line of kind "ulp", "rel" or "abs" with tolerance tol, and of
 * kind "ulp32" when f32_kinds; 0 (*bound untouched) for any other kind. */
int tolerance_bound(double want, const char *kind, double tol, int f32_kinds, double *bound);

/* 1 when got is want, or finite and within the tolerance of the line; *known_kind = 0 (and 0)
 * for a kind tolerance_bound does not know. */
int within(double got, double want, const char *kind, double tol, int f32_kinds, int *known_kind);

uint64_t bits64(double x);

/* Same bits, or both NaN (a NaN's payload is not part of the interface). */
int same(double a, double b);

/* ------------------------------------------------------------------------------------------ */
/* Reading the data files                                                                      */
/* ------------------------------------------------------------------------------------------ */

struct reader {
    FILE *fp;
    const char *path;
    long lineno;
    int max_tokens;   /* a record with more tokens gives max_tokens + 1 */
    char where[200];  /* "path:lineno" of the last line read */
    char line[MAX_LINE];
    char copy[MAX_LINE]; /* the last record as read, without its line end */
};

/* Opens path; a failed check "cannot open" and 0 when it cannot. */
int open_reader(struct reader *r, const char *path, int max_tokens);

/* Next line that is neither blank nor a comment, split into tokens (tok holds max_tokens); 0 at
 * end of file. A line longer than MAX_LINE is a failed check and skipped. */
int next_record(struct reader *r, char **tok, int *ntok);

/* ------------------------------------------------------------------------------------------ */
/* Universe and vector lines of the cosmology and decoupling files                            */
/* ------------------------------------------------------------------------------------------ */

/* "universe NAME" and the NPARAMS numbers of FORMAT.md into *p; a failed check "malformed
 * universe line" and 0 when the line is not one or NAME does not fit name_size bytes. */
int parse_universe_line(const char *where, char **tok, int ntok, const char *copy,
                        size_t name_size, struct relicore_universe_parameters *p);

/* A vector line "function TARGET nargs args... expected kind tolerance source", 0 to 2 args. */
struct vector_line {
    const char *name, *target, *kind, *source;
    int nargs;
    double args[2], want, tol;
};

/* Reads tok[0 .. ntok) into *v; a failed check (malformed line, wrong number of fields,
 * unreadable number) and 0 when it cannot. */
int parse_vector_line(const char *where, char **tok, int ntok, const char *copy,
                      struct vector_line *v);

/* A status line: the call returned s and wrote got; it must fail with the code of the line and
 * write NaN. */
void check_status_line(const char *where, const struct vector_line *v, int32_t s, double got,
                       const char *copy);

#endif
