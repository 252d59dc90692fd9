#!/usr/bin/python3
"""A well-behaved external extractor for the tests: per article, the first sentence is the
problem and every sentence holding the word "must" is the remedy (score 0.9, an attribute).
Offsets are code points, so Python's str slicing is used as is."""
import json
import sys

for line in sys.stdin:
    article = json.loads(line)
    text = article["text"]
    spans = []
    if article["sentences"]:
        start, end = article["sentences"][0]
        spans.append({"function": "problem", "start": start, "end": end})
    for start, end in article["sentences"]:
        if "must" in text[start:end].split():
            spans.append({"function": "remedy", "start": start, "end": end, "score": 0.9,
                          "attributes": {"quote": text[start:end]}})
    print(json.dumps({"id": article["id"], "spans": spans}))
