package dev.changeling.review.export;

import dev.changeling.results.Verdict;

/** The colour each verdict has in the HTML report, chosen so that survived and unreached stand out. */
final class VerdictColours {

    private VerdictColours() {
    }

    static String of(Verdict verdict) {
        return switch (verdict) {
            case KILLED -> "#3f8f5a";
            case SURVIVED -> "#c8372d";
            case UNREACHED -> "#e09a1a";
            case TIMED_OUT -> "#3a6ea5";
            case CRASHED -> "#7b4fa0";
            case STILLBORN -> "#9a9a9a";
            case SKIPPED -> "#c9c9c9";
        };
    }
}
