package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.lwjgl.glfw.GLFW.*;

import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import tetrapod.model.Frame;
import tetrapod.model.Vec3;

/** Key and mouse input through the input map into the viewer's camera and state. */
class ViewerSessionTest {

    private static final int W = 1200;
    private static final int H = 900;
    private final Frame frame = ViewFixtures.ridge();

    private ViewData threeAzimuths() {
        int n = frame.members().size();
        List<ViewCase> cases = new java.util.ArrayList<>();
        for (double az : new double[] {0, 45, 90}) {
            double[] u = new double[n];
            Arrays.fill(u, az / 100);
            cases.add(new ViewCase("wind " + az, OptionalDouble.of(az),
                    Map.of(Colouring.UTILISATION, MemberScalars.of(u), Colouring.AXIAL, MemberScalars.of(new double[n])),
                    List.of(), List.of(), List.of()));
        }
        return new ViewData(frame, cases, Colouring.UTILISATION);
    }

    private ViewerSession session(ViewData data) {
        return new ViewerSession(data, SceneOptions.defaults(data), W, H);
    }

    @Test
    void arrowKeysTurnTheCameraByTheirStep() {
        ViewerSession s = session(threeAzimuths());
        InputMap input = new InputMap();
        Camera before = s.camera();
        s.apply(input.key(GLFW_KEY_RIGHT, 0).orElseThrow());
        s.apply(input.key(GLFW_KEY_UP, 0).orElseThrow());
        assertEquals(before.yaw() + InputMap.ORBIT_STEP, s.camera().yaw(), 1e-12);
        assertEquals(before.pitch() + InputMap.ORBIT_STEP, s.camera().pitch(), 1e-12);
        assertEquals(before.distance(), s.camera().distance(), 1e-12);
        SceneBuilderTest.assertClose(before.target(), s.camera().target());
    }

    @Test
    void panningMovesTheSceneWithTheCursor() {
        ViewerSession s = session(threeAzimuths());
        InputMap input = new InputMap();
        Vec3 target = s.camera().target();
        input.press(GLFW_MOUSE_BUTTON_RIGHT, 0, 600, 450);
        s.apply(input.move(680, 420).orElseThrow());
        input.release(GLFW_MOUSE_BUTTON_RIGHT, 680, 420);
        // the old target (at the screen centre before) now appears where the cursor went: (+80, −30) px
        double[] xy = new double[4];
        new Projector(s.camera(), W, H).project(target.x(), target.y(), target.z(), xy);
        assertEquals(W / 2.0 + 80, xy[0], 0.05);
        assertEquals(H / 2.0 - 30, xy[1], 0.05);
    }

    @Test
    void theWheelAndKeysZoomAndResetFramesAgain() {
        ViewerSession s = session(threeAzimuths());
        InputMap input = new InputMap();
        Camera framed = s.camera();
        s.apply(input.scroll(1).orElseThrow());
        assertEquals(framed.distance() * InputMap.ZOOM_STEP, s.camera().distance(), 1e-9);
        s.apply(input.key(GLFW_KEY_MINUS, 0).orElseThrow());
        assertEquals(framed.distance(), s.camera().distance(), 1e-9);
        s.apply(new ViewerAction.Orbit(1, 0.3));
        s.apply(input.key(GLFW_KEY_R, 0).orElseThrow());
        assertEquals(framed, s.camera());
    }

    @Test
    void bracketsStepThroughTheAzimuthsAndWrap() {
        ViewerSession s = session(threeAzimuths());
        InputMap input = new InputMap();
        s.apply(input.key(GLFW_KEY_RIGHT_BRACKET, 0).orElseThrow());
        assertEquals(1, s.options().caseIndex());
        assertTrue(s.scene().labels().stream().anyMatch(l -> l.text().equals("wind 45°")));
        // the colours follow the case: utilisation 0.45 everywhere
        assertEquals(new UtilisationScale().colour(0.45), s.scene().members().colour(0));
        s.apply(input.key(GLFW_KEY_LEFT_BRACKET, 0).orElseThrow());
        s.apply(input.key(GLFW_KEY_LEFT_BRACKET, 0).orElseThrow());
        assertEquals(2, s.options().caseIndex());
    }

    @Test
    void colouringKeysOnlyOfferWhatTheDataHas() {
        ViewerSession s = session(threeAzimuths());
        InputMap input = new InputMap();
        assertEquals(Colouring.UTILISATION, s.options().colouring());
        s.apply(input.key(GLFW_KEY_C, 0).orElseThrow());
        assertEquals(Colouring.ROLE, s.options().colouring(), "after utilisation comes role (azimuth is not offered)");
        s.apply(input.key(GLFW_KEY_C, 0).orElseThrow());
        assertEquals(Colouring.AXIAL, s.options().colouring());
        assertTrue(s.apply(input.key(GLFW_KEY_4, 0).orElseThrow()), "the status line changes");
        assertEquals(Colouring.AXIAL, s.options().colouring(), "no azimuth values: the colouring stays");
        assertEquals("4 (azimuth): no governing azimuths in 'wind 0.0': the results hold no envelope over wind azimuths",
                s.status());
        assertFalse(s.apply(input.key(GLFW_KEY_4, 0).orElseThrow()), "the same key again: nothing new to say");
    }

    @Test
    void steppingIntoACaseWithoutTheChosenColouringShowsRolesAndComesBack() {
        int n = frame.members().size();
        ViewCase envelope = new ViewCase("envelope", OptionalDouble.empty(),
                Map.of(Colouring.UTILISATION, MemberScalars.of(new double[n]), Colouring.AZIMUTH,
                        MemberScalars.of(new double[n])), List.of(), List.of(), List.of());
        ViewCase wind = new ViewCase("wind 0", OptionalDouble.of(0),
                Map.of(Colouring.UTILISATION, MemberScalars.of(new double[n])), List.of(), List.of(), List.of());
        ViewData data = new ViewData(frame, List.of(envelope, wind), Colouring.UTILISATION);
        ViewerSession s = session(data);
        s.apply(new ViewerAction.UseColouring(Colouring.AZIMUTH));
        assertEquals(Colouring.AZIMUTH, s.options().colouring());
        s.apply(new ViewerAction.StepCase(1));
        assertEquals(Colouring.ROLE, s.options().colouring(), "the wind case has no governing azimuths");
        assertEquals("coloured by role: 'wind 0' has no azimuth values; azimuth comes back in a case that has them",
                s.status());
        s.apply(new ViewerAction.StepCase(1));
        assertEquals(Colouring.AZIMUTH, s.options().colouring());
        assertEquals("", s.status());
    }

    @Test
    void clickingAMemberShowsItsDescriptionAndClickingNothingClearsIt() {
        ViewData data = threeAzimuths();
        ViewerSession s = session(data);
        int leg = ViewFixtures.withRole(frame, tetrapod.model.Role.LEG).get(0);
        var a = s.scene().members().start(leg);
        var b = s.scene().members().end(leg);
        double[] xy = new double[4];
        new Projector(s.camera(), W, H).project((a.x() + b.x()) / 2, (a.y() + b.y()) / 2, (a.z() + b.z()) / 2, xy);
        InputMap input = new InputMap();
        input.press(GLFW_MOUSE_BUTTON_LEFT, 0, xy[0], xy[1]);
        s.apply(input.release(GLFW_MOUSE_BUTTON_LEFT, xy[0], xy[1]).orElseThrow());
        assertTrue(s.picked().isPresent());
        int picked = s.picked().getAsInt();
        assertTrue(s.scene().labels().stream().anyMatch(l -> l.style() == LabelStyle.INFO
                && l.text().equals(MemberDescription.of(data, 0, picked))));
        s.apply(new ViewerAction.Pick(3, 3));
        assertTrue(s.picked().isEmpty());
        assertTrue(s.scene().labels().stream().noneMatch(l -> l.style() == LabelStyle.INFO));
        assertEquals("", s.status(), "clearing a pick does something: no status");
        s.apply(new ViewerAction.Pick(3, 3));
        assertEquals("click: no member within 4 px of the cursor", s.status());
    }

    @Test
    void thePickedMemberIsOutlinedAndItsBoxKeepsOffTheTower() {
        ViewData data = threeAzimuths();
        ViewerSession s = session(data);
        int leg = ViewFixtures.withRole(frame, tetrapod.model.Role.LEG).get(0);
        int before = s.scene().decorations().count();
        var a = s.scene().members().start(leg);
        var b = s.scene().members().end(leg);
        double[] xy = new double[4];
        new Projector(s.camera(), W, H).project((a.x() + b.x()) / 2, (a.y() + b.y()) / 2, (a.z() + b.z()) / 2, xy);
        s.apply(new ViewerAction.Pick(xy[0], xy[1]));
        int k = s.picked().getAsInt();
        SegmentInstances deco = s.scene().decorations();
        assertEquals(before + 3, deco.count(), "outline, band and core");
        float width = s.scene().members().startWidth(k);
        assertEquals(PickHighlight.OUTLINE, deco.colour(before));
        assertEquals(PickHighlight.BAND, deco.colour(before + 1));
        assertEquals(s.scene().members().colour(k), deco.colour(before + 2));
        assertTrue(deco.startWidth(before) > deco.startWidth(before + 1)
                && deco.startWidth(before + 1) > deco.startWidth(before + 2) && deco.startWidth(before + 2) > width);
        SceneBuilderTest.assertClose(s.scene().members().start(k), deco.start(before));
        SceneBuilderTest.assertClose(s.scene().members().end(k), deco.end(before));
        // the description's box does not cover the tower's projected box, whatever the view
        for (ViewerAction turn : List.of(new ViewerAction.Orbit(0, 0), new ViewerAction.Pan(-300, 0),
                new ViewerAction.Pan(600, 0), new ViewerAction.Orbit(1.2, 0.4))) {
            s.apply(turn);
            Projector p = new Projector(s.camera(), W, H);
            LabelPainter painter = new LabelPainter(H);
            List<PlacedImage> placed = OverlayLayout.place(s.scene(), p, painter);
            var info = painter.text(MemberDescription.of(data, 0, k), LabelStyle.INFO);
            PlacedImage box = placed.stream().filter(i -> i.image() == info).findFirst().orElseThrow();
            ScreenRect tower = InfoBoxPlacement.towerBounds(s.scene().members(), p).orElseThrow();
            assertEquals(0, OverlayLayout.rect(box).overlapArea(tower), 1e-9, turn + ": box " + OverlayLayout.rect(box)
                    + ", tower " + tower);
            assertTrue(box.x() >= 0 && box.y() >= 0 && box.x() + box.image().getWidth() <= W
                    && box.y() + box.image().getHeight() <= H, "inside the window");
        }
    }

    @Test
    void theAxisTriadTurnsWithTheCameraButNeverZoomsOrPans() {
        ViewerSession s = session(threeAzimuths());
        assertTrue(s.scene().axisTriad());
        assertFalse(s.options().axes(), "no axes at the grid corner, where zoom would lose them");
        s.apply(new ViewerAction.Zoom(0.05));
        s.apply(new ViewerAction.Pan(400, -250));
        s.apply(new ViewerAction.Orbit(0.7, 0.3));
        Camera triad = AxisTriad.camera(s.camera());
        assertEquals(s.camera().yaw(), triad.yaw(), 1e-12);
        assertEquals(s.camera().pitch(), triad.pitch(), 1e-12);
        assertEquals(AxisTriad.EYE_DISTANCE, triad.distance(), 0);
        SceneBuilderTest.assertClose(tetrapod.model.Vec3.ZERO, triad.target());
        // the inset is the same square of the window whatever the camera: 0.16 × 900 = 144 px,
        // 12 × 0.9 = 10.8 → 11 px from the top and right edges
        assertEquals(ScreenRect.at(1200 - 11 - 144, 11, 144, 144), AxisTriad.viewport(W, H));
        // every arrow tip projects inside the inset
        Projector p = AxisTriad.projector(s.camera(), AxisTriad.viewport(W, H));
        double[] xy = new double[4];
        for (tetrapod.model.Vec3 tip : List.of(tetrapod.model.Vec3.X, tetrapod.model.Vec3.Y, tetrapod.model.Vec3.Z)) {
            assertTrue(p.project(tip.x(), tip.y(), tip.z(), xy));
            assertTrue(xy[0] > 0 && xy[0] < 144 && xy[1] > 0 && xy[1] < 144, tip + " at " + xy[0] + ", " + xy[1]);
        }
    }

    @Test
    void keysThatDoNothingSayWhy() {
        ViewerSession geometry = session(ViewData.geometryOnly(frame, OptionalDouble.empty()));
        assertTrue(geometry.apply(new ViewerAction.StepCase(1)));
        assertEquals(0, geometry.options().caseIndex());
        assertEquals("[ ]: nothing to step through: the model has no wind, so there are no azimuths, only 'geometry'",
                geometry.status());
        assertTrue(geometry.scene().labels().stream().anyMatch(l -> l.style() == LabelStyle.STATUS
                && l.text().equals(geometry.status())), "shown in the status line");
        geometry.apply(new ViewerAction.NextColouring());
        assertEquals("C: 'geometry' has no member results, so role is its only colouring", geometry.status());
        geometry.apply(new ViewerAction.ToggleDeformed());
        assertFalse(geometry.options().deformed());
        assertEquals("D: 'geometry' has no displacements: the model has not been analysed", geometry.status());
        geometry.apply(new ViewerAction.Orbit(0.1, 0));
        assertEquals("", geometry.status(), "a key that acts clears the line");
        assertTrue(geometry.scene().labels().stream().noneMatch(l -> l.style() == LabelStyle.STATUS));

        int n = frame.members().size();
        ViewCase envelope = new ViewCase("envelope over 2 cases", OptionalDouble.empty(),
                Map.of(Colouring.UTILISATION, MemberScalars.of(new double[n]), Colouring.AZIMUTH,
                        MemberScalars.of(new double[n])), List.of(), List.of(), List.of());
        ViewCase wind = new ViewCase("wind 0", OptionalDouble.of(0), Map.of(Colouring.UTILISATION,
                MemberScalars.of(new double[n])), List.of(new NodeVector(frame.nodes().get(5).id(),
                new tetrapod.model.Vec3(0.01, 0, 0))), List.of(), List.of());
        ViewerSession s = session(new ViewData(frame, List.of(wind, envelope), Colouring.UTILISATION));
        s.apply(new ViewerAction.UseColouring(Colouring.AZIMUTH));
        assertEquals("4 (azimuth): no governing azimuths in 'wind 0': only the envelope over the azimuths has them "
                + "(step with [ ])", s.status());
        s.apply(new ViewerAction.UseColouring(Colouring.UTILISATION));
        assertEquals("3 (utilisation): the members are already coloured by utilisation", s.status());
        s.apply(new ViewerAction.ToggleDeformed());
        assertTrue(s.options().deformed());
        assertEquals("", s.status());
        s.apply(new ViewerAction.StepCase(1));
        assertEquals("deformed shape not shown: 'envelope over 2 cases' has no single displacement field (each member's "
                + "worst comes from its own case); step to a load case with [ ]", s.status());
        s.apply(new ViewerAction.ToggleDeformed());
        s.apply(new ViewerAction.ToggleDeformed());
        assertFalse(s.options().deformed(), "D cannot turn the deformed shape on in the envelope");
        assertTrue(s.status().startsWith("D: 'envelope over 2 cases' has no single displacement field"), s.status());
    }
}
