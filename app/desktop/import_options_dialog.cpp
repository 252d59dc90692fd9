#include "app/desktop/import_options_dialog.h"

#include "core/io/document_split.h"

#include <QDialogButtonBox>
#include <QDirIterator>
#include <QFileInfo>
#include <QFormLayout>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QPushButton>
#include <QVBoxLayout>

namespace fourfold {

namespace {

bool textLike(const QString &path)
{
    const auto format = importFormatFromPath(path);
    return format
        && (*format == ImportFormat::Text || *format == ImportFormat::Docx
            || *format == ImportFormat::Odt || *format == ImportFormat::Pdf);
}

// The text-like files among `paths` (a folder's found in its subfolders), at most `most`.
QStringList textLikeFiles(const QStringList &paths, qsizetype most)
{
    QStringList out;
    for (const QString &path : paths) {
        if (QFileInfo(path).isDir()) {
            QStringList inFolder;
            QDirIterator it(path, QDir::Files, QDirIterator::Subdirectories);
            while (it.hasNext())
                if (const QString f = it.next(); textLike(f))
                    inFolder << f;
            inFolder.sort();
            out << inFolder;
        } else if (textLike(path)) {
            out << path;
        }
    }
    return out.mid(0, most);
}

} // namespace

ImportOptionsDialog::ImportOptionsDialog(const QStringList &paths, QWidget *parent)
    : QDialog(parent)
    , m_paths(paths)
{
    setWindowTitle(tr("Import articles"));
    auto *layout = new QVBoxLayout(this);
    auto *what =
        new QLabel(paths.size() == 1 ? tr("Import %1").arg(QFileInfo(paths.front()).fileName())
                                     : tr("Import %n files", nullptr, int(paths.size())),
            this);
    layout->addWidget(what);

    auto *form = new QFormLayout;
    m_pattern = new QLineEdit(this);
    m_pattern->setObjectName(QStringLiteral("split-pattern"));
    m_pattern->setPlaceholderText(tr("e.g. ^=+$ or ^Item \\d+"));
    m_pattern->setToolTip(
        tr("A regular expression. Each text, DOCX, ODT or PDF document is cut into articles at "
           "the lines where it is found. Named groups (?<title>…), (?<outlet>…) and (?<date>…) "
           "fill those fields; otherwise the first line of each part is its title. Leave empty "
           "for one article per document."));
    form->addRow(tr("Split each document at lines matching:"), m_pattern);
    layout->addLayout(form);
    m_problem = new QLabel(this);
    m_problem->setWordWrap(true);
    m_problem->setStyleSheet(QStringLiteral("color: #a40000"));
    m_problem->hide();
    layout->addWidget(m_problem);

    auto *previewButton = new QPushButton(tr("Preview the cuts"), this);
    previewButton->setObjectName(QStringLiteral("preview-cuts"));
    layout->addWidget(previewButton, 0, Qt::AlignLeft);
    m_preview = new QListWidget(this);
    m_preview->setAccessibleName(tr("Preview of the cuts"));
    layout->addWidget(m_preview);

    m_buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, this);
    m_buttons->button(QDialogButtonBox::Ok)->setText(tr("Import"));
    layout->addWidget(m_buttons);
    connect(m_buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(m_buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    connect(m_pattern, &QLineEdit::textChanged, this, &ImportOptionsDialog::patternChanged);
    connect(previewButton, &QPushButton::clicked, this, &ImportOptionsDialog::preview);
    resize(620, 380);
}

ImportOptions ImportOptionsDialog::options() const
{
    ImportOptions options;
    options.splitOn = m_pattern->text();
    return options;
}

void ImportOptionsDialog::patternChanged()
{
    m_preview->clear();
    QString problem;
    if (!m_pattern->text().isEmpty())
        if (auto compiled = compileSplitPattern(m_pattern->text()); !compiled)
            problem = compiled.error().message;
    m_problem->setText(problem);
    m_problem->setVisible(!problem.isEmpty());
    m_buttons->button(QDialogButtonBox::Ok)->setEnabled(problem.isEmpty());
}

void ImportOptionsDialog::preview()
{
    m_preview->clear();
    if (m_pattern->text().isEmpty()) {
        m_preview->addItem(tr("No pattern: each document is one article."));
        return;
    }
    const QStringList files = textLikeFiles(m_paths, 5);
    if (files.isEmpty()) {
        m_preview->addItem(tr("None of the chosen files is a text, DOCX, ODT or PDF document."));
        return;
    }
    for (const QString &file : files) {
        const QString name = QFileInfo(file).fileName();
        auto parts = readArticles(file, options());
        if (!parts) {
            m_preview->addItem(tr("%1: not cut — %2").arg(name, parts.error().message));
            continue;
        }
        for (const ImportedArticle &a : *parts) {
            QStringList fields {a.title.isEmpty() ? tr("(no title)") : a.title};
            if (!a.outlet.isEmpty())
                fields << a.outlet;
            if (!a.published.isEmpty())
                fields << a.published;
            m_preview->addItem(tr("%1 (line %2): %3 (%n characters)", nullptr, int(a.text.size()))
                                   .arg(a.externalId)
                                   .arg(a.sourceLine)
                                   .arg(fields.join(QStringLiteral(" · "))));
        }
    }
}

std::optional<ImportOptions> ImportOptionsDialog::ask(const QStringList &paths, QWidget *parent)
{
    ImportOptionsDialog dialog(paths, parent);
    if (dialog.exec() != QDialog::Accepted)
        return std::nullopt;
    return dialog.options();
}

} // namespace fourfold
