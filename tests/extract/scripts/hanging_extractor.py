#!/usr/bin/python3
"""An external extractor that reads its input and then never answers."""
import sys
import time

sys.stdin.read()
print("thinking...", file=sys.stderr, flush=True)
while True:
    time.sleep(60)
