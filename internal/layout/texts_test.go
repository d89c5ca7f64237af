package layout

import (
	"strings"
	"testing"
)

// TestTextsAndNames checks the texts that reach the terminal, the sheet and
// the exports: lengths are capped, control characters refused, a numeric
// date must be a date, custom tags are refused (issue 10, items 6 and 9).
func TestTextsAndNames(t *testing.T) {
	tests := []struct {
		name  string
		pairs []string
		field string
		want  string
	}{
		{"long array name", []string{"- name: A\n", "- name: " + strings.Repeat("A", 260) + "\n"}, "arrays[0].name", "260 characters long; want at most 40"},
		{"long point name", []string{"- name: P1", "- name: " + strings.Repeat("é", 41)}, "operating_points[0].name", "41 characters long"},
		{"long title", []string{"title: Test layout", "title: " + strings.Repeat("t", 25600)}, "title.title", "want at most 120"},
		{"escape in title", []string{"title: Test layout", `title: "a\e[2Jb"`}, "title.title", "U+001B"},
		{"new line in title", []string{"title: Test layout", "title: |\n    two\n    lines"}, "title.title", "U+000A"},
		{"bidi override in a stand name", []string{"- name: tripod", "- name: \"tri\u202Epod\""}, "stands[0].name", "U+202E"},
		{"month 13", []string{"title: Test layout", "title: Test layout\n  date: 2026-13-45"}, "title.date", `"2026-13-45" is not a date`},
		{"30 February", []string{"title: Test layout", "title: Test layout\n  date: 30.02.2026"}, "title.date", "not a date"},
		{"custom tag", []string{"npr: 1.5", "npr: !pressure 1.5"}, "", "YAML tag !pressure is not supported"},
		{"obstacle outside", []string{"  ceiling: 4 m", "  ceiling: 4 m\n  obstacles:\n    - {name: rig, circle: {centre: [30, 30], radius: 1}, to: 1 m}"}, "cell.obstacles[0].circle", "wholly outside the cell"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			es := decodeErrors(t, edit(t, baseLayout, tt.pairs...))
			for _, e := range es {
				if e.Field == tt.field && strings.Contains(e.Msg, tt.want) && e.Line > 0 {
					return
				}
			}
			t.Errorf("got %v, want a problem at %q with a line saying %q", es, tt.field, tt.want)
		})
	}
	// dates that are dates, and free texts, are kept as written
	for _, date := range []string{"2026-11-30", "2024-02-29", "30.11.2026", "November 2026"} {
		req, _ := mustDecode(t, edit(t, baseLayout, "title: Test layout", "title: Test layout\n  date: "+date))
		if req.Title.Date != date {
			t.Errorf("date %q: got %q", date, req.Title.Date)
		}
	}
	// an obstacle that crosses the cell is kept
	mustDecode(t, edit(t, baseLayout, "  ceiling: 4 m", "  ceiling: 4 m\n  obstacles:\n    - {name: duct, polygon: [[-1, 2], [9, 2], [9, 2.5], [-1, 2.5], [-1, 2]], to: 0.5 m}"))
}

// TestAngleShortfallBelowResolution checks that a range whose last step
// falls short of "to" by less than the printed 0.1° is not warned ("stop
// at 175.0°, short of 175.0°", issue 10, item 9), while a visible
// shortfall still is.
func TestAngleShortfallBelowResolution(t *testing.T) {
	polar := "polar: {from: 30 deg, to: 150 deg, step: 10 deg}"
	_, warns := mustDecode(t, edit(t, baseLayout, polar, "polar: {from: 30 deg, to: 175.04 deg, step: 5 deg}"))
	for _, w := range warns {
		if strings.Contains(w.Msg, "short of") {
			t.Errorf("got warning %q, want none below 0.1°", w)
		}
	}
	_, warns = mustDecode(t, edit(t, baseLayout, polar, "polar: {from: 30 deg, to: 175.2 deg, step: 5 deg}"))
	found := false
	for _, w := range warns {
		found = found || strings.Contains(w.Msg, "stop at 175.0°, short of 175.2°")
	}
	if !found {
		t.Errorf("got %v, want a warning that the steps stop at 175.0°", warns)
	}
}

// TestKeyWithControlCharacters checks that an unknown key written with
// escapes ("\e[2J") is quoted in the message, so that it cannot drive the
// terminal (issue 10, item 9).
func TestKeyWithControlCharacters(t *testing.T) {
	es := decodeErrors(t, baseLayout+"\"\\e[2Jx\": 1\n")
	for _, e := range es {
		if strings.ContainsRune(e.Error(), 0x1b) {
			t.Errorf("got %q, want no raw escape character", e)
		}
	}
	if !strings.Contains(es.Error(), `"\x1b[2Jx"`) {
		t.Errorf("got %v, want the key quoted", es)
	}
}
