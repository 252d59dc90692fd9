#!/bin/sh
# An external extractor for the tests that writes too much. Each flood is bounded (8 MB), so that
# a limit that does not hold fails the test instead of filling the memory.
#   stdout: 8 MB of short lines on stdout
#   line:   two short lines, then one line of 8 MB
#   stderr: 8 MB on stderr, then a last stderr line, then a valid answer for every article
#   stderr-fail: 8 MB on stderr, then a last stderr line, then exit code 3
flood() {
    yes 'flooding the pipe with text' | head -c 8000000
}
case "$1" in
stdout)
    flood
    ;;
line)
    printf '%s\n%s\n' 'short line one' 'short line two'
    flood | tr -d '[:space:]'
    ;;
stderr | stderr-fail)
    flood >&2
    echo 'LAST-STDERR-LINE' >&2
    if [ "$1" = stderr-fail ]; then
        exit 3
    fi
    # Every protocol line starts with {"id":"...": answer it with no spans.
    sed -n 's/^{"id":"\([^"]*\)".*/{"id":"\1","spans":[]}/p'
    ;;
esac
