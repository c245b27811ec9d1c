package org.lpzplanner.drawing;

/**
 * Every layer the product draws. The plan layers come first, in the order a plan draws them,
 * bottom to top; the section layers follow (a section draws them in its own order). Each has
 * exactly one entry in {@link PlanStyle}.
 */
public enum Layer {
    PROTECTED_GROUND,
    /** The risk estimate's collection area A_D (risk page, and switched on over the plan page's plan). */
    COLLECTION_AREA,
    STRUCTURE,
    ROOFTOP_OBJECT,
    EXPOSED_ROOF,
    /** Stored keep-out areas, hatched over what lies below so that exposed roof stays visible. */
    KEEP_OUT,
    /** Facade bands where flashes to the side are negligible (IEC 62305-3:2010 5.2.3). */
    FACADE_NEGLIGIBLE,
    /** Facade bands needing lateral air-termination (IEC 62305-3:2010 5.2.3). */
    FACADE_BAND,
    /** The stretch of a part a model warning is about, drawn under the part. */
    MODEL_WARNING,
    /** Exposed edges, corners and facade bands a designer accepted. */
    ACCEPTED_ITEM,
    EXPOSED_EDGE,
    EXPOSED_CORNER,
    CONDUCTOR,
    DOWN_CONDUCTOR,
    ROD,
    /** Section: the structure profile along the cut. */
    SECTION_PROFILE,
    /** Section: the part of the profile a sphere reaches (LPZ 0A). */
    SECTION_EXPOSED,
    /** Section: the protection envelope, the boundary between LPZ 0A and 0B. */
    SECTION_ENVELOPE,
    /** Section: an air-termination rod near the cut. */
    SECTION_ROD,
    /** Section: the rolling sphere at a resting position. */
    SECTION_SPHERE;

    /** True for the layers of a plan, false for those of a section. */
    public boolean onPlan() {
        return ordinal() <= ROD.ordinal();
    }
}
