package jet

import (
	"math"
	"testing"
)

// TestLauCoreLength checks Lc/Dj = 4.2 + 1.1·Mj² (Lau, Morris & Fisher 1979;
// formula from memory, citation CONFIRMED) at the reference sheet's §3a check
// values.
func TestLauCoreLength(t *testing.T) {
	for _, tt := range []struct{ m, want float64 }{
		{0.3, 4.299}, {0.5, 4.475}, {0.9, 5.091}, {1.0, 5.300}, {1.37, 6.2646}, {1.5, 6.675}, {2.0, 8.600},
	} {
		if got := LauCoreLength(tt.m); !near(got, tt.want, 1e-4) {
			t.Errorf("Mj %g: got %.4f, want %.4f", tt.m, got, tt.want)
		}
	}
}

// TestGrowthReduction checks Φ(Mc) = 0.8·exp(−3Mc²) + 0.2 (Dimotakis 1991
// fit, form CONFIRMED in public code; attribution from memory) at the
// reference sheet's §7 values, and the convective Mach numbers of its two
// example jets.
func TestGrowthReduction(t *testing.T) {
	for _, tt := range []struct{ mc, want float64 }{
		{0.3, 0.8107}, {0.5, 0.5779}, {0.8, 0.3173}, {1.0, 0.2398}, {1.5, 0.2009},
	} {
		if got := GrowthReduction(tt.mc); !near(got, tt.want, 2e-4) {
			t.Errorf("Mc %g: got %.4f, want %.4f", tt.mc, got, tt.want)
		}
	}
	// cold Mj = 1.5 jet: Mc = Uj/(aj + a∞) = 0.6805 (Papamoschou & Roshko 1988 form)
	e, err := ExitState(Nozzle{Kind: Convergent, Diameter: 1}, cold(Air().PressureRatio(1.5)))
	if err != nil {
		t.Fatal(err)
	}
	if !near(e.ConvectiveMach, 0.6805, 2e-4) || !near(GrowthReduction(e.ConvectiveMach), 0.3994, 3e-4) {
		t.Errorf("cold Mj 1.5: got Mc %.4f Φ %.4f, want 0.6805, 0.3994", e.ConvectiveMach, GrowthReduction(e.ConvectiveMach))
	}
}

// TestMixingLayerGrowth checks the Brown & Roshko density form of the
// vorticity-thickness growth with Cω = 0.181 against the reference sheet's
// §7 table rows for a jet into still air (r = 0; formula from memory).
func TestMixingLayerGrowth(t *testing.T) {
	for _, tt := range []struct{ s, want float64 }{{1, 0.1810}, {2.78, 0.2414}} {
		if got := MixingLayerGrowth(0.181, tt.s, 0); !near(got, tt.want, 3e-4) {
			t.Errorf("s %g: got %.4f, want %.4f", tt.s, got, tt.want)
		}
	}
}

// TestHeatingFactor checks that heating shortens the nominal core and that
// an unheated jet is unchanged (Witze 1974 density exponent 0.22; the
// reference sheet §3c and §7 mixing-layer argument give about ×0.75 at
// Tj/Ta = 2.78, and 2.78^−0.22 = 0.798, hand-computed).
func TestHeatingFactor(t *testing.T) {
	g := Air()
	for _, mj := range []float64{0.3, 0.9, 1.5} {
		unheated := g.TemperatureRatio(mj) // ρj/ρa when T0 = Ta
		if got := HeatingFactor(mj, unheated, g.Gamma); !near(got, 1, 1e-12) {
			t.Errorf("unheated Mj %g: got %g, want 1", mj, got)
		}
	}
	if got := HeatingFactor(0, 1/2.78, g.Gamma); !near(got, 0.798, 1e-3) {
		t.Errorf("Tj/Ta 2.78: got %.4f, want 0.798", got)
	}
	hot, _ := NewPlume(Nozzle{Kind: Convergent, Diameter: 1}, Condition{Primary: Stream{NPR: 1.5, TotalTemperature: 800}, Ambient: StandardAmbient()}, DefaultLimits())
	coldP, _ := NewPlume(Nozzle{Kind: Convergent, Diameter: 1}, cold(1.5), DefaultLimits())
	if hot.CoreLength(Nominal) >= coldP.CoreLength(Nominal) {
		t.Errorf("heated core %g not shorter than cold %g", hot.CoreLength(Nominal), coldP.CoreLength(Nominal))
	}
	// the conservative core never shrinks with heating and is at least 7 Dj
	if hot.CoreLength(Conservative) < coldP.CoreLength(Conservative)-1e-12 || coldP.CoreLength(Conservative) < 7*coldP.Exit().FullyExpandedDiameter {
		t.Errorf("conservative cores: hot %g, cold %g", hot.CoreLength(Conservative), coldP.CoreLength(Conservative))
	}
}

// TestMixingLayerEdges checks that the reported mixing layer closes on the
// axis at the end of the core and widens downstream.
func TestMixingLayerEdges(t *testing.T) {
	p, err := NewPlume(Nozzle{Kind: Convergent, Diameter: 0.1}, cold(1.5), DefaultLimits())
	if err != nil {
		t.Fatal(err)
	}
	lc := p.CoreLength(Nominal)
	ml0 := p.MixingLayer(0)
	if ml0.Inner != p.Exit().FullyExpandedDiameter/2 || ml0.Outer != ml0.Inner {
		t.Errorf("at the exit: got %+v, want a zero-thickness layer on the lip", ml0)
	}
	if ml := p.MixingLayer(lc); ml.Inner != 0 || ml.Outer <= 0.05 {
		t.Errorf("at the end of the core: got %+v", ml)
	}
	prev := 0.0
	for x := 0.0; x < 3*lc; x += lc / 10 {
		ml := p.MixingLayer(x)
		if ml.Outer < prev-1e-12 || math.IsNaN(ml.Outer) {
			t.Fatalf("outer edge shrinks at x %g: %g after %g", x, ml.Outer, prev)
		}
		prev = ml.Outer
	}
}
