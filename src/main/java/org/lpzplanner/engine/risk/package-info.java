/**
 * Which protection level a structure needs: collection area, expected dangerous events and the
 * risk of loss of human life (R1) due to flashes to the structure and to its incoming lines,
 * following IEC 62305-2:2010.
 *
 * <p>Rules of the package: plain Java and JTS only; every factor carries its source (standard and
 * table); values recalled rather than derived are marked "[from memory — check against the
 * standard]" where they are defined. R1 = R_A + R_B + R_U + R_V: the whole R1 for structures
 * without a risk of explosion and where no failure of internal systems immediately endangers life;
 * for those (R_C, R_M, R_W and R_Z also count) the estimate refuses ({@link
 * org.lpzplanner.engine.risk.OutsideEstimate}).
 */
package org.lpzplanner.engine.risk;
