package org.cellwright.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.cellwright.cell.StopCondition;
import org.junit.jupiter.api.Test;

/** The stop-condition mini-language of {@code run.stop}, its thresholds in SI and its error columns. */
class StopConditionParserTest {

    private final StopConditionParser parser = new StopConditionParser(LibraryFixture.library(),
            new SpeciesResolver(LibraryFixture.library(), List.of()));

    @Test
    void readsEveryForm() throws UnitException {
        assertEquals(new StopCondition.ShortCircuit(), parser.parse("short"));
        assertEquals(new StopCondition.ShortCircuit(), parser.parse(" Short circuit "));
        // 2 g/L of Sn2+ at 118.71 g/mol
        assertEquals(new StopCondition.SpeciesBelow("Sn2+", 2 / 0.11871), parser.parse("Sn2+ < 2 g/L"));
        assertEquals(new StopCondition.SpeciesBelow("Cu2+", 100), parser.parse("Cu++<0.1 mol/L"));
        assertEquals(new StopCondition.SpeciesBelow("H+", 50), parser.parse("H+ <= 50 mmol/L"));
        assertEquals(333.15, ((StopCondition.TemperatureAbove) parser.parse("T > 60 C")).kelvin(), 1e-12);
        assertEquals(330.0, ((StopCondition.TemperatureAbove) parser.parse("temperature > 330 K")).kelvin(), 0.0);
        assertEquals(new StopCondition.VoltageAbove(8), parser.parse("U > 8 V"));
        assertEquals(new StopCondition.VoltageAbove(4.5), parser.parse("voltage >= 4500 mV"));
        assertEquals(new StopCondition.DepositAbove("Sn", 0.1), parser.parse("Sn > 100 g"));
    }

    private UnitException fails(String text) {
        return assertThrows(UnitException.class, () -> parser.parse(text));
    }

    @Test
    void explainsWhatIsWrongAndWhere() {
        UnitException noOp = fails("when the tin is gone");
        assertEquals(1, noOp.column());
        assertEquals("cannot read the stop condition 'when the tin is gone'; write e.g. \"short\", \"Sn2+ < 2 g/L\", "
                + "\"T > 60 C\", \"U > 8 V\" or \"Sn > 100 g\"", noOp.getMessage());
        UnitException unit = fails("Sn2+ < 2 g/Lt");
        assertEquals(10, unit.column());
        assertEquals("unit 'g/Lt' is not a concentration; did you mean 'g/L'?", unit.getMessage());
        UnitException wrongWay = fails("Sn2+ > 2 g/L");
        assertEquals(6, wrongWay.column());
        assertEquals("a species stop is written 'Sn2+ < 2 g/L': the run stops when it falls below",
                wrongWay.getMessage());
        UnitException hot = fails("T < 60 C");
        assertEquals(3, hot.column());
        UnitException boiling = fails("T > 120 C");
        assertEquals("the temperature must lie between 0 C and 100 C (liquid water at 1 atm)", boiling.getMessage());
        assertEquals(5, boiling.column());
        UnitException unknown = fails("Snn2+ < 2 g/L");
        assertEquals("unknown species or metal 'Snn2+'; did you mean 'Sn2+'?", unknown.getMessage());
        assertEquals(1, unknown.column());
        UnitException volts = fails("U > 8 A");
        assertEquals("expected a voltage, got a current 'A'", volts.getMessage());
        assertEquals(7, volts.column());
        UnitException nothing = fails("< 3 V");
        assertEquals(1, nothing.column());
    }
}
