package org.lpzplanner.accounts;

import java.sql.Timestamp;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicLong;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.dao.DuplicateKeyException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Component;

/**
 * Limits password sign-ins per account, with locks that grow, and slows guessing from one client
 * address without locking out the right password.
 *
 * <p><b>Per account</b> (by e-mail, also for e-mails no account has): {@link #reserve} counts an
 * attempt as failed <em>before</em> its password is checked, with a compare-and-set on the row of
 * {@code sign_in_failures}; a success then deletes the row. So concurrent attempts, on any app
 * instance on the same database, are counted one by one and never get more password checks than
 * the limit allows. The first {@code freeFailuresPerAccount} failures in a row cost nothing; the
 * next failure locks the account for {@code firstLock}, and every further one for twice as long as
 * the one before, up to {@code longestLock} ({@link Limits#lockAfter}). While locked, an attempt is
 * refused without its password being checked. Failures are forgotten {@code forgetAfter} after the
 * last one.
 *
 * <p><b>Per address</b>: failures from a client address are rows of {@code sign_in_attempts}.
 * From an address with {@code maxFailuresPerAddress} failures within {@code addressWindow} (many
 * accounts tried from one place), attempts are still checked, so the right password of an account
 * that is not locked signs in; but a wrong one locks its account at once, as if it had reached the
 * limit. That makes guessing from such an address one try per account and lock.
 *
 * <p>Thread-safe; all state is in the database, so every instance on it sees the same counts.
 */
@Component
public class SignInThrottle {

    /** How much a compare-and-set may be retried under contention before the attempt is refused. */
    private static final int TRIES = 100;

    /** The limits; docs/security.md gives the schedule of the defaults. */
    public record Limits(int freeFailuresPerAccount, Duration firstLock, Duration longestLock, Duration forgetAfter,
            int maxFailuresPerAddress, Duration addressWindow) {

        /** How long the account is locked after its {@code failures}-th failure in a row. */
        public Duration lockAfter(int failures) {
            if (failures < freeFailuresPerAccount) {
                return Duration.ZERO;
            }
            int doublings = Math.min(failures - freeFailuresPerAccount, 30);
            Duration lock = firstLock.multipliedBy(1L << doublings);
            return lock.compareTo(longestLock) > 0 ? longestLock : lock;
        }
    }

    private record Failures(int count, Instant lockedUntil, Instant lastFailure, long version) {
    }

    private final JdbcClient jdbc;
    private final Clock clock;
    private final Limits limits;
    /** Attempts reserved by this instance; every hundredth one also drops expired rows. */
    private final AtomicLong reserved = new AtomicLong();

    @Autowired
    public SignInThrottle(JdbcClient jdbc, Clock clock,
            @Value("${lpz.sign-in.max-failures-per-account:5}") int freeFailuresPerAccount,
            @Value("${lpz.sign-in.first-lock:PT1M}") Duration firstLock,
            @Value("${lpz.sign-in.longest-lock:PT1H}") Duration longestLock,
            @Value("${lpz.sign-in.forget-failures-after:PT24H}") Duration forgetAfter,
            @Value("${lpz.sign-in.max-failures-per-address:20}") int maxFailuresPerAddress,
            @Value("${lpz.sign-in.window:PT15M}") Duration addressWindow) {
        this(jdbc, clock, new Limits(freeFailuresPerAccount, firstLock, longestLock, forgetAfter, maxFailuresPerAddress,
                addressWindow));
    }

    public SignInThrottle(JdbcClient jdbc, Clock clock, Limits limits) {
        if (limits.freeFailuresPerAccount() < 1 || limits.maxFailuresPerAddress() < 1) {
            throw new IllegalArgumentException("sign-in limits must allow at least one failure");
        }
        this.jdbc = jdbc;
        this.clock = clock;
        this.limits = limits;
    }

    /**
     * Counts an attempt on the account as failed before its password is checked; {@link #succeeded}
     * takes that back. Call it before every password check.
     *
     * @throws SignInThrottledException while the account is locked: the password must not be checked
     */
    public void reserve(String email, String address) {
        if (reserved.incrementAndGet() % 100 == 0) {
            forgetOld();
        }
        String key = key(email);
        Instant now = now();
        boolean suspectAddress = failuresFrom(address(address), now) >= limits.maxFailuresPerAddress();
        for (int i = 0; i < TRIES; i++) {
            Optional<Failures> stored = find(key);
            if (stored.isEmpty()) {
                if (insert(key, next(0, suspectAddress), now)) {
                    return;
                }
                continue;
            }
            Failures f = stored.get();
            if (f.lockedUntil() != null && f.lockedUntil().isAfter(now)) {
                throw new SignInThrottledException(Duration.between(now, f.lockedUntil()));
            }
            int before = f.lastFailure().isBefore(now.minus(limits.forgetAfter())) ? 0 : f.count();
            if (update(key, f.version(), next(before, suspectAddress), now)) {
                return;
            }
        }
        // so many attempts on this account at once that none of them got counted: refuse, unchecked
        throw new SignInThrottledException(limits.firstLock());
    }

    /** Records the failure of a reserved attempt against the client address. */
    public void failed(String email, String address) {
        jdbc.sql("INSERT INTO sign_in_attempts (email, address, succeeded, attempted_at) VALUES (?, ?, FALSE, ?)")
                .params(key(email), address(address), Timestamp.from(now())).update();
    }

    /** A success ends the account's run of failures and its lock (the address's count stays). */
    public void succeeded(String email, String address) {
        jdbc.sql("DELETE FROM sign_in_failures WHERE email = ?").param(key(email)).update();
    }

    /** Drops what no limit needs any more; called now and then so the tables stay small. */
    public void forgetOld() {
        Instant now = now();
        jdbc.sql("DELETE FROM sign_in_attempts WHERE attempted_at < ?")
                .param(Timestamp.from(now.minus(limits.addressWindow()))).update();
        jdbc.sql("DELETE FROM sign_in_failures WHERE last_failure_at < ? AND (locked_until IS NULL OR locked_until < ?)")
                .params(Timestamp.from(now.minus(limits.forgetAfter())), Timestamp.from(now)).update();
    }

    private int next(int before, boolean suspectAddress) {
        return suspectAddress ? Math.max(before + 1, limits.freeFailuresPerAccount()) : before + 1;
    }

    private Timestamp lockedUntil(int failures, Instant now) {
        Duration lock = limits.lockAfter(failures);
        return lock.isZero() ? null : Timestamp.from(now.plus(lock));
    }

    private boolean insert(String key, int failures, Instant now) {
        try {
            jdbc.sql("INSERT INTO sign_in_failures (email, failures, locked_until, last_failure_at, version)"
                    + " VALUES (?, ?, ?, ?, 0)").params(key, failures, lockedUntil(failures, now), Timestamp.from(now))
                    .update();
            return true;
        } catch (DuplicateKeyException e) {
            return false;
        }
    }

    private boolean update(String key, long version, int failures, Instant now) {
        return jdbc.sql("UPDATE sign_in_failures SET failures = ?, locked_until = ?, last_failure_at = ?,"
                        + " version = version + 1 WHERE email = ? AND version = ?")
                .params(failures, lockedUntil(failures, now), Timestamp.from(now), key, version).update() == 1;
    }

    private Optional<Failures> find(String key) {
        return jdbc.sql("SELECT failures, locked_until, last_failure_at, version FROM sign_in_failures WHERE email = ?")
                .param(key).query((rs, n) -> new Failures(rs.getInt("failures"),
                        rs.getTimestamp("locked_until") == null ? null : rs.getTimestamp("locked_until").toInstant(),
                        rs.getTimestamp("last_failure_at").toInstant(), rs.getLong("version")))
                .optional();
    }

    private long failuresFrom(String address, Instant now) {
        return jdbc.sql("SELECT COUNT(*) FROM sign_in_attempts WHERE address = ? AND succeeded = FALSE"
                + " AND attempted_at > ?").params(address, Timestamp.from(now.minus(limits.addressWindow())))
                .query(Long.class).single();
    }

    private Instant now() {
        return clock.instant().truncatedTo(ChronoUnit.MILLIS);
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
