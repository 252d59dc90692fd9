#pragma once
// Which codings count. A coder's spans and answers on an article count for reliability, the
// comparison, scoring against coders and training feedback only once the coder has marked the
// article done: before that, "no span here" may only mean "not read yet", and counting it as
// "absent" inflates agreement. Articles a coder has started (opened, or holds spans or answers
// on) but not marked done are "in progress": left out by default and listed, taken in on
// request. Assigned articles the coder never touched never count. The one place that decides
// this; every consumer asks it.

#include "core/model/annotation.h"
#include "core/model/error.h"

#include <QHash>
#include <QPair>

#include <optional>
#include <vector>

namespace fourfold {

class Project;

enum class CodingState {
    Untouched, // not assigned in the phase, or assigned and never opened or coded
    InProgress, // opened or coded, not marked done
    Done, // marked done by the coder
};

struct CodingScopeOptions {
    // Takes articles in progress in as if they were done.
    bool includeUnfinished = false;
    // Only assignments, spans and answers of this phase make an article the coder's; none = any.
    std::optional<Phase> phase;
};

class CodingScope
{
public:
    // Reads the assignments and which coders hold spans or answers on which articles (two
    // queries, whatever the size of the project). Fails only when the project cannot be read.
    static Result<CodingScope> load(const Project &project, const CodingScopeOptions &options = {});
    // The same for one article only (two indexed queries): what opening one article needs.
    static Result<CodingScope> loadArticle(
        const Project &project, ArticleId article, const CodingScopeOptions &options = {});

    // Done: the coder has an assignment of the article marked done and an assignment, span or
    // answer of it in the phase. InProgress: in the phase, not done, and opened ("started") or
    // holding spans or answers. Untouched otherwise.
    CodingState state(ArticleId article, CoderId coder) const;
    // Whether the coder's codings of the article count: Done, or InProgress when the options
    // take unfinished work in.
    bool counts(ArticleId article, CoderId coder) const;
    // Whether the pair is in progress and left out by these options.
    bool leftOut(ArticleId article, CoderId coder) const;

    const CodingScopeOptions &options() const { return m_options; }

private:
    CodingScopeOptions m_options;
    QHash<QPair<qint64, qint64>, CodingState> m_states; // only pairs not Untouched
};

} // namespace fourfold
