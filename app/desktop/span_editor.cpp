#include "app/desktop/span_editor.h"

#include "app/desktop/coding_session.h"
#include "app/desktop/function_style.h"
#include "app/desktop/span_quote.h"

#include <QButtonGroup>
#include <QComboBox>
#include <QCompleter>
#include <QDoubleSpinBox>
#include <QEvent>
#include <QFormLayout>
#include <QGridLayout>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QLocale>
#include <QMenu>
#include <QPainter>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QRadioButton>
#include <QScrollArea>
#include <QStackedWidget>
#include <QTimer>
#include <QVBoxLayout>

#include <algorithm>
#include <cmath>

namespace fourfold {

namespace {

const QString kJudges = QStringLiteral("judges");
// The property naming the attribute whose used values a free-text field completes.
constexpr const char *kCompletionKey = "fourfoldCompletionKey";
const QString kAddresses = QStringLiteral("addresses");
// The spin box's value below 0 that stands for "not set".
constexpr double kNotSet = -0.1;
// Stepping through confidences with the arrow keys commits once, this long after the last step.
constexpr int kSettleMs = 700;
constexpr int kQuoteChars = 90;

// The function's letter on its colour, drawn for 1×, 2× and 3× screens.
QIcon badgeIcon(FramingFunction function)
{
    const FunctionStyle style = functionStyle(function);
    QIcon icon;
    for (int scale : {1, 2, 3}) {
        const int side = 16 * scale;
        QPixmap pixmap(side, side);
        pixmap.fill(Qt::transparent);
        QPainter p(&pixmap);
        p.setRenderHint(QPainter::Antialiasing);
        p.setPen(Qt::NoPen);
        p.setBrush(style.colour);
        p.drawRoundedRect(QRectF(0, 0, side, side), 3.0 * scale, 3.0 * scale);
        QFont font;
        font.setBold(true);
        font.setPixelSize(11 * scale);
        p.setFont(font);
        p.setPen(badgeTextColour(style.colour));
        p.drawText(QRect(0, 0, side, side), Qt::AlignCenter, QString(style.letter));
        p.end();
        icon.addPixmap(pixmap);
    }
    return icon;
}

// A quote on one line, cut to a readable length without splitting a surrogate pair.
QString shortQuote(const QString &quote)
{
    QString s = quote.simplified();
    if (s.size() > kQuoteChars) {
        qsizetype cut = kQuoteChars - 1;
        if (s.at(cut - 1).isHighSurrogate())
            --cut;
        s = s.left(cut) + QChar(0x2026);
    }
    return spanQuote(s);
}

bool sameContent(const AnnotationContent &a, const AnnotationContent &b)
{
    return a.function == b.function && a.range == b.range && a.attributes == b.attributes
        && a.note == b.note && a.confidence == b.confidence;
}

QString linkPhrase(const QString &type, bool outgoing)
{
    if (type == kJudges)
        return outgoing ? SpanEditor::tr("judges") : SpanEditor::tr("judged by");
    if (type == kAddresses)
        return outgoing ? SpanEditor::tr("addresses") : SpanEditor::tr("addressed by");
    return outgoing ? SpanEditor::tr("%1 →").arg(type) : SpanEditor::tr("← %1").arg(type);
}

} // namespace

SpanEditor::SpanEditor(CodingSession *session, QWidget *parent)
    : QWidget(parent)
    , m_session(session)
{
    setAccessibleName(tr("Span editor"));
    m_confidenceSettle = new QTimer(this);
    m_confidenceSettle->setSingleShot(true);
    m_confidenceSettle->setInterval(kSettleMs);
    connect(m_confidenceSettle, &QTimer::timeout, this, &SpanEditor::commit);

    auto *hint = new QLabel(tr("No span selected.\n\nClick a span in the text or on the frame "
                               "card to edit it, or select text and press 1–4 to code it."),
        this);
    hint->setWordWrap(true);
    hint->setAlignment(Qt::AlignCenter);
    hint->setForegroundRole(QPalette::PlaceholderText);
    hint->setMargin(fontMetrics().height());

    auto *scroll = new QScrollArea(this);
    scroll->setWidget(makeEditorPage());
    scroll->setWidgetResizable(true);
    scroll->setFrameShape(QFrame::NoFrame);
    scroll->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);

    m_pages = new QStackedWidget(this);
    m_pages->addWidget(hint);
    m_pages->addWidget(scroll);
    auto *layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(m_pages);

    if (m_session) {
        connect(this, &SpanEditor::contentEdited, this,
            [this](AnnotationId id, const AnnotationContent &content) {
                // On failure the session reports the error; the fields go back to what the
                // project holds.
                if (m_session->changeSpan(id, content)) {
                    if (m_stored && m_stored->id == id)
                        m_stored->content = content;
                } else {
                    revertToStored();
                }
            });
        connect(this, &SpanEditor::linkRequested, this,
            [this](AnnotationId source, AnnotationId target, const QString &type) {
                m_session->linkSpans(source, target, type);
            });
        connect(this, &SpanEditor::unlinkRequested, this, [this](LinkId id) {
            if (m_span)
                m_session->unlinkSpans(id, m_span->article);
        });
        setCodebook(m_session->codebook());
    }
    setSpan(std::nullopt, {}, {});
}

SpanEditor::~SpanEditor()
{
    // A focused field reports "editing finished" as it goes; the fields go while this is still a
    // SpanEditor, and nothing is committed any more.
    m_loading = true;
    delete m_pages;
}

QWidget *SpanEditor::makeEditorPage()
{
    auto *page = new QWidget;
    auto *column = new QVBoxLayout(page);

    m_quote = new QLabel(page);
    m_quote->setWordWrap(true);
    m_quote->setTextInteractionFlags(Qt::TextSelectableByMouse);
    QFont italic = m_quote->font();
    italic.setItalic(true);
    m_quote->setFont(italic);
    column->addWidget(m_quote);
    m_readOnly = new QLabel(tr("Another coder's span: shown, not editable."), page);
    m_readOnly->setWordWrap(true);
    m_readOnly->setForegroundRole(QPalette::PlaceholderText);
    column->addWidget(m_readOnly);

    m_form = new QFormLayout;
    m_form->setRowWrapPolicy(QFormLayout::WrapAllRows);
    m_form->setFieldGrowthPolicy(QFormLayout::AllNonFixedFieldsGrow);
    column->addLayout(m_form);

    auto *functions = new QWidget(page);
    auto *grid = new QGridLayout(functions);
    grid->setContentsMargins(0, 0, 0, 0);
    m_function = new QButtonGroup(this);
    for (FramingFunction f : kFramingFunctions) {
        auto *button = new QRadioButton(functionName(f), functions);
        button->setIcon(badgeIcon(f));
        button->setAccessibleName(tr("Function: %1").arg(functionName(f)));
        m_function->addButton(button, int(f));
        grid->addWidget(button, int(f) / 2, int(f) % 2);
    }
    auto *functionLabel = new QLabel(tr("&Function:"), page);
    functionLabel->setBuddy(m_function->button(0));
    m_form->addRow(functionLabel, functions);
    connect(m_function, &QButtonGroup::idClicked, this,
        [this](int id) { chooseFunction(FramingFunction(id)); });

    m_note = new QPlainTextEdit(page);
    m_note->setAccessibleName(tr("Note"));
    m_note->setTabChangesFocus(true);
    m_note->setFixedHeight(fontMetrics().lineSpacing() * 4 + 2 * m_note->frameWidth() + 8);
    m_note->installEventFilter(this);
    auto *noteLabel = new QLabel(tr("&Note:"), page);
    noteLabel->setBuddy(m_note);
    m_form->addRow(noteLabel, m_note);

    m_confidence = new QDoubleSpinBox(page);
    m_confidence->setAccessibleName(tr("Confidence"));
    m_confidence->setRange(kNotSet, 1.0);
    m_confidence->setSingleStep(0.1);
    m_confidence->setDecimals(2);
    m_confidence->setSpecialValueText(tr("not set"));
    m_confidence->setKeyboardTracking(false);
    m_confidence->setSizePolicy(QSizePolicy::Fixed, QSizePolicy::Fixed);
    m_confidence->setToolTip(tr("How sure you are of this span, from 0 (a guess) to 1 (certain)."));
    auto *confidenceLabel = new QLabel(tr("&Confidence:"), page);
    confidenceLabel->setBuddy(m_confidence);
    m_form->addRow(confidenceLabel, m_confidence);
    connect(m_confidence, &QDoubleSpinBox::valueChanged, this, [this] {
        if (!m_loading)
            m_confidenceSettle->start();
    });
    connect(m_confidence, &QDoubleSpinBox::editingFinished, this, &SpanEditor::commitPendingEdits);

    auto *links = new QGroupBox(tr("Links"), page);
    auto *linkColumn = new QVBoxLayout(links);
    m_linkHint = new QLabel(tr("Links start from an evaluation (to the cause it judges) or from a "
                               "remedy (to the problem it addresses)."),
        links);
    m_linkHint->setWordWrap(true);
    m_linkHint->setForegroundRole(QPalette::PlaceholderText);
    linkColumn->addWidget(m_linkHint);
    auto *linkRow = new QHBoxLayout;
    m_linkLabel = new QLabel(links);
    m_linkLabel->setSizePolicy(QSizePolicy::Fixed, QSizePolicy::Preferred);
    m_linkTarget = new QComboBox(links);
    m_linkTarget->setAccessibleName(tr("Span to link to"));
    m_linkTarget->setSizeAdjustPolicy(QComboBox::AdjustToMinimumContentsLengthWithIcon);
    m_linkTarget->setMinimumContentsLength(8);
    m_linkLabel->setBuddy(m_linkTarget);
    m_linkButton = new QPushButton(tr("&Link"), links);
    m_linkButton->setAccessibleName(tr("Link to the chosen span"));
    linkRow->addWidget(m_linkLabel);
    linkRow->addWidget(m_linkTarget, 1);
    linkRow->addWidget(m_linkButton);
    linkColumn->addLayout(linkRow);
    connect(m_linkButton, &QPushButton::clicked, this, [this] {
        const AnnotationId target {m_linkTarget->currentData().toLongLong()};
        const QString type = m_span ? linkTypeFrom(m_span->content.function) : QString();
        if (m_span && target.isValid() && !type.isEmpty() && !isReadOnly())
            emit linkRequested(m_span->id, target, type);
    });
    m_linkList = new QListWidget(links);
    m_linkList->setAccessibleName(tr("Links of this span"));
    m_linkList->setTextElideMode(Qt::ElideRight);
    m_linkList->setWordWrap(false);
    m_linkList->setSelectionMode(QAbstractItemView::SingleSelection);
    m_linkList->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    m_linkList->setIconSize(QSize(16, 16));
    m_linkList->setUniformItemSizes(true);
    linkColumn->addWidget(m_linkList);
    m_noLinks = new QLabel(tr("No links yet."), links);
    m_noLinks->setForegroundRole(QPalette::PlaceholderText);
    linkColumn->addWidget(m_noLinks);
    m_unlinkButton = new QPushButton(tr("&Remove link"), links);
    m_unlinkButton->setAccessibleName(tr("Remove the chosen link"));
    m_unlinkButton->setEnabled(false);
    auto *unlinkRow = new QHBoxLayout;
    unlinkRow->addStretch(1);
    unlinkRow->addWidget(m_unlinkButton);
    linkColumn->addLayout(unlinkRow);
    connect(m_linkList, &QListWidget::itemSelectionChanged, this, [this] {
        m_unlinkButton->setEnabled(!m_linkList->selectedItems().isEmpty() && !isReadOnly());
    });
    connect(m_unlinkButton, &QPushButton::clicked, this, [this] {
        const QList<QListWidgetItem *> chosen = m_linkList->selectedItems();
        if (!chosen.isEmpty() && !isReadOnly())
            emit unlinkRequested(LinkId {chosen.front()->data(Qt::UserRole).toLongLong()});
    });
    m_linkList->setContextMenuPolicy(Qt::CustomContextMenu);
    connect(m_linkList, &QWidget::customContextMenuRequested, this, [this](const QPoint &pos) {
        QListWidgetItem *item = m_linkList->itemAt(pos);
        if (!item || isReadOnly())
            return;
        const LinkId id {item->data(Qt::UserRole).toLongLong()};
        QMenu menu(this);
        menu.addAction(tr("&Remove link"), this, [this, id] { emit unlinkRequested(id); });
        menu.exec(m_linkList->viewport()->mapToGlobal(pos));
    });
    column->addWidget(links);
    column->addStretch(1);
    return page;
}

void SpanEditor::addLinkActions(QMenu *menu)
{
    if (!m_span || isReadOnly())
        return;
    for (int i = 0; i < m_linkList->count(); ++i) {
        const QListWidgetItem *item = m_linkList->item(i);
        const LinkId id {item->data(Qt::UserRole).toLongLong()};
        menu->addAction(item->icon(), tr("Remove link: %1").arg(item->text()), this,
            [this, id] { emit unlinkRequested(id); });
    }
}

QString SpanEditor::linkTypeFrom(FramingFunction function)
{
    if (function == FramingFunction::Evaluation)
        return kJudges;
    if (function == FramingFunction::Remedy)
        return kAddresses;
    return {};
}

void SpanEditor::setCodebook(const Codebook &codebook)
{
    m_codebook = codebook;
    m_attributesBuilt = false;
    if (m_span)
        loadSpan();
}

std::vector<AttributeSpec> SpanEditor::schema(FramingFunction function) const
{
    if (m_codebook.functions.size() != kFramingFunctions.size())
        return {};
    return m_codebook.definition(function).attributes;
}

void SpanEditor::setSpan(const std::optional<Annotation> &span,
    const std::vector<Annotation> &articleSpans, const std::vector<AnnotationLink> &links)
{
    commitPendingEdits();
    m_span = span;
    m_stored = span;
    m_articleSpans = articleSpans;
    m_links = links;
    m_pages->setCurrentIndex(m_span ? 1 : 0);
    m_pages->widget(1)->setEnabled(m_span.has_value());
    if (m_span)
        loadSpan();
}

void SpanEditor::commitPendingEdits()
{
    m_confidenceSettle->stop();
    commit();
}

bool SpanEditor::isReadOnly() const
{
    return m_session && m_span && m_span->coder != m_session->coder().id;
}

void SpanEditor::buildAttributeFields(FramingFunction function, const QJsonObject &values)
{
    // Fields are taken out and deleted later: this can run while a field is still emitting.
    for (auto &[spec, field] : m_attributeFields) {
        const QFormLayout::TakeRowResult row = m_form->takeRow(field);
        for (QLayoutItem *item : {row.labelItem, row.fieldItem}) {
            if (!item)
                continue;
            if (QWidget *w = item->widget()) {
                w->hide();
                w->deleteLater();
            }
            delete item;
        }
    }
    m_attributeFields.clear();

    int row = 1; // below the function
    // New fields would come last in the tab order; they go right after the function instead.
    QWidget *previous = m_function->button(int(FramingFunction::Remedy));
    for (const AttributeSpec &spec : schema(function)) {
        QWidget *field = nullptr;
        const QString value = values.value(spec.key).toString();
        if (spec.type == AttributeSpec::Type::Choice) {
            auto *choice = new QComboBox(m_form->parentWidget());
            choice->addItem(tr("not set"), QString());
            for (const QString &v : spec.values)
                choice->addItem(v, v);
            choice->setCurrentIndex(std::max(0, choice->findData(value)));
            connect(choice, &QComboBox::activated, this, &SpanEditor::commit);
            field = choice;
        } else {
            auto *text = new QLineEdit(value, m_form->parentWidget());
            text->setPlaceholderText(tr("not set"));
            text->setClearButtonEnabled(true);
            connect(text, &QLineEdit::editingFinished, this, &SpanEditor::commit);
            // Its completions are read when the field is first entered (eventFilter), not with
            // every span selected.
            text->setProperty(kCompletionKey, spec.key);
            text->installEventFilter(this);
            field = text;
        }
        field->setAccessibleName(spec.label);
        field->setEnabled(!isReadOnly());
        auto *label = new QLabel(tr("%1:").arg(spec.label), m_form->parentWidget());
        label->setBuddy(field);
        m_form->insertRow(row++, label, field);
        QWidget::setTabOrder(previous, field);
        previous = field;
        m_attributeFields.emplace_back(spec, field);
    }
    m_attributeFunction = function;
    m_attributesBuilt = true;
}

QStringList SpanEditor::completionsFor(const QString &key)
{
    if (!m_session)
        return {};
    if (auto known = m_completions.constFind(key); known != m_completions.constEnd())
        return *known;
    // A coder is offered only their own values; a lead every coder's and gold's.
    const Coder &me = m_session->coder();
    auto values = m_session->project().attributeValues(
        key, me.role == CoderRole::Lead ? std::nullopt : std::optional(me.id));
    m_completions.insert(key, values ? *values : QStringList());
    return m_completions.value(key);
}

void SpanEditor::loadSpan()
{
    m_loading = true;
    const Annotation &a = *m_span;
    const bool readOnly = isReadOnly();
    m_quote->setText(shortQuote(a.quote));
    m_quote->setToolTip(QStringLiteral("<p>%1</p>").arg(a.quote.toHtmlEscaped()));
    m_readOnly->setVisible(readOnly);
    for (QAbstractButton *b : m_function->buttons())
        b->setEnabled(!readOnly);
    m_function->button(int(a.content.function))->setChecked(true);

    if (!m_attributesBuilt || m_attributeFunction != a.content.function) {
        buildAttributeFields(a.content.function, a.content.attributes);
    } else {
        for (auto &[spec, field] : m_attributeFields) {
            const QString value = a.content.attributes.value(spec.key).toString();
            if (auto *choice = qobject_cast<QComboBox *>(field))
                choice->setCurrentIndex(std::max(0, choice->findData(value)));
            else if (auto *text = qobject_cast<QLineEdit *>(field); text && text->text() != value)
                text->setText(value);
            field->setEnabled(!readOnly);
        }
    }
    // Only a changed note is set again, so a refresh while the coder types keeps the cursor.
    if (m_note->toPlainText() != a.content.note)
        m_note->setPlainText(a.content.note);
    m_note->setReadOnly(readOnly);
    m_note->setPlaceholderText(
        readOnly ? tr("No note.") : tr("Why this span, doubts, a question for the lead…"));
    const double confidence = a.content.confidence.value_or(kNotSet);
    if (std::abs(m_confidence->value() - confidence) >= 0.005)
        m_confidence->setValue(confidence);
    m_confidence->setEnabled(!readOnly);
    loadLinks();
    m_loading = false;
}

void SpanEditor::loadLinks()
{
    const Annotation &a = *m_span;
    const QString type = linkTypeFrom(a.content.function);
    const bool canLink = !type.isEmpty();
    m_linkHint->setVisible(!canLink);
    m_linkLabel->setVisible(canLink);
    m_linkTarget->setVisible(canLink);
    m_linkButton->setVisible(canLink);
    m_linkLabel->setText(type == kJudges ? tr("&Judges:") : tr("&Addresses:"));
    m_linkTarget->setPlaceholderText(
        type == kJudges ? tr("no cause span to link") : tr("no problem span to link"));

    auto spanOf = [this](AnnotationId id) -> const Annotation * {
        for (const Annotation &s : m_articleSpans)
            if (s.id == id && !s.deleted)
                return &s;
        return nullptr;
    };
    std::vector<AnnotationId> linked;
    for (const AnnotationLink &l : m_links)
        if (!l.deleted && l.source == a.id && l.type == type)
            linked.push_back(l.target);

    // An evaluation judges a cause, a remedy addresses a problem: only spans of that function
    // are offered, in reading order.
    const FramingFunction targetFunction =
        type == kJudges ? FramingFunction::Cause : FramingFunction::Problem;
    std::vector<const Annotation *> targets;
    for (const Annotation &s : m_articleSpans)
        if (!s.deleted && s.id != a.id && s.content.function == targetFunction
            && std::ranges::find(linked, s.id) == linked.end())
            targets.push_back(&s);
    std::ranges::stable_sort(targets, [](const Annotation *x, const Annotation *y) {
        return x->content.range.start < y->content.range.start;
    });
    m_linkTarget->clear();
    for (const Annotation *s : targets) {
        m_linkTarget->addItem(badgeIcon(s->content.function), shortQuote(s->quote), s->id.value);
        const int i = m_linkTarget->count() - 1;
        m_linkTarget->setItemData(i,
            tr("%1: %2").arg(functionName(s->content.function), s->quote.simplified()),
            Qt::AccessibleTextRole);
        m_linkTarget->setItemData(
            i, QStringLiteral("<p>%1</p>").arg(s->quote.toHtmlEscaped()), Qt::ToolTipRole);
    }
    // With a placeholder text the combo proposes nothing by itself; the best target it should.
    m_linkTarget->setCurrentIndex(targets.empty() ? -1 : 0);
    m_linkTarget->setEnabled(!targets.empty() && !isReadOnly());
    m_linkButton->setEnabled(!targets.empty() && !isReadOnly());

    m_linkList->clear();
    for (const AnnotationLink &l : m_links) {
        if (l.deleted || (l.source != a.id && l.target != a.id))
            continue;
        const bool outgoing = l.source == a.id;
        const Annotation *other = spanOf(outgoing ? l.target : l.source);
        const QString what = other ? shortQuote(other->quote) : tr("a span not shown here");
        auto *item = new QListWidgetItem(tr("%1 %2").arg(linkPhrase(l.type, outgoing), what));
        if (other)
            item->setIcon(badgeIcon(other->content.function));
        item->setToolTip(
            other ? QStringLiteral("<p>%1</p>").arg(other->quote.toHtmlEscaped()) : QString());
        item->setData(Qt::UserRole, l.id.value);
        m_linkList->addItem(item);
    }
    const int rows = std::min(m_linkList->count(), 4);
    m_linkList->setVisible(rows > 0);
    m_noLinks->setVisible(rows == 0);
    m_unlinkButton->setVisible(rows > 0);
    m_unlinkButton->setEnabled(false);
    if (rows > 0)
        m_linkList->setFixedHeight(
            rows * m_linkList->sizeHintForRow(0) + 2 * m_linkList->frameWidth());
}

void SpanEditor::chooseFunction(FramingFunction function)
{
    if (m_loading || !m_span || isReadOnly() || function == m_attributeFunction)
        return;
    // Attributes the new function also declares (same key, allowed value) are kept; the schema
    // of another function would not validate.
    const QJsonObject current = contentFromFields().attributes;
    QJsonObject kept;
    for (const AttributeSpec &spec : schema(function)) {
        const QString value = current.value(spec.key).toString();
        if (!value.isEmpty()
            && (spec.type == AttributeSpec::Type::Text || spec.values.contains(value)))
            kept.insert(spec.key, value);
    }
    buildAttributeFields(function, kept);
    commit();
    loadLinks();
}

AnnotationContent SpanEditor::contentFromFields() const
{
    AnnotationContent c = m_span->content;
    if (m_function->checkedId() >= 0)
        c.function = FramingFunction(m_function->checkedId());
    c.attributes = {};
    for (const auto &[spec, field] : m_attributeFields) {
        QString value;
        if (auto *choice = qobject_cast<QComboBox *>(field))
            value = choice->currentData().toString();
        else if (auto *text = qobject_cast<QLineEdit *>(field))
            value = text->text().trimmed();
        if (!value.isEmpty())
            c.attributes.insert(spec.key, value);
    }
    c.note = m_note->toPlainText();
    const double v = m_confidence->value();
    // The spin box shows two decimals; a stored value it cannot show exactly is kept as it is.
    if (v < 0)
        c.confidence.reset();
    else if (!(m_span->content.confidence && std::abs(*m_span->content.confidence - v) < 0.005))
        c.confidence = v;
    return c;
}

void SpanEditor::commit()
{
    if (m_loading || !m_span || isReadOnly())
        return;
    m_confidenceSettle->stop();
    const AnnotationContent content = contentFromFields();
    if (sameContent(content, m_span->content))
        return;
    m_span->content = content;
    // A value typed now is offered from the next field on.
    for (const auto &[spec, field] : m_attributeFields) {
        const QString value = content.attributes.value(spec.key).toString().trimmed();
        if (auto known = m_completions.find(spec.key);
            known != m_completions.end() && !value.isEmpty() && !known->contains(value))
            known->append(value);
    }
    emit contentEdited(m_span->id, content);
}

void SpanEditor::revertToStored()
{
    if (m_stored && m_span && m_span->id == m_stored->id) {
        m_span = m_stored;
        loadSpan();
    }
}

bool SpanEditor::eventFilter(QObject *watched, QEvent *event)
{
    if (event->type() == QEvent::FocusIn)
        if (auto *text = qobject_cast<QLineEdit *>(watched);
            text && !text->completer() && text->property(kCompletionKey).isValid()) {
            auto *completer =
                new QCompleter(completionsFor(text->property(kCompletionKey).toString()), text);
            completer->setCaseSensitivity(Qt::CaseInsensitive);
            completer->setFilterMode(Qt::MatchContains);
            text->setCompleter(completer);
        }
    if (watched == m_note && event->type() == QEvent::FocusOut)
        commit();
    return QWidget::eventFilter(watched, event);
}

} // namespace fourfold
