package org.lpzplanner.persistence;

import org.junit.jupiter.api.extension.ConditionEvaluationResult;
import org.junit.jupiter.api.extension.ExecutionCondition;
import org.junit.jupiter.api.extension.ExtensionContext;

/** Enables {@link OnPostgres} classes when a test server is configured; under CI its absence is an error. */
public class PostgresCondition implements ExecutionCondition {

    @Override
    public ConditionEvaluationResult evaluateExecutionCondition(ExtensionContext context) {
        if (PostgresTestDatabase.configured()) {
            return ConditionEvaluationResult.enabled("PostgreSQL test server configured");
        }
        if ("true".equalsIgnoreCase(System.getenv("CI"))) {
            throw new IllegalStateException("CI=true but " + PostgresTestDatabase.URL_VARIABLE
                    + " is not set: .ci/run starts a PostgreSQL server and sets it");
        }
        return ConditionEvaluationResult.disabled("PostgreSQL tests skipped: set " + PostgresTestDatabase.URL_VARIABLE
                + " (and LPZ_TEST_POSTGRES_USER, LPZ_TEST_POSTGRES_PASSWORD) to run them");
    }
}
