package org.tensio.engine.verification;

/**
 * One published check case as its fixture defines it (data only; {@link VerificationRunner} computes it).
 * Units throughout: mm, N, MPa; angles in degrees.
 *
 * @param id                     unique id, e.g. {@code closed.rectangle.Ixx}
 * @param family                 the fixture's family, e.g. {@code closed-form}
 * @param fixture                the fixture's resource name, e.g. {@code verification/closed-form.txt}
 * @param line                   the line of the case in the fixture, 1-based
 * @param section                the section's name in the fixture
 * @param sectionDefinition      the section as the fixture writes it (shape, parameters, placement, material)
 * @param quantity               the quantity as the fixture writes it, e.g. {@code Ixx} or
 *                               {@code stress.tauZY(x=0,y=0,Vy=1e4,shear=elementary)}
 * @param description            what the quantity is (and, for stresses, where and under which load)
 * @param unit                   the quantity's unit
 * @param referenceFormula       the reference as the fixture writes it (formula or table value)
 * @param reference              the reference value, unit {@code unit}
 * @param tolerance              what the case accepts
 * @param toleranceJustification why that tolerance
 * @param source                 where the reference comes from: book, edition, table or equation; "from memory"
 *                               where recalled
 * @since 0.1
 */
public record VerificationCase(String id, String family, String fixture, int line, String section,
        String sectionDefinition, String quantity, String description, String unit, String referenceFormula,
        double reference, Tolerance tolerance, String toleranceJustification, String source) {

    /** Rejects null or blank texts, a non-finite reference and a null tolerance; messages name the case and field. */
    public VerificationCase {
        String[] texts = {id, family, fixture, section, sectionDefinition, quantity, description, unit,
            referenceFormula, toleranceJustification, source};
        String[] names = {"id", "family", "fixture", "section", "sectionDefinition", "quantity", "description", "unit",
            "referenceFormula", "toleranceJustification", "source"};
        for (int i = 0; i < texts.length; i++) {
            if (texts[i] == null || texts[i].isBlank()) {
                throw new IllegalArgumentException("verification case '" + id + "': " + names[i] + " must not be empty");
            }
        }
        if (!Double.isFinite(reference)) {
            throw new IllegalArgumentException("verification case '" + id + "': reference must be finite, got " + reference);
        }
        if (tolerance == null) {
            throw new IllegalArgumentException("verification case '" + id + "': tolerance must not be null");
        }
    }
}
