package org.lpzplanner.analysis;

/** No review item of the site's latest analysis has this key (or the site was never analysed). */
public class ReviewItemNotFoundException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public ReviewItemNotFoundException(String message) {
        super(message);
    }
}
