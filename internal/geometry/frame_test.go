package geometry

import (
	"math"
	"math/rand/v2"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"
)

func TestJetFrameToJet(t *testing.T) {
	pi := math.Pi
	alongX := JetFrame{Exit: r3.Vec{X: 1, Y: 2, Z: 1.5}, Heading: 0}
	alongMinusY := JetFrame{Exit: r3.Vec{X: 0, Y: 0, Z: 1}, Heading: -pi / 2}
	alongY := JetFrame{Exit: r3.Vec{X: 0, Y: 0, Z: 2}, Heading: pi / 2}
	v := func(x, y, z float64) r3.Vec { return r3.Vec{X: x, Y: y, Z: z} }
	// Hand-computed. Heading 0: left is +Y. Heading −π/2 (jet along −Y):
	// left is +X. Heading π/2 (along +Y): left is −X.
	tests := []struct {
		name  string
		f     JetFrame
		p     r3.Vec
		want  JetPoint
		polar float64
		dist  float64
	}{
		{"+X: on the axis downstream", alongX, v(4, 2, 1.5), JetPoint{X: 3}, 0, 3},
		{"+X: left in the exit plane", alongX, v(1, 3, 1.5), JetPoint{R: 1, Azimuth: 0}, pi / 2, 1},
		{"+X: right", alongX, v(1, 1, 1.5), JetPoint{R: 1, Azimuth: pi}, pi / 2, 1},
		{"+X: up", alongX, v(1, 2, 2.5), JetPoint{R: 1, Azimuth: pi / 2}, pi / 2, 1},
		{"+X: down", alongX, v(1, 2, 0.5), JetPoint{R: 1, Azimuth: 3 * pi / 2}, pi / 2, 1},
		{"+X: upstream on the axis", alongX, v(0, 2, 1.5), JetPoint{X: -1}, pi, 1},
		{"+X: 3-4-5 up and left at 45°", alongX, v(4, 2+4/math.Sqrt2, 1.5+4/math.Sqrt2), JetPoint{X: 3, R: 4, Azimuth: pi / 4}, math.Atan2(4, 3), 5},
		{"+X: the exit centre", alongX, v(1, 2, 1.5), JetPoint{}, 0, 0},
		{"-Y: downstream", alongMinusY, v(0, -5, 1), JetPoint{X: 5}, 0, 5},
		{"-Y: left is +X", alongMinusY, v(2, -3, 1), JetPoint{X: 3, R: 2, Azimuth: 0}, math.Atan2(2, 3), math.Sqrt(13)},
		{"-Y: right is -X", alongMinusY, v(-2, -3, 1), JetPoint{X: 3, R: 2, Azimuth: pi}, math.Atan2(2, 3), math.Sqrt(13)},
		{"-Y: up", alongMinusY, v(0, -3, 3), JetPoint{X: 3, R: 2, Azimuth: pi / 2}, math.Atan2(2, 3), math.Sqrt(13)},
		{"-Y: upstream and down", alongMinusY, v(0, 4, 0), JetPoint{X: -4, R: 1, Azimuth: 3 * pi / 2}, math.Atan2(1, -4), math.Sqrt(17)},
		{"+Y: left is -X", alongY, v(-1, 0, 2), JetPoint{R: 1, Azimuth: 0}, pi / 2, 1},
		{"+Y: right is +X, downstream", alongY, v(1, 1, 2), JetPoint{X: 1, R: 1, Azimuth: pi}, pi / 4, math.Sqrt2},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			got := tt.f.ToJet(tt.p)
			if !near(got.X, tt.want.X, 1e-12) || !near(got.R, tt.want.R, 1e-12) || !near(got.Azimuth, tt.want.Azimuth, 1e-12) {
				t.Errorf("ToJet(%v): got %v, want %v", tt.p, got, tt.want)
			}
			if p := got.Polar(); !near(p, tt.polar, 1e-12) {
				t.Errorf("Polar: got %.15g, want %.15g", p, tt.polar)
			}
			if d := got.Distance(); !near(d, tt.dist, 1e-12) {
				t.Errorf("Distance: got %.15g, want %.15g", d, tt.dist)
			}
			back := tt.f.ToCell(tt.want)
			if r3.Norm(r3.Sub(back, tt.p)) > 1e-12 {
				t.Errorf("ToCell(%v): got %v, want %v", tt.want, back, tt.p)
			}
		})
	}
}

func TestJetFrameAxis(t *testing.T) {
	// Hand-computed unit vectors.
	tests := []struct {
		heading float64
		want    r3.Vec
	}{
		{0, r3.Vec{X: 1}},
		{math.Pi / 2, r3.Vec{Y: 1}},
		{-math.Pi / 2, r3.Vec{Y: -1}},
		{math.Pi, r3.Vec{X: -1}},
		{math.Pi / 6, r3.Vec{X: math.Sqrt(3) / 2, Y: 0.5}},
	}
	for _, tt := range tests {
		got := JetFrame{Heading: tt.heading}.Axis()
		if r3.Norm(r3.Sub(got, tt.want)) > 1e-15 {
			t.Errorf("Axis at heading %g: got %v, want %v", tt.heading, got, tt.want)
		}
	}
}

func TestJetPointPolarSpecialCases(t *testing.T) {
	// Hand-computed: the exit centre, including a negative-zero X, is at 0.
	tests := []struct {
		name string
		q    JetPoint
		want float64
	}{
		{"exit centre", JetPoint{}, 0},
		{"exit centre, X = -0", JetPoint{X: math.Copysign(0, -1)}, 0},
		{"exit plane", JetPoint{R: 2}, math.Pi / 2},
		{"upstream axis", JetPoint{X: -3}, math.Pi},
		{"30° from the downstream axis", JetPoint{X: math.Sqrt(3), R: 1}, math.Pi / 6},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := tt.q.Polar(); !near(got, tt.want, 1e-15) {
				t.Errorf("got %.17g, want %.17g", got, tt.want)
			}
		})
	}
}

func TestPropertyFrameRoundTrip(t *testing.T) {
	rng := rand.New(rand.NewPCG(61, 62))
	headings := []float64{0, math.Pi / 2, math.Pi, -math.Pi / 2, 0.3, -2.9, 7.5}
	for _, h := range headings {
		f := JetFrame{Exit: r3.Vec{X: -3 + 6*rng.Float64(), Y: -3 + 6*rng.Float64(), Z: 2 * rng.Float64()}, Heading: h}
		for range 2000 {
			p := r3.Vec{X: -50 + 100*rng.Float64(), Y: -50 + 100*rng.Float64(), Z: 10 * rng.Float64()}
			q := f.ToJet(p)
			if back := f.ToCell(q); r3.Norm(r3.Sub(back, p)) > 1e-9 {
				t.Fatalf("heading %g, p %v: ToCell(ToJet(p)) = %v, want within 1e-9 m", h, p, back)
			}
			if q.R < 0 || q.Azimuth < 0 || q.Azimuth >= 2*math.Pi {
				t.Fatalf("heading %g, p %v: got %v, want R >= 0 and azimuth in [0, 2π)", h, p, q)
			}
			if pol := q.Polar(); pol < 0 || pol > math.Pi {
				t.Fatalf("heading %g, p %v: got polar %g, want in [0, π]", h, p, pol)
			}
			// Distance from the exit is frame-independent.
			if d, want := q.Distance(), r3.Norm(r3.Sub(p, f.Exit)); !near(d, want, 1e-9) {
				t.Fatalf("heading %g, p %v: got Distance %g, want %g", h, p, d, want)
			}
			// The reverse trip, away from the axis where azimuth is defined.
			if q.R > 1e-6 {
				q2 := f.ToJet(f.ToCell(q))
				if !near(q2.X, q.X, 1e-9) || !near(q2.R, q.R, 1e-9) || math.Abs(math.Remainder(q2.Azimuth-q.Azimuth, 2*math.Pi)) > 1e-9 {
					t.Fatalf("heading %g: ToJet(ToCell(%v)) = %v", h, q, q2)
				}
			}
		}
	}
}
