package org.lpzplanner.accounts;

/**
 * What an account may do. Every role reads its team's sites and comments on them; a reviewer also
 * marks a revision reviewed but changes nothing else; a designer creates and edits sites; an
 * administrator does what a designer does and manages accounts and teams.
 */
public enum Role {
    ADMIN, DESIGNER, REVIEWER;

    /** The Spring Security authority, e.g. {@code ROLE_DESIGNER}. */
    public String authority() {
        return "ROLE_" + name();
    }

    /** Whether this role may create and change sites. */
    public boolean edits() {
        return this != REVIEWER;
    }

    /** The role named by a form or API value (case-insensitive), or null when there is none. */
    public static Role parse(String text) {
        if (text == null) {
            return null;
        }
        for (Role r : values()) {
            if (r.name().equalsIgnoreCase(text.strip())) {
                return r;
            }
        }
        return null;
    }
}
