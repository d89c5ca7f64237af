package sheet_test

import (
	"regexp"
	"strings"
	"testing"

	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

// pageText joins the texts of every page, one per line.
func pageText(m *sheet.Model) string {
	var b strings.Builder
	for _, pg := range m.Pages {
		for _, t := range pg.Texts {
			b.WriteString(t.Text)
			b.WriteByte('\n')
		}
	}
	return b.String()
}

// flowText joins the texts of every page into one line of words, undoing
// the wrapping of paragraphs.
func flowText(m *sheet.Model) string { return strings.Join(strings.Fields(pageText(m)), " ") }

func TestSetUpSteps(t *testing.T) {
	m := build(t, chamberPlan(t), sheet.Options{})
	text := flowText(m)
	for _, want := range []string{
		// arc A: R = 3.5 m, steps of 13.333°: chord 2·3.5·sin(6.667°) = 0.8127 m (hand-computed)
		"A-01 -> A-10: 0.813 m each step",
		// arc B: R = 1.2 m, 10° steps: 2·1.2·sin(5°) = 0.2092 m (hand-computed)
		"B-01 -> B-04: 0.209 m each step",
		// the centre of arc A is the nozzle exit, (0.5, 0)
		"Mark the centre on the jet axis below the nozzle exit: X 0.500 m, Y 0.000 m from the datum.", // not "0.000 m downstream" (review)
		"Swing radius 3.500 m from the centre",
		// line L: 2.5 m to the right, stations every 1 m from x = 1 m
		"parallel to the jet axis, 2.500 m to the right of the axis",
		"L-01 -> L-07: 1.000 m each step",
		// mark P1 at (0, 4): 4.000 m from the datum
		"Check mark P1: X 0.000 m, Y 4.000 m, 4.000 m from the datum by tape.",
		"Set the microphone heights with a laser level from the floor: 1.500 m.",
		"Do NOT set A-08, A-09 and A-10",
		"diaphragm edge-on to the aim point",
		"Stand boom has a 0.400 m boom",
		"people out of the cell",
	} {
		if !strings.Contains(text, want) {
			t.Errorf("the set-up steps do not say %q", want)
		}
	}
}

// TestZonesDrawn: the chamber's governing point SP3 is cold, so the sheet
// draws the hot zone of SP7, the hottest point, and says so.
func TestZonesDrawn(t *testing.T) {
	p := chamberPlan(t)
	m := build(t, p, sheet.Options{})
	if m.Governing != "SP3" {
		t.Fatalf("got governing point %s, want SP3", m.Governing)
	}
	text := flowText(m)
	for _, want := range []string{
		"The zones drawn are those of operating point SP3",
		"the hot zone of point SP7, the largest hot zone",
		// the length of SP3's conservative velocity zone as the plan holds it
		"velocity zone to 26.917 m from the exit",
	} {
		if !strings.Contains(text, want) {
			t.Errorf("the sheet does not say %q", want)
		}
	}
	count := map[sheet.Style]int{}
	for _, v := range m.Pages[0].Views {
		for _, s := range v.Shapes {
			count[s.Style]++
		}
	}
	for _, st := range []sheet.Style{sheet.StyleCore, sheet.StyleBoundary, sheet.StyleTreatment, sheet.StyleKeepOut} {
		if count[st] != 1 {
			t.Errorf("got %d shapes of style %s in the plan, want 1", count[st], st)
		}
	}
	// the free zones, and the bent and wall-jet zones of the same points
	for _, st := range []sheet.Style{sheet.StyleVelocity, sheet.StyleHot} {
		if count[st] < 1 {
			t.Errorf("got %d shapes of style %s in the plan, want at least 1", count[st], st)
		}
	}
	if count[sheet.StyleMargin] != 2 {
		t.Errorf("got %d margin bands, want 2 (velocity and hot)", count[sheet.StyleMargin])
	}
	if count[sheet.StyleObstacle] != 2 {
		t.Errorf("got %d obstacles drawn, want 2", count[sheet.StyleObstacle])
	}
}

// TestSetUpWording: the steps speak as a technician works (issue 9 item 7):
// no chalk on a treated floor, no heights or edge-on aim for microphones
// flush on the floor, a probe not "pointed", a round distance of the
// sheet's own unit, and one feet-and-inches notation.
func TestSetUpWording(t *testing.T) {
	chamber := flowText(build(t, chamberPlan(t), sheet.Options{}))
	p := padPlan(t, 60)
	for i := range p.Stations {
		if s := &p.Stations[i]; s.Array == "N" {
			s.Stand, s.Height, s.Mic.Z = nil, 0, 0
			s.Incidence = planner.GrazingIncidence
		}
	}
	pad := flowText(build(t, p, sheet.Options{}))
	tests := []struct {
		name, text string
		want, not  []string
	}{
		{"treated floor", chamber,
			[]string{"Mark the axis on the floor (tape on the grating, or a string line", "Set CAM-01 as its own procedure says"},
			[]string{"chalk", "Point each", "Point CAM"}},
		{"outdoor pad, feet and inches", pad,
			// 20 ft downstream, not a metric 5 m in feet; ground, not floor, outdoors
			[]string{"Mark the axis on the ground (a chalk line)", `(20' 0" downstream)`, "lie flush on the ground: no heights to set", "Lay each microphone flat on the ground"},
			[]string{"16' 4", " in.", "/16", "laser level from the floor: 0\""}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			for _, w := range tt.want {
				if !strings.Contains(tt.text, w) {
					t.Errorf("the sheet does not say %q", w)
				}
			}
			// the old notation, "147 ft 7-5/8 in", and zero feet, "0' 7-7/8\""
			for _, re := range []*regexp.Regexp{regexp.MustCompile(`\d ft \d`), regexp.MustCompile(`(^|[^0-9])0' \d`)} {
				if loc := re.FindStringIndex(tt.text); loc != nil {
					t.Errorf("the sheet says %q", tt.text[max(0, loc[0]-40):min(len(tt.text), loc[1]+40)])
				}
			}
			for _, w := range tt.not {
				if strings.Contains(tt.text, w) {
					i := strings.Index(tt.text, w)
					t.Errorf("the sheet says %q: …%s…", w, tt.text[max(0, i-60):min(len(tt.text), i+60)])
				}
			}
		})
	}
}

// TestSetOutTable: a table of its own that a technician works down: one
// row per stand with the base from the datum, tapes from the two nearest
// floor marks, the height, the boom, the aim and boxes to tick (issue 9
// item 4: the base positions were in run-on prose).
func TestSetOutTable(t *testing.T) {
	p := chamberPlan(t)
	m := build(t, p, sheet.Options{})
	var rows [][]string
	var heads []string
	for pi, pg := range m.Pages {
		for ti, tb := range pg.Tables {
			if tb.Name != "setout" {
				continue
			}
			if !tb.Continued && (ti != 0 || pi == 0) {
				t.Errorf("the set-out table starts on sheet %d after another table, want it first on a sheet of its own", pi+1)
			}
			if heads == nil {
				for _, c := range tb.Columns {
					heads = append(heads, strings.Join(c.Heading, " "))
				}
			}
			for _, r := range tb.Rows {
				row := make([]string, len(r.Cells))
				for i, c := range r.Cells {
					row[i] = strings.Join(c, " ")
				}
				rows = append(rows, row)
			}
		}
	}
	if len(rows) != len(p.Stations) {
		t.Fatalf("got %d set-out rows, want one per station (%d)", len(rows), len(p.Stations))
	}
	for _, w := range []string{"Base X", "Base Y", "Tape 1", "Tape 2", "Mic height", "Boom", "Aim", "Set", "As built"} {
		found := false
		for _, h := range heads {
			found = found || strings.HasPrefix(h, w)
		}
		if !found {
			t.Errorf("no column %q in %q", w, heads)
		}
	}
	for _, r := range rows {
		if r[0] != "CAM-01" {
			continue
		}
		// base (5, −3.9): P2 (8, −4) is sqrt(9 + 0.01) = 3.002 m away, the
		// datum sqrt(25 + 15.21) = 6.341 m (hand-computed)
		if r[1] != "5.000" || r[2] != "-3.900" || r[3] != "P2: 3.002" || r[4] != "datum: 6.341" {
			t.Errorf("CAM-01: got %q, want base 5.000, -3.900 and tapes P2: 3.002, datum: 6.341", r[:5])
		}
		if r[7] != "its own procedure" || r[8] != "[ ]" {
			t.Errorf("CAM-01: got aim %q and set box %q", r[7], r[8])
		}
	}
	blocked := 0
	for i, s := range p.Stations {
		if s.Status == planner.Blocked {
			blocked++
			if rows[i][8] != "DO NOT SET" {
				t.Errorf("%s is blocked but its set box says %q", s.ID, rows[i][8])
			}
		}
	}
	if blocked == 0 {
		t.Error("the fixture has no blocked station to check")
	}
}
