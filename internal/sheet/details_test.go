package sheet_test

import (
	"fmt"
	"regexp"
	"strconv"
	"strings"
	"testing"

	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

// TestDetailTitlesListWhatIsShown: a detail's title names every station
// whose ID it shows, and every label of a detail lies inside its frame
// (review: "DETAIL A — A-01 to A-07" showed,
// R-08, with labels cut off at the frame).
func TestDetailTitlesListWhatIsShown(t *testing.T) {
	for _, path := range []string{"testdata/review-chamber.yaml", "../../layouts/anechoic-model-jet.yaml"} {
		m := build(t, demoPlan(t, path), sheet.Options{})
		details := 0
		for _, pg := range m.Pages {
			titles := map[string]string{}
			for _, tx := range pg.Texts {
				if strings.HasPrefix(tx.Text, "DETAIL ") {
					titles["detail "+strings.Fields(tx.Text)[1]] = tx.Text
				}
			}
			for _, v := range pg.Views {
				if !strings.HasPrefix(v.Name, "detail ") {
					continue
				}
				details++
				title, ok := titles[v.Name]
				if !ok {
					t.Errorf("%s %s: no title", path, v.Name)
					continue
				}
				for _, l := range pg.Labels {
					if l.View != v.Name {
						continue
					}
					if b := l.Box(); b.X < v.Frame.X-0.01 || b.Y < v.Frame.Y-0.01 || b.Right() > v.Frame.Right()+0.01 || b.Bottom() > v.Frame.Bottom()+0.01 {
						t.Errorf("%s %s: label %q at %+v runs out of the frame %+v", path, v.Name, l.Text, b, v.Frame)
					}
					if l.Kind == sheet.StationLabel && !covers(title, l.For) {
						t.Errorf("%s: %q shows %s", path, title, l.For)
					}
				}
			}
		}
		if details == 0 {
			t.Errorf("%s: no detail views", path)
		}
	}
}

// covers reports whether a detail title names id, alone or in a run
// "A-01 to A-10".
func covers(title, id string) bool {
	if regexp.MustCompile(`(^|[ ,—])` + regexp.QuoteMeta(id) + `($|[ ,])`).MatchString(title) {
		return true
	}
	split := func(s string) (string, int, bool) {
		i := strings.LastIndexByte(s, '-')
		if i < 0 {
			return "", 0, false
		}
		n, err := strconv.Atoi(s[i+1:])
		return s[:i], n, err == nil
	}
	pre, n, ok := split(id)
	if !ok {
		return false
	}
	for _, m := range regexp.MustCompile(`(\S+) to (\S+?)[,]?(?: |$)`).FindAllStringSubmatch(title, -1) {
		p1, a, ok1 := split(m[1])
		p2, b, ok2 := split(m[2])
		if ok1 && ok2 && p1 == pre && p2 == pre && a <= n && n <= b {
			return true
		}
	}
	return false
}

// TestShownRunsCountsStations: a detail's title that sums up the runs it
// has no room for counts their stations, not the runs.
func TestShownRunsCountsStations(t *testing.T) {
	var ss []*planner.Station
	add := func(array string, n int) {
		for i := 1; i <= n; i++ {
			ss = append(ss, &planner.Station{ID: fmt.Sprintf("%s-%02d", array, i), Array: array, Index: i})
		}
	}
	add("A", 6)
	add("N", 16)
	add("R", 6)
	lead, tail := "DETAIL C — ", ", scale 1:100"
	for _, tt := range []struct {
		w    float64
		want string
	}{
		{500, "A-01 to A-06, N-01 to N-16, R-01 to R-06"},
		{40, "A-01 to A-06 and 22 more"}, // 16 + 6 stations in two runs
	} {
		if got := sheet.ShownRuns(ss, tt.w, lead, tail); got != tt.want {
			t.Errorf("width %g mm: got %q, want %q", tt.w, got, tt.want)
		}
	}
}
