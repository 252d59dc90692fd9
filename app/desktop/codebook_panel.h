#pragma once
// The codebook at the coder's elbow: the definition, decision rules, examples and attributes of
// one framing function at a time. The desk shows the function in focus (that of the selected
// span or the one about to be applied); the coder can also switch to any other function.

#include "core/model/codebook.h"

#include <QWidget>

class QTabBar;
class QTextBrowser;

namespace fourfold {

class CodebookPanel : public QWidget
{
    Q_OBJECT
public:
    explicit CodebookPanel(QWidget *parent = nullptr);

    // Shows `codebook`, staying on the function in focus.
    void setCodebook(const Codebook &codebook);
    // Shows the definition, rules and examples of `function`.
    void showFunction(FramingFunction function);
    // The function shown.
    FramingFunction function() const { return m_function; }

protected:
    // Renders again when the palette changes (light ⇄ dark), since the page takes its colours
    // from the palette.
    void changeEvent(QEvent *event) override;

private:
    void render();

    Codebook m_codebook;
    bool m_hasCodebook = false;
    FramingFunction m_function = FramingFunction::Problem;
    QTabBar *m_tabs = nullptr;
    QTextBrowser *m_text = nullptr;
};

} // namespace fourfold
