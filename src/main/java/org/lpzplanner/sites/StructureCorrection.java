package org.lpzplanner.sites;

/**
 * A correction of one structure as typed in: each value is text, and a blank value keeps what the
 * file says.
 *
 * @param index       0-based position of the structure among the site's structures (file order)
 * @param height      wall-top height above ground, metres
 * @param roof        roof form: {@code flat}, {@code gable}, {@code hip} or {@code shed}
 * @param ridgeHeight ridge (or high side) height above ground, metres
 * @param bearing     ridge bearing of a gable roof, or high-side bearing of a shed roof, degrees
 * @param parapet     parapet height above a flat roof, metres
 */
public record StructureCorrection(int index, String height, String roof, String ridgeHeight, String bearing,
        String parapet) {

    static boolean given(String text) {
        return text != null && !text.isBlank();
    }

    /** Whether anything other than the height is to change. */
    boolean changesRoof() {
        return given(roof) || given(ridgeHeight) || given(bearing) || given(parapet);
    }

    /**
     * The site file with this correction applied, in the file's own format; not yet read back.
     *
     * @param document the site file as read, for the number of structures
     * @throws org.lpzplanner.system.InvalidInputException when the structure does not exist or a
     *         value cannot be used, naming the field
     */
    public String applyTo(StoredSite site, org.lpzplanner.engine.io.SiteDocument document) {
        int count = document.site().structures().size();
        if (index < 0 || index >= count) {
            throw new org.lpzplanner.system.InvalidInputException("structure", "structure must be a number from 1 to "
                    + count + ", got " + (index + 1));
        }
        return SiteFileCorrector.correct(site.sourceText(), site.sourceName(), this);
    }

    /** The values given, in words, for the audit trail, e.g. {@code height 12.5, roof gable}. */
    public String describe() {
        java.util.List<String> parts = new java.util.ArrayList<>();
        if (given(height)) {
            parts.add("height " + height.strip());
        }
        if (given(roof)) {
            parts.add("roof " + roof.strip());
        }
        if (given(ridgeHeight)) {
            parts.add("ridge height " + ridgeHeight.strip());
        }
        if (given(bearing)) {
            parts.add("bearing " + bearing.strip());
        }
        if (given(parapet)) {
            parts.add("parapet " + parapet.strip());
        }
        return parts.isEmpty() ? "no change" : String.join(", ", parts);
    }

    boolean isEmpty() {
        return !given(height) && !changesRoof();
    }
}
