package chartmodel

import (
	"sync"

	xfont "golang.org/x/image/font"
	"golang.org/x/image/font/gofont/gobold"
	"golang.org/x/image/font/gofont/goregular"
	"golang.org/x/image/font/opentype"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/text"
)

// Typeface is the name charts give the Go fonts, which the window and the
// record also use, so that text measured while laying out a chart has the
// width it is drawn with.
const Typeface font.Typeface = "Go"

var (
	fontsOnce sync.Once
	fonts     *font.Cache
)

// handler returns the text handler over the embedded Go fonts (parsed
// once; the parsed fonts are never changed after).
func handler() text.Handler {
	fontsOnce.Do(func() {
		reg, err1 := opentype.Parse(goregular.TTF)
		bold, err2 := opentype.Parse(gobold.TTF)
		if err1 != nil || err2 != nil {
			panic("chartmodel: the embedded Go fonts do not parse")
		}
		fonts = font.NewCache(font.Collection{
			{Font: font.Font{Typeface: Typeface}, Face: reg},
			{Font: font.Font{Typeface: Typeface, Weight: xfont.WeightBold}, Face: bold},
		})
	})
	return text.Plain{Fonts: fonts}
}
