package org.lpzplanner.accounts;

import org.lpzplanner.persistence.OnPostgres;
import org.lpzplanner.persistence.PostgresTestDatabase;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/** {@link TeamNamesTest} on PostgreSQL: the same rule from the same migration. */
@OnPostgres
class TeamNamesOnPostgresTest extends TeamNamesTest {

    @DynamicPropertySource
    static void postgres(DynamicPropertyRegistry registry) {
        PostgresTestDatabase.register(registry);
    }
}
