package dev.changeling.worker;

/**
 * How JUnit Platform unique ids nest: segments ({@code [type:value]}) joined by slashes, where a value's own
 * slashes are encoded, so an ancestor's id is a prefix of its descendants' up to a separator.
 */
public final class UniqueIds {

    private static final String SEGMENT = "/[";

    private UniqueIds() {
    }

    /** Whether {@code id} is {@code ancestor} itself or lies below it. */
    public static boolean isWithin(String id, String ancestor) {
        return id.equals(ancestor) || id.startsWith(ancestor + "/");
    }

    /** The engine's first container holding the id (a test's top-level class, say), or null for an engine's own id. */
    public static String outermostContainer(String id) {
        int second = id.indexOf(SEGMENT);
        if (second < 0) {
            return null;
        }
        int third = id.indexOf(SEGMENT, second + 1);
        return third < 0 ? id : id.substring(0, third);
    }

    /** The id one segment up (a test's class, say), or null for an engine's own id. */
    public static String parent(String id) {
        int at = id.lastIndexOf(SEGMENT);
        return at < 0 ? null : id.substring(0, at);
    }
}
