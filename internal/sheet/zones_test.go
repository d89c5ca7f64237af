package sheet

import (
	"math"
	"testing"
)

// TestMarginOutline grows a rectangular zone (0 ≤ x ≤ 4, r ≤ 1) by 0.5 m:
// the band is r = 1.5 over the zone, a quarter circle beyond each end, and
// reaches from x = −0.5 to 4.5 (hand-computed Minkowski sum).
func TestMarginOutline(t *testing.T) {
	zone := zoneOutline{{0, 0}, {0, 1}, {4, 1}, {4, 0}}
	const m = 0.5
	out := marginOutline(zone, m, 400)
	if out[0] != [2]float64{-m, 0} || out[len(out)-1] != [2]float64{4 + m, 0} {
		t.Fatalf("got ends %v and %v, want (-0.5, 0) and (4.5, 0)", out[0], out[len(out)-1])
	}
	for _, p := range out[1 : len(out)-1] {
		var want float64
		switch x := p[0]; {
		case x < 0:
			want = 1 + math.Sqrt(m*m-x*x)
		case x > 4:
			want = 1 + math.Sqrt(m*m-(x-4)*(x-4))
		default:
			want = 1 + m
		}
		// never inside the exact band, and outside by at most the
		// lift e = m − sqrt(m² − (m/8)²) of points m/4 apart (derived)
		e := m - math.Sqrt(m*m-m*m/64)
		if p[1] < want-1e-9 || p[1] > want+e+1e-9 {
			t.Errorf("at x = %.3f: got r = %.4f, want %.4f to %.4f", p[0], p[1], want, want+e)
		}
	}
	if marginOutline(nil, m, 10) != nil || marginOutline(zone, 0, 10) != nil {
		t.Error("got a band for an empty zone or a zero margin, want none")
	}
}
