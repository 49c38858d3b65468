package report

// recordTitle prints the top of the first page: a small kicker line, the
// title and a subtitle.
func (d *doc) recordTitle(kicker, title, subtitle string) {
	d.use(style{faceBold, 8, accent})
	lh := lineHeight(8)
	d.c.drawText(d.left, baseline(d.y, lh, 8), kicker)
	d.y += lh + 0.5
	for _, ln := range func() []string { d.use(titleStyle); return d.wrap(title, d.width()) }() {
		tl := lineHeight(titleStyle.size)
		d.c.drawText(d.left, baseline(d.y, tl, titleStyle.size), ln)
		d.y += tl
	}
	if subtitle != "" {
		d.paragraph(subtitle, style{faceRegular, 10, darkGrey})
	}
	d.c.setStroke(accent)
	d.c.setLineWidth(0.8)
	d.c.setDash()
	d.y += 1.5
	d.c.line(d.left, d.y, d.right, d.y)
	d.y += 3
}

// signer is one row of the sign-off block.
type signer struct{ role, name string }

// signOff prints the sign-off block, kept whole on one page: for each
// signer a name, a signature line and a date line.
func (d *doc) signOff(reviewer string) {
	signers := []signer{{"Prepared by", ""}, {"Reviewed by", reviewer}, {"Approved by", ""}}
	const boxH = 33
	d.heading("Sign-off")
	d.lead("By signing, each person confirms that they have read this record in full, including its cautions and the sources of its data, and that the inputs describe the revision named in the header.")
	d.need(boxH)
	gap := 4.0
	w := (d.width() - 2*gap) / 3
	for i, s := range signers {
		x := d.left + float64(i)*(w+gap)
		d.c.setStroke(black)
		d.c.setLineWidth(0.3)
		d.c.setDash()
		d.c.rect(x, d.y, w, boxH, stroke)
		d.c.setFill(lightGrey)
		d.c.rect(x, d.y, w, 6, fillStroke)
		d.use(bodyBold)
		d.c.drawText(x+2, baseline(d.y, 6, 9), s.role)
		rows := []struct{ label, value string }{{"Name", s.name}, {"Signature", ""}, {"Date", ""}}
		for j, r := range rows {
			ly := d.y + 14 + float64(j)*8
			d.use(label)
			d.c.drawText(x+2, ly, r.label)
			d.c.setStroke(midGrey)
			d.c.setLineWidth(0.2)
			lx := x + 17
			d.c.line(lx, ly+0.8, x+w-2, ly+0.8)
			if r.value != "" {
				d.use(body)
				d.c.drawText(lx+0.5, ly-0.3, d.fit(r.value, x+w-2-lx-1))
			}
		}
	}
	d.y += boxH + 2
}
