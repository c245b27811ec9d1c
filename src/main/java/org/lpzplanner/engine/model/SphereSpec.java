package org.lpzplanner.engine.model;

/**
 * The protection level chosen and the sphere radius actually rolled: the level's radius, or a
 * custom one (e.g. 46 m, a common practice for ordinary structures).
 */
public record SphereSpec(ProtectionLevel level, double radius) {

    public SphereSpec {
        if (level == null) {
            throw new IllegalArgumentException("a protection level is required");
        }
        if (!SettingRange.RADIUS.contains(radius)) {
            throw new IllegalArgumentException("sphere radius must be " + SettingRange.RADIUS.rule() + ", got " + radius);
        }
    }

    public static SphereSpec of(ProtectionLevel level) {
        return new SphereSpec(level, level.sphereRadius());
    }

    public boolean isCustomRadius() {
        return radius != level.sphereRadius();
    }
}
