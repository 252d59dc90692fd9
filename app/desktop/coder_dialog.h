#pragma once
// "Who is coding?": picked when a project opens. A coder then sees only their own spans and
// their assigned articles; a lead sees everything.

#include "core/model/coder.h"

#include <QDialog>

#include <optional>
#include <vector>

class QListWidget;

namespace fourfold {

class Project;

class CoderDialog : public QDialog
{
    Q_OBJECT
public:
    // `project`, if given, lets the dialog add a person (name, pseudonym, role) to the project.
    CoderDialog(const QString &projectName, const std::vector<Coder> &coders,
        QWidget *parent = nullptr, Project *project = nullptr);
    std::optional<Coder> chosen() const;

private:
    void addPerson();
    std::vector<Coder> m_coders;
    Project *m_project = nullptr;
    QListWidget *m_list = nullptr;
};

} // namespace fourfold
