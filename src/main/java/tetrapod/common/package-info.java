/** Units, typed errors, the progress listener and waiting for threads: what every other package may use. */
package tetrapod.common;
