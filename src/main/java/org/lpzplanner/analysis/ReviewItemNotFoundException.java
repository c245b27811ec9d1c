package org.lpzplanner.analysis;

import org.lpzplanner.system.NotFoundException;

/** No review item of the site's latest analysis has this key (or the site was never analysed). */
public class ReviewItemNotFoundException extends NotFoundException {

    private static final long serialVersionUID = 1L;

    public ReviewItemNotFoundException(String message) {
        super(message, null);
    }
}
