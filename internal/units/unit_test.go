package units

import (
	"errors"
	"math"
	"reflect"
	"testing"
)

func TestLookup(t *testing.T) {
	tests := []struct {
		symbol string
		ok     bool
		dim    Dim
		scale  float64
		offset float64
	}{
		// 1959 agreement (CONFIRMED, stored page "International yard and pound").
		{"in", true, Length, 0.0254, 0},
		{`"`, true, Length, 0.0254, 0},
		{"ft", true, Length, 0.3048, 0},
		{"′", true, Length, 0.3048, 0},
		{"yd", true, Length, 0.9144, 0},
		{"C", true, Temperature, 1, 273.15},
		{"°C", true, Temperature, 1, 273.15},
		{"R", true, Temperature, 5.0 / 9, 0},
		{"psi", true, Pressure, 6894.757293168361, 0},
		{"km/h", true, Velocity, 1 / 3.6, 0},
		{"°", true, Angle, math.Pi / 180, 0},
		{"%", true, Fraction, 0.01, 0},
		// Mass and time units exist only to be named; 1 lb = 0.453 592 37 kg
		// (1959 agreement, CONFIRMED as above).
		{"kg", true, Mass, 1, 0},
		{"lb", true, Mass, 0.45359237, 0},
		{"min", true, Time, 60, 0},
		// Case-sensitive and exact.
		{"k", false, 0, 0, 0},
		{"c", false, 0, 0, 0},
		{"KM", false, 0, 0, 0},
		{"Mm", false, 0, 0, 0},
		{" m", false, 0, 0, 0},
		{"", false, 0, 0, 0},
	}
	for _, tc := range tests {
		t.Run(tc.symbol, func(t *testing.T) {
			u, ok := Lookup(tc.symbol)
			if ok != tc.ok {
				t.Fatalf("Lookup(%q): got ok %v, want %v", tc.symbol, ok, tc.ok)
			}
			if !ok {
				return
			}
			if u.Symbol != tc.symbol || u.Dim != tc.dim || !closeTo(u.Scale, tc.scale, 0) || !closeTo(u.Offset, tc.offset, 0) {
				t.Errorf("Lookup(%q): got %+v, want Dim %v Scale %v Offset %v", tc.symbol, u, tc.dim, tc.scale, tc.offset)
			}
		})
	}
}

func TestUnitToSIAndBack(t *testing.T) {
	// Every unit in the table converts a reading to SI and back to itself.
	for _, d := range unitTable {
		t.Run(d.Symbol, func(t *testing.T) {
			for _, v := range []float64{-12.5, 0, 1, 59, 1234.5} {
				if got := d.FromSI(d.ToSI(v)); !closeTo(got, v, 1e-12) {
					t.Errorf("FromSI(ToSI(%v)) in %q: got %v, want %v", v, d.Symbol, got, v)
				}
			}
		})
	}
}

func TestSymbols(t *testing.T) {
	tests := []struct {
		dim  Dim
		want []string
	}{
		{Length, []string{"m", "mm", "cm", "km", "in", "ft", "yd"}},
		{Temperature, []string{"K", "C", "F", "R"}},
		{Pressure, []string{"Pa", "hPa", "kPa", "MPa", "mbar", "bar", "psi", "atm", "inHg", "mmHg"}},
		{Velocity, []string{"m/s", "km/h", "ft/s", "kn", "mph"}},
		{Angle, []string{"rad", "deg"}},
		{Frequency, []string{"Hz", "kHz", "MHz"}},
		{Fraction, []string{"%"}},
		{Mass, []string{"kg", "g", "lb"}},
		{Time, []string{"s", "ms", "min", "h"}},
		{Dim(0), nil},
	}
	for _, tc := range tests {
		t.Run(tc.dim.String(), func(t *testing.T) {
			if got := Symbols(tc.dim); !reflect.DeepEqual(got, tc.want) {
				t.Errorf("Symbols(%v): got %q, want %q", tc.dim, got, tc.want)
			}
		})
	}
}

func TestEveryListedSymbolParses(t *testing.T) {
	for _, d := range []Dim{Length, Temperature, Pressure, Velocity, Angle, Frequency, Fraction} {
		for _, sym := range Symbols(d) {
			t.Run(sym, func(t *testing.T) {
				if _, err := Parse("1 "+sym, d, ""); err != nil {
					t.Errorf("Parse(%q, %v): got error %v, want nil", "1 "+sym, d, err)
				}
			})
		}
	}
}

func TestDimString(t *testing.T) {
	tests := []struct {
		dim  Dim
		want string
	}{
		{Length, "length"}, {Temperature, "temperature"}, {Pressure, "pressure"},
		{Velocity, "velocity"}, {Angle, "angle"}, {Frequency, "frequency"},
		{Fraction, "fraction"}, {Mass, "mass"}, {Time, "time"},
		{Dim(0), "Dim(0)"}, {Dim(42), "Dim(42)"}, {Dim(-1), "Dim(-1)"},
	}
	for _, tc := range tests {
		t.Run(tc.want, func(t *testing.T) {
			if got := tc.dim.String(); got != tc.want {
				t.Errorf("Dim(%d).String(): got %q, want %q", int(tc.dim), got, tc.want)
			}
		})
	}
}

func TestDegRad(t *testing.T) {
	// 1° = π/180 rad (CONFIRMED, NIST "Units outside the SI", Table 6).
	tests := []struct {
		deg, rad float64
	}{
		{0, 0}, {30, math.Pi / 6}, {90, math.Pi / 2}, {180, math.Pi}, {-45, -math.Pi / 4}, {360, 2 * math.Pi},
	}
	for _, tc := range tests {
		if got := Rad(tc.deg); !closeTo(got, tc.rad, 1e-15) {
			t.Errorf("Rad(%v): got %v, want %v", tc.deg, got, tc.rad)
		}
		if got := Deg(tc.rad); !closeTo(got, tc.deg, 1e-12) {
			t.Errorf("Deg(%v): got %v, want %v", tc.rad, got, tc.deg)
		}
	}
	if got := Deg(math.NaN()); !math.IsNaN(got) {
		t.Errorf("Deg(NaN): got %v, want NaN", got)
	}
}

func TestParseSystem(t *testing.T) {
	tests := []struct {
		in      string
		want    System
		wantErr bool
	}{
		{"metric", Metric, false},
		{"Metric", Metric, false},
		{" imperial ", Imperial, false},
		{"feet-and-inches", Imperial, false},
		{"ft-in", Imperial, false},
		{"FT-IN", Imperial, false},
		{"", 0, true},
		{"si", 0, true},
		{"us", 0, true},
	}
	for _, tc := range tests {
		t.Run(tc.in, func(t *testing.T) {
			got, err := ParseSystem(tc.in)
			if tc.wantErr {
				if !errors.Is(err, ErrUnknownSystem) {
					t.Errorf("ParseSystem(%q): got error %v, want one wrapping ErrUnknownSystem", tc.in, err)
				}
				return
			}
			if err != nil || got != tc.want {
				t.Errorf("ParseSystem(%q): got %v, %v, want %v, nil", tc.in, got, err, tc.want)
			}
		})
	}
	_, err := ParseSystem("us")
	want := `units: unknown unit system "us" (want metric, imperial, feet-and-inches or ft-in)`
	if err == nil || err.Error() != want {
		t.Errorf("ParseSystem(%q): got error %v, want %s", "us", err, want)
	}
}

func TestSystemString(t *testing.T) {
	tests := []struct {
		sys  System
		want string
	}{{Metric, "metric"}, {Imperial, "imperial"}, {System(0), "System(0)"}}
	for _, tc := range tests {
		if got := tc.sys.String(); got != tc.want {
			t.Errorf("System(%d).String(): got %q, want %q", int(tc.sys), got, tc.want)
		}
		if tc.sys == 0 {
			continue
		}
		if back, err := ParseSystem(tc.sys.String()); err != nil || back != tc.sys {
			t.Errorf("ParseSystem(%q): got %v, %v, want %v", tc.want, back, err, tc.sys)
		}
	}
}
