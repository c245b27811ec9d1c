package org.lpzplanner.analysis;

import org.lpzplanner.persistence.OnPostgres;
import org.lpzplanner.persistence.PostgresTestDatabase;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/** Every test of {@link ReviewApiTest}, against PostgreSQL. */
@OnPostgres
class ReviewApiOnPostgresTest extends ReviewApiTest {

    @DynamicPropertySource
    static void postgres(DynamicPropertyRegistry registry) {
        PostgresTestDatabase.register(registry);
    }
}
