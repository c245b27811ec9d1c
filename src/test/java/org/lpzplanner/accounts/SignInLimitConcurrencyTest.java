package org.lpzplanner.accounts;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Clock;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
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
 * Wrong passwords for one account sent all at once, as many threads started together (also spread
 * over two app instances on the same database): no more of them have their password checked than
 * the account's limit (5), however they interleave. The check is made slow on purpose, so that all
 * of them are in flight before the first one fails.
 */
@SpringBootTest
@AutoConfigureMockMvc // the suite's shared context has MockMvc; this class does not use it
class SignInLimitConcurrencyTest {

    private static final int PARALLEL = 14;
    private static final int LIMIT = 5;

    @Autowired
    SignInThrottle throttle;

    /** A password check that takes a while and always fails; counts how often it ran. */
    private static AuthenticationProvider slowWrongPassword(AtomicInteger checks) {
        return new AuthenticationProvider() {
            @Override
            public Authentication authenticate(Authentication authentication) {
                checks.incrementAndGet();
                try {
                    Thread.sleep(200);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
                throw new BadCredentialsException("wrong password");
            }

            @Override
            public boolean supports(Class<?> authentication) {
                return true;
            }
        };
    }

    private static int refusedUnchecked(List<AuthenticationProvider> instances, String email) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(PARALLEL);
        CyclicBarrier start = new CyclicBarrier(PARALLEL);
        List<Future<Boolean>> outcomes = new ArrayList<>();
        for (int i = 0; i < PARALLEL; i++) {
            AuthenticationProvider instance = instances.get(i % instances.size());
            String address = "198.51.100." + (i + 1);
            Callable<Boolean> attempt = () -> {
                UsernamePasswordAuthenticationToken request = UsernamePasswordAuthenticationToken.unauthenticated(email,
                        "guess");
                request.setDetails(new WebAuthenticationDetails(address, null));
                start.await();
                try {
                    instance.authenticate(request);
                    throw new AssertionError("a wrong password signed in");
                } catch (SignInThrottledException e) {
                    return true;
                } catch (BadCredentialsException e) {
                    return false;
                }
            };
            outcomes.add(pool.submit(attempt));
        }
        int refused = 0;
        for (Future<Boolean> outcome : outcomes) {
            refused += outcome.get(60, TimeUnit.SECONDS) ? 1 : 0;
        }
        pool.shutdown();
        return refused;
    }

    @Autowired
    JdbcClient jdbc;

    @Test
    void parallelWrongPasswordsGetNoMoreChecksThanTheLimit() throws Exception {
        AtomicInteger checks = new AtomicInteger();
        AuthenticationProvider provider = new ThrottledAuthenticationProvider(slowWrongPassword(checks), throttle);

        int refused = refusedUnchecked(List.of(provider), "parallel@default.test");

        assertThat(checks.get()).as("passwords checked").isBetween(1, LIMIT);
        assertThat(refused).as("refused without a check").isEqualTo(PARALLEL - checks.get());
    }

    @Test
    void parallelWrongPasswordsSpreadOverTwoInstancesGetNoMoreChecksThanTheLimit() throws Exception {
        AtomicInteger checks = new AtomicInteger();
        SignInThrottle.Limits limits = new SignInThrottle.Limits(LIMIT, Duration.ofMinutes(1), Duration.ofHours(1),
                Duration.ofHours(24), 20, Duration.ofMinutes(15));
        List<AuthenticationProvider> instances = List.of(
                new ThrottledAuthenticationProvider(slowWrongPassword(checks),
                        new SignInThrottle(jdbc, Clock.systemUTC(), limits)),
                new ThrottledAuthenticationProvider(slowWrongPassword(checks),
                        new SignInThrottle(jdbc, Clock.systemUTC(), limits)));

        int refused = refusedUnchecked(instances, "two-instances@default.test");

        assertThat(checks.get()).as("passwords checked").isBetween(1, LIMIT);
        assertThat(refused).as("refused without a check").isEqualTo(PARALLEL - checks.get());
    }
}
