package org.lpzplanner.engine.risk;

/**
 * The user's choices for the risk of loss of human life due to flashes to the structure.
 *
 * @param dangerousEventsPerYear N_D, see {@link DangerousEvents#perYear()}
 * @param surface ground or floor surface near the structure (r_t)
 * @param fireRisk risk of fire (r_f)
 * @param fireProvisions provisions against fire (r_p)
 * @param specialHazard special hazard to people (h_z)
 * @param use type of structure (L_T, L_F)
 * @param touchStep measures against touch and step voltage (P_TA)
 * @param occupancy persons and hours present (n_z/n_t · t_z/8760)
 */
public record LifeRiskInputs(double dangerousEventsPerYear, SurfaceType surface, FireRisk fireRisk,
        FireProvisions fireProvisions, SpecialHazard specialHazard, StructureUse use, TouchStepProtection touchStep,
        Occupancy occupancy) {

    public LifeRiskInputs {
        if (!(dangerousEventsPerYear >= 0) || Double.isInfinite(dangerousEventsPerYear)) {
            throw new IllegalArgumentException("dangerous events per year must be a finite number >= 0, got " + dangerousEventsPerYear);
        }
        if (surface == null || fireRisk == null || fireProvisions == null || specialHazard == null || use == null
                || touchStep == null || occupancy == null) {
            throw new IllegalArgumentException("every risk factor must be chosen (surface, fire risk, fire provisions, "
                    + "special hazard, structure use, touch and step protection, occupancy)");
        }
    }

    /** L_A = r_t · L_T · n_z/n_t · t_z/8760 [IEC 62305-2:2010 Annex C]. */
    public double lossByTouchAndStepVoltage() {
        return surface.rt() * use.lt() * occupancy.fraction();
    }

    /** L_B = r_p · r_f · h_z · L_F · n_z/n_t · t_z/8760 [IEC 62305-2:2010 Annex C]. */
    public double lossByPhysicalDamage() {
        return fireProvisions.rp() * fireRisk.rf() * specialHazard.hz() * use.lf() * occupancy.fraction();
    }
}
