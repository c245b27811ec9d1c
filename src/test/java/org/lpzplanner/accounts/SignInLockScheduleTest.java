package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.security.authentication.AuthenticationProvider;
import org.springframework.security.authentication.BadCredentialsException;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.core.Authentication;
import org.springframework.security.web.authentication.WebAuthenticationDetails;

/**
 * The lock schedule of the default limits, on a clock the test moves: 5 failures in a row cost
 * nothing more, the 5th locks the account for 1 minute, and every further failure locks it for
 * twice as long as the one before, up to an hour (1, 2, 4, 8, 16, 32, 60, 60 … minutes). While
 * locked nothing is checked; a success ends it all; failures are forgotten a day after the last.
 */
@SpringBootTest
@AutoConfigureMockMvc // the suite's shared context has MockMvc; this class does not use it
class SignInLockScheduleTest {

    private static final SignInThrottle.Limits DEFAULTS = new SignInThrottle.Limits(5, Duration.ofMinutes(1),
            Duration.ofHours(1), Duration.ofHours(24), 20, Duration.ofMinutes(15));

    @Autowired
    JdbcClient jdbc;

    /** A clock that stands still until the test moves it. */
    static final class TestClock extends Clock {
        private Instant now = Instant.parse("2026-03-02T08:00:00Z");

        void advance(Duration d) {
            now = now.plus(d);
        }

        @Override
        public ZoneId getZone() {
            return ZoneOffset.UTC;
        }

        @Override
        public Clock withZone(ZoneId zone) {
            return this;
        }

        @Override
        public Instant instant() {
            return now;
        }
    }

    TestClock clock;
    AtomicInteger checks;
    ThrottledAuthenticationProvider signIn;

    @BeforeEach
    void throttleOnTheTestClock() {
        clock = new TestClock();
        checks = new AtomicInteger();
        AuthenticationProvider passwords = new AuthenticationProvider() {
            @Override
            public Authentication authenticate(Authentication a) {
                checks.incrementAndGet();
                if (!"right".equals(a.getCredentials())) {
                    throw new BadCredentialsException("wrong password");
                }
                return UsernamePasswordAuthenticationToken.authenticated(a.getName(), null, List.of());
            }

            @Override
            public boolean supports(Class<?> authentication) {
                return true;
            }
        };
        signIn = new ThrottledAuthenticationProvider(passwords, new SignInThrottle(jdbc, clock, DEFAULTS));
    }

    /** Signs in and says what came of it: "in", "wrong" or "locked N" (minutes left). */
    private String attempt(String email, String password) {
        UsernamePasswordAuthenticationToken request = UsernamePasswordAuthenticationToken.unauthenticated(email,
                password);
        request.setDetails(new WebAuthenticationDetails("203.0.113.5", null));
        try {
            signIn.authenticate(request);
            return "in";
        } catch (SignInThrottledException e) {
            return "locked " + e.waitMinutes();
        } catch (BadCredentialsException e) {
            return "wrong";
        }
    }

    @Test
    void locksGrowFromOneMinuteDoublingUpToAnHour() {
        String email = "schedule@default.test";
        // four failures in a row, each checked at once: no lock stands in their way
        for (int i = 1; i <= 4; i++) {
            assertThat(attempt(email, "guess " + i)).isEqualTo("wrong");
        }
        assertThat(checks.get()).isEqualTo(4);

        int[] minutes = {1, 2, 4, 8, 16, 32, 60, 60, 60};
        for (int n = 0; n < minutes.length; n++) {
            int checked = checks.get();
            assertThat(attempt(email, "failure " + (5 + n))).isEqualTo("wrong");
            assertThat(checks.get()).isEqualTo(checked + 1);

            Duration lock = Duration.ofMinutes(minutes[n]);
            assertThat(attempt(email, "right")).as("right after failure %d", 5 + n)
                    .isEqualTo("locked " + minutes[n]);
            clock.advance(lock.minusSeconds(1));
            assertThat(attempt(email, "right")).as("a second before the lock of %s ends", lock).isEqualTo("locked 1");
            assertThat(checks.get()).as("nothing checked while locked").isEqualTo(checked + 1);
            clock.advance(Duration.ofSeconds(1));
        }
        assertThat(attempt(email, "right")).isEqualTo("in");
        // the success ended the run: the next failure costs nothing
        assertThat(attempt(email, "wrong once")).isEqualTo("wrong");
        assertThat(attempt(email, "right")).isEqualTo("in");
    }

    @Test
    void failuresAreForgottenADayAfterTheLast() {
        String email = "forgotten@default.test";
        for (int i = 0; i < 5; i++) {
            attempt(email, "guess " + i);
        }
        assertThat(attempt(email, "right")).isEqualTo("locked 1");
        clock.advance(Duration.ofHours(24).plusSeconds(1));
        for (int i = 0; i < 4; i++) {
            assertThat(attempt(email, "guess " + i)).isEqualTo("wrong");
        }
        assertThat(attempt(email, "right")).isEqualTo("in");
    }

    @Test
    void theLockHoldsOnEveryInstanceOnTheSameDatabase() {
        String email = "everywhere@default.test";
        for (int i = 0; i < 5; i++) {
            attempt(email, "guess " + i);
        }
        SignInThrottle otherInstance = new SignInThrottle(jdbc, clock, DEFAULTS);
        assertThatThrownBy(() -> otherInstance.reserve(email, "198.51.100.200"))
                .isInstanceOf(SignInThrottledException.class);
        clock.advance(Duration.ofMinutes(1));
        otherInstance.reserve(email, "198.51.100.200");
        otherInstance.succeeded(email, "198.51.100.200");
        assertThat(attempt(email, "guess after")).isEqualTo("wrong");
    }
}
