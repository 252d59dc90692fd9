// PLACEHOLDER: replaced by the work that owns this file.
#include "core/store/extractor_run_table.h"
