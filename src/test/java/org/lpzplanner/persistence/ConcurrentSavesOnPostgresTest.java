package org.lpzplanner.persistence;

import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/** {@link ConcurrentSavesTest} against PostgreSQL, where racing transactions really interleave. */
@OnPostgres
class ConcurrentSavesOnPostgresTest extends ConcurrentSavesTest {

    @DynamicPropertySource
    static void postgres(DynamicPropertyRegistry registry) {
        PostgresTestDatabase.register(registry);
    }
}
