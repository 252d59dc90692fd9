#!/usr/bin/python3
"""A slow but healthy external extractor: it thinks argv[1] seconds before each answer (no
spans), so a run takes longer than the idle timeout in total but never goes silent for that
long."""
import json
import sys
import time

pause = float(sys.argv[1])
for line in sys.stdin:
    article = json.loads(line)
    for _ in range(3):
        time.sleep(pause / 3)
        print("working", file=sys.stderr, flush=True)
    print(json.dumps({"id": article["id"], "spans": []}), flush=True)
