#pragma once
// Whose spans the desk shows while a lead shows every coder's: a legend of the coders with spans
// on the open article (pseudonym and number of spans, in the order of the pseudonyms) and a
// filter to one coder (all coders / C01 / C02 …). Hidden otherwise. People are named by pseudonym
// only; the filter goes to the coding session, which the views read.

#include "core/model/ids.h"

#include <QWidget>

class QComboBox;
class QLabel;

namespace fourfold {

class CodingSession;

class CoderLegend : public QWidget
{
    Q_OBJECT
public:
    explicit CoderLegend(QWidget *parent = nullptr);

    // The session whose open article the legend describes; null hides it.
    void setSession(CodingSession *session);
    // Reads the open article's spans again (after it changed or another was opened); shows the
    // legend while the session shows every coder's spans, else hides it.
    void refresh();

    // For tests: the filter (item data: the coder id, 0 for every coder) and the legend's text.
    QComboBox *filter() const { return m_filter; }
    QString legendText() const;

private:
    void fillFilter();

    CodingSession *m_session = nullptr;
    QLabel *m_legend = nullptr;
    QComboBox *m_filter = nullptr;
};

} // namespace fourfold
