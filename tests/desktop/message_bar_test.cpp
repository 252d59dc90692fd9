// The message bar: results and refusals said without a modal box, with their actions.
#include "app/desktop/main_window.h"
#include "app/desktop/message_bar.h"

#include <QLabel>
#include <QPlainTextEdit>
#include <QSignalSpy>
#include <QTest>
#include <QToolButton>

#include <catch2/catch.hpp>

using namespace fourfold;

namespace {

QToolButton *buttonReading(QWidget &parent, const QString &text)
{
    for (QToolButton *b : parent.findChildren<QToolButton *>())
        if (b->text().remove(QLatin1Char('&')) == text && !b->isHidden())
            return b;
    return nullptr;
}

} // namespace

TEST_CASE("the message bar shows a result with its actions and closes when one is taken")
{
    MessageBar bar;
    bar.resize(700, 60);
    CHECK(bar.isHidden());
    int opened = 0;
    bar.showMessage(MessageBar::Kind::Success, QStringLiteral("The report was written."),
        {{QStringLiteral("&Open"), [&] { ++opened; }}, {QStringLiteral("Open the &folder"), {}}});
    CHECK_FALSE(bar.isHidden());
    CHECK(bar.kind() == MessageBar::Kind::Success);
    CHECK(bar.text() == QStringLiteral("The report was written."));
    CHECK(bar.actionTexts()
        == QStringList {QStringLiteral("Open"), QStringLiteral("Open the folder")});
    // No details given: no Details button.
    CHECK(buttonReading(bar, QStringLiteral("Details")) == nullptr);
    QToolButton *open = buttonReading(bar, QStringLiteral("Open"));
    REQUIRE(open);
    QTest::mouseClick(open, Qt::LeftButton);
    CHECK(opened == 1);
    CHECK(bar.isHidden());
    CHECK_FALSE(bar.trigger(QStringLiteral("Nothing like it")));
}

TEST_CASE("the message bar opens details on demand and a new message replaces the old one")
{
    MessageBar bar;
    bar.resize(700, 200);
    bar.showMessage(MessageBar::Kind::Warning, QStringLiteral("Merged 2 copies; 1 conflict."),
        {{QStringLiteral("&Retry"), {}}},
        QStringLiteral("c01.fourfold: 3 new\nc02.fourfold: 1 conflict"));
    auto *details = bar.findChild<QPlainTextEdit *>();
    REQUIRE(details);
    CHECK(details->isHidden());
    QToolButton *more = buttonReading(bar, QStringLiteral("Details"));
    REQUIRE(more);
    QTest::mouseClick(more, Qt::LeftButton);
    CHECK_FALSE(details->isHidden());
    CHECK(bar.details().contains(QStringLiteral("c02.fourfold: 1 conflict")));

    // The next message takes the place of this one: its actions and details go.
    bar.showMessage(MessageBar::Kind::Error, QStringLiteral("The span was not changed."));
    QCoreApplication::processEvents(QEventLoop::AllEvents);
    QCoreApplication::sendPostedEvents(nullptr, QEvent::DeferredDelete);
    CHECK(bar.actionTexts().isEmpty());
    CHECK(buttonReading(bar, QStringLiteral("Retry")) == nullptr);
    CHECK(details->isHidden());
    CHECK(bar.kind() == MessageBar::Kind::Error);
    // The text is plain: markup shows as written.
    bar.showMessage(MessageBar::Kind::Information, QStringLiteral("<b>C01</b>"));
    CHECK(bar.findChild<QLabel *>(QString(), Qt::FindDirectChildrenOnly) != nullptr);
    bool plain = false;
    for (QLabel *l : bar.findChildren<QLabel *>())
        plain = plain
            || (l->text() == QStringLiteral("<b>C01</b>") && l->textFormat() == Qt::PlainText);
    CHECK(plain);
    // The close button hides it.
    QTest::mouseClick(buttonReading(bar, QStringLiteral("✕")), Qt::LeftButton);
    CHECK(bar.isHidden());
}

TEST_CASE("a success message closes by itself and an error stays")
{
    MessageBar bar;
    bar.showMessage(MessageBar::Kind::Error, QStringLiteral("Not saved."), {}, {}, 1);
    bar.showMessage(MessageBar::Kind::Success, QStringLiteral("Saved."), {}, {}, 1);
    QTRY_VERIFY_WITH_TIMEOUT(bar.isHidden(), 5000);
    bar.showMessage(MessageBar::Kind::Error, QStringLiteral("Not saved."), {}, {}, 1);
    QTest::qWait(1500);
    CHECK_FALSE(bar.isHidden());
}

TEST_CASE("the main window has one message bar that is closed at the start")
{
    MainWindow w;
    REQUIRE(w.messageBar());
    CHECK(w.messageBar()->isHidden());
    CHECK(w.findChildren<MessageBar *>().size() == 1);
}
