package sheet_test

import (
	"regexp"
	"strings"
	"testing"

	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

// TestOutdoorSaysGround: on the outdoor pad the set-up steps, the set-out
// and station tables, the noise notes and the planner's reasons say
// "ground", not "floor", and a mark at the datum is said to be there, not
// checked "0" from the datum by tape" (review of the pad sheet).
func TestOutdoorSaysGround(t *testing.T) {
	p := demoPlan(t, "../../layouts/outdoor-static-pad.yaml")
	m := build(t, p, sheet.Options{})
	floor := regexp.MustCompile(`(?i)\bfloors?\b`)
	// the document's name, "floor layout sheet", is the sheet's kind
	exempt := []string{"floor layout sheet"}
	var all []string
	all = append(all, modelStrings(m)...)
	for _, s := range p.Stations {
		all = append(all, s.Reasons...)
		for _, c := range s.Checks {
			all = append(all, c.Reason)
		}
	}
	saidDatum := false
next:
	for _, s := range all {
		for _, e := range exempt {
			if strings.Contains(s, e) {
				continue next
			}
		}
		if floor.MatchString(s) {
			t.Errorf("an outdoor sheet says %q: want \"ground\"", s)
		}
		if strings.Contains(s, `, 0" from the datum`) || strings.Contains(s, `, 0" downstream`) {
			t.Errorf("%q: a mark at the datum is checked by a tape of 0\"", s)
		}
		saidDatum = saidDatum || strings.Contains(s, "P1 is at the datum")
	}
	if !saidDatum {
		t.Error(`no step says "P1 is at the datum"`)
	}
}

// padDemo plans the outdoor pad demo (feet and inches).
func padDemo(t testing.TB) *planner.Plan { return demoPlan(t, "../../layouts/outdoor-static-pad.yaml") }

// TestEveryStandHasAFix: on the demos and the reviewer's hard-walled room
// every row of the set-out table has two fixes, or stands on a mark
// (review: tape 2 was "-" with no reason for the pad's G-13 and G-14 and
// the room's A-02).
func TestEveryStandHasAFix(t *testing.T) {
	for _, path := range []string{"../../layouts/anechoic-model-jet.yaml", "../../layouts/outdoor-static-pad.yaml",
		"../../layouts/hard-wall-exhaust-room.yaml", "testdata/review-hard-wall.yaml"} {
		m := build(t, demoPlan(t, path), sheet.Options{Paper: "A1"})
		rows := 0
		for _, pg := range m.Pages {
			for _, tb := range pg.Tables {
				if tb.Name != "setout" {
					continue
				}
				for _, r := range tb.Rows {
					rows++
					t1, t2 := strings.Join(r.Cells[3], " "), strings.Join(r.Cells[4], " ")
					if t1 == "-" || t2 == "-" {
						t.Errorf("%s %s: tapes %q, %q: want a fix", path, strings.Join(r.Cells[0], " "), t1, t2)
					}
				}
			}
		}
		if rows == 0 {
			t.Errorf("%s: no set-out rows", path)
		}
	}
}

// TestBoundaryNoteFollowsThePlanner: the note on zones cut at the boundary
// points to warnings of wall contacts only where the planner reports one
// (review: the anechoic chamber's collector takes the jet, and the note
// pointed to warnings that were not there).
func TestBoundaryNoteFollowsThePlanner(t *testing.T) {
	for _, path := range []string{"../../layouts/anechoic-model-jet.yaml", "../../layouts/hard-wall-exhaust-room.yaml"} {
		p := demoPlan(t, path)
		contacts := len(p.Impingements)+len(p.Attached) > 0
		m := build(t, p, sheet.Options{})
		pointed, denied := false, false
		for _, s := range modelStrings(m) {
			pointed = pointed || strings.Contains(s, "See the plan's warnings where a zone meets a wall")
			denied = denied || strings.Contains(s, "no zone meets a wall")
		}
		if pointed != contacts || denied == contacts {
			t.Errorf("%s: planner contacts %v; the note points to wall warnings %v, says there are none %v", path, contacts, pointed, denied)
		}
	}
}
