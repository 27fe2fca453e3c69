package org.tensio.engine.fatigue;

import java.util.ArrayList;
import java.util.List;

/**
 * The corrected endurance limit (or fatigue strength at a stated life) at a station:
 * Se = ka · kb · kc · kd · ke · kf · Se' (Marin's equation; Shigley's Mechanical Engineering Design, 9th/10th ed.,
 * Eq. 6-18, from memory), every factor with its value and source.
 *
 * @param basis   Se' (or Sf') before corrections, stress unit
 * @param factors ka, kb, kc, kd, ke, kf in that order
 * @param value   Se, stress unit
 * @since 0.1
 */
public record EnduranceLimit(Factor basis, List<Factor> factors, double value) {

    /** Copies the list. */
    public EnduranceLimit {
        factors = List.copyOf(factors);
    }

    /**
     * @param m                the material's fatigue data
     * @param c                the station's conditions (already merged over the material's)
     * @param size             the size factor kb ({@link EquivalentDiameter#sizeFactor})
     * @param mpaPerStressUnit MPa in one stress unit (the surface fit and the steel estimate are written in MPa)
     * @throws IllegalArgumentException naming the field when the surface finish is missing or a condition lies
     *                                  outside its fit
     */
    public static EnduranceLimit of(FatigueMaterial m, FatigueConditions c, Factor size, double mpaPerStressUnit) {
        if (c.surface() == null) {
            throw new IllegalArgumentException("surface: no surface finish for material '" + m.material()
                    + "' (give it in the fatigue material or the station, one of " + List.of(SurfaceFinish.values())
                    + ")");
        }
        double sutMpa = m.sut() * mpaPerStressUnit;
        Factor basis = switch (m.basis()) {
            case given -> new Factor("Se'", "endurance limit", m.strength(), "given");
            case steelEstimate -> {
                Factor f = MarinFactors.steelEnduranceEstimate(sutMpa);
                yield new Factor("Se'", f.name(), f.value() / mpaPerStressUnit, f.source());
            }
            case strengthAtCycles -> new Factor("Sf'", "fatigue strength at " + MarinFactors.n(m.cycles()) + " cycles",
                    m.strength(), "given (no endurance limit: the results hold for " + MarinFactors.n(m.cycles())
                            + " cycles)");
        };
        List<Factor> k = new ArrayList<>();
        k.add(MarinFactors.surface(c.surface(), sutMpa));
        k.add(size);
        k.add(MarinFactors.loadCombined());
        k.add(c.temperature() == null ? MarinFactors.roomTemperature() : MarinFactors.temperature(c.temperature()));
        k.add(c.reliability() == null ? MarinFactors.reliability(0.5) : MarinFactors.reliability(c.reliability()));
        k.add(MarinFactors.miscellaneous(c.miscellaneous() == null ? 1 : c.miscellaneous(), c.miscellaneous() != null));
        double v = basis.value();
        for (Factor f : k) {
            v *= f.value();
        }
        return new EnduranceLimit(basis, k, v);
    }

    /** @return the factor with this symbol ({@code ka} ... {@code kf}) */
    public Factor factor(String symbol) {
        for (Factor f : factors) {
            if (f.symbol().equals(symbol)) {
                return f;
            }
        }
        throw new IllegalArgumentException("symbol: no factor '" + symbol + "'");
    }
}
