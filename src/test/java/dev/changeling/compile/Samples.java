package dev.changeling.compile;

/** The sample sources the build tests compile: a greenhouse's small helpers, each shaped to give certain hosts. */
final class Samples {

    private Samples() {
    }

    /** Pure functions over small inputs: arithmetic, predicates, loops with increments, side effects on arrays. */
    static final String TRAYS = """
            package sample;

            import java.util.Arrays;

            /** Seed-tray arithmetic for a greenhouse. */
            public final class Trays {

                private Trays() {
                }

                public static int spacing(int width, int seeds) {
                    return width * seeds + (width - seeds) / (seeds == 0 ? 1 : seeds) % 7;
                }

                public static boolean inBed(int row, int column) {
                    return row >= 0 && row < 10 || column > 3 && !(column == 5);
                }

                public static int wateringTotal(int rows) {
                    int total = 0;
                    for (int i = 0, guard = 0; i < rows && guard < 40; i++, guard++) {
                        total += i * 2;
                    }
                    return total;
                }

                public static int drain(int level) {
                    int steps = 0;
                    int guard = 0;
                    while (level > 0 && guard++ < 40) {
                        level -= 2;
                        steps++;
                    }
                    return steps * 10 + level;
                }

                public static String label(int growth) {
                    return growth > 0 ? "up" : growth == 0 ? "flat" : "down" + growth;
                }

                public static String feed(int a, int b) {
                    int[] box = {a, b, 0};
                    topUp(box, a - b);
                    return Arrays.toString(box);
                }

                static void topUp(int[] box, int by) {
                    box[0] += by;
                    box[1]++;
                    settle(box);
                }

                private static void settle(int[] box) {
                    box[2] = box[0] * 3 - box[1];
                }

                public static long area(int side, long depth) {
                    return side + depth * 2;
                }

                public static char nextBed(char bed, int by) {
                    return (char) (bed + by % 3);
                }

                public static Integer extra(Integer stock, int more) {
                    return stock == null ? more : stock + more;
                }

                public static int tangle(int a, int b, int c) {
                    return a + b * c < c - a ? a : b;
                }

                public static boolean named(String tag) {
                    return tag != null && tag.length() > 2 || tag == null && !tag.isEmpty();
                }

                public static boolean sorted(int[] values) {
                    for (int i = 1, guard = 0; i < values.length && guard < 40; i++, guard++) {
                        if (values[i - 1] > values[i]) {
                            return false;
                        }
                    }
                    return true;
                }
            }
            """;

    /** A String join whose {@code -} cannot compile, beside changes that can. */
    static final String LABELS = """
            package sample;

            public final class Labels {

                private Labels() {
                }

                public static String join(String left, String right) {
                    return left + right;
                }

                public static int width(String word) {
                    return word.length() + 1;
                }
            }
            """;

    /** Hosts whose switch javac rejects, or would accept with another meaning. */
    static final String SACKS = """
            package sample;

            public final class Sacks {

                private Sacks() {
                }

                public static int weigh(int more) {
                    byte base = 10;
                    return base + more;
                }

                public static String describe(Integer count) {
                    return kind(count);
                }

                static String kind(Object value) {
                    return "object " + value;
                }

                static String kind(int value) {
                    return "int " + value;
                }
            }
            """;

    /** Statements whose deletion breaks flow (a return) or scope (a declaration). */
    static final String LEDGER = """
            package sample;

            public final class Ledger {

                private Ledger() {
                }

                public static int balance(int in, int out) {
                    int net = in - out;
                    if (net < 0) {
                        return 0;
                    }
                    return net;
                }

                public static int fee(int amount) {
                    int fee = amount / 10;
                    fee += 2;
                    return fee;
                }

                public static int tax(int amount) {
                    int rate;
                    int[] seen = {0};
                    rate = amount > 100 ? 20 : 10;
                    mark(seen);
                    return amount * rate / 100 + seen[0];
                }

                static void mark(int[] seen) {
                    seen[0] = 1;
                }
            }
            """;

    /** A constant that a case label needs, so a switch on it fails far from any host. */
    static final String SEASONS = """
            package sample;

            public final class Seasons {

                private final int summer = 2 + 4;

                public static String of(int month) {
                    return new Seasons().name(month);
                }

                String name(int month) {
                    switch (month) {
                        case summer:
                            return "summer";
                        default:
                            return month > 8 ? "late" : "early";
                    }
                }
            }
            """;

    /** A static initialiser's arithmetic, which runs once per JVM. */
    static final String LIMITS = """
            package sample;

            public final class Limits {

                static int ceiling = 3 + 4;

                private Limits() {
                }

                public static int room(int used) {
                    return ceiling - used;
                }
            }
            """;

    /** Non-ASCII names, a character outside the BMP, a unicode escape and a host over three lines with a comment. */
    static final String BEDS = """
            package sample;

            /** Beete: Größen und Flächen \uD83C\uDF31. */
            public final class Beete {

                private Beete() {
                }

                public static String tag(int größe) {
                    String keim = "\uD83C\uDF31\\u00e9";
                    return keim + (größe > 2 ? "groß" : "klein") + größe;
                }

                public static int fläche(int breite, int länge) {
                    int ergebnis = breite
                            * länge // der Rand zählt mit
                            + 1;
                    if (ergebnis > 40) {
                        throw new IllegalStateException("zu groß");
                    }
                    return ergebnis;
                }
            }
            """;

    /** Nested and anonymous classes, so the schema writes more classes than files. */
    static final String SHEDS = """
            package sample;

            import java.util.function.IntSupplier;

            public final class Sheds {

                private Sheds() {
                }

                static final class Shelf {
                    int slots(int width) {
                        return width / 2;
                    }
                }

                public static int stock(int width) {
                    IntSupplier count = new IntSupplier() {
                        @Override
                        public int getAsInt() {
                            return new Shelf().slots(width) + 1;
                        }
                    };
                    return count.getAsInt();
                }
            }
            """;

    /** Refers to another class of the project, so it compiles only with the project's classes on the classpath. */
    static final String PATHS = """
            package sample;

            public final class Paths {

                private Paths() {
                }

                public static int length(int rows) {
                    return Limits.room(rows) + rows * 2;
                }
            }
            """;

    /** Lambda bodies: value lambdas, void lambdas, and one that is both, passed where overloads tell them apart. */
    static final String SPRINKLERS = """
            package sample;

            import java.util.List;
            import java.util.concurrent.Callable;
            import java.util.function.IntUnaryOperator;

            public final class Sprinklers {

                private Sprinklers() {
                }

                public static String pulse(int start) {
                    int[] box = {start};
                    return pick(() -> box[0]++) + ":" + box[0];
                }

                public static int wet(int a) {
                    IntUnaryOperator spray = x -> x * 2 + a;
                    return spray.applyAsInt(a + 1);
                }

                public static long dry(int limit) {
                    return List.of(3, 8, 1, 9).stream().filter(v -> v > limit).count();
                }

                public static int tick(int n) {
                    int[] count = {0};
                    Runnable step = () -> count[0] += n;
                    step.run();
                    step.run();
                    return count[0];
                }

                static String pick(Runnable task) {
                    task.run();
                    return "runnable";
                }

                static String pick(Callable<Integer> task) {
                    try {
                        return "callable " + task.call();
                    } catch (Exception e) {
                        return "failed";
                    }
                }
            }
            """;

    /** Loops whose condition is, or could become, a constant. */
    static final String LADDERS = """
            package sample;

            public final class Ladders {

                private Ladders() {
                }

                public static int rungs(int from) {
                    int steps = 0;
                    for (int left = from; left > 0; left -= 3) {
                        steps++;
                    }
                    return steps;
                }

                public static int climb(int x) {
                    while (true) {
                        if (x > 3) {
                            return x;
                        }
                        x += 2;
                    }
                }
            }
            """;

    /** Switch rules (an expression arm, a block arm with yield, arrow rules in a statement) and a body without braces. */
    static final String SEASONS_SWITCH = """
            package sample;

            public final class Months {

                private Months() {
                }

                public static int weight(int month) {
                    return switch (month) {
                        case 12, 1, 2 -> month * 10;
                        case 3, 4, 5 -> {
                            int base = month + 1;
                            yield base * 2;
                        }
                        default -> month - 1;
                    };
                }

                public static String kind(int n) {
                    String out = "";
                    switch (n % 3) {
                        case 0 -> out += "fizz";
                        case 1 -> out = out + n;
                        default -> {
                            out = "none";
                        }
                    }
                    return out;
                }

                public static int tally(int a, int b) {
                    int c = 0;
                    if (a > 0) b++;
                    c++;
                    return b * 10 + c;
                }
            }
            """;
}
