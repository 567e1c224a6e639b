package tetrapod.model.spec;

/** A section defined in the model file. Dimensions in mm, properties in cm² and cm⁴. */
public sealed interface UserSectionSpec
        permits UserSectionSpec.Angle, UserSectionSpec.Tube, UserSectionSpec.Properties {

    /** An angle by its dimensions, mm: legs a ≥ b, thickness t, root radius r1, toe radius r2. */
    record Angle(double legA, double legB, double t, double r1, double r2) implements UserSectionSpec { }

    /** A round tube by its outside diameter and wall thickness, mm. */
    record Tube(double d, double t) implements UserSectionSpec { }

    /**
     * A section by its properties: A (cm²), Iy, Iz, J (cm⁴), minor principal Iv (cm⁴), the width
     * it presents to wind (mm) and whether it is flat-sided; mass (kg/m) from A and the density
     * when NaN.
     */
    record Properties(double area, double iy, double iz, double iv, double torsion, double width,
                      boolean flatSided, double massPerMetre) implements UserSectionSpec { }
}
