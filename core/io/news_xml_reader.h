#pragma once
// The news industry's XML for readArticles: IPTC NITF 3.x documents and NewsML-G2 news items
// (a newsItem, or the newsItems of a newsMessage); the rules are described in article_reader.h.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QString>

struct _xmlNode;

namespace fourfold {

// Whether `root` is a news item's root element: NITF's <nitf> (no namespace or an IPTC NITF
// namespace) or NewsML-G2's <newsItem> or <newsMessage>.
bool isNewsXmlRoot(const _xmlNode *root);

// Hands the article of a NITF document or NewsML-G2 newsItem, or each newsItem of a
// newsMessage, under `root` (parsed from `file`) to `take`. Fails with InvalidInput naming `file`
// and the line of the element at fault: a NITF document without <body.content>, a newsItem
// without guid or without text held inline (remote content is not fetched), inline content of a
// type Fourfold cannot read, a newsMessage holding no newsItem or an item of another kind. A
// failure of `take` is returned as it is.
Status readNewsXmlArticles(_xmlNode *root, const QString &file, const ImportedArticleSink &take);

} // namespace fourfold
