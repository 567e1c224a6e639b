/** Loads on the frame: self-weight (and, as they land, wind, ancillaries, ice and combinations). */
package tetrapod.load;
