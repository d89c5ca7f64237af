package sheet

import (
	"strings"
	"unicode/utf8"

	"github.com/jung-kurt/gofpdf"
)

// fontFamily is the core font every text is set in.
const fontFamily = "Helvetica"

// replacements turns characters outside cp1252, which the core fonts cannot
// print, into plain words or symbols. Longer keys come first where one is a
// prefix of another.
var replacements = strings.NewReplacer(
	"θi", "theta_i", "θj", "theta_j", "θ", "theta",
	"≥", ">=", "≤", "<=", "≠", "!=", "≈", "~", "−", "-", "‐", "-", "‑", "-",
	"→", "->", "←", "<-", "↑", "^", "↓", "v",
	"λ", "lambda", "ρ", "rho", "π", "pi", "Δ", "delta", "δ", "delta",
	"μ", "µ", "α", "alpha", "β", "beta", "γ", "gamma", "ω", "omega", "φ", "phi",
	"σ", "sigma", "τ", "tau", "ε", "epsilon", "η", "eta", "ν", "nu", "κ", "kappa",
	"′", "'", "″", `"`, "₀", "0", "₁", "1", "₂", "2", "₃", "3",
	"√", "sqrt", "∞", "inf", "\t", " ",
)

// cp1252Extra holds the characters of cp1252 at 0x80–0x9F, which are not
// the Latin-1 code points (Microsoft's Windows-1252 code page table, from
// memory; gofpdf's cp1252 map agrees).
const cp1252Extra = "€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ"

// clean returns s with every character the core fonts cannot print
// replaced: first by the words of replacements, then by "?".
func clean(s string) string {
	s = replacements.Replace(s)
	ok := true
	for _, r := range s {
		if !printable(r) {
			ok = false
			break
		}
	}
	if ok {
		return s
	}
	var b strings.Builder
	for _, r := range s {
		if printable(r) {
			b.WriteRune(r)
		} else {
			b.WriteByte('?')
		}
	}
	return b.String()
}

// printable reports whether r is in cp1252 and is not a control character
// other than none (newlines are split before printing).
func printable(r rune) bool {
	switch {
	case r >= 0x20 && r < 0x7f:
		return true
	case r >= 0xa0 && r <= 0xff:
		return true
	case r == utf8.RuneError:
		return false
	}
	return strings.ContainsRune(cp1252Extra, r)
}

// meter measures text in the core font, the same way the renderer prints it.
// The core fonts have no kerning, so a text's width is the sum of its
// characters' widths: each character is measured once per size and weight
// and remembered, and every measure and wrap is linear in the text's length.
type meter struct {
	pdf   *gofpdf.Fpdf
	tr    func(string) string
	size  float64
	bold  bool
	cache map[glyphKey]float64
	// tables hold the widths of the first 256 characters by size and
	// weight (glyphKey with r 0)
	tables map[glyphKey]*[256]float64
}

// glyphKey is a character at a size (pt) and weight.
type glyphKey struct {
	size float64
	bold bool
	r    rune
}

func newMeter() *meter {
	pdf := gofpdf.New("L", "mm", "A4", "")
	m := &meter{pdf: pdf, tr: pdf.UnicodeTranslatorFromDescriptor(""), cache: make(map[glyphKey]float64), tables: make(map[glyphKey]*[256]float64)}
	m.set(8, false)
	return m
}

func (m *meter) set(size float64, bold bool) {
	if m.size == size && m.bold == bold {
		return
	}
	style := ""
	if bold {
		style = "B"
	}
	m.pdf.SetFont(fontFamily, style, size)
	m.size, m.bold = size, bold
}

// runeWidth returns the printed width of r at size (pt), mm.
func (m *meter) runeWidth(r rune, size float64, bold bool) float64 {
	k := glyphKey{size, bold, r}
	if w, ok := m.cache[k]; ok {
		return w
	}
	m.set(size, bold)
	w := m.pdf.GetStringWidth(m.tr(string(r)))
	m.cache[k] = w
	return w
}

// latin returns the widths of the characters below U+0100 at size (pt)
// and weight, measured once.
func (m *meter) latin(size float64, bold bool) *[256]float64 {
	k := glyphKey{size: size, bold: bold}
	if t, ok := m.tables[k]; ok {
		return t
	}
	t := new([256]float64)
	for r := range t {
		t[r] = m.runeWidth(rune(r), size, bold)
	}
	m.tables[k] = t
	return t
}

// width returns the printed width of s at size (pt), mm.
func (m *meter) width(s string, size float64, bold bool) float64 {
	t := m.latin(size, bold)
	w := 0.0
	for _, r := range s {
		if r < 256 {
			w += t[r]
		} else {
			w += m.runeWidth(r, size, bold)
		}
	}
	return w
}

// wrap breaks s into lines no wider than w (mm) at size (pt), at spaces;
// a word wider than w is broken between characters. Newlines in s start a
// new line. An empty s gives one empty line. A w that is not positive (or
// NaN) puts each character on a line of its own. The cost is linear in the
// length of s.
func (m *meter) wrap(s string, w, size float64, bold bool) []string {
	if !(w > 0) {
		w = 0
	}
	// sums of character widths differ from a whole line's measure by
	// rounding: a line within wrapTol of w fits
	w += wrapTol
	space := m.runeWidth(' ', size, bold)
	var out []string
	for _, para := range strings.Split(s, "\n") {
		words := strings.FieldsFunc(para, func(r rune) bool { return r == ' ' })
		if len(words) == 0 {
			out = append(out, "")
			continue
		}
		var line strings.Builder
		lw := 0.0
		for _, word := range words {
			ww := m.width(word, size, bold)
			if line.Len() > 0 && lw+space+ww <= w {
				line.WriteByte(' ')
				line.WriteString(word)
				lw += space + ww
				continue
			}
			if line.Len() > 0 {
				out = append(out, line.String())
				line.Reset()
			}
			if ww <= w {
				line.WriteString(word)
				lw = ww
				continue
			}
			// a word wider than the line: break it between characters
			start, cw := 0, 0.0
			for i, r := range word {
				rw := m.runeWidth(r, size, bold)
				if i > start && cw+rw > w {
					out = append(out, word[start:i])
					start, cw = i, 0
				}
				cw += rw
			}
			line.WriteString(word[start:])
			lw = cw
		}
		out = append(out, line.String())
	}
	return out
}

// wrapTol is the rounding allowance of wrap, mm.
const wrapTol = 1e-6

// lineHeight returns the line spacing of text at size (pt), mm.
func lineHeight(size float64) float64 { return size * mmPerPt * 1.2 }

// capHeight returns the height of capitals at size (pt), mm: 0.72 em for
// Helvetica (Adobe's Helvetica font metrics give CapHeight 718 per 1000 em,
// from memory).
func capHeight(size float64) float64 { return size * mmPerPt * 0.72 }
