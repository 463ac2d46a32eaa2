package org.gatefit.catalog;

import java.util.List;
import org.gatefit.failure.BadInput;

/**
 * Input data that cannot be used: carries every problem found (up to a cap) with file, line and
 * column, so a user can fix a whole file in one pass. Exits 3 ({@link BadInput}).
 */
public final class CatalogDataException extends BadInput {
    private static final long serialVersionUID = 1L;
    /** How many problems are listed in the message. */
    public static final int SHOWN = 20;

    private final transient List<Problem> problems;
    private final long total;

    public CatalogDataException(List<Problem> problems, long total) {
        super(summary(problems, total));
        this.problems = List.copyOf(problems);
        this.total = total;
    }

    public CatalogDataException(Problem problem) {
        this(List.of(problem), 1);
    }

    /** The problems kept (capped). */
    public List<Problem> problems() {
        return problems;
    }

    /** How many problems were found in all, including those not kept. */
    public long total() {
        return total;
    }

    private static String summary(List<Problem> problems, long total) {
        StringBuilder sb = new StringBuilder();
        int n = 0;
        for (Problem p : problems) {
            if (n++ == SHOWN) {
                break;
            }
            if (sb.length() > 0) {
                sb.append('\n');
            }
            sb.append(p);
        }
        long more = total - Math.min(problems.size(), SHOWN);
        if (more > 0) {
            sb.append("\n… and ").append(more).append(more == 1 ? " more problem" : " more problems");
        }
        return sb.toString();
    }
}
