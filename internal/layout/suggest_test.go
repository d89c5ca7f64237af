package layout

import "testing"

func TestLevenshtein(t *testing.T) {
	tests := []struct {
		a, b string
		want int
	}{
		// The classic worked example, kitten → sitting, is 3 edits
		// (Levenshtein 1966; from memory). The rest are hand-computed.
		{"kitten", "sitting", 3},
		{"", "", 0},
		{"", "abc", 3},
		{"ceilng", "ceiling", 1},
		{"flor", "floor", 1},
		{"heading", "heading", 0},
		{"größe", "grosse", 3}, // ö→o, ß→s, insert s: runes, not bytes
	}
	for _, tt := range tests {
		t.Run(tt.a+"→"+tt.b, func(t *testing.T) {
			if got := levenshtein(tt.a, tt.b); got != tt.want {
				t.Errorf("levenshtein(%q, %q): got %d, want %d", tt.a, tt.b, got, tt.want)
			}
			if got := levenshtein(tt.b, tt.a); got != tt.want {
				t.Errorf("levenshtein(%q, %q): got %d, want %d (symmetry)", tt.b, tt.a, got, tt.want)
			}
		})
	}
}

func TestSuggest(t *testing.T) {
	tests := []struct {
		name string
		got  string
		want string
	}{
		{"one edit", "ceilng", "ceiling"},
		{"case", "Ceiling", "ceiling"},
		{"two edits", "obstacls", "obstacles"},
		{"prefix of a key", "treatment", "treatment_depth"},
		{"key is a prefix", "keep_outs_zone", "keep_out"},
		{"nothing close", "zebra", ""},
		{"short and far", "xy", ""},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			if got := suggest(tt.got, cellKeys); got != tt.want {
				t.Errorf("suggest(%q): got %q, want %q", tt.got, got, tt.want)
			}
		})
	}
}

func TestUnknownKeyMsg(t *testing.T) {
	tests := []struct {
		name, got, where string
		want             string
	}{
		{"suggestion", "ceilng", "cell", `unknown key "ceilng"; did you mean "ceiling"?`},
		{"list", "zebra", "band", `unknown key "zebra"; the keys of band are low, high`},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			known := cellKeys
			if tt.where == "band" {
				known = bandKeys
			}
			if got := unknownKeyMsg(tt.got, tt.where, known); got != tt.want {
				t.Errorf("got %q, want %q", got, tt.want)
			}
		})
	}
}

func TestOneOf(t *testing.T) {
	tests := []struct {
		words []string
		want  string
	}{
		{nil, ""},
		{[]string{"a"}, "a"},
		{[]string{"a", "b"}, "a or b"},
		{[]string{"a", "b", "c"}, "a, b or c"},
	}
	for _, tt := range tests {
		t.Run(tt.want, func(t *testing.T) {
			if got := oneOf(tt.words); got != tt.want {
				t.Errorf("oneOf(%q): got %q, want %q", tt.words, got, tt.want)
			}
		})
	}
}
