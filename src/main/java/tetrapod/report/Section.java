package tetrapod.report;

/** One numbered section of the report. */
sealed interface Section permits SummarySection, InputSection, WindSection, ResultsSection, MemberChecksSection,
        RequirementsSection, FoundationsSection, NaturalModesSection, ServiceabilitySection, SizingSection, HandMethodSection, MethodNotesSection,
        CautionsSection, SourcesSection, AppendixSection {

    /** The id of the section's element, e.g. {@code summary}. */
    String id();

    String title();

    /** Writes the section's content (its heading is written by the caller). */
    void write(Html out, ReportInput input);
}
