package sheet_test

import (
	"fmt"
	"math"
	"path/filepath"
	"strings"
	"testing"

	"github.com/paulmach/orb"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
	"arcwright/internal/sheet"
	"arcwright/internal/units"
)

// Where a plan label sits (issue 9 item 4: "labels sit on the hatch away
// from their symbols"). The measures here are the test's own, from the
// sheet model alone: the hatched regions are the view's polygons whose
// style hatches (zones, keep-outs, treatment), cut by their clip; a label
// box "sits on the hatch" when a point of it, 0.3 mm inside its edge, lies
// in such a region.
const (
	// spotReach is the gap (mm) between a label's anchor and its box
	// within which a clear spot must be used rather than the hatch: a
	// reasonable leader, about half an inch on the page (our choice).
	spotReach = 10.0
	// spotSlack is the clear space (mm) a spot must have all round to
	// count as clear here, so that a spot the test finds between the
	// placer's candidate positions is not asked for.
	spotSlack = 1.0
	// nearGap is the largest gap (mm) between a station label without a
	// leader and its station's centre: the symbol (at most 1.1 mm radius)
	// and the clear space beside it.
	nearGap = 3.0
	// featureGap is the same for the other labels, whose marks (an arc's
	// dimension line, a zone's edge, a hazard triangle) are larger.
	featureGap = 6.0
	// maxLeader is the longest leader (mm) a station label may have.
	maxLeader = 25.0
)

// hatchRegion is one hatched polygon of a view: its rings (even-odd) and
// its clip polygon (none when shorter than three points).
type hatchRegion struct {
	rings [][]sheet.Pt
	clip  []sheet.Pt
	bound sheet.Rect
}

// inRing reports whether p lies inside ring by the even-odd crossing rule.
func inRing(p sheet.Pt, ring []sheet.Pt) bool {
	in := false
	n := len(ring)
	for i, j := 0, n-1; i < n; j, i = i, i+1 {
		a, b := ring[i], ring[j]
		if (a.Y > p.Y) != (b.Y > p.Y) && p.X < a.X+(p.Y-a.Y)/(b.Y-a.Y)*(b.X-a.X) {
			in = !in
		}
	}
	return in
}

func (h hatchRegion) contains(p sheet.Pt) bool {
	b := h.bound
	if p.X < b.X || p.X > b.Right() || p.Y < b.Y || p.Y > b.Bottom() {
		return false
	}
	in := false
	for _, r := range h.rings {
		if inRing(p, r) {
			in = !in
		}
	}
	return in && (len(h.clip) < 3 || inRing(p, h.clip))
}

// hatchedRegions returns the hatched polygons of view v.
func hatchedRegions(v sheet.View) []hatchRegion {
	var out []hatchRegion
	for _, s := range v.Shapes {
		d, ok := s.Style.Def()
		if !ok || len(d.Hatches) == 0 || s.Kind != sheet.Polygon || len(s.Points) < 3 {
			continue
		}
		h := hatchRegion{rings: append([][]sheet.Pt{s.Points}, s.Holes...), clip: s.Clip, bound: bound(s.Points)}
		if len(s.Clip) >= 3 {
			h.bound = intersect(h.bound, bound(s.Clip))
		}
		out = append(out, h)
	}
	return out
}

func bound(pts []sheet.Pt) sheet.Rect {
	x0, y0, x1, y1 := math.Inf(1), math.Inf(1), math.Inf(-1), math.Inf(-1)
	for _, p := range pts {
		x0, y0, x1, y1 = math.Min(x0, p.X), math.Min(y0, p.Y), math.Max(x1, p.X), math.Max(y1, p.Y)
	}
	return sheet.Rect{X: x0, Y: y0, W: x1 - x0, H: y1 - y0}
}

func intersect(a, b sheet.Rect) sheet.Rect {
	x0, y0 := math.Max(a.X, b.X), math.Max(a.Y, b.Y)
	x1, y1 := math.Min(a.Right(), b.Right()), math.Min(a.Bottom(), b.Bottom())
	return sheet.Rect{X: x0, Y: y0, W: math.Max(0, x1-x0), H: math.Max(0, y1-y0)}
}

func grow(r sheet.Rect, d float64) sheet.Rect {
	return sheet.Rect{X: r.X - d, Y: r.Y - d, W: r.W + 2*d, H: r.H + 2*d}
}

// hatchSet is the hatched regions of a view with a memo of the sample
// points already tried.
type hatchSet struct {
	regions []hatchRegion
	memo    map[[2]int]bool
}

// sampleStep is the spacing of the sample points of onHatch, mm.
const sampleStep = 0.25

// at reports whether the sample point (i, j)·sampleStep lies in a hatched
// region.
func (h *hatchSet) at(i, j int) bool {
	k := [2]int{i, j}
	if v, ok := h.memo[k]; ok {
		return v
	}
	p := sheet.Pt{X: float64(i) * sampleStep, Y: float64(j) * sampleStep}
	in := false
	for _, r := range h.regions {
		if in = r.contains(p); in {
			break
		}
	}
	h.memo[k] = in
	return in
}

// onHatch reports whether box r, shrunk by 0.3 mm, holds a point of a
// hatched region, sampled every sampleStep on the page.
func (h *hatchSet) onHatch(r sheet.Rect) bool {
	r = grow(r, -0.3)
	i0, i1 := int(math.Ceil(r.X/sampleStep)), int(math.Floor(r.Right()/sampleStep))
	j0, j1 := int(math.Ceil(r.Y/sampleStep)), int(math.Floor(r.Bottom()/sampleStep))
	for _, g := range h.regions {
		if !g.bound.Overlaps(r, 0) {
			continue
		}
		for i := i0; i <= i1; i++ {
			for j := j0; j <= j1; j++ {
				if h.at(i, j) {
					return true
				}
			}
		}
		return false
	}
	return false
}

// nearest returns the point of box r nearest to p.
func nearest(p sheet.Pt, r sheet.Rect) sheet.Pt {
	return sheet.Pt{X: math.Max(r.X, math.Min(p.X, r.Right())), Y: math.Max(r.Y, math.Min(p.Y, r.Bottom()))}
}

// gapTo returns the distance from p to box r, 0 inside it, mm.
func gapTo(p sheet.Pt, r sheet.Rect) float64 {
	dx := math.Max(0, math.Max(r.X-p.X, p.X-r.Right()))
	dy := math.Max(0, math.Max(r.Y-p.Y, p.Y-r.Bottom()))
	return math.Hypot(dx, dy)
}

// fixedLabel reports whether l is set in a fixed place (the grid figures
// along the frame, the datum's axis letters) rather than placed.
func fixedLabel(l sheet.Label) bool {
	return strings.HasPrefix(l.For, "grid ") || l.For == "datum axis"
}

// markStyles are the styles of the drawn marks a label must keep off.
var markStyles = map[sheet.Style]bool{
	sheet.StyleMark: true, sheet.StyleStrike: true, sheet.StyleSolid: true, sheet.StyleHazard: true,
	sheet.StyleNozzle: true, sheet.StyleCrew: true, sheet.StyleWhite: true, sheet.StyleTick: true,
	sheet.StyleCollector: true,
}

// segHits reports whether the segment ab meets r (sampled every 0.1 mm).
func segHits(a, b sheet.Pt, r sheet.Rect) bool {
	n := int(math.Ceil(math.Hypot(b.X-a.X, b.Y-a.Y)/0.1)) + 1
	for i := 0; i <= n; i++ {
		t := float64(i) / float64(n)
		p := sheet.Pt{X: a.X + t*(b.X-a.X), Y: a.Y + t*(b.Y-a.Y)}
		if p.X > r.X && p.X < r.Right() && p.Y > r.Y && p.Y < r.Bottom() {
			return true
		}
	}
	return false
}

// clearSpot looks for a box of l's size whose gap to l's anchor is at most
// spotReach, inside the placer's bounds (the frame less 0.8 mm), off the
// hatch and, with spotSlack all round, clear of every other label, leader
// and mark of the view, that a straight leader from the anchor reaches
// without crossing a label or a mark (but the marks at the anchor). It
// returns the spot found.
func clearSpot(l sheet.Label, others []sheet.Label, marks []sheet.Rect, frame sheet.Rect, hs *hatchSet) (sheet.Rect, bool) {
	in := grow(frame, -0.8)
	a := l.Anchor
	reach := spotReach + math.Max(l.W, l.H)
	var near []sheet.Rect
	var segs [][2]sheet.Pt
	for _, o := range others {
		if gapTo(a, o.Box()) < reach+2 {
			near = append(near, o.Box())
		}
		if len(o.Line) == 2 {
			segs = append(segs, [2]sheet.Pt{o.Line[0], o.Line[1]})
		}
	}
	var cross []sheet.Rect // what a leader may not cross
	for _, o := range near {
		cross = append(cross, o)
	}
	for _, m := range marks {
		if gapTo(a, m) < reach+2 {
			near = append(near, m)
			if gapTo(a, m) > 0 {
				cross = append(cross, m)
			}
		}
	}
	const step = 0.5
	for dy := -reach; dy <= reach; dy += step {
		for dx := -reach; dx <= reach; dx += step {
			r := sheet.Rect{X: a.X + dx - l.W/2, Y: a.Y + dy - l.H/2, W: l.W, H: l.H}
			if gapTo(a, r) > spotReach || !in.Contains(r) {
				continue
			}
			g := grow(r, spotSlack)
			free := true
			for _, o := range near {
				if o.Overlaps(g, 0) {
					free = false
					break
				}
			}
			for _, s := range segs {
				if !free {
					break
				}
				free = !segHits(s[0], s[1], g)
			}
			if !free || hs.onHatch(grow(r, spotSlack+0.3)) {
				continue
			}
			to := nearest(a, r)
			for _, o := range cross {
				if free = !segHits(a, to, o); !free {
					break
				}
			}
			if free {
				return r, true
			}
		}
	}
	return sheet.Rect{}, false
}

// labelSpots measures every placed label of the plan and detail views of
// m and reports: a label on the hatch where a clear spot lies within
// reach, a station label without a leader farther than nearGap from its
// station, another label without a leader farther than featureGap, and a
// leader that does not join the label to its mark.
func labelSpots(t *testing.T, what string, m *sheet.Model) {
	t.Helper()
	onHatchN, placed := 0, 0
	for _, pg := range m.Pages {
		for _, v := range pg.Views {
			if v.Name != "plan" && !strings.HasPrefix(v.Name, "detail ") {
				continue
			}
			hs := &hatchSet{regions: hatchedRegions(v), memo: map[[2]int]bool{}}
			var ls []sheet.Label
			for _, l := range pg.Labels {
				if l.View == v.Name {
					ls = append(ls, l)
				}
			}
			var marks []sheet.Rect
			for _, s := range v.Shapes {
				if !markStyles[s.Style] {
					continue
				}
				if s.Kind == sheet.Circle {
					marks = append(marks, sheet.Rect{X: s.Points[0].X - s.R, Y: s.Points[0].Y - s.R, W: 2 * s.R, H: 2 * s.R})
				} else {
					marks = append(marks, bound(s.Points))
				}
			}
			for i, l := range ls {
				if fixedLabel(l) {
					continue
				}
				placed++
				box := l.Box()
				if hs.onHatch(box) {
					onHatchN++
					others := append(append([]sheet.Label(nil), ls[:i]...), ls[i+1:]...)
					if r, ok := clearSpot(l, others, marks, v.Frame, hs); ok {
						t.Errorf("%s: %s: label %q (%s) at (%.1f, %.1f) sits on the hatch; (%.1f, %.1f) is clear, %.1f mm from its mark",
							what, v.Name, l.Text, l.Kind, l.X, l.Y, r.X, r.Y, gapTo(l.Anchor, r))
					}
				}
				gap := gapTo(l.Anchor, box)
				station := l.Kind == sheet.StationLabel || l.Kind == sheet.NumberLabel || l.Kind == sheet.RangeLabel
				if !l.Leader {
					limit := featureGap
					if station {
						limit = nearGap
					}
					if gap > limit {
						t.Errorf("%s: %s: label %q (%s) sits %.1f mm from its mark without a leader, want at most %.1f mm", what, v.Name, l.Text, l.Kind, gap, limit)
					}
					continue
				}
				if len(l.Line) != 2 {
					t.Errorf("%s: %s: label %q has a leader of %d points, want 2", what, v.Name, l.Text, len(l.Line))
					continue
				}
				// the leader runs from beside the mark to the box's edge
				from, to := l.Line[0], l.Line[1]
				if d := gapTo(to, box); d > 0.05 || to.X > box.X+0.05 && to.X < box.Right()-0.05 && to.Y > box.Y+0.05 && to.Y < box.Bottom()-0.05 {
					t.Errorf("%s: %s: the leader of %q ends at (%.1f, %.1f), off its box's edge %v", what, v.Name, l.Text, to.X, to.Y, box)
				}
				if station {
					if d := math.Hypot(from.X-l.Anchor.X, from.Y-l.Anchor.Y); d > nearGap {
						t.Errorf("%s: %s: the leader of %q starts %.1f mm from its station, want at most %.1f", what, v.Name, l.Text, d, nearGap)
					}
					if d := math.Hypot(to.X-from.X, to.Y-from.Y); d > maxLeader {
						t.Errorf("%s: %s: the leader of %q is %.1f mm long, want at most %.1f", what, v.Name, l.Text, d, maxLeader)
					}
				}
			}
		}
	}
	t.Logf("%s: %d labels placed, %d on the hatch", what, placed, onHatchN)
}

// TestLabelsOffTheHatchAndNearTheirMarks: on every demo and on crowded
// hand-made plans, no placed label of the plan or a detail sits on a
// hatched zone where a clear spot lies within a reasonable leader's reach,
// and each label lies beside its mark or is joined to it by a leader
// (issue 9 item 4).
func TestLabelsOffTheHatchAndNearTheirMarks(t *testing.T) {
	paths, err := filepath.Glob("../../layouts/*.yaml")
	if err != nil || len(paths) == 0 {
		t.Fatalf("no demo layouts: %v", err)
	}
	type tcase struct {
		name string
		plan func(testing.TB) *planner.Plan
		opt  sheet.Options
	}
	var cases []tcase
	for _, path := range paths {
		cases = append(cases, tcase{filepath.Base(path), func(t testing.TB) *planner.Plan { return demoPlan(t, path) }, sheet.Options{}})
	}
	cases = append(cases,
		tcase{"chamber A3", chamberPlan, sheet.Options{}},
		tcase{"chamber A4", chamberPlan, sheet.Options{Paper: "A4"}},
		tcase{"pad 60 stations", func(t testing.TB) *planner.Plan { return padPlan(t, 60) }, sheet.Options{}},
		tcase{"pad 500 stations", func(t testing.TB) *planner.Plan { return padPlan(t, 500) }, sheet.Options{}},
		tcase{"pad 500 stations on A4", func(t testing.TB) *planner.Plan { return padPlan(t, 500) }, sheet.Options{Paper: "A4"}},
		tcase{"hugging sidelines", hugPlan, sheet.Options{}},
	)
	for _, tt := range cases {
		t.Run(tt.name, func(t *testing.T) {
			m := build(t, tt.plan(t), tt.opt)
			labelSpots(t, fmt.Sprint(tt.name), m)
		})
	}
}

// hugPlan is a crowded plan whose stations crowd the zones' edges: a
// close arc that runs into the plume, two dense sidelines along the
// velocity zone with keep-outs between their stations and the edge of the
// hatch, in metres.
func hugPlan(t testing.TB) *planner.Plan {
	t.Helper()
	p := padPlan(t, 2) // the pad's cell and exhaust, stations replaced
	req := p.Request
	req.Units = units.Metric
	req.Cell.KeepOuts = append(req.Cell.KeepOuts,
		geometry.KeepOut{Name: "cable trench", Footprint: geometry.Polygon(orb.Ring{{6, 3.2}, {22, 3.2}, {22, 4.4}, {6, 4.4}})},
		geometry.KeepOut{Name: "drain", Footprint: geometry.Circle(orb.Point{12, -5.5}, 1.2)},
	)
	f := newFixture(t, req)
	tri := &req.Stands[0]
	f.arc("C", 0, 6, 10, 170, 4, 0, tri)
	f.line("S", 4.8, 2, 24, 0.5, math.Pi, tri, planner.NormalIncidence)
	f.line("U", 5, 2, 24, 1, 0, tri, planner.NormalIncidence)
	f.ring("R", 3, 1.5, 12)
	return f.finish()
}

// TestNearFieldDetail: the anechoic demo's near-field line, whose IDs go
// on leaders for want of room, keeps its detail view (issue 9 item 4).
func TestNearFieldDetail(t *testing.T) {
	m := build(t, demoPlan(t, "../../layouts/anechoic-model-jet.yaml"), sheet.Options{})
	for _, pg := range m.Pages {
		for _, tx := range pg.Texts {
			if strings.HasPrefix(tx.Text, "DETAIL ") && strings.Contains(tx.Text, "— N-01 to N-07,") { // the stations it shows
				return
			}
		}
	}
	t.Error("no detail view of the near-field line N")
}
