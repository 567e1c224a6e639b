/**
 * The 3D view: a scene built from a frame and its results (pure Java and JOML), drawn by OpenGL
 * (LWJGL) into a window or an off-screen image, or by Java2D when no OpenGL can be had.
 *
 * <p>Conventions, stated once:
 * <ul>
 * <li>World space is tower axes: right-handed, z up, x and y along the base's face directions,
 *     metres. Wind azimuth 0 deg blows towards +x, 90 deg towards +y.</li>
 * <li>Angles in code are radians; degrees appear only in names ending in {@code Deg} and in text.</li>
 * <li>Projection is OpenGL's: clip space x, y, z in [-1, 1] after division by w, with JOML's
 *     {@code setPerspective} ({@code zZeroToOne = false}) and {@code lookAt}.</li>
 * <li>Pixel coordinates are image coordinates: origin at the top left, y down, pixel centres at
 *     half-integers. OpenGL read-backs are flipped into this order.</li>
 * <li>Forces in N, tension positive; reactions are the forces the supports exert on the structure.
 *     Text shown to people uses kN and m and always prints the unit.</li>
 * <li>Widths of drawn lines are in reference pixels: pixels of an image 1000 px high, scaled
 *     with the image height so that a window and a large PNG look alike.</li>
 * </ul>
 */
package tetrapod.view;
