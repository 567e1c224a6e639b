/** Units, typed errors and the progress listener: what every other package may use. */
package tetrapod.common;
