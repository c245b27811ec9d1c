package org.lpzplanner.accounts;

import java.time.Instant;

/** A personal API token as listed (the token itself is shown once, when created, and not stored). */
public record ApiToken(long id, String label, Instant createdAt, Instant lastUsedAt) {
}
