#pragma once
// For tests only: the SQLite connection under a Project, for fault injection, dumps and rows a
// test writes or reads directly. Front ends never include this header: the store is private to
// core (DEVELOPERS.md, "What front ends may include").

#include "core/project/project.h"
#include "core/store/database.h"

namespace fourfold {

struct ProjectTestAccess {
    static Database &database(Project &project) { return project.db(); }
};

// The connection `project` works on; valid as long as `project` is.
inline Database &databaseForTesting(Project &project)
{
    return ProjectTestAccess::database(project);
}

} // namespace fourfold
