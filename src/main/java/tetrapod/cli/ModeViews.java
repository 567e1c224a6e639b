package tetrapod.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import tetrapod.analysis.NaturalMode;
import tetrapod.model.Frame;
import tetrapod.model.Vec3;
import tetrapod.view.Colouring;
import tetrapod.view.NodeVector;
import tetrapod.view.ViewCase;
import tetrapod.view.ViewData;

/** A natural mode as a picture: its shape as the displacements of one case, drawn deformed (render --mode). */
final class ModeViews {

    private ModeViews() { }

    static ViewData of(Frame frame, NaturalMode mode) {
        List<NodeVector> shape = new ArrayList<>(frame.nodes().size());
        double[] phi = mode.shape();
        for (int k = 0; k < frame.nodes().size(); k++) {
            shape.add(new NodeVector(frame.nodes().get(k).id(), new Vec3(phi[6 * k], phi[6 * k + 1], phi[6 * k + 2])));
        }
        String name = String.format(Locale.ROOT, "mode %d: %.3f Hz, %s%s", mode.number(), mode.frequencyHz(),
                mode.kind().label(), mode.swayDirectionDeg() == null ? ""
                        : String.format(Locale.ROOT, " along %d°", Math.round(mode.swayDirectionDeg()) % 180));
        ViewCase c = ViewCase.shape(name, shape);
        return new ViewData(frame, List.of(c), Colouring.ROLE);
    }
}
