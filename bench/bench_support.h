#pragma once
// What every benchmark program needs: the process's peak memory and a way to stop at the first
// error with its message.

#include "core/model/error.h"

#include <sys/resource.h>

#include <cstdio>
#include <cstdlib>
#include <utility>

namespace fourfold::bench {

// The peak resident memory of this process so far, in MiB.
inline double peakMiB()
{
    rusage usage {};
    getrusage(RUSAGE_SELF, &usage);
    return double(usage.ru_maxrss) / 1024.0;
}

[[noreturn]] inline void fail(const char *what, const Error &e)
{
    std::fprintf(stderr, "%s: %s\n", what, qPrintable(e.toString()));
    std::exit(1);
}

template<typename T>
T check(Result<T> r, const char *what)
{
    if (!r)
        fail(what, r.error());
    return std::move(*r);
}

inline void check(const Status &s, const char *what)
{
    if (!s)
        fail(what, s.error());
}

} // namespace fourfold::bench
