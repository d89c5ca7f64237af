package jet

import (
	"errors"
	"math"
	"strings"
	"testing"
)

func cold(npr float64) Condition {
	return Condition{Primary: Stream{NPR: npr, TotalTemperature: 288.15}, Ambient: StandardAmbient()}
}

// TestExitVelocityDensity checks the fully expanded state against the
// reference sheet's §1 check values (computed from the NACA 1135 relations
// with R = 287.05 J/(kg·K) and Ta = 288.15 K), to half a unit of the last
// printed digit (2e-4 relative).
func TestExitVelocityDensity(t *testing.T) {
	n := Nozzle{Kind: Convergent, Diameter: 0.05}
	tests := []struct {
		name          string
		stream        Stream
		mj, tj, uj, r float64 // r = ρj/ρa, 0 = not checked
	}{
		{"NPR 1.5 cold", Stream{NPR: 1.5, TotalTemperature: 288.15}, 0.7837, 256.63, 251.67, 1.1228},
		{"NPR 2.0 cold", Stream{NPR: 2.0, TotalTemperature: 288.15}, 1.0465, 236.38, 322.53, 1.2190},
		{"NPR 3.671 cold", Stream{NPR: 3.671, TotalTemperature: 288.15}, 1.5, 198.72, 423.89, 0},
		{"NPR 1.8 hot", Stream{NPR: 1.8, TotalTemperature: 800}, 0.9562, 676.32, 498.51, 0.4261},
		{"NPR 1.8 hot γ=1.33", Stream{NPR: 1.8, TotalTemperature: 800, Gas: Gas{Gamma: 1.33, R: 287}}, 0.9755, 691.44, 501.15, 0},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			e, err := ExitState(n, Condition{Primary: tt.stream, Ambient: StandardAmbient()})
			if err != nil {
				t.Fatal(err)
			}
			check := func(what string, got, want float64) {
				if want != 0 && !near(got, want, 2e-4) {
					t.Errorf("%s: got %.5f, want %.5f", what, got, want)
				}
			}
			check("Mj", e.Mach, tt.mj)
			check("Tj", e.StaticTemperature, tt.tj)
			check("Uj", e.Velocity, tt.uj)
			if tt.stream.Gas == (Gas{}) {
				check("ρj/ρa", e.DensityRatio, tt.r)
			}
		})
	}
}

// TestFullyExpandedDiameter checks Dj/D from mass conservation against the
// reference sheet's §2 table (DERIVED; the area-from-throat form is
// CONFIRMED in a public implementation), to 1e-4.
func TestFullyExpandedDiameter(t *testing.T) {
	g := Air()
	tests := []struct {
		name   string
		mj, md float64
		want   float64
	}{
		{"convergent, Mj 1.5", 1.5, 1, 1.08451},
		{"convergent, Mj 2.0", 2.0, 1, 1.29904},
		{"convergent, Mj 1.2", 1.2, 1, 1.01511},
		{"CD over-expanded", 1.3, 1.5, 0.95215},
		{"CD under-expanded", 1.7, 1.5, 1.06642},
		{"CD on design", 1.5, 1.5, 1.00000},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			n := Nozzle{Kind: Convergent, Diameter: 0.1}
			if tt.md > 1 {
				n = Nozzle{Kind: ConvergentDivergent, Diameter: 0.1, DesignMach: tt.md}
			}
			e, err := ExitState(n, cold(g.PressureRatio(tt.mj)))
			if err != nil {
				t.Fatal(err)
			}
			if got := e.FullyExpandedDiameter / 0.1; !near(got, tt.want, 1e-4) {
				t.Errorf("got Dj/D %.5f, want %.5f", got, tt.want)
			}
		})
	}
}

// TestExpansionStates checks the regime of a convergent-divergent nozzle
// designed for Mach 1.5 across NPR (normal-shock and isentropic relations,
// NACA Report 1135, hand-computed: subsonic throughout below NPR 1.2755
// (the subsonic M = 0.60 of A/A* = 1.1762), a normal shock inside up to
// 3.671/2.4583 = 1.4934 (the normal-shock pressure ratio at M 1.5),
// over-expanded up to 3.671, under-expanded above).
func TestExpansionStates(t *testing.T) {
	n := Nozzle{Kind: ConvergentDivergent, Diameter: 0.1, DesignMach: 1.5}
	tests := []struct {
		npr  float64
		want Expansion
	}{
		{1.05, Subsonic},
		{1.27, Subsonic},
		{1.3, ShockInNozzle},
		{1.49, ShockInNozzle},
		{1.6, OverExpanded},
		{2.5, OverExpanded},
		{3.671, Ideal},
		{5, UnderExpanded},
	}
	for _, tt := range tests {
		e, err := ExitState(n, cold(tt.npr))
		if err != nil {
			t.Fatal(err)
		}
		if e.Expansion != tt.want {
			t.Errorf("NPR %g: got %v, want %v", tt.npr, e.Expansion, tt.want)
		}
	}
	// convergent: subsonic below the critical NPR, under-expanded above
	for _, tt := range []struct {
		npr  float64
		want Expansion
	}{{1.5, Subsonic}, {1.89, Subsonic}, {2.5, UnderExpanded}} {
		e, _ := ExitState(Nozzle{Kind: Convergent, Diameter: 0.1}, cold(tt.npr))
		if e.Expansion != tt.want {
			t.Errorf("convergent NPR %g: got %v, want %v", tt.npr, e.Expansion, tt.want)
		}
	}
}

// TestShockCells checks the shock-cell spacing against the reference
// sheet's §8 table: Ls/Dj = 1.1·sqrt(Mj²−1) (Tam et al. 1985, from memory)
// and the Prandtl–Pack vortex-sheet 1.30637·sqrt(Mj²−1) (CONFIRMED in a
// public implementation), and the Mach-disk distance 0.645·sqrt(p0/pa)·D
// (Crist, Sherman & Glass 1966, CONFIRMED in Franquet et al. 2015).
func TestShockCells(t *testing.T) {
	g := Air()
	for _, tt := range []struct{ mj, tam, pack float64 }{
		{1.2, 0.7297, 0.8665}, {1.5, 1.2298, 1.4606}, {2.0, 1.9053, 2.2627},
	} {
		e, err := ExitState(Nozzle{Kind: Convergent, Diameter: 0.1}, cold(g.PressureRatio(tt.mj)))
		if err != nil {
			t.Fatal(err)
		}
		dj := e.FullyExpandedDiameter
		if got := e.ShockCellSpacing / dj; !near(got, tt.tam, 1e-4) {
			t.Errorf("Mj %g: got Ls/Dj %.4f, want %.4f", tt.mj, got, tt.tam)
		}
		if got := e.ShockCellSpacingUpper / dj; !near(got, tt.pack, 1e-4) {
			t.Errorf("Mj %g: got upper Ls/Dj %.4f, want %.4f", tt.mj, got, tt.pack)
		}
	}
	for _, tt := range []struct{ npr, want float64 }{{10, 2.040}, {30, 3.533}} {
		e, _ := ExitState(Nozzle{Kind: Convergent, Diameter: 1}, cold(tt.npr))
		if !near(e.MachDiskDistance, tt.want, 2e-4) {
			t.Errorf("NPR %g: got Mach disk %.4f D, want %.3f", tt.npr, e.MachDiskDistance, tt.want)
		}
	}
	e, _ := ExitState(Nozzle{Kind: Convergent, Diameter: 1}, cold(1.5))
	if e.ShockCellSpacing != 0 || e.MachDiskDistance != 0 || e.ShockContaining() {
		t.Errorf("subsonic jet: got shock cells %g, Mach disk %g", e.ShockCellSpacing, e.MachDiskDistance)
	}
}

// TestEffectiveDiameter checks Thring & Newby's D_eff = Dj·sqrt(ρj/ρa)
// (CONFIRMED in Franquet et al. 2015 Eq. 19) against the reference sheet's
// §5a check values for jets whose static temperature is 600, 800 and 1000 K
// at Ta = 288.15 K.
func TestEffectiveDiameter(t *testing.T) {
	g := Air()
	mj := 0.5
	for _, tt := range []struct{ tj, want float64 }{{600, 0.6930}, {800, 0.6002}, {1000, 0.5368}} {
		c := Condition{Primary: Stream{NPR: g.PressureRatio(mj), TotalTemperature: tt.tj * g.TemperatureRatio(mj)}, Ambient: StandardAmbient()}
		e, err := ExitState(Nozzle{Kind: Convergent, Diameter: 1}, c)
		if err != nil {
			t.Fatal(err)
		}
		if got := e.EffectiveDiameter / e.FullyExpandedDiameter; !near(got, tt.want, 1e-4) {
			t.Errorf("Tj %g K: got %.4f, want %.4f", tt.tj, got, tt.want)
		}
	}
}

// TestCoaxialConservation checks that the mixed-equivalent jet carries the
// mass flow, momentum flux and total enthalpy of its two streams (conservation
// laws; hand-computed from two single-stream states).
func TestCoaxialConservation(t *testing.T) {
	amb := StandardAmbient()
	pri := Stream{NPR: 1.6, TotalTemperature: 700}
	sec := Stream{NPR: 1.4, TotalTemperature: 300}
	n := Nozzle{Kind: Coaxial, Diameter: 0.1, SecondaryDiameter: 0.2}
	e, err := ExitState(n, Condition{Primary: pri, Secondary: &sec, Ambient: amb})
	if err != nil {
		t.Fatal(err)
	}
	p, _ := ExitState(Nozzle{Kind: Convergent, Diameter: 0.1}, Condition{Primary: pri, Ambient: amb})
	s, _ := ExitState(Nozzle{Kind: Convergent, Diameter: math.Sqrt(0.2*0.2 - 0.1*0.1)}, Condition{Primary: sec, Ambient: amb})
	if got, want := e.MassFlow, p.MassFlow+s.MassFlow; !near(got, want, 1e-12) {
		t.Errorf("mass flow: got %g, want %g", got, want)
	}
	if got, want := e.MassFlow*e.Velocity, p.Thrust+s.Thrust; !near(got, want, 1e-12) {
		t.Errorf("momentum: got %g, want %g", got, want)
	}
	cp := Air().Cp()
	if got, want := e.MassFlow*cp*e.TotalTemperature, cp*(p.MassFlow*700+s.MassFlow*300); !near(got, want, 1e-12) {
		t.Errorf("enthalpy: got %g, want %g", got, want)
	}
	// mass conservation in the fully expanded section
	if got := e.Density * e.Velocity * math.Pi * e.FullyExpandedDiameter * e.FullyExpandedDiameter / 4; !near(got, e.MassFlow, 1e-12) {
		t.Errorf("ρUA: got %g, want %g", got, e.MassFlow)
	}
	if e.Velocity <= s.Velocity || e.Velocity >= p.Velocity {
		t.Errorf("mixed velocity %g not between %g and %g", e.Velocity, s.Velocity, p.Velocity)
	}
}

// TestRectangular checks the area-equivalent diameter: a 0.5 m × 0.1 m exit
// has D_eq = sqrt(4·0.05/π) = 0.2523 m (reference sheet §6, hand-computed).
func TestRectangular(t *testing.T) {
	n := Nozzle{Kind: Rectangular, Width: 0.5, Height: 0.1}
	if got := n.EquivalentDiameter(); !near(got, 0.2523, 2e-4) {
		t.Errorf("got D_eq %.4f, want 0.2523", got)
	}
	r := RectangularFromAspect(0.2523, 5, 0)
	if !near(r.Width, 0.5, 1e-3) || !near(r.Height, 0.1, 1e-3) {
		t.Errorf("from aspect: got %g × %g, want 0.5 × 0.1", r.Width, r.Height)
	}
	e, err := ExitState(n, cold(1.5))
	if err != nil {
		t.Fatal(err)
	}
	if !near(e.Diameter, 0.2523, 2e-4) || e.SlotReynolds <= 0 {
		t.Errorf("got D %g, slot Re %g", e.Diameter, e.SlotReynolds)
	}
}

// TestExitErrors checks that bad inputs are refused with an error naming
// the input and what was expected.
func TestExitErrors(t *testing.T) {
	good := Nozzle{Kind: Convergent, Diameter: 0.05}
	tests := []struct {
		name string
		n    Nozzle
		c    Condition
		want string
	}{
		{"NPR below 1", good, cold(0.9), "nozzle pressure ratio must be greater than 1"},
		{"NPR of 1", good, cold(1), "1 means no flow"},
		{"NaN NPR", good, cold(math.NaN()), "nozzle pressure ratio must be a finite number"},
		{"zero diameter", Nozzle{Kind: Convergent}, cold(1.5), "nozzle diameter must be greater than 0 m"},
		{"negative diameter", Nozzle{Kind: Convergent, Diameter: -1}, cold(1.5), "nozzle diameter must be greater than 0 m, got -1 m"},
		{"gamma 1", good, Condition{Primary: Stream{NPR: 1.5, TotalTemperature: 300, Gas: Gas{Gamma: 1, R: 287}}, Ambient: StandardAmbient()}, "ratio of specific heats must be greater than 1"},
		{"no temperature", good, Condition{Primary: Stream{NPR: 1.5}, Ambient: StandardAmbient()}, "total temperature or its ratio to ambient must be given"},
		{"CD without Mach", Nozzle{Kind: ConvergentDivergent, Diameter: 0.05}, cold(2), "design Mach number must be greater than 1"},
		{"coaxial without secondary", Nozzle{Kind: Coaxial, Diameter: 0.05, SecondaryDiameter: 0.1}, cold(1.5), "secondary stream is required"},
		{"coaxial inverted", Nozzle{Kind: Coaxial, Diameter: 0.1, SecondaryDiameter: 0.05}, cold(1.5), "secondary diameter must exceed the primary diameter"},
		{"rectangle on its side", Nozzle{Kind: Rectangular, Width: 0.1, Height: 0.2}, cold(1.5), "nozzle height must not exceed the width"},
		{"zero ambient pressure", good, Condition{Primary: Stream{NPR: 1.5, TotalTemperature: 300}}, "ambient pressure must be greater than 0 Pa"},
		{"unknown kind", Nozzle{Diameter: 1}, cold(1.5), "nozzle kind must be"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := ExitState(tt.n, tt.c)
			var ie *InputError
			if !errors.As(err, &ie) {
				t.Fatalf("got %v, want an *InputError", err)
			}
			if !strings.Contains(err.Error(), tt.want) {
				t.Errorf("got %q, want it to contain %q", err, tt.want)
			}
		})
	}
}
