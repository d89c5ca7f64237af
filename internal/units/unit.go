package units

// Unit is one accepted unit symbol. A value v written in the unit is
// v*Scale + Offset in the SI unit of Dim; Offset is zero except for the
// temperature scales with a shifted zero (°C, °F).
type Unit struct {
	Symbol string  // as written, case-sensitive: "mm", "°C", "km/h"
	Dim    Dim     // the dimension it measures
	Scale  float64 // SI units per unit
	Offset float64 // SI value of a reading of zero, in the SI unit of Dim
}

// ToSI converts a reading v in unit u to the SI unit of u.Dim.
func (u Unit) ToSI(v float64) float64 { return v*u.Scale + u.Offset }

// FromSI converts an SI value si to a reading in unit u.
func (u Unit) FromSI(si float64) float64 { return (si - u.Offset) / u.Scale }

// unitDef is one row of the unit table: the unit and whether its symbol is
// the main spelling listed in messages ("known: K, C, F, R").
type unitDef struct {
	Unit
	listed bool
}

// unitTable holds every accepted symbol. Aliases (″, °C, degC …) follow the
// listed spelling. The named constants are defined with their sources in
// constants.go; the decimal factors are the SI prefixes (milli 10⁻³, centi
// 10⁻², hecto 10², kilo 10³, mega 10⁶) and 1 % = 0.01, 1 min = 60 s,
// 1 h = 3600 s, all exact (SI Brochure, 9th ed., 2019: prefixes, and non-SI
// units accepted for use with the SI).
var unitTable = []unitDef{
	// Lengths.
	{Unit{"m", Length, 1, 0}, true},
	{Unit{"mm", Length, 1e-3, 0}, true},
	{Unit{"cm", Length, 1e-2, 0}, true},
	{Unit{"km", Length, 1e3, 0}, true},
	{Unit{"in", Length, Inch, 0}, true},
	{Unit{`"`, Length, Inch, 0}, false},
	{Unit{"″", Length, Inch, 0}, false}, // U+2033 double prime
	{Unit{"ft", Length, Foot, 0}, true},
	{Unit{"'", Length, Foot, 0}, false},
	{Unit{"′", Length, Foot, 0}, false}, // U+2032 prime
	{Unit{"yd", Length, Yard, 0}, true},

	// Temperatures (absolute results).
	{Unit{"K", Temperature, 1, 0}, true},
	{Unit{"C", Temperature, 1, ZeroCelsius}, true},
	{Unit{"°C", Temperature, 1, ZeroCelsius}, false},
	{Unit{"degC", Temperature, 1, ZeroCelsius}, false},
	{Unit{"F", Temperature, RankineDegree, ZeroFahrenheitRankine * RankineDegree}, true},
	{Unit{"°F", Temperature, RankineDegree, ZeroFahrenheitRankine * RankineDegree}, false},
	{Unit{"degF", Temperature, RankineDegree, ZeroFahrenheitRankine * RankineDegree}, false},
	{Unit{"R", Temperature, RankineDegree, 0}, true},
	{Unit{"°R", Temperature, RankineDegree, 0}, false},
	{Unit{"degR", Temperature, RankineDegree, 0}, false},

	// Pressures.
	{Unit{"Pa", Pressure, 1, 0}, true},
	{Unit{"hPa", Pressure, 100, 0}, true},
	{Unit{"kPa", Pressure, 1e3, 0}, true},
	{Unit{"MPa", Pressure, 1e6, 0}, true},
	{Unit{"mbar", Pressure, Bar / 1000, 0}, true},
	{Unit{"bar", Pressure, Bar, 0}, true},
	{Unit{"psi", Pressure, PSI, 0}, true},
	{Unit{"atm", Pressure, StandardAtmosphere, 0}, true},
	{Unit{"inHg", Pressure, InchOfMercury, 0}, true},
	{Unit{"mmHg", Pressure, MillimetreOfMercury, 0}, true},

	// Velocities.
	{Unit{"m/s", Velocity, 1, 0}, true},
	{Unit{"km/h", Velocity, KilometrePerHour, 0}, true},
	{Unit{"ft/s", Velocity, FootPerSecond, 0}, true},
	{Unit{"kn", Velocity, Knot, 0}, true},
	{Unit{"mph", Velocity, MilePerHour, 0}, true},

	// Angles.
	{Unit{"rad", Angle, 1, 0}, true},
	{Unit{"deg", Angle, Degree, 0}, true},
	{Unit{"°", Angle, Degree, 0}, false},

	// Frequencies.
	{Unit{"Hz", Frequency, 1, 0}, true},
	{Unit{"kHz", Frequency, 1e3, 0}, true},
	{Unit{"MHz", Frequency, 1e6, 0}, true},

	// Fractions.
	{Unit{"%", Fraction, 0.01, 0}, true},

	// Recognised only to name them in errors.
	{Unit{"kg", Mass, 1, 0}, true},
	{Unit{"g", Mass, 1e-3, 0}, true},
	{Unit{"lb", Mass, Pound, 0}, true},
	{Unit{"s", Time, 1, 0}, true},
	{Unit{"ms", Time, 1e-3, 0}, true},
	{Unit{"min", Time, 60, 0}, true},
	{Unit{"h", Time, 3600, 0}, true},
}

// unitIndex maps each symbol to its row in unitTable.
var unitIndex = func() map[string]Unit {
	m := make(map[string]Unit, len(unitTable))
	for _, d := range unitTable {
		if _, dup := m[d.Symbol]; dup {
			panic("units: duplicate unit symbol " + d.Symbol)
		}
		m[d.Symbol] = d.Unit
	}
	return m
}()

// Lookup returns the unit with the given symbol, matched exactly
// (case-sensitive, no surrounding space), and whether it exists.
// Mass and time units are found too, with Dim Mass or Time.
func Lookup(symbol string) (Unit, bool) {
	u, ok := unitIndex[symbol]
	return u, ok
}

// Symbols returns the main symbols of dimension d in a fixed order, without
// aliases (for Temperature: K, C, F, R). It returns nil for a value that is
// not a dimension. The slice is new on each call.
func Symbols(d Dim) []string {
	var out []string
	for _, u := range unitTable {
		if u.Dim == d && u.listed {
			out = append(out, u.Symbol)
		}
	}
	return out
}

// siUnit is the unit a bare number is read in when Parse is given bare == "".
func siUnit(d Dim) Unit {
	return Unit{Dim: d, Scale: 1}
}
