#pragma once
// RSS 2.0 and Atom 1.0 feeds for readArticles: one article per item or entry; the rules are
// described in article_reader.h.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QString>

struct _xmlNode;

namespace fourfold {

// Whether `root` is a feed's root element: <rss> (no namespace) or Atom's <feed>.
bool isFeedRoot(const _xmlNode *root);

// Hands each item (RSS) or entry (Atom) under `root`, a feed's root element parsed from `file`,
// to `take` as an article, in file order. Fails with InvalidInput naming `file` and the line of
// the element at fault: an RSS version other than 2.0, not exactly one channel, a feed without
// items or entries, an item without guid or link or an entry without id, an unknown RSS or Atom
// element, a date that cannot be read, content of a type or place Fourfold cannot read. A
// failure of `take` is returned as it is.
Status readFeedArticles(_xmlNode *root, const QString &file, const ImportedArticleSink &take);

} // namespace fourfold
