package tetrapod.report;

/** What these results are and are not. */
final class CautionsSection implements Section {

    @Override
    public String id() {
        return "cautions";
    }

    @Override
    public String title() {
        return "Cautions";
    }

    @Override
    public void write(Html out, ReportInput ri) {
        out.open("ul", "class=\"cautions\"");
        out.element("li", "These results are for checking by a qualified engineer against the codes that apply "
                + "where the tower stands.");
        out.element("li", "Tetrapod does not certify compliance with any code or standard, and this report is not "
                + "a certificate.");
        out.element("li", "The results are only as good as the model: geometry, sections, connections, loads, "
                + "combinations and every default listed under Input and assumptions must be confirmed for the "
                + "actual structure.");
        out.element("li", "Not covered: second-order and dynamic effects, fatigue, connections other than the bolt "
                + "checks shown, gusset plates, block tearing, and the design of the foundations beyond the checks "
                + "shown.");
        out.close("ul");
    }
}
