#pragma once
// RAII savepoint: everything between construction and commit() is one atomic unit; leaving the
// scope without commit() rolls it all back. Savepoints nest; the outermost one is a write
// transaction begun at once (BEGIN IMMEDIATE), so a second process that writes the same file
// waits for the busy timeout instead of failing at its first write.

#include "core/model/error.h"

namespace fourfold {

class Database;

class Savepoint
{
public:
    // Opens the savepoint; check ok() / the status from begin() before writing.
    static Result<Savepoint> begin(Database &db);
    ~Savepoint();
    Savepoint(Savepoint &&other) noexcept;
    Savepoint &operator=(Savepoint &&) = delete;
    Savepoint(const Savepoint &) = delete;
    Savepoint &operator=(const Savepoint &) = delete;

    // Makes the changes permanent (or part of the enclosing savepoint). Fails with the mapped
    // SQLite error; the destructor then rolls back.
    Status commit();

private:
    explicit Savepoint(Database *db)
        : m_db(db)
    { }
    Database *m_db = nullptr;
    bool m_done = false;
    bool m_outermost = false; // BEGIN IMMEDIATE … COMMIT rather than a named savepoint
};

} // namespace fourfold
