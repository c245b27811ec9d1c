package org.lpzplanner.sites;

import org.lpzplanner.system.NotFoundException;

/** No site is stored under the id asked for. The message can be shown to users. */
public class SiteNotFoundException extends NotFoundException {

    private static final long serialVersionUID = 1L;

    private final long siteId;

    public SiteNotFoundException(long siteId) {
        super("no site with id " + siteId + " is stored", null);
        this.siteId = siteId;
    }

    /** For something of the site that is missing, such as an earlier file; the message says what. */
    public SiteNotFoundException(long siteId, String message) {
        super(message, null);
        this.siteId = siteId;
    }

    public long siteId() {
        return siteId;
    }
}
