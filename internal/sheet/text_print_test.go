package sheet_test

import (
	"strings"
	"testing"

	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

// cp1252 reports whether r prints in the core fonts' code page: printable
// ASCII, Latin-1 from U+00A0, or one of the characters Windows-1252 puts at
// 0x80–0x9F (Microsoft's Windows-1252 code page table, FROM MEMORY).
func cp1252(r rune) bool {
	return r >= 0x20 && r < 0x7f || r >= 0xa0 && r <= 0xff || strings.ContainsRune("€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ", r)
}

// modelStrings returns every string the model prints.
func modelStrings(m *sheet.Model) []string {
	var out []string
	for _, pg := range m.Pages {
		for _, t := range pg.Texts {
			out = append(out, t.Text)
		}
		for _, l := range pg.Labels {
			out = append(out, l.Text)
		}
		for _, tb := range pg.Tables {
			out = append(out, strings.Split(tb.Title, "\n")...)
			for _, c := range tb.Columns {
				out = append(out, c.Heading...)
			}
			for _, r := range tb.Rows {
				for _, c := range r.Cells {
					out = append(out, c...)
				}
			}
		}
	}
	return out
}

// TestTextsPrintInCp1252: reasons with θ, ≥ and − from the planner reach
// the page as characters the core fonts have.
func TestTextsPrintInCp1252(t *testing.T) {
	p := chamberPlan(t)
	p.Stations[0].Reasons = []string{"θj = 30° ≥ the limit − 2 λ/4"}
	p.Request.Title.Facility = "Kammer Ü — Ø 3 m"
	m := build(t, p, sheet.Options{})
	for _, s := range modelStrings(m) {
		for _, r := range s {
			if !cp1252(r) {
				t.Errorf("%q holds %q, which the core fonts cannot print", s, r)
			}
		}
	}
	if row := stationRow(t, m, "A-01"); row[len(row)-1] != "theta_j = 30° >= the limit - 2 lambda/4" {
		t.Errorf("got reason %q, want the replacement words", row[len(row)-1])
	}
}

// TestLegendExplainsEverySymbol: every style the plan view draws a feature
// with has a sample in the legend on sheet 1.
func TestLegendExplainsEverySymbol(t *testing.T) {
	for _, tt := range []struct {
		name string
		plan func(testing.TB) *planner.Plan
	}{{"chamber", chamberPlan}, {"pad", func(t testing.TB) *planner.Plan { return padPlan(t, 60) }}} {
		t.Run(tt.name, func(t *testing.T) {
			m := build(t, tt.plan(t), sheet.Options{})
			pg := m.Pages[0]
			inLegend := map[sheet.Style]bool{}
			for _, s := range pg.Shapes {
				inLegend[s.Style] = true
			}
			explained := map[sheet.Style]bool{
				sheet.StyleBoundary: true, sheet.StyleSiteLimit: true, sheet.StyleTreatment: true, sheet.StyleObstacle: true, sheet.StyleKeepOut: true,
				sheet.StyleVelocity: true, sheet.StyleHot: true, sheet.StyleMargin: true, sheet.StyleCore: true,
				sheet.StyleAxis: true, sheet.StyleNozzle: true, sheet.StyleCollector: true, sheet.StyleArray: true,
				sheet.StyleBase: true, sheet.StyleMark: true, sheet.StyleStrike: true, sheet.StyleGrid: true,
			}
			for _, v := range pg.Views {
				for _, s := range v.Shapes {
					if explained[s.Style] && !inLegend[s.Style] {
						t.Errorf("the plan draws style %s, which the legend does not show", s.Style)
						explained[s.Style] = false
					}
				}
			}
		})
	}
}
