package org.tensio.engine.checks;

import java.util.IdentityHashMap;
import java.util.Map;

import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;

/** One {@link UnitStressField} per section instance for the life of one operation. Not thread-safe. */
final class FieldCache {

    private final SectionAnalysisService engine;
    private final Map<Section, UnitStressField> fields = new IdentityHashMap<>();

    FieldCache(SectionAnalysisService engine) {
        if (engine == null) {
            throw new IllegalArgumentException("engine must not be null");
        }
        this.engine = engine;
    }

    UnitStressField of(Section s) {
        UnitStressField f = fields.get(s);
        if (f == null) {
            f = UnitStressField.of(s, engine.properties(s), engine.solution(s));
            fields.put(s, f);
        }
        return f;
    }
}
