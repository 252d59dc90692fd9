#pragma once
// The workbench window. For now a reader: the project's articles on the left, the selected
// article's canonical text with its paragraph roles on the right. The coding desk builds on it.

#include "core/project/project.h"

#include <QMainWindow>

#include <optional>

class QLabel;
class QTableView;
class QTextBrowser;

namespace fourfold {

class ArticleListModel;

class MainWindow : public QMainWindow
{
    Q_OBJECT
public:
    explicit MainWindow(QWidget *parent = nullptr);

    // Opens `path` and shows its articles. Returns the error to present if it cannot.
    Status openProject(const QString &path);

private:
    void showArticle(ArticleId id);
    void openDialog();

    std::optional<Project> m_project;
    ArticleListModel *m_articles = nullptr;
    QTableView *m_list = nullptr;
    QTextBrowser *m_reader = nullptr;
    QLabel *m_status = nullptr;
};

} // namespace fourfold
