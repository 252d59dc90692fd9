// The span editor's free-text attributes offer the values already used, so that one actor keeps
// one spelling (the walkthrough's finding); a coder is offered only their own values, since a
// coder codes blind (common practice in content analysis: coders do not see each other's
// codings). Checked on the sample project against the values read from its spans in the test.
#include "app/desktop/coding_session.h"
#include "app/desktop/span_editor.h"
#include "core/project/project.h"
#include "tests/support/test_support.h"

#include <QApplication>
#include <QCompleter>
#include <QFile>
#include <QFocusEvent>
#include <QLineEdit>
#include <QSet>
#include <QStringListModel>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct SampleSession {
    QTemporaryDir dir;
    std::unique_ptr<CodingSession> session;
    explicit SampleSession(const QString &who)
    {
        const QString path = dir.filePath(QStringLiteral("demo.fourfold"));
        REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
        QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
        auto p = Project::open(path);
        REQUIRE(p);
        auto coder = p->coderByPseudonym(who);
        REQUIRE(coder);
        REQUIRE(coder->has_value());
        session = std::make_unique<CodingSession>(std::move(*p), **coder);
    }
};

// The actor values of the spans of `coder` (every coder's and gold's when none), computed here
// from the project's rows.
QSet<QString> actorsIn(Project &project, std::optional<CoderId> coder)
{
    QSet<QString> out;
    auto all = project.allAnnotations();
    REQUIRE(all);
    for (const Annotation &a : *all)
        if (!a.deleted && (!coder || a.coder == *coder))
            if (const QString v = a.content.attributes.value(QStringLiteral("actor")).toString();
                !v.isEmpty())
                out.insert(v);
    if (!coder) {
        auto gold = project.goldAnnotations();
        REQUIRE(gold);
        for (const GoldAnnotation &g : *gold)
            if (const QString v = g.content.attributes.value(QStringLiteral("actor")).toString();
                !v.isEmpty())
                out.insert(v);
    }
    return out;
}

// Opens a cause span of `owner` in an editor of `s`, enters its actor field and returns what
// the field offers.
QStringList offeredFor(SampleSession &s, CoderId owner)
{
    Project &project = s.session->project();
    auto all = project.allAnnotations();
    REQUIRE(all);
    const auto cause = std::ranges::find_if(*all, [&](const Annotation &a) {
        return !a.deleted && a.coder == owner && a.content.function == FramingFunction::Cause;
    });
    REQUIRE(cause != all->end());
    SpanEditor editor(s.session.get());
    editor.setCodebook(s.session->codebook());
    editor.setSpan(*cause, {*cause}, {});
    QLineEdit *actor = nullptr;
    for (QLineEdit *e : editor.findChildren<QLineEdit *>())
        if (e->accessibleName() == QStringLiteral("Actor held responsible"))
            actor = e;
    REQUIRE(actor);
    CHECK(actor->completer() == nullptr); // nothing read before the field is entered
    QFocusEvent in(QEvent::FocusIn, Qt::TabFocusReason);
    QApplication::sendEvent(actor, &in);
    REQUIRE(actor->completer());
    auto *model = qobject_cast<QStringListModel *>(actor->completer()->model());
    REQUIRE(model);
    return model->stringList();
}

} // namespace

TEST_CASE("A coder's actor field offers that coder's own actor names and no one else's")
{
    SampleSession s(QStringLiteral("C01"));
    const CoderId c01 = s.session->coder().id;
    const QStringList offered = offeredFor(s, c01);
    const QSet<QString> own = actorsIn(s.session->project(), c01);
    REQUIRE(own.size() > 5);
    CHECK(QSet<QString>(offered.begin(), offered.end()) == own);
    CHECK(offered.size() == own.size()); // each value once
    // A value only another coder used is not offered (C02's "the pandemic").
    CHECK_FALSE(offered.contains(QStringLiteral("the pandemic")));
}

TEST_CASE("A lead's actor field offers every coder's and gold's actor names, most used first")
{
    SampleSession s(QStringLiteral("L01"));
    auto c01 = s.session->project().coderByPseudonym(QStringLiteral("C01"));
    REQUIRE(c01);
    const QStringList offered = offeredFor(s, (*c01)->id);
    const QSet<QString> every = actorsIn(s.session->project(), std::nullopt);
    CHECK(QSet<QString>(offered.begin(), offered.end()) == every);
    CHECK(offered.contains(QStringLiteral("the pandemic")));
    // "Harbrook Borough Council" is used more often than a value used once: it comes earlier.
    CHECK(offered.indexOf(QStringLiteral("Harbrook Borough Council"))
        < offered.indexOf(QStringLiteral("the pandemic")));
}
