package tetrapod.view;

/** How a label looks: font size in reference px, colour, weight, and whether it sits in a box. */
public enum LabelStyle {
    CAPTION(22, 0x22262B, true, false),
    AXIS(17, 0x3A3F45, true, false),
    REACTION(15, 0x1F2328, false, false),
    WIND(16, 0x0E6E78, true, false),
    INFO(16, 0x1F2328, false, true),
    HELP(14, 0x50565C, false, false),
    STATUS(15, 0x7A3A00, true, true);

    final int size;
    final Rgb colour;
    final boolean bold;
    final boolean boxed;

    LabelStyle(int size, int colour, boolean bold, boolean boxed) {
        this.size = size;
        this.colour = Rgb.hex(colour);
        this.bold = bold;
        this.boxed = boxed;
    }
}
