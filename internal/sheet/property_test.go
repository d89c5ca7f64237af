package sheet_test

import (
	"errors"
	"fmt"
	"math"
	"math/rand/v2"
	"strings"
	"testing"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
	"arcwright/internal/sheet"
	"arcwright/internal/units"
)

// randomPlan plans a random cell with the planner: a hard-walled or
// anechoic room, an outdoor pad inside a site limit, or an open site, 3 m
// to 600 m across, metric or feet and inches, with an arc, a sideline, a
// ring and a few points (the planner's safety test draws its cells the
// same way; these add open sites and sheets in feet).
func randomPlan(t testing.TB, rng *rand.Rand, i int) *planner.Plan {
	t.Helper()
	size := 3 * math.Pow(200, rng.Float64()) // 3 m to 600 m, log-uniform
	w, l := size*(0.6+0.8*rng.Float64()), size*(0.6+0.8*rng.Float64())
	kind := geometry.Kind(i % 3)
	d := math.Min(0.02+0.3*rng.Float64(), size/40)
	ceiling := math.Inf(1)
	if kind != geometry.OutdoorPad {
		ceiling = 3 + math.Min(size/3, 10)*rng.Float64()
	}
	axis := 0.5 + math.Min(2.5, 0.4*math.Min(ceiling, 8))*rng.Float64()
	exit := r3.Vec{X: w * (0.2 + 0.3*rng.Float64()), Y: l * (0.3 + 0.4*rng.Float64()), Z: axis}
	sys := units.Metric
	if rng.IntN(2) == 1 {
		sys = units.Imperial
	}
	req := &planner.Request{
		Source: "random", Units: sys, Convention: planner.Convention(1 + rng.IntN(2)),
		Title:   planner.Title{Title: "Random cell", Facility: "Test range"},
		Ambient: planner.Ambient{Pressure: 101325, Temperature: 288, Humidity: 50},
		Cell: geometry.Cell{
			Kind: kind, Ceiling: ceiling, Floor: geometry.Surface(rng.IntN(2)),
			Marks: []geometry.Mark{{Name: "M1", At: orb.Point{w * rng.Float64(), l * rng.Float64()}}},
		},
		Nozzle: jet.Nozzle{Kind: jet.Convergent, Diameter: d},
		Exit:   geometry.JetFrame{Exit: exit, Heading: 2 * math.Pi * rng.Float64()},
		Band:   planner.Band{Low: 100, High: 20000},
		Limits: planner.DefaultLimits(),
		Stands: []planner.Stand{
			{Name: "post", BaseRadius: 0.15, BaseHeight: 0.1, PoleDiameter: 0.03},
			{Name: "boom", BaseRadius: 0.2, BaseHeight: 0.1, PoleDiameter: 0.03, BoomLength: 0.4},
		},
	}
	// the fifth is an open site with no boundary
	if i != 5 {
		req.Cell.Boundary = orb.Ring{{0, 0}, {w, 0}, {w, l}, {0, l}, {0, 0}}
	}
	for i := 0; i <= rng.IntN(3); i++ {
		req.Points = append(req.Points, jet.Condition{Name: fmt.Sprintf("P%d", i+1),
			Primary: jet.Stream{NPR: 1.05 + 1.5*rng.Float64(), TotalTemperature: 280 + 600*rng.Float64()}})
	}
	for i := 0; i < rng.IntN(5); i++ {
		c := orb.Point{w * rng.Float64(), l * rng.Float64()}
		if math.Hypot(c[0]-exit.X, c[1]-exit.Y) < size/6 {
			continue
		}
		req.Cell.Obstacles = append(req.Cell.Obstacles, geometry.Obstacle{Name: fmt.Sprintf("o%d", i),
			Footprint: geometry.Circle(c, size/50), ZMin: 0, ZMax: 1 + 2*rng.Float64()})
	}
	stand := func() string { return []string{"post", "boom", ""}[rng.IntN(3)] }
	az := func() float64 { return []float64{0, math.Pi / 2, math.Pi}[rng.IntN(3)] }
	deg := func(d float64) float64 { return d * math.Pi / 180 }
	r := size * (0.15 + 0.2*rng.Float64())
	step := []float64{2, 5, 10, 15}[rng.IntN(4)]
	req.Arrays = []planner.Array{
		{Name: "A", Kind: planner.Arc, Stand: stand(), Radius: r, From: deg(20), To: deg(160), Step: deg(step), Azimuth: az()},
		{Name: "S", Kind: planner.Line, Stand: stand(), Offset: r / 2, XFrom: 0, XTo: r, Spacing: r / 8, Azimuth: az()},
		{Name: "R", Kind: planner.Ring, Stand: "", RingX: r / 3, Radius: r / 6, AzFrom: 0, AzTo: deg(315), AzStep: deg(45), FullTurn: true},
	}
	p, err := planner.New(req)
	if err != nil {
		t.Fatalf("planning a random cell: %v", err)
	}
	return p
}

// checkSheet checks the invariants of a laid-out sheet: every label inside
// its view's frame (or, outside a view, inside the drawing border), every
// text starting inside the border, and every station drawn inside the
// plan's frame or listed as unlabelled.
func checkSheet(t *testing.T, what string, p *planner.Plan, m *sheet.Model) {
	t.Helper()
	const tol = 1e-6
	in := func(r, box sheet.Rect) bool {
		return r.X >= box.X-tol && r.Y >= box.Y-tol && r.Right() <= box.Right()+tol && r.Bottom() <= box.Bottom()+tol
	}
	for pi, pg := range m.Pages {
		frames := map[string]sheet.Rect{}
		for _, v := range pg.Views {
			frames[v.Name] = v.Frame
		}
		for _, l := range pg.Labels {
			box := pg.Frame
			if f, ok := frames[l.View]; ok {
				box = f
			}
			if !in(l.Box(), box) {
				t.Errorf("%s: sheet %d: label %q (%s) at %v lies outside its frame %v", what, pi+1, l.Text, l.View, l.Box(), box)
			}
		}
		for _, tx := range pg.Texts {
			if tx.X < pg.Frame.X-tol || tx.X > pg.Frame.Right() || tx.Y < pg.Frame.Y || tx.Y > pg.Frame.Bottom()+tol {
				t.Errorf("%s: sheet %d: text %q starts at (%.1f, %.1f), outside the border", what, pi+1, tx.Text, tx.X, tx.Y)
			}
		}
	}
	plan := m.Pages[0].Views[0].Frame
	named := map[string]bool{}
	for _, id := range m.Unlabelled {
		named[id] = true
	}
	for _, k := range m.Key {
		named[k.ID] = true
	}
	for _, l := range m.Pages[0].Labels {
		switch l.Kind {
		case sheet.StationLabel, sheet.NumberLabel:
			if l.View == "plan" {
				named[l.For] = true
				if a := l.Anchor; a.X < plan.X || a.X > plan.Right() || a.Y < plan.Y || a.Y > plan.Bottom() {
					t.Errorf("%s: station %s is drawn at (%.1f, %.1f), outside the plan's frame %v", what, l.For, a.X, a.Y, plan)
				}
			}
		case sheet.RangeLabel:
			for _, id := range strings.Split(l.Text, "…") {
				named[id] = true
			}
		}
	}
	_ = p
}

// TestSheetProperty draws random cells at every paper, automatically and
// at every standard scale: no panic, no error but a scale too large for the
// paper, and the invariants of checkSheet (issue 9).
func TestSheetProperty(t *testing.T) {
	rng := rand.New(rand.NewPCG(9, 2026))
	papers := sheet.Papers()
	scales := sheet.StandardScales()
	const layouts = 6
	plans := make([]*planner.Plan, layouts)
	for i := range plans {
		plans[i] = randomPlan(t, rng, i)
		t.Logf("layout %d: %s, %s, %d stations, boundary %v", i, plans[i].Request.Cell.Kind, plans[i].Request.Units, len(plans[i].Stations), plans[i].Request.Cell.Boundary.Bound())
	}
	try := func(i int, paper string, scale int) {
		p := plans[i]
		what := fmt.Sprintf("layout %d (%s, %s) on %s at 1:%d", i, p.Request.Cell.Kind, p.Request.Units, paper, scale)
		var m *sheet.Model
		var err error
		func() {
			defer func() {
				if r := recover(); r != nil {
					t.Fatalf("%s: panic: %v", what, r)
				}
			}()
			m, err = sheet.Build(p, sheet.Options{Paper: paper, Scale: scale})
		}()
		if err != nil {
			if scale > 0 && errors.Is(err, sheet.ErrScale) && strings.Contains(err.Error(), "too large a scale") {
				return // the scale asked for is too large for the paper: said so
			}
			t.Errorf("%s: %v", what, err)
			return
		}
		checkSheet(t, what, p, m)
	}
	for i := range plans {
		for k, pp := range papers {
			if k%2 == i%2 { // every paper, by every other layout
				try(i, pp.Name, 0)
			}
		}
	}
	for k, s := range scales {
		// a plan whose sheet's family holds the scale; the other family is
		// refused (one family of scales per sheet)
		i := k % layouts
		for n := 0; n < layouts && sheet.CheckScale(s, plans[i].Request.Units) != nil; n++ {
			i = (i + 1) % layouts
		}
		try(i, papers[k%len(papers)].Name, s)
		for j := range plans {
			if err := sheet.CheckScale(s, plans[j].Request.Units); err != nil {
				if _, err := sheet.Build(plans[j], sheet.Options{Scale: s}); !errors.Is(err, sheet.ErrScale) || !strings.Contains(err.Error(), "one family of scales per sheet") {
					t.Errorf("layout %d (%s) at 1:%d: got %v, want the scale refused as of the other family", j, plans[j].Request.Units, s, err)
				}
				break
			}
		}
	}
}
