package jet

import (
	"math"
	"testing"
)

// TestRadialJetConstants checks the radial wall jet's decay constants,
// derived from the momentum and enthalpy fluxes with δ½ = 0.085 r
// (hand-computed: c_uu = 0.5·sqrt(π/(2 ln2)) = 0.75269, Cu =
// 1/sqrt(8·0.085·0.75269) = 1.3977; for λ = 1.3, c_uθ = 0.5·sqrt(π/(ln2·
// (1 + 1/1.69))) = 0.84372 and Cθ = 1/(8·1.3977·0.085·0.84372) = 1.2470).
func TestRadialJetConstants(t *testing.T) {
	if !near(radialJetVelocity, 1.3977, 1e-4) {
		t.Errorf("Cu: got %.5f, want 1.3977", radialJetVelocity)
	}
	if got := radialJetScalar(1.3); !near(got, 1.2470, 1e-4) {
		t.Errorf("Cθ: got %.5f, want 1.2470", got)
	}
}

// TestWallJetSpreadsSideways checks a wall jet along a surface: it runs
// to the conservative zone's tip, is never narrower than the free zone,
// and spreads along the surface several times faster than it thickens
// (0.32 against 0.05, Launder & Rodi 1983, from memory).
func TestWallJetSpreadsSideways(t *testing.T) {
	c := Condition{Primary: Stream{NPR: 1.8, TotalTemperature: 800}, Ambient: StandardAmbient()}
	p, err := NewPlume(Nozzle{Kind: Convergent, Diameter: 0.0508}, c, DefaultLimits())
	if err != nil {
		t.Fatal(err)
	}
	for _, z := range []Zone{VelocityZone, HotZone} {
		env := p.Envelope(z, Conservative)
		start := env.Length / 4
		w := p.WallJet(z, start)
		if len(w.X) < 2 || w.X[0] != start || !near(w.X[len(w.X)-1], env.Length, 1e-12) {
			t.Fatalf("%s: wall jet from %.3f to %.3f m, want %.3f to %.3f m", z, w.X[0], w.X[len(w.X)-1], start, env.Length)
		}
		for i, x := range w.X {
			if w.Span[i] < env.Radius(x) {
				t.Errorf("%s at %.3f m: span %.4f m narrower than the free zone's %.4f m", z, x, w.Span[i], env.Radius(x))
			}
			if w.Depth[i] > 0 && w.Span[i] < 6*w.Depth[i] {
				t.Errorf("%s at %.3f m: span %.4f m is not several times the depth %.4f m", z, x, w.Span[i], w.Depth[i])
			}
		}
		if w.MaxDepth <= 0 || math.IsNaN(w.MaxDepth) {
			t.Errorf("%s: depth %v", z, w.MaxDepth)
		}
	}
	if w := p.WallJet(VelocityZone, 1e9); len(w.X) != 0 {
		t.Error("a wall jet starting past the zone's end has samples")
	}
}

// TestRadialJetReach checks the radial wall jet's reach against its law:
// the velocity zone reaches r = 1.15·1.3977·D_eff·Uj/u_lim over the wall
// (hand-computed from the decay law and the tail factor), never less
// than the free zone there.
func TestRadialJetReach(t *testing.T) {
	c := Condition{Primary: Stream{NPR: 1.8, TotalTemperature: 800}, Ambient: StandardAmbient()}
	p, err := NewPlume(Nozzle{Kind: Convergent, Diameter: 0.0508}, c, DefaultLimits())
	if err != nil {
		t.Fatal(err)
	}
	e := p.Exit()
	rj := p.RadialJet(VelocityZone, 2)
	want := 1.15 * 1.3977 * e.EffectiveDiameter * e.Velocity / 5
	if !near(rj.Radius, math.Max(want, p.Envelope(VelocityZone, Conservative).Radius(2)), 1e-3) {
		t.Errorf("radius %.4f m, want %.4f m", rj.Radius, want)
	}
	if rj.Depth <= 0 {
		t.Errorf("depth %v", rj.Depth)
	}
}
