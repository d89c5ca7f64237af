package geometry

import (
	"math"
	"testing"
)

// TestContoursCircle checks the contour of a cone r = |p − c| at level R:
// a closed line whose points lie on the circle of radius R within the
// error of linear interpolation along the grid edges (hand-computed: under
// h²/(2R) = 2.5 mm for h = 0.1 m, R = 2 m; the test allows h/10).
func TestContoursCircle(t *testing.T) {
	const h, R = 0.1, 2.0
	g := Grid{X0: -3, Y0: -3, Step: h, NX: 61, NY: 61}
	g.Values = make([]float64, g.NX*g.NY)
	for j := 0; j < g.NY; j++ {
		for i := 0; i < g.NX; i++ {
			x, y := g.X0+float64(i)*h, g.Y0+float64(j)*h
			g.Values[j*g.NX+i] = -math.Hypot(x, y) // above the level inside the circle
		}
	}
	lines := g.Contours(-R)
	if len(lines) != 1 {
		t.Fatalf("got %d lines, want 1 closed line", len(lines))
	}
	l := lines[0]
	if l[0] != l[len(l)-1] || len(l) < 40 {
		t.Errorf("got an open line of %d points, want a closed one", len(l))
	}
	for _, p := range l {
		if d := math.Abs(math.Hypot(p[0], p[1]) - R); d > h/10 {
			t.Errorf("point %v is %.4f m off the circle", p, d)
		}
	}
	// a level nowhere reached gives no line; NaN squares give none
	if got := g.Contours(1); len(got) != 0 {
		t.Errorf("level above the field: got %d lines", len(got))
	}
	for k := range g.Values {
		g.Values[k] = math.NaN()
	}
	if got := g.Contours(-R); len(got) != 0 {
		t.Errorf("NaN field: got %d lines", len(got))
	}
}

// TestContoursOpen checks a contour that leaves the grid: one open line
// from edge to edge.
func TestContoursOpen(t *testing.T) {
	g := Grid{Step: 1, NX: 5, NY: 4, Values: make([]float64, 20)}
	for j := 0; j < 4; j++ {
		for i := 0; i < 5; i++ {
			g.Values[j*5+i] = float64(i) // a ramp in x
		}
	}
	lines := g.Contours(2.5)
	if len(lines) != 1 || len(lines[0]) != 4 {
		t.Fatalf("got %v, want one line of 4 points at x = 2.5", lines)
	}
	for _, p := range lines[0] {
		if p[0] != 2.5 {
			t.Errorf("point %v, want x = 2.5", p)
		}
	}
}
