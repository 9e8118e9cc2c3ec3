import type { ValueSource } from '@broodsilk/shared';

/** The catalogue our names follow. */
export const WSC_VERSION =
  'World Spider Catalog (2025). World Spider Catalog. Version 26. Natural History Museum Bern, online at http://wsc.nmbe.ch. doi: 10.24436/2';

const pub = (citation: string): ValueSource => ({ kind: 'published', citation });

/** Publications and catalogues named in docs/trade-facts.md; each value in the dataset names one of these or says it has none. */
export const SRC = {
  mendozaFrancke2020: pub(
    'Mendoza, J. & Francke, O. 2020. Systematic revision of Mexican threatened tarantulas Brachypelma, with a description of a new genus (Tliltocatl). Zool. J. Linn. Soc.',
  ),
  fukushimaBertani2017: pub(
    'Fukushima, C.S. & Bertani, R. 2017. Taxonomic revision and cladistic analysis of Avicularia Lamarck, 1818. ZooKeys 659: 1–185. doi:10.3897/zookeys.659.10717',
  ),
  cec2019: pub(
    'Cooper, E.W.T., West, R. & Mendoza, J. 2019. Identification of CITES-listed Tarantulas. Commission for Environmental Cooperation, Montreal. ISBN 978-2-89700-254-1',
  ),
  ahmed2009: pub(
    'Ahmed, N., Pinkham, M. & Warrell, D.A. 2009. Symptom in search of a toxin: muscle spasms following bites by Old World tarantula spiders. QJM',
  ),
  fuchs2014: pub('Fuchs, J. et al. 2014. Toxicon 77: 73–77. doi:10.1016/j.toxicon.2013.10.032'),
  haukeHerzig2020: pub(
    'Hauke, T.J. & Herzig, V. 2020. Preprint doi:10.20944/preprints202012.0145.v1 (cramps most frequent after bites of Poecilotheriinae, Harpactirinae and Stromatopelminae)',
  ),
  handwikiPsalmopoeus: pub(
    'HandWiki, "Psalmopoeus irminia" (Psalmopoeus described as having stronger venom than other New World tarantulas; no medically significant case given)',
  ),
  carrim2010: pub('Carrim, Z.I. et al. 2010. Case report, The Lancet (urticating hairs of Grammostola in the cornea)'),
  dorHenaut2012: pub(
    'Dor, A. & Hénaut, Y. 2012. Silk use and spiderling behavior in the tarantula Brachypelma vagans. Acta Zoológica Mexicana 28(1) (200 young per sac, n = 2)',
  ),
  brachypelmaSmithiDe: pub('brachypelma-smithi.de, "Vermehrung: Entwicklung und Aufzucht" (B. smithi up to 600 eggs; genus Brachypelma 100–600)'),
  tarantulaspiderNet: pub('tarantulaspider.net, "How to Take Care of Tarantula Eggs" (Theraphosa under 100; Citharischius more than 1000 eggs)'),
  theraphosaClutch: pub('thezooreviewer.blogspot.com (2024), Theraphosa blondi: 50–200 eggs per sac'),
  theraphosaTiming: pub('Wikipedia, "Goliath birdeater" (mirror); thezooreviewer.blogspot.com (2024): Theraphosa blondi spiderlings 6–8 weeks after laying'),
  lasiodoraZoo: pub('Zoo species page, Brazilian salmon pink bird-eating tarantula (app-czn-prod-uks-frontend.azurewebsites.net): up to 2000 eggs'),
  arachnoworld: pub(
    'arachnoworld.de, "Vom Schlüpfen bis zum Tod" (about 200 eggs in Grammostola mollicoma and Lasiodora klugi, about 800 in Pamphobeteus and Acanthoscurria)',
  ),
  arachnofolies: pub('arachnofolies.ch, "Mygales Brachypelma" (B. albopilosum males rarely live more than a year after the last molt)'),
  spinnenAndre: pub('spinnen-andre.jimdo.com, "Zucht" (sac usually 4–10 weeks after copulation)'),
  mommajorje2010: pub('mommajorje.com blog, 2010 (Grammostola rosea 80–1000 eggs)'),
  citesCop18: pub('CITES CoP18 Prop. 46 (Colombo 2019): all Poecilotheria species to Appendix II'),
  common: { kind: 'common-practice' } as ValueSource,
  memory: { kind: 'memory' } as ValueSource,
} as const;

export const memo = (note: string): ValueSource => ({ kind: 'memory', note });
