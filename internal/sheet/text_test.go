package sheet

import (
	"strings"
	"testing"
)

func TestClean(t *testing.T) {
	tests := []struct{ in, want string }{
		{"θj ≥ 30°", "theta_j >= 30°"},
		{"−3 ft ½ in", "-3 ft ½ in"},
		{"L²/λ", "L²/lambda"},
		{"Ø 1.2 m — ok…", "Ø 1.2 m — ok…"},
		{"日本", "??"},
		{"a\tb", "a b"},
	}
	for _, tt := range tests {
		if got := clean(tt.in); got != tt.want {
			t.Errorf("clean(%q): got %q, want %q", tt.in, got, tt.want)
		}
	}
}

func TestWrap(t *testing.T) {
	m := newMeter()
	text := "Swing radius 3.500 m from the centre with a tape held level, then mark each station by its chord from the one before: A-01 -> A-10 0.813 m."
	for _, w := range []float64{20, 40, 80} {
		lines := m.wrap(text, w, 6.5, false)
		if got := strings.Join(lines, " "); got != text {
			t.Errorf("width %g: the lines lost text: %q", w, got)
		}
		for _, l := range lines {
			if m.width(l, 6.5, false) > w+1e-9 {
				t.Errorf("width %g: line %q is %.2f mm wide", w, l, m.width(l, 6.5, false))
			}
		}
	}
	long := m.wrap("ABCDEFGHIJKLMNOPQRSTUVWXYZ", 8, 6.5, false)
	if len(long) < 3 || strings.Join(long, "") != "ABCDEFGHIJKLMNOPQRSTUVWXYZ" {
		t.Errorf("a long word was not broken into pieces: %q", long)
	}
	if got := m.wrap("Loss\u00a0A (dB)", 9, 6, true); got[0] != "Loss\u00a0A" {
		t.Errorf("a no-break space was broken: %q", got)
	}
}
