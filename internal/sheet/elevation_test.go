package sheet_test

import (
	"math"
	"strings"
	"testing"

	"arcwright/internal/jet"
	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

// inside reports whether p is inside the ring pts (even-odd rule).
func inside(p sheet.Pt, pts []sheet.Pt) bool {
	in := false
	for i, j := 0, len(pts)-1; i < len(pts); j, i = i, i+1 {
		a, b := pts[i], pts[j]
		if (a.Y > p.Y) != (b.Y > p.Y) && p.X < (b.X-a.X)*(p.Y-a.Y)/(b.Y-a.Y)+a.X {
			in = !in
		}
	}
	return in
}

// TestClearanceViewTells: in the clearance view every station's mark is
// inside the drawn velocity zone exactly when the station is inside the
// conservative velocity zone (its distance from the axis below the zone's
// radius at its axial position) — the view tells the truth that the old
// projection onto the axis plane did not (issue 9 item 2: ground
// microphones drawn inside the hot zone).
func TestClearanceViewTells(t *testing.T) {
	for _, tt := range []struct {
		name string
		plan func(testing.TB) *planner.Plan
	}{{"chamber", chamberPlan}, {"pad", func(t testing.TB) *planner.Plan { return padPlan(t, 60) }}} {
		t.Run(tt.name, func(t *testing.T) {
			p := tt.plan(t)
			m := build(t, p, sheet.Options{})
			var view *sheet.View
			var labels []sheet.Label
			for i := range m.Pages {
				for j := range m.Pages[i].Views {
					if m.Pages[i].Views[j].Name == "clearance" {
						view = &m.Pages[i].Views[j]
						labels = m.Pages[i].Labels
					}
				}
			}
			if view == nil {
				t.Fatal("no clearance view")
			}
			var zone []sheet.Pt
			for _, sh := range view.Shapes {
				if sh.Style == sheet.StyleVelocity {
					zone = sh.Points
				}
			}
			env := p.Points[p.Governing].Plume.Envelope(jet.VelocityZone, jet.Conservative)
			checked := 0
			for _, l := range labels {
				if l.View != "clearance" || l.Kind != sheet.StationLabel {
					continue
				}
				var s *planner.Station
				for i := range p.Stations {
					if p.Stations[i].ID == l.Text {
						s = &p.Stations[i]
					}
				}
				if s == nil {
					t.Fatalf("label %q names no station", l.Text)
				}
				r := env.Radius(s.Jet.X)
				if math.Abs(s.Jet.R-r) < 0.02 {
					continue // on the edge, within a drawing's accuracy
				}
				if got, want := inside(l.Anchor, zone), s.Jet.R < r; got != want {
					t.Errorf("%s at x %.3f m, r %.3f m (zone radius %.3f m): drawn inside %v, truly inside %v", s.ID, s.Jet.X, s.Jet.R, r, got, want)
				}
				checked++
			}
			if checked < len(p.Stations)/2 {
				t.Errorf("checked %d of %d stations, want most labelled", checked, len(p.Stations))
			}
		})
	}
}

// TestSideViewsNumbered: both side views number their axes (no "-0"), and
// the elevation cuts its zones at the floor (issue 9 item 2: no numbers on
// the x axis, "-0" on the height axis, zones through the floor).
func TestSideViewsNumbered(t *testing.T) {
	m := build(t, chamberPlan(t), sheet.Options{})
	count := map[string]int{}
	for _, pg := range m.Pages {
		for _, l := range pg.Labels {
			if strings.HasPrefix(l.For, "grid") && (l.View == "elevation" || l.View == "clearance") {
				count[l.View+" "+l.For]++
				if l.Text == "-0" {
					t.Errorf("%s %s prints -0", l.View, l.For)
				}
			}
		}
		for _, v := range pg.Views {
			if v.Name != "elevation" {
				continue
			}
			for _, sh := range v.Shapes {
				if sh.Style != sheet.StyleVelocity {
					continue
				}
				if len(sh.Clip) < 3 {
					t.Fatal("the elevation's velocity zone is not cut")
				}
				// the clip's lowest edge is the floor line
				low := 0.0
				for _, q := range sh.Clip {
					low = math.Max(low, q.Y)
				}
				var floorY float64
				for _, s2 := range v.Shapes {
					if s2.Style == sheet.StyleBoundary && len(s2.Points) == 2 && s2.Points[0].Y == s2.Points[1].Y {
						floorY = math.Max(floorY, s2.Points[0].Y)
					}
				}
				if math.Abs(low-floorY) > 1e-6 {
					t.Errorf("the zone is cut at page y %.2f, the floor is at %.2f", low, floorY)
				}
			}
		}
	}
	for _, k := range []string{"elevation grid x", "elevation grid height", "clearance grid x", "clearance grid r"} {
		if count[k] < 2 {
			t.Errorf("%s: got %d numbers, want at least 2", k, count[k])
		}
	}
}
