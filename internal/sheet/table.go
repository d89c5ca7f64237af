package sheet

import (
	"math"
	"strings"
)

// tableSpec is a table before layout: headings and cell texts.
type tableSpec struct {
	name  string
	title string
	heads []string
	right []bool // right-aligned columns
	flex  []bool // columns that take the width left over and wrap
	rows  [][]string
	maxW  float64 // largest width, mm; 0: the flow's width
}

// Table padding, mm.
const (
	cellPadX = 1.0
	cellPadY = 0.6
)

// layoutColumns returns the column widths of t within w (mm): each column
// as wide as its widest cell (headings may wrap at spaces), the flexible
// columns sharing what is left; when the fixed columns alone are too wide
// they shrink in proportion and their cells wrap.
func (b *builder) layoutColumns(t *tableSpec, w, size float64) []float64 {
	n := len(t.heads)
	nat := make([]float64, n)  // natural width (longest cell on one line)
	word := make([]float64, n) // longest heading word
	for i, h := range t.heads {
		for _, wd := range splitWords(h) {
			word[i] = math.Max(word[i], b.m.width(wd, size, true))
		}
	}
	for _, r := range t.rows {
		for i, c := range r {
			nat[i] = math.Max(nat[i], b.m.width(c, size, false))
		}
	}
	ws := make([]float64, n)
	fixed, flexNat, nflex := 0.0, 0.0, 0
	for i := range ws {
		// 0.3 mm slack keeps a word exactly as wide as its column on one line
		ws[i] = math.Max(nat[i], word[i]) + 2*cellPadX + 0.3
		if t.flex[i] {
			ws[i] = math.Max(word[i]+2*cellPadX, math.Min(ws[i], 25))
			flexNat += math.Max(nat[i], word[i]) + 2*cellPadX
			nflex++
		} else {
			fixed += ws[i]
		}
	}
	left := w - fixed
	if nflex == 0 {
		if left < 0 {
			for i := range ws {
				ws[i] *= w / fixed
			}
		}
		return ws
	}
	minFlex := 30.0 * float64(nflex)
	if left < minFlex {
		f := math.Max(0.3, (w-minFlex)/fixed)
		for i := range ws {
			if !t.flex[i] {
				ws[i] *= f
			}
		}
		left = w - fixed*f
	}
	share := math.Min(left, flexNat)
	for i := range ws {
		if t.flex[i] {
			full := math.Max(nat[i], word[i]) + 2*cellPadX
			ws[i] = math.Max(ws[i], share*full/flexNat)
		}
	}
	return ws
}

// splitWords splits s at spaces.
func splitWords(s string) []string {
	var out []string
	start := -1
	for i, r := range s {
		if r == ' ' || r == '\n' {
			if start >= 0 {
				out = append(out, s[start:i])
				start = -1
			}
		} else if start < 0 {
			start = i
		}
	}
	if start >= 0 {
		out = append(out, s[start:])
	}
	return out
}

// table lays t out at the flow's width and places it, splitting it between
// rows onto as many sheets as it needs; each part repeats the heading.
func (f *flow) table(t tableSpec) {
	b := f.b
	sz := sizeTable
	lh := lineHeight(sz)
	w := f.area.W
	if t.maxW > 0 {
		w = math.Min(w, t.maxW)
	}
	for i := range t.heads {
		t.heads[i] = clean(t.heads[i])
	}
	for _, r := range t.rows {
		for i := range r {
			r[i] = clean(r[i])
		}
	}
	ws := b.layoutColumns(&t, w, sz)
	cols := make([]Column, len(ws))
	headLines := 1
	for i, h := range t.heads {
		cols[i] = Column{Heading: b.m.wrap(h, ws[i]-2*cellPadX, sz, true), W: ws[i], Right: t.right[i]}
		headLines = max(headLines, len(cols[i].Heading))
	}
	headH := float64(headLines)*lh + 2*cellPadY
	rows := make([]Row, len(t.rows))
	for ri, r := range t.rows {
		cells := make([][]string, len(r))
		n := 1
		for i, c := range r {
			cells[i] = b.m.wrap(c, ws[i]-2*cellPadX, sz, false)
			n = max(n, len(cells[i]))
		}
		rows[ri] = Row{Cells: cells, H: float64(n)*lh + 2*cellPadY}
	}
	first := true
	for len(rows) > 0 || first {
		title := clean(t.title)
		if !first {
			title += " (continued)"
		}
		tl := b.m.wrap(title, f.area.W, sizeBody, true)
		titleH := float64(len(tl))*lineHeight(sizeBody) + 1
		// start a part only where its heading and a few rows fit
		need := titleH + headH
		for i := 0; i < min(3, len(rows)); i++ {
			need += rows[i].H
		}
		f.ensure(need)
		part := Table{
			Name: t.name, Title: strings.Join(tl, "\n"), X: f.area.X, Y: f.y, Size: sz, Line: lh,
			TitleH: titleH, HeadH: headH, Columns: cols, Continued: !first,
		}
		y := f.y + titleH + headH
		n := 0
		bottom := f.bottomFor(part.X, part.X+part.W())
		for n < len(rows) && y+rows[n].H <= bottom {
			y += rows[n].H
			n++
		}
		if n == 0 && len(rows) > 0 && f.y == f.area.Y {
			n = 1 // a row taller than a sheet: print it anyway
			y += rows[0].H
		}
		part.Rows = rows[:n]
		rows = rows[n:]
		f.page.Tables = append(f.page.Tables, part)
		f.y = y + 2
		first = false
		if len(rows) > 0 {
			f.newPage()
		}
	}
}
