package tetrapod.view;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * The state behind the window, as plain Java: camera, case, colouring, toggles, picked member and
 * status line, changed by {@link ViewerAction}s, and the scene to draw for it. The window only feeds
 * it input and draws {@link #scene()} with {@link #camera()}. The x, y, z directions are drawn as an
 * inset triad (when the options ask for axes) instead of at the grid's corner, so that orbit and
 * zoom never lose them. A key that would change nothing leaves the state as it is and says why in
 * the status line. Not thread-safe.
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
    private final boolean triad;
    private String status = "";
    private Scene base;
    private Scene decorated;

    public ViewerSession(ViewData data, SceneOptions options, int width, int height) {
        this.data = data;
        this.triad = options.axes();
        this.options = options.withAxes(false);
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
        Optional<String> why = StatusMessages.whyNothing(action, data, options);
        if (why.isPresent()) {
            return say(why.get());
        }
        if (action instanceof ViewerAction.Snapshot || action instanceof ViewerAction.Close) {
            return false;  // the window's business
        }
        String before = status;
        status = "";
        boolean changed = change(action);
        return changed || !before.equals(status);
    }

    private boolean change(ViewerAction action) {
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
            List<String> unshown = new ArrayList<>();
            if (c != preferred) {
                unshown.add(StatusMessages.colouringNotShown(data.cases().get(index), preferred));
            }
            if (options.deformed()) {
                StatusMessages.deformedNotShown(data.cases().get(index)).ifPresent(unshown::add);
            }
            status = String.join("\n", unshown);
            rebuild();
        } else if (action instanceof ViewerAction.NextColouring) {
            List<Colouring> offered = data.colourings(options.caseIndex());
            preferred = offered.get((offered.indexOf(options.colouring()) + 1) % offered.size());
            options = options.withColouring(preferred);
            rebuild();
        } else if (action instanceof ViewerAction.UseColouring u) {
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
            OptionalInt before = picked;
            picked = Picking.memberAt(base, new Projector(camera, width, height), p.x(), p.y());
            decorated = null;
            if (picked.isEmpty() && before.isEmpty()) {
                status = StatusMessages.nothingPicked();
            }
        } else {
            return false;
        }
        return true;
    }

    private boolean say(String why) {
        if (why.equals(status)) {
            return false;
        }
        status = why;
        decorated = null;
        return true;
    }

    /** The status line: why the last key did nothing, or what the last change leaves unshown; "" for none. */
    public String status() {
        return status;
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

    /**
     * The scene to draw: the case's scene with the picked member highlighted and its description
     * away from the tower, the help, the status line above it, and the axis triad.
     */
    public Scene scene() {
        if (decorated == null) {
            List<SceneLabel> extra = new ArrayList<>();
            picked.ifPresent(m -> extra.add(new SceneLabel(MemberDescription.of(data, options.caseIndex(), m),
                    LabelStyle.INFO, new LabelAnchor.AwayFromTower(16))));
            if (help) {
                extra.add(new SceneLabel(InputMap.HELP, LabelStyle.HELP,
                        new LabelAnchor.AtCorner(LabelAnchor.Corner.BOTTOM_LEFT, 12)));
            }
            if (!status.isEmpty()) {
                extra.add(new SceneLabel(status, LabelStyle.STATUS,
                        new LabelAnchor.AtCorner(LabelAnchor.Corner.BOTTOM_LEFT, 12)));
            }
            Scene s = base.withLabels(extra).withAxisTriad(triad);
            if (picked.isPresent()) {
                s = s.withDecorations(PickHighlight.of(base.members(), picked.getAsInt()));
            }
            decorated = s;
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
