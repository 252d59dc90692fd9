#include "app/desktop/codebook_panel.h"

#include "app/desktop/function_style.h"

#include <QEvent>
#include <QLocale>
#include <QTabBar>
#include <QTextBrowser>
#include <QTextDocument>
#include <QVBoxLayout>

#include <cmath>

namespace fourfold {

namespace {

QString levelName(MeasurementLevel level)
{
    switch (level) {
    case MeasurementLevel::Nominal:
        return CodebookPanel::tr("nominal");
    case MeasurementLevel::Ordinal:
        return CodebookPanel::tr("ordinal");
    case MeasurementLevel::Interval:
        return CodebookPanel::tr("interval");
    case MeasurementLevel::Ratio:
        return CodebookPanel::tr("ratio");
    }
    return {};
}

// Secondary text: the text colour two thirds of the way from the page colour, readable on light
// and dark palettes alike (the palette's placeholder colour may be translucent, which rich text
// cannot use).
QString mutedColour(const QPalette &palette)
{
    const QColor text = palette.color(QPalette::Text);
    const QColor base = palette.color(QPalette::Base);
    auto mix = [](float a, float b) { return 0.34f * b + 0.66f * a; };
    return QColor::fromRgbF(mix(text.redF(), base.redF()), mix(text.greenF(), base.greenF()),
        mix(text.blueF(), base.blueF()))
        .name();
}

QString esc(const QString &s)
{
    return s.toHtmlEscaped();
}

} // namespace

CodebookPanel::CodebookPanel(QWidget *parent)
    : QWidget(parent)
{
    setAccessibleName(tr("Codebook"));
    m_tabs = new QTabBar(this);
    m_tabs->setAccessibleName(tr("Framing function"));
    m_tabs->setExpanding(false);
    m_tabs->setDrawBase(false);
    for (FramingFunction f : kFramingFunctions)
        m_tabs->addTab(functionName(f));
    m_text = new QTextBrowser(this);
    m_text->setAccessibleName(tr("Codebook entry"));
    m_text->setOpenLinks(false);
    m_text->setFrameShape(QFrame::NoFrame);
    m_text->document()->setDocumentMargin(fontMetrics().height() * 0.6);
    auto *layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(0);
    layout->addWidget(m_tabs);
    layout->addWidget(m_text, 1);
    connect(m_tabs, &QTabBar::currentChanged, this, [this](int index) {
        if (index >= 0)
            showFunction(kFramingFunctions[size_t(index)]);
    });
    render();
}

void CodebookPanel::setCodebook(const Codebook &codebook)
{
    m_codebook = codebook;
    m_hasCodebook = codebook.functions.size() == kFramingFunctions.size();
    render();
}

void CodebookPanel::showFunction(FramingFunction function)
{
    const bool changed = function != m_function;
    m_function = function;
    m_tabs->setCurrentIndex(int(function));
    if (changed)
        render();
}

void CodebookPanel::changeEvent(QEvent *event)
{
    QWidget::changeEvent(event);
    if (event->type() == QEvent::PaletteChange || event->type() == QEvent::ApplicationPaletteChange)
        render();
}

void CodebookPanel::render()
{
    if (!m_hasCodebook) {
        m_text->setHtml(QStringLiteral("<p><i>%1</i></p>").arg(esc(tr("No codebook loaded."))));
        return;
    }
    const FunctionDefinition &def = m_codebook.definition(m_function);
    const FunctionStyle style = functionStyle(m_function);
    const QString muted = mutedColour(m_text->palette());

    QString html = QStringLiteral("<p style='margin-bottom:2px'><span style='background-color:%1; "
                                  "color:%2; font-weight:bold'>&nbsp;%3&nbsp;</span>&nbsp; "
                                  "<span style='font-size:large; font-weight:bold'>%4</span></p>")
                       .arg(style.colour.name(), badgeTextColour(style.colour).name(),
                           esc(QString(style.letter)), esc(def.label));
    html += QStringLiteral("<p style='color:%1; margin-top:0'>%2</p>")
                .arg(muted, esc(tr("%1, version %2").arg(m_codebook.name).arg(m_codebook.number)));
    html += QStringLiteral("<p>%1</p>").arg(esc(def.definition));

    auto heading = [](const QString &title) {
        return QStringLiteral("<h4 style='margin-top:12px; margin-bottom:4px'>%1</h4>")
            .arg(esc(title));
    };
    if (!def.rules.isEmpty()) {
        html += heading(tr("Decision rules"));
        html += QStringLiteral("<ol style='-qt-list-indent:1'>");
        for (const QString &rule : def.rules)
            html += QStringLiteral("<li style='margin-bottom:4px'>%1</li>").arg(esc(rule));
        html += QStringLiteral("</ol>");
    }
    if (!def.examples.isEmpty()) {
        html += heading(tr("Examples"));
        for (const QString &example : def.examples)
            html += QStringLiteral("<p style='margin-left:12px'><i>%1</i></p>")
                        .arg(esc(QLocale().quoteString(example)));
    }
    html += heading(tr("Attributes"));
    if (def.attributes.empty()) {
        html += QStringLiteral("<p style='color:%1'>%2</p>")
                    .arg(muted, esc(tr("None: marking the span is all this function asks for.")));
    } else {
        html += QStringLiteral("<ul style='-qt-list-indent:1'>");
        for (const AttributeSpec &a : def.attributes) {
            const QString kind = a.type == AttributeSpec::Type::Text
                ? tr("free text")
                : tr("%1 (%2)").arg(a.values.join(QStringLiteral(" · ")), levelName(a.level));
            html += QStringLiteral("<li><b>%1</b>: %2</li>").arg(esc(a.label), esc(kind));
        }
        html += QStringLiteral("</ul>");
    }
    m_text->setHtml(html);
}

} // namespace fourfold
