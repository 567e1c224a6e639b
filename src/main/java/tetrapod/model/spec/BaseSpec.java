package tetrapod.model.spec;

/** Leg centre-line spacing at z = 0, m: along x (widthX) and along y (widthY). */
public record BaseSpec(double widthX, double widthY) { }
