package org.lpzplanner.sites;

import java.util.Locale;
import java.util.Map;

/**
 * What another feature adds to a site's plan page (for example the level the risk estimate asks
 * for and its collection area). Every Spring bean of this type is asked on each plan page; the
 * attributes go into the page's model, and the plan template shows them when present.
 */
public interface PlanContribution {

    /** Model attributes for the plan page of this site; empty when there is nothing to add. */
    Map<String, Object> attributes(StoredSite site, Locale locale);
}
