#pragma once
// Edits the selected span: its framing function, the attributes the codebook asks for with that
// function, a note, the coder's confidence, and links from an evaluation to the cause it judges
// or from a remedy to the problem it addresses. Each change goes to the coding session as one
// undoable edit: choices at once, text when its field is left (not per keystroke), and a
// confidence once it has stopped changing.

#include "core/model/annotation.h"
#include "core/model/codebook.h"

#include <QHash>
#include <QStringList>
#include <QWidget>

#include <optional>
#include <vector>

class QButtonGroup;
class QComboBox;
class QDoubleSpinBox;
class QFormLayout;
class QLabel;
class QListWidget;
class QMenu;
class QPlainTextEdit;
class QPushButton;
class QStackedWidget;
class QTimer;

namespace fourfold {

class CodingSession;

class SpanEditor : public QWidget
{
    Q_OBJECT
public:
    // With a session, the editor follows the session's codebook, sends every edit to
    // session->changeSpan() / linkSpans() / unlinkSpans(), and shows other coders' spans
    // read-only. Without one (nullptr) it only emits contentEdited(), linkRequested() and
    // unlinkRequested().
    explicit SpanEditor(CodingSession *session, QWidget *parent = nullptr);
    // Drops an edit still in progress: call commitPendingEdits() first to keep it.
    ~SpanEditor() override;

    // The schema of the attribute fields. Called with the session's codebook on construction.
    void setCodebook(const Codebook &codebook);
    // Shows `span` for editing, or a hint when there is none. `articleSpans` are the spans
    // visible on the desk for the span's article (link targets; the span itself may be among
    // them); `links` are the article's links, of which those from or to the span are listed.
    // An edit still in progress on the previous span is committed first.
    void setSpan(const std::optional<Annotation> &span, const std::vector<Annotation> &articleSpans,
        const std::vector<AnnotationLink> &links);
    // Commits an edit still in progress (a note being typed, a confidence being stepped) now;
    // call it before undo or before the window closes.
    void commitPendingEdits();
    // The span being edited, with the edits made so far, or nothing.
    std::optional<Annotation> span() const { return m_span; }

    // Adds "Remove link …" to `menu` for each link of the span shown (none for another coder's
    // span), each asking as the Remove link button does: the desk's context menu offers them.
    void addLinkActions(QMenu *menu);

    // The link type an evaluation ("judges") or a remedy ("addresses") starts; empty for others.
    static QString linkTypeFrom(FramingFunction function);

signals:
    // The user changed span `id`; `content` is its full new content.
    void contentEdited(AnnotationId id, const AnnotationContent &content);
    // The user asked to link span `source` to span `target` with a link of `type`.
    void linkRequested(AnnotationId source, AnnotationId target, const QString &type);
    // The user asked to remove link `id` of the span.
    void unlinkRequested(LinkId id);

protected:
    bool eventFilter(QObject *watched, QEvent *event) override;

private:
    QWidget *makeEditorPage();
    void buildAttributeFields(FramingFunction function, const QJsonObject &values);
    void loadSpan();
    void loadLinks();
    void chooseFunction(FramingFunction function);
    void commit();
    void revertToStored();
    AnnotationContent contentFromFields() const;
    bool isReadOnly() const;
    std::vector<AttributeSpec> schema(FramingFunction function) const;

    CodingSession *m_session = nullptr;
    Codebook m_codebook;
    std::optional<Annotation> m_span; // as edited here
    std::optional<Annotation> m_stored; // as last given by setSpan()
    std::vector<Annotation> m_articleSpans;
    std::vector<AnnotationLink> m_links;
    bool m_loading = false;

    QStackedWidget *m_pages = nullptr;
    QLabel *m_quote = nullptr;
    QLabel *m_readOnly = nullptr;
    QButtonGroup *m_function = nullptr;
    QWidget *m_attributeBox = nullptr;
    QFormLayout *m_form = nullptr;
    std::vector<std::pair<AttributeSpec, QWidget *>> m_attributeFields;
    // What a free-text attribute field offers to complete (e.g. actor names already used, so
    // that one actor keeps one spelling), read once per key per session.
    QStringList completionsFor(const QString &key);
    QHash<QString, QStringList> m_completions;
    FramingFunction m_attributeFunction = FramingFunction::Problem;
    bool m_attributesBuilt = false;
    QPlainTextEdit *m_note = nullptr;
    QDoubleSpinBox *m_confidence = nullptr;
    QTimer *m_confidenceSettle = nullptr;
    QLabel *m_linkHint = nullptr;
    QLabel *m_linkLabel = nullptr;
    QComboBox *m_linkTarget = nullptr;
    QPushButton *m_linkButton = nullptr;
    QListWidget *m_linkList = nullptr;
    QPushButton *m_unlinkButton = nullptr;
    QLabel *m_noLinks = nullptr;
};

} // namespace fourfold
