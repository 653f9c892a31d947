package org.cellwright.validation;

import java.util.ArrayList;
import java.util.List;

import org.cellwright.chem.ChemistryValidation;
import org.cellwright.io.UnitValidation;
import org.cellwright.sim.EngineValidation;
import org.cellwright.sim.deposit.DendriteValidation;
import org.cellwright.study.StrdValidation;

/**
 * Every check of Cellwright against the outside world, gathered from the packages that compute them, in the
 * order of the validation report (docs/validation.md).
 */
public final class ValidationCatalogue {

    private static List<ValidationCase> cases;

    private ValidationCatalogue() {
    }

    /** @return every case, computed once per test run (the engine runs take a few seconds) */
    public static synchronized List<ValidationCase> all() {
        if (cases == null) {
            List<ValidationCase> out = new ArrayList<>();
            out.addAll(EngineValidation.cases());
            out.addAll(DendriteValidation.cases());
            out.addAll(ChemistryValidation.cases());
            out.addAll(StrdValidation.cases());
            out.addAll(UnitValidation.cases());
            out.addAll(TankhouseValidation.cases());
            cases = List.copyOf(out);
        }
        return cases;
    }
}
