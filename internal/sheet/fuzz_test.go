package sheet_test

import (
	"errors"
	"math"
	"testing"

	"arcwright/internal/sheet"
)

// FuzzBuild builds the chamber sheet with any paper name, any scale, one
// station moved anywhere (possibly to NaN or infinity) and any title text:
// Build either refuses with one of its errors or returns a model whose
// labels do not overlap and whose scale bar matches its scale. It never
// panics.
func FuzzBuild(f *testing.F) {
	f.Add("A3", 0, 0, 0.0, 0.0, "Model jet")
	f.Add("a4", 100, 3, 1.5, -2.0, "θ ≥ 30° − check")
	f.Add("Tabloid", 0, 7, 40.0, 40.0, "")
	f.Add("Letter", 75, 12, math.NaN(), 0.0, "x")
	f.Add("B5", 0, 1, 0.0, 0.0, "x")
	f.Add("", -3, 2, math.Inf(1), 1.0, "日本語のタイトル")
	f.Add("A3", 20, 29, 0.0, 0.0, "too large a scale")
	f.Fuzz(func(t *testing.T, paper string, scale, station int, dx, dy float64, title string) {
		p := chamberPlan(t)
		s := &p.Stations[(station%len(p.Stations)+len(p.Stations))%len(p.Stations)]
		if math.Abs(dx) < 1e4 && math.Abs(dy) < 1e4 || !finiteF(dx, dy) {
			s.Mic.X += dx
			s.Mic.Y += dy
			s.Base[0] += dx
			s.Base[1] += dy
		}
		p.Request.Title.Title = title
		m, err := sheet.Build(p, sheet.Options{Paper: paper, Scale: scale})
		if err != nil {
			if !errors.Is(err, sheet.ErrUnknownPaper) && !errors.Is(err, sheet.ErrScale) && !errors.Is(err, sheet.ErrInvalidPlan) {
				t.Fatalf("got an error wrapping none of the sentinels: %v", err)
			}
			return
		}
		if !finiteF(dx, dy) {
			t.Fatalf("a station at a non-finite place was accepted")
		}
		bar := m.ScaleBar
		if math.Abs(bar.LengthMM-bar.RealLength*1000/float64(m.Scale)) > 0.5 {
			t.Fatalf("scale bar %.2f mm for %.3f m at 1:%d", bar.LengthMM, bar.RealLength, m.Scale)
		}
		for i := range m.Pages {
			if o := overlaps(&m.Pages[i]); len(o) > 0 {
				t.Fatalf("page %d: overlapping labels: %s", i+1, o[0])
			}
		}
	})
}

func finiteF(v ...float64) bool {
	for _, x := range v {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return false
		}
	}
	return true
}
