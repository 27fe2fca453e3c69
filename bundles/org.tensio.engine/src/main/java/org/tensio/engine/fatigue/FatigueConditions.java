package org.tensio.engine.fatigue;

/**
 * The service conditions that correct the endurance limit: surface finish, reliability, temperature and
 * miscellaneous effects. Each may be absent (null): a station's conditions override its material's
 * ({@link #over}); what is absent in both takes the default of {@link EnduranceLimit}: reliability 50 %
 * (ke = 1), room temperature (kd = 1), no miscellaneous effects (kf = 1). The surface finish has no default.
 *
 * @param surface       surface finish, or null
 * @param reliability   one of {@link MarinFactors#RELIABILITIES}, or null
 * @param temperature   operating temperature, °C, or null
 * @param miscellaneous miscellaneous-effects factor &gt; 0, or null
 * @since 0.1
 */
public record FatigueConditions(SurfaceFinish surface, Double reliability, Double temperature, Double miscellaneous) {

    /** Nothing given. */
    public static final FatigueConditions NONE = new FatigueConditions(null, null, null, null);

    /** @return these conditions, with the absent ones taken from {@code base} */
    public FatigueConditions over(FatigueConditions base) {
        return new FatigueConditions(surface != null ? surface : base.surface,
                reliability != null ? reliability : base.reliability,
                temperature != null ? temperature : base.temperature,
                miscellaneous != null ? miscellaneous : base.miscellaneous);
    }
}
