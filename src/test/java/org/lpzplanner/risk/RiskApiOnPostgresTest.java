package org.lpzplanner.risk;

import org.lpzplanner.persistence.OnPostgres;
import org.lpzplanner.persistence.PostgresTestDatabase;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/** Every test of {@link RiskApiTest}, against PostgreSQL. */
@OnPostgres
class RiskApiOnPostgresTest extends RiskApiTest {

    @DynamicPropertySource
    static void postgres(DynamicPropertyRegistry registry) {
        PostgresTestDatabase.register(registry);
    }
}
