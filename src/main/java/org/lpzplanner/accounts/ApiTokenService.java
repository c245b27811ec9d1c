package org.lpzplanner.accounts;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.sql.Timestamp;
import java.time.Clock;
import java.time.temporal.ChronoUnit;
import java.util.Base64;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;
import org.lpzplanner.system.InvalidInputException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Service;

/**
 * Personal API tokens: 256 random bits, shown once; only their SHA-256 is stored (a fast hash
 * suffices for random secrets of this length, unlike passwords). A token acts as its account,
 * with the account's role and team, while the account is enabled.
 */
@Service
public class ApiTokenService {

    /** Every token starts with this, so that a leaked one is easy to recognise in logs and scans. */
    public static final String PREFIX = "lpz_";

    private static final SecureRandom RANDOM = new SecureRandom();

    private final JdbcClient jdbc;
    private final AccountRepository accounts;
    private final Clock clock;

    public ApiTokenService(JdbcClient jdbc, AccountRepository accounts, Clock clock) {
        this.jdbc = jdbc;
        this.accounts = accounts;
        this.clock = clock;
    }

    /** Creates a token for the account and returns it; this is the only time it is readable. */
    public String create(long accountId, String label) {
        String l = label == null || label.isBlank() ? "API token" : label.strip();
        if (l.length() > 100) {
            throw new InvalidInputException("label", "the token label must be at most 100 characters");
        }
        byte[] secret = new byte[32];
        RANDOM.nextBytes(secret);
        String token = PREFIX + Base64.getUrlEncoder().withoutPadding().encodeToString(secret);
        jdbc.sql("INSERT INTO api_tokens (account_id, label, token_sha256, created_at) VALUES (?, ?, ?, ?)")
                .params(accountId, l, sha256(token), Timestamp.from(clock.instant().truncatedTo(ChronoUnit.MILLIS)))
                .update();
        return token;
    }

    public List<ApiToken> list(long accountId) {
        return jdbc.sql("SELECT id, label, created_at, last_used_at FROM api_tokens WHERE account_id = ? ORDER BY id")
                .param(accountId).query((rs, n) -> new ApiToken(rs.getLong("id"), rs.getString("label"),
                        rs.getTimestamp("created_at").toInstant(),
                        rs.getTimestamp("last_used_at") == null ? null : rs.getTimestamp("last_used_at").toInstant()))
                .list();
    }

    /** Revokes one of the account's own tokens; false when it has no such token. */
    public boolean revoke(long accountId, long tokenId) {
        return jdbc.sql("DELETE FROM api_tokens WHERE id = ? AND account_id = ?").params(tokenId, accountId)
                .update() > 0;
    }

    /** Revokes every token of the account; returns how many there were. */
    public int revokeAll(long accountId) {
        return jdbc.sql("DELETE FROM api_tokens WHERE account_id = ?").param(accountId).update();
    }

    /** The enabled account a token belongs to, empty for an unknown token. */
    public Optional<SignedInAccount> authenticate(String token) {
        if (token == null || !token.startsWith(PREFIX) || token.length() > 100) {
            return Optional.empty();
        }
        String hash = sha256(token);
        Optional<Long> accountId = jdbc.sql("SELECT account_id FROM api_tokens WHERE token_sha256 = ?").param(hash)
                .query(Long.class).optional();
        Optional<SignedInAccount> account = accountId.flatMap(accounts::findById).filter(Account::enabled)
                .map(a -> new SignedInAccount(a.id(), a.email(), a.displayName(), a.role(), a.teamId(), true, null));
        account.ifPresent(a -> jdbc.sql("UPDATE api_tokens SET last_used_at = ? WHERE token_sha256 = ?")
                .params(Timestamp.from(clock.instant().truncatedTo(ChronoUnit.MILLIS)), hash).update());
        return account;
    }

    static String sha256(String text) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }
}
