#pragma once
// How the four framing functions look everywhere in the window. Colour is never the only cue:
// each function also has its own letter badge and its own line pattern, and spans of different
// functions are drawn in separate lanes under the text, so overlaps stay readable.

#include "core/model/framing_function.h"

#include <QColor>
#include <QString>

namespace fourfold {

struct FunctionStyle {
    QColor colour; // Okabe & Ito (2008) colour-blind-safe palette
    QChar letter; // badge: P, C, E, R
    Qt::PenStyle line; // the lane's line pattern
    int lane = 0; // 0..3, top to bottom under a line of text
};

FunctionStyle functionStyle(FramingFunction f);
// The translated name for menus and panels ("Problem", "Cause", "Evaluation", "Remedy").
QString functionName(FramingFunction f);
// The key that applies the function: 1..4.
int functionShortcutKey(FramingFunction f);
// Black or white, whichever contrasts more with `background` (for the badge letter).
QColor badgeTextColour(const QColor &background);

} // namespace fourfold
