/**
 * The app as a program: settings, data folder, clock, upload limit, migrations of earlier releases,
 * the OpenAPI document, and how failures are answered: the JSON API's error bodies
 * ({@link org.lpzplanner.system.ApiErrorHandler}) and the pages' error pages
 * ({@link org.lpzplanner.system.PageErrors}, for controllers marked {@link org.lpzplanner.system.SitePages}).
 *
 * <p>Rules of the package: knows no feature (ArchitectureTest); features reach it only through the
 * base types {@link org.lpzplanner.system.NotFoundException}, {@link org.lpzplanner.system.ConflictException},
 * {@link org.lpzplanner.system.BusyException}, {@link org.lpzplanner.system.OverBudgetException} and {@link org.lpzplanner.system.InvalidInputException}.
 */
package org.lpzplanner.system;
