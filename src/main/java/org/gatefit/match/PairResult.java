package org.gatefit.match;

import java.util.List;
import java.util.Optional;

/**
 * Every check and figure of one driver–switch pair at one operating point.
 *
 * @param driver   driver part number
 * @param switchPart switch part number
 * @param verdict  fail if any check fails; warn if any warns or is unknown; else pass
 * @param score    ranking score in [0,1] (see {@link Score})
 * @param checks   one per rule, in rule order
 * @param figures  computed values, in a fixed order
 * @param point    the operating point after defaults
 * @param margins  the margins applied
 * @param priceTieBreak unit price of the part being chosen, used only to break ties (NaN unknown)
 */
public record PairResult(String driver, String switchPart, Verdict verdict, double score, List<Check> checks,
                         List<Figure> figures, OperatingPoint point, Margins margins, double priceTieBreak) {
    public PairResult {
        checks = List.copyOf(checks);
        figures = List.copyOf(figures);
    }

    /** The same result with the price that breaks ranking ties. */
    public PairResult withPrice(double price) {
        return new PairResult(driver, switchPart, verdict, score, checks, figures, point, margins, price);
    }

    /**
     * The verdict this pair ranks by: its checks' worst as {@link #verdict}, but an unknown that
     * waits only for an operating-point value the asker did not give ({@link Check#notGiven}) counts
     * as a pass — it is the same open question for every driver it touches and says nothing about the
     * part. Shown verdicts stay {@link #verdict}.
     */
    public Verdict rankVerdict() {
        if (checks.stream().noneMatch(c -> c.notGiven() != null)) {
            return verdict;
        }
        Verdict v = Verdict.PASS;
        for (Check c : checks) {
            v = v.and(c.notGiven() != null ? Verdict.PASS : c.verdict());
        }
        return v.forPair();
    }

    /** A figure by name. */
    public Optional<Figure> figure(String name) {
        return figures.stream().filter(f -> f.name().equals(name)).findFirst();
    }

    /** The check of a rule. */
    public Optional<Check> check(Rule rule) {
        return checks.stream().filter(c -> c.rule() == rule).findFirst();
    }
}
