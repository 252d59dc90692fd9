// PLACEHOLDER: replaced by the work that owns this file.
#include "core/project/study_design.h"
