package org.lpzplanner.engine.risk;

/**
 * Type of ground or floor surface where people stand near the structure, giving the reduction
 * factor r_t of injury by touch and step voltage [IEC 62305-2:2010 Table C.3].
 */
public enum SurfaceType {
    /** r_t = 10⁻² [Table C.3; from memory — check against the standard]. */
    AGRICULTURAL_OR_CONCRETE(1e-2, "agricultural ground or concrete"),
    /** r_t = 10⁻³ [Table C.3; from memory — check against the standard]. */
    MARBLE_OR_CERAMIC(1e-3, "marble or ceramic"),
    /** r_t = 10⁻⁴ [Table C.3; from memory — check against the standard]. */
    GRAVEL_OR_CARPET(1e-4, "gravel, moquette or carpet"),
    /** r_t = 10⁻⁵ [Table C.3; from memory — check against the standard]. */
    ASPHALT_LINOLEUM_OR_WOOD(1e-5, "asphalt, linoleum or wood");

    private final double rt;
    private final String description;

    SurfaceType(double rt, String description) {
        this.rt = rt;
        this.description = description;
    }

    /** r_t. */
    public double rt() {
        return rt;
    }

    /** Plain-words name for reports. */
    public String description() {
        return description;
    }
}
