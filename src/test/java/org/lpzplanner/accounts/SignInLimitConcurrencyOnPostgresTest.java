package org.lpzplanner.accounts;

import org.lpzplanner.persistence.OnPostgres;
import org.lpzplanner.persistence.PostgresTestDatabase;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/** {@link SignInLimitConcurrencyTest} on PostgreSQL, where concurrent transactions really interleave. */
@OnPostgres
class SignInLimitConcurrencyOnPostgresTest extends SignInLimitConcurrencyTest {

    @DynamicPropertySource
    static void postgres(DynamicPropertyRegistry registry) {
        PostgresTestDatabase.register(registry);
    }
}
