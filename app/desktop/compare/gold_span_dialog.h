#pragma once
// Asks a lead for a gold span's function and boundaries (code points into the canonical text),
// starting from a coder's span or merged spans, and shows the text it would take.

#include "core/model/annotation.h"
#include "core/model/article.h"

#include <QDialog>

class QComboBox;
class QLabel;
class QSpinBox;

namespace fourfold {

class GoldSpanDialog : public QDialog
{
    Q_OBJECT
public:
    GoldSpanDialog(
        const Article &article, const AnnotationContent &initial, QWidget *parent = nullptr);

    // The content as edited: function and range; the attributes of the start are kept unless the
    // function was changed (they belong to the first function's schema).
    AnnotationContent content() const;

private:
    void updatePreview();

    const Article &m_article;
    AnnotationContent m_content;
    QComboBox *m_function = nullptr;
    QSpinBox *m_start = nullptr;
    QSpinBox *m_end = nullptr;
    QLabel *m_preview = nullptr;
};

} // namespace fourfold
