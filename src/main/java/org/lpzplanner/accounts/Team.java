package org.lpzplanner.accounts;

import java.time.Instant;

/** A team: it owns sites, and its accounts see only those. */
public record Team(long id, String name, Instant createdAt) {
}
