package org.lpzplanner.engine.exposure;

/**
 * Whether a sphere can touch an air-termination part, i.e. whether it intercepts. A part the
 * sphere never reaches lies wholly inside the protection of others and does no work.
 */
public record PartInterception(String partId, String partName, PartKind kind, boolean intercepts) {

    public enum PartKind { ROD, CONDUCTOR }
}
