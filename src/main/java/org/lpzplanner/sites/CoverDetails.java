package org.lpzplanner.sites;

import org.lpzplanner.system.InvalidInputException;

/**
 * The site's address and the designer's name as the report's cover prints them: free text of one
 * line, at most {@link #MAX_LENGTH} characters, empty when not entered. The same check serves the
 * page form, the JSON API, the site import and the command line, so a value stored one way can be
 * stored every other way.
 */
public final class CoverDetails {

    /** Longest address or designer name kept (the columns are VARCHAR(200)). */
    public static final int MAX_LENGTH = 200;

    private CoverDetails() {
    }

    /**
     * The value stripped of surrounding blanks; null stays null (nothing to change), blank becomes
     * empty (cleared).
     *
     * @param field the name the message uses for the value, e.g. {@code address}
     * @throws InvalidInputException when it is too long or holds a control character or a broken
     *         character, naming the field
     */
    public static String check(String field, String value) {
        if (value == null) {
            return null;
        }
        String text = value.strip();
        if (text.length() > MAX_LENGTH) {
            throw new InvalidInputException(field, field + " must be at most " + MAX_LENGTH
                    + " characters, got " + text.length());
        }
        int[] codePoints = text.codePoints().toArray();
        for (int i = 0; i < codePoints.length; i++) {
            int type = Character.getType(codePoints[i]);
            // Line breaks, tabs and other controls would break the one printed line; a lone half of
            // a surrogate pair is not a character at all.
            if (type == Character.CONTROL || type == Character.SURROGATE || codePoints[i] == 0x2028
                    || codePoints[i] == 0x2029) {
                throw new InvalidInputException(field, field + " must be one line of text without control"
                        + " characters; character " + (i + 1) + " is U+"
                        + String.format("%04X", codePoints[i]));
            }
        }
        return text;
    }
}
