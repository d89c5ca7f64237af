package units

import "math"

// Exact conversion constants. Each is an exact definition, evaluated once by
// the Go compiler in exact arithmetic and rounded to float64; the comment gives
// its unit and its published source.
const (
	// Yard is the international yard in metres: exactly 0.9144 m, by the
	// international yard and pound agreement of 1 July 1959.
	Yard = 0.9144 // m

	// Inch is the international inch in metres: 1/36 yd = 0.0254 m exactly
	// (1959 agreement, as Yard).
	Inch = Yard / 36 // m

	// Foot is the international foot in metres: 12 in = 0.3048 m exactly
	// (1959 agreement, as Yard).
	Foot = 12 * Inch // m

	// Mile is the international statute mile in metres: 1760 yd = 1609.344 m
	// exactly (1959 agreement, as Yard).
	Mile = 1760 * Yard // m

	// NauticalMile is the international nautical mile in metres: exactly
	// 1852 m, adopted by the First International Extraordinary Hydrographic
	// Conference, Monaco, 1929; listed with the knot in the SI Brochure
	// (8th ed., 2006, Table 9).
	NauticalMile = 1852 // m

	// Pound is the international avoirdupois pound in kilograms: exactly
	// 0.453 592 37 kg (1959 agreement, as Yard).
	Pound = 0.45359237 // kg

	// StandardGravity is the standard acceleration of gravity g_n in m/s²:
	// exactly 9.806 65 m/s², 3rd CGPM (1901).
	StandardGravity = 9.80665 // m/s²
)

// Temperature scales.
const (
	// ZeroCelsius is 0 °C in kelvin: t/°C = T/K − 273.15 exactly, by the
	// definition of the degree Celsius in the SI Brochure (9th ed., 2019, §2.3.1).
	ZeroCelsius = 273.15 // K

	// RankineDegree is the size of one degree Rankine (and one degree
	// Fahrenheit) in kelvin: exactly 5/9 K, from T/K = (T/°R)/1.8
	// (NIST SP 811, 2008, App. B.8, entry "degree Rankine").
	RankineDegree = 5.0 / 9.0 // K per °R

	// ZeroFahrenheitRankine is 0 °F on the Rankine scale: exactly 459.67 °R,
	// so that T/K = (t/°F + 459.67)/1.8 (NIST SP 811, 2008, App. B.8, entry
	// "degree Fahrenheit").
	ZeroFahrenheitRankine = 459.67 // °R
)

// Pressures.
const (
	// Bar is one bar in pascals: exactly 10⁵ Pa, so 1 mbar = 1 hPa = 100 Pa
	// (SI Brochure, 8th ed., 2006, Table 9).
	Bar = 1e5 // Pa

	// StandardAtmosphere is one standard atmosphere in pascals: exactly
	// 101 325 Pa (10th CGPM, 1954, Resolution 4).
	StandardAtmosphere = 101325 // Pa

	// PSI is one pound-force per square inch in pascals:
	// Pound·StandardGravity/Inch² = 6894.757 293 168 36… Pa, exact from the
	// definitions above (NIST SP 811, 2008, App. B.8 lists 6.894 757 E+03 Pa).
	PSI = Pound * StandardGravity / (Inch * Inch) // Pa

	// MercuryDensity is the conventional density of mercury (at 0 °C) that,
	// with StandardGravity, defines the conventional manometric units:
	// exactly 13 595.1 kg/m³, giving 1 mmHg = 133.322 387 415 Pa.
	MercuryDensity = 13595.1 // kg/m³

	// MillimetreOfMercury is the conventional millimetre of mercury in
	// pascals: 13 595.1 kg/m³ × 9.806 65 m/s² × 1 mm = 133.322 387 415 Pa
	// exactly (NIST SP 811, 2008, App. B.8 lists 1.333 224 E+02 Pa).
	MillimetreOfMercury = MercuryDensity * StandardGravity * 1e-3 // Pa

	// InchOfMercury is the conventional inch of mercury in pascals:
	// 25.4 mmHg = 3386.388 640 341 Pa exactly (NIST SP 811, 2008, App. B.8
	// lists 3.386 389 E+03 Pa).
	InchOfMercury = MercuryDensity * StandardGravity * Inch // Pa
)

// Velocities.
const (
	// Knot is one knot in metres per second: one nautical mile per hour,
	// 1852/3600 m/s exactly (see NauticalMile).
	Knot = NauticalMile / 3600.0 // m/s

	// MilePerHour is one statute mile per hour in metres per second:
	// 1609.344/3600 = 0.447 04 m/s exactly (see Mile).
	MilePerHour = Mile / 3600 // m/s

	// KilometrePerHour is one kilometre per hour in metres per second:
	// 1000/3600 m/s exactly (SI prefix and the hour, 1 h = 3600 s, SI Brochure).
	KilometrePerHour = 1000 / 3600.0 // m/s

	// FootPerSecond is one foot per second in metres per second: 0.3048 m/s
	// exactly (see Foot).
	FootPerSecond = Foot // m/s
)

// Angles.
const (
	// Degree is one degree of plane angle in radians: exactly π/180 rad
	// (SI Brochure, 9th ed., 2019, non-SI units accepted for use with the SI).
	Degree = math.Pi / 180 // rad
)

// Deg converts an angle from radians to degrees.
//
// Special cases: NaN and ±Inf pass through unchanged.
func Deg(rad float64) float64 { return rad / Degree }

// Rad converts an angle from degrees to radians.
//
// Special cases: NaN and ±Inf pass through unchanged.
func Rad(deg float64) float64 { return deg * Degree }
