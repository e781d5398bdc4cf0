package dev.changeling.compile;

/**
 * Where the build spent its time, in milliseconds, and how much work each part did.
 *
 * @param renderMillis   writing the schema sources, over all rounds
 * @param compileMillis  the schema's javac tasks, over all rounds
 * @param fallbackMillis compiling mutants one at a time
 * @param schemaRounds   how many times the schema was compiled before it came out clean; 0 when the last build's was
 *                       taken as it was
 * @param aloneCompiles  how many mutants were compiled from their own files
 * @param aloneTasks     how many javac tasks that took (mutants of different files share one)
 */
public record BuildTimings(long renderMillis, long compileMillis, long fallbackMillis, int schemaRounds,
                           int aloneCompiles, int aloneTasks) {

    /** One line for a log: {@code render 12 ms, schema 2 rounds 1830 ms, alone 5 mutants in 2 tasks 640 ms}. */
    public String summary() {
        return "render " + renderMillis + " ms, schema " + schemaRounds + (schemaRounds == 1 ? " round " : " rounds ")
                + compileMillis + " ms, alone " + aloneCompiles + (aloneCompiles == 1 ? " mutant" : " mutants")
                + " in " + aloneTasks + (aloneTasks == 1 ? " task " : " tasks ") + fallbackMillis + " ms";
    }
}
