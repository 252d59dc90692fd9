#!/usr/bin/python3
"""An external extractor that answers the first article, then fails with exit code 3."""
import json
import sys

article = json.loads(sys.stdin.readline())
print(json.dumps({"id": article["id"], "spans": []}), flush=True)
print("model file weights.bin not found", file=sys.stderr)
sys.exit(3)
