/**
 * Which protection level a structure needs: collection area, expected dangerous events and the
 * risk of loss of human life (R1) due to flashes to the structure, following IEC 62305-2:2010.
 *
 * <p>Rules of the package: plain Java and JTS only; every factor carries its source (standard and
 * table); values recalled rather than derived are marked "[from memory — check against the
 * standard]" where they are defined. Only the components due to flashes to the structure (R_A and
 * R_B) are estimated; flashes near the structure, to lines or near lines are outside this package.
 */
package org.lpzplanner.engine.risk;
