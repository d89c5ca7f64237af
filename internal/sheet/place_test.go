package sheet

import (
	"math/rand/v2"
	"testing"
)

func TestSegHitsRect(t *testing.T) {
	r := Rect{0, 0, 10, 5}
	tests := []struct {
		name string
		a, b Pt
		want bool
	}{
		{"through", Pt{-5, 2}, Pt{15, 2}, true},
		{"inside", Pt{2, 2}, Pt{3, 3}, true},
		{"above", Pt{-5, -1}, Pt{15, -1}, false},
		{"diagonal miss", Pt{9, -5}, Pt{15, 1}, false},
		{"diagonal hit", Pt{8, -2}, Pt{12, 2}, true},
		{"ends short", Pt{-5, 2}, Pt{-1, 2}, false},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := segHitsRect(tt.a, tt.b, r, 0); got != tt.want {
				t.Errorf("got %v, want %v", got, tt.want)
			}
		})
	}
}

// TestPlacerProperty places many labels around random marks and checks by
// brute force that no two placed boxes overlap, no box covers a mark and
// every box is inside the bounds.
func TestPlacerProperty(t *testing.T) {
	rng := rand.New(rand.NewPCG(7, 11))
	bounds := Rect{0, 0, 120, 80}
	pl := newPlacer(bounds)
	var marks, boxes []Rect
	for range 300 {
		p := Pt{5 + 110*rng.Float64(), 5 + 70*rng.Float64()}
		m := rectAround(p, 0.8)
		pl.block(m)
		marks = append(marks, m)
	}
	for i, m := range marks {
		c := Pt{m.X + 0.8, m.Y + 0.8}
		s, ok := pl.find(want{w: 4 + float64(i%3), h: 2.2, anchor: c, clear: 1, dir: Pt{1, 0}}, []float64{2, 5, 9})
		if !ok {
			continue
		}
		pl.commit(s)
		boxes = append(boxes, s.box)
	}
	if len(boxes) < 100 {
		t.Fatalf("placed %d of 300 labels, want most of them", len(boxes))
	}
	for i, a := range boxes {
		if !bounds.Contains(a) {
			t.Fatalf("box %v is outside %v", a, bounds)
		}
		for _, b := range boxes[i+1:] {
			if a.Overlaps(b, 0) {
				t.Fatalf("boxes %v and %v overlap", a, b)
			}
		}
		for _, m := range marks {
			if a.Overlaps(m, 0) {
				t.Fatalf("box %v covers mark %v", a, m)
			}
		}
	}
}
