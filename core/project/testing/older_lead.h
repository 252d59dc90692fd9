#pragma once
// For tests only: a lead as a project from before passphrases holds them (no passphrase hash:
// whoever chooses them first sets it), added beside any other person. Project::addCoder refuses
// leads, and People adds a lead with a passphrase or only as a fresh project's first lead; tests
// that need a lead without one, wherever, make it here. Programs never include this header.

#include "core/project/testing/project_database.h"
#include "core/store/coder_table.h"
#include "core/store/store_util.h"

namespace fourfold {

inline Result<CoderId> addOlderLeadForTesting(
    Project &project, const QString &name, const QString &pseudonym)
{
    Coder lead;
    lead.uuid = store::newUuid();
    lead.name = name;
    lead.pseudonym = pseudonym;
    lead.role = CoderRole::Lead;
    return store::insertCoder(databaseForTesting(project), lead);
}

} // namespace fourfold
