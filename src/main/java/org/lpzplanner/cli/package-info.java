/**
 * The command line: {@code analyze}, {@code envelope} and {@code report}, without a Spring context.
 *
 * <p>Rules of the package: the same engine and writers as the app ({@code ResultGeoJson}, the report
 * assembler), so the command line and the app give the same results; errors in one line, exit 2.
 */
package org.lpzplanner.cli;
