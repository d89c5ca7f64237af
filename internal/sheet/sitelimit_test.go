package sheet_test

import (
	"strings"
	"testing"

	"arcwright/internal/layout"
	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

// inPagePolygon reports whether page point p is inside the polygon ring
// (even-odd rule).
func inPagePolygon(ring []sheet.Pt, p sheet.Pt) bool {
	in := false
	for i, j := 0, len(ring)-1; i < len(ring); j, i = i, i+1 {
		a, b := ring[i], ring[j]
		if (a.Y > p.Y) != (b.Y > p.Y) && p.X < (b.X-a.X)*(p.Y-a.Y)/(b.Y-a.Y)+a.X {
			in = !in
		}
	}
	return in
}

// padWithCrewPastLimit is the outdoor pad demo with the crew position
// "fence line east" moved to [700 ft, 246 ft], 44 ft past the site limit
// (x = 656 ft) on the jet axis (y = 246 ft): the reviewer's repro.
func padWithCrewPastLimit(t *testing.T) *planner.Plan {
	req, _, err := layout.Load("../../layouts/outdoor-static-pad.yaml")
	if err != nil {
		t.Fatal(err)
	}
	found := false
	for i := range req.Crew {
		if req.Crew[i].Name == "fence line east" {
			req.Crew[i].At.X, req.Crew[i].At.Y = 700*0.3048, 246*0.3048 // ft to m, exact
			found = true
		}
	}
	if !found {
		t.Fatal("no crew position \"fence line east\" in the pad demo")
	}
	p, err := planner.New(req)
	if err != nil {
		t.Fatal(err)
	}
	return p
}

// TestOutdoorZonesPastSiteLimit: an outdoor site limit is not a wall
// (issue 8): the zones, margins and noise contours of the plan are not cut
// at it, a crew position past the limit that the planner puts inside a
// zone has that zone drawn under its mark, the limit is named "site
// limit" on the plan, and the clearance view calls it a site limit, not a
// wall, and draws the zones on past it. The walls of a room keep cutting
// the zones.
func TestOutdoorZonesPastSiteLimit(t *testing.T) {
	p := padWithCrewPastLimit(t)
	var crew *planner.CrewExposure
	for i := range p.Crew {
		if p.Crew[i].Name == "fence line east" && p.Crew[i].InZone {
			crew = &p.Crew[i]
		}
	}
	if crew == nil {
		t.Fatal("the planner does not put the crew position past the limit inside a zone")
	}
	m := build(t, p, sheet.Options{})
	pt, _ := planMap(t, m, p)
	at := pt(crew.At.X, crew.At.Y)
	under := false
	for _, v := range m.Pages[0].Views {
		if v.Name != "plan" {
			continue
		}
		for _, s := range v.Shapes {
			switch s.Style {
			case sheet.StyleVelocity, sheet.StyleHot, sheet.StyleMargin, sheet.StyleNoiseA, sheet.StyleNoisePeak:
				if len(s.Clip) >= 3 {
					t.Errorf("a %s shape is cut at the site limit", s.Style)
				}
				if s.Style != sheet.StyleNoiseA && s.Style != sheet.StyleNoisePeak && inPagePolygon(s.Points, at) {
					under = true
				}
			}
		}
	}
	if !under {
		t.Errorf("no zone drawn under the crew mark at (%.1f, %.1f) mm past the site limit", at.X, at.Y)
	}
	var plan, side []string
	for _, pg := range m.Pages {
		for _, l := range pg.Labels {
			switch l.View {
			case "", "plan":
				plan = append(plan, l.Text)
			case "clearance", "elevation":
				side = append(side, l.Text)
			}
		}
	}
	if !strings.Contains(strings.Join(plan, "|"), "site limit") {
		t.Errorf("the plan does not name the site limit: %q", plan)
	}
	sides := strings.Join(side, "|")
	if strings.Contains(sides, "wall") || !strings.Contains(sides, "site limit") {
		t.Errorf("side views call the site limit %q, want \"site limit\" and no wall", side)
	}

	room := build(t, demoPlan(t, "../../layouts/hard-wall-exhaust-room.yaml"), sheet.Options{})
	cut := false
	for _, v := range room.Pages[0].Views {
		for _, s := range v.Shapes {
			cut = cut || v.Name == "plan" && s.Style == sheet.StyleVelocity && len(s.Clip) >= 3
		}
	}
	if !cut {
		t.Error("the hard-wall room's velocity zone is no longer cut at its walls")
	}
}

// TestStationTableBoundaryHeading: the station table's boundary clearance
// column names the boundary the cell has: the site limit of an outdoor pad
// (not a wall, issue 8), the walls of a room.
func TestStationTableBoundaryHeading(t *testing.T) {
	for _, tt := range []struct {
		demo, want, not string
	}{
		{"outdoor-static-pad.yaml", "Clearance site limit", "wall"},
		{"hard-wall-exhaust-room.yaml", "Clearance wall", "site limit"},
	} {
		m := build(t, demoPlan(t, "../../layouts/"+tt.demo), sheet.Options{})
		var heads []string
		for _, pg := range m.Pages {
			for _, tb := range pg.Tables {
				if tb.Name != "stations" {
					continue
				}
				for _, c := range tb.Columns {
					heads = append(heads, strings.Join(c.Heading, " "))
				}
			}
		}
		all := strings.Join(heads, "|")
		if !strings.Contains(all, tt.want) || strings.Contains(all, tt.not) {
			t.Errorf("%s: station table headings %q, want %q and no %q", tt.demo, heads, tt.want, tt.not)
		}
	}
}
