package dev.changeling.samples.apiary;

/**
 * One hive on its scale.
 *
 * @param name      the name painted on the roof, unique within a yard
 * @param tareGrams the weight of the empty boxes, frames and roof
 */
public record Hive(String name, int tareGrams) {

    public Hive {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a hive needs a name");
        }
        if (tareGrams <= 0) {
            throw new IllegalArgumentException("the boxes of " + name + " must weigh something, not " + tareGrams + " g");
        }
    }
}
