#pragma once
// Before an import: the files or folder chosen, an optional pattern that cuts each text-like
// document (txt, docx, odt, pdf) into articles, and a preview of the cuts read from the files
// before anything is stored. A bad pattern is shown at the field and keeps Import disabled.

#include "core/io/article_reader.h"

#include <QDialog>
#include <QStringList>

#include <optional>

class QDialogButtonBox;
class QLabel;
class QLineEdit;
class QListWidget;

namespace fourfold {

class ImportOptionsDialog : public QDialog
{
    Q_OBJECT
public:
    // `paths`: the files chosen, or one folder.
    explicit ImportOptionsDialog(const QStringList &paths, QWidget *parent = nullptr);

    // The options chosen (the split pattern; everything else as by default).
    ImportOptions options() const;
    // Reads the text-like files (at most five; a folder's, found in its subfolders) with the
    // current pattern and lists each cut: "file #n: title · outlet · date (characters)".
    void preview();
    // Shows the dialog; the options when the person chooses Import, nothing when cancelled.
    static std::optional<ImportOptions> ask(const QStringList &paths, QWidget *parent);

    QLineEdit *patternField() const { return m_pattern; }
    QListWidget *previewList() const { return m_preview; }
    QLabel *problemLabel() const { return m_problem; }

private:
    void patternChanged();

    QStringList m_paths;
    QLineEdit *m_pattern = nullptr;
    QLabel *m_problem = nullptr;
    QListWidget *m_preview = nullptr;
    QDialogButtonBox *m_buttons = nullptr;
};

} // namespace fourfold
