package sheet_test

import (
	"testing"

	"arcwright/internal/sheet"
)

// TestObstaclesClippedToThePlan: on a cropped site (the reviewer's large
// site on A0 at 1" = 20') every obstacle drawn on the plan lies inside the
// plan's frame, and every obstacle's name and leader too (review: a
// leader ran up past the top frame line, obstacles straddled the bottom
// frame line).
func TestObstaclesClippedToThePlan(t *testing.T) {
	p := demoPlan(t, "testdata/review-big.yaml")
	m := build(t, p, sheet.Options{Paper: "A0", Scale: 240})
	pg := m.Pages[0]
	v := pg.Views[0]
	f := v.Frame
	in := func(q sheet.Pt) bool {
		return q.X >= f.X-0.01 && q.X <= f.Right()+0.01 && q.Y >= f.Y-0.01 && q.Y <= f.Bottom()+0.01
	}
	names := map[string]bool{}
	for _, o := range p.Request.Cell.Obstacles {
		names[o.Name] = true
	}
	drawn := 0
	for _, sh := range v.Shapes {
		if sh.Style != sheet.StyleObstacle {
			continue
		}
		drawn++
		for _, q := range sh.Points {
			if !in(q) {
				t.Errorf("an obstacle's outline reaches %+v, outside the plan frame %+v", q, f)
				break
			}
		}
	}
	if drawn == 0 {
		t.Fatal("no obstacle drawn")
	}
	for _, l := range pg.Labels {
		if l.View != v.Name || !names[l.For] {
			continue
		}
		b := l.Box()
		if !in(sheet.Pt{X: b.X, Y: b.Y}) || !in(sheet.Pt{X: b.Right(), Y: b.Bottom()}) {
			t.Errorf("obstacle %s: label %+v outside the plan frame", l.For, b)
		}
		for _, q := range l.Line {
			if !in(q) {
				t.Errorf("obstacle %s: leader reaches %+v, outside the plan frame %+v", l.For, q, f)
			}
		}
	}
}
