package tetrapod.load;

import java.util.ArrayList;
import java.util.List;
import tetrapod.common.Units;
import tetrapod.generate.Panel;
import tetrapod.generate.Tower;
import tetrapod.model.Face;
import tetrapod.model.NodeForce;
import tetrapod.model.spec.AncillarySpec;

/**
 * The items a tower carries, in SI: their weight, the ice on them and what they show the wind.
 * A point item acts at its height; a linear item is cut at the panel levels and each piece acts at
 * its mid-height. Each load goes to the legs of the panel it is in ({@link Attachments}).
 */
public final class Ancillaries {

    private final Tower tower;
    private final List<AncillarySpec> items;

    private Ancillaries(Tower tower, List<AncillarySpec> items) {
        this.tower = tower;
        this.items = List.copyOf(items);
    }

    /**
     * The items of a generated tower, as the spec gives them (kN, kN/m, m, m²).
     *
     * @throws IllegalArgumentException when an item lies outside the tower (the reader reports that first)
     */
    public static Ancillaries of(Tower tower, List<AncillarySpec> items) {
        for (AncillarySpec item : items) {
            double low = item instanceof AncillarySpec.Linear l ? l.from() : ((AncillarySpec.Point) item).height();
            double high = item instanceof AncillarySpec.Linear l ? l.to() : low;
            if (low < 0 || high > tower.height() + 1e-9) {
                throw new IllegalArgumentException("ancillary '" + item.name() + "' is outside the tower");
            }
        }
        return new Ancillaries(tower, items);
    }

    public List<AncillarySpec> items() {
        return items;
    }

    /** A piece of an item at one height: its length (1 for a point item) and mid-height. */
    private record Piece(int item, AncillarySpec spec, double z, double length, Face face) { }

    private List<Piece> pieces() {
        List<Piece> pieces = new ArrayList<>();
        for (int k = 0; k < items.size(); k++) {
            AncillarySpec item = items.get(k);
            if (item instanceof AncillarySpec.Point p) {
                pieces.add(new Piece(k, p, p.height(), 1, p.face()));
            } else {
                AncillarySpec.Linear l = (AncillarySpec.Linear) item;
                for (Panel panel : tower.panels()) {
                    double a = Math.max(l.from(), panel.zBottom());
                    double b = Math.min(l.to(), panel.zTop());
                    if (b - a > 1e-9) {
                        pieces.add(new Piece(k, l, (a + b) / 2, b - a, l.face()));
                    }
                }
            }
        }
        return pieces;
    }

    /** The items' own weight, N (−z), merged by node in ascending node id. */
    public List<NodeForce> weights() {
        NodalLoads sum = new NodalLoads();
        for (Piece p : pieces()) {
            double w = p.spec instanceof AncillarySpec.Point pt ? pt.weight() * Units.KN
                    : ((AncillarySpec.Linear) p.spec).weight() * Units.KN * p.length;
            sum.add(Attachments.at(tower, p.z, p.face), 0, 0, -w);
        }
        return sum.toList();
    }

    /** The weight of the ice on the items, N (−z): ASCE 7 (10.4-2) on point items, (10.4-1) on linear ones. */
    public List<NodeForce> iceWeights(Asce7Ice ice) {
        NodalLoads sum = new NodalLoads();
        if (ice.isNone()) {
            return List.of();
        }
        for (Piece p : pieces()) {
            double w = p.spec instanceof AncillarySpec.Point pt ? ice.itemWeight(pt.area(), p.z)
                    : ice.weightPerMetre(((AncillarySpec.Linear) p.spec).width(), p.z) * p.length;
            sum.add(Attachments.at(tower, p.z, p.face), 0, 0, -w);
        }
        return sum.toList();
    }

    /** What the items show the wind, bare or with ice. */
    public List<WindPoint> windPoints(Asce7Ice ice) {
        List<WindPoint> points = new ArrayList<>();
        for (Piece p : pieces()) {
            double area;
            double cf;
            double shielding;
            if (p.spec instanceof AncillarySpec.Point pt) {
                area = ice.icedArea(pt.area(), p.z);
                cf = pt.forceCoefficient();
                shielding = pt.shielding();
            } else {
                AncillarySpec.Linear l = (AncillarySpec.Linear) p.spec;
                area = ice.icedWidth(l.width(), p.z) * p.length;
                cf = l.forceCoefficient();
                shielding = l.shielding();
            }
            double effective = cf * area * (1 - shielding);
            if (effective > 0) {
                points.add(new WindPoint(p.item, p.spec.name(), p.z, effective, Attachments.at(tower, p.z, p.face)));
            }
        }
        return List.copyOf(points);
    }
}
