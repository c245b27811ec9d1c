package org.lpzplanner.accounts;

import java.sql.Timestamp;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.Locale;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Component;

/**
 * Limits failed sign-ins per account and per client address within a sliding window. Attempts
 * are rows in {@code sign_in_attempts}, so every app instance on the same database sees the same
 * count; a success clears the account's failures.
 */
@Component
public class SignInThrottle {

    private final JdbcClient jdbc;
    private final Clock clock;
    private final int maxPerAccount;
    private final int maxPerAddress;
    private final Duration window;
    /** Attempts recorded by this instance; every hundredth one also drops expired rows. */
    private final java.util.concurrent.atomic.AtomicLong recorded = new java.util.concurrent.atomic.AtomicLong();

    public SignInThrottle(JdbcClient jdbc, Clock clock,
            @Value("${lpz.sign-in.max-failures-per-account:5}") int maxPerAccount,
            @Value("${lpz.sign-in.max-failures-per-address:20}") int maxPerAddress,
            @Value("${lpz.sign-in.window:PT15M}") Duration window) {
        this.jdbc = jdbc;
        this.clock = clock;
        this.maxPerAccount = maxPerAccount;
        this.maxPerAddress = maxPerAddress;
        this.window = window;
    }

    /** @throws SignInThrottledException when the account or the address has too many recent failures */
    public void check(String email, String address) {
        Timestamp since = Timestamp.from(clock.instant().minus(window));
        long byAccount = jdbc.sql("SELECT COUNT(*) FROM sign_in_attempts WHERE email = ? AND succeeded = FALSE"
                + " AND attempted_at > ?").params(key(email), since).query(Long.class).single();
        long byAddress = jdbc.sql("SELECT COUNT(*) FROM sign_in_attempts WHERE address = ? AND succeeded = FALSE"
                + " AND attempted_at > ?").params(address(address), since).query(Long.class).single();
        if (byAccount >= maxPerAccount || byAddress >= maxPerAddress) {
            throw new SignInThrottledException(window.toMinutes());
        }
    }

    public void failed(String email, String address) {
        record(email, address, false);
    }

    /** A success ends the account's run of failures (the address's count stays). */
    public void succeeded(String email, String address) {
        jdbc.sql("DELETE FROM sign_in_attempts WHERE email = ? AND succeeded = FALSE").param(key(email)).update();
        record(email, address, true);
    }

    /** Drops attempts older than the window; called now and then so the table stays small. */
    public void forgetOld() {
        jdbc.sql("DELETE FROM sign_in_attempts WHERE attempted_at < ?")
                .param(Timestamp.from(clock.instant().minus(window))).update();
    }

    private void record(String email, String address, boolean succeeded) {
        if (recorded.incrementAndGet() % 100 == 0) {
            forgetOld();
        }
        jdbc.sql("INSERT INTO sign_in_attempts (email, address, succeeded, attempted_at) VALUES (?, ?, ?, ?)")
                .params(key(email), address(address), succeeded, Timestamp.from(Instant.now(clock))).update();
    }

    private static String key(String email) {
        String k = email == null ? "" : email.strip().toLowerCase(Locale.ROOT);
        return k.length() > 254 ? k.substring(0, 254) : k;
    }

    private static String address(String address) {
        String a = address == null ? "unknown" : address;
        return a.length() > 64 ? a.substring(0, 64) : a;
    }
}
