package dev.changeling.review.triage;

/**
 * What the developer decided about one survivor, wherever it is kept.
 *
 * @param kind what was decided
 * @param text the reason for an equivalent, the note of a mark; may be null
 */
record Decision(Kind kind, String text) {

    enum Kind {
        EQUIVALENT("equivalent"),
        NEEDS_TEST("needs a test"),
        FIXED("fixed");

        private final String label;

        Kind(String label) {
            this.label = label;
        }

        String label() {
            return label;
        }

        /** Whether the survivor no longer counts as unresolved. */
        boolean resolves() {
            return this != NEEDS_TEST;
        }
    }

    String shown() {
        return text == null || text.isBlank() ? kind.label() : kind.label() + " (" + text + ")";
    }
}
