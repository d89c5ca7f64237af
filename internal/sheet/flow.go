package sheet

// flow places blocks (headings, tables, text columns, figures) down the
// sheets after sheet 1, starting a new sheet when one is full. Every sheet
// keeps the title block's band at its foot free.
type flow struct {
	b    *builder
	area Rect // content area of a sheet
	page *Page
	y    float64
}

func newFlow(b *builder) *flow {
	f := b.frame
	return &flow{b: b, area: Rect{f.X + 3, f.Y + 3, f.W - 6, f.H - 6 - titleH - gapMM}}
}

// bottomFor returns the lowest y a block spanning x0 to x1 (mm) may reach:
// the frame's foot beside the title block, else the top of its band.
func (f *flow) bottomFor(x0, x1 float64) float64 {
	if x1 <= f.b.frame.Right()-f.b.colW-gapMM {
		return f.b.frame.Bottom() - 3
	}
	return f.area.Bottom()
}

// newPage starts a sheet.
func (f *flow) newPage() {
	f.b.model.Pages = append(f.b.model.Pages, Page{})
	f.page = &f.b.model.Pages[len(f.b.model.Pages)-1]
	f.y = f.area.Y
}

// room returns the height left on the current sheet, mm.
func (f *flow) room() float64 {
	if f.page == nil {
		return 0
	}
	return f.area.Bottom() - f.y
}

// ensure starts a new sheet unless h mm are left on this one.
func (f *flow) ensure(h float64) {
	if f.room() < h {
		f.newPage()
	}
}

// heading prints a section heading, kept with at least keep mm of what
// follows.
func (f *flow) heading(s string, keep float64) {
	h := lineHeight(sizeHeading) + 1.5
	f.ensure(h + keep)
	f.y += capHeight(sizeHeading) + 0.5
	f.page.Texts = append(f.page.Texts, f.b.text(f.area.X, f.y, sizeHeading, true, s))
	f.y += h - capHeight(sizeHeading) - 0.5
}

// gap adds vertical space unless at the top of a sheet.
func (f *flow) gap(h float64) {
	if f.page != nil && f.y > f.area.Y {
		f.y += h
	}
}

// textLine is one paragraph of a text block.
type textLine struct {
	text   string
	bold   bool
	indent float64 // mm
	space  float64 // extra space before, mm
}

// columns flows paragraphs through columns about 125 mm wide across the
// sheet, column by column, then on to the next sheet. A bold line is kept
// with the line after it.
func (f *flow) columns(paras []textLine) {
	b := f.b
	k := max(1, int((f.area.W+6)/126))
	const cgap = 6.0
	cw := (f.area.W - float64(k-1)*cgap) / float64(k)
	sz := sizeBody
	lh := lineHeight(sz)
	type wl struct {
		text  string
		bold  bool
		x     float64
		space float64
		keep  bool
	}
	var lines []wl
	for _, p := range paras {
		ws := b.m.wrap(clean(p.text), cw-p.indent, sz, p.bold)
		for i, w := range ws {
			l := wl{text: w, bold: p.bold, x: p.indent}
			if i == 0 {
				l.space = p.space
			}
			l.keep = p.bold && i == len(ws)-1
			lines = append(lines, l)
		}
	}
	f.ensure(4 * lh)
	top := f.y
	c := 0
	y := top
	bottom := top
	for i := 0; i < len(lines); i++ {
		l := lines[i]
		need := l.space + lh
		if l.keep {
			need += lh
		}
		x0 := f.area.X + float64(c)*(cw+cgap)
		if y > top && y+need > f.bottomFor(x0, x0+cw) {
			c++
			if c == k {
				f.newPage()
				top, c = f.y, 0
				bottom = top
			}
			y = top
		}
		if y > top {
			y += l.space
		}
		y += lh
		f.page.Texts = append(f.page.Texts, Text{X: f.area.X + float64(c)*(cw+cgap) + l.x, Y: y - lh*0.25, Size: sz, Bold: l.bold, Text: l.text})
		bottom = max(bottom, y)
	}
	f.y = bottom + 1
}
