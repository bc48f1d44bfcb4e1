/*
 * liblogicproof_z3compat: lets the Microsoft.Z3 4.12 managed API run on top of
 * the libz3 shipped by the Linux distribution (4.8.12 on Debian/Ubuntu).
 *
 * The managed assembly binds "libz3" to this library (see Z3Runtime.cs). The
 * library is linked against libz3.so.4, so every Z3 symbol it does not define
 * itself is found in that dependency when the runtime looks it up on this
 * library's handle. What it defines:
 *
 *  - Z3_enable_concurrent_dec_ref: missing before 4.12 and called by every
 *    managed Context constructor. Forwarded when the real library has it,
 *    otherwise a no-op (releases are made thread-safe here instead).
 *
 *  - Every release function the managed finalizers call (Z3_dec_ref, the
 *    Z3_*_dec_ref family, Z3_del_constructor, Z3_del_constructor_list). The
 *    finalizer thread must not touch a 4.8 context while its owning thread
 *    works in it, so each release is queued per context instead of run.
 *
 *  - The matching Z3_*_inc_ref functions and Z3_del_context: they run the
 *    queued releases of their context on the calling thread, which is the
 *    thread that owns the context.
 *
 *  - Z3_get_decl_kind: 4.12 renumbered some sequence/regex kinds and
 *    Z3_OP_UNINTERPRETED; values from 4.8.12 are translated to the numbering
 *    the managed enum uses.
 *
 *  - Z3_get_error_code: see release_suppresses_error_check below.
 *
 * Other entry points of the managed API that 4.8.12 lacks (characters,
 * string/regex extras, simplifiers, parser contexts, user propagators,
 * on-clause callbacks, Z3_substitute_funs, Z3_mk_real_int64, ...) are left
 * undefined: using them throws EntryPointNotFoundException, which is the
 * honest answer, and none of them is needed by Context, Solver, the
 * Boolean/bit-vector/integer/real builders, Model, Params, Statistics,
 * Goal/Tactic or Fixedpoint.
 */
#define _GNU_SOURCE
#include <dlfcn.h>
#include <pthread.h>
#include <stdatomic.h>
#include <stddef.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>

#define EXPORT __attribute__((visibility("default")))

#define Z3_OK 0u

typedef void *z3_context;
typedef void (*ref_fn)(z3_context, void *);
typedef void (*del_context_fn)(z3_context);
typedef void (*enable_fn)(z3_context);
typedef unsigned (*get_error_code_fn)(z3_context);
typedef void (*set_error_fn)(z3_context, unsigned);
typedef void (*set_error_handler_fn)(z3_context, void *);
typedef unsigned (*get_decl_kind_fn)(z3_context, void *);
typedef void (*get_version_fn)(unsigned *, unsigned *, unsigned *, unsigned *);

/* Reference-counted object families of the managed API: name prefix of the
   *_inc_ref / *_dec_ref pair. Families missing from the real library (e.g.
   simplifier in 4.8) cannot be created there, so their wrappers are never
   reached; they are kept so a newer libz3 works unchanged. */
#define Z3COMPAT_FAMILIES(X) \
    X(Z3)                    \
    X(Z3_params)             \
    X(Z3_param_descrs)       \
    X(Z3_model)              \
    X(Z3_func_interp)        \
    X(Z3_func_entry)         \
    X(Z3_goal)               \
    X(Z3_tactic)             \
    X(Z3_simplifier)         \
    X(Z3_probe)              \
    X(Z3_apply_result)       \
    X(Z3_solver)             \
    X(Z3_stats)              \
    X(Z3_ast_vector)         \
    X(Z3_ast_map)            \
    X(Z3_fixedpoint)         \
    X(Z3_optimize)

static struct {
#define X(f) ref_fn f##_inc_ref; ref_fn f##_dec_ref;
    Z3COMPAT_FAMILIES(X)
#undef X
    ref_fn del_constructor;
    ref_fn del_constructor_list;
    del_context_fn del_context;
    enable_fn enable_concurrent_dec_ref;
    get_error_code_fn get_error_code;
    set_error_fn set_error;
    set_error_handler_fn set_error_handler;
    get_decl_kind_fn get_decl_kind;
    get_version_fn get_version;
} real;

static pthread_once_t init_once = PTHREAD_ONCE_INIT;
static int translate_decl_kinds;

static void *resolve(void *lib, const char *name, int required)
{
    void *p = dlsym(lib, name);
    if (p == NULL && required) {
        fprintf(stderr, "liblogicproof_z3compat: libz3.so.4 has no %s\n", name);
        abort();
    }
    return p;
}

static void init(void)
{
    void *lib = dlopen("libz3.so.4", RTLD_NOW | RTLD_LOCAL);
    if (lib == NULL) {
        fprintf(stderr, "liblogicproof_z3compat: %s\n", dlerror());
        abort();
    }
#define X(f)                                                      \
    real.f##_inc_ref = (ref_fn)resolve(lib, #f "_inc_ref", 0);    \
    real.f##_dec_ref = (ref_fn)resolve(lib, #f "_dec_ref", 0);
    Z3COMPAT_FAMILIES(X)
#undef X
    real.del_constructor = (ref_fn)resolve(lib, "Z3_del_constructor", 0);
    real.del_constructor_list = (ref_fn)resolve(lib, "Z3_del_constructor_list", 0);
    real.del_context = (del_context_fn)resolve(lib, "Z3_del_context", 1);
    real.enable_concurrent_dec_ref = (enable_fn)resolve(lib, "Z3_enable_concurrent_dec_ref", 0);
    real.get_error_code = (get_error_code_fn)resolve(lib, "Z3_get_error_code", 1);
    real.set_error = (set_error_fn)resolve(lib, "Z3_set_error", 1);
    real.set_error_handler = (set_error_handler_fn)resolve(lib, "Z3_set_error_handler", 1);
    real.get_decl_kind = (get_decl_kind_fn)resolve(lib, "Z3_get_decl_kind", 1);
    real.get_version = (get_version_fn)resolve(lib, "Z3_get_version", 1);

    unsigned major = 0, minor = 0, build = 0, revision = 0;
    real.get_version(&major, &minor, &build, &revision);
    /* The table below was derived from the 4.8.12 headers only. */
    translate_decl_kinds = major == 4 && minor == 8 && build == 12;
}

static inline void ensure_init(void)
{
    pthread_once(&init_once, init);
}

/* ---- per-context queue of deferred releases ---- */

struct pending_release {
    ref_fn release;
    void *object;
};

struct context_queue {
    z3_context context;
    struct pending_release *items;
    size_t count;
    size_t capacity;
    struct context_queue *next;
};

#define BUCKETS 64u

static struct context_queue *buckets[BUCKETS];
static pthread_mutex_t queue_lock = PTHREAD_MUTEX_INITIALIZER;
/* Lets the many inc_ref calls skip the lock while nothing is queued. */
static atomic_size_t pending_total;

static size_t bucket_of(z3_context context)
{
    uintptr_t p = (uintptr_t)context;
    return (size_t)((p >> 4) ^ (p >> 12)) % BUCKETS;
}

static struct context_queue **find_slot(z3_context context)
{
    struct context_queue **slot = &buckets[bucket_of(context)];
    while (*slot != NULL && (*slot)->context != context)
        slot = &(*slot)->next;
    return slot;
}

static void enqueue(z3_context context, ref_fn release, void *object)
{
    /* A null context means the managed Context is already disposed, and the
       native objects went with it. */
    if (context == NULL || object == NULL || release == NULL)
        return;
    pthread_mutex_lock(&queue_lock);
    struct context_queue **slot = find_slot(context);
    struct context_queue *queue = *slot;
    if (queue == NULL) {
        queue = calloc(1, sizeof *queue);
        if (queue == NULL)
            goto out; /* leaking one object beats releasing it on the wrong thread */
        queue->context = context;
        *slot = queue;
    }
    if (queue->count == queue->capacity) {
        size_t capacity = queue->capacity == 0 ? 64 : queue->capacity * 2;
        struct pending_release *items = realloc(queue->items, capacity * sizeof *items);
        if (items == NULL)
            goto out;
        queue->items = items;
        queue->capacity = capacity;
    }
    queue->items[queue->count].release = release;
    queue->items[queue->count].object = object;
    queue->count++;
    atomic_fetch_add_explicit(&pending_total, 1, memory_order_release);
out:
    pthread_mutex_unlock(&queue_lock);
}

/* Runs the releases queued for the context on the calling thread. Items are
   taken out under the lock and run outside it, so finalizers can keep
   queueing meanwhile. */
static void flush(z3_context context, int forget_context)
{
    if (!forget_context && atomic_load_explicit(&pending_total, memory_order_acquire) == 0)
        return;
    struct pending_release *items = NULL;
    size_t count = 0;
    pthread_mutex_lock(&queue_lock);
    struct context_queue **slot = find_slot(context);
    struct context_queue *queue = *slot;
    if (queue != NULL) {
        items = queue->items;
        count = queue->count;
        if (forget_context) {
            *slot = queue->next;
            free(queue);
        } else {
            queue->items = NULL;
            queue->count = 0;
            queue->capacity = 0;
        }
        atomic_fetch_sub_explicit(&pending_total, count, memory_order_relaxed);
    }
    pthread_mutex_unlock(&queue_lock);
    for (size_t i = 0; i < count; i++)
        items[i].release(context, items[i].object);
    free(items);
}

/* The real inc_ref runs before the flush, so an object whose last real
   reference is a queued release is never freed before it is re-acquired. The
   managed wrapper checks the error code right after inc_ref; the flushed
   releases reset it, so it is restored. */
static void acquire(ref_fn inc_ref, z3_context context, void *object)
{
    if (inc_ref == NULL)
        return;
    inc_ref(context, object);
    if (atomic_load_explicit(&pending_total, memory_order_acquire) == 0)
        return;
    unsigned error = real.get_error_code(context);
    flush(context, 0);
    if (error != Z3_OK)
        real.set_error(context, error);
}

/* The managed wrappers of Z3_del_constructor(_list) read the context's error
   code right after the call, on the finalizer thread. Since the call was only
   queued, that read answers Z3_OK without touching the context (which may
   even be null once the managed Context is disposed). */
static _Thread_local int release_suppresses_error_check;

#define X(f)                                                             \
    EXPORT void f##_inc_ref(z3_context c, void *o)                       \
    {                                                                    \
        ensure_init();                                                   \
        acquire(real.f##_inc_ref, c, o);                                 \
    }                                                                    \
    EXPORT void f##_dec_ref(z3_context c, void *o)                       \
    {                                                                    \
        ensure_init();                                                   \
        enqueue(c, real.f##_dec_ref, o);                                 \
    }
Z3COMPAT_FAMILIES(X)
#undef X

EXPORT void Z3_del_constructor(z3_context c, void *constructor)
{
    ensure_init();
    enqueue(c, real.del_constructor, constructor);
    release_suppresses_error_check = 1;
}

EXPORT void Z3_del_constructor_list(z3_context c, void *list)
{
    ensure_init();
    enqueue(c, real.del_constructor_list, list);
    release_suppresses_error_check = 1;
}

EXPORT unsigned Z3_get_error_code(z3_context c)
{
    if (release_suppresses_error_check) {
        release_suppresses_error_check = 0;
        return Z3_OK;
    }
    ensure_init();
    return real.get_error_code(c);
}

EXPORT void Z3_del_context(z3_context c)
{
    ensure_init();
    if (c == NULL)
        return;
    /* The managed Context drops its error-handler delegate before deleting
       the context; a release failing now must not call into it. */
    real.set_error_handler(c, NULL);
    flush(c, 1);
    real.del_context(c);
}

EXPORT void Z3_enable_concurrent_dec_ref(z3_context c)
{
    ensure_init();
    if (real.enable_concurrent_dec_ref != NULL)
        real.enable_concurrent_dec_ref(c);
}

/* 4.8.12 value -> value of the same kind in the 4.12 managed Z3_decl_kind. */
static const struct {
    unsigned from;
    unsigned to;
} decl_kind_map[] = {
    {1559, 1562},   /* Z3_OP_SEQ_AT */
    {1560, 1563},   /* Z3_OP_SEQ_NTH */
    {1561, 1564},   /* Z3_OP_SEQ_LENGTH */
    {1562, 1565},   /* Z3_OP_SEQ_INDEX */
    {1563, 1566},   /* Z3_OP_SEQ_LAST_INDEX */
    {1564, 1567},   /* Z3_OP_SEQ_TO_RE */
    {1565, 1568},   /* Z3_OP_SEQ_IN_RE */
    {1566, 1569},   /* Z3_OP_STR_TO_INT */
    {1567, 1570},   /* Z3_OP_INT_TO_STR */
    {1568, 1575},   /* Z3_OP_STRING_LT */
    {1569, 1576},   /* Z3_OP_STRING_LE */
    {1570, 1577},   /* Z3_OP_RE_PLUS */
    {1571, 1578},   /* Z3_OP_RE_STAR */
    {1572, 1579},   /* Z3_OP_RE_OPTION */
    {1573, 1580},   /* Z3_OP_RE_CONCAT */
    {1574, 1581},   /* Z3_OP_RE_UNION */
    {1575, 1582},   /* Z3_OP_RE_RANGE */
    {1576, 1585},   /* Z3_OP_RE_LOOP */
    {1577, 1584},   /* Z3_OP_RE_INTERSECT */
    {1578, 1588},   /* Z3_OP_RE_EMPTY_SET */
    {1579, 1589},   /* Z3_OP_RE_FULL_SET */
    {1580, 1587},   /* Z3_OP_RE_COMPLEMENT */
    {45101, 45102}, /* Z3_OP_UNINTERPRETED */
};

EXPORT unsigned Z3_get_decl_kind(z3_context c, void *decl)
{
    ensure_init();
    unsigned kind = real.get_decl_kind(c, decl);
    if (translate_decl_kinds) {
        for (size_t i = 0; i < sizeof decl_kind_map / sizeof decl_kind_map[0]; i++) {
            if (decl_kind_map[i].from == kind)
                return decl_kind_map[i].to;
        }
    }
    return kind;
}

/* Diagnostics for tests: releases still queued for a context. */
EXPORT size_t logicproof_z3compat_pending(z3_context c)
{
    size_t count = 0;
    pthread_mutex_lock(&queue_lock);
    struct context_queue *queue = *find_slot(c);
    if (queue != NULL)
        count = queue->count;
    pthread_mutex_unlock(&queue_lock);
    return count;
}
