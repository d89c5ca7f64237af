package jet

import (
	"math"
	"strings"
	"testing"
)

// TestBuoyancy checks the momentum length scale and the onset of buoyant
// bending against the reference sheet §9 check values (Fischer et al. 1979
// L_M = M0^(3/4)/B0^(1/2), from memory; Chen & Rodi x_b = 0.53, CONFIRMED in
// Papanikolaou et al. 2012) for Ta = 288.15 K.
func TestBuoyancy(t *testing.T) {
	tests := []struct {
		name              string
		d, uj, tj         float64
		lm, onset, onset1 float64 // onset1: where x_b = 1, 0 = unchecked
	}{
		{"take-off-like", 1, 400, 800, 69.9, 39.3, 74.2},
		{"idle-like", 1, 50, 500, 15.3, 8.6, 16.2},
		{"model hot", 0.1, 20, 400, 2.81, 1.58, 0},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			b := buoyancyOf(288.15/tt.tj, 288.15/tt.tj, tt.uj, math.Pi*tt.d*tt.d/4)
			if !near(b.MomentumLength, tt.lm, 3e-3) {
				t.Errorf("L_M: got %.3f m, want %.3g", b.MomentumLength, tt.lm)
			}
			if !near(b.Onset, tt.onset, 3e-3) {
				t.Errorf("x at x_b = 0.53: got %.3f m, want %.3g", b.Onset, tt.onset)
			}
			if tt.onset1 > 0 {
				if got := b.MomentumLength / math.Pow(math.Pi/4, 0.25); !near(got, tt.onset1, 3e-3) {
					t.Errorf("x at x_b = 1: got %.3f m, want %.3g", got, tt.onset1)
				}
			}
			// jet-like bending z = 0.058·L_M·(x/L_M)³ (DERIVED in the sheet): z/x = 5.8 % at x = L_M
			if got := b.Rise(b.MomentumLength) / b.MomentumLength; !near(got, 0.058, 1e-12) {
				t.Errorf("rise at L_M: got %g L_M, want 0.058", got)
			}
		})
	}
	if b := buoyancyOf(1, 1, 300, 1); !math.IsInf(b.MomentumLength, 1) || b.Rise(100) != 0 {
		t.Errorf("neutral jet: got %+v", b)
	}
	if b := buoyancyOf(1.2, 1.2, 300, 1); b.Rise(b.MomentumLength) >= 0 {
		t.Errorf("dense jet should sink: rise %g", b.Rise(b.MomentumLength))
	}
}

// TestFlags checks that each regime is flagged with a reason.
func TestFlags(t *testing.T) {
	amb := StandardAmbient()
	tests := []struct {
		name string
		n    Nozzle
		c    Condition
		want FlagKind
		text string
	}{
		{"under-expanded", Nozzle{Kind: Convergent, Diameter: 0.05}, cold(3), FlagShock, "shock cells about"},
		{"Mach disk", Nozzle{Kind: Convergent, Diameter: 0.05}, cold(6), FlagShock, "Mach disk"},
		{"shock in nozzle", Nozzle{Kind: ConvergentDivergent, Diameter: 0.05, DesignMach: 1.5}, cold(1.4), FlagShock, "normal shock stands inside"},
		{"hot slow", Nozzle{Kind: Convergent, Diameter: 1}, Condition{Primary: Stream{NPR: 1.015, TotalTemperature: 500}, Ambient: amb}, FlagBuoyant, "bend the jet up"},
		{"outside Lau", Nozzle{Kind: Convergent, Diameter: 0.05}, cold(10), FlagOutsideFit, "outside the 0.28–1.37"},
		{"very hot", Nozzle{Kind: Convergent, Diameter: 0.05}, Condition{Primary: Stream{NPR: 1.5, TotalTemperature: 1600}, Ambient: amb}, FlagOutsideFit, "density ratio"},
		{"rectangular", RectangularFromAspect(0.05, 4, 0), cold(1.5), FlagGeometry, "circumscribing"},
		{"coaxial", Nozzle{Kind: Coaxial, Diameter: 0.05, SecondaryDiameter: 0.1}, Condition{Primary: Stream{NPR: 1.5, TotalTemperature: 600}, Secondary: &Stream{NPR: 1.3, TemperatureRatio: 1}, Ambient: amb}, FlagGeometry, "mixed jet"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			p, err := NewPlume(tt.n, tt.c, DefaultLimits())
			if err != nil {
				t.Fatal(err)
			}
			for _, f := range p.Flags() {
				if f.Kind == tt.want && strings.Contains(f.Reason, tt.text) {
					return
				}
			}
			t.Errorf("no %v flag containing %q in %v", tt.want, tt.text, p.Flags())
		})
	}
	p, _ := NewPlume(Nozzle{Kind: Convergent, Diameter: 0.05}, cold(1.5), DefaultLimits())
	for _, f := range p.Flags() {
		if f.Kind == FlagShock || f.Kind == FlagBuoyant || f.Kind == FlagLaminar {
			t.Errorf("plain subsonic model jet flagged %v", f)
		}
	}
}

// TestUnheatedJetIsNotBuoyant checks that a jet with T0 = Ta carries no
// buoyancy although its static temperature is below ambient (its kinetic
// energy returns as heat as it slows; derived from the conservation of
// total enthalpy).
func TestUnheatedJetIsNotBuoyant(t *testing.T) {
	p, err := NewPlume(Nozzle{Kind: Convergent, Diameter: 0.3}, cold(1.69), DefaultLimits())
	if err != nil {
		t.Fatal(err)
	}
	if b := p.Buoyancy(); b.ReducedGravity != 0 || !math.IsInf(b.MomentumLength, 1) || Has(p.Flags(), FlagBuoyant) {
		t.Errorf("unheated jet: got %+v, flags %v", b, p.Flags())
	}
}
