// The logging categories, the error log line and the soft assertion.
#include "core/model/logging.h"

#include <QString>

#include <catch2/catch.hpp>

#include <vector>

using namespace fourfold;

namespace {

struct Logged {
    QtMsgType type;
    QString category;
    QString text;
};

std::vector<Logged> captured;

void capture(QtMsgType type, const QMessageLogContext &context, const QString &text)
{
    captured.push_back({type, QString::fromLatin1(context.category), text});
}

// Installs the capturing handler for the lifetime of the object.
struct Capture {
    QtMessageHandler previous;
    Capture()
        : previous(qInstallMessageHandler(capture))
    {
        captured.clear();
    }
    ~Capture() { qInstallMessageHandler(previous); }
};

} // namespace

TEST_CASE("a soft assertion that holds says nothing and one that fails logs and lets go on")
{
    Capture c;
    const int length = 10;
    CHECK(FOURFOLD_SOFT_ASSERT(lcStore(), length > 5));
    CHECK(captured.empty());
    CHECK_FALSE(FOURFOLD_SOFT_ASSERT(lcStore(), length > 50));
    REQUIRE(captured.size() == 1);
    CHECK(captured[0].type == QtCriticalMsg);
    CHECK(captured[0].category == QStringLiteral("fourfold.store"));
    CHECK(captured[0].text.startsWith(QStringLiteral("soft assertion failed: length > 50 (")));
    CHECK(captured[0].text.contains(QStringLiteral("logging_test.cpp:")));
}

TEST_CASE("an error is logged with its code and raw cause in its folder's category")
{
    Capture c;
    Error e;
    e.code = ErrorCode::Busy;
    e.message = QStringLiteral("The project file could not be updated.");
    e.cause = QStringLiteral("database is locked");
    logError(lcDesktop(), e);
    REQUIRE(captured.size() == 1);
    CHECK(captured[0].type == QtWarningMsg);
    CHECK(captured[0].category == QStringLiteral("fourfold.desktop"));
    CHECK(captured[0].text.contains(QStringLiteral("busy")));
    CHECK(captured[0].text.contains(QStringLiteral("The project file could not be updated.")));
    CHECK(captured[0].text.contains(QStringLiteral("cause: database is locked")));
    // Categories are per folder and can be switched off by the usual rules.
    CHECK(
        QString::fromLatin1(lcAgreement().categoryName()) == QStringLiteral("fourfold.agreement"));
    CHECK_FALSE(lcExchange().isDebugEnabled());
}
