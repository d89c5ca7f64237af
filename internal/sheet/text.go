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
type meter struct {
	pdf  *gofpdf.Fpdf
	tr   func(string) string
	size float64
	bold bool
}

func newMeter() *meter {
	pdf := gofpdf.New("L", "mm", "A4", "")
	m := &meter{pdf: pdf, tr: pdf.UnicodeTranslatorFromDescriptor("")}
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

// width returns the printed width of s at size (pt), mm.
func (m *meter) width(s string, size float64, bold bool) float64 {
	m.set(size, bold)
	return m.pdf.GetStringWidth(m.tr(s))
}

// wrap breaks s into lines no wider than w (mm) at size (pt), at spaces;
// a word wider than w is broken between characters. Newlines in s start a
// new line. An empty s gives one empty line.
func (m *meter) wrap(s string, w, size float64, bold bool) []string {
	var out []string
	for _, para := range strings.Split(s, "\n") {
		words := strings.FieldsFunc(para, func(r rune) bool { return r == ' ' })
		if len(words) == 0 {
			out = append(out, "")
			continue
		}
		line := ""
		for _, word := range words {
			try := word
			if line != "" {
				try = line + " " + word
			}
			if m.width(try, size, bold) <= w {
				line = try
				continue
			}
			if line != "" {
				out = append(out, line)
			}
			line = word
			for m.width(line, size, bold) > w {
				cut := m.fit(line, w, size, bold)
				out = append(out, line[:cut])
				line = line[cut:]
			}
		}
		out = append(out, line)
	}
	return out
}

// fit returns the byte length of the longest prefix of s (at least one
// character) that fits in w mm.
func (m *meter) fit(s string, w, size float64, bold bool) int {
	end := 0
	for i, r := range s {
		next := i + utf8.RuneLen(r)
		if end > 0 && m.width(s[:next], size, bold) > w {
			break
		}
		end = next
	}
	return end
}

// lineHeight returns the line spacing of text at size (pt), mm.
func lineHeight(size float64) float64 { return size * mmPerPt * 1.2 }

// capHeight returns the height of capitals at size (pt), mm: 0.72 em for
// Helvetica (Adobe's Helvetica font metrics give CapHeight 718 per 1000 em,
// from memory).
func capHeight(size float64) float64 { return size * mmPerPt * 0.72 }
