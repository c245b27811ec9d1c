/**
 * The one bound on long computations per app instance: {@link org.lpzplanner.heavywork.HeavyWorkCapacity}
 * gives every heavy computation (analyses, method checks, separation surveys, bills of quantities,
 * section envelopes, printed reports, proposals) a place out of a fixed number, and a time budget
 * once it holds one. A caller that finds no place within the wait is answered 429 with Retry-After
 * ({@link org.lpzplanner.heavywork.HeavyWorkBusyException}); a computation that outlives its budget
 * where the engine can be stopped is answered 503 with Retry-After
 * ({@link org.lpzplanner.heavywork.HeavyWorkOverBudgetException}).
 *
 * <p>Rules of the package: knows no feature (ArchitectureTest), so every feature may use it; it
 * knows the engine's progress hooks and reaches the answers through the base types of
 * {@code system}.
 */
package org.lpzplanner.heavywork;
