package org.lpzplanner.airtermination;

/**
 * Values for a new rod or a change of one: position in local metres, height above what it stands
 * on as typed (metres); null leaves a value unchanged (or, for a new rod, unset: height 1 m). An
 * {@code id}, when given for a new rod, must not be in use (it lets a removed rod come back under
 * its old id).
 */
public record RodInput(String id, String name, Double x, Double y, String height) {
}
