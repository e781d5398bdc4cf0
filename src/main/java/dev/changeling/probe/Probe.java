package dev.changeling.probe;

/**
 * The switch that schema-rewritten code calls: {@code Probe.on(17)} is true while mutation point 17
 * is switched on, and records that point 17 was reached; {@code Probe.enter(4)}, the first statement of method 4 of
 * the schema, notes that the method ran. JDK only, and tiny, because it sits on the hot path of every mutated
 * expression and every call of a schema method.
 */
public final class Probe {

    private static boolean[] active = new boolean[0];
    private static boolean recording;
    private static final Object LOCK = new Object();
    /** The points reached (and infections and entries, recorded as reach) since the last drain. */
    private static final Notes REACHED = new Notes();
    /** The methods entered since the last drain. */
    private static final Notes ENTERED = new Notes();
    /** The step of tests the worker is running; it counts up, so a stop meant for an earlier step matches nothing. */
    private static volatile int step;
    /** The step whose deadline passed: while it runs, every switch throws. */
    private static volatile int stopAt = -1;
    /** How many times a switch has thrown to stop a step, ever: a test that saw it change was ended by a stop. */
    private static volatile int stopsThrown;

    private Probe() {
    }

    /**
     * Whether point {@code id} is switched on; records the reach while recording. Once the running step's
     * deadline has passed, it throws instead, so that a mutant looping through its own code unwinds its test.
     */
    public static boolean on(int id) {
        if (stopAt == step) {
            stopsThrown++;
            throw new MutantStopped();
        }
        if (recording) {
            REACHED.add(id);
        }
        boolean[] now = active;
        return id < now.length && now[id];
    }

    /**
     * Notes that method {@code id} of the schema was entered, whether or not reach is recorded: what ran under a mutant
     * is what its verdict depends on. While reach is recorded, the entry is also recorded as the reach of id
     * {@code 2 * points + id}, so that the baseline knows which methods each test entered.
     */
    public static void enter(int id) {
        ENTERED.add(id);
        if (recording) {
            REACHED.add(2 * active.length + id);
        }
    }

    /** Sizes the tables for {@code points} mutation points and {@code methods} noted methods, and switches everything off. */
    public static void prepare(int points, int methods) {
        synchronized (LOCK) {
            active = new boolean[points];
            // a point's infection is recorded as the reach of id points + point, a method's entry as 2 * points + method
            REACHED.size(2 * points + methods);
            ENTERED.size(methods);
        }
    }

    /** The methods entered since the last drain, each once, and forgets them. */
    public static int[] drainEntered() {
        return ENTERED.drain();
    }

    /** Switches exactly the given points on (none for the unmutated program). */
    public static void activate(int... ids) {
        boolean[] next = new boolean[active.length];
        for (int id : ids) {
            next[id] = true;
        }
        active = next;
    }

    /** Starts the next step of tests (the worker's thread calls this before each); returns its number, from 1. */
    public static int beginStep() {
        step = step + 1;
        return step;
    }

    /** Stops the step with this number, if it is still running (any thread may call this). */
    public static void stop(int stepNumber) {
        stopAt = stepNumber;
    }

    /** How many times a switch has thrown to stop a step so far (only ever grows). */
    public static int stopsThrown() {
        return stopsThrown;
    }

    /** Whether the running step was told to stop. */
    public static boolean stopped() {
        return stopAt == step;
    }

    /** Whether reach is being recorded: the baseline, where a watched switch also compares its mutated values. */
    public static boolean watching() {
        return recording;
    }

    /**
     * Notes, while recording, that point {@code id}'s mutated expression gave another value than the original for
     * the running test (recorded as the reach of id {@code points + id}); always false, so the switch goes on to the
     * original.
     */
    public static boolean differs(int id, boolean differs) {
        if (differs && recording) {
            REACHED.add(active.length + id);
        }
        return false;
    }

    public static void record(boolean on) {
        recording = on;
    }

    /** The points reached since the last drain, each once, and forgets them. */
    public static int[] drainReached() {
        return REACHED.drain();
    }

    /** Ids noted once each until drained, in the order first noted. */
    private static final class Notes {

        private boolean[] seen = new boolean[0];
        private int[] ids = new int[16];
        private int count;

        void size(int idCount) {
            synchronized (LOCK) {
                seen = new boolean[idCount];
                count = 0;
            }
        }

        /** Notes the id, once until the next drain; an id past the size is ignored. Cheap when already noted. */
        void add(int id) {
            boolean[] now = seen;
            if (id >= now.length || now[id]) {
                return;
            }
            synchronized (LOCK) {
                if (id < seen.length && !seen[id]) {
                    seen[id] = true;
                    if (count == ids.length) {
                        ids = java.util.Arrays.copyOf(ids, count * 2);
                    }
                    ids[count++] = id;
                }
            }
        }

        int[] drain() {
            synchronized (LOCK) {
                int[] out = java.util.Arrays.copyOf(ids, count);
                for (int id : out) {
                    seen[id] = false;
                }
                count = 0;
                return out;
            }
        }
    }

    /**
     * Hands its argument back, so that a switch standing where a statement expression stood ({@code i++;},
     * a for-loop update, a lambda body such as {@code () -> count++}) is still one, with the same value.
     */
    public static boolean pass(boolean value) {
        return value;
    }

    public static char pass(char value) {
        return value;
    }

    public static byte pass(byte value) {
        return value;
    }

    public static short pass(short value) {
        return value;
    }

    public static int pass(int value) {
        return value;
    }

    public static long pass(long value) {
        return value;
    }

    public static float pass(float value) {
        return value;
    }

    public static double pass(double value) {
        return value;
    }

    public static <T> T pass(T value) {
        return value;
    }
}
