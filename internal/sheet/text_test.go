package sheet

import (
	"math"
	"strconv"
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

// TestWrapNonPositiveWidth: a width that is not positive puts each
// character on a line of its own and ends (issue 10 item 6: the wrapper
// looped on an empty remainder wider than a negative width and was killed
// at 24 GB).
func TestWrapNonPositiveWidth(t *testing.T) {
	m := newMeter()
	for _, w := range []float64{0, -5, math.NaN(), math.Inf(-1)} {
		got := m.wrap("ab cd", w, 6, false)
		if strings.Join(got, "") != "abcd" || len(got) != 4 {
			t.Errorf("width %g: got %q, want one character a line", w, got)
		}
	}
}

// TestWrapMatchesWidth: the wrapped lines of a long text, measured whole,
// are no wider than the width, and the text survives: the per-character
// sums that make wrapping linear agree with measuring the line.
func TestWrapMatchesWidth(t *testing.T) {
	m := newMeter()
	text := strings.Repeat("Mark A-01 at X 2.500 m, Y −1.250 m; then W-", 400)
	text = clean(text)
	for _, w := range []float64{3, 30, 300} {
		lines := m.wrap(text, w, 6.5, true)
		if strings.ReplaceAll(strings.Join(lines, ""), " ", "") != strings.ReplaceAll(text, " ", "") {
			t.Fatalf("width %g: the lines lost text", w)
		}
		for _, l := range lines {
			if got := m.width(l, 6.5, true); got > w+1e-9 && len([]rune(l)) > 1 {
				t.Errorf("width %g: line %q is %.3f mm wide", w, l, got)
			}
		}
	}
}

// BenchmarkWrapLong wraps a 25,600-character title without spaces (issue
// 10 item 6: 17 s before the wrapper became linear); ns/char stays flat
// from 2,560 to 25,600 characters when the cost is linear.
func BenchmarkWrapLong(b *testing.B) {
	for _, n := range []int{2560, 25600} {
		b.Run(strconv.Itoa(n), func(b *testing.B) {
			m := newMeter()
			s := strings.Repeat("W", n)
			b.ReportAllocs()
			for b.Loop() {
				m.wrap(s, 40, 6.5, false)
			}
			b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N)/float64(n), "ns/char")
		})
	}
}
