#pragma once
// Asks a lead for a gold span's function, boundaries and attributes, starting from a coder's span
// or merged spans. The boundaries are chosen by selecting on the article's text — snapped to whole
// words as on the desk, exactly with "Exact selection" — and can be set to the code point with
// the start and end fields; the text the span would take is shown under them.

#include "core/model/annotation.h"
#include "core/model/article.h"
#include "core/model/codebook.h"
#include "core/text/segmenter.h"

#include <QDialog>

#include <utility>
#include <vector>

class QCheckBox;
class QComboBox;
class QFormLayout;
class QLabel;
class QPlainTextEdit;
class QSpinBox;

namespace fourfold {

class OffsetMap;

class GoldSpanDialog : public QDialog
{
    Q_OBJECT
public:
    // `codebook` gives the attribute fields of each function; an empty codebook offers none and
    // keeps the starting attributes.
    GoldSpanDialog(const Article &article, const AnnotationContent &initial,
        const Codebook &codebook = {}, QWidget *parent = nullptr);
    ~GoldSpanDialog() override;

    // The content as edited: function, range and attributes (a function's own fields; another
    // function starts with none set).
    AnnotationContent content() const;

    // For tests: selects `utf16Start`..`utf16End` on the text as a mouse would.
    void selectOnText(int utf16Start, int utf16End);
    void setExact(bool exact);

private:
    void updatePreview();
    void takeTextSelection();
    void buildAttributeFields(FramingFunction function, const QJsonObject &values);
    QJsonObject attributesFromFields() const;

    const Article &m_article;
    AnnotationContent m_content;
    Codebook m_codebook;
    Segmentation m_segmentation;
    std::unique_ptr<OffsetMap> m_offsets;
    bool m_settingRange = false;
    QComboBox *m_function = nullptr;
    QPlainTextEdit *m_text = nullptr;
    QCheckBox *m_exact = nullptr;
    QSpinBox *m_start = nullptr;
    QSpinBox *m_end = nullptr;
    QLabel *m_preview = nullptr;
    QFormLayout *m_attributeForm = nullptr;
    std::vector<std::pair<AttributeSpec, QWidget *>> m_attributeFields;
};

} // namespace fourfold
