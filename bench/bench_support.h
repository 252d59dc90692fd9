#pragma once
// What every benchmark program needs: the process's peak memory, a way to stop at the first
// error with its message, and the people of a generated study.

#include "core/model/error.h"
#include "core/project/edit.h"
#include "core/project/people.h"
#include "core/project/project.h"

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

// The people of a generated study (bench/study_generator.h): coders C01, C02, ... (their
// pseudonym as name) and the lead L01.
inline void addStudyPeople(Project &project, int coders)
{
    for (int c = 0; c < coders; ++c) {
        const QString pseudonym = QStringLiteral("C%1").arg(c + 1, 2, 10, QLatin1Char('0'));
        check(project.addCoder(pseudonym, pseudonym, CoderRole::Coder), "coder");
    }
    // The first lead of a new project, without a passphrase (people.h).
    auto lead = check(
        People::addLeadWithoutPassphrase(project, QStringLiteral("Lead"), QStringLiteral("L01")),
        "lead");
    check(project.apply(*lead), "lead");
}

} // namespace fourfold::bench
