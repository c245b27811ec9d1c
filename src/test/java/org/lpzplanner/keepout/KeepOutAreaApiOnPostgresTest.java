package org.lpzplanner.keepout;

import org.lpzplanner.persistence.OnPostgres;
import org.lpzplanner.persistence.PostgresTestDatabase;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/** Every test of {@link KeepOutAreaApiTest}, against PostgreSQL. */
@OnPostgres
class KeepOutAreaApiOnPostgresTest extends KeepOutAreaApiTest {

    @DynamicPropertySource
    static void postgres(DynamicPropertyRegistry registry) {
        PostgresTestDatabase.register(registry);
    }
}
