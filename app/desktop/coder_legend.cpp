#include "app/desktop/coder_legend.h"

#include "app/desktop/coding_session.h"

#include <QComboBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QMap>

namespace fourfold {

CoderLegend::CoderLegend(QWidget *parent)
    : QWidget(parent)
{
    setAccessibleName(tr("Coders of the spans shown"));
    auto *row = new QHBoxLayout(this);
    row->setContentsMargins(0, 0, 0, 0);
    m_legend = new QLabel(this);
    m_legend->setTextFormat(Qt::RichText);
    m_legend->setWordWrap(true);
    m_legend->setToolTip(tr("Each span's badge carries its coder's pseudonym after the letter."));
    m_filter = new QComboBox(this);
    m_filter->setAccessibleName(tr("Show the spans of"));
    auto *label = new QLabel(tr("&Show spans of:"), this);
    label->setBuddy(m_filter);
    row->addWidget(m_legend, 1);
    row->addWidget(label);
    row->addWidget(m_filter);
    connect(m_filter, &QComboBox::activated, this, [this](int index) {
        if (m_session)
            m_session->setCoderFilter(CoderId {m_filter->itemData(index).toLongLong()});
    });
    hide();
}

void CoderLegend::setSession(CodingSession *session)
{
    m_session = session;
    fillFilter();
    refresh();
}

void CoderLegend::fillFilter()
{
    m_filter->clear();
    m_filter->addItem(tr("All coders"), qint64(0));
    if (!m_session)
        return;
    // By pseudonym (C01, C02, …), the order the coders are known by.
    QMap<QString, qint64> byPseudonym;
    const QHash<qint64, QString> &names = m_session->pseudonyms();
    for (auto it = names.begin(); it != names.end(); ++it)
        byPseudonym.insert(it.value(), it.key());
    for (auto it = byPseudonym.begin(); it != byPseudonym.end(); ++it)
        m_filter->addItem(it.key(), it.value());
}

void CoderLegend::refresh()
{
    const bool shown = m_session && m_session->showsAllCoders() && m_session->document().isOpen();
    setVisible(shown);
    if (!shown)
        return;
    if (m_filter->count() != m_session->pseudonyms().size() + 1)
        fillFilter(); // a person was added since
    const ArticleDocument &doc = m_session->document();
    QMap<QString, int> spansBy; // pseudonym → live spans on the article
    for (const Annotation &a : doc.unfilteredSpans())
        if (!a.deleted)
            ++spansBy[m_session->pseudonyms().value(a.coder.value, tr("unknown"))];
    QStringList parts;
    const CoderId only = m_session->coderFilter();
    const QString onlyName = m_session->pseudonyms().value(only.value);
    for (auto it = spansBy.begin(); it != spansBy.end(); ++it) {
        const int count = it.value();
        QString part = tr("<b>%1</b> %n span(s)", nullptr, count).arg(it.key().toHtmlEscaped());
        if (only.isValid() && it.key() != onlyName)
            part = QStringLiteral("<span style='color:palette(mid)'>%1</span>").arg(part);
        parts << part;
    }
    m_legend->setText(parts.isEmpty()
            ? tr("No coder has spans on this article.")
            : tr("Spans by: %1").arg(parts.join(QStringLiteral(" \u00B7 "))));
    const int index = m_filter->findData(only.isValid() ? only.value : qint64(0));
    m_filter->setCurrentIndex(std::max(index, 0));
}

QString CoderLegend::legendText() const
{
    return m_legend->text();
}

} // namespace fourfold
