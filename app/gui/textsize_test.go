package gui

import (
	"sync"

	"fyne.io/fyne/v2"
)

// measuringApp is the test app with a driver that remembers every text
// size it measured for the whole run. Fyne keeps its own sizes for a
// minute after last use; the tests open the same example a hundred times
// over several minutes, and measuring text is most of what a window
// costs on the test driver.
type measuringApp struct {
	fyne.App
	d *measuringDriver
}

// Driver returns the remembering driver.
func (a measuringApp) Driver() fyne.Driver { return a.d }

// fontKey is what a text is drawn in: its size, style and the name of
// its font (the source's, or the theme's for the style).
type fontKey struct {
	size  float32
	style fyne.TextStyle
	font  string
}

type textSize struct {
	size fyne.Size
	base float32
}

// measuringDriver is the test driver with a lasting memory of text sizes.
type measuringDriver struct {
	fyne.Driver
	mu sync.Mutex
	// sizes holds the sizes by font, then by text: the texts of a
	// wrapped label come one after the other in the same font, and
	// looking up the text alone hashes only its string.
	sizes        map[fontKey]map[string]textSize
	calls, found int
	// last and lastSizes are the font asked for last and its sizes.
	last      fontKey
	lastSizes map[string]textSize
	// theme is the theme the names in fonts are of; a text asked for in
	// another theme empties fonts.
	theme fyne.Theme
	fonts map[fyne.TextStyle]string
}

// RenderedTextSize measures text once for the run. The key holds the
// font's name, so that a change of look measures again.
func (d *measuringDriver) RenderedTextSize(text string, size float32, style fyne.TextStyle, source fyne.Resource) (fyne.Size, float32) {
	k := fontKey{size: size, style: style}
	var th fyne.Theme
	if source != nil {
		k.font = source.Name()
	} else {
		th = fyne.CurrentApp().Settings().Theme()
	}
	d.mu.Lock()
	if th != nil {
		if d.theme != th {
			d.theme, d.fonts = th, map[fyne.TextStyle]string{}
		}
		name, ok := d.fonts[style]
		if !ok {
			if f := th.Font(style); f != nil {
				name = "theme " + f.Name()
			}
			d.fonts[style] = name
		}
		k.font = name
	}
	if d.lastSizes == nil || d.last != k {
		m := d.sizes[k]
		if m == nil {
			m = map[string]textSize{}
			d.sizes[k] = m
		}
		d.last, d.lastSizes = k, m
	}
	sizes := d.lastSizes
	d.calls++
	m, ok := sizes[text]
	if ok {
		d.found++
	}
	d.mu.Unlock()
	if ok {
		return m.size, m.base
	}
	s, b := d.Driver.RenderedTextSize(text, size, style, source)
	d.mu.Lock()
	sizes[text] = textSize{s, b}
	d.mu.Unlock()
	return s, b
}
