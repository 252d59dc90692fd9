#pragma once
// "Who is coding?": picked when a project opens. A coder then sees only their own spans and
// their assigned articles; a lead sees everything.

#include "core/model/coder.h"

#include <QDialog>

#include <optional>
#include <vector>

class QListWidget;

namespace fourfold {

class CoderDialog : public QDialog
{
    Q_OBJECT
public:
    CoderDialog(
        const QString &projectName, const std::vector<Coder> &coders, QWidget *parent = nullptr);
    std::optional<Coder> chosen() const;

private:
    std::vector<Coder> m_coders;
    QListWidget *m_list = nullptr;
};

} // namespace fourfold
