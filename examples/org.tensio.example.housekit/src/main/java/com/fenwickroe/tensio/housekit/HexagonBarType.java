package com.fenwickroe.tensio.housekit;

import java.util.List;
import java.util.Map;

import org.tensio.engine.profile.ProfileDef;
import org.tensio.engine.spi.ProfileType;

/** Registers {@link HexagonBarProfile}: {@code acrossFlats} required, {@code boreDiameter} optional (0: solid). */
public final class HexagonBarType implements ProfileType {

    @Override
    public String type() {
        return HexagonBarProfile.TYPE;
    }

    @Override
    public List<String> parameterNames() {
        return List.of("acrossFlats", "boreDiameter");
    }

    @Override
    public List<String> requiredParameterNames() {
        return List.of("acrossFlats");
    }

    @Override
    public ProfileDef create(Map<String, Double> parameters) {
        return new HexagonBarProfile(parameters.get("acrossFlats"), parameters.getOrDefault("boreDiameter", 0.0));
    }
}
