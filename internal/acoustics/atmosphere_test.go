package acoustics

import (
	"errors"
	"math"
	"strings"
	"testing"
)

func TestStandardAtmosphere(t *testing.T) {
	a := StandardAtmosphere()
	// ISO 9613-1:1993 reference values T0 and p_r (acoustics.md §1.1, CONFIRMED);
	// 70 % is the ISO 9613-2 Table 2 row (acoustics.md §1.4, CONFIRMED).
	want := Atmosphere{Temperature: 293.15, RelativeHumidity: 70, Pressure: 101325}
	if a != want {
		t.Errorf("got %+v, want %+v", a, want)
	}
	if err := a.Validate(); err != nil {
		t.Errorf("got error %v, want nil", err)
	}
	if w := a.Warnings(); len(w) != 0 {
		t.Errorf("got warnings %q, want none", w)
	}
}

func TestAtmosphereValidate(t *testing.T) {
	std := StandardAtmosphere()
	with := func(f func(*Atmosphere)) Atmosphere { a := std; f(&a); return a }
	tests := []struct {
		name  string
		a     Atmosphere
		field string // "" for a valid atmosphere
	}{
		{"standard", std, ""},
		{"dry", with(func(a *Atmosphere) { a.RelativeHumidity = 0 }), ""},
		{"saturated", with(func(a *Atmosphere) { a.RelativeHumidity = 100 }), ""},
		{"coldest plausible", with(func(a *Atmosphere) { a.Temperature = MinTemperature }), ""},
		{"hottest plausible", with(func(a *Atmosphere) { a.Temperature = MaxTemperature }), ""},
		{"lowest plausible pressure", with(func(a *Atmosphere) { a.Pressure = MinPressure }), ""},
		{"highest plausible pressure", with(func(a *Atmosphere) { a.Pressure = MaxPressure }), ""},
		{"NaN temperature", with(func(a *Atmosphere) { a.Temperature = math.NaN() }), "Temperature"},
		{"infinite temperature", with(func(a *Atmosphere) { a.Temperature = math.Inf(1) }), "Temperature"},
		{"zero temperature", with(func(a *Atmosphere) { a.Temperature = 0 }), "Temperature"},
		{"negative temperature", with(func(a *Atmosphere) { a.Temperature = -5 }), "Temperature"},
		{"Celsius given as kelvin", with(func(a *Atmosphere) { a.Temperature = 20 }), "Temperature"},
		{"too hot", with(func(a *Atmosphere) { a.Temperature = 400 }), "Temperature"},
		{"NaN humidity", with(func(a *Atmosphere) { a.RelativeHumidity = math.NaN() }), "RelativeHumidity"},
		{"negative humidity", with(func(a *Atmosphere) { a.RelativeHumidity = -1 }), "RelativeHumidity"},
		{"humidity above 100", with(func(a *Atmosphere) { a.RelativeHumidity = 100.5 }), "RelativeHumidity"},
		{"infinite humidity", with(func(a *Atmosphere) { a.RelativeHumidity = math.Inf(1) }), "RelativeHumidity"},
		{"NaN pressure", with(func(a *Atmosphere) { a.Pressure = math.NaN() }), "Pressure"},
		{"infinite pressure", with(func(a *Atmosphere) { a.Pressure = math.Inf(-1) }), "Pressure"},
		{"zero pressure", with(func(a *Atmosphere) { a.Pressure = 0 }), "Pressure"},
		{"kPa given as Pa", with(func(a *Atmosphere) { a.Pressure = 101.325 }), "Pressure"},
		{"too high pressure", with(func(a *Atmosphere) { a.Pressure = 2e6 }), "Pressure"},
		{"zero value", Atmosphere{}, "Temperature"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			err := tt.a.Validate()
			if tt.field == "" {
				if err != nil {
					t.Errorf("got error %v, want nil", err)
				}
				return
			}
			if err == nil {
				t.Fatalf("got nil error, want one naming %s", tt.field)
			}
			if !errors.Is(err, ErrInvalidAtmosphere) {
				t.Errorf("got error %v, want it to wrap ErrInvalidAtmosphere", err)
			}
			if !strings.Contains(err.Error(), tt.field) {
				t.Errorf("got error %q, want it to name %s", err, tt.field)
			}
		})
	}
}

func TestAtmosphereWarnings(t *testing.T) {
	tests := []struct {
		name  string
		a     Atmosphere
		words []string // one substring per expected warning, in order
	}{
		{"standard", StandardAtmosphere(), nil},
		// Limits of ISO 9613-1 clause 7 (acoustics.md §1.3, FROM MEMORY): inclusive.
		{"at the cold limit", Atmosphere{Temperature: 253.15, RelativeHumidity: 70, Pressure: 101325}, nil},
		{"at the hot limit", Atmosphere{Temperature: 323.15, RelativeHumidity: 10, Pressure: 101325}, nil},
		{"too cold", Atmosphere{Temperature: 243.15, RelativeHumidity: 100, Pressure: 101325}, []string{"Temperature 243.15 K"}},
		{"dry air", Atmosphere{Temperature: 293.15, RelativeHumidity: 0, Pressure: 101325}, []string{"Water-vapour concentration 0 %"}},
		{"hot and humid", Atmosphere{Temperature: 333.15, RelativeHumidity: 90, Pressure: 101325},
			[]string{"Temperature 333.15 K", "Water-vapour concentration"}},
		{"high pressure", Atmosphere{Temperature: 293.15, RelativeHumidity: 70, Pressure: 200e3}, []string{"Pressure 200.0 kPa"}},
		{"invalid", Atmosphere{Temperature: math.NaN(), RelativeHumidity: 70, Pressure: 101325}, []string{"invalid atmosphere: Temperature"}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got := tt.a.Warnings()
			if len(got) != len(tt.words) {
				t.Fatalf("got %d warnings %q, want %d", len(got), got, len(tt.words))
			}
			for i, w := range tt.words {
				if !strings.Contains(got[i], w) {
					t.Errorf("warning %d: got %q, want it to contain %q", i, got[i], w)
				}
				if !strings.HasSuffix(got[i], ".") {
					t.Errorf("warning %d: got %q, want a sentence ending in a full stop", i, got[i])
				}
			}
		})
	}
}

func TestSpeedOfSound(t *testing.T) {
	// COMPUTED check values of c = 343.2·(T/293.15)^½, acoustics.md §0.
	tests := []struct {
		celsius, want float64
	}{
		{0, 331.29}, {15, 340.26}, {20, 343.20}, {30, 349.00},
	}
	for _, tt := range tests {
		a := celsius(tt.celsius, 70, ReferencePressure)
		if got := a.SpeedOfSound(); !withinAbs(got, tt.want, printed(2)) {
			t.Errorf("%g °C: got %.4f m/s, want %.2f m/s", tt.celsius, got, tt.want)
		}
	}
}

func TestDensity(t *testing.T) {
	tests := []struct {
		name string
		a    Atmosphere
		want float64
		tol  float64
	}{
		// Hand-computed: 101325/(287.05·293.15) = 1.20412 kg/m³; acoustics.md §6.6
		// uses ρ = 1.204 kg/m³ for 20 °C air (COMPUTED rows).
		{"20 °C", StandardAtmosphere(), 1.204, printed(3)},
		// Hand-computed: 101325/(287.05·288.15) = 1.22500 kg/m³, the ISO 2533 sea-level
		// density 1.225 kg/m³ (from memory, high confidence).
		{"15 °C", celsius(15, 0, 101325), 1.225, printed(3)},
		// Hand-computed: half the pressure halves the density, 1.204118/2.
		{"half pressure", Atmosphere{Temperature: 293.15, Pressure: 101325.0 / 2}, 0.602059, 1e-6},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := tt.a.Density(); !withinAbs(got, tt.want, tt.tol) {
				t.Errorf("got %.6f kg/m³, want %g ± %g", got, tt.want, tt.tol)
			}
		})
	}
}
