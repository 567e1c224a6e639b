package tetrapod.io;

import java.util.List;
import tetrapod.model.spec.ProjectSpec;

/** Reads the model file's {@code project} object: the title block's free-text fields, each optional. */
final class ProjectReader {

    static final List<String> KEYS = List.of("project", "structure", "revision", "date", "preparedBy", "checkedBy");

    private ProjectReader() { }

    /** The project, or {@link ProjectSpec#NONE} when {@code fields} is null (no {@code project} in the file). */
    static ProjectSpec read(Fields fields) {
        if (fields == null) {
            return ProjectSpec.NONE;
        }
        fields.allowOnly(KEYS);
        return new ProjectSpec(fields.optionalText("project", ""), fields.optionalText("structure", ""),
                fields.optionalText("revision", ""), fields.optionalText("date", ""),
                fields.optionalText("preparedBy", ""), fields.optionalText("checkedBy", ""));
    }

    /** The project as plain values, only the fields given (none: an empty map). */
    static java.util.Map<String, Object> toMap(ProjectSpec p) {
        java.util.Map<String, Object> m = new java.util.LinkedHashMap<>();
        List<String> values = List.of(p.project(), p.structure(), p.revision(), p.date(), p.preparedBy(), p.checkedBy());
        for (int k = 0; k < KEYS.size(); k++) {
            if (!values.get(k).isEmpty()) {
                m.put(KEYS.get(k), values.get(k));
            }
        }
        return m;
    }
}
