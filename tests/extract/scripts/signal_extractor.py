#!/usr/bin/python3
"""An external extractor that kills itself with SIGKILL (a crash, not an exit code)."""
import os
import signal
import sys

sys.stdin.read()
os.kill(os.getpid(), signal.SIGKILL)
