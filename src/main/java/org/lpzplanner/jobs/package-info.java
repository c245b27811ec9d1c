/**
 * Background jobs shared by every instance of the app: their stored state, progress, outcome and
 * cancel flag (table {@code background_jobs}), and this instance's heartbeat and name.
 *
 * <p>Rules of the package: knows no feature (ArchitectureTest); a job is identified by its id
 * alone, whatever it computes is the feature's business.
 */
package org.lpzplanner.jobs;
