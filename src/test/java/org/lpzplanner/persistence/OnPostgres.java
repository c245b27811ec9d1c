package org.lpzplanner.persistence;

import java.lang.annotation.ElementType;
import java.lang.annotation.Inherited;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.extension.ExtendWith;

/**
 * Marks a test class that runs against the PostgreSQL server named by the environment variable
 * {@value PostgresTestDatabase#URL_VARIABLE}. Without it the class is skipped locally and fails
 * under CI ({@code CI=true}), where {@code .ci/run} starts a server.
 */
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@Inherited
@Tag("postgres")
@ExtendWith(PostgresCondition.class)
public @interface OnPostgres {
}
