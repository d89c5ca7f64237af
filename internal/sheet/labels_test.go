package sheet_test

import (
	"fmt"
	"strings"
	"testing"

	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

// overlaps returns the pairs of labels on a page whose boxes overlap, by
// brute force over every pair.
func overlaps(pg *sheet.Page) []string {
	var out []string
	ls := pg.Labels
	for i := range ls {
		for j := i + 1; j < len(ls); j++ {
			if ls[i].View == ls[j].View && ls[i].Box().Overlaps(ls[j].Box(), 0) {
				out = append(out, fmt.Sprintf("%q at (%.2f, %.2f) and %q at (%.2f, %.2f)", ls[i].Text, ls[i].X, ls[i].Y, ls[j].Text, ls[j].X, ls[j].Y))
			}
		}
	}
	return out
}

func TestLabelsDoNotOverlap(t *testing.T) {
	for _, tt := range []struct {
		name  string
		plan  func(testing.TB) *planner.Plan
		paper string
	}{
		{"chamber A3", chamberPlan, ""},
		{"chamber A4", chamberPlan, "A4"},
		{"pad 60 stations", func(t testing.TB) *planner.Plan { return padPlan(t, 60) }, ""},
		{"pad 500 stations", func(t testing.TB) *planner.Plan { return padPlan(t, 500) }, ""},
		{"pad 500 stations on A4", func(t testing.TB) *planner.Plan { return padPlan(t, 500) }, "A4"},
	} {
		t.Run(tt.name, func(t *testing.T) {
			m := build(t, tt.plan(t), sheet.Options{Paper: tt.paper})
			for i := range m.Pages {
				pg := &m.Pages[i]
				if o := overlaps(pg); len(o) > 0 {
					t.Errorf("page %d: got %d overlapping label pairs, want none; first: %s", pg.Number, len(o), o[0])
				}
				for _, l := range pg.Labels {
					var frame sheet.Rect
					for _, v := range pg.Views {
						if v.Name == l.View {
							frame = v.Frame
						}
					}
					if !frame.Contains(l.Box()) {
						t.Errorf("page %d: label %q at (%.2f, %.2f) lies outside its %s frame", pg.Number, l.Text, l.X, l.Y, l.View)
					}
				}
			}
		})
	}
}

// TestEveryStationIsNamedOnce: on the plan each station is named exactly
// once: by its ID, by a key number, inside a range label, or listed as
// unlabelled.
func TestEveryStationIsNamedOnce(t *testing.T) {
	for _, n := range []int{60, 500} {
		t.Run(fmt.Sprint(n), func(t *testing.T) {
			p := padPlan(t, n)
			// 1" = 20' (1:240), an engineer's scale that crowds the plan
			m := build(t, p, sheet.Options{Scale: 240})
			seen := map[string]int{}
			index := map[string]int{}
			for i, s := range p.Stations {
				index[s.ID] = i
			}
			for _, l := range m.Pages[0].Labels {
				switch l.Kind {
				case sheet.StationLabel:
					seen[l.Text]++
				case sheet.RangeLabel:
					ends := strings.Split(l.Text, "…")
					for i := index[ends[0]]; i <= index[ends[1]]; i++ {
						seen[p.Stations[i].ID]++
					}
				}
			}
			for _, k := range m.Key {
				seen[k.ID]++
			}
			for _, id := range m.Unlabelled {
				seen[id]++
			}
			for _, s := range p.Stations {
				if seen[s.ID] != 1 {
					t.Errorf("station %s is named %d times on the plan, want 1", s.ID, seen[s.ID])
				}
			}
			// the plan must still read: nearly every station is named on it
			if len(m.Unlabelled) > n/10 {
				t.Errorf("got %d of %d stations without a label, want at most %d", len(m.Unlabelled), n, n/10)
			}
		})
	}
}

// Test500StationTable: the station table of a 500-station plan runs over
// several sheets, repeats its heading on each, never splits a row and
// lists every station once, in order.
func Test500StationTable(t *testing.T) {
	p := padPlan(t, 500)
	m := build(t, p, sheet.Options{})
	var parts []sheet.Table
	pagesWith := map[int]bool{}
	for _, pg := range m.Pages {
		for _, tb := range pg.Tables {
			if tb.Name == "stations" {
				parts = append(parts, tb)
				pagesWith[pg.Number] = true
			}
		}
	}
	if len(pagesWith) < 3 {
		t.Fatalf("got the station table on %d sheets, want several", len(pagesWith))
	}
	var ids []string
	for i, tb := range parts {
		if got, want := tb.Continued, i > 0; got != want {
			t.Errorf("part %d: got Continued %v, want %v", i+1, got, want)
		}
		if i > 0 && fmt.Sprint(tb.Columns) != fmt.Sprint(parts[0].Columns) {
			t.Errorf("part %d: the heading differs from the first part's", i+1)
		}
		if i > 0 && tb.Title != "" && !strings.Contains(tb.Title, "(continued)") { // a lane beside a titled part has no title
			t.Errorf("part %d: got title %q, want it marked (continued)", i+1, tb.Title)
		}
		for _, r := range tb.Rows {
			ids = append(ids, strings.Join(r.Cells[0], ""))
		}
		// parts stay clear of the title block and inside the frame
		box := sheet.Rect{X: tb.X, Y: tb.Y, W: tb.W(), H: tb.H()}
		if box.Overlaps(m.Pages[0].TitleBlock, 0) || !m.Pages[0].Frame.Contains(box) {
			t.Errorf("part %d (%v) overlaps the title block or leaves the frame", i+1, box)
		}
	}
	if len(ids) != len(p.Stations) {
		t.Fatalf("got %d rows, want %d", len(ids), len(p.Stations))
	}
	for i, s := range p.Stations {
		if ids[i] != s.ID {
			t.Fatalf("row %d is %s, want %s", i+1, ids[i], s.ID)
		}
	}
}

// TestReasonsWrapInTheirCell: a long reason wraps inside its cell, and the
// row grows to hold it.
func TestReasonsWrapInTheirCell(t *testing.T) {
	p := chamberPlan(t)
	long := strings.Repeat("the stand base overlaps the rig plenum footprint ", 12)
	p.Stations[0].Reasons = []string{long}
	m := build(t, p, sheet.Options{Paper: "A4"})
	for _, pg := range m.Pages {
		for _, tb := range pg.Tables {
			if tb.Name != "stations" {
				continue
			}
			for _, r := range tb.Rows {
				if strings.Join(r.Cells[0], "") != "A-01" {
					continue
				}
				reason := r.Cells[len(r.Cells)-1]
				if len(reason) < 3 {
					t.Fatalf("got the reason on %d lines, want it wrapped over several", len(reason))
				}
				if want := float64(len(reason)) * tb.Line; r.H < want {
					t.Errorf("got a row %.2f mm high, want at least %.2f mm for %d lines", r.H, want, len(reason))
				}
				if got := strings.Join(reason, " "); got != strings.TrimSpace(long) {
					t.Errorf("the wrapped reason lost text: got %q", got)
				}
				return
			}
		}
	}
	t.Fatal("no row for A-01")
}

// TestDetailViews: an array too dense to label at the plan's scale gets a
// detail view at a larger standard scale, outlined and lettered on the
// plan, in which its stations carry their IDs (issue 9 item 4: the
// near-field line's 7 stations 3 mm apart had no enlarged detail).
func TestDetailViews(t *testing.T) {
	p := padPlan(t, 500)
	m := build(t, p, sheet.Options{})
	outlined, lettered := false, false
	for _, sh := range m.Pages[0].Views[0].Shapes {
		outlined = outlined || sh.Style == sheet.StyleDetail
	}
	for _, l := range m.Pages[0].Labels {
		lettered = lettered || strings.HasPrefix(l.Text, "DETAIL ")
	}
	if !outlined || !lettered {
		t.Fatalf("got outline %v and letter %v on the plan, want both", outlined, lettered)
	}
	ids := map[string]string{} // station ID → the detail that labels it
	details := 0
	for _, pg := range m.Pages[1:] {
		for _, v := range pg.Views {
			if !strings.HasPrefix(v.Name, "detail ") {
				continue
			}
			details++
			if v.Scale >= m.Scale {
				t.Errorf("%s at 1:%d, not larger than the plan's 1:%d", v.Name, v.Scale, m.Scale)
			}
		}
		for _, l := range pg.Labels {
			if strings.HasPrefix(l.View, "detail ") && l.Kind == sheet.StationLabel {
				ids[l.Text] = l.View
			}
		}
	}
	if details == 0 {
		t.Fatal("no detail view after sheet 1")
	}
	// the unlabelled stations of the plan are mostly named in a detail
	named := 0
	for _, id := range m.Unlabelled {
		if ids[id] != "" {
			named++
		}
	}
	if len(m.Unlabelled) > 0 && named < len(m.Unlabelled)/2 {
		t.Errorf("%d of %d stations without a label on the plan are named in a detail, want most", named, len(m.Unlabelled))
	}
}
