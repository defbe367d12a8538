# The evaluation interviews, invented for evaluation only, and their gold. Frozen on 2026-12-02:
# never edit them to suit the program (see transcripts-eval/README.md).
#
# Talk markup: one turn per line, "KEY: text"; a stretch in another language is {code:text} with an
# ISO 639-1 code; the gold worklist is those stretches in order. Headings: H(label, name, surfaces,
# geonameId, country, merge, note); `merge` says how a surface joins its person (see the README).

def H(label, name, surfaces, gid=None, country=None, merge=None, note=None, link_as=None):
    h = {"label": label, "name": name, "surfaces": surfaces}
    if label == "LOC":
        h["geonameId"] = gid
        if country:
            h["country"] = country
        if link_as:
            h["linkAs"] = link_as
    if merge:
        h["merge"] = merge
    if note:
        h["note"] = note
    return h


SLONIM = {
    "name": "slonim-1994", "format": "vtt", "main": "en",
    "speakers": {"I": "Interviewer", "N": "Aleksandr Slonim"},
    "note": "Invented interview for evaluation. Aleksandr Slonim, his family, neighbours and the factory named here are fictional; the places are real.",
    "talk": """
I: This is an interview with Aleksandr Slonim, recorded in Cleveland, Ohio, on the sixth of April, 1994. Mister Slonim, thank you for having me.
N: Please, not Mister Slonim. Call me Sasha, everybody calls me Sasha. Only my mother said Shura. {ru:Шурочка, иди домой, ужин стынет!} [laughs] That is how she called me from the window.
I: Sasha, then. Where were you born?
N: In Vilna, in 1926. {ru:Я родился в Вильно, в двадцать шестом году.} Then it was Poland, and on the papers it said Wilno. Today they say Vilnius. {lt:Aš gimiau Vilniuje.} My grandson taught me this sentence, he is very proud of it. [laughs]
I: Tell me about your parents.
N: My father was Yosef Slonim. He was a tailor, he made coats. At home my mother called him Yossele, and the Russian customers called him {ru:Иосиф Маркович}, very respectful. My mother, Dvoyre, was from Lida. {yi:מײַן מאַמע איז געקומען פֿון לידע.} Lida is a small town, maybe a hundred kilometres from Vilna, today in Belarus.
I: Did you have brothers or sisters?
N: One sister, Rivka. Rivkele, we said. She was three years younger. {yi:ריװקעלע, קום אַהער!} All day my mother was shouting this, because Rivkele was always running away to the river. [pause] She lives in Haifa now, Rivka Ben-Ami, with her husband's name.
I: What language did you speak at home?
N: Yiddish, of course, Yiddish at home. On the street Polish, and a little Russian from the neighbours. Our neighbour, {ru:тётя Лида}, she was Russian, Lidiya Petrovna, she taught me the Russian letters. {ru:Лидия Петровна была очень добрая женщина.} A very good woman. And in the cheder I had reb Mendel. {yi:רב מענדל האָט אונדז געלערנט חומש.} Reb Mendel taught us the Chumash, with a stick. [laughs] Not so gentle.
I: What happened when the war came?
N: In 1940 the Soviets came, and in June 1941 the Germans. My father said, {yi:מיר מוזן אַנטלויפֿן}, we must run. But he did not run himself. He sent us, my mother, Rivkele and me, on a train to the east, and he stayed to close the shop. [long pause] We never saw him again. Later we learned he was killed in Ponary, in the forest near the city. {ru:Его убили в Понарах.} Ponary. Everybody from Vilna knows this word.
I: I am sorry.
N: [pause] Yes. So, the train. Three weeks on the train. We came to Tashkent, in Uzbekistan. {ru:В Ташкенте было тепло, и были яблоки.} It was warm, there were apples. My mother sewed army uniforms {ru:на фабрике «Красный текстильщик»}, the Red Textile Worker, twelve hours a day.
I: And after the war?
N: In 1945 we went back. Vilnius was the capital now, {ru:столица Литовской ССР}. In our apartment lived other people. Nobody from the family was left. So we went to Kovno, to my mother's cousin, {ru:в Ковно}, it is Kaunas now. {lt:Kaune gyvenome dvejus metus.} Two years we lived there. Then I got work in the port in Riga, and we moved to Riga.
I: Did you learn Latvian?
N: A little. My wife is Latvian, Inese. Inese Slonim, before she was Inese Kalniņa. {lv:Mēs dzīvojām Rīgā trīsdesmit gadus.} Thirty years in Riga. Her mother always said {lv:Saša, ēd vēl!} [laughs] Sasha, eat more. A Latvian mother-in-law, a Jewish mother, it is the same thing. [laughs]
I: When did you leave?
N: In 1979. Seven years we waited for the permission, and in Moscow they said no, no, no. {ru:В Москве нам говорили: ждите.} Then, yes. Vienna, then Rome, and then Cleveland, where my cousin Misha was. Mikhail Slonim, but nobody calls him Mikhail, only Misha. He came from Minsk, much earlier, in the seventies.
I: Do you still speak Yiddish?
N: With Rivkele, on the telephone, to Haifa. {yi:ווי גייט עס דיר, ריװקעלע?} And she answers in Hebrew, because of the grandchildren. [laughs] {yi:איך בענק נאָך ווילנע.} I miss Vilna. Still, after everything.
I: Thank you, Sasha.
N: Thank you. {ru:Спасибо, что пришли.}
""",
    "headings": [
        H("PER", "Aleksandr Slonim", ["Aleksandr Slonim", "Mister Slonim", "Sasha", "Shura", "Шурочка", "Saša"],
          merge={"Mister Slonim": "title", "Sasha": "diminutive", "Shura": "diminutive", "Шурочка": "diminutive", "Saša": "diminutive"}),
        H("PER", "Yosef Slonim", ["Yosef Slonim", "Yossele", "Иосиф Маркович"],
          merge={"Yossele": "diminutive", "Иосиф Маркович": "equivalent"}),
        H("PER", "Dvoyre Slonim", ["Dvoyre"]),
        H("PER", "Rivka Ben-Ami", ["Rivka", "Rivkele", "ריװקעלע", "Rivka Ben-Ami"],
          merge={"Rivkele": "diminutive", "ריװקעלע": "diminutive", "Rivka Ben-Ami": "married-name"}),
        H("PER", "Lidiya Petrovna", ["тётя Лида", "Лида", "Lidiya Petrovna", "Лидия Петровна"],
          merge={"тётя Лида": "kinship", "Лида": "diminutive", "Лидия Петровна": "transliteration"}),
        H("PER", "Mendel", ["reb Mendel", "Reb Mendel", "רב מענדל"],
          merge={"reb Mendel": "title", "Reb Mendel": "title", "רב מענדל": "transliteration"}),
        H("PER", "Inese Slonim", ["Inese", "Inese Slonim", "Inese Kalniņa"], merge={"Inese Kalniņa": "married-name"}),
        H("PER", "Mikhail Slonim", ["Misha", "Mikhail Slonim", "Mikhail"], merge={"Misha": "diminutive"}),
        H("LOC", "Cleveland", ["Cleveland"], 5150529, "US", note="Cleveland, Ohio, not Cleveland, Tennessee"),
        H("LOC", "Ohio", ["Ohio"], None, "US", note="first-level region"),
        H("LOC", "Vilnius", ["Vilna", "Вильно", "Wilno", "Vilnius", "Vilniuje", "ווילנע"], 593116, "LT"),
        H("LOC", "Poland", ["Poland"], None, "PL"),
        H("LOC", "Lida", ["Lida", "לידע"], 626081, "BY"),
        H("LOC", "Belarus", ["Belarus"], None, "BY"),
        H("LOC", "Haifa", ["Haifa"], 294801, "IL"),
        H("LOC", "Ponary", ["Ponary", "Понарах"], None, "LT", note="killing site in the forest at Paneriai; not a city", link_as="at"),
        H("LOC", "Tashkent", ["Tashkent", "Ташкенте"], 1512569, "UZ"),
        H("LOC", "Uzbekistan", ["Uzbekistan"], None, "UZ"),
        H("LOC", "Lithuanian SSR", ["Литовской ССР"], None, None, note="historical state"),
        H("LOC", "Kaunas", ["Kovno", "Ковно", "Kaunas", "Kaune"], 598316, "LT"),
        H("LOC", "Riga", ["Riga", "Rīgā"], 456172, "LV"),
        H("LOC", "Moscow", ["Moscow", "Москве"], 524901, "RU"),
        H("LOC", "Vienna", ["Vienna"], 2761369, "AT"),
        H("LOC", "Rome", ["Rome"], 3169070, "IT", note="Roma in the GeoNames name column"),
        H("LOC", "Minsk", ["Minsk"], 625144, "BY"),
        H("ORG", "Red Textile Worker", ["Red Textile Worker", "Красный текстильщик"]),
    ],
}

HNATYUK = {
    "name": "hnatyuk-2005", "format": "srt", "main": "en",
    "speakers": {"I": "INTERVIEWER", "M": "MYKOLA"},
    "talk": """
I: We are recording. It is the eleventh of September, 2005, in Winnipeg, and I am here with Mykola Hnatyuk. Mister Hnatyuk, can you tell me your name and where you were born?
M: My name is Mykola Hnatyuk. In Canada I am Nick, Nick Hnatyuk, on the cheques and on the mailbox. But at home, Mykola. My mother said Mykolka. {uk:Миколко, ходи їсти!} [laughs]
I: And where were you born?
M: I was born in 1930 in Kolomyya, in Galicia. {uk:Я народився в Коломиї, на Галичині.} Then it was Poland, and the Poles wrote Kołomyja. Before, under the Austrians, the Germans said Kolomea. One town, three names. [laughs]
I: Tell me about your family.
M: My father, Petro Hnatyuk, was a carpenter. {uk:Тато робив столи і вікна для всієї вулиці.} My mother, Olena, was from Bukovina, from near Czernowitz, Chernivtsi now. {uk:Мама була родом з Буковини.} She spoke also Romanian, because Bukovina was Romanian then. And my little sister Halyna, Halya. {uk:Галя плакала весь час.} [laughs] And my father's brother, {uk:дядько Іван}, uncle Ivan. Ivan was the one with the books, he read everything, he was in the Prosvita, the reading society. {uk:Він ходив до читальні «Просвіти» щовечора.}
I: Were there other people in the town you remember?
M: Oh, yes. Our neighbour across the street was pan Brody, a Jewish man, he had the shop with the nails and the paint. Brody was his name, like the town near Lviv. {uk:Його родина колись прийшла з Бродів.} His family came from there, long ago. Pan Brody always gave me a candy. {pl:Masz, Kolka, tylko nie mów mamie.} Here, Kolka, just do not tell your mother. [laughs] He spoke Polish to me, I spoke Ukrainian to him.
I: What happened to him?
M: [pause] In 1942 they took all the Jews of Kolomyya. To Bełżec, we learned later. {uk:Ми бачили, як їх вели на станцію.} We saw them walking to the station. Pan Brody and his wife and the two girls. [long pause] I was twelve. I did not understand everything.
I: And your own family during the war?
M: In 1943 the Germans took me for work, to Germany. {de:Schneller, schneller, los!} That is what I heard for two years. I worked on a farm near Regensburg, in Bavaria. The farmer, Herr Gruber, he was not bad. His wife gave me soup. {de:Iss, Junge, iss.}
I: After the war?
M: After the war I did not go back. Galicia was Soviet now, and my father wrote, do not come. {uk:Синку, не вертайся.} So I stayed in the camp for displaced persons in Regensburg, five years. Then Canada. Winnipeg. In Winnipeg, you know, half the city speaks Ukrainian. [laughs]
I: Did you see your family again?
M: In 1969 I went to visit, to Lviv. Halyna came from Ternopil, and uncle Ivan was still alive, very old. {uk:Ми зустрілися у Львові, на вокзалі.} We met in Lviv, at the station. My mother's cousin was Polish, she still said {pl:we Lwowie}, never Lviv, and my sister said {ru:во Львове}, because of the school, and I said Lemberg, like my father. [laughs] One city, and we could not agree.
I: Did you go to Kyiv?
M: Once. Halya's son studied in Kyiv, at the university. {uk:У Києві все було інакше, велике місто.} Kiev, we wrote then in English. He showed me the Dnieper. A big river.
I: Was your wife also from Galicia?
M: No, no. My wife, Stefania, was from Volhynia. {uk:Стефа з Волині, з-під Рівного.} Stefa, from near Rivne. Volhynians and Galicians, they argue about everything, even how to make borscht. [laughs]
I: You sing in a choir, I think?
M: Yes, forty years in the Dnipro Choir, at the church hall. {uk:Хор «Дніпро»}, we sing at Christmas, the old carols.
I: Thank you, Mister Hnatyuk.
M: Mykola, please. {uk:Дякую вам.} Thank you.
""",
    "headings": [
        H("PER", "Mykola Hnatyuk", ["Mykola Hnatyuk", "Mister Hnatyuk", "Mykola", "Nick", "Nick Hnatyuk", "Mykolka", "Миколко", "Kolka"],
          merge={"Mister Hnatyuk": "title", "Nick": "equivalent", "Nick Hnatyuk": "equivalent", "Mykolka": "diminutive", "Миколко": "diminutive", "Kolka": "diminutive"}),
        H("PER", "Petro Hnatyuk", ["Petro Hnatyuk"]),
        H("PER", "Olena Hnatyuk", ["Olena"]),
        H("PER", "Halyna Hnatyuk", ["Halyna", "Halya", "Галя"], merge={"Halya": "diminutive", "Галя": "diminutive"}),
        H("PER", "Ivan Hnatyuk", ["дядько Іван", "uncle Ivan", "Ivan"], merge={"дядько Іван": "kinship", "uncle Ivan": "kinship"}),
        H("PER", "Brody", ["pan Brody", "Pan Brody", "Brody"], merge={"pan Brody": "title", "Pan Brody": "title"},
          note="surname that is also a town (Brody, UA): never a place"),
        H("PER", "Gruber", ["Herr Gruber"], merge={"Herr Gruber": "title"}),
        H("PER", "Stefania Hnatyuk", ["Stefania", "Stefa", "Стефа"], merge={"Stefa": "diminutive", "Стефа": "diminutive"}),
        H("LOC", "Winnipeg", ["Winnipeg"], 6183235, "CA"),
        H("LOC", "Canada", ["Canada"], None, "CA"),
        H("LOC", "Kolomyya", ["Kolomyya", "Коломиї", "Kołomyja", "Kolomea"], 705392, "UA"),
        H("LOC", "Galicia", ["Galicia", "Галичині"], None, None, note="historical region (Austrian Galicia), not Galicia in Spain"),
        H("LOC", "Poland", ["Poland"], None, "PL"),
        H("LOC", "Bukovina", ["Bukovina", "Буковини"], None, None, note="historical region"),
        H("LOC", "Chernivtsi", ["Czernowitz", "Chernivtsi"], 710719, "UA"),
        H("LOC", "Brody", ["Бродів"], 711416, "UA", note="the town; the Latin 'Brody' in this interview is the neighbour"),
        H("LOC", "Lviv", ["Lviv", "Львові", "Lwowie", "Львове", "Lemberg"], 702550, "UA"),
        H("LOC", "Bełżec", ["Bełżec"], None, "PL", note="extermination camp; village not in cities15000", link_as="at"),
        H("LOC", "Germany", ["Germany"], None, "DE"),
        H("LOC", "Regensburg", ["Regensburg"], 2849483, "DE"),
        H("LOC", "Bavaria", ["Bavaria"], None, "DE", note="first-level region"),
        H("LOC", "Ternopil", ["Ternopil"], 691650, "UA"),
        H("LOC", "Kyiv", ["Kyiv", "Києві", "Kiev"], 703448, "UA"),
        H("LOC", "Dnieper", ["Dnieper"], None, None, note="river"),
        H("LOC", "Volhynia", ["Volhynia", "Волині"], None, None, note="historical region"),
        H("LOC", "Rivne", ["Rivne", "Рівного"], 695594, "UA"),
        H("ORG", "Prosvita", ["Prosvita", "Просвіти"]),
        H("ORG", "Dnipro Choir", ["Dnipro Choir", "Дніпро"]),
    ],
}

KOLINOVA = {
    "name": "kolinova-2008", "format": "txt", "main": "en",
    "speakers": {"J": "JANA", "V": "VĚRA"},
    "talk": """
J: This is an interview with Věra Kolínová, in Toronto, on the twentieth of May, 2008. Věra, thank you for having me.
V: You are welcome, Jana. [laughs] You know, in Czech you would say {cs:paní Kolínová}, but here everybody says Vera, without the little hat on the e. I was born Věra Weissová.
J: Where were you born?
V: In Brno, in 1928. {cs:Narodila jsem se v Brně, na Moravě.} The Germans called it Brünn. My father spoke German, my mother Czech, so at home we had both. {de:Bei uns hat man beides gesprochen.}
J: Tell me about your parents.
V: My father, Otto Weiss, had a textile shop, {cs:obchod s látkami}, near the square. My mother was Marie, but everybody said Mařenka, even the customers. {cs:Mařenko, podej mi nůžky!} [laughs] My father said that a hundred times a day. And my brother Pavel, Pavlík, two years older. Later, in England, he was Paul.
J: What happened in 1939?
V: {cs:Patnáctého března přijeli Němci do Brna.} The fifteenth of March. In the summer my brother went to England with a children's transport. {cs:Pavlík odjel vlakem do Anglie.} I stayed, because I was sick with the measles. [pause] Such a small thing, the measles.
J: And then?
V: In 1942 we were sent to Terezín. Theresienstadt, the Germans called it. {cs:V Terezíně jsme byli dva roky.} My father worked in the carpentry. There was a teacher, pan Hájek, who taught the children to sing, in secret. {cs:Pan Hájek nás učil zpívat potají.} And my mother's sister was there also, {cs:teta Olga}. {cs:Teta Olga mi dávala svůj chleba.} She gave me her bread. Olga did not come back.
J: And after Terezín?
V: In October 1944, the transport to Auschwitz. {cs:Do Osvětimi.} My father, my mother... [long pause] Only I came back. I was sixteen. From Auschwitz they sent me to a factory in Silesia, near Breslau. Today it is Wrocław, in Poland.
J: How did you come home?
V: In May 1945, on foot, on trains, on a truck. To Prague first. {cs:V Praze na nádraží visely seznamy.} At the station in Prague there were lists, the names of who came back. I looked for my parents. [pause] Not there. But my cousin Arnošt was there, in uniform, he came with the army from the east. {cs:Arnošt byl s armádou v Kyjevě, v roce 1943.} And there was a telegram from Pavel, from London.
J: Where did you meet your husband?
V: In Prague, in 1947. Jindřich Kolín. Jindra. {cs:Jeho rodina byla z Kolína}, from the town with the same name as him. [laughs] {cs:Jindro, kde máš klobouk?} I said that every morning for fifty years. We lived first in Olomouc. {cs:V Olomouci jsme bydleli tři roky.}
J: Why did you leave Czechoslovakia?
V: In 1968. The tanks. {cs:V srpnu přijely tanky.} We took the children, Tomáš and Hana, and went to Vienna, and then here, to Toronto. {de:In Wien hat uns eine Cousine geholfen.} In Canada Jindra became Henry, Henry Kolin on the door, without the little hat. Pan Kolín was finished. [laughs]
J: Do you still speak Czech with your children?
V: With Tomáš, yes. Hana answers in English. My grandson calls me {cs:babička}, and he thinks it is my name. [laughs]
""",
    "headings": [
        H("PER", "Věra Kolínová", ["Věra Kolínová", "Věra", "paní Kolínová", "Vera", "Věra Weissová"],
          merge={"paní Kolínová": "title", "Vera": "transliteration", "Věra Weissová": "married-name"}),
        H("PER", "Jana", ["Jana"]),
        H("PER", "Otto Weiss", ["Otto Weiss"]),
        H("PER", "Marie Weissová", ["Marie", "Mařenka", "Mařenko"], merge={"Mařenka": "diminutive", "Mařenko": "diminutive"}),
        H("PER", "Pavel Weiss", ["Pavel", "Pavlík", "Paul"], merge={"Pavlík": "diminutive", "Paul": "equivalent"}),
        H("PER", "Hájek", ["pan Hájek", "Pan Hájek"], merge={"pan Hájek": "title", "Pan Hájek": "title"}),
        H("PER", "Olga", ["teta Olga", "Teta Olga", "Olga"], merge={"teta Olga": "kinship", "Teta Olga": "kinship"}),
        H("PER", "Arnošt", ["Arnošt"]),
        H("PER", "Jindřich Kolín", ["Jindřich Kolín", "Jindra", "Jindro", "Henry", "Henry Kolin", "Pan Kolín"],
          merge={"Jindra": "diminutive", "Jindro": "diminutive", "Henry": "equivalent", "Henry Kolin": "equivalent", "Pan Kolín": "title"},
          note="surname that is also a town (Kolín, CZ): never a place"),
        H("PER", "Tomáš Kolín", ["Tomáš"]),
        H("PER", "Hana Kolínová", ["Hana"]),
        H("LOC", "Toronto", ["Toronto"], 6167865, "CA"),
        H("LOC", "Brno", ["Brno", "Brně", "Brna", "Brünn"], 3078610, "CZ"),
        H("LOC", "Moravia", ["Moravě"], None, "CZ", note="historical region"),
        H("LOC", "England", ["England", "Anglie"], None, "GB"),
        H("LOC", "Terezín", ["Terezín", "Theresienstadt", "Terezíně"], None, "CZ", note="ghetto; town not in cities15000", link_as="at"),
        H("LOC", "Auschwitz", ["Auschwitz", "Osvětimi"], 3089658, "PL", note="camp; heading keeps the spoken name, linked at Oświęcim", link_as="at"),
        H("LOC", "Silesia", ["Silesia"], None, None, note="historical region"),
        H("LOC", "Wrocław", ["Breslau", "Wrocław"], 3081368, "PL"),
        H("LOC", "Poland", ["Poland"], None, "PL"),
        H("LOC", "Prague", ["Prague", "Praze"], 3067696, "CZ"),
        H("LOC", "Kyiv", ["Kyjevě"], 703448, "UA"),
        H("LOC", "London", ["London"], 2643743, "GB"),
        H("LOC", "Kolín", ["Kolína"], 3073371, "CZ", note="the town; 'Kolín' bare in this interview is the husband"),
        H("LOC", "Olomouc", ["Olomouc", "Olomouci"], 3069011, "CZ"),
        H("LOC", "Czechoslovakia", ["Czechoslovakia"], None, None, note="historical state"),
        H("LOC", "Vienna", ["Vienna", "Wien"], 2761369, "AT"),
        H("LOC", "Canada", ["Canada"], None, "CA"),
    ],
}

PAPADAKI = {
    "name": "papadaki-2012", "format": "md", "main": "en",
    "speakers": {"I": "INTERVIEWER", "E": "ELENI"},
    "title": "Interview with Eleni Papadaki, Melbourne, 2012 (invented for evaluation)",
    "sections": {0: "Thessaloniki", 6: "The War", 10: "Larisa", 12: "Australia"},
    "talk": """
I: We are recording. This is an interview with Eleni Papadaki, in Melbourne, on the fourth of March, 2012. Mrs. Papadaki, thank you for having me.
E: Eleni, please. Or Lena, here in Australia everybody says Lena. My father called me Elenitsa. {el:Ελενίτσα μου, έλα εδώ.} [laughs]
I: Where were you born?
E: In Thessaloniki, in 1933. {el:Γεννήθηκα στη Θεσσαλονίκη, κοντά στο λιμάνι.} The English said Salonica, and my father's Jewish friends said Saloniki. One city, many names, many peoples. {el:Εμείς είμαστε από τη Μακεδονία.} We are from Macedonia, the Greek one, you must write that.
I: Tell me about your family.
E: My father, Giorgos Papadakis, was a fisherman. {el:Ο πατέρας μου ήταν ψαράς.} He worked on the boats of the Aegean Fishing Company. Everybody called him kyr Giorgos, or Giorgakis when they were joking. My mother's family came from Smyrna, from Asia Minor, in 1922, as refugees. {el:Η γιαγιά μου ήρθε από τη Σμύρνη με ένα καράβι.} My grandmother came from Smyrna on a boat, with nothing.
I: Who were your neighbours?
E: Next door lived kyria Esterina, Esterina Saltiel, a Jewish lady. {el:Η κυρία Εστερίνα μου έμαθε να πλέκω.} She taught me to knit. She had a son, Jacques, my best friend. {el:Ο Ζακ ήταν ο καλύτερός μου φίλος.}
I: What happened in the war?
E: In 1943 the Germans took the Jews of Thessaloniki. All of them, in the trains, to Auschwitz. {el:Μια μέρα η κυρία Εστερίνα και ο Ζακ δεν ήταν πια εκεί.} One day they were not there anymore. [long pause] Nobody came back. Only later we knew the names, Auschwitz, Birkenau.
I: And your own family?
E: We were hungry. {el:Πεινάσαμε πολύ εκείνο τον χειμώνα.} My mother's brother, {el:ο θείος Κώστας}, went to the mountains with the partisans. After the civil war uncle Kostas had to leave Greece, he went to Tashkent with the communists. {el:Ο Κώστας γύρισε από την Τασκένδη μόνο το 1982.} He came back only in 1982, an old man.
I: Did you stay in Thessaloniki?
E: No. In 1950 we moved to Larisa, because my father found work there. {el:Στη Λάρισα δεν υπήρχε θάλασσα.} No sea in Larisa, my father was so sad. [laughs] And there my cousin Larissa was born, named after the city. Larissa with two s, she always says. [laughs]
I: When did you come to Australia?
E: In 1956, on the ship, from Piraeus. {el:Από τον Πειραιά ως τη Μελβούρνη, ένας μήνας.} Piraeus to Melbourne, one month. My husband, Dimitris, was already here. In Australia he was Jim, Jimmy for his friends. {el:Ο Δημήτρης μου έγραφε κάθε εβδομάδα.} Every week a letter.
I: Do you have family in Greece still?
E: My brother Giannis lives in Athens. {el:Ο Γιάννης μένει στην Αθήνα, στο Παγκράτι.} His grandchildren here in Melbourne call him Uncle John. [laughs] Giannis, John, it is all the same.
I: Thank you, Eleni.
E: {el:Να είστε καλά.} Thank you.
""",
    "headings": [
        H("PER", "Eleni Papadaki", ["Eleni Papadaki", "Mrs. Papadaki", "Eleni", "Lena", "Elenitsa", "Ελενίτσα"],
          merge={"Mrs. Papadaki": "title", "Lena": "diminutive", "Elenitsa": "diminutive", "Ελενίτσα": "diminutive"}),
        H("PER", "Giorgos Papadakis", ["Giorgos Papadakis", "kyr Giorgos", "Giorgakis"],
          merge={"kyr Giorgos": "title", "Giorgakis": "diminutive"}),
        H("PER", "Esterina Saltiel", ["kyria Esterina", "Esterina Saltiel", "κυρία Εστερίνα", "Εστερίνα"],
          merge={"kyria Esterina": "title", "κυρία Εστερίνα": "title", "Εστερίνα": "transliteration"}),
        H("PER", "Jacques Saltiel", ["Jacques", "Ζακ"], merge={"Ζακ": "transliteration"}),
        H("PER", "Kostas", ["θείος Κώστας", "uncle Kostas", "Κώστας"],
          merge={"θείος Κώστας": "kinship", "uncle Kostas": "kinship", "Κώστας": "transliteration"}),
        H("PER", "Larissa", ["Larissa"], note="first name that is also a city (Larisa, GR): never a place"),
        H("PER", "Dimitris", ["Dimitris", "Jim", "Jimmy", "Δημήτρης"],
          merge={"Jim": "equivalent", "Jimmy": "equivalent", "Δημήτρης": "transliteration"}),
        H("PER", "Giannis Papadakis", ["Giannis", "Γιάννης", "Uncle John"],
          merge={"Γιάννης": "transliteration", "Uncle John": "equivalent"}),
        H("LOC", "Melbourne", ["Melbourne", "Μελβούρνη"], 2158177, "AU"),
        H("LOC", "Australia", ["Australia"], None, "AU"),
        H("LOC", "Thessaloniki", ["Thessaloniki", "Θεσσαλονίκη", "Salonica", "Saloniki"], 734077, "GR"),
        H("LOC", "Macedonia", ["Macedonia", "Μακεδονία"], None, "GR", note="the Greek region, not the state North Macedonia"),
        H("LOC", "Smyrna", ["Smyrna", "Σμύρνη"], 311046, "TR", note="heading keeps the spoken name, linked at İzmir", link_as="at"),
        H("LOC", "Asia Minor", ["Asia Minor"], None, None, note="historical region"),
        H("LOC", "Auschwitz", ["Auschwitz"], 3089658, "PL", note="camp; heading keeps the spoken name, linked at Oświęcim", link_as="at"),
        H("LOC", "Birkenau", ["Birkenau"], None, "PL", note="camp at Brzezinka; not Birkenau, DE", link_as="at"),
        H("LOC", "Greece", ["Greece"], None, "GR"),
        H("LOC", "Tashkent", ["Tashkent", "Τασκένδη"], 1512569, "UZ"),
        H("LOC", "Larisa", ["Larisa", "Λάρισα"], 258576, "GR"),
        H("LOC", "Piraeus", ["Piraeus", "Πειραιά"], 255274, "GR"),
        H("LOC", "Athens", ["Athens", "Αθήνα"], 264371, "GR"),
        H("LOC", "Pangrati", ["Παγκράτι"], None, "GR", note="district of Athens"),
        H("ORG", "Aegean Fishing Company", ["Aegean Fishing Company"]),
    ],
}

INTERVIEWS = [SLONIM, HNATYUK, KOLINOVA, PAPADAKI]
