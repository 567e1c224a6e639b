package tetrapod.view;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import tetrapod.generate.TowerGenerator;
import tetrapod.io.SpecReader;
import tetrapod.model.Frame;
import tetrapod.model.Member;
import tetrapod.model.Role;
import tetrapod.model.spec.TowerSpec;
import tetrapod.section.SectionCatalogue;
import tetrapod.section.SteelGrades;

/** Frames and view data for the view tests. */
final class ViewFixtures {

    private ViewFixtures() { }

    /** The frame of one of the example models in models/. */
    static Frame frame(String model) {
        try {
            TowerSpec spec = SpecReader.read(Path.of("models", model), SectionCatalogue.standard());
            return TowerGenerator.generate(spec, SectionCatalogue.standard().with(spec.userSections()),
                    SteelGrades.fromSpec(spec.material())).frame();
        } catch (Exception e) {
            throw new AssertionError("cannot build " + model, e);
        }
    }

    static Frame ridge() {
        return frame("ridge-lookout-square.json");
    }

    /** Every member at {@code base} utilisation except {@code over}, which is at {@code overValue}. */
    static ViewData utilisation(Frame frame, double base, int over, double overValue) {
        double[] u = new double[frame.members().size()];
        Arrays.fill(u, base);
        u[over] = overValue;
        ViewCase c = new ViewCase("test case", OptionalDouble.of(30), Map.of(Colouring.UTILISATION, MemberScalars.of(u)),
                List.of(), List.of(), List.of());
        return new ViewData(frame, List.of(c), Colouring.UTILISATION);
    }

    /** Indices of the members with {@code role}. */
    static List<Integer> withRole(Frame frame, Role role) {
        List<Integer> list = new ArrayList<>();
        for (int k = 0; k < frame.members().size(); k++) {
            Member m = frame.members().get(k);
            if (m.role() == role) {
                list.add(k);
            }
        }
        return list;
    }
}
