package tetrapod.view;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The picked member's info box goes to the corner or side farthest from the tower's projected
 * bounding box, off what is already drawn, inside the window (issue 16 item 8). Expected positions
 * worked by hand in each test from the rectangles' coordinates.
 */
class InfoBoxPlacementTest {

    private static final ScreenRect UPPER_LEFT_TOWER = new ScreenRect(100, 100, 400, 500);

    @Test
    void theBoxGoesToTheCornerFarthestFromTheTower() {
        // 1000 × 800 window, 300 × 200 box, 10 px inset. Gaps to the tower (100..400 × 100..500):
        // bottom right (690..990 × 590..790): dx 290, dy 90 → √(290² + 90²) = 303.6, the largest;
        // top right and right middle: 290; bottom left and bottom middle: 90; the others overlap it.
        ScreenRect r = InfoBoxPlacement.place(1000, 800, 300, 200, UPPER_LEFT_TOWER, List.of(), 10);
        assertEquals(ScreenRect.at(690, 590, 300, 200), r);
        assertEquals(303.6, r.gap(UPPER_LEFT_TOWER), 0.05);
    }

    @Test
    void placesAlreadyTakenAreAvoidedNextAndTiesGoToTheFartherCentre() {
        // the help holds the bottom right and the axis triad the top right: right middle (690..990 ×
        // 300..500) and top right tie at a gap of 290; only the right middle is free
        List<ScreenRect> taken = List.of(new ScreenRect(600, 600, 1000, 800), new ScreenRect(850, 10, 990, 150));
        ScreenRect r = InfoBoxPlacement.place(1000, 800, 300, 200, UPPER_LEFT_TOWER, taken, 10);
        assertEquals(ScreenRect.at(690, 300, 300, 200), r);
    }

    @Test
    void aTowerAtTheRightSendsTheBoxLeft() {
        // tower 600..900 × 50..750: top left and bottom left have gaps of 600 − 310 = 290, left middle
        // too; the centres: (160, 110) and (160, 690) are both √(590² + 290²) = 657.4 from (750, 400),
        // the left middle (160, 400) 590: top left comes first of the two corners
        ScreenRect tower = new ScreenRect(600, 50, 900, 750);
        ScreenRect r = InfoBoxPlacement.place(1000, 800, 300, 200, tower, List.of(), 10);
        assertEquals(0, r.overlapArea(tower));
        assertEquals(10, r.x0());
        assertEquals(290, r.gap(tower), 1e-9);
    }

    @Test
    void whenTheTowerFillsTheWindowTheBoxCoversAsLittleOfItAsItCan() {
        // zoomed in: the tower's box reaches beyond the window on every side but the right (to 850),
        // so a box at the right edge (700..990) covers only 850 − 700 = 150 px of width
        ScreenRect tower = new ScreenRect(-500, -500, 850, 1300);
        ScreenRect r = InfoBoxPlacement.place(1000, 800, 290, 200, tower, List.of(), 10);
        assertEquals(700, r.x0());
        assertEquals(150 * 200, r.overlapArea(tower), 1e-9);
    }

    @Test
    void aBoxLargerThanTheWindowIsClampedInside() {
        // 300 × 100 box in a 200 × 150 window: x from its left edge (0), y within 0..50
        ScreenRect r = InfoBoxPlacement.place(200, 150, 300, 100, new ScreenRect(50, 20, 150, 130), List.of(), 10);
        assertEquals(0, r.x0());
        assertTrue(r.y0() >= 0 && r.y1() <= 150, "inside the window vertically: " + r);
    }

    @Test
    void theTowerBoundsAreTheProjectedMemberEnds() {
        Scene scene = SceneBuilder.build(ViewFixtures.utilisation(ViewFixtures.ridge(), 0.3, 0, 0.3),
                SceneOptions.defaults(ViewFixtures.utilisation(ViewFixtures.ridge(), 0.3, 0, 0.3)).membersOnly());
        Projector p = RenderContract.projector(scene);
        ScreenRect b = InfoBoxPlacement.towerBounds(scene.members(), p).orElseThrow();
        double[] xy = new double[4];
        for (int k = 0; k < scene.members().count(); k++) {
            var s = scene.members().start(k);
            p.project(s.x(), s.y(), s.z(), xy);
            assertTrue(xy[0] >= b.x0() && xy[0] <= b.x1() && xy[1] >= b.y0() && xy[1] <= b.y1());
        }
        // framed by the default camera: the tower is inside the middle 90 % of the 800 × 600 image
        assertTrue(b.x0() >= 0.05 * 800 - 1 && b.x1() <= 0.95 * 800 + 1 && b.y0() >= 0.05 * 600 - 1
                && b.y1() <= 0.95 * 600 + 1, b.toString());
    }
}
