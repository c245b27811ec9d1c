/**
 * The site as a designer describes it: structures with their roof forms, rooftop objects, rods and
 * conductors, in local metres (x east, y north, heights above flat ground); and the protection
 * levels with every parameter the product uses ({@link org.lpzplanner.engine.model.ProtectionLevel},
 * one table, sources named there).
 *
 * <p>Rules of the package: records and enums only, no computation beyond validation of what a
 * value can be; nothing here depends on another package of the product.
 */
package org.lpzplanner.engine.model;
