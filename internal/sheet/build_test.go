package sheet_test

import (
	"bytes"
	"errors"
	"flag"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"github.com/paulmach/orb"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata")

// build builds the sheet of p with the fixed clock and fails the test on
// an error.
func build(t testing.TB, p *planner.Plan, opt sheet.Options) *sheet.Model {
	t.Helper()
	m, err := sheet.Build(p, opt)
	if err != nil {
		t.Fatalf("Build: %v", err)
	}
	return m
}

// TestDumpGolden compares the JSON dump of the chamber sheet with
// testdata/chamber.json (refresh with go test -update).
func TestDumpGolden(t *testing.T) {
	m := build(t, chamberPlan(t), sheet.Options{})
	got, err := m.Dump()
	if err != nil {
		t.Fatal(err)
	}
	path := filepath.Join("testdata", "chamber.json")
	if *update {
		if err := os.WriteFile(path, got, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatalf("%v (run go test -update to create it)", err)
	}
	if !bytes.Equal(got, want) {
		gl, wl := strings.Split(string(got), "\n"), strings.Split(string(want), "\n")
		for i := 0; i < min(len(gl), len(wl)); i++ {
			if gl[i] != wl[i] {
				t.Fatalf("dump differs from %s at line %d:\ngot  %s\nwant %s\n(run go test -update if the change is intended)", path, i+1, gl[i], wl[i])
			}
		}
		t.Fatalf("dump differs from %s in length: got %d lines, want %d", path, len(gl), len(wl))
	}
}

// TestDumpDeterministic builds the same plan twice and compares the dumps.
func TestDumpDeterministic(t *testing.T) {
	a, err := build(t, chamberPlan(t), sheet.Options{}).Dump()
	if err != nil {
		t.Fatal(err)
	}
	b, err := build(t, chamberPlan(t), sheet.Options{}).Dump()
	if err != nil {
		t.Fatal(err)
	}
	if !bytes.Equal(a, b) {
		t.Fatal("two builds of the same plan dump differently")
	}
}

func TestBuildPaperAndScale(t *testing.T) {
	tests := []struct {
		name      string
		plan      func(testing.TB) *planner.Plan
		opt       sheet.Options
		paper     string
		scale     int
		err       error
		errSubstr []string
	}{
		// The chamber spans 12.8 × 10.8 m with its treatment: 1:50 makes it
		// 256 × 216 mm, inside A3's plan area, and 1:25 does not fit
		// (hand-computed).
		{name: "plan paper and automatic scale", plan: chamberPlan, paper: "A3", scale: 50},
		{name: "A4 option overrides the plan", plan: chamberPlan, opt: sheet.Options{Paper: "a4"}, paper: "A4", scale: 100},
		{name: "tabloid", plan: chamberPlan, opt: sheet.Options{Paper: "Tabloid"}, paper: "Tabloid", scale: 50},
		{name: "letter", plan: chamberPlan, opt: sheet.Options{Paper: " Letter "}, paper: "Letter", scale: 100},
		{name: "smaller scale asked", plan: chamberPlan, opt: sheet.Options{Scale: 100}, paper: "A3", scale: 100},
		{name: "non-standard scale asked", plan: chamberPlan, opt: sheet.Options{Scale: 75}, paper: "A3", scale: 75},
		{name: "unknown paper", plan: chamberPlan, opt: sheet.Options{Paper: "A5"}, err: sheet.ErrUnknownPaper, errSubstr: []string{`"A5"`, "paper asked for", "A0", "ANSI D"}},
		{name: "scale that does not fit", plan: chamberPlan, opt: sheet.Options{Scale: 20}, err: sheet.ErrScale, errSubstr: []string{"scale asked for", "1:20", "1:50 fits on A3", "1:50 fits on A3; or use A1, which holds it at 1:20"}},
		{name: "negative scale", plan: chamberPlan, opt: sheet.Options{Scale: -50}, err: sheet.ErrScale, errSubstr: []string{"scale asked for", "not a standard scale"}},
		{name: "odd scale", plan: chamberPlan, opt: sheet.Options{Scale: 7}, err: sheet.ErrScale, errSubstr: []string{"1:7", "not a standard scale", "1:75"}},
		// one family of scales per sheet (review: 1" = 20' on a metric sheet printed "Scale 1:240")
		// a feet-and-inches sheet's error is in feet and inches (review: the pad at 1/4" = 1'-0" said "199.9 × 150.0 m")
		{name: "feet-and-inches sheet too large a scale", plan: padDemo, opt: sheet.Options{Scale: 48}, err: sheet.ErrScale, errSubstr: []string{`1/4" = 1'-0"`, `the plan spans 656' 0" × 492' 0"`}}, // the pad's 200 m × 150 m site, about 656 ft × 492 ft
		{name: "imperial scale on a metric sheet", plan: chamberPlan, opt: sheet.Options{Scale: 240}, err: sheet.ErrScale, errSubstr: []string{`1" = 20'`, "feet-and-inches scale", "metric sheet", "1:50"}},
		// a feet-and-inches sheet takes the engineer's 1" = 20' (1:240):
		// the pad's 60 stations need 1:200, which is not one of them
		{name: "pad at 1 in = 20 ft", plan: func(t testing.TB) *planner.Plan { return padPlan(t, 60) }, paper: "A3", scale: 240},
		{name: "A0", plan: chamberPlan, opt: sheet.Options{Paper: "A0"}, paper: "A0", scale: 20},
		{name: "ANSI D alias", plan: chamberPlan, opt: sheet.Options{Paper: "ansi-d"}, paper: "ANSI D", scale: 25},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			opt := tt.opt
			m, err := sheet.Build(tt.plan(t), opt)
			if tt.err != nil {
				if !errors.Is(err, tt.err) {
					t.Fatalf("got error %v, want one wrapping %v", err, tt.err)
				}
				for _, s := range tt.errSubstr {
					if !strings.Contains(err.Error(), s) {
						t.Errorf("got error %q, want it to mention %q", err, s)
					}
				}
				return
			}
			if err != nil {
				t.Fatalf("got error %v, want none", err)
			}
			if m.Paper.Name != tt.paper || m.Scale != tt.scale {
				t.Errorf("got %s at 1:%d, want %s at 1:%d", m.Paper.Name, m.Scale, tt.paper, tt.scale)
			}
		})
	}
}

// TestScaleFromPlan reads the scale from the plan's sheet options and names
// that option when it does not fit.
func TestScaleFromPlan(t *testing.T) {
	p := chamberPlan(t)
	p.Request.Sheet.Scale = 10
	_, err := sheet.Build(p, sheet.Options{})
	if !errors.Is(err, sheet.ErrScale) || !strings.Contains(err.Error(), "layout's sheet scale") {
		t.Fatalf("got %v, want an ErrScale naming the layout's sheet scale", err)
	}
	p.Request.Sheet.Paper = "B4"
	_, err = sheet.Build(p, sheet.Options{})
	if !errors.Is(err, sheet.ErrUnknownPaper) || !strings.Contains(err.Error(), "layout's sheet paper") {
		t.Fatalf("got %v, want an ErrUnknownPaper naming the layout's sheet paper", err)
	}
}

func TestBuildRejectsBadPlan(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	tests := []struct {
		name  string
		edit  func(p *planner.Plan) *planner.Plan
		field string
	}{
		{"nil plan", func(*planner.Plan) *planner.Plan { return nil }, "nil"},
		{"nil request", func(p *planner.Plan) *planner.Plan { p.Request = nil; return p }, "Plan.Request"},
		{"no points", func(p *planner.Plan) *planner.Plan { p.Points = nil; return p }, "Plan.Points"},
		{"governing out of range", func(p *planner.Plan) *planner.Plan { p.Governing = 7; return p }, "Plan.Governing"},
		{"nil plume", func(p *planner.Plan) *planner.Plan { p.Points[1].Plume = nil; return p }, "Points[1] (SP7).Plume"},
		{"NaN core", func(p *planner.Plan) *planner.Plan { p.Points[0].CoreNominal = nan; return p }, "Points[0] (SP1).CoreNominal"},
		{"NaN microphone", func(p *planner.Plan) *planner.Plan { p.Stations[3].Mic.X = nan; return p }, "Stations[3] (A-04).Mic.X"},
		{"infinite height", func(p *planner.Plan) *planner.Plan { p.Stations[0].Height = inf; return p }, "Stations[0] (A-01).Height"},
		{"NaN polar", func(p *planner.Plan) *planner.Plan { p.Stations[5].Polar = nan; return p }, "Stations[5] (A-06).Polar"},
		{"NaN boom", func(p *planner.Plan) *planner.Plan {
			st := *p.Stations[14].Stand
			st.BoomLength = nan
			p.Stations[14].Stand = &st
			return p
		}, "Stations[14] (L-01).Stand.BoomLength"},
		{"NaN arc centre", func(p *planner.Plan) *planner.Plan { p.Arrays[0].Centre.Y = nan; return p }, "Arrays[0] (A)"},
		{"NaN margin", func(p *planner.Plan) *planner.Plan { p.Request.Limits.Margin = nan; return p }, "Request.Limits.Margin"},
		{"infinite absorption", func(p *planner.Plan) *planner.Plan { p.Absorption[2].PerM = inf; return p }, "Absorption[2]"},
		{"NaN exit", func(p *planner.Plan) *planner.Plan { p.Request.Exit.Exit.Z = nan; return p }, "Request.Exit.Exit.Z"},
		{"NaN boundary", func(p *planner.Plan) *planner.Plan { p.Request.Cell.Boundary[1][0] = nan; return p }, "Request.Cell.Boundary"},
		{"no unit system", func(p *planner.Plan) *planner.Plan { p.Request.Units = 0; return p }, "Request.Units"},
		{"no convention", func(p *planner.Plan) *planner.Plan { p.Request.Convention = 0; return p }, "Request.Convention"},
		{"no verdict", func(p *planner.Plan) *planner.Plan { p.Stations[2].Status = 0; return p }, "Stations[2] (A-03).Status"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, err := sheet.Build(tt.edit(chamberPlan(t)), sheet.Options{})
			if !errors.Is(err, sheet.ErrInvalidPlan) {
				t.Fatalf("got error %v, want one wrapping ErrInvalidPlan", err)
			}
			if !strings.Contains(err.Error(), tt.field) {
				t.Errorf("got error %q, want it to name %q", err, tt.field)
			}
		})
	}
}

// TestNaNCheckValues accepts checks that do not apply (NaN) and a wall at
// infinity, and prints them as "n/a" and "none".
func TestNaNCheckValues(t *testing.T) {
	p := chamberPlan(t)
	s := &p.Stations[0]
	for i := range s.Checks {
		switch s.Checks[i].Name {
		case planner.CheckHot:
			s.Checks[i].Value = math.NaN()
		case planner.CheckWall:
			s.Checks[i].Value = math.Inf(1)
		}
	}
	m := build(t, p, sheet.Options{})
	row := stationRow(t, m, "A-01")
	if row[11] != "n/a" || row[12] != "none" {
		t.Errorf("got hot clearance %q and wall clearance %q, want \"n/a\" and \"none\"", row[11], row[12])
	}
}

// TestOneGeometry: the station table gives the radius and polar angle as
// the layout asks (nominal, as the plan marks them) and as placed, the same
// quantity (a station placed where asked shows them equal; the true
// distance the checks use is in the CSV and JSON), and names the operating
// point of each clearance (issue 9 item 5: the plan said R 147' 7-5/8", the
// table 147' 11-11/16" without saying why; one "Point" column for both
// zones; review: a ring's radius about the axis against its distance from
// the exit).
func TestOneGeometry(t *testing.T) {
	p := chamberPlan(t)
	s := &p.Stations[0]                         // A-01, nominal 30° at 3.5 m
	s.Radius, s.Polar = 3.612, 30.7*math.Pi/180 // the distance and angle in space
	for i := range s.Checks {
		switch s.Checks[i].Name {
		case planner.CheckVelocity:
			s.Checks[i].Point = "SP3"
		case planner.CheckHot:
			s.Checks[i].Point = "SP7"
		}
	}
	m := build(t, p, sheet.Options{})
	row := stationRow(t, m, "A-01")
	var heads []string
	for _, pg := range m.Pages {
		for _, tb := range pg.Tables {
			if tb.Name == "stations" && len(heads) == 0 {
				for _, c := range tb.Columns {
					heads = append(heads, strings.Join(c.Heading, " "))
				}
			}
		}
	}
	want := map[int][2]string{
		3: {"Polar nominal", "30.0"}, 4: {"Polar as placed", "30.0"},
		5: {"Radius nominal", "3.500"}, 6: {"Radius as placed", "3.500"},
	}
	for i, w := range want {
		if !strings.HasPrefix(heads[i], w[0]) || row[i] != w[1] {
			t.Errorf("column %d: got %q = %q, want %q = %q", i, heads[i], row[i], w[0], w[1])
		}
	}
	if !strings.HasSuffix(row[10], "(SP3)") || !strings.HasSuffix(row[11], "(SP7)") {
		t.Errorf("got clearances %q and %q, want each with its point (SP3), (SP7)", row[10], row[11])
	}
	// the plan marks the nominal radius and says so
	found := false
	for _, l := range m.Pages[0].Labels {
		if l.For == "A" && strings.HasPrefix(l.Text, "R 3.500 m nominal") {
			found = true
		}
	}
	if !found {
		t.Error("the plan does not label arc A \"R 3.500 m nominal\"")
	}
}

// stationRow returns the cells of the station table row of id, each cell's
// lines joined by spaces.
func stationRow(t *testing.T, m *sheet.Model, id string) []string {
	t.Helper()
	for _, pg := range m.Pages {
		for _, tb := range pg.Tables {
			if tb.Name != "stations" {
				continue
			}
			for _, r := range tb.Rows {
				if strings.Join(r.Cells[0], "") == id {
					out := make([]string, len(r.Cells))
					for i, c := range r.Cells {
						out[i] = strings.Join(c, " ")
					}
					return out
				}
			}
		}
	}
	t.Fatalf("no row for %s in the station table", id)
	return nil
}

func TestIssueDate(t *testing.T) {
	tests := []struct {
		name, date string
		wantIssue  string
		wantCreate time.Time
	}{
		{"ISO date from the title block", "2025-03-10", "2025-03-10", time.Date(2025, 3, 10, 0, 0, 0, 0, time.UTC)},
		{"written date from the title block", "7 April 2025", "7 April 2025", time.Date(2025, 4, 7, 0, 0, 0, 0, time.UTC)},
		// no clock: free text and a missing date give the fixed date
		{"free text gives the fixed PDF date", "spring 2025", "spring 2025", sheet.Undated},
		{"no date: said so, and the fixed PDF date", "", "not dated (title: date)", sheet.Undated},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			p := chamberPlan(t)
			p.Request.Title.Date = tt.date
			m := build(t, p, sheet.Options{})
			if m.IssueDate != tt.wantIssue || !m.Created.Equal(tt.wantCreate) {
				t.Errorf("got issue %q created %v, want %q and %v", m.IssueDate, m.Created, tt.wantIssue, tt.wantCreate)
			}
		})
	}
}

// TestScaleBar checks the drawn length of the scale bar against its real
// length and the scale, and its label.
func TestScaleBar(t *testing.T) {
	tests := []struct {
		name  string
		plan  func(testing.TB) *planner.Plan
		opt   sheet.Options
		label string
		ticks string
	}{
		// 1:50 on A3: the bar may be up to 93 mm, 4.65 m; the largest
		// round length below is 2.5 m, 50 mm (hand-computed).
		{"chamber A3 1:50", chamberPlan, sheet.Options{}, "2.5 m", "0 0.5 1 1.5 2 2.5"},
		// 1:100 on A4: up to 56.8 mm, 5.68 m: 5 m, 50 mm (hand-computed).
		{"chamber A4 1:100", chamberPlan, sheet.Options{Paper: "A4"}, "5 m", "0 1 2 3 4 5"},
		// 1:200 in feet: up to 93 mm, 61.0 ft: 50 ft, 76.2 mm (hand-computed).
		{"pad 1:200 feet", func(t testing.TB) *planner.Plan { return padPlan(t, 60) }, sheet.Options{}, "50 ft", "0 10 20 30 40 50"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			m := build(t, tt.plan(t), tt.opt)
			bar := m.ScaleBar
			want := bar.RealLength * 1000 / float64(m.Scale)
			if math.Abs(bar.LengthMM-want) > 0.5 {
				t.Errorf("got a bar of %.2f mm, want %.2f mm (%.3f m at 1:%d)", bar.LengthMM, want, bar.RealLength, m.Scale)
			}
			if bar.Label != tt.label {
				t.Errorf("got label %q, want %q", bar.Label, tt.label)
			}
			if got := strings.Join(bar.Ticks, " "); got != tt.ticks {
				t.Errorf("got ticks %q, want %q", got, tt.ticks)
			}
		})
	}
}

// TestEmptyPlan: a plan with no arrays, stations or absorption rows still
// gives a sheet set with the cell, the zones and the cautions.
func TestEmptyPlan(t *testing.T) {
	p := chamberPlan(t)
	p.Arrays, p.Stations, p.Absorption, p.Warnings = nil, nil, nil, nil
	p.OK, p.Warn, p.Blocked = 0, 0, 0
	m := build(t, p, sheet.Options{})
	if len(m.Pages) < 2 || m.Scale != 50 {
		t.Fatalf("got %d sheets at 1:%d, want at least 2 at 1:50", len(m.Pages), m.Scale)
	}
	if !strings.Contains(flowText(m), "Stations: 0 ok, 0 with a warning, 0 blocked (of 0).") {
		t.Error("the notes do not count zero stations")
	}
	render(t, m)
}

// TestLongNames builds sheets with names far longer than any column or
// title cell (issue 10 item 6: a 260-character array name, 160 on A4, a
// 1000-character operating-point name and a 25,600-character title looped
// in the text wrapper or took 17 s). Every build ends; the names are capped
// at validation, so this only guards the sheet.
func TestLongNames(t *testing.T) {
	tests := []struct {
		name  string
		paper string
		edit  func(p *planner.Plan)
	}{
		{"array name 260", "A3", func(p *planner.Plan) { renameArray(p, strings.Repeat("W", 260)) }},
		{"array name 160 on A4", "A4", func(p *planner.Plan) { renameArray(p, strings.Repeat("W", 160)) }},
		{"point name 1000", "A4", func(p *planner.Plan) {
			p.Points[p.Governing].Name = strings.Repeat("SP", 500)
			p.Points[p.GoverningHot].Name = strings.Repeat("SP", 500)
		}},
		{"title 25600", "A4", func(p *planner.Plan) { p.Request.Title.Title = strings.Repeat("Survey ", 3657) }},
		{"title 25600 without a space", "A4", func(p *planner.Plan) { p.Request.Title.Title = strings.Repeat("W", 25600) }},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			p := chamberPlan(t)
			tt.edit(p)
			m := build(t, p, sheet.Options{Paper: tt.paper})
			if len(m.Pages) > 60 {
				t.Errorf("got %d sheets, want the long name not to multiply them", len(m.Pages))
			}
		})
	}
}

// renameArray gives the first array and its stations the name n.
func renameArray(p *planner.Plan, n string) {
	old := p.Arrays[0].Name
	p.Arrays[0].Name = n
	for i := range p.Stations {
		if p.Stations[i].Array == old {
			p.Stations[i].Array = n
		}
	}
}

// TestLargeSiteCropped: an outdoor site far larger than its stations is
// drawn cropped to them at a larger scale, with break marks where the site
// limit leaves the frame and a note saying so (issue 9 item 3: a large
// site was refused, or drawn as a speck).
func TestLargeSiteCropped(t *testing.T) {
	p := chamberPlan(t)
	c := &p.Request.Cell
	c.Kind = geometry.OutdoorPad
	c.Ceiling, c.TreatmentDepth = math.Inf(1), 0
	// the site's upstream edge 8 m behind the datum crosses the frame
	c.Boundary = orb.Ring{{-8, -150}, {400, -150}, {400, 250}, {-8, 250}, {-8, -150}}
	c.Collector = nil
	m := build(t, p, sheet.Options{})
	// the whole site fits A3 at 1:2000 (408 × 400 m is 204 × 200 mm,
	// hand-computed), where the 12 m of stations would fill 6 mm
	if m.Scale > 200 {
		t.Errorf("got 1:%d, want the stations' region drawn at 1:200 or larger", m.Scale)
	}
	breaks := 0
	for _, sh := range m.Pages[0].Views[0].Shapes {
		if sh.Style == sheet.StyleBoundary && sh.Kind == sheet.Polyline && len(sh.Points) == 4 {
			breaks++
		}
	}
	if breaks == 0 {
		t.Error("no break marks where the site limit leaves the frame")
	}
	if !strings.Contains(flowText(m), "cropped to the stations") {
		t.Error("the sheet does not say the plan is cropped")
	}
}
