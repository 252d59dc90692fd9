#pragma once
// Lead passphrases, kept only as a salted, slow hash: libsodium's crypto_pwhash_str, which is
// Argon2id (RFC 9106) and writes the algorithm, its parameters, a random 16-byte salt and the
// hash into one string ("$argon2id$v=19$m=65536,t=2,p=1$…"), so a file keeps verifying when the
// limits change later.
//
// Limits: OPSLIMIT_INTERACTIVE and MEMLIMIT_INTERACTIVE (2 passes over 64 MiB). The passphrase
// guards the shared desk against a careless or curious look, not against someone who holds the
// file (who can read every span in it without any passphrase), so the slow hash only has to make
// a copied hash expensive to guess, and it runs each time a lead is chosen on a shared lab
// machine and in every test that signs a lead in. MODERATE (3 passes over 256 MiB) would cost
// four times the memory and several times the time on each choice for no gain in what the
// passphrase can protect.

#include "core/model/error.h"

#include <QString>

namespace fourfold {

// The shortest passphrase a lead may set: NIST SP 800-63B §5.1.1.1 asks for at least 8
// characters of a memorized secret (from memory).
inline constexpr int kMinPassphraseLength = 8;

// InvalidArgument when `passphrase` is shorter than kMinPassphraseLength characters (code
// points, after Unicode NFC).
Status checkNewPassphrase(const QString &passphrase);
// The Argon2id string of `passphrase` (NFC, UTF-8) with a fresh random salt. Internal if
// libsodium cannot start or runs out of memory.
Result<QString> hashPassphrase(const QString &passphrase);
// Whether `passphrase` is the one `hash` was made from (false for an empty or malformed hash).
bool passphraseMatches(const QString &hash, const QString &passphrase);
// How many Argon2id computations (hash or verify) this process ran: tests count them.
qint64 passphraseHashesComputed();

} // namespace fourfold
