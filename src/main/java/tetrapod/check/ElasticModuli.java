package tetrapod.check;

import java.util.Optional;
import tetrapod.model.Section;
import tetrapod.model.SectionProperties;
import tetrapod.model.SectionShape;

/**
 * Elastic section moduli about the principal axes u–u (local y) and v–v (local z), m³: from the
 * extreme fibres of an angle, or I/(D/2) for a round tube. Sections given only by their
 * properties have none (their fibre distances are unknown).
 */
record ElasticModuli(double u, double v) {

    static Optional<ElasticModuli> of(Section section) {
        SectionProperties p = section.properties();
        if (section.shape() instanceof SectionShape.Angle angle) {
            AngleGeometry g = new AngleGeometry(angle, p);
            return Optional.of(new ElasticModuli(g.elasticModulusU(), g.elasticModulusV()));
        }
        if (section.shape() instanceof SectionShape.Tube tube) {
            return Optional.of(new ElasticModuli(p.iu() / (tube.d() / 2), p.iv() / (tube.d() / 2)));
        }
        return Optional.empty();
    }
}
