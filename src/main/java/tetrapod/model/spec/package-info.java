/** The tower spec: what the user wrote in the model file, as records, defaults filled in. */
package tetrapod.model.spec;
