package jet

import (
	"math"
	"testing"

	"gonum.org/v1/gonum/integrate/quad"
)

// TestPlaneJetConstants checks the Gaussian momentum identity that ties the
// plane-jet decay constant to the spreading rate against the reference
// sheet's §6 values (DERIVED), and that the nominal K and S are the
// Gutmark & Wygnanski (1976) spreading rate 0.10–0.11 (CONFIRMED secondary)
// with its momentum-conserving decay constant.
func TestPlaneJetConstants(t *testing.T) {
	for _, tt := range []struct{ s, k float64 }{{0.10, 2.5774}, {0.11, 2.4574}, {0.128, 2.2781}} {
		if got := PlaneDecayFromSpread(tt.s); !near(got, tt.k, 1e-4) {
			t.Errorf("S_p %g: got K_u %.4f, want %.4f", tt.s, got, tt.k)
		}
	}
	m := NominalModel()
	if m.PlaneS < 0.10 || m.PlaneS > 0.11 || !near(m.PlaneK, PlaneDecayFromSpread(m.PlaneS), 2e-3) {
		t.Errorf("nominal plane constants S %g, K %g", m.PlaneS, m.PlaneK)
	}
	// the conservative decay is slower (a larger K)
	if c := ConservativeModel(); c.PlaneK < m.PlaneK || c.PlaneS < m.PlaneS {
		t.Errorf("conservative plane constants S %g, K %g below nominal", c.PlaneS, c.PlaneK)
	}
}

// TestPlaneJetDecay checks the x^(−1/2) centreline decay, the linear
// spreading and momentum conservation (∫u²dy = U0²·B with the
// momentum-conserving K; derived) of PlaneJet.
func TestPlaneJetDecay(t *testing.T) {
	m := NominalModel()
	m.PlaneK = PlaneDecayFromSpread(m.PlaneS)
	j := NewPlaneJet(40, 0.02, m)
	for _, x := range []float64{0.5, 1, 2, 4} {
		if got := j.Centerline(4*x) / j.Centerline(x); !near(got, 0.5, 1e-12) {
			t.Errorf("x %g: Uc(4x)/Uc(x) = %g, want 1/2", x, got)
		}
		if got := j.HalfWidth(2*x) / j.HalfWidth(x); !near(got, 2, 1e-12) {
			t.Errorf("x %g: y½(2x)/y½(x) = %g, want 2", x, got)
		}
		mom := 2 * quad.Fixed(func(y float64) float64 { u := j.Velocity(x, y); return u * u }, 0, 6*j.HalfWidth(x), 200, nil, 0)
		if !near(mom, j.U0*j.U0*j.B, 1e-6) {
			t.Errorf("x %g: ∫u²dy = %g, want U0²B = %g", x, mom, j.U0*j.U0*j.B)
		}
	}
	if got := j.Centerline(1e-6); got != j.U0 {
		t.Errorf("near the slot: got %g, want the cap %g", got, j.U0)
	}
}

// TestRectangularPlume checks that a high-aspect-ratio slot uses the plane
// law near the exit and the round law far downstream, continuously, and
// that its conservative zone still covers every point above the limit.
func TestRectangularPlume(t *testing.T) {
	n := RectangularFromAspect(0.1, 40, 0)
	p, err := NewPlume(n, cold(1.5), DefaultLimits())
	if err != nil {
		t.Fatal(err)
	}
	if !p.nom.plane {
		t.Fatal("aspect ratio 40 should use the plane-jet law")
	}
	e := p.Exit()
	plane := NewPlaneJet(e.Velocity, p.nom.planeB, p.nom.m)
	x := 2 * n.Width
	if got := p.CenterlineVelocity(x); got > plane.Centerline(x)+1e-9 {
		t.Errorf("x %g: centreline %g above the plane law %g", x, got, plane.Centerline(x))
	}
	prev := p.CenterlineVelocity(0)
	for x := 0.0; x < 200*e.Diameter; x += 0.01 {
		u := p.CenterlineVelocity(x)
		if u > prev+1e-9 || math.IsNaN(u) {
			t.Fatalf("centreline rises at x %g: %g after %g", x, u, prev)
		}
		prev = u
	}
	// the zone is drawn from the corners of the exit
	if r := p.Envelope(VelocityZone, Conservative).Radius(1e-9); r < math.Hypot(n.Width/2, n.Height/2)-1e-6 {
		t.Errorf("zone radius at the exit %g, want at least the half-diagonal %g", r, math.Hypot(n.Width/2, n.Height/2))
	}
}
