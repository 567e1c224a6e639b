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
        assertFalse(s.apply(input.key(GLFW_KEY_4, 0).orElseThrow()), "no azimuth values: nothing changes");
        assertEquals(Colouring.AXIAL, s.options().colouring());
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
        s.apply(new ViewerAction.StepCase(1));
        assertEquals(Colouring.AZIMUTH, s.options().colouring());
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
    }
}
