package org.lpzplanner.persistence;

import java.nio.file.Path;

/** {@link JobsAcrossInstancesTest} with the instances sharing one PostgreSQL database. */
@OnPostgres
class JobsAcrossInstancesOnPostgresTest extends JobsAcrossInstancesTest {

    @Override
    protected String[] database(Path folder) {
        return new String[] {PostgresTestDatabase.freshSchemaUrl(), PostgresTestDatabase.user(),
                PostgresTestDatabase.password()};
    }
}
