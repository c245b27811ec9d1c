/**
 * What every feature shares and no feature owns: the review cautions every result carries, the
 * titled table a report prints without knowing the feature, and how pages write dates and numbers.
 *
 * <p>Rules of the package: knows no feature (ArchitectureTest); plain Java.
 */
package org.lpzplanner.common;
