package tetrapod.model.spec;

import java.util.Objects;
import tetrapod.model.Face;

/**
 * An item carried by the tower, in file units (m, kN, m²). Its load goes to the legs of the panel
 * it is in: of the face it is on, or of all four legs when {@code face} is {@link Face#NONE}.
 */
public sealed interface AncillarySpec permits AncillarySpec.Point, AncillarySpec.Linear {

    String name();

    Face face();

    /**
     * An item at one height: antenna, dish, platform, light, equipment.
     *
     * @param height           height of its centre above the base, m
     * @param weight           kN
     * @param area             projected area facing the wind, m²
     * @param forceCoefficient force coefficient of the item (dimensionless)
     * @param shielding        fraction of its wind force taken off for shielding, 0 ≤ s < 1
     */
    record Point(String name, double height, double weight, double area, double forceCoefficient,
                 double shielding, Face face) implements AncillarySpec {
        public Point {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(face, "face");
        }
    }

    /**
     * An item running up the tower: ladder, cable tray, feeder.
     *
     * @param from             bottom height, m
     * @param to               top height, m
     * @param weight           kN/m
     * @param width            width facing the wind (projected area per metre), m
     * @param forceCoefficient force coefficient (dimensionless)
     * @param shielding        fraction of its wind force taken off for shielding, 0 ≤ s < 1
     */
    record Linear(String name, double from, double to, double weight, double width, double forceCoefficient,
                  double shielding, Face face) implements AncillarySpec {
        public Linear {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(face, "face");
        }
    }
}
