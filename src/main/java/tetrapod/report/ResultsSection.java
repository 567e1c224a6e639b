package tetrapod.report;

/** The analysis results as plots: leg base reactions, utilisation against azimuth, leg forces, histogram. */
final class ResultsSection implements Section {

    @Override
    public String id() {
        return "results";
    }

    @Override
    public String title() {
        return "Results";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        Results r = ri.results();
        out.element("h3", "Leg base reactions against azimuth");
        if (r.legSweeps().isEmpty()) {
            out.p("No wind sweep: the model has no combination with wind.");
        } else {
            out.p("Seen from above with x to the right and y up: the angle is the wind azimuth (the direction the "
                    + "wind blows towards), the distance from the centre the force. Each line is one leg base, its "
                    + "largest value over every combination at each azimuth of the sweep.");
            out.open("div", "class=\"polar-row\"");
            for (PolarCharts.Kind kind : PolarCharts.Kind.values()) {
                PolarCharts.legBases(r, kind).ifPresent(f -> ReportHtml.figure(out, f));
            }
            out.close("div");
        }
        Charts.utilisationByAzimuth(r).ifPresent(f -> {
            out.element("h3", "Largest utilisation against azimuth");
            ReportHtml.figure(out, f);
        });
        Charts.legAxialEnvelope(r).ifPresent(f -> {
            out.element("h3", "Leg axial forces against height");
            ReportHtml.figure(out, f);
        });
        out.element("h3", "Utilisation by member role");
        ReportHtml.figure(out, Charts.utilisationHistogram(r));
    }
}
