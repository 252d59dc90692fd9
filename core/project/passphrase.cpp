#include "core/project/passphrase.h"

#include <QCoreApplication>

#include <sodium.h>

#include <atomic>

namespace fourfold {

namespace {

std::atomic<qint64> g_hashes {0};

// The passphrase as bytes: Unicode NFC first, so the same characters typed on another keyboard
// or system give the same bytes (RFC 8265 §4.2, the OpaqueString profile's normalization; from
// memory).
QByteArray passphraseBytes(const QString &passphrase)
{
    return passphrase.normalized(QString::NormalizationForm_C).toUtf8();
}

bool sodiumReady()
{
    static const bool ready = sodium_init() >= 0; // 0 first time, 1 when already initialised
    return ready;
}

} // namespace

Status checkNewPassphrase(const QString &passphrase)
{
    const QString nfc = passphrase.normalized(QString::NormalizationForm_C);
    if (nfc.toUcs4().size() < kMinPassphraseLength)
        return fail(ErrorCode::InvalidArgument,
            QCoreApplication::translate(
                "Passphrase", "A lead's passphrase needs at least %1 characters.")
                .arg(kMinPassphraseLength));
    return {};
}

Result<QString> hashPassphrase(const QString &passphrase)
{
    if (!sodiumReady())
        return fail(ErrorCode::Internal,
            QCoreApplication::translate("Passphrase", "The passphrase library could not start."));
    const QByteArray bytes = passphraseBytes(passphrase);
    char out[crypto_pwhash_STRBYTES] = {};
    ++g_hashes;
    if (crypto_pwhash_str(out, bytes.constData(), quint64(bytes.size()),
            crypto_pwhash_OPSLIMIT_INTERACTIVE, crypto_pwhash_MEMLIMIT_INTERACTIVE)
        != 0)
        return fail(ErrorCode::Internal,
            QCoreApplication::translate(
                "Passphrase", "There was not enough memory to protect the passphrase."));
    return QString::fromLatin1(out);
}

bool passphraseMatches(const QString &hash, const QString &passphrase)
{
    if (hash.isEmpty() || !sodiumReady())
        return false;
    const QByteArray stored = hash.toLatin1();
    if (stored.size() >= crypto_pwhash_STRBYTES)
        return false;
    const QByteArray bytes = passphraseBytes(passphrase);
    ++g_hashes;
    return crypto_pwhash_str_verify(stored.constData(), bytes.constData(), quint64(bytes.size()))
        == 0;
}

qint64 passphraseHashesComputed()
{
    return g_hashes.load();
}

} // namespace fourfold
