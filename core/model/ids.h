#pragma once
// Distinct id types, so that an article id cannot be passed where a coder id is expected.
// The value is the SQLite rowid inside one project file; rows created by people also carry a
// UUID (see Uuid) that stays the same across copies of a project.

#include <QHashFunctions>
#include <QString>
#include <QtGlobal>

#include <compare>

namespace fourfold {

template<typename Tag>
struct Id {
    qint64 value = 0;

    constexpr bool isValid() const { return value > 0; }
    friend constexpr auto operator<=>(const Id &, const Id &) = default;
    friend constexpr bool operator==(const Id &, const Id &) = default;
    friend size_t qHash(const Id &id, size_t seed = 0) { return ::qHash(id.value, seed); }
};

using ArticleId = Id<struct ArticleTag>;
using CoderId = Id<struct CoderTag>;
using AnnotationId = Id<struct AnnotationTag>;
using LinkId = Id<struct LinkTag>;
using CodebookVersionId = Id<struct CodebookVersionTag>;
using ItemId = Id<struct ItemTag>;
using JudgementId = Id<struct JudgementTag>;
using GoldId = Id<struct GoldTag>;
using RunId = Id<struct RunTag>;

} // namespace fourfold
