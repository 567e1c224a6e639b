package tetrapod.report;

import java.util.ArrayList;
import java.util.List;

/** A table of the report: a caption, header cells that carry their unit, and rows of cells. */
final class Table {

    /** One cell: its text, an optional CSS class ("num", "over", "default", ...) and an optional id. */
    record Cell(String text, String cssClass, String id) {
        static Cell of(String text) {
            return new Cell(text, "", "");
        }

        static Cell num(String text) {
            return new Cell(text, "num", "");
        }

        /** A load case id, kept on one line. */
        static Cell caseId(String caseId) {
            return new Cell(SummarySection.caseText(caseId), "case", "");
        }

        /** A utilisation: right-aligned, marked when above 1. */
        static Cell utilisation(double u, String id) {
            return new Cell(Format.utilisation(u), u > 1.0 ? "num over" : "num", id);
        }

        Cell withId(String newId) {
            return new Cell(text, cssClass, newId);
        }

        Cell withClass(String more) {
            return new Cell(text, (cssClass + " " + more).strip(), id);
        }
    }

    private final String id;
    private final String caption;
    private final List<String> header;
    private final List<List<Cell>> rows = new ArrayList<>();

    Table(String id, String caption, List<String> header) {
        this.id = id;
        this.caption = caption;
        this.header = List.copyOf(header);
    }

    Table row(List<Cell> cells) {
        if (cells.size() != header.size()) {
            throw new IllegalArgumentException("table " + id + ": " + cells.size() + " cells for " + header.size()
                    + " columns");
        }
        rows.add(List.copyOf(cells));
        return this;
    }

    Table row(Cell... cells) {
        return row(List.of(cells));
    }

    boolean isEmpty() {
        return rows.isEmpty();
    }

    void writeTo(Html out) {
        out.open("table", id.isEmpty() ? "" : Html.attr("id", id));
        if (!caption.isEmpty()) {
            out.element("caption", caption);
        }
        out.open("thead").open("tr");
        for (String h : header) {
            out.element("th", "scope=\"col\"", h);
        }
        out.close("tr").close("thead").open("tbody");
        for (List<Cell> row : rows) {
            out.open("tr");
            for (Cell c : row) {
                String attrs = (c.cssClass().isEmpty() ? "" : Html.attr("class", c.cssClass()))
                        + (c.id().isEmpty() ? "" : (c.cssClass().isEmpty() ? "" : " ") + Html.attr("id", c.id()));
                out.element("td", attrs, c.text());
            }
            out.close("tr");
        }
        out.close("tbody").close("table");
    }
}
