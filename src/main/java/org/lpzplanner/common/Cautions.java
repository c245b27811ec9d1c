package org.lpzplanner.common;

import java.util.List;

/**
 * The cautions that go with every assessment the product produces, in one place so that the
 * command line, the web pages and printed reports all say the same thing.
 *
 * <p>Each caution is one short, self-contained line of plain text (no markup, no line breaks, no
 * bullet), in a fixed order. Callers add their own heading and bullets.
 */
public final class Cautions {

    private static final List<String> LINES = List.of(
            "This assessment applies only the rolling sphere method, at the protection level and with the"
                    + " site data given; other methods, levels or data can give different results.",
            "A qualified, licensed lightning-protection designer must review and approve any design based on"
                    + " it before anything is built or changed.",
            "Local building codes, the national standard that applies and the authority having jurisdiction"
                    + " take precedence over anything shown here.",
            "It does not cover earthing resistance, surge protection, internal systems or equipment, or the"
                    + " condition of any existing installation.",
            "Work on roofs and on electrical systems is dangerous; leave it to trained, competent installers.");

    private Cautions() {
    }

    /** The cautions, in display order; the list is unmodifiable. */
    public static List<String> lines() {
        return LINES;
    }
}
