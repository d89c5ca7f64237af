package units

import (
	"math"
	"testing"
)

// relTol is the relative tolerance for comparing a parsed SI value with its
// expected value: a few float64 roundings in v*Scale + Offset and in the
// feet-and-inches sum (dimensionless).
const relTol = 1e-12

// closeTo reports whether got is within relTol of want, or within absTol for
// values near zero (absTol in the unit of the values).
func closeTo(got, want, absTol float64) bool {
	return math.Abs(got-want) <= absTol+relTol*math.Abs(want)
}

type parseCase struct {
	name string
	in   string
	dim  Dim
	bare string
	want float64 // SI
}

// checkParse runs Parse over cases and compares with want.
func checkParse(t *testing.T, cases []parseCase) {
	t.Helper()
	for _, tc := range cases {
		t.Run(tc.name, func(t *testing.T) {
			got, err := Parse(tc.in, tc.dim, tc.bare)
			if err != nil {
				t.Fatalf("Parse(%q, %v, %q): got error %v, want %v", tc.in, tc.dim, tc.bare, err, tc.want)
			}
			if !closeTo(got, tc.want, 1e-15) {
				t.Errorf("Parse(%q, %v, %q): got %.15g, want %.15g", tc.in, tc.dim, tc.bare, got, tc.want)
			}
		})
	}
}

func TestParseLength(t *testing.T) {
	// Exact definitions: 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 yd = 0.9144 m,
	// international yard and pound agreement 1959 (CONFIRMED, stored pages
	// "International yard and pound" and sizes.com "international yard").
	// Mixed values are hand-computed from these definitions.
	checkParse(t, []parseCase{
		{"mm no space", "50.8mm", Length, "", 0.0508},
		{"mm space", "50.8 mm", Length, "", 0.0508},
		{"m", "2 m", Length, "", 2},
		{"plus sign", "+2 m", Length, "", 2},
		{"negative exponent mm", "-1.5e3 mm", Length, "", -1.5},
		{"capital exponent", "2.5E-1 m", Length, "", 0.25},
		{"leading point", ".5 m", Length, "", 0.5},
		{"trailing point", "5. m", Length, "", 5},
		{"cm", "12 cm", Length, "", 0.12},
		{"km", "1.2 km", Length, "", 1200},
		{"in space", "2 in", Length, "", 0.0508},
		{"in no space", "2in", Length, "", 0.0508},
		{"double quote", `2"`, Length, "", 0.0508},
		{"double prime", "2″", Length, "", 0.0508},
		{"ft", "6 ft", Length, "", 1.8288},
		{"single quote", "6'", Length, "", 1.8288},
		{"prime", "6′", Length, "", 1.8288},
		{"yd", "3 yd", Length, "", 2.7432},
		{"fraction", "3/4 in", Length, "", 0.01905},
		{"mixed hyphen", "1-1/2 in", Length, "", 0.0381},
		{"mixed space", "1 1/2 in", Length, "", 0.0381},
		{"feet inches", "12 ft 6 in", Length, "", 3.81},
		// hand-computed: (12·12 + 6.5) in × 0.0254 m/in = 150.5 × 0.0254 = 3.8227 m
		{"feet inches hyphen fraction", "12 ft 6-1/2 in", Length, "", 3.8227},
		{"feet inches space fraction", "12 ft 6 1/2 in", Length, "", 3.8227},
		{"quotes with fraction", `12' 6 1/2"`, Length, "", 3.8227},
		{"quotes no space", `12'6"`, Length, "", 3.81},
		{"symbols no space", "5ft6in", Length, "", 1.6764},
		{"no-break space", "50.8\u00a0mm", Length, "", 0.0508},
		{"primes", "12′ 6-1/2″", Length, "", 3.8227},
		{"feet and fraction of inch", "2 ft 1/2 in", Length, "", 0.6223},
		{"negative feet inches", "-3 ft 2-1/2 in", Length, "", -0.9779},
		{"zero feet", "0 ft 1-15/16 in", Length, "", 0.0492125},
		{"feet inches decimal", "5 ft 11.5 in", Length, "", 1.8161},
		{"extra white space", " \t 12   ft\t 6  in \n", Length, "", 3.81},
		{"bare SI", "3.5", Length, "", 3.5},
		{"bare mm", "50.8", Length, "mm", 0.0508},
		{"bare in mixed", "6 1/2", Length, "in", 0.1651},
		{"bare in fraction", "3/4", Length, "in", 0.01905},
		{"zero", "0", Length, "", 0},
	})
}

func TestParseTemperature(t *testing.T) {
	// 0 °C = 273.15 K (SI Brochure 2019 §2.3.1, FROM MEMORY);
	// T/K = (t/°F + 459.67)/1.8 and T/K = (T/°R)/1.8 (NIST SP 811 App. B.8,
	// FROM MEMORY); CONFIRMED in stored pages: 32 °F = 273.15 K,
	// 212 °F = 373.15 K, absolute zero = −459.67 °F (converttoolpro.com
	// "Fahrenheit to Kelvin").
	checkParse(t, []parseCase{
		{"C no space", "15C", Temperature, "", 288.15},
		{"degree C", "15 °C", Temperature, "", 288.15},
		{"degC", "15 degC", Temperature, "", 288.15},
		{"K", "288.15 K", Temperature, "", 288.15},
		{"F", "59 F", Temperature, "", 288.15},
		{"degree F", "32 °F", Temperature, "", 273.15},
		{"degF boiling", "212 degF", Temperature, "", 373.15},
		{"F absolute zero", "-459.67 F", Temperature, "", 0},
		{"F minus 40", "-40 F", Temperature, "", 233.15},
		{"C minus 40", "-40 C", Temperature, "", 233.15},
		{"R", "491.67 R", Temperature, "", 273.15},
		{"degree R", "518.67 °R", Temperature, "", 288.15},
		{"degR", "0 degR", Temperature, "", 0},
		{"C absolute zero", "-273.15 C", Temperature, "", 0},
		{"bare K", "300", Temperature, "", 300},
		{"bare C", "15", Temperature, "C", 288.15},
		{"bare F", "59", Temperature, "F", 288.15},
	})
}

func TestParsePressure(t *testing.T) {
	// 1 bar = 10⁵ Pa, 1 mbar = 100 Pa, 1 atm = 101 325 Pa (CONFIRMED, stored
	// page "Non-SI units accepted for use with SI"); 1 mmHg = 133.322 387 415 Pa
	// = 13 595.1 kg/m³ × 9.806 65 m/s² × 1 mm (CONFIRMED, stored page
	// primidi.com "Torr – conversion factors"); 1 inHg = 25.4 mmHg
	// (DERIVED); 1 psi = 0.453 592 37 kg × 9.806 65 m/s² / (0.0254 m)²
	// = 6894.757 293 168 Pa (DERIVED from the 1959 agreement and g_n,
	// hand-computed to 13 figures).
	checkParse(t, []parseCase{
		{"Pa", "101325 Pa", Pressure, "", 101325},
		{"kPa no space", "101.325kPa", Pressure, "", 101325},
		{"MPa", "1.5 MPa", Pressure, "", 1.5e6},
		{"hPa", "1013.25 hPa", Pressure, "", 101325},
		{"mbar", "1013.25 mbar", Pressure, "", 101325},
		{"bar", "1 bar", Pressure, "", 1e5},
		{"psi", "1 psi", Pressure, "", 6894.757293168},
		{"psi 14.7", "14.7 psi", Pressure, "", 14.7 * 6894.757293168361},
		{"atm", "1 atm", Pressure, "", 101325},
		{"mmHg", "1 mmHg", Pressure, "", 133.322387415},
		{"mmHg 760", "760 mmHg", Pressure, "", 101325.01443540},
		{"inHg", "1 inHg", Pressure, "", 3386.388640341},
		{"bare kPa", "101.325", Pressure, "kPa", 101325},
	})
}

func TestParseVelocity(t *testing.T) {
	// 1 kn = 1852 m/h = 1852/3600 m/s (CONFIRMED, stored page "Non-SI units
	// accepted for use with SI"); 1 mph = 1609.344 m/h = 0.447 04 m/s
	// (international mile 1.609 344 km, CONFIRMED, stored page "International
	// yard and pound"); 1 ft/s = 0.3048 m/s (1959 agreement, CONFIRMED);
	// 1 km/h = 1/3.6 m/s (CONFIRMED, NOAA AOML hurricane FAQ A14).
	checkParse(t, []parseCase{
		{"m/s no space", "5m/s", Velocity, "", 5},
		{"m/s", "5 m/s", Velocity, "", 5},
		{"km/h", "36 km/h", Velocity, "", 10},
		{"kn", "20 kn", Velocity, "", 20 * 1852.0 / 3600},
		{"mph", "30 mph", Velocity, "", 30 * 0.44704},
		{"ft/s", "100 ft/s", Velocity, "", 30.48},
		{"bare kn", "1", Velocity, "kn", 1852.0 / 3600},
	})
}

func TestParseAngleFrequencyFraction(t *testing.T) {
	// 1° = π/180 rad (CONFIRMED, NIST physics.nist.gov "Units outside the SI",
	// Table 6).
	checkParse(t, []parseCase{
		{"deg", "30 deg", Angle, "", math.Pi / 6},
		{"degree sign", "30°", Angle, "", math.Pi / 6},
		{"degree sign space", "30 °", Angle, "", math.Pi / 6},
		{"rad", "0.5 rad", Angle, "", 0.5},
		{"negative deg", "-90 deg", Angle, "", -math.Pi / 2},
		{"bare deg", "45", Angle, "deg", math.Pi / 4},
		{"kHz", "1 kHz", Frequency, "", 1000},
		{"Hz", "50 Hz", Frequency, "", 50},
		{"MHz", "2.5 MHz", Frequency, "", 2.5e6},
		{"percent space", "60 %", Fraction, "", 0.6},
		{"percent", "60%", Fraction, "", 0.6},
		{"bare percent", "60", Fraction, "%", 0.6},
		{"bare ratio", "0.6", Fraction, "", 0.6},
	})
}
