package tetrapod.analysis;

import java.util.List;

/**
 * Second-order effects by EN 1993-1-1:2005 5.2.2(5)B: when the smallest elastic critical load
 * factor α_cr of the cases solved in full is below 10 (5.2.1(3)), every wind force is multiplied by
 * 1/(1 − 1/α_cr) and the whole sweep, its checks and those cases are done again with it. The
 * amplification stands for a second-order analysis only for α_cr ≥ 3 (5.2.2(6)B); below that the
 * summary and the report say a second-order analysis is needed.
 *
 * @param alphaCr       the smallest α_cr of the first-order cases solved in full
 * @param caseId        the case it belongs to
 * @param amplification 1/(1 − 1/α_cr) when applied, else 1
 */
public record SecondOrder(double alphaCr, String caseId, double amplification) {

    /** EN 1993-1-1 5.2.1(3): below this α_cr second-order effects must be accounted for. */
    public static final double FIRST_ORDER_LIMIT = 10;
    /** EN 1993-1-1 5.2.2(6)B: the amplification holds down to this α_cr. */
    public static final double AMPLIFICATION_LIMIT = 3;

    public static final SecondOrder NONE = new SecondOrder(Double.POSITIVE_INFINITY, "", 1);

    static SecondOrder of(List<SolvedCase> cases) {
        SolvedCase least = null;
        for (SolvedCase c : cases) {
            if (Double.isFinite(c.alphaCr()) && (least == null || c.alphaCr() < least.alphaCr())) {
                least = c;
            }
        }
        if (least == null) {
            return NONE;
        }
        double a = least.alphaCr();
        return new SecondOrder(a, least.id(), a < FIRST_ORDER_LIMIT ? 1 / (1 - 1 / a) : 1);   // (5.4)
    }

    /** Whether the wind was amplified. */
    public boolean applied() {
        return amplification != 1;
    }

    /** Whether α_cr is below the range in which the amplification stands for a second-order analysis. */
    public boolean beyondAmplification() {
        return alphaCr < AMPLIFICATION_LIMIT;
    }
}
