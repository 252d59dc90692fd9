<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="nl">
<context>
    <name>ExtractorJob</name>
    <message>
        <location filename="../app/desktop/runs/extractor_job.cpp" line="16"/>
        <source>Choose at least one run.</source>
        <translation>Kies ten minste één run.</translation>
    </message>
</context>
<context>
    <name>FunctionStyle</name>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="30"/>
        <source>Problem</source>
        <translation>Probleem</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="32"/>
        <source>Cause</source>
        <translation>Oorzaak</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="34"/>
        <source>Evaluation</source>
        <translation>Evaluatie</translation>
    </message>
    <message>
        <location filename="../app/desktop/function_style.cpp" line="36"/>
        <source>Remedy</source>
        <translation>Oplossing</translation>
    </message>
</context>
<context>
    <name>ImportDialog</name>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="17"/>
        <source>Importing articles…</source>
        <translation>Artikelen worden geïmporteerd…</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="18"/>
        <source>Cancel</source>
        <translation>Annuleren</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="23"/>
        <source>Importing %1 (%2 of %3)…</source>
        <translation>%1 wordt geïmporteerd (%2 van %3)…</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="29"/>
        <location filename="../app/desktop/import_dialog.cpp" line="47"/>
        <source>%1: not imported — %2</source>
        <translation>%1: niet geïmporteerd — %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="42"/>
        <source>%1: cancelled; nothing from this file was added.</source>
        <translation>%1: geannuleerd; er is niets uit dit bestand toegevoegd.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_dialog.cpp" line="52"/>
        <source>%1: %n article(s) added</source>
        <translation>
            <numerusform>%1: %n artikel toegevoegd</numerusform>
            <numerusform>%1: %n artikelen toegevoegd</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="56"/>
        <source>    line %1 (%2): skipped, %3</source>
        <translation>    regel %1 (%2): overgeslagen, %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/import_dialog.cpp" line="69"/>
        <location filename="../app/desktop/import_dialog.cpp" line="75"/>
        <source>Import report</source>
        <translation>Importrapport</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/import_dialog.cpp" line="71"/>
        <source>%n article(s) added.</source>
        <translation>
            <numerusform>%n artikel toegevoegd.</numerusform>
            <numerusform>%n artikelen toegevoegd.</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>ReliabilityJob</name>
    <message>
        <location filename="../app/desktop/reliability/reliability_job.cpp" line="39"/>
        <source>The computation was cancelled.</source>
        <translation>De berekening is geannuleerd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_job.cpp" line="49"/>
        <source>Choose at least one framing function.</source>
        <translation>Kies ten minste één framingfunctie.</translation>
    </message>
</context>
<context>
    <name>StudyText</name>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="13"/>
        <source>Training</source>
        <translation>Training</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="15"/>
        <source>Pilot</source>
        <translation>Pilot</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="17"/>
        <source>Reliability</source>
        <translation>Betrouwbaarheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="19"/>
        <source>Production</source>
        <translation>Hoofdcodering</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="29"/>
        <source>%1 s</source>
        <translation>%1 s</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="32"/>
        <source>%1 min</source>
        <translation>%1 min</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_text.cpp" line="33"/>
        <source>%1 h %2 min</source>
        <translation>%1 u %2 min</translation>
    </message>
</context>
<context>
    <name>fourfold::ArticleListModel</name>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="47"/>
        <source>done</source>
        <translation>klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="49"/>
        <source>in progress</source>
        <translation>bezig</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="50"/>
        <source>not started</source>
        <translation>niet begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="92"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="94"/>
        <source>Outlet</source>
        <translation>Medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="96"/>
        <source>Lang.</source>
        <translation>Taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="100"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="102"/>
        <source>Time</source>
        <translation>Tijd</translation>
    </message>
    <message>
        <location filename="../app/desktop/article_list_model.cpp" line="98"/>
        <source>Characters</source>
        <translation>Tekens</translation>
    </message>
</context>
<context>
    <name>fourfold::CodebookPanel</name>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="22"/>
        <source>nominal</source>
        <translation>nominaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="24"/>
        <source>ordinal</source>
        <translation>ordinaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="26"/>
        <source>interval</source>
        <translation>interval</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="28"/>
        <source>ratio</source>
        <translation>ratio</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="56"/>
        <source>Codebook</source>
        <translation>Codeboek</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="58"/>
        <source>Framing function</source>
        <translation>Framingfunctie</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="64"/>
        <source>Codebook entry</source>
        <translation>Codeboekdefinitie</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="106"/>
        <source>No codebook loaded.</source>
        <translation>Geen codeboek geladen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="119"/>
        <source>%1, version %2</source>
        <translation>%1, versie %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="127"/>
        <source>Decision rules</source>
        <translation>Beslisregels</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="134"/>
        <source>Examples</source>
        <translation>Voorbeelden</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="139"/>
        <source>Attributes</source>
        <translation>Kenmerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="142"/>
        <source>None: marking the span is all this function asks for.</source>
        <translation>Geen: voor deze functie volstaat het om het fragment te markeren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="147"/>
        <source>free text</source>
        <translation>vrije tekst</translation>
    </message>
    <message>
        <location filename="../app/desktop/codebook_panel.cpp" line="148"/>
        <source>%1 (%2)</source>
        <translation>%1 (%2)</translation>
    </message>
</context>
<context>
    <name>fourfold::CoderDialog</name>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="22"/>
        <source>Who is coding?</source>
        <translation>Wie codeert er?</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="25"/>
        <source>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Choose who you are. A coder sees only their own spans and the articles assigned to them; a lead sees every article.</source>
        <translation>&lt;b&gt;%1&lt;/b&gt;&lt;br&gt;Kies wie je bent. Codeurs zien alleen hun eigen fragmenten en de artikelen die aan hen zijn toegewezen; coördinatoren zien alle artikelen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="32"/>
        <source>Coders</source>
        <translation>Codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="36"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="65"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="90"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="36"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="64"/>
        <location filename="../app/desktop/coder_dialog.cpp" line="90"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="41"/>
        <source>Start coding</source>
        <translation>Beginnen met coderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="44"/>
        <source>Add a person…</source>
        <translation>Persoon toevoegen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="58"/>
        <source>Add a person</source>
        <translation>Persoon toevoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="62"/>
        <source>e.g. C04 — the only name written to exports</source>
        <translation>bijv. C04 — de enige naam die in exports terechtkomt</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="66"/>
        <source>Name:</source>
        <translation>Naam:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="67"/>
        <source>Pseudonym:</source>
        <translation>Pseudoniem:</translation>
    </message>
    <message>
        <location filename="../app/desktop/coder_dialog.cpp" line="68"/>
        <source>Role:</source>
        <translation>Rol:</translation>
    </message>
</context>
<context>
    <name>fourfold::ComparisonView</name>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="34"/>
        <source>Coders side by side</source>
        <translation>Codeurs naast elkaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="193"/>
        <source>only one coder has a span here</source>
        <translation>slechts één codeur heeft hier een fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="194"/>
        <source>not every coder has a span here</source>
        <translation>niet elke codeur heeft hier een fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="196"/>
        <source>different functions</source>
        <translation>verschillende functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="198"/>
        <source>different boundaries</source>
        <translation>verschillende grenzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="200"/>
        <source>different attributes</source>
        <translation>verschillende kenmerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="201"/>
        <source>The coders agree here.</source>
        <translation>De codeurs zijn het hier eens.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="202"/>
        <source>Disagreement: %1.</source>
        <translation>Verschil: %1.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="202"/>
        <source>; </source>
        <translation>; </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_view.cpp" line="204"/>
        <source>Decided.</source>
        <translation>Beslist.</translation>
    </message>
</context>
<context>
    <name>fourfold::ComparisonWindow</name>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="89"/>
        <source>Compare coders and decide gold — %1</source>
        <translation>Codeurs vergelijken en gouden standaard beslissen — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="91"/>
        <source>Only a lead compares coders and decides the gold standard. Open the project as a lead to use this window.</source>
        <translation>Alleen een coördinator vergelijkt codeurs en beslist over de gouden standaard. Open het project als coördinator om dit venster te gebruiken.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="141"/>
        <source>Articles to adjudicate</source>
        <translation>Te beslissen artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="142"/>
        <source>Articles coded by several coders, most undecided disagreements first. Open: undecided disagreements; Agreed: passages all coders agree on that are not yet in gold.</source>
        <translation>Artikelen die door meerdere codeurs zijn gecodeerd, die met de meeste onbesliste verschillen eerst. Open: onbesliste verschillen; Eens: passages waarover alle codeurs het eens zijn en die nog niet in de gouden standaard staan.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="159"/>
        <source>Margin: ∅ a coder has no span here · ≠ different functions · ↔ different boundaries · ≈ different attributes · ✓ decided. Lanes under each line: problem (solid), cause (dashed), evaluation (dotted), remedy (dash-dot). Hatched: this coder has no span in the passage.</source>
        <translation>Marge: ∅ een codeur heeft hier geen fragment · ≠ verschillende functies · ↔ verschillende grenzen · ≈ verschillende kenmerken · ✓ beslist. Banen onder elke regel: probleem (doorgetrokken), oorzaak (gestreept), evaluatie (gestippeld), oplossing (streep-punt). Gearceerd: deze codeur heeft geen fragment in de passage.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="196"/>
        <source>Who</source>
        <translation>Wie</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="196"/>
        <source>Span</source>
        <translation>Fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="196"/>
        <source>Decision</source>
        <translation>Beslissing</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="201"/>
        <source>Spans of the passage</source>
        <translation>Fragmenten van de passage</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="212"/>
        <source>&amp;Rationale (optional, kept with the decision):</source>
        <translation>&amp;Motivering (optioneel, wordt bij de beslissing bewaard):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="214"/>
        <source>Why this decision, for the method section</source>
        <translation>Waarom deze beslissing, voor de methodesectie</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="218"/>
        <source>Keys: N / P next and previous disagreement, Alt+Down / Alt+Up next and previous article; A accept the chosen span, M merge the chosen spans, E edit, R reject, W withdraw a gold span; Ctrl+Shift+A accept all agreed; Ctrl+L rationale; Ctrl+Z undo.</source>
        <translation>Toetsen: N / P volgend en vorig verschil, Alt+Pijl-omlaag / Alt+Pijl-omhoog volgend en vorig artikel; A het gekozen fragment accepteren, M de gekozen fragmenten samenvoegen, E bewerken, R verwerpen, W een fragment uit de gouden standaard terugtrekken; Ctrl+Shift+A alle overeenstemmende accepteren; Ctrl+L motivering; Ctrl+Z ongedaan maken.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="251"/>
        <source>Comparison</source>
        <translation>Vergelijking</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="265"/>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="585"/>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="641"/>
        <source>, </source>
        <translation>, </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="271"/>
        <source>Function: </source>
        <translation>Functie: </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="273"/>
        <source>All functions</source>
        <translation>Alle functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="276"/>
        <source>Function filter</source>
        <translation>Functiefilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="282"/>
        <source>  Coders: </source>
        <translation>  Codeurs: </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="284"/>
        <source>All coders</source>
        <translation>Alle codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="291"/>
        <source>%1 and %2</source>
        <translation>%1 en %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="293"/>
        <source>Coder pair filter</source>
        <translation>Filter op codeurspaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="299"/>
        <source>Show decided</source>
        <translation>Besliste tonen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="300"/>
        <source>Also step through disagreements already decided</source>
        <translation>Ook langs verschillen gaan die al beslist zijn</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="303"/>
        <source>Articles in progress</source>
        <translation>Artikelen in bewerking</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="304"/>
        <source>Also compare coders on articles they have started but not yet marked done</source>
        <translation>Vergelijk codeurs ook op artikelen die ze begonnen maar nog niet als klaar gemarkeerd hebben</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="306"/>
        <source>Show articles in progress</source>
        <translation>Artikelen in bewerking tonen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="314"/>
        <source>Previous</source>
        <translation>Vorige</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="315"/>
        <source>Previous undecided disagreement</source>
        <translation>Vorig onbeslist verschil</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="316"/>
        <source>Next</source>
        <translation>Volgende</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="316"/>
        <source>Next undecided disagreement</source>
        <translation>Volgend onbeslist verschil</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="318"/>
        <source>Previous article</source>
        <translation>Vorig artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="319"/>
        <source>Previous article in the queue</source>
        <translation>Vorig artikel in de wachtrij</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="324"/>
        <source>Next article</source>
        <translation>Volgend artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="325"/>
        <source>Next article in the queue</source>
        <translation>Volgend artikel in de wachtrij</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="333"/>
        <source>Accept</source>
        <translation>Accepteren</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="333"/>
        <source>Accept the chosen coder&apos;s span into gold</source>
        <translation>Het fragment van de gekozen codeur in de gouden standaard opnemen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="335"/>
        <source>Merge</source>
        <translation>Samenvoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="336"/>
        <source>Put one span covering the chosen spans into gold</source>
        <translation>Eén fragment dat de gekozen fragmenten omvat in de gouden standaard opnemen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="337"/>
        <source>Edit…</source>
        <translation>Bewerken…</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="338"/>
        <source>Decide a gold span with a function and boundaries of your own</source>
        <translation>Een fragment voor de gouden standaard vastleggen met een eigen functie en eigen grenzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="340"/>
        <source>Reject</source>
        <translation>Verwerpen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="341"/>
        <source>Record that the chosen spans do not belong in gold</source>
        <translation>Vastleggen dat de gekozen fragmenten niet in de gouden standaard horen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="342"/>
        <source>Withdraw gold</source>
        <translation>Terugtrekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="342"/>
        <source>Withdraw the chosen gold span</source>
        <translation>Het gekozen fragment uit de gouden standaard terugtrekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="344"/>
        <source>Accept all agreed</source>
        <translation>Alle overeenstemmende accepteren</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="346"/>
        <source>Accept every span all coders of the article agree on</source>
        <translation>Elk fragment accepteren waarover alle codeurs van het artikel het eens zijn</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="352"/>
        <source>Undo</source>
        <translation>Ongedaan maken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="354"/>
        <source>Redo</source>
        <translation>Opnieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="496"/>
        <source>Gold (%1)</source>
        <translation>Gouden standaard (%1)</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="496"/>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="633"/>
        <source>Gold</source>
        <translation>Gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="541"/>
        <source>No undecided disagreement left in this article. Alt+Down opens the next article.</source>
        <translation>Geen onbeslist verschil meer in dit artikel. Alt+Pijl-omlaag opent het volgende artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="558"/>
        <source>No undecided disagreement left in this article.</source>
        <translation>Geen onbeslist verschil meer in dit artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="574"/>
        <source>No spans to compare in this article.</source>
        <translation>Geen fragmenten om te vergelijken in dit artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="575"/>
        <source>Click a passage or press N for the next disagreement.</source>
        <translation>Klik op een passage of druk op N voor het volgende verschil.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="585"/>
        <source>no span by %1</source>
        <translation>geen fragment van %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="588"/>
        <source>different functions</source>
        <translation>verschillende functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="590"/>
        <source>different boundaries</source>
        <translation>verschillende grenzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="592"/>
        <source>different attributes</source>
        <translation>verschillende kenmerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="600"/>
        <source>Passage %1 of %2 (paragraph %3): %4%5</source>
        <translation>Passage %1 van %2 (alinea %3): %4%5</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="604"/>
        <source>the coders agree</source>
        <translation>de codeurs zijn het eens</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="604"/>
        <source>; </source>
        <translation>; </translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="605"/>
        <source> — decided</source>
        <translation> — beslist</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="624"/>
        <source>Characters %1 to %2</source>
        <translation>Tekens %1 tot %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="625"/>
        <source>rejected</source>
        <translation>verworpen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="625"/>
        <source>in gold</source>
        <translation>in gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="641"/>
        <source>drawn by the lead</source>
        <translation>getekend door de coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="641"/>
        <source>from %1</source>
        <translation>van %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="643"/>
        <source>Decided by %1 at %2.%3</source>
        <translation>Beslist door %1 op %2.%3</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="645"/>
        <source> Rationale: %1</source>
        <translation> Motivering: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="653"/>
        <source>Gold %1 decided by %2 at %3%4</source>
        <translation>Gouden standaard %1 beslist door %2 op %3%4</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="757"/>
        <source>%1. Undo with %2.</source>
        <translation>%1. Ongedaan maken met %2.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="784"/>
        <source>Choose one coder&apos;s span to accept (or several to merge).</source>
        <translation>Kies het fragment van één codeur om te accepteren (of meerdere om samen te voegen).</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="811"/>
        <source>Choose a passage first.</source>
        <translation>Kies eerst een passage.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="849"/>
        <source>Choose the spans to reject (that are not rejected yet).</source>
        <translation>Kies de fragmenten om te verwerpen (die nog niet verworpen zijn).</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="860"/>
        <source>Choose one gold span to withdraw.</source>
        <translation>Kies één fragment uit de gouden standaard om terug te trekken.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/comparison_window.cpp" line="880"/>
        <source>There is no agreed passage left to accept in this article.</source>
        <translation>Er is in dit artikel geen overeenstemmende passage meer om te accepteren.</translation>
    </message>
</context>
<context>
    <name>fourfold::DisagreementQueueModel</name>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="74"/>
        <source>%1 passages: %2 with a disagreement (%3 undecided), %4 agreed and not yet in gold. Only one coder or not all: %5; function: %6; boundaries: %7; attributes: %8.</source>
        <translation>%1 passages: %2 met een verschil (%3 onbeslist), %4 overeenstemmend en nog niet in de gouden standaard. Slechts één codeur of niet alle: %5; functie: %6; grenzen: %7; kenmerken: %8.</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="96"/>
        <source>Passages with a disagreement not yet decided</source>
        <translation>Passages met een verschil waarover nog niet is beslist</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="98"/>
        <source>Passages with a disagreement, decided or not</source>
        <translation>Passages met een verschil, beslist of niet</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="100"/>
        <source>Passages all coders agree on that are not yet in gold</source>
        <translation>Passages waarover alle codeurs het eens zijn en die nog niet in de gouden standaard staan</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="109"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="111"/>
        <source>Open</source>
        <translation>Open</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="113"/>
        <source>All</source>
        <translation>Alle</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="115"/>
        <source>Agreed</source>
        <translation>Eens</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/disagreement_queue_model.cpp" line="117"/>
        <source>Coders</source>
        <translation>Codeurs</translation>
    </message>
</context>
<context>
    <name>fourfold::ExtractorWindow</name>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="97"/>
        <source>Extractor runs</source>
        <translation>Extractorruns</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Function</source>
        <translation>Functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <source>Precision</source>
        <translation>Precisie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <source>Recall</source>
        <translation>Recall</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="107"/>
        <source>F1</source>
        <translation>F1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>F1 95% CI</source>
        <translation>F1 95%-BI</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>COR</source>
        <translation>COR</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>INC</source>
        <translation>INC</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>PAR</source>
        <translation>PAR</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>MIS</source>
        <translation>MIS</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>SPU</source>
        <translation>SPU</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="108"/>
        <source>α run–coders</source>
        <translation>α run–codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="109"/>
        <source>Coders&apos; band</source>
        <translation>Bandbreedte codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="109"/>
        <source>Run vs band</source>
        <translation>Run t.o.v. band</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="110"/>
        <source>Correct: the run&apos;s span matches</source>
        <translation>Correct: het fragment van de run komt overeen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="112"/>
        <source>Incorrect: matched, but the boundaries or the function differ (strict/exact/type)</source>
        <translation>Incorrect: gekoppeld, maar de grenzen of de functie verschillen (strikt/exact/type)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="114"/>
        <source>Partial: matched with other boundaries (partial mode; counts half)</source>
        <translation>Gedeeltelijk: gekoppeld met andere grenzen (gedeeltelijke modus; telt half)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="115"/>
        <source>Missing: a reference span the run missed</source>
        <translation>Ontbrekend: een referentiefragment dat de run heeft gemist</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="117"/>
        <source>Spurious: a run span with no reference span (false positive)</source>
        <translation>Onterecht: een fragment van de run zonder referentiefragment (fout-positief)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="119"/>
        <source>Mean Krippendorff&apos;s alpha (nominal) of the run with each coder, per unit</source>
        <translation>Gemiddelde Krippendorffs alfa (nominaal) van de run met elke codeur, per eenheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="121"/>
        <source>Lowest to highest alpha of the pairs of human coders</source>
        <translation>Laagste tot hoogste alfa van de paren menselijke codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="127"/>
        <source>Scores</source>
        <translation>Scores</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="129"/>
        <source>Errors</source>
        <translation>Fouten</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="150"/>
        <source>Function confusion</source>
        <translation>Functieverwarring</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="184"/>
        <source>&lt;b&gt;Runs&lt;/b&gt; — select one or more to compare</source>
        <translation>&lt;b&gt;Runs&lt;/b&gt; — selecteer er een of meer om te vergelijken</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Name</source>
        <translation>Naam</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Version</source>
        <translation>Versie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Made</source>
        <translation>Gemaakt</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Parameters</source>
        <translation>Parameters</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="188"/>
        <source>Spans</source>
        <translation>Fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="203"/>
        <source>What the runs are scored against: gold or one coder</source>
        <translation>Waartegen de runs worden gescoord: de gouden standaard of één codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="204"/>
        <source>&amp;Reference</source>
        <translation>&amp;Referentie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="207"/>
        <source>Strict — same boundaries and function</source>
        <translation>Strikt — dezelfde grenzen en functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="208"/>
        <source>Exact — same boundaries, any function</source>
        <translation>Exact — dezelfde grenzen, elke functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="209"/>
        <source>Partial — overlap counts half</source>
        <translation>Gedeeltelijk — overlap telt half</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="210"/>
        <source>Type — same function, any overlap</source>
        <translation>Type — dezelfde functie, elke overlap</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="214"/>
        <source>&amp;Matching</source>
        <translation>&amp;Vergelijkingswijze</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="217"/>
        <source>Sentence</source>
        <translation>Zin</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="218"/>
        <source>Paragraph</source>
        <translation>Alinea</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="219"/>
        <source>Token (word)</source>
        <translation>Token (woord)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="223"/>
        <source>The unit on which the run&apos;s alpha with the coders is computed</source>
        <translation>De eenheid waarop de alfa van de run met de codeurs wordt berekend</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="224"/>
        <source>&amp;Unit for alpha</source>
        <translation>&amp;Eenheid voor alfa</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Reference spans</source>
        <translation>Referentiefragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>Run spans</source>
        <translation>Fragmenten van de run</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="263"/>
        <source>False positives</source>
        <translation>Fout-positieven</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Misses</source>
        <translation>Gemiste</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Wrong function</source>
        <translation>Verkeerde functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="264"/>
        <source>Boundary</source>
        <translation>Grens</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="265"/>
        <source>Click a count to list those errors</source>
        <translation>Klik op een aantal om die fouten te tonen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="274"/>
        <source>All functions</source>
        <translation>Alle functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="279"/>
        <source>Every kind of error</source>
        <translation>Elk soort fout</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="284"/>
        <source>Article or text…</source>
        <translation>Artikel of tekst…</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="286"/>
        <source>&amp;Show</source>
        <translation>&amp;Tonen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="309"/>
        <source>Double-click or press Enter to open the passage</source>
        <translation>Dubbelklik of druk op Enter om de passage te openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="332"/>
        <source>Gold</source>
        <translation>Gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="338"/>
        <source>Coder %1</source>
        <translation>Codeur %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="376"/>
        <source>?</source>
        <translation>?</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="387"/>
        <source>This project has no extractor runs yet. Make one with “fourfold-cli extract”, or import an extractor&apos;s spans with it.</source>
        <translation>Dit project heeft nog geen extractorruns. Maak er een met ‘fourfold-cli extract’, of importeer er de fragmenten van een extractor mee.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="419"/>
        <source>No run selected.</source>
        <translation>Geen run geselecteerd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="423"/>
        <source>&lt;b&gt;%1&lt;/b&gt;, version %2, made %3, %4 spans&lt;br&gt;%5</source>
        <translation>&lt;b&gt;%1&lt;/b&gt;, versie %2, gemaakt %3, %4 fragmenten&lt;br&gt;%5</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="475"/>
        <source>Select a run to score.</source>
        <translation>Selecteer een run om te scoren.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="481"/>
        <source>Scoring %n run(s)…</source>
        <translation>
            <numerusform>%n run wordt gescoord…</numerusform>
            <numerusform>%n runs worden gescoord…</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="533"/>
        <source>gold</source>
        <translation>de gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="533"/>
        <source>coder %1</source>
        <translation>codeur %1</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="544"/>
        <source>%n article(s) with %1 scored.</source>
        <translation>
            <numerusform>%n artikel met %1 gescoord.</numerusform>
            <numerusform>%n artikelen met %1 gescoord.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="592"/>
        <source>Precision %1, recall %2 (95% bootstrap intervals)</source>
        <translation>Precisie %1, recall %2 (95%-bootstrapintervallen)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="611"/>
        <source>▼ below</source>
        <translation>▼ eronder</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="613"/>
        <source>● inside</source>
        <translation>● binnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="615"/>
        <source>▲ above</source>
        <translation>▲ erboven</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="617"/>
        <source>undefined</source>
        <translation>niet gedefinieerd</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="636"/>
        <source>Micro</source>
        <translation>Micro</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="638"/>
        <source>Macro</source>
        <translation>Macro</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="641"/>
        <source>%1: alpha on %n unit(s) (%2) with coders %3.</source>
        <translation>
            <numerusform>%1: alfa op %n eenheid (%2) met codeurs %3.</numerusform>
            <numerusform>%1: alfa op %n eenheden (%2) met codeurs %3.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="646"/>
        <source>%1: no band with the coders — %2</source>
        <translation>%1: geen band met de codeurs — %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="649"/>
        <source>Scored against %1, %2 matching; intervals from %n bootstrap replicate(s) over articles.</source>
        <translation>
            <numerusform>Gescoord tegen %1, vergelijkingswijze %2; intervallen uit %n bootstrapreplicatie over artikelen.</numerusform>
            <numerusform>Gescoord tegen %1, vergelijkingswijze %2; intervallen uit %n bootstrapreplicaties over artikelen.</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/extractor_window.cpp" line="666"/>
        <source>Errors of run &lt;b&gt;%1&lt;/b&gt; against %2 (%3 matching) on %n article(s). Double-click an error to see its passage.</source>
        <translation>
            <numerusform>Fouten van run &lt;b&gt;%1&lt;/b&gt; tegen %2 (vergelijkingswijze %3) in %n artikel. Dubbelklik op een fout om de passage te zien.</numerusform>
            <numerusform>Fouten van run &lt;b&gt;%1&lt;/b&gt; tegen %2 (vergelijkingswijze %3) in %n artikelen. Dubbelklik op een fout om de passage te zien.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="672"/>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="728"/>
        <source>No run scored.</source>
        <translation>Geen run gescoord.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="686"/>
        <source>All</source>
        <translation>Alle</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="716"/>
        <source>reference</source>
        <translation>referentie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="721"/>
        <source>None (false positive)</source>
        <translation>Geen (fout-positief)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="722"/>
        <source>None (miss)</source>
        <translation>Geen (gemist)</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="733"/>
        <source>Rows: the function %1 gives a span; columns: the function run &lt;b&gt;%2&lt;/b&gt; gives it (%3 matching). The diagonal is agreement on the function.</source>
        <translation>Rijen: de functie die %1 aan een fragment geeft; kolommen: de functie die run &lt;b&gt;%2&lt;/b&gt; eraan geeft (vergelijkingswijze %3). De diagonaal is overeenstemming over de functie.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="781"/>
        <source>%1 %2 → run %3: %4</source>
        <translation>%1 %2 → run %3: %4</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/extractor_window.cpp" line="787"/>
        <source>The run gives no matched span another function.</source>
        <translation>De run geeft geen enkel gekoppeld fragment een andere functie.</translation>
    </message>
</context>
<context>
    <name>fourfold::FrameCard</name>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="162"/>
        <source>Frame card</source>
        <translation>Framekaart</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="209"/>
        <source>— nothing coded yet</source>
        <translation>— nog niets gecodeerd</translation>
    </message>
    <message>
        <location filename="../app/desktop/frame_card.cpp" line="263"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="279"/>
        <source>%n span(s)</source>
        <translation>
            <numerusform>%n fragment</numerusform>
            <numerusform>%n fragmenten</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/frame_card.cpp" line="281"/>
        <source>%1: %n span(s)</source>
        <translation>
            <numerusform>%1: %n fragment</numerusform>
            <numerusform>%1: %n fragmenten</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::GoldSpanDialog</name>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="22"/>
        <source>Edit the gold span</source>
        <translation>Fragment van de gouden standaard bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="28"/>
        <source>&amp;Function:</source>
        <translation>&amp;Functie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="36"/>
        <source>&amp;Start (character):</source>
        <translation>&amp;Begin (teken):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="37"/>
        <source>&amp;End (character, not included):</source>
        <translation>&amp;Einde (teken, niet inbegrepen):</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="42"/>
        <source>Text:</source>
        <translation>Tekst:</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="44"/>
        <source>Decide gold span</source>
        <translation>Fragment voor de gouden standaard vastleggen</translation>
    </message>
    <message>
        <location filename="../app/desktop/compare/gold_span_dialog.cpp" line="70"/>
        <source>(The end must come after the start.)</source>
        <translation>(Het einde moet na het begin komen.)</translation>
    </message>
</context>
<context>
    <name>fourfold::ItemForm</name>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="29"/>
        <source>Article-level items</source>
        <translation>Items op artikelniveau</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="34"/>
        <source>The codebook asks no questions about the article as a whole.</source>
        <translation>Het codeboek stelt geen vragen over het artikel als geheel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/item_form.cpp" line="68"/>
        <source>not answered</source>
        <translation>niet beantwoord</translation>
    </message>
</context>
<context>
    <name>fourfold::LeadWindows</name>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="122"/>
        <source>Write the reliability report</source>
        <translation>Het betrouwbaarheidsrapport schrijven</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="123"/>
        <source>Web page (*.html);;PDF document (*.pdf)</source>
        <translation>Webpagina (*.html);;PDF-document (*.pdf)</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="130"/>
        <source>Reliability report</source>
        <translation>Betrouwbaarheidsrapport</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="134"/>
        <source>The reliability report was written to %1.</source>
        <translation>Het betrouwbaarheidsrapport is geschreven naar %1.</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="135"/>
        <source>&amp;Open</source>
        <translation>&amp;Openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="136"/>
        <location filename="../app/desktop/lead_windows.cpp" line="175"/>
        <source>Open the &amp;folder</source>
        <translation>De &amp;map openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="147"/>
        <location filename="../app/desktop/lead_windows.cpp" line="155"/>
        <location filename="../app/desktop/lead_windows.cpp" line="168"/>
        <source>Coder copy</source>
        <translation>Codeurskopie</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="156"/>
        <source>A coder copy holds only the articles assigned to this coder, the codebook and the coder&apos;s own codings. Whose copy?</source>
        <translation>Een codeurskopie bevat alleen de artikelen die aan deze codeur zijn toegewezen, het codeboek en de eigen coderingen van de codeur. Voor wie is de kopie?</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="162"/>
        <source>Write the coder copy</source>
        <translation>De codeurskopie schrijven</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="163"/>
        <location filename="../app/desktop/lead_windows.cpp" line="185"/>
        <source>Fourfold project (*.fourfold)</source>
        <translation>Fourfold-project (*.fourfold)</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="172"/>
        <source>Wrote %1 for %2: %n article(s), %3 span(s).</source>
        <translation>
            <numerusform>%1 geschreven voor %2: %n artikel, %3 fragment(en).</numerusform>
            <numerusform>%1 geschreven voor %2: %n artikelen, %3 fragment(en).</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="185"/>
        <source>Merge returned coder copies</source>
        <translation>Teruggekomen codeurskopieën samenvoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="190"/>
        <source>Merge coder copies</source>
        <translation>Codeurskopieën samenvoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="191"/>
        <source>Nothing was merged.

%1</source>
        <translation>Er is niets samengevoegd.

%1</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="198"/>
        <source>%1 (%2): already merged, nothing new.</source>
        <translation>%1 (%2): al samengevoegd, niets nieuws.</translation>
    </message>
    <message>
        <location filename="../app/desktop/lead_windows.cpp" line="200"/>
        <source>%1 (%2): %3 new, %4 changed (%5 deleted), %6 conflict(s).</source>
        <translation>%1 (%2): %3 nieuw, %4 gewijzigd (%5 verwijderd), %6 conflict(en).</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="208"/>
        <source>Merged %n copy(ies); %1 conflict(s) keep the project&apos;s version until you decide (fourfold-cli merge PROJECT --conflicts lists them).</source>
        <translation>
            <numerusform>%n kopie samengevoegd; %1 conflict(en) houden de versie van het project tot u beslist (fourfold-cli merge PROJECT --conflicts somt ze op).</numerusform>
            <numerusform>%n kopieën samengevoegd; %1 conflict(en) houden de versie van het project tot u beslist (fourfold-cli merge PROJECT --conflicts somt ze op).</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/lead_windows.cpp" line="212"/>
        <source>Merged %n copy(ies).</source>
        <translation>
            <numerusform>%n kopie samengevoegd.</numerusform>
            <numerusform>%n kopieën samengevoegd.</numerusform>
        </translation>
    </message>
</context>
<context>
    <name>fourfold::MainWindow</name>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="693"/>
        <source>Fourfold</source>
        <translation>Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="183"/>
        <source>Articles</source>
        <translation>Artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="104"/>
        <source>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Manual frame analysis of news and opinion articles: problem, cause, evaluation, remedy.&lt;/p&gt;</source>
        <translation>&lt;h1&gt;Fourfold&lt;/h1&gt;&lt;p&gt;Handmatige frame-analyse van nieuws- en opinieartikelen: probleem, oorzaak, evaluatie, oplossing.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="111"/>
        <source>Open a project…</source>
        <translation>Project openen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="114"/>
        <source>Open the sample project</source>
        <translation>Voorbeeldproject openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="116"/>
        <source>Invented demo data: three local controversies, three coders.</source>
        <translation>Verzonnen demogegevens: drie lokale kwesties, drie codeurs.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="122"/>
        <location filename="../app/desktop/main_window.cpp" line="135"/>
        <source>Recent projects</source>
        <translation>Recente projecten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="154"/>
        <source>Search the texts…</source>
        <translation>Zoeken in de teksten…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="156"/>
        <source>Search articles</source>
        <translation>Artikelen doorzoeken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="163"/>
        <source>Status filter</source>
        <translation>Statusfilter</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="164"/>
        <source>All articles</source>
        <translation>Alle artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="165"/>
        <source>Not started</source>
        <translation>Niet begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="166"/>
        <source>In progress</source>
        <translation>Bezig</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="167"/>
        <source>Done</source>
        <translation>Klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="225"/>
        <source>Mark the selected text as %1 (key %2)</source>
        <translation>De geselecteerde tekst markeren als %1 (toets %2)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="236"/>
        <source>Mark as done</source>
        <translation>Markeren als klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="237"/>
        <source>Mark this article as done and open the next one (Ctrl+Return)</source>
        <translation>Dit artikel markeren als klaar en het volgende openen (Ctrl+Return)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="305"/>
        <source>&amp;Project</source>
        <translation>&amp;Project</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="306"/>
        <source>&amp;New project…</source>
        <translation>&amp;Nieuw project…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="307"/>
        <source>&amp;Open…</source>
        <translation>&amp;Openen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="308"/>
        <source>&amp;Import articles…</source>
        <translation>Artikelen &amp;importeren…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="310"/>
        <source>Open the &amp;sample project</source>
        <translation>&amp;Voorbeeldproject openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="312"/>
        <source>&amp;Quit</source>
        <translation>&amp;Afsluiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="314"/>
        <source>&amp;Edit</source>
        <translation>&amp;Bewerken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="315"/>
        <location filename="../app/desktop/main_window.cpp" line="453"/>
        <source>&amp;Undo</source>
        <translation>&amp;Ongedaan maken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="318"/>
        <location filename="../app/desktop/main_window.cpp" line="456"/>
        <source>&amp;Redo</source>
        <translation>Opn&amp;ieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="322"/>
        <source>&amp;Code</source>
        <translation>&amp;Coderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="326"/>
        <source>Mark as %1	%2</source>
        <translation>Markeren als %1	%2</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="330"/>
        <source>Mark article as &amp;done</source>
        <translation>Artikel markeren als &amp;klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="332"/>
        <source>&amp;Next article</source>
        <translation>&amp;Volgend artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="335"/>
        <source>&amp;Find in texts</source>
        <translation>&amp;Zoeken in teksten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="336"/>
        <source>&amp;Training feedback…</source>
        <translation>&amp;Trainingsfeedback…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="343"/>
        <source>&amp;View</source>
        <translation>&amp;Weergave</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="344"/>
        <source>Show &amp;every coder&apos;s spans (leads only)</source>
        <translation>Fragmenten van &amp;alle codeurs tonen (alleen coördinatoren)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="354"/>
        <source>&amp;Lead</source>
        <translation>C&amp;oördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="355"/>
        <source>&amp;Compare and adjudicate…</source>
        <translation>&amp;Vergelijken en beslissen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="357"/>
        <source>&amp;Reliability…</source>
        <translation>&amp;Betrouwbaarheid…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="359"/>
        <source>Write the reliability &amp;report…</source>
        <translation>Betrouwbaarheids&amp;rapport schrijven…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="361"/>
        <source>&amp;Study design…</source>
        <translation>&amp;Onderzoeksopzet…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="362"/>
        <source>&amp;Progress…</source>
        <translation>Voort&amp;gang…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="363"/>
        <source>&amp;Hand out a coder copy…</source>
        <translation>Codeurs&amp;kopie uitdelen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="364"/>
        <source>&amp;Merge returned coder copies…</source>
        <translation>Teruggekomen codeurskopieën &amp;samenvoegen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="366"/>
        <source>&amp;Extractor runs…</source>
        <translation>&amp;Extractorruns…</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="370"/>
        <source>&amp;Settings</source>
        <translation>&amp;Instellingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="371"/>
        <source>&amp;Language</source>
        <translation>&amp;Taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="376"/>
        <source>System language</source>
        <translation>Systeemtaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="387"/>
        <source>&amp;Help</source>
        <translation>&amp;Help</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="389"/>
        <source>&amp;Keyboard shortcuts</source>
        <translation>&amp;Sneltoetsen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="406"/>
        <source>The project has no coder &quot;%1&quot;.</source>
        <translation>Het project heeft geen codeur ‘%1’.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="410"/>
        <source>Nobody was chosen to code.</source>
        <translation>Er is niemand gekozen om te coderen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="435"/>
        <source>Span</source>
        <translation>Fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="436"/>
        <source>Codebook</source>
        <translation>Codeboek</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="453"/>
        <source>&amp;Undo %1</source>
        <translation>&amp;Ongedaan maken: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="456"/>
        <source>&amp;Redo %1</source>
        <translation>Opn&amp;ieuw: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="599"/>
        <source>Every article in the list is done.</source>
        <translation>Alle artikelen in de lijst zijn klaar.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/main_window.cpp" line="621"/>
        <source>%n article(s) contain &quot;%1&quot;.</source>
        <translation>
            <numerusform>%n artikel bevat ‘%1’.</numerusform>
            <numerusform>%n artikelen bevatten ‘%1’.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="627"/>
        <source>New project</source>
        <translation>Nieuw project</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="637"/>
        <source>Cannot create project</source>
        <translation>Project kan niet worden aangemaakt</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="649"/>
        <source>Import articles</source>
        <translation>Artikelen importeren</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="650"/>
        <source>Articles (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv)</source>
        <translation>Artikelen (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="681"/>
        <source>The language changes when Fourfold starts again.</source>
        <translation>De taal verandert wanneer Fourfold opnieuw wordt gestart.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="694"/>
        <source>No project open</source>
        <translation>Geen project geopend</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="698"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="698"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="699"/>
        <source>%1 — coding as %2 (%3) — Fourfold</source>
        <translation>%1 — coderen als %2 (%3) — Fourfold</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="702"/>
        <source>Coding as %1 · %2 · lead: every article</source>
        <translation>Coderen als %1 · %2 · coördinator: alle artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="703"/>
        <source>Coding as %1 · %2 · blind: only your own spans</source>
        <translation>Coderen als %1 · %2 · blind: alleen je eigen fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="715"/>
        <source>Mark the selected text as %1 (snapped to whole words; hold Alt for the exact selection); with a span selected: relabel it</source>
        <translation>De geselecteerde tekst markeren als %1 (afgerond op hele woorden; houd Alt ingedrukt voor de exacte selectie); met een fragment geselecteerd: de functie ervan wijzigen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="719"/>
        <source>Delete</source>
        <translation>Delete</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="719"/>
        <source>Delete the selected span</source>
        <translation>Het geselecteerde fragment verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="721"/>
        <source>Undo the last change</source>
        <translation>De laatste wijziging ongedaan maken</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="722"/>
        <source>Redo</source>
        <translation>Opnieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="723"/>
        <source>Mark the article as done and open the next</source>
        <translation>Het artikel markeren als klaar en het volgende openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="724"/>
        <source>Next article that is not done</source>
        <translation>Volgend artikel dat nog niet klaar is</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="726"/>
        <source>Search the texts</source>
        <translation>Zoeken in de teksten</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="728"/>
        <source>Keyboard shortcuts</source>
        <translation>Sneltoetsen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="731"/>
        <source>Span resizing keys are listed in the reading desk&apos;s tooltip.</source>
        <translation>De toetsen om een fragment groter of kleiner te maken staan in de tooltip van het leesvenster.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="661"/>
        <source>Open project</source>
        <translation>Project openen</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="627"/>
        <location filename="../app/desktop/main_window.cpp" line="661"/>
        <source>Fourfold projects (*.fourfold)</source>
        <translation>Fourfold-projecten (*.fourfold)</translation>
    </message>
    <message>
        <location filename="../app/desktop/main_window.cpp" line="129"/>
        <location filename="../app/desktop/main_window.cpp" line="642"/>
        <location filename="../app/desktop/main_window.cpp" line="665"/>
        <location filename="../app/desktop/main_window.cpp" line="674"/>
        <source>Cannot open project</source>
        <translation>Project kan niet worden geopend</translation>
    </message>
</context>
<context>
    <name>fourfold::MessageBar</name>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="68"/>
        <source>Message</source>
        <translation>Melding</translation>
    </message>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="83"/>
        <source>&amp;Details</source>
        <translation>&amp;Details</translation>
    </message>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="89"/>
        <location filename="../app/desktop/message_bar.cpp" line="90"/>
        <source>Close the message</source>
        <translation>De melding sluiten</translation>
    </message>
    <message>
        <location filename="../app/desktop/message_bar.cpp" line="95"/>
        <source>Details of the message</source>
        <translation>Details van de melding</translation>
    </message>
</context>
<context>
    <name>fourfold::ProgressBoardWindow</name>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="63"/>
        <source>Progress — %1</source>
        <translation>Voortgang — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="73"/>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Phase</source>
        <translation>Fase</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="74"/>
        <source>All phases</source>
        <translation>Alle fasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="77"/>
        <source>Show:</source>
        <translation>Tonen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="79"/>
        <source>Reload</source>
        <translation>Opnieuw laden</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <source>Coder</source>
        <translation>Codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <source>Assigned</source>
        <translation>Toegewezen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <source>Started</source>
        <translation>Begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="83"/>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="180"/>
        <source>Done</source>
        <translation>Klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Agreement so far (α)</source>
        <translation>Overeenstemming (α)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Compared articles</source>
        <translation>Vergeleken artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="84"/>
        <source>Active time</source>
        <translation>Actieve tijd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="87"/>
        <source>Krippendorff&apos;s alpha on the articles the coder finished: in training with the lead&apos;s master coding, in the other phases the mean over every coder who finished the same articles. ✓ at .800 or more, ~ from .667 (tentative), ✗ below.</source>
        <translation>Krippendorffs alfa over de artikelen die de codeur heeft afgerond: in de training met de mastercodering van de coördinator, in de andere fasen het gemiddelde over alle codeurs die dezelfde artikelen hebben afgerond. ✓ bij .800 of hoger, ~ vanaf .667 (voorlopig), ✗ daaronder.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="94"/>
        <source>Effort</source>
        <translation>Tijdsbesteding</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Articles done</source>
        <translation>Afgeronde artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="96"/>
        <source>Active time, all coders</source>
        <translation>Actieve tijd, alle codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="97"/>
        <source>Mean per done article</source>
        <translation>Gemiddelde per afgerond artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="102"/>
        <source>Show active time per coder</source>
        <translation>Actieve tijd per codeur tonen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="106"/>
        <source>Off by default: time is shown only summed over all coders. Recording and showing how long each person works can count as monitoring employees, which may need the coders&apos; agreement or a works council&apos;s consent. Turn it on only if your study has that agreement; the change is written to the project&apos;s log. Only a lead can switch it.</source>
        <translation>Standaard uit: tijd wordt alleen opgeteld over alle codeurs getoond. Vastleggen en tonen hoe lang iedere persoon werkt, kan gelden als het monitoren van werknemers, waarvoor de instemming van de codeurs of van een ondernemingsraad nodig kan zijn. Zet dit alleen aan als je onderzoek die instemming heeft; de wijziging wordt in het logboek van het project geschreven. Alleen een coördinator kan dit omzetten.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="179"/>
        <source>%1 of %2</source>
        <translation>%1 van %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="229"/>
        <source>&lt;b&gt;No assignments yet.&lt;/b&gt; Plan them in the study design window.</source>
        <translation>&lt;b&gt;Nog geen toewijzingen.&lt;/b&gt; Plan ze in het venster Onderzoeksopzet.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/progress_board_window.cpp" line="230"/>
        <source>&lt;b&gt;%1 of %2 assignments done&lt;/b&gt; · %3 of active coding time in all.</source>
        <translation>&lt;b&gt;%1 van %2 toewijzingen klaar&lt;/b&gt; · %3 actieve codeertijd in totaal.</translation>
    </message>
</context>
<context>
    <name>fourfold::ReadingView</name>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="60"/>
        <source>intro</source>
        <translation>inleiding</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="62"/>
        <source>body</source>
        <translation>kern</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="64"/>
        <source>conclusion</source>
        <translation>slot</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="89"/>
        <source>Article text</source>
        <translation>Artikeltekst</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="633"/>
        <source>Mark as %1</source>
        <translation>Markeren als %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="634"/>
        <source>Change to %1</source>
        <translation>Wijzigen in %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="639"/>
        <source>Delete span</source>
        <translation>Fragment verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="665"/>
        <source>%1: “%2”</source>
        <translation>%1: ‘%2’</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reading_view.cpp" line="894"/>
        <source>%n span(s). Select text and press 1 to 4 to mark a framing function; Alt+Down and Alt+Up move between spans.</source>
        <translation>
            <numerusform>%n fragment. Selecteer tekst en druk op 1 tot en met 4 om een framingfunctie te markeren; met Alt+Pijl-omlaag en Alt+Pijl-omhoog ga je van fragment naar fragment.</numerusform>
            <numerusform>%n fragmenten. Selecteer tekst en druk op 1 tot en met 4 om een framingfunctie te markeren; met Alt+Pijl-omlaag en Alt+Pijl-omhoog ga je van fragment naar fragment.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reading_view.cpp" line="903"/>
        <source>Selected span: %1, “%2”. Press 1 to 4 to relabel, Delete to delete, Alt+Left/Right and Alt+Shift+Left/Right to resize.</source>
        <translation>Geselecteerd fragment: %1, ‘%2’. Druk op 1 tot en met 4 om de functie te wijzigen, op Delete om het te verwijderen, en op Alt+Links/Rechts en Alt+Shift+Links/Rechts om het groter of kleiner te maken.</translation>
    </message>
</context>
<context>
    <name>fourfold::ReliabilityWindow</name>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="115"/>
        <source>0.800: rely on the variable</source>
        <translation>0.800: op de variabele vertrouwen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="116"/>
        <source>0.667: tentative conclusions only</source>
        <translation>0.667: alleen voorlopige conclusies</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="156"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="575"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="678"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="722"/>
        <source>undefined</source>
        <translation>niet gedefinieerd</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="158"/>
        <source>reliable (≥ 0.800)</source>
        <translation>betrouwbaar (≥ 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="160"/>
        <source>tentative (≥ 0.667)</source>
        <translation>voorlopig (≥ 0.667)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="164"/>
        <source>unreliable (&lt; 0.667)</source>
        <translation>onbetrouwbaar (&lt; 0.667)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="174"/>
        <source>Reliability — %1</source>
        <translation>Betrouwbaarheid — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="212"/>
        <source>Table</source>
        <translation>Tabel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="226"/>
        <source>Alpha without each coder</source>
        <translation>Alfa zonder elke codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="229"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="707"/>
        <source>Alpha without each article (the costliest first)</source>
        <translation>Alfa zonder elk artikel (het duurste eerst)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="233"/>
        <source>Change = alpha without it − alpha with everything: positive means leaving it out raises alpha, so it costs reliability (leave-one-out, common practice). A diagnostic for training and codebook work, not a licence to report the higher figure.</source>
        <translation>Verandering = alfa zonder − alfa met alles: positief betekent dat weglaten de alfa verhoogt, het kost dus betrouwbaarheid (leave-one-out, gangbare praktijk). Een diagnose voor training en codeboekwerk, geen vrijbrief om het hogere cijfer te rapporteren.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="238"/>
        <source>Boundary habits on matched spans</source>
        <translation>Grensgewoonten bij gekoppelde fragmenten</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="241"/>
        <source>Each span against the other coder&apos;s span of the same function that overlaps it most; differences are this coder&apos;s minus the other&apos;s, in characters (code points). Systematic: the mean differs from 0 by more than two standard errors over at least 5 matches (a rough screen, common practice).</source>
        <translation>Elk fragment tegenover het fragment van de andere codeur met dezelfde functie dat het het meest overlapt; verschillen zijn die van deze codeur min die van de ander, in tekens (codepunten). Systematisch: het gemiddelde wijkt meer dan twee standaardfouten van 0 af over ten minste 5 koppelingen (een ruwe screening, gangbare praktijk).</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="248"/>
        <source>Diagnostics</source>
        <translation>Diagnose</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="253"/>
        <source>Alpha per function</source>
        <translation>Alfa per functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="255"/>
        <source>Coder pairs</source>
        <translation>Codeursparen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="257"/>
        <source>Function confusion</source>
        <translation>Functieverwarring</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="260"/>
        <source>Alpha over time</source>
        <translation>Alfa door de tijd</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="285"/>
        <source>Article item</source>
        <translation>Artikelitem</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="286"/>
        <source>Paragraph</source>
        <translation>Alinea</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="287"/>
        <source>Sentence</source>
        <translation>Zin</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="288"/>
        <source>Token (word)</source>
        <translation>Token (woord)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="289"/>
        <source>Continuum (spans, unitizing alpha)</source>
        <translation>Continuüm (fragmenten, unitizing-alfa)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="294"/>
        <source>&amp;Unit</source>
        <translation>&amp;Eenheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="300"/>
        <source>&amp;Item</source>
        <translation>&amp;Item</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="316"/>
        <source>Functions</source>
        <translation>Functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="335"/>
        <source>&amp;Coders</source>
        <translation>&amp;Codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="338"/>
        <source>All phases</source>
        <translation>Alle fasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="342"/>
        <source>&amp;Phase</source>
        <translation>&amp;Fase</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="344"/>
        <source>Gold joins as a coder</source>
        <translation>Gouden standaard als codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="346"/>
        <source>Count articles in progress</source>
        <translation>Artikelen in bewerking meetellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="347"/>
        <source>By default a coder&apos;s article counts only once the coder has marked it done; tick to count articles still in progress too.</source>
        <translation>Standaard telt een artikel van een codeur pas mee als de codeur het als klaar gemarkeerd heeft; vink aan om ook artikelen in bewerking mee te tellen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="355"/>
        <source>none</source>
        <translation>geen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="356"/>
        <source>&amp;Bootstrap</source>
        <translation>&amp;Bootstrap</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="359"/>
        <source>Batches of articles</source>
        <translation>Groepen artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="360"/>
        <source>Weeks</source>
        <translation>Weken</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="361"/>
        <source>&amp;Drift by</source>
        <translation>&amp;Drift per</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="365"/>
        <source> articles</source>
        <translation> artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="366"/>
        <source>Batch &amp;size</source>
        <translation>Groeps&amp;grootte</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="368"/>
        <source>Co&amp;mpute</source>
        <translation>Be&amp;rekenen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="370"/>
        <source>Cancel</source>
        <translation>Annuleren</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="478"/>
        <source>Computing…</source>
        <translation>Bezig met berekenen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="488"/>
        <source>Cancelling after the current step…</source>
        <translation>Annuleren na de huidige stap…</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="505"/>
        <source>Cancelled; the results shown are from before.</source>
        <translation>Geannuleerd; de getoonde resultaten zijn van eerder.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="510"/>
        <source>%n coder(s) compared.</source>
        <translation>
            <numerusform>%n codeur vergeleken.</numerusform>
            <numerusform>%n codeurs vergeleken.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="525"/>
        <source>Chosen functions (sets)</source>
        <translation>Functieverzameling</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="544"/>
        <source>Alpha</source>
        <translation>Alfa</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="201"/>
        <source>Alpha: Krippendorff&apos;s alpha, coincidence form (Krippendorff 2011). Interval: 95% bootstrap, units resampled (percentile; the pair interval of Hayes &amp; Krippendorff 2007 is in the report, and it is too narrow with more than two coders); q(α &lt; 0.800): share of replicates below 0.800. Verdict: Krippendorff (2004, §12.2). Minimum values: Krippendorff (2004, §11.4) after Bloch &amp; Kraemer (1989), for the rarest value at p = 0.05. Cohen&apos;s kappa per pair over the units both coded (Cohen 1960); Fleiss&apos; kappa (Fleiss 1971) needs every coder on every unit.</source>
        <translation>Alfa: Krippendorffs alfa, coïncidentievorm (Krippendorff 2011). Interval: 95%-bootstrap, eenheden opnieuw getrokken (percentiel; het paarinterval van Hayes &amp; Krippendorff 2007 staat in het rapport en is te smal bij meer dan twee codeurs); q(α &lt; 0.800): aandeel replicaties onder 0.800. Oordeel: Krippendorff (2004, §12.2). Benodigde waarden: Krippendorff (2004, §11.4) naar Bloch &amp; Kraemer (1989), voor de zeldzaamste waarde bij p = 0.05. Cohens kappa per paar over de eenheden die beide codeerden (Cohen 1960); Fleiss&apos; kappa (Fleiss 1971) vereist elke codeur op elke eenheid.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="544"/>
        <source>q(α &lt; 0.800)</source>
        <translation>q(α &lt; 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="544"/>
        <source>95% interval (units resampled)</source>
        <translation>95%-interval (eenheden opnieuw getrokken)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="545"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="663"/>
        <source>Verdict</source>
        <translation>Oordeel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="545"/>
        <source>Percent agreement</source>
        <translation>Procentuele overeenstemming</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="545"/>
        <source>Fleiss&apos; kappa</source>
        <translation>Fleiss&apos; kappa</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="549"/>
        <source>Cohen&apos;s kappa %1 × %2</source>
        <translation>Cohens kappa %1 × %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="551"/>
        <source>Pairable values</source>
        <translation>Paarbare waarden</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="551"/>
        <source>Pairable units</source>
        <translation>Paarbare eenheden</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="551"/>
        <source>Rarest value</source>
        <translation>Zeldzaamste waarde</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="552"/>
        <source>Minimum values (α ≥ 0.800)</source>
        <translation>Benodigde waarden (α ≥ 0.800)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="552"/>
        <source>Sample</source>
        <translation>Steekproef</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="557"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="667"/>
        <source>Statistic</source>
        <translation>Statistiek</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="583"/>
        <source>%1, %2 replicates, seed %3</source>
        <translation>%1, %2 replicaties, seed %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="609"/>
        <source>Fleiss&apos; kappa needs every coder on every unit; some cells are missing.</source>
        <translation>Fleiss&apos; kappa vereist elke codeur op elke eenheid; er ontbreken cellen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="627"/>
        <source>below the minimum</source>
        <translation>onder het minimum</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="628"/>
        <source>large enough</source>
        <translation>groot genoeg</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="644"/>
        <source>The sample is smaller than Krippendorff&apos;s minimum for the rarest value (alpha ≥ 0.800 at p = 0.05) in: %1. Code more units before relying on these figures.</source>
        <translation>De steekproef is kleiner dan Krippendorffs minimum voor de zeldzaamste waarde (alfa ≥ 0.800 bij p = 0.05) in: %1. Codeer meer eenheden voordat je op deze cijfers vertrouwt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="663"/>
        <source>Unitizing alpha</source>
        <translation>Unitizing-alfa</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="663"/>
        <source>Observed disagreement D_o</source>
        <translation>Waargenomen onenigheid D_o</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="664"/>
        <source>Expected disagreement D_e</source>
        <translation>Verwachte onenigheid D_e</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="664"/>
        <source>Continuum</source>
        <translation>Continuüm</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="669"/>
        <source>All four, pooled</source>
        <translation>Alle vier, samengenomen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="686"/>
        <source>%1 articles, %2 characters</source>
        <translation>%1 artikelen, %2 tekens</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="704"/>
        <source>Alpha without each article: the %1 costliest of %2</source>
        <translation>Alfa zonder elk artikel: de %1 duurste van %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="709"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="709"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="739"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="892"/>
        <source>Coder</source>
        <translation>Codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="711"/>
        <source>Title</source>
        <translation>Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="712"/>
        <source>Alpha without</source>
        <translation>Alfa zonder</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="712"/>
        <source>Change</source>
        <translation>Verandering</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="712"/>
        <source>Units</source>
        <translation>Eenheden</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="739"/>
        <source>Matches</source>
        <translation>Koppelingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="739"/>
        <source>Length ± SE</source>
        <translation>Lengte ± SE</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="739"/>
        <source>Start</source>
        <translation>Begin</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="740"/>
        <source>End</source>
        <translation>Einde</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="740"/>
        <source>Longer</source>
        <translation>Langer</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="740"/>
        <source>Shorter</source>
        <translation>Korter</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="740"/>
        <source>Habit</source>
        <translation>Gewoonte</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="762"/>
        <source>spans systematically longer</source>
        <translation>fragmenten systematisch langer</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="763"/>
        <source>spans systematically shorter</source>
        <translation>fragmenten systematisch korter</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="776"/>
        <source>Alpha per function, with 95% bootstrap intervals</source>
        <translation>Alfa per functie, met 95%-bootstrapintervallen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="780"/>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="943"/>
        <source>Krippendorff&apos;s alpha</source>
        <translation>Krippendorffs alfa</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="800"/>
        <source>pooled</source>
        <translation>samengenomen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="884"/>
        <source>Cohen&apos;s kappa of each pair of coders over the units both coded (%1). Darker: higher agreement; hatched: not defined.</source>
        <translation>Cohens kappa van elk paar codeurs over de eenheden die beide codeerden (%1). Donkerder: hogere overeenstemming; gearceerd: niet gedefinieerd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="889"/>
        <source>Continuum units have no per-pair kappa; see the span agreement in the function confusion.</source>
        <translation>Continuümeenheden hebben geen kappa per paar; zie de overeenstemming van fragmenten in de functieverwarring.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="906"/>
        <source>nothing</source>
        <translation>niets</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="925"/>
        <source>A coder&apos;s span</source>
        <translation>Fragment van een codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="925"/>
        <source>What another coder gave it</source>
        <translation>Wat een andere codeur eraan gaf</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="926"/>
        <source>Each span of each coder against the best-overlapping span of every other coder (both directions of each pair). Darker: a larger share of the row. &quot;nothing&quot;: no overlapping span.</source>
        <translation>Elk fragment van elke codeur tegenover het best overlappende fragment van elke andere codeur (beide richtingen van elk paar). Donkerder: een groter deel van de rij. ‘niets’: geen overlappend fragment.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="938"/>
        <source>Alpha by week of first coding — %1</source>
        <translation>Alfa per week van eerste codering — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="939"/>
        <source>Alpha by batch of articles, in coding order — %1</source>
        <translation>Alfa per groep artikelen, in codeervolgorde — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="979"/>
        <source>ISO week</source>
        <translation>ISO-week</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/reliability_window.cpp" line="979"/>
        <source>articles (in coding order)</source>
        <translation>artikelen (in codeervolgorde)</translation>
    </message>
</context>
<context>
    <name>fourfold::ReportOptionsDialog</name>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="22"/>
        <source>Reliability report</source>
        <translation>Betrouwbaarheidsrapport</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="26"/>
        <source>Paragraph</source>
        <translation>Alinea</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="27"/>
        <source>Sentence</source>
        <translation>Zin</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="28"/>
        <source>Token (word)</source>
        <translation>Token (woord)</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="30"/>
        <source>&amp;Unit of the functions</source>
        <translation>&amp;Eenheid van de functies</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="33"/>
        <source>All phases</source>
        <translation>Alle fasen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="36"/>
        <source>&amp;Phase</source>
        <translation>&amp;Fase</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="54"/>
        <source>&amp;Coders</source>
        <translation>&amp;Codeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="60"/>
        <source>none</source>
        <translation>geen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="61"/>
        <source> replicates</source>
        <translation> replicaties</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="62"/>
        <source>&amp;Bootstrap</source>
        <translation>&amp;Bootstrap</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="66"/>
        <source>S&amp;eed</source>
        <translation>Z&amp;aad</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="68"/>
        <source>Count articles in progress</source>
        <translation>Artikelen in bewerking meetellen</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="69"/>
        <source>By default a coder&apos;s article counts only once the coder has marked it done; tick to count articles still in progress too.</source>
        <translation>Standaard telt een artikel van een codeur pas mee als de codeur het als klaar gemarkeerd heeft; vink aan om ook artikelen in bewerking mee te tellen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="74"/>
        <source>Reliability report: %1</source>
        <translation>Betrouwbaarheidsrapport: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="75"/>
        <source>&amp;Title</source>
        <translation>&amp;Titel</translation>
    </message>
    <message>
        <location filename="../app/desktop/reliability/report_options_dialog.cpp" line="78"/>
        <source>&amp;Write…</source>
        <translation>&amp;Schrijven…</translation>
    </message>
</context>
<context>
    <name>fourfold::RunErrorModel</name>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="75"/>
        <source>Correct</source>
        <translation>Correct</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="77"/>
        <source>False positive</source>
        <translation>Fout-positief</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="79"/>
        <source>Miss</source>
        <translation>Gemist</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="81"/>
        <source>Wrong function</source>
        <translation>Verkeerde functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="83"/>
        <source>Boundary</source>
        <translation>Grens</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="106"/>
        <source>%1 [%2, %3) “%4”</source>
        <translation>%1 [%2, %3) ‘%4’</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="117"/>
        <source>%1 → %2</source>
        <translation>%1 → %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="125"/>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="127"/>
        <source>—</source>
        <translation>—</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="152"/>
        <source>Function</source>
        <translation>Functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="154"/>
        <source>Kind</source>
        <translation>Soort</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="156"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="159"/>
        <source>Span of %1</source>
        <translation>Fragment van %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="160"/>
        <source>Gold span</source>
        <translation>Fragment gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_error_model.cpp" line="162"/>
        <source>Run span</source>
        <translation>Fragment van de run</translation>
    </message>
</context>
<context>
    <name>fourfold::RunPassageWindow</name>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="25"/>
        <source>Passage</source>
        <translation>Passage</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="31"/>
        <source>◀ &amp;Previous error</source>
        <translation>◀ Vo&amp;rige fout</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="34"/>
        <source>&amp;Next error ▶</source>
        <translation>&amp;Volgende fout ▶</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="73"/>
        <source>%1 — %2 against %3</source>
        <translation>%1 — %2 tegen %3</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="75"/>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="160"/>
        <source>gold</source>
        <translation>de gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="96"/>
        <source>Gold</source>
        <translation>Gouden standaard</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="97"/>
        <source>Coder %1</source>
        <translation>Codeur %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="100"/>
        <source>Run %1</source>
        <translation>Run %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="147"/>
        <source>No error of the run on this article.</source>
        <translation>Geen fout van de run in dit artikel.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="161"/>
        <source>coder %1</source>
        <translation>codeur %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="170"/>
        <source>&lt;b&gt;False positive.&lt;/b&gt; The run marks “%1” as %2; %3 has no span there.</source>
        <translation>&lt;b&gt;Fout-positief.&lt;/b&gt; De run markeert ‘%1’ als %2; %3 heeft daar geen fragment.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="173"/>
        <source>&lt;b&gt;Miss.&lt;/b&gt; %1 marks “%2” as %3; the run has no span there.</source>
        <translation>&lt;b&gt;Gemist.&lt;/b&gt; %1 markeert ‘%2’ als %3; de run heeft daar geen fragment.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="177"/>
        <source>&lt;b&gt;Wrong function.&lt;/b&gt; %1 marks “%2” as %3; the run marks “%4” as %5.</source>
        <translation>&lt;b&gt;Verkeerde functie.&lt;/b&gt; %1 markeert ‘%2’ als %3; de run markeert ‘%4’ als %5.</translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="186"/>
        <source>at the same place</source>
        <translation>op dezelfde plaats</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="187"/>
        <source>%n character(s) earlier</source>
        <translation>
            <numerusform>%n teken eerder</numerusform>
            <numerusform>%n tekens eerder</numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="188"/>
        <source>%n character(s) later</source>
        <translation>
            <numerusform>%n teken later</numerusform>
            <numerusform>%n tekens later</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/runs/run_passage_window.cpp" line="193"/>
        <source>&lt;b&gt;Boundary.&lt;/b&gt; Both mark %1 here. Compared with the span of %2, the run&apos;s starts %3 and ends %4.&lt;br&gt;%5: “%6” %7&lt;br&gt;Run: “%8” %9</source>
        <translation>&lt;b&gt;Grens.&lt;/b&gt; Beide markeren hier %1. Vergeleken met het fragment van %2 begint dat van de run %3 en eindigt het %4.&lt;br&gt;%5: ‘%6’ %7&lt;br&gt;Run: ‘%8’ %9</translation>
    </message>
</context>
<context>
    <name>fourfold::SpanEditor</name>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="90"/>
        <source>judges</source>
        <translation>beoordeelt</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="90"/>
        <source>judged by</source>
        <translation>beoordeeld door</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="92"/>
        <source>addresses</source>
        <translation>behandelt</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="92"/>
        <source>addressed by</source>
        <translation>behandeld door</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="93"/>
        <source>%1 →</source>
        <translation>%1 →</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="93"/>
        <source>← %1</source>
        <translation>← %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="102"/>
        <source>Span editor</source>
        <translation>Fragmenteditor</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="108"/>
        <source>No span selected.

Click a span in the text or on the frame card to edit it, or select text and press 1–4 to code it.</source>
        <translation>Geen fragment geselecteerd.

Klik op een fragment in de tekst of op de framekaart om het te bewerken, of selecteer tekst en druk op 1&#xa0;tot&#xa0;en&#xa0;met&#xa0;4 om die te coderen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="174"/>
        <source>Another coder&apos;s span: shown, not editable.</source>
        <translation>Fragment van een andere codeur: zichtbaar, niet bewerkbaar.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="191"/>
        <source>Function: %1</source>
        <translation>Functie: %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="195"/>
        <source>&amp;Function:</source>
        <translation>&amp;Functie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="202"/>
        <source>Note</source>
        <translation>Notitie</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="206"/>
        <source>&amp;Note:</source>
        <translation>&amp;Notitie:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="211"/>
        <source>Confidence</source>
        <translation>Zekerheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="215"/>
        <location filename="../app/desktop/span_editor.cpp" line="362"/>
        <location filename="../app/desktop/span_editor.cpp" line="370"/>
        <source>not set</source>
        <translation>niet opgegeven</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="218"/>
        <source>How sure you are of this span, from 0 (a guess) to 1 (certain).</source>
        <translation>Hoe zeker je bent van dit fragment, van 0 (een gok) tot 1 (zeker).</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="219"/>
        <source>&amp;Confidence:</source>
        <translation>&amp;Zekerheid:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="228"/>
        <source>Links</source>
        <translation>Koppelingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="230"/>
        <source>Links start from an evaluation (to the cause it judges) or from a remedy (to the problem it addresses).</source>
        <translation>Koppelingen beginnen bij een evaluatie (naar de oorzaak die ze beoordeelt) of bij een oplossing (naar het probleem dat ze behandelt).</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="240"/>
        <source>Span to link to</source>
        <translation>Fragment om aan te koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="244"/>
        <source>&amp;Link</source>
        <translation>&amp;Koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="245"/>
        <source>Link to the chosen span</source>
        <translation>Koppelen aan het gekozen fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="257"/>
        <source>Links of this span</source>
        <translation>Koppelingen van dit fragment</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="265"/>
        <source>No links yet.</source>
        <translation>Nog geen koppelingen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="268"/>
        <source>&amp;Remove link</source>
        <translation>Koppeling &amp;verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="269"/>
        <source>Remove the chosen link</source>
        <translation>De gekozen koppeling verwijderen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="377"/>
        <source>%1:</source>
        <translation>%1:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="417"/>
        <source>No note.</source>
        <translation>Geen notitie.</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="417"/>
        <source>Why this span, doubts, a question for the lead…</source>
        <translation>Waarom dit fragment, twijfels, een vraag voor de coördinator…</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="435"/>
        <source>&amp;Judges:</source>
        <translation>Be&amp;oordeelt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="435"/>
        <source>&amp;Addresses:</source>
        <translation>Behan&amp;delt:</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="437"/>
        <source>no cause span to link</source>
        <translation>geen oorzaakfragment om te koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="437"/>
        <source>no problem span to link</source>
        <translation>geen probleemfragment om te koppelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="467"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="483"/>
        <source>a span not shown here</source>
        <translation>een fragment dat hier niet wordt getoond</translation>
    </message>
    <message>
        <location filename="../app/desktop/span_editor.cpp" line="484"/>
        <source>%1 %2</source>
        <translation>%1 %2</translation>
    </message>
</context>
<context>
    <name>fourfold::StudyDesignWindow</name>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="111"/>
        <source>Study design — %1</source>
        <translation>Onderzoeksopzet — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="113"/>
        <source>Plan who codes what: draw the reliability sample that every reliability coder codes, deal the rest of the articles, and keep the codebook&apos;s versions in view. Nothing is written until you commit a plan.</source>
        <translation>Plan wie wat codeert: trek de betrouwbaarheidssteekproef die elke betrouwbaarheidscodeur codeert, verdeel de overige artikelen en houd de versies van het codeboek in het oog. Er wordt niets weggeschreven totdat je een plan vastlegt.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="122"/>
        <source>Reliability sample</source>
        <translation>Betrouwbaarheidssteekproef</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="123"/>
        <source>Assign the rest</source>
        <translation>De rest toewijzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="124"/>
        <source>Assignments</source>
        <translation>Toewijzingen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="125"/>
        <source>Codebook versions</source>
        <translation>Codeboekversies</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="160"/>
        <source>lead</source>
        <translation>coördinator</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="160"/>
        <source>coder</source>
        <translation>codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="190"/>
        <source>The seed must be a whole number from 0 to 18446744073709551615; &quot;%1&quot; is not.</source>
        <translation>De seed moet een geheel getal van 0 tot 18446744073709551615 zijn; ‘%1’ is dat niet.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="210"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="308"/>
        <source>Draw</source>
        <translation>Trekken</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="216"/>
        <source>A pilot sample is coded before the codebook is final and is not part of the reliability sample.</source>
        <translation>Een pilotsteekproef wordt gecodeerd voordat het codeboek definitief is en hoort niet bij de betrouwbaarheidssteekproef.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="218"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="739"/>
        <source>Phase:</source>
        <translation>Fase:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="223"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="741"/>
        <source>Articles:</source>
        <translation>Artikelen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="225"/>
        <source>Share of the frame:</source>
        <translation>Aandeel van het steekproefkader:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="245"/>
        <source>Size:</source>
        <translation>Omvang:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="249"/>
        <source>Simple random sample</source>
        <translation>Enkelvoudige aselecte steekproef</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="250"/>
        <source>Stratified by outlet</source>
        <translation>Gestratificeerd naar medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="251"/>
        <source>Stratified by language</source>
        <translation>Gestratificeerd naar taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="252"/>
        <source>Stratified by topic</source>
        <translation>Gestratificeerd naar onderwerp</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="253"/>
        <source>Stratified draws allocate the sample to each group in proportion to its size in the frame.</source>
        <translation>Bij gestratificeerde trekkingen krijgt elke groep een deel van de steekproef naar verhouding van haar omvang in het kader.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="255"/>
        <source>Method:</source>
        <translation>Methode:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="262"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="580"/>
        <source>Seed</source>
        <translation>Seed</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="264"/>
        <source>New seed</source>
        <translation>Nieuwe seed</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="269"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="582"/>
        <source>Seed:</source>
        <translation>Seed:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="270"/>
        <source>The seed is recorded with the draw: the same seed on the same project draws the same articles on any computer.</source>
        <translation>De seed wordt bij de trekking vastgelegd: dezelfde seed op hetzelfde project trekt op elke computer dezelfde artikelen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="276"/>
        <source>Reliability coders</source>
        <translation>Betrouwbaarheidscodeurs</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="278"/>
        <source>Coded by all of:</source>
        <translation>Gecodeerd door allen van:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="280"/>
        <source>Minimum sample (Krippendorff)</source>
        <translation>Minimale steekproef (Krippendorff)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="288"/>
        <source>The smallest alpha you would still accept: .800 for firm conclusions, .667 for tentative ones (Krippendorff).</source>
        <translation>De kleinste alfa die je nog zou accepteren: .800 voor stellige conclusies, .667 voor voorlopige (Krippendorff).</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="290"/>
        <source>α_min:</source>
        <translation>α_min:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="295"/>
        <source>Significance level:</source>
        <translation>Significantieniveau:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="302"/>
        <source>The expected share of the rarest value: 0.25 when four values are equally frequent.</source>
        <translation>Het verwachte aandeel van de zeldzaamste waarde: 0.25 als vier waarden even vaak voorkomen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="304"/>
        <source>Rarest value&apos;s share:</source>
        <translation>Aandeel zeldzaamste waarde:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="310"/>
        <source>Draw the sample and show it; nothing is written yet.</source>
        <translation>De steekproef trekken en tonen; er wordt nog niets weggeschreven.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="311"/>
        <source>Commit the draw</source>
        <translation>Trekking vastleggen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="313"/>
        <source>Assign the drawn articles to every chosen coder and record the draw with its seed.</source>
        <translation>De getrokken artikelen aan elke gekozen codeur toewijzen en de trekking met haar seed vastleggen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="342"/>
        <source>Stratum</source>
        <translation>Stratum</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="342"/>
        <source>In the frame</source>
        <translation>In het kader</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="342"/>
        <source>Drawn</source>
        <translation>Getrokken</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="344"/>
        <source>Drawn articles:</source>
        <translation>Getrokken artikelen:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="347"/>
        <source>Drawn articles</source>
        <translation>Getrokken artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="401"/>
        <source>&lt;b&gt;No sample is drawn yet for the phase %1.&lt;/b&gt; Choose the size, method, seed and coders, then press &lt;i&gt;Draw&lt;/i&gt; to see the sample and whether it is large enough.</source>
        <translation>&lt;b&gt;Er is nog geen steekproef voor de fase %1 getrokken.&lt;/b&gt; Kies de omvang, methode, seed en codeurs en druk dan op &lt;i&gt;Trekken&lt;/i&gt; om de steekproef te zien en of die groot genoeg is.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="460"/>
        <source>simple random sample</source>
        <translation>enkelvoudige aselecte steekproef</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="462"/>
        <source>stratified by outlet</source>
        <translation>gestratificeerd naar medium</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="464"/>
        <source>stratified by language</source>
        <translation>gestratificeerd naar taal</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="466"/>
        <source>stratified by topic</source>
        <translation>gestratificeerd naar onderwerp</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="467"/>
        <source>%n article(s) of a frame of %1, %2, seed %3, coded by %4.</source>
        <translation>
            <numerusform>%n artikel uit een kader van %1, %2, seed %3, gecodeerd door %4.</numerusform>
            <numerusform>%n artikelen uit een kader van %1, %2, seed %3, gecodeerd door %4.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="475"/>
        <source>&lt;b&gt;%1 sample drawn on %2.&lt;/b&gt; %3 The draw is recorded and cannot be drawn again.</source>
        <translation>&lt;b&gt;Steekproef voor fase %1 getrokken op %2.&lt;/b&gt; %3 De trekking is vastgelegd en kan niet opnieuw worden getrokken.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="481"/>
        <source>&lt;b&gt;Planned draw, not yet committed.&lt;/b&gt; %1 Press &lt;i&gt;Commit the draw&lt;/i&gt; to assign it.</source>
        <translation>&lt;b&gt;Geplande trekking, nog niet vastgelegd.&lt;/b&gt; %1 Druk op &lt;i&gt;Trekking vastleggen&lt;/i&gt; om haar toe te wijzen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="490"/>
        <source>No minimum sample can be computed for these settings.</source>
        <translation>Voor deze instellingen kan geen minimale steekproef worden berekend.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="492"/>
        <source>&lt;b&gt;Krippendorff&apos;s minimum: %1 values&lt;/b&gt; per variable for α_min = %2 at p = %3, with the rarest value at %4 %.</source>
        <translation>&lt;b&gt;Krippendorffs minimum: %1 waarden&lt;/b&gt; per variabele voor α_min = %2 bij p = %3, met de zeldzaamste waarde op %4 %.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="501"/>
        <source>Unit</source>
        <translation>Eenheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="501"/>
        <source>Values the draw delivers</source>
        <translation>Waarden die de trekking oplevert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="505"/>
        <source>✓ enough</source>
        <translation>✓ genoeg</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="506"/>
        <source>✗ %n short</source>
        <translation>
            <numerusform>✗ %n te weinig</numerusform>
            <numerusform>✗ %n te weinig</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="514"/>
        <source>Article-level items</source>
        <translation>Items op artikelniveau</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="515"/>
        <source>Paragraphs</source>
        <translation>Alinea&apos;s</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="516"/>
        <source>Sentences</source>
        <translation>Zinnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="519"/>
        <source>Values are units × coders. For spans, count the codings of each function: a rare function (often the remedy) may need a larger or stratified sample.</source>
        <translation>Waarden zijn eenheden × codeurs. Tel voor fragmenten de coderingen van elke functie: een zeldzame functie (vaak de oplossing) kan een grotere of gestratificeerde steekproef nodig hebben.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="556"/>
        <source>Deal the rest</source>
        <translation>De rest verdelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="558"/>
        <source>Every article with no assignment yet goes to production coding, shuffled with the seed and dealt in turn.</source>
        <translation>Elk artikel zonder toewijzing gaat naar de hoofdcodering, geschud met de seed en om de beurt uitgedeeld.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="564"/>
        <source>Single-coded: one coder per article</source>
        <translation>Enkel gecodeerd: één codeur per artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="567"/>
        <source>Double-coded: two coders per article, pairs rotating</source>
        <translation>Dubbel gecodeerd: twee codeurs per artikel, wisselende paren</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="572"/>
        <source>Coding:</source>
        <translation>Codering:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="575"/>
        <source>Production coders</source>
        <translation>Codeurs hoofdcodering</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="577"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="747"/>
        <source>Coders:</source>
        <translation>Codeurs:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="584"/>
        <source>Plan</source>
        <translation>Plannen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="586"/>
        <source>Assign</source>
        <translation>Toewijzen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="606"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="720"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Article</source>
        <translation>Artikel</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="606"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="709"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="720"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Coder</source>
        <translation>Codeur</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="625"/>
        <source>Press &lt;i&gt;Plan&lt;/i&gt; to see who would code which article.</source>
        <translation>Druk op &lt;i&gt;Plannen&lt;/i&gt; om te zien wie welk artikel zou coderen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="665"/>
        <source>Every article is assigned already: there is no rest to deal.</source>
        <translation>Elk artikel is al toegewezen: er is geen rest te verdelen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="670"/>
        <source>%1: %2</source>
        <translation>%1: %2</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="671"/>
        <source>&lt;b&gt;Planned, not yet assigned:&lt;/b&gt; %n article(s); load per coder %1. Press &lt;i&gt;Assign&lt;/i&gt; to write the plan.</source>
        <translation>
            <numerusform>&lt;b&gt;Gepland, nog niet toegewezen:&lt;/b&gt; %n artikel; belasting per codeur %1. Druk op &lt;i&gt;Toewijzen&lt;/i&gt; om het plan weg te schrijven.</numerusform>
            <numerusform>&lt;b&gt;Gepland, nog niet toegewezen:&lt;/b&gt; %n artikelen; belasting per codeur %1. Druk op &lt;i&gt;Toewijzen&lt;/i&gt; om het plan weg te schrijven.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="693"/>
        <source>The rest is assigned.</source>
        <translation>De rest is toegewezen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="708"/>
        <source>&lt;b&gt;Articles per coder and phase&lt;/b&gt; (done / assigned)</source>
        <translation>&lt;b&gt;Artikelen per codeur en fase&lt;/b&gt; (klaar / toegewezen)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="712"/>
        <source>Total</source>
        <translation>Totaal</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="719"/>
        <source>&lt;b&gt;Every assignment&lt;/b&gt;</source>
        <translation>&lt;b&gt;Alle toewijzingen&lt;/b&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="720"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Phase</source>
        <translation>Fase</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="720"/>
        <source>Status</source>
        <translation>Status</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="729"/>
        <source>Give articles to coders</source>
        <translation>Artikelen aan codeurs geven</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="731"/>
        <source>Every chosen coder gets every chosen article, e.g. the training articles that the lead has master-coded.</source>
        <translation>Elke gekozen codeur krijgt elk gekozen artikel, bijv. de trainingsartikelen die de coördinator als master heeft gecodeerd.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="744"/>
        <source>Articles to give</source>
        <translation>Te geven artikelen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="750"/>
        <source>Coders to give to</source>
        <translation>Codeurs die ze krijgen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="752"/>
        <source>Give</source>
        <translation>Geven</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="782"/>
        <source>done</source>
        <translation>klaar</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="783"/>
        <source>started</source>
        <translation>begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="784"/>
        <source>not started</source>
        <translation>niet begonnen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="840"/>
        <source>Every chosen coder has every chosen article in this phase already.</source>
        <translation>Elke gekozen codeur heeft elk gekozen artikel in deze fase al.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="862"/>
        <source>Version</source>
        <translation>Versie</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="862"/>
        <source>Made</source>
        <translation>Gemaakt</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="862"/>
        <source>By</source>
        <translation>Door</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="862"/>
        <source>Note</source>
        <translation>Notitie</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="866"/>
        <source>Add a version from a file…</source>
        <translation>Versie uit een bestand toevoegen…</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="868"/>
        <source>Read a codebook JSON file and store it as the next version, with a note that says what changed and why.</source>
        <translation>Een JSON-codeboekbestand inlezen en als volgende versie opslaan, met een notitie die zegt wat er veranderd is en waarom.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="881"/>
        <source>Compare version</source>
        <translation>Versie vergelijken</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="883"/>
        <source>with</source>
        <translation>met</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="891"/>
        <source>Changes between the versions</source>
        <translation>Wijzigingen tussen de versies</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="899"/>
        <source>Only those to re-check</source>
        <translation>Alleen die opnieuw te controleren zijn</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Function</source>
        <translation>Functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Made under</source>
        <translation>Gemaakt onder</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="903"/>
        <source>Re-check</source>
        <translation>Opnieuw controleren</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="973"/>
        <source>yes — its function changed</source>
        <translation>ja — de functie is veranderd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="973"/>
        <source>no</source>
        <translation>nee</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="983"/>
        <source>&lt;b&gt;Every annotation was made under the current version (%1).&lt;/b&gt;</source>
        <translation>&lt;b&gt;Elke annotatie is gemaakt onder de huidige versie (%1).&lt;/b&gt;</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/study_design_window.cpp" line="984"/>
        <source>&lt;b&gt;%n annotation(s) were made under an older version&lt;/b&gt; than the current one (%1); %2 of them belong to a function whose definition, rules, examples or attributes changed since, and should be re-checked.</source>
        <translation>
            <numerusform>&lt;b&gt;%n annotatie is gemaakt onder een oudere versie&lt;/b&gt; dan de huidige (%1); %2 daarvan hoort bij een functie waarvan de definitie, regels, voorbeelden of kenmerken sindsdien veranderd zijn, en moet opnieuw worden gecontroleerd.</numerusform>
            <numerusform>&lt;b&gt;%n annotaties zijn gemaakt onder een oudere versie&lt;/b&gt; dan de huidige (%1); %2 daarvan horen bij een functie waarvan de definitie, regels, voorbeelden of kenmerken sindsdien veranderd zijn, en moeten opnieuw worden gecontroleerd.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="999"/>
        <source>&lt;p&gt;There is only version %1: nothing to compare yet. Add a version when the codebook changes.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Er is alleen versie %1: nog niets te vergelijken. Voeg een versie toe wanneer het codeboek verandert.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1003"/>
        <source>&lt;p&gt;Choose two different versions to compare.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Kies twee verschillende versies om te vergelijken.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1012"/>
        <source>Codebook version %1 → %2</source>
        <translation>Codeboekversie %1 → %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1014"/>
        <source>&lt;p&gt;No changes.&lt;/p&gt;</source>
        <translation>&lt;p&gt;Geen wijzigingen.&lt;/p&gt;</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1022"/>
        <source>added</source>
        <translation>toegevoegd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1026"/>
        <source>removed</source>
        <translation>verwijderd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1030"/>
        <source>changed</source>
        <translation>gewijzigd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1055"/>
        <source>item removed:</source>
        <translation>item verwijderd:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1059"/>
        <source>item added:</source>
        <translation>item toegevoegd:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1063"/>
        <source>the order changed</source>
        <translation>de volgorde is veranderd</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1067"/>
        <source>was:</source>
        <translation>was:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1070"/>
        <source>now:</source>
        <translation>nu:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1082"/>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1086"/>
        <source>Add a codebook version</source>
        <translation>Een codeboekversie toevoegen</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1082"/>
        <source>Codebooks (*.json)</source>
        <translation>Codeboeken (*.json)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/study_design_window.cpp" line="1087"/>
        <source>What changed, and why?</source>
        <translation>Wat is er veranderd, en waarom?</translation>
    </message>
</context>
<context>
    <name>fourfold::TrainingFeedbackDialog</name>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="39"/>
        <source>Training feedback — %1</source>
        <translation>Trainingsfeedback — %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="47"/>
        <source>Compared per:</source>
        <translation>Vergeleken per:</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="50"/>
        <source>Unit</source>
        <translation>Eenheid</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="51"/>
        <source>sentence</source>
        <translation>zin</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="52"/>
        <source>paragraph</source>
        <translation>alinea</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="53"/>
        <source>word</source>
        <translation>woord</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="60"/>
        <source>Agreement per function</source>
        <translation>Overeenstemming per functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>Function</source>
        <translation>Functie</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>Same as the master</source>
        <translation>Gelijk aan de master</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="61"/>
        <source>α</source>
        <translation>α</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="62"/>
        <source>You marked / master marked</source>
        <translation>Jij markeerde / master markeerde</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="62"/>
        <source>What it suggests</source>
        <translation>Wat het suggereert</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="71"/>
        <source>Most units carry no function, so &quot;same as the master&quot; is high even when your spans differ; α corrects for that agreement by chance (Krippendorff). Aim for α of .800 or more.</source>
        <translation>De meeste eenheden dragen geen functie, dus ‘gelijk aan de master’ is hoog, ook als je fragmenten verschillen; α corrigeert voor die toevallige overeenstemming (Krippendorff). Streef naar een α van .800 of meer.</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="85"/>
        <source>On to the real work</source>
        <translation>Door naar het echte werk</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="123"/>
        <source>&lt;b&gt;No feedback yet.&lt;/b&gt; %1</source>
        <translation>&lt;b&gt;Nog geen feedback.&lt;/b&gt; %1</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="131"/>
        <source>&lt;b&gt;No finished training article to compare yet.&lt;/b&gt; Feedback comes once you mark a training article as done.</source>
        <translation>&lt;b&gt;Nog geen afgerond trainingsartikel om te vergelijken.&lt;/b&gt; Feedback komt zodra je een trainingsartikel als klaar markeert.</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="135"/>
        <source>&lt;b&gt;%1, your coding of %n training article(s) compared with the master coding of %2&lt;/b&gt;, %3 by %3: in how many did you and the master agree on whether the function is there?</source>
        <translation>
            <numerusform>&lt;b&gt;%1, jouw codering van %n trainingsartikel vergeleken met de mastercodering van %2&lt;/b&gt;, %3 voor %3: in hoeveel waren jij en de master het eens over de vraag of de functie aanwezig is?</numerusform>
            <numerusform>&lt;b&gt;%1, jouw codering van %n trainingsartikelen vergeleken met de mastercodering van %2&lt;/b&gt;, %3 voor %3: in hoeveel waren jij en de master het eens over de vraag of de functie aanwezig is?</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="158"/>
        <source>%1 % (%2 of %3)</source>
        <translation>%1 % (%2 van %3)</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="174"/>
        <source>%1 / %2</source>
        <translation>%1 / %2</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="180"/>
        <source>nothing to compare</source>
        <translation>niets om te vergelijken</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="182"/>
        <source>close to the master</source>
        <translation>dicht bij de master</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="184"/>
        <source>you mark it more often than the master: re-read the exclusion rules</source>
        <translation>je markeert haar vaker dan de master: lees de uitsluitingsregels opnieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="186"/>
        <source>you miss some: re-read the definition and examples</source>
        <translation>je mist er enkele: lees de definitie en de voorbeelden opnieuw</translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="188"/>
        <source>as often, but in other places: compare your spans with the lead&apos;s</source>
        <translation>even vaak, maar op andere plaatsen: vergelijk je fragmenten met die van de coördinator</translation>
    </message>
    <message numerus="yes">
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="195"/>
        <source>You have %n training article(s) still open. Finish them before the real work starts.</source>
        <translation>
            <numerusform>Je hebt nog %n trainingsartikel open. Rond het af voordat het echte werk begint.</numerusform>
            <numerusform>Je hebt nog %n trainingsartikelen open. Rond ze af voordat het echte werk begint.</numerusform>
        </translation>
    </message>
    <message>
        <location filename="../app/desktop/study/training_feedback_dialog.cpp" line="201"/>
        <source>Training is complete. Talk over the functions with low agreement with your lead, then go on to your assigned articles.</source>
        <translation>De training is afgerond. Bespreek de functies met weinig overeenstemming met je coördinator en ga daarna verder met de artikelen die aan je zijn toegewezen.</translation>
    </message>
</context>
<context>
    <name>main</name>
    <message>
        <location filename="../app/desktop/main.cpp" line="27"/>
        <source>Fourfold: manual frame analysis of news and opinion articles.</source>
        <translation>Fourfold: handmatige frame-analyse van nieuws- en opinieartikelen.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="29"/>
        <source>Code as the coder with this pseudonym.</source>
        <translation>Coderen als de codeur met dit pseudoniem.</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="32"/>
        <source>A project file to open (*.fourfold).</source>
        <translation>Een projectbestand om te openen (*.fourfold).</translation>
    </message>
    <message>
        <location filename="../app/desktop/main.cpp" line="40"/>
        <source>Cannot open project</source>
        <translation>Project kan niet worden geopend</translation>
    </message>
</context>
</TS>
