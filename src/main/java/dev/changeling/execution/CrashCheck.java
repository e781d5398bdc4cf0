package dev.changeling.execution;

/**
 * A worker can die of something other than its mutant: killed from outside (kill -9, the kernel's out-of-memory
 * killer). So a crash counts only when the mutant, run again in a fresh worker, crashes that one too; otherwise the
 * second run gives the verdict, and its message says that the first worker died.
 */
final class CrashCheck {

    private CrashCheck() {
    }

    /**
     * The verdict of a mutant that crashed its worker and then ran {@code again} in a fresh one.
     *
     * @param death how the first worker ended ("exit 137"), or null when it did not say
     */
    static JobResult settle(JobResult crash, String death, JobResult again) {
        long nanos = crash.nanos() + again.nanos();
        if (again.outcome() == Outcome.CRASHED) {
            return new JobResult(again.key(), Outcome.CRASHED, again.testId(), again.message() + "; again in a fresh worker",
                    again.testsRun(), nanos, again.entered());
        }
        String note = "the first worker died" + (death == null ? "" : " (" + death + ")")
                + " and the mutant ran again in a fresh one";
        return new JobResult(again.key(), again.outcome(), again.testId(),
                again.message() == null ? note : again.message() + "; " + note, again.testsRun(), nanos, again.entered());
    }
}
