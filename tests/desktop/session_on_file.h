#pragma once
// A person's coding session on a project file, with a connection of its own: what the lead's
// windows take, while a test reads the same file through another connection.

#include "app/desktop/coding_session.h"
#include "core/project/project.h"

#include <catch2/catch.hpp>

#include <memory>

namespace fourfold::test {

inline std::unique_ptr<CodingSession> sessionOnFile(const QString &path, const QString &pseudonym)
{
    auto project = Project::open(path);
    REQUIRE(project);
    auto coder = project->coderByPseudonym(pseudonym);
    REQUIRE(coder);
    REQUIRE(coder->has_value());
    const Coder who = **coder;
    return std::make_unique<CodingSession>(std::move(*project), who);
}

} // namespace fourfold::test
