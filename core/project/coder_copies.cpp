// PLACEHOLDER: replaced by the work that owns this file.
#include "core/project/coder_copies.h"
