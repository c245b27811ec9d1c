package org.lpzplanner.accounts;

import java.time.Instant;

/** A stored account; {@code passwordHash} is an encoded hash, never the password. */
public record Account(long id, String email, String displayName, String passwordHash, Role role, long teamId,
        boolean enabled, Instant createdAt) {
}
