package sheet_test

import (
	"strings"
	"testing"

	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

// TestNoiseOnTheSheet checks that the plan view draws the predicted noise
// contours and crew positions, and that the level and crew tables list
// every microphone and crew entry with the caution.
func TestNoiseOnTheSheet(t *testing.T) {
	p := chamberPlan(t)
	req := *p.Request
	req.Crew = []planner.Crew{{Name: "desk", At: r3.Vec{X: 1, Y: 1, Z: 1.6}, Hours: 2}}
	req.Noise.Contours = []float64{120}
	p.Request = &req
	p.Stations = append([]planner.Station(nil), p.Stations...)
	for i := range p.Stations {
		st := &p.Stations[i]
		st.Levels = nil
		for _, pt := range p.Points {
			st.Levels = append(st.Levels, planner.Level{Point: pt.Name, OASPL: 120, AWeighted: 118, Peak: 132, Uncertainty: 3})
		}
		st.Checks = append(append([]planner.Check(nil), st.Checks...), planner.Check{Name: planner.CheckLevel, Value: 120, Unit: "dB", Verdict: planner.OK, Point: p.Points[0].Name, Reason: "fits"})
	}
	p.Crew = []planner.CrewExposure{{Name: "desk", Point: p.Points[0].Name, At: req.Crew[0].At, Hours: 2, AWeighted: 110, Peak: 125, AllowedHours: 0.1, Status: planner.Blocked, Reason: "passes the limit"}}
	if len(p.Points) > 1 {
		// a position inside a zone reads "KEEP OUT", not only "LIMIT"
		p.Crew = append(p.Crew, planner.CrewExposure{Name: "desk", Point: p.Points[1].Name, At: req.Crew[0].At, Hours: 2, AWeighted: 100, Peak: 115, AllowedHours: 1, Status: planner.Blocked, InZone: true, Reason: "inside the velocity zone"})
	}
	m := build(t, p, sheet.Options{})
	styles := map[sheet.Style]int{}
	for _, v := range m.Pages[0].Views {
		for _, s := range v.Shapes {
			styles[s.Style]++
		}
	}
	noise, _ := p.NoiseMap()
	lines := 0
	for _, c := range noise.Contours {
		lines += len(c.Lines)
	}
	if lines == 0 || styles[sheet.StyleNoiseA]+styles[sheet.StyleNoisePeak] != lines {
		t.Errorf("got %d contour shapes, want one per line of the noise map (%d)", styles[sheet.StyleNoiseA]+styles[sheet.StyleNoisePeak], lines)
	}
	if styles[sheet.StyleCrew] != 1 {
		t.Errorf("got %d crew symbols, want 1", styles[sheet.StyleCrew])
	}
	tables := map[string]sheet.Table{}
	rows := map[string]int{} // a table may run over several pages
	for _, pg := range m.Pages {
		for _, tb := range pg.Tables {
			if _, seen := tables[tb.Name]; !seen {
				tables[tb.Name] = tb
			}
			rows[tb.Name] += len(tb.Rows)
		}
	}
	for _, name := range []string{"levels", "crew"} {
		tb, ok := tables[name]
		if !ok {
			t.Errorf("no %s table", name)
			continue
		}
		if name == "crew" && len(p.Points) > 1 {
			var status []string
			for _, r := range tb.Rows {
				status = append(status, strings.Join(r.Cells[8], " "))
			}
			if len(status) != 2 || status[0] != "LIMIT" || status[1] != "KEEP OUT" {
				t.Errorf("crew table status: got %q, want LIMIT, then KEEP OUT for the position in a zone", status)
			}
		}
		if name == "levels" && rows[name] != len(p.Stations) {
			t.Errorf("levels table: got %d rows, want %d", rows[name], len(p.Stations))
		}
		if !strings.Contains(tb.Title, "estimates") || !strings.Contains(tb.Title, "licensed practice") {
			t.Errorf("%s table title lacks the caution: %q", name, tb.Title)
		}
	}
}
