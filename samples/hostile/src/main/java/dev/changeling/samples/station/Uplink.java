package dev.changeling.samples.station;

/** The station's radio link to the base: how many uploads a backlog takes, and how many tries a connection. */
public final class Uplink {

    private Uplink() {
    }

    /** Uploads needed to send {@code readings} readings, {@code batch} at a time (the last upload may be short). */
    public static int uploadsFor(int readings, int batch) {
        if (batch <= 0) {
            throw new IllegalArgumentException("batch must be positive, not " + batch);
        }
        int uploads = 0;
        int left = readings;
        // Hostile: `left > 0` -> `left != 0` steps past zero when readings are no whole number of batches and
        // never ends; the loop passes the mutant's switch on every round, so the worker can stop it in place.
        while (left > 0) {
            left -= batch;
            uploads++;
        }
        return uploads;
    }

    /** The attempt on which the link comes up, when the first {@code failuresBeforeLink} attempts fail. */
    public static int attemptsUntilLinked(int failuresBeforeLink) {
        int attempt = 0;
        while (true) {
            try {
                attempt++;
                // Hostile: `attempt > failuresBeforeLink` -> `false` never links, and the catch-all below swallows
                // every error, even the one that stops a mutant at its deadline: only killing the worker ends it.
                if (attempt > failuresBeforeLink) {
                    return attempt;
                }
                throw new IllegalStateException("no carrier on attempt " + attempt);
            } catch (Throwable retry) {
                // the station retries whatever went wrong
            }
        }
    }
}
