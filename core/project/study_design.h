#pragma once
// PLACEHOLDER: replaced by the work that owns this file.
