package org.lpzplanner.engine.risk;

import java.util.ArrayList;
import java.util.List;

/**
 * The user's choices for the risk of loss of human life due to flashes to the structure and to
 * its incoming lines.
 *
 * @param events         N_G, A_D and C_D, giving N_D ({@link DangerousEvents#perYear()}); N_G also gives N_L
 * @param surface        ground or floor surface where people stand (r_t), outside near the
 *                       down-conductors (L_A) and inside where lines enter (L_U)
 * @param fireRisk       risk of fire (r_f)
 * @param fireProvisions provisions against fire (r_p)
 * @param specialHazard  special hazard to people (h_z)
 * @param use            type of structure (L_T, L_F)
 * @param touchStep      measures against touch and step voltage near the down-conductors (P_TA)
 * @param occupancy      persons and hours present (n_z/n_t · t_z/8760)
 * @param lines          the incoming lines, none for a structure without any
 * @param lifeCriticalSystems whether a failure of internal systems immediately endangers life
 */
public record LifeRiskInputs(DangerousEvents events, SurfaceType surface, FireRisk fireRisk,
        FireProvisions fireProvisions, SpecialHazard specialHazard, StructureUse use, TouchStepProtection touchStep,
        Occupancy occupancy, List<IncomingLine> lines, boolean lifeCriticalSystems) {

    public LifeRiskInputs {
        if (events == null || surface == null || fireRisk == null || fireProvisions == null || specialHazard == null
                || use == null || touchStep == null || occupancy == null || lines == null) {
            throw new IllegalArgumentException("every risk factor must be chosen (dangerous events, surface, fire risk,"
                    + " fire provisions, special hazard, structure use, touch and step protection, occupancy, lines)");
        }
        lines = List.copyOf(lines);
    }

    /** N_D per year. */
    public double dangerousEventsPerYear() {
        return events.perYear();
    }

    /** N_G in flashes per km² per year. */
    public double flashDensity() {
        return events.flashDensity();
    }

    /**
     * L_A = L_U = r_t · L_T · n_z/n_t · t_z/8760 [IEC 62305-2:2010 Annex C; L_U with the floor's r_t,
     * here the one surface the user chose].
     */
    public double lossByTouchAndStepVoltage() {
        return surface.rt() * use.lt() * occupancy.fraction();
    }

    /** L_B = L_V = r_p · r_f · h_z · L_F · n_z/n_t · t_z/8760 [IEC 62305-2:2010 Annex C]. */
    public double lossByPhysicalDamage() {
        return fireProvisions.rp() * fireRisk.rf() * specialHazard.hz() * use.lf() * occupancy.fraction();
    }

    /** The reasons this estimate cannot give R1 for the structure; empty when it can. */
    public List<OutsideEstimate> outsideEstimate() {
        List<OutsideEstimate> out = new ArrayList<>();
        if (fireRisk == FireRisk.EXPLOSION) {
            out.add(OutsideEstimate.EXPLOSION_RISK);
        }
        if (lifeCriticalSystems) {
            out.add(OutsideEstimate.LIFE_CRITICAL_SYSTEMS);
        }
        return out;
    }
}
