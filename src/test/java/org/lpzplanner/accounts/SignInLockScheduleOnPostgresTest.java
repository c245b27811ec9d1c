package org.lpzplanner.accounts;

import org.lpzplanner.persistence.OnPostgres;
import org.lpzplanner.persistence.PostgresTestDatabase;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/** {@link SignInLockScheduleTest} on PostgreSQL: the same locks from the same stored times. */
@OnPostgres
class SignInLockScheduleOnPostgresTest extends SignInLockScheduleTest {

    @DynamicPropertySource
    static void postgres(DynamicPropertyRegistry registry) {
        PostgresTestDatabase.register(registry);
    }
}
