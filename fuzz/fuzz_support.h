#pragma once
// What the fuzz targets share. Each target defines LLVMFuzzerTestOneInput (libFuzzer's entry
// point, https://llvm.org/docs/LibFuzzer.html): built with FOURFOLD_FUZZ it is linked with
// libFuzzer; otherwise with replay_main.cpp, which runs the committed seed corpus and a fixed
// number of deterministic mutations of it (the ctest cases).
//
// A target feeds the input to one reader through the reader's real entry point (a file on disk
// where the reader takes a path) and checks what the reader promises: no crash, an error that
// names the file, and for imports into a project that a refused file changes nothing.

#include "core/project/project.h"

#include <QByteArray>
#include <QString>

#include <cstddef>
#include <cstdint>

extern "C" int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size);

namespace fourfold::fuzz {

// Stops the program (a finding) with `what` when `condition` is false.
void check(bool condition, const char *what);
#define FOURFOLD_FUZZ_CHECK(condition) ::fourfold::fuzz::check((condition), #condition)

QByteArray bytes(const uint8_t *data, size_t size);

// A folder of this process that lives until the program ends.
QString workFolder();
// Writes `bytes` to `name` in the work folder and returns its path.
QString writeInput(const QString &name, const QByteArray &bytes);

// A project with the demo articles, their coders (C01–C03, lead L01) and the default
// codebook, made once per process; each call opens a fresh copy of it.
Project freshProject();

// The figures a refused import must leave as they were.
bool sameCounts(const ProjectCounts &a, const ProjectCounts &b);

} // namespace fourfold::fuzz
