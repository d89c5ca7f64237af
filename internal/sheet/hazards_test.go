package sheet_test

import (
	"math"
	"path/filepath"
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/layout"
	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

// planMap maps the cell frame (m) to the plan view's page (mm) of m, from
// the plan's scale and a station label's anchor (the mark, at the
// microphone): the plan view is not rotated.
func planMap(t *testing.T, m *sheet.Model, p *planner.Plan) (func(x, y float64) sheet.Pt, sheet.Rect) {
	t.Helper()
	k := 1000 / float64(m.Scale)
	var frame sheet.Rect
	for _, v := range m.Pages[0].Views {
		if v.Name == "plan" {
			frame = v.Frame
		}
	}
	for _, l := range m.Pages[0].Labels {
		if l.Kind != sheet.StationLabel || l.View != "" && l.View != "plan" {
			continue
		}
		for i := range p.Stations {
			if s := &p.Stations[i]; s.ID == l.For {
				ox, oy := l.Anchor.X-s.Mic.X*k, l.Anchor.Y+s.Mic.Y*k
				return func(x, y float64) sheet.Pt { return sheet.Pt{X: ox + x*k, Y: oy - y*k} }, frame
			}
		}
	}
	t.Fatal("no station label on the plan to find its origin")
	return nil, frame
}

// hazardCentres returns the centres of the warning triangles on the plan.
func hazardCentres(m *sheet.Model) []sheet.Pt {
	var out []sheet.Pt
	for _, v := range m.Pages[0].Views {
		if v.Name != "plan" {
			continue
		}
		for _, s := range v.Shapes {
			if s.Style == sheet.StyleHazard && len(s.Points) == 3 {
				out = append(out, sheet.Pt{X: (s.Points[0].X + s.Points[1].X + s.Points[2].X) / 3, Y: (s.Points[0].Y + s.Points[1].Y + s.Points[2].Y) / 3})
			}
		}
	}
	return out
}

// allText joins the texts of every page, runs of spaces squeezed.
func allText(m *sheet.Model) string {
	var s []string
	for _, pg := range m.Pages {
		for _, tx := range pg.Texts {
			s = append(s, tx.Text)
		}
	}
	return strings.Join(strings.Fields(strings.Join(s, " ")), " ")
}

// fencePlan is the anechoic demo with a thin fence across the jet axis
// 2.5 m downstream of the exit, planned by the planner.
func fencePlan(t *testing.T) *planner.Plan {
	req, _, err := layout.Load("../../layouts/anechoic-model-jet.yaml")
	if err != nil {
		t.Fatal(err)
	}
	a := req.Exit.ToCell(geometry.JetPoint{X: 2.5})
	req.Cell.Obstacles = append(req.Cell.Obstacles, geometry.Obstacle{Name: "test fence",
		Footprint: geometry.Polygon(orb.Ring{{a.X, a.Y - 1.5}, {a.X + 0.05, a.Y - 1.5}, {a.X + 0.05, a.Y + 1.5}, {a.X, a.Y + 1.5}, {a.X, a.Y - 1.5}}), ZMin: 0, ZMax: 4})
	p, err := planner.New(req)
	if err != nil {
		t.Fatal(err)
	}
	return p
}

// shortPadPlan is the outdoor pad demo with its site limit moved in to
// x = 380 ft, short of where buoyancy starts to bend the jets (150–192 ft
// downstream of the exit at x = 260 ft, the planner's report), and without
// the blast fence, which now lies off the site.
func shortPadPlan(t *testing.T) *planner.Plan {
	req, _, err := layout.Load("../../layouts/outdoor-static-pad.yaml")
	if err != nil {
		t.Fatal(err)
	}
	const ft = 0.3048 // m, exact
	req.Cell.Boundary = orb.Ring{{0, 0}, {380 * ft, 0}, {380 * ft, 492 * ft}, {0, 492 * ft}, {0, 0}}
	var keep []geometry.Obstacle
	for _, o := range req.Cell.Obstacles {
		if o.Name != "blast fence" {
			keep = append(keep, o)
		}
	}
	req.Cell.Obstacles = keep
	p, err := planner.New(req)
	if err != nil {
		t.Fatal(err)
	}
	return p
}

// TestHazardMarksFromThePlanner: every place where the planner reports a
// zone reaching a surface (Plan.Impingements, and the zones the surfaces
// carry on, Plan.Attached, which start there) has a warning triangle on
// the plan within a few mm of it (a strike on the obstacle itself), or a
// note when it is outside the frame; and every triangle stands for
// something the planner reports (no wall jet beyond a capturing collector
// or where no zone reaches): issue 9, safety content.
func TestHazardMarksFromThePlanner(t *testing.T) {
	demos, err := filepath.Glob("../../layouts/*.yaml")
	if err != nil || len(demos) == 0 {
		t.Fatalf("no demo layouts: %v", err)
	}
	type tc struct {
		name string
		plan *planner.Plan
	}
	var cases []tc
	for _, d := range demos {
		cases = append(cases, tc{filepath.Base(d), demoPlan(t, d)})
	}
	cases = append(cases, tc{"fence across the axis", fencePlan(t)}, tc{"pad, site limit short of the bend", shortPadPlan(t)})
	// near is how close a mark must be, mm: the sheet marks places of one
	// kind within 5 mm of each other with one triangle (DERIVED from the
	// triangle's size, 3.6 mm)
	const near = 5.5
	for _, c := range cases {
		t.Run(c.name, func(t *testing.T) {
			p := c.plan
			m := build(t, p, sheet.Options{})
			pt, frame := planMap(t, m, p)
			marks := hazardCentres(m)
			text := allText(m)
			k := 1000 / float64(m.Scale)
			inFrame := func(q sheet.Pt) bool {
				return q.X > frame.X+2 && q.X < frame.Right()-2 && q.Y > frame.Y+2 && q.Y < frame.Bottom()-2
			}
			// want is a place the planner reports; dist its distance from a
			// page point, mm
			type want struct {
				what  string
				point string
				at    sheet.Pt
				dist  func(q sheet.Pt) float64
			}
			var wants []want
			for _, im := range p.Impingements {
				w := want{what: im.Surface + " " + im.Obstacle, point: im.Point, at: pt(im.At[0], im.At[1])}
				w.dist = func(q sheet.Pt) float64 { return math.Hypot(q.X-w.at.X, q.Y-w.at.Y) }
				if im.Surface == planner.SurfaceObstacle {
					for _, o := range p.Request.Cell.Obstacles {
						if o.Name == im.Obstacle {
							fp := o.Footprint
							w.dist = func(q sheet.Pt) float64 {
								x0, y0 := pt(0, 0).X, pt(0, 0).Y
								return fp.Distance(orb.Point{(q.X - x0) / k, (y0 - q.Y) / k}) * k
							}
							// on the obstacle, nearest the planner's place
							w.at = q0(fp, im.At, pt)
						}
					}
				}
				wants = append(wants, w)
			}
			for _, a := range p.Attached {
				found := false
				for _, im := range p.Impingements {
					found = found || im.Point == a.Point && im.Zone == a.Zone && im.X == a.X
				}
				if !found {
					t.Errorf("%s: the %v zone carried on by the %s from %.2f m has no impingement to mark", a.Point, a.Zone, a.Surface, a.X)
				}
			}
			fence := false
			for _, w := range wants {
				fence = fence || strings.Contains(w.what, "fence")
				if !inFrame(w.at) {
					if !strings.Contains(text, "Outside the frame") || !strings.Contains(text, w.point) {
						t.Errorf("%s %s: outside the plan's frame and not in its notes", w.point, w.what)
					}
					continue
				}
				best := math.Inf(1)
				for _, q := range marks {
					best = math.Min(best, w.dist(q))
				}
				if best > near {
					t.Errorf("%s: %s: the nearest warning triangle is %.1f mm away, want within %.1f mm", w.point, w.what, best, near)
				}
			}
			if strings.Contains(c.name, "fence") && !fence {
				t.Error("the planner reports no strike of the fence across the axis")
			}
			// every triangle stands for a report: an impingement, a
			// buoyant point's onset or a crew position inside a zone
			var reports []sheet.Pt
			for _, w := range wants {
				reports = append(reports, w.at)
			}
			for k := range p.Points {
				q := &p.Points[k]
				if !jet.Has(q.Flags, jet.FlagBuoyant) {
					continue
				}
				on := q.Plume.Buoyancy().Onset
				a := p.Request.Exit.ToCell(geometry.JetPoint{X: on})
				// not beyond a capturing collector, nor outside the walls (a site limit is not a wall)
				col := p.Request.Cell.Collector
				if col != nil && q.Capture != planner.Blocked && on >= r3.Dot(r3.Sub(col.Inlet, p.Request.Exit.Exit), p.Request.Exit.Axis()) {
					continue
				}
				if p.Request.Cell.Bounded() && p.Request.Cell.Kind != geometry.OutdoorPad && !p.Request.Cell.Contains(orb.Point{a.X, a.Y}) {
					continue
				}
				reports = append(reports, pt(a.X, a.Y))
				if at := pt(a.X, a.Y); inFrame(at) {
					best := math.Inf(1)
					for _, m := range marks {
						best = math.Min(best, math.Hypot(m.X-at.X, m.Y-at.Y))
					}
					if best > near {
						t.Errorf("%s: buoyancy bends the jet from %.1f m: the nearest warning triangle is %.1f mm away", q.Name, on, best)
					}
				}
			}
			for _, e := range p.Crew {
				if e.InZone {
					reports = append(reports, pt(e.At.X, e.At.Y))
				}
			}
			if col := p.Request.Cell.Collector; col != nil {
				for k := range p.Points {
					if p.Points[k].Capture != planner.OK {
						reports = append(reports, pt(col.Inlet.X, col.Inlet.Y))
					}
				}
			}
			for _, q := range marks {
				best := math.Inf(1)
				for _, r := range reports {
					best = math.Min(best, math.Hypot(q.X-r.X, q.Y-r.Y))
				}
				if best > near {
					t.Errorf("a warning triangle at (%.1f, %.1f) mm is %.1f mm from anything the planner reports", q.X, q.Y, best)
				}
			}
		})
	}
}

// q0 returns the page point of the footprint fp nearest to the cell point
// a, sampled along its outline.
func q0(fp geometry.Footprint, a orb.Point, pt func(x, y float64) sheet.Pt) sheet.Pt {
	ring := fp.Ring
	if ring == nil {
		ring = fp.Outline(72)
	}
	best, bd := ring[0], math.Inf(1)
	for i := 0; i+1 < len(ring); i++ {
		for s := 0.0; s <= 1; s += 0.01 {
			q := orb.Point{ring[i][0] + s*(ring[i+1][0]-ring[i][0]), ring[i][1] + s*(ring[i+1][1]-ring[i][1])}
			if d := math.Hypot(q[0]-a[0], q[1]-a[1]); d < bd {
				best, bd = q, d
			}
		}
	}
	if fp.Contains(a) {
		best = a
	}
	return pt(best[0], best[1])
}

// TestClearanceViewRingsCarriedBlocks: the clearance view draws the free
// zones, bodies of revolution; a station blocked by a zone bent by
// buoyancy or carried along the ground (the pad's G-15 and G-16, 0 in
// from the velocity zone carried along the ground) would sit outside their
// outline there, so it is ringed and the caption says so: the caption's
// "clear exactly when outside the outline" holds for what is drawn
// (review of the sheet, item 4).
func TestClearanceViewRingsCarriedBlocks(t *testing.T) {
	p := demoPlan(t, "../../layouts/outdoor-static-pad.yaml")
	m := build(t, p, sheet.Options{})
	want := map[string]bool{}
	for _, s := range p.Stations {
		for _, c := range s.Checks {
			if (c.Name == planner.CheckVelocity || c.Name == planner.CheckHot) && c.Verdict != planner.OK &&
				(strings.Contains(c.Reason, "bent by buoyancy") || strings.Contains(c.Reason, "carried along the")) {
				want[s.ID] = true
			}
		}
	}
	if !want["G-15"] || !want["G-16"] {
		t.Fatalf("the planner no longer blocks G-15 and G-16 by a carried zone: %v", want)
	}
	found := false
	for _, pg := range m.Pages {
		for _, v := range pg.Views {
			if v.Name != "clearance" {
				continue
			}
			found = true
			var rings []sheet.Pt
			for _, s := range v.Shapes {
				if s.Kind == sheet.Circle && s.Style == sheet.StyleStrike {
					rings = append(rings, s.Points[0])
				}
			}
			for _, l := range pg.Labels {
				if l.View != "clearance" || l.Kind != sheet.StationLabel {
					continue
				}
				ringed := false
				for _, r := range rings {
					ringed = ringed || math.Hypot(r.X-l.Anchor.X, r.Y-l.Anchor.Y) < 0.01
				}
				if ringed != want[l.For] {
					t.Errorf("%s: ringed %v in the clearance view, want %v", l.For, ringed, want[l.For])
				}
			}
			if len(rings) != len(want) {
				t.Errorf("got %d ringed stations, want %d", len(rings), len(want))
			}
			text := sheetText(m, pg.Number-1)
			if !strings.Contains(text, "not bodies of revolution and are not drawn here: a station they block is ringed") {
				t.Error("the clearance view's caption does not say that bent and carried zones are not drawn and how their blocks are shown")
			}
		}
	}
	if !found {
		t.Fatal("no clearance view")
	}
}

// TestCaptureWarningMarked: the warnings panel says triangles mark where
// its warnings apply, so a collector capture warning (warn or blocked) has
// a triangle at the collector inlet; both demos with a collector have one
// (the anechoic demo warns, the hard-wall room blocks: their planner
// output).
func TestCaptureWarningMarked(t *testing.T) {
	const near = 5.5 // mm, as in TestHazardMarksFromThePlanner
	for _, d := range []string{"anechoic-model-jet.yaml", "hard-wall-exhaust-room.yaml"} {
		t.Run(d, func(t *testing.T) {
			p := demoPlan(t, filepath.Join("../../layouts", d))
			col := p.Request.Cell.Collector
			n := 0
			for k := range p.Points {
				if p.Points[k].Capture != planner.OK {
					n++
				}
			}
			if col == nil || n == 0 {
				t.Fatalf("the demo has no capture warning to mark")
			}
			m := build(t, p, sheet.Options{})
			pt, _ := planMap(t, m, p)
			at := pt(col.Inlet.X, col.Inlet.Y)
			best := math.Inf(1)
			for _, q := range hazardCentres(m) {
				best = math.Min(best, math.Hypot(q.X-at.X, q.Y-at.Y))
			}
			if best > near {
				t.Errorf("capture warning: the nearest triangle is %.1f mm from the collector inlet, want within %.1f mm", best, near)
			}
			if !strings.Contains(allText(m), "capture") {
				t.Errorf("no text on the sheet names the capture warning")
			}
		})
	}
}
