package tetrapod.view;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalInt;

/**
 * The state behind the window, as plain Java: camera, case, colouring, toggles and picked member,
 * changed by {@link ViewerAction}s, and the scene to draw for it. The window only feeds it input
 * and draws {@link #scene()} with {@link #camera()}. Not thread-safe.
 */
public final class ViewerSession {

    private final ViewData data;
    private int width;
    private int height;
    private SceneOptions options;
    /** The colouring last chosen: shown whenever the current case offers it, else role. */
    private Colouring preferred;
    private Camera camera;
    private OptionalInt picked = OptionalInt.empty();
    private boolean help = true;
    private Scene base;
    private Scene decorated;

    public ViewerSession(ViewData data, SceneOptions options, int width, int height) {
        this.data = data;
        this.options = options;
        this.preferred = options.colouring();
        resize(width, height);
        rebuild();
        camera = framing();
    }

    /** The viewport changed size (px). */
    public void resize(int w, int h) {
        width = Math.max(1, w);
        height = Math.max(1, h);
        decorated = null;
    }

    /** Applies an action; returns whether the picture changed. Snapshot and Close are the window's. */
    public boolean apply(ViewerAction action) {
        if (action instanceof ViewerAction.Orbit o) {
            camera = camera.orbit(o.dYaw(), o.dPitch());
        } else if (action instanceof ViewerAction.Pan p) {
            camera = camera.pan(p.dxPx(), p.dyPx(), height);
        } else if (action instanceof ViewerAction.Zoom z) {
            camera = camera.zoom(z.factor());
        } else if (action instanceof ViewerAction.StepCase s) {
            int index = Math.floorMod(options.caseIndex() + s.step(), data.cases().size());
            Colouring c = data.cases().get(index).offers(preferred) ? preferred : Colouring.ROLE;
            options = options.withCase(index).withColouring(c);
            rebuild();
        } else if (action instanceof ViewerAction.NextColouring) {
            List<Colouring> offered = data.colourings(options.caseIndex());
            preferred = offered.get((offered.indexOf(options.colouring()) + 1) % offered.size());
            options = options.withColouring(preferred);
            rebuild();
        } else if (action instanceof ViewerAction.UseColouring u) {
            if (!data.cases().get(options.caseIndex()).offers(u.colouring()) || u.colouring() == options.colouring()) {
                return false;
            }
            preferred = u.colouring();
            options = options.withColouring(preferred);
            rebuild();
        } else if (action instanceof ViewerAction.ToggleDeformed) {
            options = options.withDeformed(!options.deformed());
            rebuild();
        } else if (action instanceof ViewerAction.ToggleGrid) {
            options = options.withGrid(!options.grid());
            rebuild();
        } else if (action instanceof ViewerAction.ToggleHelp) {
            help = !help;
            decorated = null;
        } else if (action instanceof ViewerAction.ResetCamera) {
            camera = framing();
        } else if (action instanceof ViewerAction.Pick p) {
            picked = Picking.memberAt(base, new Projector(camera, width, height), p.x(), p.y());
            decorated = null;
        } else {
            return false;  // Snapshot, Close: the window's business
        }
        return true;
    }

    public Camera camera() {
        return camera;
    }

    public SceneOptions options() {
        return options;
    }

    public OptionalInt picked() {
        return picked;
    }

    public int width() {
        return width;
    }

    public int height() {
        return height;
    }

    /** The scene to draw: the case's scene with the picked member's description and the help. */
    public Scene scene() {
        if (decorated == null) {
            List<SceneLabel> extra = new ArrayList<>();
            picked.ifPresent(m -> extra.add(new SceneLabel(MemberDescription.of(data, options.caseIndex(), m),
                    LabelStyle.INFO, new LabelAnchor.AtCorner(LabelAnchor.Corner.BOTTOM_RIGHT, 16))));
            if (help) {
                extra.add(new SceneLabel(InputMap.HELP, LabelStyle.HELP,
                        new LabelAnchor.AtCorner(LabelAnchor.Corner.BOTTOM_LEFT, 12)));
            }
            decorated = base.withLabels(extra);
        }
        return decorated;
    }

    private void rebuild() {
        base = SceneBuilder.build(data, options);
        decorated = null;
    }

    private Camera framing() {
        return Camera.framing(base.bounds(), width, height, Camera.DEFAULT_YAW, Camera.DEFAULT_PITCH);
    }
}
