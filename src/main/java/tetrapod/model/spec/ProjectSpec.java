package tetrapod.model.spec;

import java.util.Objects;

/**
 * What the calculation is filed under: the model file's {@code project} object, printed in the
 * report's title block. Each field is free text ("" when the file does not give it).
 *
 * @param project    the project's name or number
 * @param structure  the structure within the project, e.g. "tower T2"
 * @param revision   the revision of the calculation, e.g. "B"
 * @param date       the date of the revision as the user writes it (not checked as a date)
 * @param preparedBy who prepared the calculation
 * @param checkedBy  who checked it
 */
public record ProjectSpec(String project, String structure, String revision, String date, String preparedBy,
                          String checkedBy) {

    /** A model file without {@code project}. */
    public static final ProjectSpec NONE = new ProjectSpec("", "", "", "", "", "");

    public ProjectSpec {
        project = Objects.requireNonNullElse(project, "");
        structure = Objects.requireNonNullElse(structure, "");
        revision = Objects.requireNonNullElse(revision, "");
        date = Objects.requireNonNullElse(date, "");
        preparedBy = Objects.requireNonNullElse(preparedBy, "");
        checkedBy = Objects.requireNonNullElse(checkedBy, "");
    }

    public boolean isEmpty() {
        return equals(NONE);
    }
}
