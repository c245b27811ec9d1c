/**
 * The questions a designer asks of the envelope ({@link org.lpzplanner.engine.exposure.ExposureAnalysis}):
 * exposed roof areas, edges, corners and facade bands (classified by the tall-structure rule,
 * IEC 62305-3:2010 5.2.3), the parts that intercept, protected ground, and warnings the designer
 * must see (a conductor that spheres can pass under).
 *
 * <p>Rules of the package: every decision errs toward "exposed" (1 mm margin; a decision that stays
 * uncertain counts as exposed); no verdict of full protection while a warning stands; an update after
 * an edit gives the same result as a fresh analysis. Depends on the model, geom and envelope.
 */
package org.lpzplanner.engine.exposure;
