package layout

import (
	"fmt"
	"strings"
	"unicode/utf8"
)

// Limits of the "did you mean" suggestion for a misspelt key or word.
const (
	// suggestMaxEdits is the largest edit distance at which a known word is
	// suggested for a misspelt one.
	suggestMaxEdits = 2
	// suggestMinPrefix is the shortest shared beginning at which a known
	// word is suggested when the edit distance is larger ("treatment" for
	// "treatment_depth").
	suggestMinPrefix = 4
)

// suggest returns the known word that got was most likely meant to be, or ""
// when none is close. A word is close when its edit distance to got (case
// ignored) is at most suggestMaxEdits, or, failing that, when the two share
// a beginning of at least suggestMinPrefix characters (or one is a prefix of
// the other and at least 3 characters long). The first of equally close
// words wins.
func suggest(got string, known []string) string {
	g := strings.ToLower(got)
	best, bestDist := "", suggestMaxEdits+1
	for _, k := range known {
		kl := strings.ToLower(k)
		if n, m := utf8.RuneCountInString(g), utf8.RuneCountInString(kl); n-m > suggestMaxEdits || m-n > suggestMaxEdits {
			continue // too different in length to be within reach
		}
		if d := levenshtein(g, kl); d < bestDist {
			best, bestDist = k, d
		}
	}
	if best != "" {
		return best
	}
	bestPrefix := 0
	for _, k := range known {
		kl := strings.ToLower(k)
		p := commonPrefix(g, kl)
		short := min(utf8.RuneCountInString(g), utf8.RuneCountInString(kl))
		if (p >= suggestMinPrefix || (p == short && p >= 3)) && p > bestPrefix {
			best, bestPrefix = k, p
		}
	}
	return best
}

// unknownKeyMsg is the message for the key got in the section called where
// ("the top level", "cell", "arrays[1].arc"), whose keys are known.
func unknownKeyMsg(got, where string, known []string) string {
	if s := suggest(got, known); s != "" {
		return fmt.Sprintf("unknown key %q; did you mean %q?", got, s)
	}
	return fmt.Sprintf("unknown key %q; the keys of %s are %s", got, where, strings.Join(known, ", "))
}

// oneOf lists words as "a, b or c".
func oneOf(words []string) string {
	switch len(words) {
	case 0:
		return ""
	case 1:
		return words[0]
	}
	return strings.Join(words[:len(words)-1], ", ") + " or " + words[len(words)-1]
}

// levenshtein returns the number of single-character insertions, deletions
// and substitutions that turn a into b, counting runes (Levenshtein 1966,
// the two-row dynamic programme; common practice).
func levenshtein(a, b string) int {
	ra, rb := []rune(a), []rune(b)
	prev := make([]int, len(rb)+1)
	cur := make([]int, len(rb)+1)
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(ra); i++ {
		cur[0] = i
		for j := 1; j <= len(rb); j++ {
			cost := 1
			if ra[i-1] == rb[j-1] {
				cost = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+cost)
		}
		prev, cur = cur, prev
	}
	return prev[len(rb)]
}

// commonPrefix returns the number of leading runes a and b share.
func commonPrefix(a, b string) int {
	n := 0
	for a != "" && b != "" {
		ra, sa := utf8.DecodeRuneInString(a)
		rb, sb := utf8.DecodeRuneInString(b)
		if ra != rb {
			break
		}
		n++
		a, b = a[sa:], b[sb:]
	}
	return n
}
