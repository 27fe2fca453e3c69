package org.tensio.ui.editor.model;

import java.math.BigDecimal;

import com.google.gson.JsonElement;
import com.google.gson.JsonPrimitive;

/** Numbers as the editor writes them: integral values without a decimal point, others in shortest form. */
public final class JsonNumbers {

    private JsonNumbers() {
    }

    /**
     * @return {@code value} as a JSON number
     * @throws IllegalArgumentException when {@code value} is not finite (JSON has no NaN or infinity)
     */
    public static JsonPrimitive of(double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value: " + value + " is not a finite number");
        }
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return new JsonPrimitive((long) value);
        }
        return new JsonPrimitive(new BigDecimal(Double.toString(value)).stripTrailingZeros());
    }

    /** @return the number held by {@code e}, or {@code fallback} when it is not a JSON number */
    public static double value(JsonElement e, double fallback) {
        if (e != null && e.isJsonPrimitive() && e.getAsJsonPrimitive().isNumber()) {
            return e.getAsDouble();
        }
        return fallback;
    }
}
