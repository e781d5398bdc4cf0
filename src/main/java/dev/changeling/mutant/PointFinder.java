package dev.changeling.mutant;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.stmt.ExpressionStmt;
import com.github.javaparser.ast.stmt.ForStmt;
import com.github.javaparser.ast.stmt.Statement;
import dev.changeling.operator.MutationOperator;
import dev.changeling.operator.Proposal;
import dev.changeling.operator.Proposals;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.function.Predicate;

/** Finds every mutation point of a parsed file: each operator visits each node that may be mutated. */
public final class PointFinder {

    private final List<MutationOperator> operators;
    private final boolean mutateDiagnostics;
    private final Predicate<Point> inScope;
    private final Map<String, Integer> notMade = new TreeMap<>();

    /** Finds every point the operators make, diagnostics-only code included. */
    public PointFinder(List<MutationOperator> operators) {
        this(operators, true, point -> true);
    }

    /**
     * @param mutateDiagnostics whether to make points in code whose only effect is diagnostics (calls on a logger,
     *                          {@code assert}, {@code toString()}); those not made are counted ({@link #notMade()})
     * @param inScope           which points count as not made when left out (those the run would otherwise make)
     */
    public PointFinder(List<MutationOperator> operators, boolean mutateDiagnostics, Predicate<Point> inScope) {
        this.operators = List.copyOf(operators);
        this.mutateDiagnostics = mutateDiagnostics;
        this.inScope = inScope;
    }

    /** How many points were not made so far, by reason ("logging call", "assert statement", "body of toString()"). */
    public Map<String, Integer> notMade() {
        return Collections.unmodifiableMap(new TreeMap<>(notMade));
    }

    /**
     * The points of a parsed file. Where the parser read Unicode escapes decoded, nodes that hold one are not
     * visited and hosts that hold one are not changed: the written text there is not the text the tree describes.
     */
    public List<Point> find(JavaSources.Parsed parsed) {
        SourceFile file = parsed.file();
        Proposals proposals = new Proposals(file, parsed::touchesDecodedEscape);
        boolean decoded = !parsed.decodedEscapes().isEmpty();
        parsed.unit().walk(Node.TreeTraversal.PREORDER, node -> {
            if (!Eligibility.excluded(node) && !(decoded && parsed.touchesDecodedEscape(file.spanOf(node)))) {
                for (MutationOperator operator : operators) {
                    proposals.from(operator);
                    operator.visit(node, proposals);
                }
            }
        });
        return toPoints(file, proposals.collected());
    }

    /** Fingerprints are made over every proposal, so they are the same whether diagnostics are mutated or not. */
    private List<Point> toPoints(SourceFile file, List<Proposal> proposals) {
        Map<String, Integer> ordinals = new HashMap<>();
        List<Point> points = new ArrayList<>(proposals.size());
        for (Proposal proposal : proposals) {
            Node host = proposal.host();
            String type = Members.typeOf(host);
            String member = Members.memberOf(host);
            String snippet = Snippets.normalise(file.textOf(host));
            String replacement = Snippets.normalise(proposal.replacement());
            String key = Fingerprint.tupleKey(file.path(), type, member, proposal.operator(), snippet, replacement);
            int ordinal = ordinals.merge(key, 1, Integer::sum) - 1;
            Point point = new Point(file.path(), type, member, proposal.operator(), kindOf(host),
                    file.spanOf(host), proposal.edit(), proposal.replacement(), snippet, proposal.description(),
                    file.lines().line(proposal.edit().begin()), Eligibility.oncePerJvm(host),
                    Fingerprint.of(file.path(), type, member, proposal.operator(), snippet, replacement, ordinal));
            Optional<String> diagnostic = mutateDiagnostics ? Optional.empty() : Diagnostics.only(host);
            if (diagnostic.isEmpty()) {
                points.add(point);
            } else if (inScope.test(point)) {
                notMade.merge(diagnostic.get(), 1, Integer::sum);
            }
        }
        return points;
    }

    private static HostKind kindOf(Node host) {
        if (host instanceof Statement) {
            return HostKind.STATEMENT;
        }
        Node parent = host.getParentNode().orElse(null);
        // An expression lambda's body (held in an ExpressionStmt by JavaParser) counts too: the schema's
        // wrapper there hands the value back, so it suits void and value-returning lambdas alike.
        boolean standsAlone = parent instanceof ExpressionStmt
                || (parent instanceof ForStmt loop
                    && (loop.getInitialization().stream().anyMatch(init -> init == host)
                        || loop.getUpdate().stream().anyMatch(update -> update == host)));
        return standsAlone ? HostKind.STATEMENT_EXPRESSION : HostKind.EXPRESSION;
    }
}
