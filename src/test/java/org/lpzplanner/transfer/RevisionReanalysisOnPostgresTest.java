package org.lpzplanner.transfer;

import org.lpzplanner.persistence.OnPostgres;
import org.lpzplanner.persistence.PostgresTestDatabase;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/** Every test of {@link RevisionReanalysisTest}, against PostgreSQL. */
@OnPostgres
class RevisionReanalysisOnPostgresTest extends RevisionReanalysisTest {

    @DynamicPropertySource
    static void postgres(DynamicPropertyRegistry registry) {
        PostgresTestDatabase.register(registry);
    }
}
