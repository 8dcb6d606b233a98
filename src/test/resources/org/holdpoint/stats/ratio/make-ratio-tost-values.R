# Reference values for the TOST of a ratio after/before on the log scale, base R only: t.test() on the
# logarithms (Welch, var.equal = TRUE, paired) at conf.level 1 - 2*alpha, exponentiated; the one-sided p-values
# from pt() with the t.test's estimate, standard error and df against (log L, log U).
# Run from this folder: Rscript make-ratio-tost-values.R
set.seed(20261206)
h <- function(x) sprintf("%.17g", x)
cases <- list(
  list(id = "ratio-25", nb = 25, na = 25, mb = 0.045, ma = 0.047, s = 0.35, paired = FALSE, lo = 0.8, up = 1.25),
  list(id = "ratio-12-40", nb = 12, na = 40, mb = 3.1, ma = 2.9, s = 0.2, paired = FALSE, lo = NA, up = 1.2),
  list(id = "ratio-paired-18", nb = 18, na = 18, mb = 12, ma = 12.6, s = 0.15, paired = TRUE, lo = 0.9, up = 1.1)
)
rows <- c("id,design,alpha,lower,upper,estimate,ci_lower,ci_upper,p_lower,p_upper")
srows <- c("id,group,i,x")
for (k in cases) {
  if (k$paired) {
    base <- rlnorm(k$nb, log(k$mb), k$s)
    b <- round(base * exp(rnorm(k$nb, 0, 0.05)), 4)
    a <- round(base * (k$ma / k$mb) * exp(rnorm(k$na, 0, 0.05)), 4)
  } else {
    b <- round(rlnorm(k$nb, log(k$mb), k$s), 4)
    a <- round(rlnorm(k$na, log(k$ma), k$s * 1.2), 4)
  }
  for (i in seq_along(b)) srows <- c(srows, paste(k$id, "before", i, h(b[i]), sep = ","))
  for (i in seq_along(a)) srows <- c(srows, paste(k$id, "after", i, h(a[i]), sep = ","))
  designs <- if (k$paired) list(paired = list(paired = TRUE)) else
    list(welch = list(var.equal = FALSE), pooled = list(var.equal = TRUE))
  for (dn in names(designs)) for (alpha in c(0.05, 0.10)) {
    args <- c(list(x = log(a), y = log(b), conf.level = 1 - 2 * alpha), designs[[dn]])
    tt <- do.call(t.test, args)
    d <- if (k$paired) unname(tt$estimate) else unname(tt$estimate[1] - tt$estimate[2])
    se <- unname(tt$stderr); df <- unname(tt$parameter)
    pl <- if (is.na(k$lo)) NA else pt((d - log(k$lo)) / se, df, lower.tail = FALSE)
    pu <- if (is.na(k$up)) NA else pt((d - log(k$up)) / se, df)
    rows <- c(rows, paste(k$id, dn, alpha, h(k$lo), h(k$up), h(exp(d)), h(exp(tt$conf.int[1])),
                          h(exp(tt$conf.int[2])), h(pl), h(pu), sep = ","))
  }
}
writeLines(c(paste0("# ", R.version.string, "; base R only; set.seed(20261206); t.test on log(after), log(before); ",
                    "exp of estimate and conf.int; pt for the one-sided p"), rows), "ratio-tost-values.csv")
writeLines(c(paste0("# ", R.version.string, "; set.seed(20261206); values rounded to 4 decimals"), srows),
           "ratio-samples.csv")
