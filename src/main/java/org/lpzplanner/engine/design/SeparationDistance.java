package org.lpzplanner.engine.design;

import org.locationtech.jts.geom.Coordinate;
import org.lpzplanner.engine.model.ProtectionLevel;

/**
 * Separation distance between the lightning protection system and a metal installation
 * [IEC 62305-3:2010 6.3]:
 * <pre>
 *   s = k<sub>i</sub> · (k<sub>c</sub> / k<sub>m</sub>) · l
 * </pre>
 * k<sub>i</sub> from the protection level (Table 10: 0.08, 0.06, 0.04, 0.04 for I to IV);
 * k<sub>c</sub> the share of the current in the nearest down-conductor, simplified to 1 for one
 * down-conductor, 0.66 for two and 0.44 for three or more (Table 12 and Annex C; use 1 where the earth
 * electrodes' resistances differ by more than a factor of two); k<sub>m</sub> the insulating material
 * (Table 11: 1 in air, 0.5 in concrete or brick); l the length in metres along the air-termination or
 * down-conductor from the point considered to the nearest equipotential bonding point.
 *
 * <p><b>Default length.</b> When l is not given, {@link #check} takes the height above ground of the
 * LPS point considered: a straight vertical path to bonding at ground level. This is the shortest path
 * possible, so the s it gives is only a lower bound: such a result can show a failure, but never
 * passes (a check that cannot be confirmed counts as failed). Pass the real l to confirm a pass.
 *
 * <p>Results follow the 2010 edition; the 2024 edition revised this method. Stateless and thread-safe.
 */
public final class SeparationDistance {

    private SeparationDistance() {
    }

    /** Insulating material between the LPS and the installation, with its k<sub>m</sub> [IEC 62305-3:2010 Table 11]. */
    public enum Material {
        AIR(1.0), CONCRETE_OR_BRICK(0.5);

        private final double km;

        Material(double km) {
            this.km = km;
        }

        public double km() {
            return km;
        }
    }

    /**
     * Outcome of one check.
     *
     * @param required      s, metres
     * @param actual        3D distance between the installation point and the LPS point, metres
     * @param length        l used, metres
     * @param lengthAssumed true when l was the default (height of the LPS point above ground)
     */
    public record Result(double required, double actual, double length, boolean lengthAssumed) {

        /**
         * True when the installation is at least s away from the LPS. With an assumed l, s is only a
         * lower bound, so the check cannot be confirmed and does not pass.
         */
        public boolean passes() {
            return !lengthAssumed && actual >= required;
        }
    }

    /**
     * k<sub>c</sub> simplified by the number of down-conductors: 1, 0.66, 0.44 for one, two, three or
     * more [IEC 62305-3:2010 Table 12, Annex C].
     */
    public static double kc(int downConductors) {
        if (downConductors < 1) {
            throw new IllegalArgumentException("the number of down-conductors must be at least 1, got " + downConductors);
        }
        return downConductors == 1 ? 1.0 : downConductors == 2 ? 0.66 : 0.44;
    }

    /** s = k<sub>i</sub> · (k<sub>c</sub> / k<sub>m</sub>) · l in metres. */
    public static double required(ProtectionLevel level, int downConductors, Material material, double length) {
        if (!(length >= 0) || Double.isInfinite(length)) {
            throw new IllegalArgumentException("length to the nearest bonding point must be zero or more metres, got " + length);
        }
        return level.ki() * kc(downConductors) / material.km() * length;
    }

    /**
     * Checks a metal installation point against the nearest point of the air-termination or
     * down-conductor (both in local metres, z above ground).
     *
     * @param length l in metres, or null to take the height of {@code lpsPoint} above ground (see class comment)
     */
    public static Result check(ProtectionLevel level, int downConductors, Material material, Coordinate installation,
            Coordinate lpsPoint, Double length) {
        boolean assumed = length == null;
        double l = assumed ? Math.max(0, lpsPoint.getZ()) : length;
        double actual = installation.distance3D(lpsPoint);
        return new Result(required(level, downConductors, material, l), actual, l, assumed);
    }
}
