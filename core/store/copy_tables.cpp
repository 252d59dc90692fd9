// PLACEHOLDER: replaced by the work that owns this file.
#include "core/store/copy_tables.h"
